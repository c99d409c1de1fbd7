#!/usr/bin/env bash
# Speed and memory of meritbook on the demo study, measured (not asserted):
#  1. the command a user types, cold JVM each time (./meritbook run), wall-clock seconds and peak RSS;
#  2. the pipeline's stages inside one JVM, cold and warm, with the peak heap.
# Usage: bench/timing.sh [NOTEBOOK] [ITERATIONS]
set -euo pipefail
cd "$(dirname "$0")/.."
notebook="${1:-demo-data/hmf-honey-validation.md}"
iterations="${2:-10}"
mvn -B -q -DskipTests package test-compile >/dev/null
out="$(mktemp -d)"
echo "== ./meritbook run (cold JVM, 3 runs; a run right after a build also writes the class-data archive)"
for i in 1 2 3; do
  if [ -x /usr/bin/time ]; then
    /usr/bin/time -f "run $i: %e s wall, %U s user, peak RSS %M KB" \
      ./meritbook run "$notebook" -o "$out/run$i" 2>&1 >/dev/null | tail -1
  else
    start=$(date +%s%N)
    ./meritbook run "$notebook" -o "$out/run$i" >/dev/null
    end=$(date +%s%N)
    awk -v ns=$((end - start)) -v i="$i" 'BEGIN { printf "run %d: %.2f s (no /usr/bin/time: no RSS)\n", i, ns / 1e9 }'
  fi
done
# Reproducibility is part of the measure: a faster path that changes a byte is a regression.
if diff -r "$out/run2" "$out/run3" >/dev/null; then
  echo "runs 2 and 3: output byte-identical"
else
  echo "runs 2 and 3: OUTPUT DIFFERS"
fi
echo "== stages in one JVM"
java -Djava.awt.headless=true -cp "target/classes:target/test-classes:target/lib/*" \
  org.meritbook.bench.PipelineTiming "$notebook" "$iterations"
echo "== the same in a 256 MiB heap (does the demo fit?)"
java -Xmx256m -Djava.awt.headless=true -cp "target/classes:target/test-classes:target/lib/*" \
  org.meritbook.bench.PipelineTiming "$notebook" 2 | tail -1
rm -rf "$out"
