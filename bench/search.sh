#!/usr/bin/env bash
# npm run bench:search — the search benchmark end to end on loopback:
#  1. in-process: 100,000 invented posts into a flexsearch index, 1,000 mixed queries;
#  2. through the API: the same posts in a benchmark database (clackwater_test_bench on
#     the test MariaDB), `next start` on it, the same queries to GET /api/search.
set -euo pipefail
export CLACKWATER_ENV=test DB_NAME=clackwater_test_bench PORT="${BENCH_PORT:-3200}" POSTS="${POSTS:-100000}"
. "$(dirname "$0")/../scripts/env.sh"
cd "$ROOT"
export NEXTAUTH_URL="http://127.0.0.1:$PORT" SITE_URL="http://127.0.0.1:$PORT" NEXT_TELEMETRY_DISABLED=1
bash scripts/db.sh start
mariadb --no-defaults --socket="$DB_DATA_DIR/sock" -uroot -e "CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci"
log "in-process"
node --expose-gc --import tsx bench/search.ts "$POSTS"
log "seeding $POSTS posts into $DB_NAME"
npx tsx bench/seed-posts.ts "$POSTS"
[ -f .next/BUILD_ID ] || npx next build
log "through the API on 127.0.0.1:$PORT"
node node_modules/next/dist/bin/next start -p "$PORT" -H 127.0.0.1 >.data/bench-server.log 2>&1 &
server=$!
trap 'kill $server 2>/dev/null || true' EXIT
for _ in $(seq 1 120); do curl -sf "http://127.0.0.1:$PORT/api/health" >/dev/null && break; sleep 0.5; done
node --import tsx bench/search.ts --api "http://127.0.0.1:$PORT"
echo "server resident memory after the run (index of $POSTS posts included): $(( $(ps -o rss= -p "$server") / 1024 )) MB"
