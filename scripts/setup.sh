#!/usr/bin/env bash
# Shared setup for start.sh, test.sh and dev.sh: source it, then call the functions you need.
# Everything here is idempotent: a second run reuses what the first one installed or started.
set -euo pipefail

TP_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
TP_DATA="$TP_ROOT/.data"
TP_DB_PORT="${TP_DB_PORT:-3307}"
TP_DB_USER="${TP_DB_USER:-touchproof}"
# Local loopback-only database; the password only keeps other local users' tools out by accident.
TP_DB_PASSWORD="${TP_DB_PASSWORD:-touchproof-local}"
TP_CNF="$TP_DATA/mariadb.cnf"
mkdir -p "$TP_DATA"

tp_log() { printf '\033[1m[touchproof]\033[0m %s\n' "$*" >&2; }

# Run a command as root (directly, or through sudo when available).
tp_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; elif command -v sudo >/dev/null 2>&1; then sudo "$@"; else
    tp_log "need root to run: $*"; return 1; fi
}

tp_deb_installed() { dpkg-query -W -f='${Status}' "$1" 2>/dev/null | grep -q 'install ok installed'; }

# Install the Debian packages given as arguments when any of them is missing.
tp_ensure_debs() {
  local missing=() p
  for p in "$@"; do tp_deb_installed "$p" || missing+=("$p"); done
  [ ${#missing[@]} -eq 0 ] && return 0
  tp_log "installing Debian packages: ${missing[*]}"
  export DEBIAN_FRONTEND=noninteractive
  tp_root apt-get update -q </dev/null
  tp_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -q --no-install-recommends "${missing[@]}" </dev/null
}

# npm packages: `npm ci` when node_modules is absent; `npm install` when package-lock.json changed
# since the last install (recorded as a hash stamp inside node_modules).
tp_ensure_node_modules() {
  local lock="$TP_ROOT/package-lock.json" stamp="$TP_ROOT/node_modules/.touchproof-lock-hash" want
  want="$(sha256sum "$lock" | cut -d' ' -f1)"
  if [ ! -d "$TP_ROOT/node_modules" ]; then
    tp_log "installing npm packages (npm ci)"
    (cd "$TP_ROOT" && npm ci --no-audit --no-fund </dev/null)
  elif [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then
    return 0
  elif [ -f "$TP_ROOT/node_modules/.package-lock.json" ] && [ "$TP_ROOT/node_modules/.package-lock.json" -nt "$lock" ]; then
    : # installed after the lock file was last written: up to date, just record the stamp
  else
    tp_log "package-lock.json changed: npm install"
    (cd "$TP_ROOT" && npm install --no-audit --no-fund </dev/null)
  fi
  echo "$want" > "$stamp"
}

# Socket paths must stay under ~100 bytes; fall back to /tmp for deep checkouts.
tp_socket_path() {
  local s="$TP_DATA/mysqld.sock"
  if [ ${#s} -gt 90 ]; then s="/tmp/touchproof-$(printf '%s' "$TP_ROOT" | sha256sum | cut -c1-12).sock"; fi
  printf '%s' "$s"
}

# Write the private MariaDB defaults file. Always pass it FIRST (--defaults-file=...) so Debian's
# /etc/mysql/my.cnf and its socket are never read.
tp_write_cnf() {
  local sock; sock="$(tp_socket_path)"
  {
    echo "[client]"
    echo "port=$TP_DB_PORT"
    echo "socket=$sock"
    echo "user=$(id -un)"
    echo "default-character-set=utf8mb4"
    echo "[mysqld]"
    [ "$(id -u)" -eq 0 ] && echo "user=root"
    echo "bind-address=127.0.0.1"
    echo "port=$TP_DB_PORT"
    echo "datadir=$TP_DATA/mysql"
    echo "socket=$sock"
    echo "pid-file=$TP_DATA/mariadb.pid"
    echo "log-error=$TP_DATA/mariadb.err"
    echo "character-set-server=utf8mb4"
    echo "collation-server=utf8mb4_unicode_ci"
    echo "default-time-zone=+00:00"
    echo "max-allowed-packet=64M"
    echo "skip-name-resolve"
    echo "innodb-buffer-pool-size=128M"
  } > "$TP_CNF"
}

tp_db_ping() { mariadb-admin --defaults-file="$TP_CNF" --connect-timeout=2 ping >/dev/null 2>&1; }

# Start the private MariaDB (or reuse the running one) and create databases + the app user.
tp_db_start() {
  tp_ensure_debs mariadb-server
  tp_write_cnf
  if tp_db_ping; then tp_log "MariaDB already running on 127.0.0.1:$TP_DB_PORT"; else
    if [ ! -d "$TP_DATA/mysql/mysql" ]; then
      tp_log "initialising MariaDB data in .data/mysql"
      rm -rf "$TP_DATA/mysql"
      mariadb-install-db --defaults-file="$TP_CNF" --auth-root-authentication-method=socket \
        --auth-root-socket-user="$(id -un)" --skip-test-db >"$TP_DATA/mariadb-install.log" 2>&1 \
        || { cat "$TP_DATA/mariadb-install.log" >&2; return 1; }
    fi
    # A killed server leaves a stale pid file and socket behind.
    rm -f "$TP_DATA/mariadb.pid" "$(tp_socket_path)"
    tp_log "starting MariaDB on 127.0.0.1:$TP_DB_PORT"
    setsid nohup mariadbd --defaults-file="$TP_CNF" >>"$TP_DATA/mariadb.out" 2>&1 < /dev/null &
    local i
    for i in $(seq 1 150); do tp_db_ping && break; sleep 0.2; done
    tp_db_ping || { tp_log "MariaDB did not start; see .data/mariadb.err"; tail -n 30 "$TP_DATA/mariadb.err" >&2; return 1; }
  fi
  tp_db_bootstrap
}

tp_sql() { mariadb --defaults-file="$TP_CNF" -N -B -e "$1"; }

tp_db_bootstrap() {
  local db sql=""
  for db in touchproof touchproof_test touchproof_e2e; do
    sql+="CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
  done
  for host in 127.0.0.1 localhost; do
    sql+="CREATE USER IF NOT EXISTS '$TP_DB_USER'@'$host' IDENTIFIED BY '$TP_DB_PASSWORD';"
    for db in touchproof touchproof_test touchproof_e2e; do
      sql+="GRANT ALL PRIVILEGES ON \`$db\`.* TO '$TP_DB_USER'@'$host';"
    done
  done
  tp_sql "$sql"
}

tp_db_url() { printf 'mysql://%s:%s@127.0.0.1:%s/%s' "$TP_DB_USER" "$TP_DB_PASSWORD" "$TP_DB_PORT" "${1:-touchproof}"; }

# Stop a process recorded in a pid file (only if it is still the process we started).
tp_stop_pidfile() {
  local f="$1" name="$2" pid
  [ -f "$f" ] || return 0
  pid="$(cat "$f")"
  if [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null; then
    tp_log "stopping $name (pid $pid)"
    kill "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    # Zombies answer kill -0; look at the process state before escalating.
    if kill -0 "$pid" 2>/dev/null && [ "$(ps -o stat= -p "$pid" 2>/dev/null | cut -c1)" != "Z" ]; then
      kill -9 "$pid" 2>/dev/null || true
    fi
  fi
  rm -f "$f"
}

tp_port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

tp_wait_http() {
  local url="$1" tries="${2:-100}" i
  for i in $(seq 1 "$tries"); do
    if node -e "fetch(process.argv[1]).then(r=>process.exit(r.status<500?0:1),()=>process.exit(1))" "$url"; then return 0; fi
    sleep 0.2
  done
  return 1
}
