#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL, migrate, seed, build and serve both apps.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

PIDS=()
cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  for pid in "${PIDS[@]:-}"; do [ -n "$pid" ] && kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  if [ "${PG_STARTED_HERE:-0}" = 1 ]; then stop_postgres; log "PostgreSQL stopped"; fi
}
trap cleanup INT TERM EXIT

free_port() { local p="$1"; while port_in_use "$p"; do p=$((p + 1)); done; echo "$p"; }

ensure_node_modules
start_postgres
ensure_database covalent
build_all

[ -f "$DATA/app-secret" ] || { head -c 48 /dev/urandom | base64 | tr -d '\n/+=' > "$DATA/app-secret"; chmod 600 "$DATA/app-secret"; }
export NODE_ENV=development
export APP_SECRET="$(cat "$DATA/app-secret")"
export HOST="${HOST:-127.0.0.1}"
export PORT="$(free_port "${PORT:-3000}")"
export PUBLIC_URL="${PUBLIC_URL:-http://127.0.0.1:$PORT}"
export SMTP_HOST="${SMTP_HOST:-127.0.0.1}"
if [ "$SMTP_HOST" = "127.0.0.1" ]; then
  export SMTP_PORT="$(free_port 2525)"
  MAIL_HTTP_PORT="$(free_port 8025)"
fi
export HOST_APP_DIST="$ROOT/host-app/dist"
# School sign-on: the local demo OpenID provider, unless OIDC_ISSUER points at a real one.
if [ -z "${OIDC_ISSUER:-}" ]; then
  OIDC_PORT="$(free_port 9125)"
  [ -f "$DATA/oidc-client-secret" ] || { head -c 32 /dev/urandom | base64 | tr -d '\n/+=' > "$DATA/oidc-client-secret"; chmod 600 "$DATA/oidc-client-secret"; }
  export OIDC_ISSUER="http://127.0.0.1:$OIDC_PORT"
  export OIDC_CLIENT_ID="covalent-local"
  export OIDC_CLIENT_SECRET="$(cat "$DATA/oidc-client-secret")"
  export OIDC_REDIRECT_URI="${OIDC_REDIRECT_URI:-$PUBLIC_URL/api/auth/sign-on/callback}"
fi
export PLAYER_APP_DIST="$ROOT/player-app/dist"

log "migrating and seeding the database"
node "$ROOT/server/dist/database/migrate.js"
node "$ROOT/server/dist/database/seed.js" | tee "$DATA/seed.txt"

if [ "$SMTP_HOST" = "127.0.0.1" ]; then
  node "$ROOT/server/dist/mail/dev/mail-catcher.js" "$SMTP_PORT" "$MAIL_HTTP_PORT" &
  PIDS+=($!)
fi
if [ -n "${OIDC_PORT:-}" ]; then
  node "$ROOT/server/dev/oidc-provider.mjs" "$OIDC_PORT" &
  PIDS+=($!)
  wait_http "$OIDC_ISSUER/.well-known/openid-configuration" 20 || die "the sign-on provider did not come up"
  SIGN_ON_DEMO="$(node -e 'const a = require(process.argv[1]).accounts.find((x) => x.email.startsWith("teacher@")); console.log(`login ${a.login}, password ${a.password}`)' "$ROOT/fixtures/demo/sign-on.json")"
fi
node "$ROOT/server/dist/main.js" &
PIDS+=($!)

wait_http "http://127.0.0.1:$PORT/api/health" 30 || die "the server did not come up"

cat <<MSG

  Covalent is running.
    Host app (teachers):  $PUBLIC_URL/
    Player app (students): $PUBLIC_URL/play/
$( [ -n "${MAIL_HTTP_PORT:-}" ] && echo "    Captured e-mail:       http://127.0.0.1:$MAIL_HTTP_PORT/" )
$( [ -n "${OIDC_PORT:-}" ] && echo "    School sign-on (demo provider, $OIDC_ISSUER): \"Sign in with school account\", then $SIGN_ON_DEMO" )
  Sign in with an account above (the teacher is the one to try first).
  Ctrl-C stops the server, the mail catcher, the sign-on provider and PostgreSQL.

MSG
wait -n "${PIDS[@]}" || true
