#!/usr/bin/env bash
# Shared shell helpers for start, stop and test: dependencies, the private MariaDB instance, pid files.
# Every MariaDB call carries --no-defaults so /etc/mysql never leaks in, and names its own socket.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export NEXT_TELEMETRY_DISABLED=1

log() { printf '\033[1;33m[tallyforge]\033[0m %s\n' "$*"; }

apt_install() {
  # Installs Debian packages once; apt lists are refreshed only when a package is missing.
  if [ "$(id -u)" -ne 0 ]; then log "need root to apt-get install $*; install them and run again"; exit 1; fi
  if [ -z "${TF_APT_UPDATED:-}" ]; then apt-get update -qq >/dev/null; TF_APT_UPDATED=1; fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  local stamp="$ROOT/node_modules/.package-lock.json"
  if [ ! -f "$stamp" ] || [ "$ROOT/package-lock.json" -nt "$stamp" ]; then
    log "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
  fi
}

ensure_mariadb() {
  if ! command -v mariadbd >/dev/null 2>&1 && [ ! -x /usr/sbin/mariadbd ]; then
    log "installing MariaDB from Debian's packages"
    apt_install mariadb-server mariadb-client
  fi
  export PATH="$PATH:/usr/sbin"
}

# db_start PROFILE PORT: a private instance under .data/PROFILE, on 127.0.0.1:PORT.
# Creates the data dir, the database and the application user on first use; reuses them after.
db_start() {
  local profile="$1" port="$2"
  local dir="$ROOT/.data/$profile" ; local data="$dir/mariadb" run="$dir/run"
  mkdir -p "$run"
  DB_SOCKET="$run/mariadb.sock"
  if [ ! -d "$data/mysql" ]; then
    log "initialising a private MariaDB data dir in .data/$profile"
    mkdir -p "$data"
    mariadb-install-db --no-defaults --user=root --datadir="$data" \
      --auth-root-authentication-method=socket --skip-test-db >"$dir/install-db.log" 2>&1
  fi
  if ! mariadb-admin --no-defaults -S "$DB_SOCKET" -u root ping >/dev/null 2>&1; then
    log "starting MariaDB on 127.0.0.1:$port"
    nohup mariadbd --no-defaults --datadir="$data" --socket="$DB_SOCKET" --port="$port" \
      --bind-address=127.0.0.1 --user=root --pid-file="$run/mariadb.pid" \
      --log-error="$dir/mariadb.err" --character-set-server=utf8mb4 \
      --collation-server=utf8mb4_unicode_ci --max-connections=300 >/dev/null 2>&1 &
    # Not a job of this shell: a fault test may kill it, and the shell need not report that.
    disown
    for _ in $(seq 1 150); do
      mariadb-admin --no-defaults -S "$DB_SOCKET" -u root ping >/dev/null 2>&1 && break
      sleep 0.2
    done
    mariadb-admin --no-defaults -S "$DB_SOCKET" -u root ping >/dev/null 2>&1 \
      || { log "MariaDB did not start; see .data/$profile/mariadb.err"; exit 1; }
  fi
  [ -f "$dir/db-password" ] || { head -c 24 /dev/urandom | base64 | tr -d '/+=' > "$dir/db-password"; chmod 600 "$dir/db-password"; }
  export DB_HOST=127.0.0.1 DB_PORT="$port" DB_USER="${DB_USER:-tallyforge}"
  export DB_NAME="${DB_NAME:-tallyforge}" DB_PASSWORD="$(cat "$dir/db-password")"
  mariadb --no-defaults -S "$DB_SOCKET" -u root <<SQL
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'localhost';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
SQL
}

# db_reset_database PROFILE: drops and recreates the database (tests only).
db_reset_database() {
  local sock="$ROOT/.data/$1/run/mariadb.sock"
  mariadb --no-defaults -S "$sock" -u root -e "DROP DATABASE IF EXISTS \`$DB_NAME\`; CREATE DATABASE \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
}

db_stop() {
  local sock="$ROOT/.data/$1/run/mariadb.sock"
  if mariadb-admin --no-defaults -S "$sock" -u root ping >/dev/null 2>&1; then
    log "stopping MariaDB (.data/$1)"
    mariadb-admin --no-defaults -S "$sock" -u root shutdown
  fi
}

# secret_file PROFILE NAME: a random secret kept in .data/PROFILE/NAME, made once.
secret_file() {
  local f="$ROOT/.data/$1/$2"
  mkdir -p "$(dirname "$f")"
  [ -f "$f" ] || { head -c 48 /dev/urandom | base64 | tr -d '/+=\n' > "$f"; chmod 600 "$f"; }
  cat "$f"
}

kill_pidfile() {
  local f="$1"
  if [ -f "$f" ]; then
    local pid; pid="$(cat "$f")"
    if kill -0 "$pid" 2>/dev/null; then kill "$pid" 2>/dev/null || true; for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done; fi
    rm -f "$f"
  fi
}
