#!/usr/bin/env bash
# npm run cluster — Clackwater as a host would run several instances, all on 127.0.0.1
# and all as the invoking user, data and logs under .data/cluster/:
#   a MariaDB primary (binary log on) and a replica of it (scripts/db-replica.sh),
#   Redis (Debian's redis-server, no persistence), two or more app instances
#   (scripts/server.mjs on the one build) and HAProxy in front of them.
# Usage: scripts/cluster.sh [start] | stop | status   (npm run cluster; npm run cluster -- stop)
#
# Ports (environment; defaults in brackets): CLUSTER_PORT the balancer [3700],
# CLUSTER_APP_PORTS the instances ["3701 3702"], CLUSTER_DB_PORT the primary [3703],
# CLUSTER_REPLICA_PORT the replica [3704], CLUSTER_REDIS_PORT Redis [3705].
# CLUSTER_FRESH=1 resets the database to the demo before the instances start.
# SMTP_HOST/SMTP_PORT, NEXTAUTH_SECRET and MAIL_* pass through to every instance.
set -euo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"

DIR="$ROOT/.data/cluster"
CLUSTER_PORT="${CLUSTER_PORT:-3700}"
CLUSTER_APP_PORTS="${CLUSTER_APP_PORTS:-3701 3702}"
export DB_PORT="${CLUSTER_DB_PORT:-3703}" DB_DATA_DIR="$DIR/mariadb-primary"
export REPLICA_PORT="${CLUSTER_REPLICA_PORT:-3704}" REPLICA_DATA_DIR="$DIR/mariadb-replica"
REDIS_PORT="${CLUSTER_REDIS_PORT:-3705}"
BALANCER="http://127.0.0.1:$CLUSTER_PORT"
HAPROXY=$(command -v haproxy || echo /usr/sbin/haproxy)
REDIS_SERVER=$(command -v redis-server || echo /usr/bin/redis-server)

alive() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }
healthy() { curl -fs -m 2 "$1/api/health" >/dev/null 2>&1; }
replica_script() { [ -f "$ROOT/scripts/db-replica.sh" ]; }

# Waits for a pid file's process to end after SIGTERM, then SIGKILLs it.
stop_pid() {
  local name=$1 pidf=$2
  alive "$pidf" || { rm -f "$pidf"; return 0; }
  local pid; pid=$(cat "$pidf")
  log "stopping $name (pid $pid)"
  kill -TERM "$pid" 2>/dev/null || true
  for _ in $(seq 1 40); do kill -0 "$pid" 2>/dev/null || break; sleep 0.25; done
  kill -0 "$pid" 2>/dev/null && kill -KILL "$pid" 2>/dev/null || true
  rm -f "$pidf"
}

start_redis() {
  if alive "$DIR/redis.pid"; then log "Redis already running on 127.0.0.1:$REDIS_PORT"; return 0; fi
  [ -x "$REDIS_SERVER" ] || die "redis-server not found: run scripts/ensure-system.sh (Debian package redis-server)"
  mkdir -p "$DIR/redis"
  # a helper, not a record: no snapshots, no append-only file
  "$REDIS_SERVER" --port "$REDIS_PORT" --bind 127.0.0.1 --dir "$DIR/redis" --save '' --appendonly no \
    --daemonize yes --pidfile "$DIR/redis.pid" --logfile "$DIR/redis.log"
  for _ in $(seq 1 40); do alive "$DIR/redis.pid" && break; sleep 0.25; done
  alive "$DIR/redis.pid" || die "Redis did not start (see $DIR/redis.log)"
  log "Redis is up on 127.0.0.1:$REDIS_PORT"
}

start_app() {
  local port=$1 pidf="$DIR/app-$1.pid"
  if alive "$pidf"; then log "instance :$port already running"; return 0; fi
  (
    export PORT="$port" NEXTAUTH_URL="$BALANCER" SITE_URL="$BALANCER" NEXTAUTH_SECRET="$SECRET"
    export REDIS_URL="redis://127.0.0.1:$REDIS_PORT/0" TRUST_PROXY_HOPS=1 NEXT_TELEMETRY_DISABLED=1
    [ -n "$REPLICAS" ] && export DB_REPLICAS="$REPLICAS"
    # every instance runs the outbox worker: its row claims keep each message single
    unset MAIL_WORKER
    nohup node scripts/server.mjs -p "$port" -H 127.0.0.1 >"$DIR/app-$port.log" 2>&1 &
    echo $! >"$pidf"
  )
}

write_haproxy_cfg() {
  local servers="" n=0
  for port in $CLUSTER_APP_PORTS; do
    n=$((n + 1))
    servers+="    server app$n 127.0.0.1:$port"$'\n'
  done
  sed -e "s|@PIDFILE@|$DIR/haproxy.pid|" -e "s|@BALANCER_PORT@|$CLUSTER_PORT|" \
    "$ROOT/scripts/cluster/haproxy.cfg.template" | awk -v s="$servers" '{ if ($0 == "@SERVERS@") printf "%s", s; else print }' \
    >"$DIR/haproxy.cfg"
  "$HAPROXY" -c -q -f "$DIR/haproxy.cfg" || die "HAProxy refused $DIR/haproxy.cfg"
}

start() {
  command -v curl >/dev/null || die "curl not found"
  [ -x "$HAPROXY" ] || die "haproxy not found: run scripts/ensure-system.sh (Debian package haproxy)"
  [ -f .next/BUILD_ID ] || die "no build: run npm run build first (every instance serves the one build)"
  mkdir -p "$DIR"
  # one signing secret for every instance, so a session from one is good on all
  if [ -n "${NEXTAUTH_SECRET:-}" ]; then SECRET="$NEXTAUTH_SECRET"; else
    [ -f "$DIR/auth-secret" ] || (umask 077 && head -c 32 /dev/urandom | base64 | tr -d '=\n' >"$DIR/auth-secret")
    SECRET=$(cat "$DIR/auth-secret")
  fi

  DB_BINLOG=1 bash scripts/db.sh start
  if [ -n "${CLUSTER_FRESH:-}" ]; then
    npx tsx scripts/reset-db.ts
  else
    npx tsx scripts/migrate.ts up
    npx tsx scripts/seed.ts
  fi
  REPLICAS=""
  if replica_script; then
    bash scripts/db-replica.sh start
    REPLICAS="127.0.0.1:$REPLICA_PORT"
  else
    log "scripts/db-replica.sh is missing: running without a replica (every read goes to the primary)"
  fi
  start_redis

  for port in $CLUSTER_APP_PORTS; do start_app "$port"; done
  for port in $CLUSTER_APP_PORTS; do
    for _ in $(seq 1 120); do healthy "http://127.0.0.1:$port" && break; sleep 0.5; done
    healthy "http://127.0.0.1:$port" || { tail -20 "$DIR/app-$port.log" >&2; die "instance :$port did not answer in 60 s"; }
    log "instance http://127.0.0.1:$port is up"
  done

  if ! alive "$DIR/haproxy.pid"; then
    write_haproxy_cfg
    # -D: into the background, its pid in the pid file; its log (stdout) to haproxy.log
    "$HAPROXY" -D -f "$DIR/haproxy.cfg" >>"$DIR/haproxy.log" 2>&1
  fi
  for _ in $(seq 1 40); do healthy "$BALANCER" && break; sleep 0.25; done
  healthy "$BALANCER" || die "HAProxy does not answer on $BALANCER (see $DIR/haproxy.log)"
  log "ready: $BALANCER (instances on ${CLUSTER_APP_PORTS// /, }; logs in $DIR)"
}

stop() {
  stop_pid HAProxy "$DIR/haproxy.pid"
  for f in "$DIR"/app-*.pid; do [ -e "$f" ] && stop_pid "instance $(basename "$f" .pid)" "$f"; done
  stop_pid Redis "$DIR/redis.pid"
  if replica_script; then bash scripts/db-replica.sh stop || true; fi
  bash scripts/db.sh stop
}

status() {
  local bad=0 say
  say() { printf '%-28s %s\n' "$1" "$2"; }
  if alive "$DIR/haproxy.pid" && healthy "$BALANCER"; then say "balancer $BALANCER" up; else say "balancer $BALANCER" down; bad=1; fi
  for port in $CLUSTER_APP_PORTS; do
    if healthy "http://127.0.0.1:$port"; then say "instance :$port" up; else say "instance :$port" down; bad=1; fi
  done
  if alive "$DIR/redis.pid"; then say "redis :$REDIS_PORT" up; else say "redis :$REDIS_PORT" down; bad=1; fi
  say "primary :$DB_PORT" "$(bash scripts/db.sh status 2>/dev/null || true)"
  if replica_script; then say "replica :$REPLICA_PORT" "$(bash scripts/db-replica.sh status 2>/dev/null || true)"; fi
  return $bad
}

case "${1:-start}" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  *) echo "usage: $0 start|stop|status" >&2; exit 2 ;;
esac
