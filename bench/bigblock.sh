#!/usr/bin/env bash
# A notebook whose data block has 100,000 rows (or ROWS), read, analysed and published in a 256 MiB
# heap. Prints figures, asserts nothing:
#  1. ./meritbook run as a user types it (cold JVM), wall-clock seconds and peak RSS;
#  2. parse + read + analyse as the first work of a fresh JVM started with the launcher's options
#     (BigBlockTiming --fresh, 3 runs): the figure the target "read and analysed in 3 s" is held to;
#  3. in one JVM (BigBlockTiming): the block read alone, read + analyse, results.json, HTML, HTML + PDF.
# The workbook is invented (src/test/java/org/meritbook/bench/BigBlockWorkbook.java, seeded).
# Usage: bench/bigblock.sh [ROWS]
set -euo pipefail
cd "$(dirname "$0")/.."
rows="${1:-100000}"
mvn -B -q -DskipTests package test-compile >/dev/null
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
cp="target/classes:target/test-classes:target/lib/*"
java -cp "$cp" org.meritbook.bench.BigBlockWorkbook "$work" "$rows" >/dev/null
echo "== workbook: $rows data rows, $(stat -c %s "$work/analyser-checks.xlsx") bytes"
echo "== ./meritbook run, MERITBOOK_JAVA_OPTS=-Xmx256m (cold JVM, 2 runs)"
for i in 1 2; do
  if [ -x /usr/bin/time ]; then
    MERITBOOK_JAVA_OPTS=-Xmx256m /usr/bin/time -f "run $i: %e s wall, %U s user, peak RSS %M KB" \
      ./meritbook run "$work/analyser-checks.md" -o "$work/run$i" 2>&1 >/dev/null | tail -1
  else
    start=$(date +%s%N)
    MERITBOOK_JAVA_OPTS=-Xmx256m ./meritbook run "$work/analyser-checks.md" -o "$work/run$i" >/dev/null
    end=$(date +%s%N)
    awk -v ns=$((end - start)) -v i="$i" 'BEGIN { printf "run %d: %.2f s (no /usr/bin/time: no RSS)\n", i, ns / 1e9 }'
  fi
done
if diff -r -x .meritbook.lock "$work/run1" "$work/run2" >/dev/null; then
  echo "runs 1 and 2: output byte-identical"
else
  echo "runs 1 and 2: OUTPUT DIFFERS"
fi
ls -l "$work/run2"/*/rev1 | awk 'NR > 1 { printf "  %-40s %12d bytes\n", $9, $5 }'
echo "== parse + read + analyse in a fresh JVM: the launcher's options, -Xmx256m (3 runs)"
launcher=(-XX:+UseSerialGC -Xmn48m -Xms112m -XX:TieredStopAtLevel=1 -Xshare:auto -Xlog:cds=off -Xlog:cds+dynamic=off)
if [ -f target/meritbook.jsa ]; then
  launcher+=(-XX:SharedArchiveFile=target/meritbook.jsa) # the class-data archive the runs above left
fi
for i in 1 2 3; do
  java -Xmx256m "${launcher[@]}" -Djava.awt.headless=true -cp "target/meritbook.jar:target/lib/*:target/test-classes" \
    org.meritbook.bench.BigBlockTiming "$work/analyser-checks.md" --fresh
done
echo "== stages in one JVM, -Xmx256m, the launcher's collector"
java -Xmx256m -XX:+UseSerialGC -Xmn48m -Xms112m -Djava.awt.headless=true -cp "$cp" org.meritbook.bench.BigBlockTiming "$work/analyser-checks.md"
