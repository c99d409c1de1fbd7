#!/usr/bin/env bash
# How soon does the live notebook show a save? Saves a copy of the notebook N times under one
# `serve` session (after five warm-up saves; the launcher's JVM options for serve) and prints the
# server's re-run time and the time from the file written to the new page state. Measured, not asserted.
# Usage: bench/live-latency.sh [NOTEBOOK] [N=20]
set -euo pipefail
cd "$(dirname "$0")/.."
notebook="${1:-demo-data/hmf-honey-validation.md}"
n="${2:-20}"
mvn -B -q -o -DskipTests package test-compile >/dev/null
java -XX:+UseSerialGC -Xmn48m -Xms112m -Djava.awt.headless=true \
  -cp "target/classes:target/test-classes:target/lib/*" org.meritbook.bench.LiveLatency "$notebook" "$n"
