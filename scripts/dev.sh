#!/usr/bin/env bash
# npm run dev — the database plus `next dev` with hot reload on http://localhost:3000.
set -euo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1
bash scripts/ensure-system.sh
bash scripts/db.sh start
npx tsx scripts/migrate.ts up
npx tsx scripts/seed.ts
npx maildev --smtp "$SMTP_PORT" --web "$MAILDEV_WEB_PORT" --ip 127.0.0.1 --web-ip 127.0.0.1 --silent >"$ROOT/.data/maildev.log" 2>&1 &
MAIL_PID=$!
log "mail catcher: http://localhost:$MAILDEV_WEB_PORT/"
trap 'kill $MAIL_PID 2>/dev/null; bash "$ROOT/scripts/db.sh" stop' EXIT
npx next dev -p "$PORT"
