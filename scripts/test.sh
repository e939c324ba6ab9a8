#!/usr/bin/env bash
# npm test: the same set-up as npm start against separate test databases, then every suite.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
set +e

cleanup() { if [ "${PG_STARTED_HERE:-0}" = 1 ]; then stop_postgres; fi; }
trap cleanup EXIT

set -e
ensure_node_modules
ensure_chromium
start_postgres
build_all
ensure_database covalent_e2e fresh
E2E_DATABASE_URL="$DATABASE_URL"
ensure_database covalent_test fresh
INT_DATABASE_URL="$DATABASE_URL"
for url in "$INT_DATABASE_URL" "$E2E_DATABASE_URL"; do DATABASE_URL="$url" node "$ROOT/server/dist/database/migrate.js"; done
APP_SECRET=seed-only-seed-only-seed-only-0123456 DATABASE_URL="$E2E_DATABASE_URL" node "$ROOT/server/dist/database/seed.js" >/dev/null
set +e

LOGS="$DATA/test-logs"; mkdir -p "$LOGS"
NAMES=(); CODES=(); PASSED=0; FAILED=0

# run NAME DIR COMMAND...: runs one suite, keeps its output, and tallies its test counts.
run() {
  local name="$1" dir="$2"; shift 2
  log "suite: $name"
  (cd "$dir" && "$@") 2>&1 | tee "$LOGS/$name.log"
  local code=${PIPESTATUS[0]}
  NAMES+=("$name"); CODES+=("$code")
  local clean p f
  clean=$(sed -e 's/\x1b\[[0-9;]*m//g' "$LOGS/$name.log")
  case "$name" in
    server-*) p=$(grep -E '^Tests:' <<<"$clean" | grep -oE '[0-9]+ passed' | grep -oE '[0-9]+' | tail -1)
              f=$(grep -E '^Tests:' <<<"$clean" | grep -oE '[0-9]+ failed' | grep -oE '[0-9]+' | tail -1) ;;
    *-vitest) p=$(grep -E '^\s+Tests' <<<"$clean" | grep -oE '[0-9]+ passed' | grep -oE '[0-9]+' | tail -1)
              f=$(grep -E '^\s+Tests' <<<"$clean" | grep -oE '[0-9]+ failed' | grep -oE '[0-9]+' | tail -1) ;;
    bench-*)  p=$(grep -oE '^bench-smoke: [0-9]+ passed' <<<"$clean" | grep -oE '[0-9]+' | tail -1)
              f=$(grep -oE '^bench[a-z-]*: [0-9]+ passed, [0-9]+ failed' <<<"$clean" | grep -oE '[0-9]+ failed' | grep -oE '[0-9]+' | tail -1) ;;
    e2e)      p=$(grep -oE '^\s+[0-9]+ passed' <<<"$clean" | grep -oE '[0-9]+' | tail -1)
              f=$(grep -oE '^\s+[0-9]+ failed' <<<"$clean" | grep -oE '[0-9]+' | tail -1) ;;
  esac
  PASSED=$((PASSED + ${p:-0})); FAILED=$((FAILED + ${f:-0}))
  if [ "$code" -ne 0 ] && [ -z "$f" ]; then FAILED=$((FAILED + 1)); fi
}

run server-unit "$ROOT/server" npx jest --config jest.unit.config.js --ci
DATABASE_URL="$INT_DATABASE_URL" run server-integration "$ROOT/server" npx jest --config jest.int.config.js --ci --runInBand
run host-app-vitest "$ROOT/host-app" npx vitest run
run player-app-vitest "$ROOT/player-app" npx vitest run
DATABASE_URL="$E2E_DATABASE_URL" run e2e "$ROOT" npx playwright test --config e2e/playwright.config.ts
# The load benchmark's smoke run: a few hundred players; fails only on lost or doubled answers.
BENCH_SKIP_BUILD=1 run bench-smoke "$ROOT" bash scripts/bench.sh --smoke

echo
log "summary"
status=0
for i in "${!NAMES[@]}"; do
  if [ "${CODES[$i]}" -eq 0 ]; then printf '  %-20s ok\n' "${NAMES[$i]}"; else printf '  %-20s FAILED (exit %s)\n' "${NAMES[$i]}" "${CODES[$i]}"; status=1; fi
done
echo "tests: $PASSED passed, $FAILED failed"
exit $status
