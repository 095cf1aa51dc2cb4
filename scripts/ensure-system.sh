#!/usr/bin/env bash
# Installs the Debian packages Clackwater needs when they are missing (MariaDB, Redis,
# HAProxy; chromium with --browser), then the npm
# packages when node_modules is missing or older than the lockfile.
# Usage: scripts/ensure-system.sh [--browser]
set -euo pipefail
. "$(dirname "$0")/env.sh"

need=()
if [ -z "${DATABASE_URL:-}" ]; then
  command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || need+=(mariadb-server mariadb-client)
fi
# several instances (npm run cluster, and its test in npm test): Redis and HAProxy
command -v redis-server >/dev/null 2>&1 || [ -x /usr/bin/redis-server ] || need+=(redis-server)
command -v haproxy >/dev/null 2>&1 || [ -x /usr/sbin/haproxy ] || need+=(haproxy)
if [ "${1:-}" = "--browser" ]; then
  [ -x /usr/bin/chromium ] || need+=(chromium)
fi
if [ ${#need[@]} -gt 0 ]; then
  [ "$(id -u)" = "0" ] || die "missing Debian packages (${need[*]}): run as root or install them with apt-get"
  log "installing Debian packages: ${need[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -q >/dev/null
  apt-get install -y -q --no-install-recommends "${need[@]}" >/dev/null
  # Debian's packages may start system-wide servers (MariaDB on 3306, Redis on 6379, HAProxy);
  # Clackwater runs its own, as the invoking user, on its own ports.
  if command -v service >/dev/null 2>&1; then
    for s in mariadb redis-server haproxy; do service "$s" stop >/dev/null 2>&1 || true; done
  fi
fi

cd "$ROOT"
if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  log "installing npm packages (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi
