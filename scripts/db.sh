#!/usr/bin/env bash
# The embedded MariaDB: a private server on 127.0.0.1:$DB_PORT with its data,
# socket and pid file in $DB_DATA_DIR (inside the project, ignored by git).
# Usage: scripts/db.sh start | stop | status | kill
# With DATABASE_URL set, the embedded server is not used and this does nothing.
# With DB_BINLOG=1 the server writes a binary log and can feed replicas
# (scripts/db-replica.sh); without it nothing about the server changes.
set -euo pipefail
. "$(dirname "$0")/env.sh"

MARIADBD=$(command -v mariadbd || echo /usr/sbin/mariadbd)
SOCK="$DB_DATA_DIR/sock"
PIDF="$DB_DATA_DIR/pid"

running() { [ -f "$PIDF" ] && kill -0 "$(cat "$PIDF")" 2>/dev/null; }
answers() { mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }

start() {
  if [ -n "${DATABASE_URL:-}" ]; then log "DATABASE_URL is set: using that server"; return 0; fi
  if running && answers; then
    if [ "${DB_BINLOG:-}" = "1" ] && [ "$(mariadb --no-defaults --socket="$SOCK" -uroot -N -e 'SELECT @@GLOBAL.log_bin')" != "1" ]; then
      # a replica cannot follow a server without a binary log: restart this one with it
      log "MariaDB is running without a binary log; restarting it with one (DB_BINLOG=1)"
      stop
    else
      log "MariaDB already running on 127.0.0.1:$DB_PORT (pid $(cat "$PIDF"))"
      return 0
    fi
  fi
  [ -x "$MARIADBD" ] || die "mariadbd not found: run scripts/ensure-system.sh"
  mkdir -p "$DB_DATA_DIR"
  if [ ! -d "$DB_DATA_DIR/mysql" ]; then
    log "initialising MariaDB data directory $DB_DATA_DIR"
    mariadb-install-db --no-defaults --user=root --datadir="$DB_DATA_DIR" \
      --auth-root-authentication-method=normal --skip-test-db >"$DB_DATA_DIR/install.log" 2>&1 \
      || { cat "$DB_DATA_DIR/install.log" >&2; die "mariadb-install-db failed"; }
  fi
  local binlog=()
  if [ "${DB_BINLOG:-}" = "1" ]; then
    # ROW format replays exactly what changed (no re-running of NOW() or triggers on the
    # replica); GTIDs let a replica join at "where this dump was taken" without file and
    # offset bookkeeping. Migration 017 creates triggers, which under a binary log need
    # SUPER unless the server trusts function creators.
    binlog=(--log-bin="$DB_DATA_DIR/binlog" --server-id="${DB_SERVER_ID:-1}" --binlog-format=ROW
      --log-slave-updates=1 --gtid-strict-mode=1 --log-bin-trust-function-creators=1
      --expire-logs-days=2)
    log "starting MariaDB on 127.0.0.1:$DB_PORT with a binary log (server id ${DB_SERVER_ID:-1})"
  else
    log "starting MariaDB on 127.0.0.1:$DB_PORT"
  fi
  rm -f "$SOCK"
  nohup "$MARIADBD" --no-defaults --user=root --datadir="$DB_DATA_DIR" --socket="$SOCK" \
    --pid-file="$PIDF" --port="$DB_PORT" --bind-address=127.0.0.1 \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --innodb-buffer-pool-size="${DB_BUFFER_POOL:-256M}" --max-connections=300 \
    ${binlog[@]+"${binlog[@]}"} \
    --log-error="$DB_DATA_DIR/error.log" >/dev/null 2>&1 &
  for _ in $(seq 1 120); do
    if answers; then break; fi
    sleep 0.5
  done
  answers || { tail -20 "$DB_DATA_DIR/error.log" >&2; die "MariaDB did not answer within 60 s"; }
  # The app's own account and database (idempotent).
  mariadb --no-defaults --socket="$SOCK" -uroot <<SQL
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON *.* TO '$DB_USER'@'127.0.0.1';
GRANT ALL PRIVILEGES ON *.* TO '$DB_USER'@'localhost';
FLUSH PRIVILEGES;
SQL
  if [ "${DB_BINLOG:-}" = "1" ]; then
    # the account replicas log in with (scripts/db-replica.sh); loopback only
    mariadb --no-defaults --socket="$SOCK" -uroot <<SQL
CREATE USER IF NOT EXISTS '$DB_REPL_USER'@'127.0.0.1' IDENTIFIED BY '$DB_REPL_PASSWORD';
GRANT REPLICATION SLAVE, REPLICATION CLIENT ON *.* TO '$DB_REPL_USER'@'127.0.0.1';
FLUSH PRIVILEGES;
SQL
  fi
  log "MariaDB is up (pid $(cat "$PIDF"), database $DB_NAME)"
}

stop() {
  if [ -n "${DATABASE_URL:-}" ]; then return 0; fi
  if ! running; then log "MariaDB is not running"; return 0; fi
  local pid; pid=$(cat "$PIDF")
  log "stopping MariaDB (pid $pid)"
  kill -TERM "$pid"
  for _ in $(seq 1 120); do kill -0 "$pid" 2>/dev/null || break; sleep 0.5; done
  if kill -0 "$pid" 2>/dev/null; then log "MariaDB did not stop in 60 s; killing"; kill -KILL "$pid"; fi
  rm -f "$PIDF"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  kill) running && kill -KILL "$(cat "$PIDF")" || true ;;
  status) if running && answers; then echo "running pid $(cat "$PIDF") port $DB_PORT"; else echo "stopped"; exit 3; fi ;;
  *) echo "usage: $0 start|stop|status|kill" >&2; exit 2 ;;
esac
