#!/usr/bin/env bash
# npm run bench: seeds the benchmark dataset into a throw-away PostgreSQL, serves the production
# build, and measures the figures the targets in docs/performance.md talk about. It asserts
# nothing; read the numbers. BENCH_SCALE (default 1) shrinks the dataset for a quick look,
# BENCH_SECONDS (default 5) sets each run's length, BENCH_CONNECTIONS (default 1,10,50) the steps,
# BENCH_INSTANCES (default 1) how many API processes serve the one database (the reads are then
# also driven across all of them, to show the figures scale).
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
export TOTP_ENCRYPTION_KEY="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")"
service_env free "$WORK/s3"
export STRIPE_SECRET_KEY=sk_test_bench STRIPE_WEBHOOK_SECRET=whsec_bench
export APP_PORT="$(free_port)" LOG_LEVEL=silent AUTH_RATE_LIMIT=1000000

start_services "$WORK/services.log"; PIDS+=("$SERVICES_PID")
log "building"
(cd "$ROOT" && npm run build --silent) >/dev/null
(cd "$ROOT/server" && node dist/cli/migrate.js >/dev/null)
INSTANCES="${BENCH_INSTANCES:-1}"
BASE_URLS=""
for i in $(seq 1 "$INSTANCES"); do
  port="$APP_PORT"; [ "$i" = 1 ] || port="$(free_port)"
  (cd "$ROOT/server" && PORT="$port" CLIENT_DIST="$ROOT/client/dist" PUBLIC_URL="http://127.0.0.1:$APP_PORT" NODE_ENV=production exec node dist/main.js >"$WORK/app-$i.log" 2>&1) & PIDS+=($!)
  for _ in $(seq 1 150); do curl -sf "http://127.0.0.1:$port/api/health" >/dev/null && break; sleep 0.2; done
  BASE_URLS="${BASE_URLS:+$BASE_URLS,}http://127.0.0.1:$port"
done
BASE_URL="http://127.0.0.1:$APP_PORT" BASE_URLS="$BASE_URLS" node "$ROOT/scripts/bench.mjs"
