#!/usr/bin/env bash
# Shared bootstrap for `npm start` and `npm test`: plain shell, so it runs before `npm ci`.
# Installs what is missing, then runs a private MariaDB on loopback with its data in .data/.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
cd "$ROOT"
DATA="$ROOT/.data"
DB_PORT="${RUNGBOOK_DB_PORT:-3407}"
DB_SOCKET="$DATA/mariadb.sock"
DB_DIR="$DATA/mariadb"
mkdir -p "$DATA"

log() { printf '\033[1;36m[rungbook]\033[0m %s\n' "$*"; }
as_root() { if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else "$@"; fi; }

apt_ready=0
apt_install() {
  if [ $apt_ready = 0 ]; then as_root apt-get update -qq; apt_ready=1; fi
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  # npm ci when nothing is installed or the installed tree no longer matches the lock file.
  local stamp="node_modules/.rungbook-lock"
  if [ -d node_modules ] && cmp -s package-lock.json "$stamp" 2>/dev/null; then return; fi
  if [ -d node_modules ] && npm ls --depth=0 >/dev/null 2>&1; then cp package-lock.json "$stamp"; return; fi
  log "installing npm packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
  cp package-lock.json "$stamp"
}

ensure_mariadb_installed() {
  if ! command -v mariadbd >/dev/null 2>&1 && [ ! -x /usr/sbin/mariadbd ]; then
    log "installing mariadb-server from Debian's packages"
    apt_install mariadb-server
  fi
  export PATH="$PATH:/usr/sbin"
}

ensure_chromium_installed() {
  if [ ! -x /usr/bin/chromium ]; then
    log "installing chromium from Debian's packages"
    apt_install chromium
  fi
}

db_ping() { mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot ping >/dev/null 2>&1; }

start_mariadb() {
  ensure_mariadb_installed
  if db_ping; then log "MariaDB already running on 127.0.0.1:$DB_PORT"; return; fi
  if [ ! -d "$DB_DIR/mysql" ]; then
    log "initialising a private MariaDB data directory in .data/mariadb"
    rm -rf "$DB_DIR"; mkdir -p "$DB_DIR"
    mariadb-install-db --no-defaults --user="$(id -un)" --datadir="$DB_DIR" \
      --auth-root-authentication-method=socket --skip-test-db --skip-name-resolve >"$DATA/mariadb-install.log" 2>&1 \
      || { cat "$DATA/mariadb-install.log"; exit 1; }
  fi
  log "starting MariaDB on 127.0.0.1:$DB_PORT"
  setsid mariadbd --no-defaults --user="$(id -un)" --datadir="$DB_DIR" --socket="$DB_SOCKET" \
    --pid-file="$DATA/mariadb.pid" --port="$DB_PORT" --bind-address=127.0.0.1 --skip-name-resolve \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --max-connections=300 --innodb-buffer-pool-size=256M \
    --log-error="$DATA/mariadb.err" </dev/null >/dev/null 2>&1 &
  for _ in $(seq 1 150); do db_ping && return; sleep 0.2; done
  echo "MariaDB did not start; see .data/mariadb.err:"; tail -20 "$DATA/mariadb.err"; exit 1
}

stop_mariadb() { db_ping && mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot shutdown >/dev/null 2>&1 || true; }

# ensure_database NAME USER PASSWORD — idempotent.
ensure_database() {
  mariadb --no-defaults --socket="$DB_SOCKET" -uroot <<SQL
CREATE DATABASE IF NOT EXISTS \`$1\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$2'@'127.0.0.1' IDENTIFIED BY '$3';
CREATE USER IF NOT EXISTS '$2'@'localhost' IDENTIFIED BY '$3';
GRANT ALL PRIVILEGES ON \`$1\`.* TO '$2'@'127.0.0.1';
GRANT ALL PRIVILEGES ON \`$1\`.* TO '$2'@'localhost';
SQL
}

drop_database() { mariadb --no-defaults --socket="$DB_SOCKET" -uroot -e "DROP DATABASE IF EXISTS \`$1\`"; }

# A random secret kept in .data so sessions survive restarts; never committed.
ensure_secret() {
  local f="$DATA/$1"
  [ -s "$f" ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))" >"$f"
  cat "$f"
}

# Wait for an HTTP URL to answer (any status).
wait_http() {
  for _ in $(seq 1 300); do
    node -e "fetch(process.argv[1]).then(()=>process.exit(0),()=>process.exit(1))" "$1" 2>/dev/null && return 0
    sleep 0.2
  done
  echo "nothing answered at $1"; return 1
}

# Start the local SMTP capture and S3-compatible store on loopback, unless already up.
start_fakes() {
  local state="$1" smtp="$2" mailweb="$3" s3="$4"
  if node -e "fetch('http://127.0.0.1:$mailweb/health').then(r=>process.exit(r.ok?0:1),()=>process.exit(1))" 2>/dev/null; then
    log "local mail capture and object store already running"; return
  fi
  log "starting local mail capture (SMTP :$smtp, inbox http://127.0.0.1:$mailweb) and object store (:$s3)"
  FAKES_STATE="$state" FAKES_SMTP_PORT="$smtp" FAKES_MAIL_WEB_PORT="$mailweb" FAKES_S3_PORT="$s3" \
    setsid node_modules/.bin/tsx lib/ops/fakes.ts >"$state.log" 2>&1 </dev/null &
  echo $! >"$state.pid"
  wait_http "http://127.0.0.1:$mailweb/health"
}

# Node options for the served app (start and test commands alike). A 32 MB young-generation
# semi-space (V8's default tops out at 16 MB) makes the scavenges that stall a request rarer:
# `npm run perf` measured the 304 path of the edition feed at p95 ≈ 4.8 ms server time with it
# against ≈ 6–7 ms without. SERVER_NODE_OPTIONS adds more (npm run perf preloads its clock).
server_node_options() { echo "${NODE_OPTIONS:-} --max-semi-space-size=32${SERVER_NODE_OPTIONS:+ $SERVER_NODE_OPTIONS}"; }
