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
OWN_PG=0
cleanup() {
  trap - INT TERM EXIT
  log "stopping"
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  wait 2>/dev/null || true
  [ "$OWN_PG" = 1 ] && pg_stop "$PGDIR"
}
trap cleanup INT TERM EXIT

# The operator's own DATABASE_URL means a real install: no local PostgreSQL, and never the demo
# accounts (the seed CLI checks this itself too: src/seed/demo-gate.ts).
if [ -n "${DATABASE_URL:-}" ]; then
  OWN_PG=0
  unset BROODSILK_DEMO
  log "using the operator's DATABASE_URL; the demo is not seeded"
else
  OWN_PG=1
  log "PostgreSQL on 127.0.0.1:$PGPORT (data in $PGDIR)"
  pg_start "$PGDIR" "$PGPORT"
  pg_ensure_db "$PGDIR" "$PGPORT" broodsilk
  # The owner app migrates; the server runs as broodsilk_app, which may read and write rows only.
  pg_ensure_runtime_role "$PGDIR" "$PGPORT" broodsilk_app
  export DATABASE_OWNER_URL="postgres://app@127.0.0.1:$PGPORT/broodsilk"
  export DATABASE_URL="postgres://broodsilk_app@127.0.0.1:$PGPORT/broodsilk" BROODSILK_DEMO=1
fi

export NODE_ENV=production
export JWT_SECRET="${JWT_SECRET:-$(local_secret "$SECRETS/jwt")}"
export CSRF_SECRET="${CSRF_SECRET:-$(local_secret "$SECRETS/csrf")}"
export CALENDAR_SECRET="${CALENDAR_SECRET:-$(local_secret "$SECRETS/calendar")}"
export TOTP_ENCRYPTION_KEY="${TOTP_ENCRYPTION_KEY:-$(local_secret "$SECRETS/totp")}"
export PORT HOST=127.0.0.1 PUBLIC_URL="${PUBLIC_URL:-http://127.0.0.1:$PORT}"
service_env usual "$ROOT/.data/s3"
export STRIPE_SECRET_KEY="${STRIPE_SECRET_KEY:-sk_test_broodsilk_local}" STRIPE_WEBHOOK_SECRET="${STRIPE_WEBHOOK_SECRET:-whsec_$(local_secret "$SECRETS/payment-webhook")}"
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
if [ "${BROODSILK_DEMO:-}" = 1 ]; then
  log "Broodsilk: $PUBLIC_URL   (demo sign-in: keeper@broodsilk.test / broodsilk-demo; Ctrl-C stops)"
else
  log "Broodsilk: $PUBLIC_URL   (first administrator: npm run create-admin -w server; see docs/operations.md; Ctrl-C stops)"
fi
wait -n "${PIDS[@]}" || true
