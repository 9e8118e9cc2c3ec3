#!/usr/bin/env bash
# npm run bench: measures, on a throw-away PostgreSQL, the figures the targets in
# docs/performance.md talk about, and prints them. It asserts nothing; read the numbers.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
ensure_node_modules
ensure_postgres_installed

WORK="$(mktemp -d /tmp/broodsilk-bench.XXXXXX)"; chmod 755 "$WORK"
PIDS=()
cleanup() { trap - INT TERM EXIT; for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null; done; wait 2>/dev/null; pg_stop "$WORK/pg"; rm -rf "$WORK"; }
trap cleanup INT TERM EXIT

PGPORT="$(free_port)"
PG_FSYNC=off pg_start "$WORK/pg" "$PGPORT"
pg_ensure_db "$WORK/pg" "$PGPORT" broodsilk_bench
export DATABASE_URL="postgres://app@127.0.0.1:$PGPORT/broodsilk_bench"
export JWT_SECRET="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")" CSRF_SECRET="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")" CALENDAR_SECRET="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")"
export SMTP_PORT="$(free_port)" MAILDEV_WEB_PORT="$(free_port)" S3_PORT="$(free_port)" S3RVER_DIR="$WORK/s3" STRIPE_API_PORT="$(free_port)"
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_REGION=us-east-1 S3_BUCKET=broodsilk-photos S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER S3_FORCE_PATH_STYLE=true
export STRIPE_SECRET_KEY=sk_test_bench STRIPE_WEBHOOK_SECRET=whsec_bench STRIPE_API_HOST=127.0.0.1 STRIPE_API_PROTOCOL=http
export APP_PORT="$(free_port)" LOG_LEVEL=silent

node "$ROOT/scripts/services.mjs" >"$WORK/services.log" 2>&1 & PIDS+=($!)
(cd "$ROOT" && npm run build --silent -w shared && npm run build --silent -w server) >/dev/null
(cd "$ROOT/server" && node dist/cli/migrate.js >/dev/null)
(cd "$ROOT/server" && PORT="$APP_PORT" NODE_ENV=production exec node dist/main.js >"$WORK/app.log" 2>&1) & PIDS+=($!)
for _ in $(seq 1 150); do curl -sf "http://127.0.0.1:$APP_PORT/api/health" >/dev/null && break; sleep 0.2; done
BASE_URL="http://127.0.0.1:$APP_PORT" node "$ROOT/scripts/bench.mjs"
