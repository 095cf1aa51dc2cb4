#!/usr/bin/env bash
# A read replica of the embedded MariaDB, kept current by MariaDB's own GTID replication.
# Usage: scripts/db-replica.sh start | stop | status | kill
#   DB_PORT, DB_DATA_DIR            the primary (already running, started with DB_BINLOG=1)
#   REPLICA_PORT, REPLICA_DATA_DIR  this replica (defaults: DB_PORT+100, DB_DATA_DIR-replica)
#   REPLICA_SERVER_ID               2 unless several replicas share one primary
# The first start copies the primary's current data (a consistent dump that records its
# GTID position), then replicates from that position; later starts resume where the
# replica stopped. The replica is read_only: only the replication thread writes to it.
set -euo pipefail
. "$(dirname "$0")/env.sh"

MARIADBD=$(command -v mariadbd || echo /usr/sbin/mariadbd)
REPLICA_PORT="${REPLICA_PORT:-$((DB_PORT + 100))}"
REPLICA_DATA_DIR="${REPLICA_DATA_DIR:-${DB_DATA_DIR%/}-replica}"
REPLICA_SERVER_ID="${REPLICA_SERVER_ID:-2}"
PSOCK="$DB_DATA_DIR/sock"
SOCK="$REPLICA_DATA_DIR/sock"
PIDF="$REPLICA_DATA_DIR/pid"
# written once the copy is loaded and replication configured; without it the directory is half-made
READY="$REPLICA_DATA_DIR/replica.ready"

primary() { mariadb --no-defaults --socket="$PSOCK" -uroot "$@"; }
replica() { mariadb --no-defaults --socket="$SOCK" -uroot "$@"; }
running() { [ -f "$PIDF" ] && kill -0 "$(cat "$PIDF")" 2>/dev/null; }
answers() { mariadb-admin --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }
slave_field() { replica -e 'SHOW SLAVE STATUS\G' 2>/dev/null | awk -F': ' -v k="$1" '$1 ~ "^ *"k"$" {print $2}'; }

launch() {
  log "starting MariaDB replica on 127.0.0.1:$REPLICA_PORT (server id $REPLICA_SERVER_ID)"
  rm -f "$SOCK"
  nohup "$MARIADBD" --no-defaults --user=root --datadir="$REPLICA_DATA_DIR" --socket="$SOCK" \
    --pid-file="$PIDF" --port="$REPLICA_PORT" --bind-address=127.0.0.1 \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --innodb-buffer-pool-size="${REPLICA_BUFFER_POOL:-128M}" --max-connections=300 \
    --server-id="$REPLICA_SERVER_ID" --read-only=1 --relay-log="$REPLICA_DATA_DIR/relay" \
    --log-bin-trust-function-creators=1 --replicate-wild-ignore-table=mysql.% \
    --log-error="$REPLICA_DATA_DIR/error.log" >/dev/null 2>&1 &
  local pid=$!
  disown "$pid" 2>/dev/null || true
  for _ in $(seq 1 120); do
    if answers; then return 0; fi
    # a server that gave up (port taken, bad datadir) is reported now, not after a minute
    kill -0 "$pid" 2>/dev/null || break
    sleep 0.5
  done
  tail -20 "$REPLICA_DATA_DIR/error.log" >&2
  kill -0 "$pid" 2>/dev/null && die "MariaDB replica did not answer within 60 s"
  die "MariaDB replica exited at start (log above)"
}

# Waits until the replica has applied everything the primary had logged when asked.
catch_up() {
  local pos
  pos=$(primary -N -e 'SELECT @@GLOBAL.gtid_binlog_pos')
  [ -n "$pos" ] || { log "replica is current (the primary has logged nothing yet)"; return 0; }
  local waited
  waited=$(replica -N -e "SELECT MASTER_GTID_WAIT('$pos', ${REPLICA_CATCH_UP_S:-60})")
  [ "$waited" = "0" ] || die "replica did not reach the primary's position $pos (io $(slave_field Slave_IO_Running), sql $(slave_field Slave_SQL_Running): $(slave_field Last_Error)$(slave_field Last_IO_Error))"
  log "replica caught up with the primary at GTID $pos"
}

# The IO thread's error 1236: the primary's binary log does not hold the position asked for.
lost_position() {
  for _ in 1 2 3 4; do
    [ "$(slave_field Last_IO_Errno)" = "1236" ] && return 0
    [ "$(slave_field Slave_IO_Running)" = "Yes" ] && return 1
    sleep 0.5
  done
  return 1
}

