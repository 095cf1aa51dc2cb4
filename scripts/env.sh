# Shared settings for the shell scripts. Source it; do not run it.
# Every value can be overridden from the environment or from .env (see .env.example).
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
if [ -f "$ROOT/.env" ]; then set -a; . "$ROOT/.env"; set +a; fi

export CLACKWATER_ENV="${CLACKWATER_ENV:-development}"
if [ "$CLACKWATER_ENV" = "test" ]; then
  export DB_PORT="${DB_PORT:-3408}"
  export DB_NAME="${DB_NAME:-clackwater_test}"
  export DB_DATA_DIR="${DB_DATA_DIR:-$ROOT/.data/mariadb-test}"
  export PORT="${PORT:-3100}"
else
  export DB_PORT="${DB_PORT:-3407}"
  export DB_NAME="${DB_NAME:-clackwater}"
  export DB_DATA_DIR="${DB_DATA_DIR:-$ROOT/.data/mariadb}"
  export PORT="${PORT:-3000}"
fi
export DB_HOST="${DB_HOST:-127.0.0.1}"
export DB_USER="${DB_USER:-clackwater}"
export DB_PASSWORD="${DB_PASSWORD:-clackwater}"
# the replication account (scripts/db.sh with DB_BINLOG=1, scripts/db-replica.sh)
export DB_REPL_USER="${DB_REPL_USER:-clackwater_repl}"
export DB_REPL_PASSWORD="${DB_REPL_PASSWORD:-clackwater_repl}"

export NEXTAUTH_URL="${NEXTAUTH_URL:-http://localhost:$PORT}"
export SITE_URL="${SITE_URL:-$NEXTAUTH_URL}"
export SMTP_HOST="${SMTP_HOST:-127.0.0.1}"
export SMTP_PORT="${SMTP_PORT:-1025}"
export MAILDEV_WEB_PORT="${MAILDEV_WEB_PORT:-1080}"

log() { printf '\033[1;36m[clackwater]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[clackwater]\033[0m %s\n' "$*" >&2; exit 1; }
