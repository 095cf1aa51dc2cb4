#!/usr/bin/env bash
# npm start — sets up whatever is missing, then serves Clackwater with demo data on
# http://localhost:$PORT (3000). Ctrl-C stops the app and the database.
set -euo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1

LOCK="$ROOT/.data/start-$PORT.pid"
mkdir -p "$ROOT/.data"
if [ -f "$LOCK" ] && kill -0 "$(cat "$LOCK")" 2>/dev/null; then
  die "Clackwater is already running (pid $(cat "$LOCK")) on http://localhost:$PORT — stop that one with Ctrl-C first."
fi
echo $$ >"$LOCK"

APP_PID=""
MAIL_PID=""
cleanup() {
  trap - INT TERM EXIT
  [ -n "$APP_PID" ] && kill -TERM "$APP_PID" 2>/dev/null && wait "$APP_PID" 2>/dev/null || true
  [ -n "$MAIL_PID" ] && kill -TERM "$MAIL_PID" 2>/dev/null || true
  bash "$ROOT/scripts/db.sh" stop || true
  rm -f "$LOCK"
}
trap cleanup INT TERM EXIT

bash scripts/ensure-system.sh
bash scripts/db.sh start
npx tsx scripts/migrate.ts up
npx tsx scripts/seed.ts
bash scripts/build-if-needed.sh

# The local mail catcher: everything the app sends lands here, nothing leaves the machine.
if [ "$SMTP_HOST" = "127.0.0.1" ] && ! (exec 3<>"/dev/tcp/127.0.0.1/$SMTP_PORT") 2>/dev/null; then
  npx maildev --smtp "$SMTP_PORT" --web "$MAILDEV_WEB_PORT" --ip 127.0.0.1 --web-ip 127.0.0.1 --silent >"$ROOT/.data/maildev.log" 2>&1 &
  MAIL_PID=$!
fi

log "Clackwater is starting on http://localhost:$PORT (Ctrl-C stops it and the database)"
# our own server, not `next start`: it hands the route handlers the real peer address
# (scripts/server.mjs; TRUST_PROXY_HOPS when a proxy stands in front)
node scripts/server.mjs -p "$PORT" &
APP_PID=$!
for _ in $(seq 1 60); do
  curl -fs "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1 && break
  sleep 1
done
log "ready: open http://localhost:$PORT"
log "mail the app sends (notifications, digests, sign-in links): http://localhost:$MAILDEV_WEB_PORT/"
wait "$APP_PID"