initialise() {
  primary -e 'SELECT 1' >/dev/null 2>&1 || die "the primary on $PSOCK does not answer: start it first (DB_BINLOG=1 scripts/db.sh start)"
  [ "$(primary -N -e 'SELECT @@GLOBAL.log_bin')" = "1" ] \
    || die "the primary has no binary log: restart it with DB_BINLOG=1 scripts/db.sh start"
  log "initialising replica data directory $REPLICA_DATA_DIR"
  rm -rf "$REPLICA_DATA_DIR"
  mkdir -p "$REPLICA_DATA_DIR"
  mariadb-install-db --no-defaults --user=root --datadir="$REPLICA_DATA_DIR" \
    --auth-root-authentication-method=normal --skip-test-db >"$REPLICA_DATA_DIR/install.log" 2>&1 \
    || { cat "$REPLICA_DATA_DIR/install.log" >&2; die "mariadb-install-db failed"; }
  launch
  # The app's account with the primary's credentials but only the right to read: read_only
  # alone does not stop an account holding ALL PRIVILEGES (READ_ONLY ADMIN), and a write that
  # landed here would silently fork the copy. The primary's own account statements are kept
  # out by --replicate-wild-ignore-table=mysql.% so its GRANT ALL never arrives here.
  replica <<SQL
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
GRANT SELECT, SHOW VIEW, EXECUTE ON *.* TO '$DB_USER'@'127.0.0.1';
GRANT SELECT, SHOW VIEW, EXECUTE ON *.* TO '$DB_USER'@'localhost';
FLUSH PRIVILEGES;
SQL
  # One consistent snapshot (InnoDB, --single-transaction) that records the GTID position it
  # was taken at (--master-data --gtid writes SET GLOBAL gtid_slave_pos=...). At this
  # project's sizes a dump takes seconds; mariadb-backup is not installed on Debian by default.
  log "copying database $DB_NAME from the primary"
  mariadb-dump --no-defaults --socket="$PSOCK" -uroot --single-transaction --master-data=1 --gtid \
    --routines --triggers --events --databases "$DB_NAME" >"$REPLICA_DATA_DIR/seed.sql" \
    || die "mariadb-dump of the primary failed"
  grep -q "gtid_slave_pos" "$REPLICA_DATA_DIR/seed.sql" || die "the dump carries no GTID position"
  replica <"$REPLICA_DATA_DIR/seed.sql" || die "loading the copy into the replica failed"
  rm -f "$REPLICA_DATA_DIR/seed.sql"
  replica <<SQL
CHANGE MASTER TO MASTER_HOST='127.0.0.1', MASTER_PORT=$DB_PORT,
  MASTER_USER='$DB_REPL_USER', MASTER_PASSWORD='$DB_REPL_PASSWORD',
  MASTER_CONNECT_RETRY=1, MASTER_USE_GTID=slave_pos;
START SLAVE;
SQL
  touch "$READY"
}

start() {
  [ -n "${DATABASE_URL:-}" ] && die "DATABASE_URL is set: replicas are only made for the embedded server"
  [ -x "$MARIADBD" ] || die "mariadbd not found: run scripts/ensure-system.sh"
  case "$REPLICA_DATA_DIR" in
    "" | / | "$DB_DATA_DIR" | "${DB_DATA_DIR%/}") die "REPLICA_DATA_DIR must be its own directory" ;;
  esac
  [ "$REPLICA_PORT" != "$DB_PORT" ] || die "REPLICA_PORT must differ from DB_PORT"
  if running && answers; then
    log "MariaDB replica already running on 127.0.0.1:$REPLICA_PORT (pid $(cat "$PIDF"))"
    [ "$(slave_field Slave_SQL_Running)" = "Yes" ] || replica -e 'START SLAVE' || true
  elif [ -f "$READY" ]; then
    # restarted after a stop or a crash: the replica resumes from its own gtid_slave_pos
    launch
    [ "$(slave_field Slave_SQL_Running)" = "Yes" ] || replica -e 'START SLAVE'
    if lost_position; then
      log "the primary no longer holds this replica's position (made again since?); copying it afresh"
      kill -KILL "$(cat "$PIDF")" || true
      sleep 0.5
      initialise
    fi
  else
    if running; then kill -KILL "$(cat "$PIDF")" || true; sleep 0.5; fi
    initialise
  fi
  catch_up
  log "MariaDB replica is up (pid $(cat "$PIDF"), replicating $DB_NAME from 127.0.0.1:$DB_PORT)"
}

stop() {
  if ! running; then log "MariaDB replica is not running"; return 0; fi
  local pid; pid=$(cat "$PIDF")
  log "stopping MariaDB replica (pid $pid)"
  kill -TERM "$pid"
  for _ in $(seq 1 120); do kill -0 "$pid" 2>/dev/null || break; sleep 0.5; done
  if kill -0 "$pid" 2>/dev/null; then log "MariaDB replica did not stop in 60 s; killing"; kill -KILL "$pid"; fi
  rm -f "$PIDF"
}

status() {
  if running && answers; then
    echo "running pid $(cat "$PIDF") port $REPLICA_PORT io $(slave_field Slave_IO_Running) sql $(slave_field Slave_SQL_Running) behind $(slave_field Seconds_Behind_Master)"
  else
    echo "stopped"
    exit 3
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  kill) if running; then log "killing MariaDB replica (pid $(cat "$PIDF"))"; kill -KILL "$(cat "$PIDF")"; fi ;;
  status) status ;;
  *) echo "usage: $0 start|stop|status|kill" >&2; exit 2 ;;
esac
