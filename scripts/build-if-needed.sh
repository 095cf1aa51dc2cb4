#!/usr/bin/env bash
# Builds the app when there is no build yet or a source file is newer than it.
set -euo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1
STAMP=.next/BUILD_ID
if [ -f "$STAMP" ] && [ -z "$(find app components content lib models migrations public package-lock.json next.config.mjs tailwind.config.ts -newer "$STAMP" ! -path public/sw.js -print -quit 2>/dev/null)" ]; then
  log "build is up to date"
else
  log "building the app (next build)"
  npx next build
  node scripts/build-sw.mjs
fi
