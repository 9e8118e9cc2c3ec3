#!/usr/bin/env bash
# Shared helpers for start.sh and test.sh: dependencies, PostgreSQL, free ports.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
IS_ROOT=0; [ "$(id -u)" = 0 ] && IS_ROOT=1

log() { printf '\033[1;32m[broodsilk]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[broodsilk]\033[0m %s\n' "$*" >&2; exit 1; }

# npm ci when node_modules is missing or older than the lock file.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.package-lock.json"
  if [ ! -f "$stamp" ] || [ "$ROOT/package-lock.json" -nt "$stamp" ]; then
    log "installing dependencies (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund)
  fi
}

pg_bindir() {
  local d
  for d in $(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V -r); do
    [ -x "$d/postgres" ] && { echo "$d"; return 0; }
  done
  return 1
}

ensure_postgres_installed() {
  pg_bindir >/dev/null && return 0
  if [ "$IS_ROOT" = 1 ]; then
    log "installing PostgreSQL from Debian's packages"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  else
    die "PostgreSQL server binaries are missing. Install them with: sudo apt-get install -y postgresql"
  fi
  pg_bindir >/dev/null || die "PostgreSQL was installed but no server binary was found under /usr/lib/postgresql"
}

ensure_chromium_installed() {
  command -v chromium >/dev/null && return 0
  if [ "$IS_ROOT" = 1 ]; then
    log "installing Chromium from Debian's packages (browser tests)"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
  else
    die "Chromium is missing. Install it with: sudo apt-get install -y chromium"
  fi
}

# Runs a PostgreSQL binary as the right user (postgres refuses to run as root).
as_pg() { if [ "$IS_ROOT" = 1 ]; then runuser -u postgres -- "$@"; else "$@"; fi; }

# True when the postgres user can reach (traverse) the given folder.
pg_can_reach() { [ "$IS_ROOT" = 0 ] || runuser -u postgres -- test -x "$1" 2>/dev/null; }

# A folder PostgreSQL may own: under the checkout when reachable, else keyed by the checkout's path.
pg_home_for() {
  local wanted="$1" key
  mkdir -p "$(dirname "$wanted")"
  if pg_can_reach "$(dirname "$wanted")"; then echo "$wanted"; return; fi
  key="$(printf '%s' "$ROOT" | sha1sum | cut -c1-12)"
  echo "/var/lib/broodsilk/$key/$(basename "$wanted")"
}

# pg_start DIR PORT — creates the cluster if needed and starts it on 127.0.0.1:PORT.
pg_start() {
  local dir="$1" port="$2" bin; bin="$(pg_bindir)"
  mkdir -p "$dir/data" "$dir/sock" "$dir/log"
  if [ "$IS_ROOT" = 1 ]; then
    chown postgres:postgres "$dir" "$dir/data" "$dir/sock" "$dir/log"
  fi
  chmod 700 "$dir/data"
  if [ ! -f "$dir/data/PG_VERSION" ]; then
    as_pg "$bin/initdb" -D "$dir/data" -U postgres -A trust -E UTF8 --locale=C.UTF-8 >"$dir/log/initdb.log" 2>&1 || { cat "$dir/log/initdb.log"; die "initdb failed"; }
  fi
  if as_pg "$bin/pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then return 0; fi
  as_pg "$bin/pg_ctl" -D "$dir/data" -l "$dir/log/pg.log" -w -t 60 \
    -o "-c listen_addresses=127.0.0.1 -p $port -k $dir/sock -c fsync=${PG_FSYNC:-on}" start >/dev/null \
    || { tail -20 "$dir/log/pg.log"; die "PostgreSQL did not start (port $port)"; }
}

pg_stop() {
  local dir="$1" bin; bin="$(pg_bindir)" || return 0
  [ -f "$dir/data/PG_VERSION" ] || return 0
  as_pg "$bin/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
}

# pg_ensure_db DIR PORT DBNAME — role app (no password on loopback trust) owning DBNAME.
pg_ensure_db() {
  local dir="$1" port="$2" db="$3" bin; bin="$(pg_bindir)"
  local psql=(as_pg "$bin/psql" -h "$dir/sock" -p "$port" -U postgres -v ON_ERROR_STOP=1 -qtA)
  "${psql[@]}" -c "DO \$\$BEGIN IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname='app') THEN CREATE ROLE app LOGIN CREATEDB; END IF; END\$\$;" >/dev/null
  if [ -z "$("${psql[@]}" -c "SELECT 1 FROM pg_database WHERE datname='$db'")" ]; then
    "${psql[@]}" -c "CREATE DATABASE \"$db\" OWNER app" >/dev/null
  fi
}

# pg_ensure_runtime_role DIR PORT ROLE — a login role that owns nothing; `npm run migrate` (run as
# the owner app) grants it the right to read and write rows (docs/operations.md, "Database roles").
pg_ensure_runtime_role() {
  local dir="$1" port="$2" role="$3" bin; bin="$(pg_bindir)"
  as_pg "$bin/psql" -h "$dir/sock" -p "$port" -U postgres -v ON_ERROR_STOP=1 -qtA \
    -c "DO \$\$BEGIN IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname='$role') THEN CREATE ROLE $role LOGIN; END IF; END\$\$;" >/dev/null
}

# A free TCP port on 127.0.0.1, chosen by the kernel.
free_port() { node -e "const s=require('net').createServer();s.listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})"; }

# A stable random secret kept in a git-ignored file.
local_secret() {
  local file="$1"
  [ -s "$file" ] || { mkdir -p "$(dirname "$file")"; node -e "console.log(require('crypto').randomBytes(32).toString('base64url'))" >"$file"; chmod 600 "$file"; }
  cat "$file"
}

# service_env PORTS S3DIR — exports the environment of the local stand-ins (mail sink, S3 fake,
# payment fake) that scripts/services.mjs and the server both read. PORTS "usual": the fixed local
# ports the README names (each overridable); "free": ports chosen by the kernel, so parallel runs
# do not collide. Secrets stay with the caller.
service_env() {
  if [ "$1" = usual ]; then
    SMTP_PORT="${SMTP_PORT:-1025}" MAILDEV_WEB_PORT="${MAILDEV_WEB_PORT:-1080}" S3_PORT="${S3_PORT:-4569}" STRIPE_API_PORT="${STRIPE_API_PORT:-12111}"
  else
    SMTP_PORT="$(free_port)" MAILDEV_WEB_PORT="$(free_port)" S3_PORT="$(free_port)" STRIPE_API_PORT="$(free_port)"
  fi
  export SMTP_HOST=127.0.0.1 SMTP_PORT MAILDEV_WEB_PORT MAILDEV_API="http://127.0.0.1:$MAILDEV_WEB_PORT"
  export S3_PORT S3RVER_DIR="$2" S3_ENDPOINT="http://127.0.0.1:$S3_PORT" S3_REGION=us-east-1 S3_BUCKET=broodsilk-photos
  export S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER S3_FORCE_PATH_STYLE=true
  export STRIPE_API_PORT STRIPE_API_HOST=127.0.0.1 STRIPE_API_PROTOCOL=http
}

# start_services LOG — runs the stand-ins in the background (pid in SERVICES_PID) and waits until they are ready.
start_services() {
  node "$ROOT/scripts/services.mjs" >"$1" 2>&1 &
  SERVICES_PID=$!
  for _ in $(seq 1 100); do
    grep -q 'services ready' "$1" 2>/dev/null && return 0
    kill -0 "$SERVICES_PID" 2>/dev/null || break
    sleep 0.2
  done
  cat "$1"
  die "the service stand-ins did not start"
}
