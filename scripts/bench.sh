#!/usr/bin/env bash
# npm run bench [-- --steps=300,1500 --trials=5 --smoke]: the load benchmark (see bench/run.mjs).
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cleanup() { if [ "${PG_STARTED_HERE:-0}" = 1 ]; then stop_postgres; fi; }
trap cleanup EXIT
ensure_node_modules
start_postgres
[ "${BENCH_SKIP_BUILD:-0}" = 1 ] || build_all
ensure_database covalent_bench fresh
node "$ROOT/server/dist/database/migrate.js"
APP_SECRET=bench-seed-bench-seed-bench-seed-0123456 node "$ROOT/server/dist/database/seed.js" >/dev/null
# PostgreSQL shares CPU0 with the load generator; the server has CPU1 to itself.
if command -v taskset >/dev/null && [ -f "$PGDATA_DIR/postmaster.pid" ]; then
  taskset -a -p -c 0 "$(head -n 1 "$PGDATA_DIR/postmaster.pid")" >/dev/null 2>&1 || true
fi
node "$ROOT/bench/run.mjs" "$@"
