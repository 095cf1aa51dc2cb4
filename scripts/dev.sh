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
trap 'bash "$ROOT/scripts/db.sh" stop' EXIT
npx next dev -p "$PORT"
