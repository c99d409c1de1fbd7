#!/usr/bin/env bash
# Does the live notebook grow over many re-runs? Saves a copy of the notebook N times under one
# `serve` session and prints heap (after GC) and live threads at the start, along the way and at
# the end. Measured, not asserted. Usage: bench/live-reruns.sh [NOTEBOOK] [N=1000]
set -euo pipefail
cd "$(dirname "$0")/.."
notebook="${1:-demo-data/hmf-honey-validation.md}"
n="${2:-1000}"
mvn -B -q -o -DskipTests package test-compile >/dev/null
java -Xmx512m -Djava.awt.headless=true -cp "target/classes:target/test-classes:target/lib/*" \
  org.meritbook.bench.LiveReruns "$notebook" "$n"
