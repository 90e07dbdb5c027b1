#!/bin/bash
# The fleet-scale benchmark of SPEC 9: for each fleet size, in one run on the same database,
#   (a) the floor: SQLite's own single sequential pass over the three cost-event columns,
#       SELECT count(*), sum(length(asset_id)+length(occurred_on)+amount) FROM cost_event
#       in the stock sqlite3 shell;
#   (b) `tenure review` on a fresh copy of the same database (wall time and peak memory from
#       /usr/bin/time -v);
# and prints the ratio (b)/(a) and how both grow with the number of events. A report, never a
# test assertion. Each timing is the best of REPEAT runs (default 3) with the file in the page
# cache (a warm-up pass reads it first), so both sides read from memory.
#
#   bench/fleet_review.sh                         # 10k/1M, 30k/3M, 100k/10M with build/cli/tenure
#   bench/fleet_review.sh build/cli/tenure "10000:1000000"
#
# Needs about 2.5 GB free in $TMPDIR (default /tmp) for the largest fleet and its copy.
set -euo pipefail
tenure=$(realpath -m "${1:-$(dirname "$0")/../build/cli/tenure}")
sizes=${2:-"10000:1000000 30000:3000000 100000:10000000"}
repeat=${REPEAT:-3}
work=$(mktemp -d "${TMPDIR:-/tmp}/tenure-bench.XXXXXX")
trap 'rm -rf "$work"' EXIT

for tool in sqlite3 /usr/bin/time; do
  command -v "$tool" >/dev/null || { echo "fleet_review: $tool is missing" >&2; exit 1; }
done
[[ -x $tenure ]] || { echo "fleet_review: no executable $tenure" >&2; exit 1; }

seconds() { date +%s.%N; }
best() { printf '%s\n' "$@" | sort -g | head -1; }

printf '%-9s %-11s %9s %9s %7s %10s\n' assets events "floor s" "review s" ratio "peak MiB"
for size in $sizes; do
  assets=${size%%:*}
  events=${size##*:}
  db="$work/fleet-$assets.db"
  "$tenure" demo --db "$db" --assets "$assets" --events "$events" >/dev/null
  cat "$db" >/dev/null  # warm the page cache
  floors=() reviews=() peak=0
  for ((r = 0; r < repeat; ++r)); do
    start=$(seconds)
    sqlite3 "$db" "SELECT count(*), sum(length(asset_id)+length(occurred_on)+amount) FROM cost_event" >/dev/null
    floors+=("$(echo "$(seconds) - $start" | bc -l)")
    cp "$db" "$work/copy.db"
    cat "$work/copy.db" >/dev/null
    start=$(seconds)
    /usr/bin/time -v -o "$work/time.txt" "$tenure" review --db "$work/copy.db" --as-of 2026-11-30 --quiet >/dev/null
    reviews+=("$(echo "$(seconds) - $start" | bc -l)")
    kib=$(awk -F: '/Maximum resident set size/ {gsub(/ /, "", $2); print $2}' "$work/time.txt")
    ((kib > peak)) && peak=$kib
    rm -f "$work/copy.db"
  done
  floor=$(best "${floors[@]}")
  review=$(best "${reviews[@]}")
  printf '%-9s %-11s %9.2f %9.2f %7.2f %10.0f\n' "$assets" "$events" "$floor" "$review" \
    "$(echo "$review / $floor" | bc -l)" "$(echo "$peak / 1024" | bc -l)"
  rm -f "$db"
done
