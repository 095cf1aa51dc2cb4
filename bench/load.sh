#!/usr/bin/env bash
# npm run bench:load — the load benchmark end to end on loopback: a benchmark database
# (clackwater_test_load on the test MariaDB) with the demo, 20,000 invented members and
# 400,000 invented posts (100,000 questions, 300,000 answers and replies), the production
# server (scripts/server.mjs: Next behind the response cache) on it, then bench/load.ts. About six minutes on two cores. BENCH_PORT picks the server's
# port; DB_PORT the test MariaDB's.
set -euo pipefail
export CLACKWATER_ENV=test DB_NAME=clackwater_test_load PORT="${BENCH_PORT:-3300}"
. "$(dirname "$0")/../scripts/env.sh"
cd "$ROOT"
export NEXTAUTH_URL="http://127.0.0.1:$PORT" SITE_URL="http://127.0.0.1:$PORT" NEXT_TELEMETRY_DISABLED=1
bash scripts/db.sh start
mariadb --no-defaults --socket="$DB_DATA_DIR/sock" -uroot -e "CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci"
# SKIP_SEED=1 reuses the posts a previous run seeded (the server and the runs only)
if [ -z "${SKIP_SEED:-}" ]; then
  log "seeding 400,000 posts and 20,000 members into $DB_NAME"
  npx tsx bench/seed-posts.ts "${POSTS:-400000}" "${MEMBERS:-20000}"
else
  npx tsx scripts/migrate.ts up # posts seeded before a newer migration (017 fills the lists' counts)
fi
[ -f .next/BUILD_ID ] || npx next build
node scripts/server.mjs -p "$PORT" -H 127.0.0.1 >.data/bench-load-server.log 2>&1 &
server=$!
trap 'kill $server 2>/dev/null || true' EXIT
for _ in $(seq 1 120); do curl -sf "http://127.0.0.1:$PORT/api/health" >/dev/null && break; sleep 0.5; done
sql() { mariadb --no-defaults --socket="$DB_DATA_DIR/sock" -uroot -N "$DB_NAME" -e "SET time_zone = '+00:00'; $1"; }
thread=$(sql "SELECT id FROM questions WHERE hidden_at IS NULL ORDER BY answer_count DESC LIMIT 1")
# a page 50,000 questions back, as the list's own "Older" links reach it (lib/validation/list-page.ts)
deep=$(sql "SELECT CONCAT(UNIX_TIMESTAMP(created_at) * 1000, '-', id) FROM questions
            WHERE hidden_at IS NULL AND deleted_at IS NULL ORDER BY created_at DESC, id DESC LIMIT 1 OFFSET 50000")
node --import tsx bench/load.ts "http://127.0.0.1:$PORT" "$thread" "/questions?after=$deep"
