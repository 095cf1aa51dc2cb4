#!/usr/bin/env bash
# npm run bench:cluster — the load benchmark (bench/load.ts) through HAProxy, once against
# one app instance and once against two (scripts/cluster.sh, the demo data, loopback only),
# and the ratio of the two rates. Bounded: LOAD_SECONDS (5) per page, a few pages (ONLY),
# no soak. Ports: CLUSTER_BASE_PORT (3700) and the next five, CLUSTER_REDIS_PORT (base + 5).
# Needs a build (npm run build). On a machine with fewer cores than instances the ratio
# says how much the instances compete for them, not how far the app scales.
set -euo pipefail
export CLACKWATER_ENV=test
. "$(dirname "$0")/../scripts/env.sh"
cd "$ROOT"
BASE="${CLUSTER_BASE_PORT:-3700}"
export CLUSTER_PORT="$BASE" CLUSTER_DB_PORT="$((BASE + 3))" CLUSTER_REPLICA_PORT="$((BASE + 4))"
export CLUSTER_REDIS_PORT="${CLUSTER_REDIS_PORT:-$((BASE + 5))}"
export LOAD_SECONDS="${LOAD_SECONDS:-5}" SOAK_SECONDS=0
# pages the demo data has (its lists are shorter than the 400,000-post benchmark's)
export ONLY="${ONLY:-home,thread page,guide page,GET /api/search}"
OUT="$ROOT/.data/cluster-bench"
mkdir -p "$OUT"
trap 'bash scripts/cluster.sh stop >/dev/null 2>&1 || true' EXIT

# "name<TAB>req/s" for every page but the static baseline that answered only 2xx, without errors
clean() { awk -F'|' '/^\| / && !/static file/ && $3 ~ /[0-9]/ && $7 + 0 == 0 && $8 + 0 == 0 { print $2 "\t" $3 + 0 }' "$1" | sort; }

bench() {
  local name=$1 ports=$2
  bash scripts/cluster.sh stop >/dev/null 2>&1 || true
  log "cluster with $name ($ports) behind HAProxy on :$BASE"
  CLUSTER_APP_PORTS="$ports" CLUSTER_FRESH=1 bash scripts/cluster.sh start >"$OUT/start-$name.log" 2>&1 \
    || { cat "$OUT/start-$name.log" >&2; die "the cluster did not start"; }
  local thread
  thread=$(mariadb --no-defaults --socket="$ROOT/.data/cluster/mariadb-primary/sock" -uroot -N "$DB_NAME" \
    -e "SELECT id FROM questions WHERE hidden_at IS NULL AND deleted_at IS NULL ORDER BY answer_count DESC LIMIT 1")
  node --import tsx bench/load.ts "http://127.0.0.1:$BASE" "$thread" | tee "$OUT/$name.txt"
}

bench one "$((BASE + 1))"
bench two "$((BASE + 1)) $((BASE + 2))"
# the pages clean in both runs, their rates summed
join -t $'\t' <(clean "$OUT/one.txt") <(clean "$OUT/two.txt") >"$OUT/both.tsv" || true
one=$(awk -F'\t' '{ s += $2 } END { printf "%.0f", s }' "$OUT/both.tsv")
two=$(awk -F'\t' '{ s += $3 } END { printf "%.0f", s }' "$OUT/both.tsv")
log "through HAProxy, summed over the $(wc -l <"$OUT/both.tsv") pages with no error or non-2xx in either run:"
log "one instance $one req/s, two instances $two req/s; scaling ratio (two / one) $(awk -v a="$two" -v b="$one" 'BEGIN { printf "%.2f", (b > 0 ? a / b : 0) }') on $(nproc) cores"
