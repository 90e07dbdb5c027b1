#!/bin/bash
# Times the repair check of SPEC 11 ("At the counter", under 10 ms for one asset) on the
# 100,000-asset demo fleet: builds it (`tenure demo --assets 100000 --events 10000000`), reviews
# it once, then times, one process per call, CALLS `tenure repair` runs and CALLS stock sqlite3
# shells that load libtenure and run one `SELECT tenure_repair_check(...)`, each on a different
# asset, and prints the median and 90th percentile wall time per process in milliseconds, beside
# the start of a `tenure --version` process alone. It also times CALLS checks inside one shell
# session, less the same session without them: the function's own time per call.
# A benchmark report, never a test assertion.
#
#   bench/repair_check.sh                       # build/cli/tenure, build/plugin/libtenure, 200 calls
#   CALLS=50 ASSETS=10000 EVENTS=1000000 bench/repair_check.sh build-lead/cli/tenure build-lead/plugin/libtenure
#
# Needs about 1.3 GB free in $TMPDIR (default /tmp) for the fleet.
set -euo pipefail
cd "$(dirname "$0")/.."
tenure=$(realpath -m "${1:-build/cli/tenure}")
library=$(realpath -m "${2:-build/plugin/libtenure}")
calls=${CALLS:-200}
assets=${ASSETS:-100000}
events=${EVENTS:-10000000}
work=$(mktemp -d "${TMPDIR:-/tmp}/tenure-repair-bench.XXXXXX")
trap 'rm -rf "$work"' EXIT

command -v sqlite3 >/dev/null || { echo "repair_check: sqlite3 is missing" >&2; exit 1; }
[[ -x $tenure ]] || { echo "repair_check: no executable $tenure" >&2; exit 1; }
[[ -e $library.so ]] || { echo "repair_check: no library $library.so" >&2; exit 1; }

db="$work/fleet.db"
echo "building the fleet: $assets assets, $events cost events" >&2
"$tenure" demo --db "$db" --assets "$assets" --events "$events" >/dev/null
"$tenure" review --db "$db" --as-of 2026-11-30 --quiet >/dev/null
# CALLS assets spread over the fleet, and their limits (half of one: a repair; none: a replace).
sqlite3 "$db" "SELECT asset_id, round(coalesce(repair_limit, 0) / 2, 2) FROM
                 (SELECT asset_id, repair_limit, row_number() OVER (ORDER BY asset_id) AS n
                    FROM tenure_latest)
               WHERE n % (SELECT max(1, count(*) / $calls) FROM tenure_latest) = 0
               ORDER BY asset_id LIMIT $calls" >"$work/sample.txt"
mapfile -t sample <"$work/sample.txt"
cat "$db" >/dev/null  # warm the page cache

# Times are read from bash itself, ${EPOCHREALTIME/./} in microseconds (bash 5): no process is
# started to read the clock, so a timing holds only the call it times.
# Median and 90th percentile of the microsecond figures in the file $1, in milliseconds.
summary() {
  sort -n "$1" | awk '{ t[NR] = $1 } END {
    printf "median %7.2f ms   p90 %7.2f ms   (%d calls)", t[int((NR + 1) / 2)] / 1e3,
           t[int(NR * 0.9 + 0.5)] / 1e3, NR }'
}

: >"$work/cli.txt"
for row in "${sample[@]}"; do
  start=${EPOCHREALTIME/./}
  "$tenure" repair --db "$db" "${row%%|*}" --estimate "${row##*|}" >/dev/null
  end=${EPOCHREALTIME/./}
  echo $((end - start)) >>"$work/cli.txt"
done

: >"$work/sql.txt"
for row in "${sample[@]}"; do
  start=${EPOCHREALTIME/./}
  sqlite3 -batch -cmd ".load $library" "$db" \
    "SELECT tenure_repair_check('${row%%|*}', ${row##*|});" >/dev/null
  end=${EPOCHREALTIME/./}
  echo $((end - start)) >>"$work/sql.txt"
done

# Process start alone, for reading the two figures above.
: >"$work/start.txt"
for ((k = 0; k < calls; ++k)); do
  start=${EPOCHREALTIME/./}
  "$tenure" --version >/dev/null
  end=${EPOCHREALTIME/./}
  echo $((end - start)) >>"$work/start.txt"
done

# One shell session checking every sampled asset, against the same session without the checks:
# the difference over the calls is the function's own time per call.
session() {
  echo ".load $library"
  echo "CREATE TEMP TABLE sample(asset_id TEXT, estimate REAL);"
  for row in "${sample[@]}"; do echo "INSERT INTO sample VALUES ('${row%%|*}', ${row##*|});"; done
  echo "SELECT count(*) FROM sample WHERE $1;"
}
session "length(tenure_repair_check(asset_id, estimate)) > 0" >"$work/checks.sql"
session "estimate >= 0" >"$work/none.sql"
start=${EPOCHREALTIME/./}
in_session=$(sqlite3 -batch "$db" <"$work/checks.sql")
end=${EPOCHREALTIME/./}
sqlite3 -batch "$db" <"$work/none.sql" >/dev/null
baseline_end=${EPOCHREALTIME/./}
with_checks=$((end - start)) without=$((baseline_end - end))

echo "repair check on $assets assets and $events cost events, wall time per call:"
echo "  tenure repair (one process each)          $(summary "$work/cli.txt")"
echo "  sqlite3 + tenure_repair_check (each)      $(summary "$work/sql.txt")"
echo "  tenure --version (process start alone)    $(summary "$work/start.txt")"
awk -v with="$with_checks" -v without="$without" -v n="$in_session" 'BEGIN {
  printf "  tenure_repair_check in one shell session  mean %7.3f ms   (%d calls)\n",
         (with - without) / n / 1e3, n }'
