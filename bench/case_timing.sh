#!/bin/bash
# Times whole `tenure case FILE` processes on every fixtures/cases/*.json and prints the mean
# wall time per process in milliseconds: a benchmark report, never a test assertion.
#
#   bench/case_timing.sh                           # build/cli/tenure, 200 runs per case
#   bench/case_timing.sh build-lead/cli/tenure 50  # another binary, 50 runs
#
# Uses hyperfine when it is installed (5 warm-up runs, then RUNS timed runs); otherwise a bash
# loop timed with `date +%s%N`, whose mean also counts the loop's own fork and exec. A case whose
# run exits non-zero (an input the CLI rejects) is still timed, and its exit code is shown.
set -euo pipefail
tenure=$(realpath -m "${1:-$(dirname "$0")/../build/cli/tenure}")
runs=${2:-200}
cd "$(dirname "$0")/.."

if [[ ! -x $tenure ]]; then
  echo "case_timing: no executable $tenure (build it: cmake --build build --target tenure)" >&2
  exit 1
fi
shopt -s nullglob
cases=(fixtures/cases/*.json)
if ((${#cases[@]} == 0)); then
  echo "case_timing: no fixtures/cases/*.json" >&2
  exit 1
fi

mean_ms_hyperfine() {
  local csv
  csv=$(mktemp)
  # Its warnings about ignored exit codes are dropped: the exit code is shown beside the time.
  hyperfine --shell=none --ignore-failure --style none --warmup 5 --runs "$runs" \
    --export-csv "$csv" "$tenure case $1" >/dev/null 2>&1
  # Columns: command,mean,stddev,median,user,system,min,max; times in seconds.
  awk -F, 'NR == 2 { printf "%.3f", $2 * 1000 }' "$csv"
  rm -f "$csv"
}

mean_ms_loop() {
  local start end
  start=$(date +%s%N)
  for ((run = 0; run < runs; run++)); do
    "$tenure" case "$1" >/dev/null 2>&1 || true
  done
  end=$(date +%s%N)
  awk -v ns=$((end - start)) -v runs="$runs" 'BEGIN { printf "%.3f", ns / runs / 1e6 }'
}

if command -v hyperfine >/dev/null 2>&1; then
  timer=hyperfine
else
  timer=loop
fi
echo "tenure case: mean wall time per process over $runs runs ($timer), $tenure"
for file in "${cases[@]}"; do
  status=0
  "$tenure" case "$file" >/dev/null 2>&1 || status=$?
  printf '%-45s %10s ms%s\n' "$file" "$(mean_ms_$timer "$file")" \
    "$( ((status == 0)) || echo "  (exit $status)")"
done
