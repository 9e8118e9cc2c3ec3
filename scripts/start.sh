#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the local service stand-ins,
# migrate, seed the demo when empty, build and serve Broodsilk at http://127.0.0.1:${PORT:-3000}.
# Ctrl-C stops everything it started. `npm run dev` adds Vite's dev server (hot reload) on :5173.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
DEV=0; [ "${1:-}" = "--dev" ] && DEV=1

ensure_node_modules
ensure_postgres_installed

PORT="${PORT:-3000}"
PGPORT="${PGPORT:-54329}"
PGDIR="$(pg_home_for "$ROOT/.data/pg")"
SECRETS="$ROOT/.data/secrets"

PIDS=()
cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  pg_stop "$PGDIR"
}
trap cleanup INT TERM EXIT

log "PostgreSQL on 127.0.0.1:$PGPORT (data in $PGDIR)"
pg_start "$PGDIR" "$PGPORT"
pg_ensure_db "$PGDIR" "$PGPORT" broodsilk

export NODE_ENV=production
export DATABASE_URL="postgres://app@127.0.0.1:$PGPORT/broodsilk"
export JWT_SECRET="${JWT_SECRET:-$(local_secret "$SECRETS/jwt")}"
export CSRF_SECRET="${CSRF_SECRET:-$(local_secret "$SECRETS/csrf")}"
export PORT HOST=127.0.0.1 PUBLIC_URL="${PUBLIC_URL:-http://127.0.0.1:$PORT}"
service_env usual "$ROOT/.data/s3"
export STRIPE_SECRET_KEY="${STRIPE_SECRET_KEY:-sk_test_broodsilk_local}" STRIPE_WEBHOOK_SECRET="${STRIPE_WEBHOOK_SECRET:-whsec_broodsilk_local}"
export PAYMENT_WEBHOOK_URL="http://127.0.0.1:$PORT/api/webhooks/payments"
export CLIENT_DIST="$ROOT/client/dist"

log "building"
(cd "$ROOT" && npm run build --silent) >/dev/null
log "migrating"
(cd "$ROOT/server" && node dist/cli/migrate.js)
(cd "$ROOT/server" && node dist/cli/seed.js)

log "starting the local service stand-ins"
SERVICES_LOG="$ROOT/.data/services.log"
start_services "$SERVICES_LOG"
PIDS+=("$SERVICES_PID")
grep '^  ' "$SERVICES_LOG" || true

(cd "$ROOT/server" && exec node dist/main.js) &
PIDS+=($!)
if [ "$DEV" = 1 ]; then
  (cd "$ROOT/client" && exec node_modules/.bin/vite 2>/dev/null || exec ../node_modules/.bin/vite) &
  PIDS+=($!)
  log "dev server with hot reload: http://127.0.0.1:5173"
fi
log "Broodsilk: http://127.0.0.1:$PORT   (demo sign-in: keeper@broodsilk.test / broodsilk-demo; Ctrl-C stops)"
wait -n "${PIDS[@]}" || true
