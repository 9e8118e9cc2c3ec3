#!/usr/bin/env bash
# npm test: type-check, lint, then every suite against its own throw-away PostgreSQL cluster
# and service stand-ins on free ports (never the demo database; parallel runs do not collide).
# Ends with one line "N passed, N failed" added up from the runners' own JSON reports.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
set +e

ensure_node_modules || exit 1
ensure_postgres_installed || exit 1
ensure_chromium_installed || exit 1

WORK="$(mktemp -d /tmp/broodsilk-test.XXXXXX)"; chmod 755 "$WORK"
REPORTS="$WORK/reports"; mkdir -p "$REPORTS"
PIDS=()
FAILED_STEPS=()
cleanup() {
  trap - INT TERM EXIT
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null; done
  wait 2>/dev/null
  pg_stop "$WORK/pg"
  rm -rf "$WORK"
}
trap cleanup INT TERM EXIT

step() { local name="$1"; shift; log "$name"; "$@" || { FAILED_STEPS+=("$name"); printf '\033[1;31m[broodsilk] step failed: %s\033[0m\n' "$name"; }; }

PGPORT="$(free_port)"
PG_FSYNC=off pg_start "$WORK/pg" "$PGPORT" || exit 1
pg_ensure_db "$WORK/pg" "$PGPORT" broodsilk_test
pg_ensure_db "$WORK/pg" "$PGPORT" broodsilk_e2e_test

export TEST_DATABASE_URL="postgres://app@127.0.0.1:$PGPORT/broodsilk_test"
export JWT_SECRET="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")"
export CSRF_SECRET="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")"
export CALENDAR_SECRET="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")"
export TOTP_ENCRYPTION_KEY="$(node -e "console.log(require('crypto').randomBytes(32).toString('hex'))")"
service_env free "$WORK/s3"
export APP_PORT="$(free_port)"
export STRIPE_SECRET_KEY="sk_test_$(node -e "console.log(require('crypto').randomBytes(12).toString('hex'))")" STRIPE_WEBHOOK_SECRET="whsec_test_$(node -e "console.log(require('crypto').randomBytes(12).toString('hex'))")"
export PAYMENT_WEBHOOK_URL="http://127.0.0.1:$APP_PORT/api/webhooks/payments"
export LOG_LEVEL=silent

start_services "$WORK/services.log"
PIDS+=("$SERVICES_PID")

cd "$ROOT"
step "build shared" npm run build --silent -w shared
step "type-check" npm run typecheck --silent
step "lint" npx eslint . --max-warnings 0
step "format" npx prettier --check . --log-level warn
step "shared unit tests" npx vitest run --root shared --reporter=default --reporter=json --outputFile="$REPORTS/shared.json"
# Built before the server suites: the delivery spec reads client/dist, the crash spec runs server/dist.
step "build server and client" bash -c "npm run build --silent -w server && npm run build --silent -w client >/dev/null"
step "server unit and integration tests" bash -c "cd server && npx vitest run --reporter=default --reporter=json --outputFile='$REPORTS/server.json'"
step "client tests" bash -c "cd client && npx vitest run --reporter=default --reporter=json --outputFile='$REPORTS/client.json'"

# Browser tests: the built app, served as in production (as the runtime role broodsilk_app; the
# owner app migrates and seeds), against its own seeded database.
pg_ensure_runtime_role "$WORK/pg" "$PGPORT" broodsilk_app
export DATABASE_OWNER_URL="postgres://app@127.0.0.1:$PGPORT/broodsilk_e2e_test"
export DATABASE_URL="postgres://broodsilk_app@127.0.0.1:$PGPORT/broodsilk_e2e_test"
if (cd server && node dist/cli/migrate.js >/dev/null && BROODSILK_DEMO=1 node dist/cli/seed.js >/dev/null); then
  # The browser suite signs in some 30 times a minute from one address; the per-address limit
  # would refuse it. The limits themselves are proven by the server's sign-in-limits specs.
  (cd server && AUTH_RATE_LIMIT=1000 PORT="$APP_PORT" CLIENT_DIST="$ROOT/client/dist" PUBLIC_URL="http://127.0.0.1:$APP_PORT" NODE_ENV=production exec node dist/main.js >"$WORK/app.log" 2>&1) &
  PIDS+=($!)
  for _ in $(seq 1 150); do curl -sf "http://127.0.0.1:$APP_PORT/api/health" >/dev/null && break; sleep 0.2; done
  export E2E_BASE_URL="http://127.0.0.1:$APP_PORT"
  step "browser tests (Chromium)" bash -c "cd client && npx vitest run -c e2e/vitest.config.ts --reporter=default --reporter=json --outputFile='$REPORTS/e2e.json'"
  [ -n "${CI:-}" ] && [ ${#FAILED_STEPS[@]} -gt 0 ] && tail -40 "$WORK/app.log"
else
  FAILED_STEPS+=("migrate and seed the browser-test database")
fi

echo
[ ${#FAILED_STEPS[@]} -gt 0 ] && printf '\033[1;31m[broodsilk] failed steps: %s\033[0m\n' "${FAILED_STEPS[*]}"
node "$ROOT/scripts/test-summary.mjs" "$REPORTS/shared.json" "$REPORTS/server.json" "$REPORTS/client.json" "$REPORTS/e2e.json"
SUMMARY_RC=$?
[ ${#FAILED_STEPS[@]} -eq 0 ] && [ $SUMMARY_RC -eq 0 ]
