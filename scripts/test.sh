#!/usr/bin/env bash
# npm test — the same set-up as npm start against a separate test database
# (its own MariaDB on 127.0.0.1:3408), then typecheck, lint, unit and integration
# tests (vitest, real MariaDB), the cluster test (several instances behind HAProxy) and
# browser tests (Playwright, Debian's chromium).
set -uo pipefail
export CLACKWATER_ENV=test
. "$(dirname "$0")/env.sh"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1 E2E_PORT="$PORT"
mkdir -p .data/reports

bash scripts/ensure-system.sh --browser || die "set-up failed"
bash scripts/db.sh start || die "could not start the test database"
trap 'bash "$ROOT/scripts/db.sh" stop >/dev/null 2>&1 || true' EXIT

failed=0
step() { log "$1"; shift; "$@" || { failed=1; log "FAILED: $*"; }; }

step "typecheck" npx tsc --noEmit
step "typecheck lib/ (noUncheckedIndexedAccess)" npx tsc -p lib --noEmit
step "lint" npx eslint . --max-warnings=0
step "format (prettier --check)" npx prettier --check . --log-level=warn
step "reset test database" npx tsx scripts/reset-db.ts
step "unit and integration tests (vitest)" npx vitest run --reporter=default --reporter=json --outputFile=.data/reports/vitest.json
step "build" npm run build
# HAProxy, two instances of the build, Redis, a primary and its replica (scripts/cluster.sh, ports 3700-3706)
step "cluster tests (vitest, tests/cluster)" npx vitest run --config vitest.cluster.config.mts
step "reset test database" npx tsx scripts/reset-db.ts
step "browser tests (playwright)" env PLAYWRIGHT_JSON_OUTPUT_NAME=.data/reports/playwright.json npx playwright test --reporter=list,json

node scripts/test-summary.mjs .data/reports/vitest.json .data/reports/playwright.json || failed=1
exit $failed
