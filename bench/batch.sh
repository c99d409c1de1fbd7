#!/usr/bin/env bash
# A batch of studies in one JVM against the same studies one cold JVM each, measured (not asserted):
#  1. N copies of the demo notebook (distinct names, one shared workbook) in a temporary folder;
#  2. ./meritbook run on all N in one command: wall-clock and user seconds, peak RSS;
#  3. ./meritbook run on each alone, N cold JVMs: the same figures summed (RSS: the largest);
#  4. totals, per-study averages, and the batch's wall time as a percentage of the singles'.
# Every batch study's output must be byte-identical to its single run's (the lock file aside).
# Usage: bench/batch.sh [N]   (default 20)
set -euo pipefail
cd "$(dirname "$0")/.."
n="${1:-20}"
[ -x /usr/bin/time ] || { echo "bench/batch.sh needs /usr/bin/time (GNU time) for user seconds and peak RSS" >&2; exit 2; }
mvn -B -q -DskipTests package >/dev/null
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
mkdir -p "$work/studies"
cp demo-data/hmf-honey-validation.xlsx "$work/studies/"
notebooks=()
for i in $(seq -w 1 "$n"); do
  cp demo-data/hmf-honey-validation.md "$work/studies/study-$i.md"
  notebooks+=("$work/studies/study-$i.md")
done
cores="$(nproc)"
echo "== $n copies of the demo notebook, $cores processors"
# The first run after a build writes the class-data archive (slower); it is not measured.
./meritbook run "${notebooks[0]}" -o "$work/warm-up" >/dev/null

/usr/bin/time -f "%e %U %M" -o "$work/batch.time" \
  ./meritbook run "${notebooks[@]}" -o "$work/batch" >"$work/batch.log" 2>&1 || {
    echo "the batch run failed:"; tail -20 "$work/batch.log"; exit 1; }
read -r batch_wall batch_user batch_rss <"$work/batch.time"
tail -1 "$work/batch.log"

: >"$work/singles.time"
for nb in "${notebooks[@]}"; do
  /usr/bin/time -a -f "%e %U %M" -o "$work/singles.time" \
    ./meritbook run "$nb" -o "$work/single" >/dev/null
done
read -r single_wall single_user single_rss < <(awk '{ w += $1; u += $2; if ($3 > m) m = $3 }
  END { printf "%.2f %.2f %d\n", w, u, m }' "$work/singles.time")

awk -v n="$n" -v bw="$batch_wall" -v bu="$batch_user" -v br="$batch_rss" \
    -v sw="$single_wall" -v su="$single_user" -v sr="$single_rss" 'BEGIN {
  printf "%-22s %10s %10s %14s %14s %16s\n", "", "wall s", "user s", "wall s/study", "user s/study", "peak RSS MB"
  printf "%-22s %10.2f %10.2f %14.2f %14.2f %16.0f\n", "batch (one JVM)", bw, bu, bw / n, bu / n, br / 1024
  printf "%-22s %10.2f %10.2f %14.2f %14.2f %16.0f\n", "singles (N cold JVMs)", sw, su, sw / n, su / n, sr / 1024
  printf "batch / singles: wall %.1f %%, user %.1f %% (target at N=100: wall <= 40 %%)\n", 100 * bw / sw, 100 * bu / su
}'

# Reproducibility is part of the measure: a faster path that changes a byte is a regression.
differing=0
for nb in "${notebooks[@]}"; do
  study="$(basename "$nb" .md)"
  if ! diff -r -x .meritbook.lock "$work/single/$study" "$work/batch/$study" >/dev/null; then
    echo "$study: BATCH OUTPUT DIFFERS from its single run"
    differing=$((differing + 1))
  fi
done
if [ "$differing" -eq 0 ]; then
  echo "all $n batch studies: output byte-identical to their single runs (lock file aside)"
else
  exit 1
fi
