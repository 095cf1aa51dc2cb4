#!/usr/bin/env bash
# Installs the Debian packages Clackwater needs when they are missing, then the npm
# packages when node_modules is missing or older than the lockfile.
# Usage: scripts/ensure-system.sh [--browser]
set -euo pipefail
. "$(dirname "$0")/env.sh"

need=()
if [ -z "${DATABASE_URL:-}" ]; then
  command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || need+=(mariadb-server mariadb-client)
fi
if [ "${1:-}" = "--browser" ]; then
  [ -x /usr/bin/chromium ] || need+=(chromium)
fi
if [ ${#need[@]} -gt 0 ]; then
  [ "$(id -u)" = "0" ] || die "missing Debian packages (${need[*]}): run as root or install them with apt-get"
  log "installing Debian packages: ${need[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -q >/dev/null
  apt-get install -y -q --no-install-recommends "${need[@]}" >/dev/null
  # Debian's package may start a system-wide server on 3306; Clackwater runs its own.
  if command -v service >/dev/null 2>&1; then service mariadb stop >/dev/null 2>&1 || true; fi
fi

cd "$ROOT"
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  log "installing npm packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi
