#!/usr/bin/env bash
# Every speed and memory target of meritbook, measured in one go (nothing asserted; the figures in
# README.md come from this script). Runs, in order:
#   bench/peer.sh RUNS      the demo cold, side by side with the R peer (bench/peer.R): wall, peak RSS, ratio
#   bench/live-latency.sh   a save in `serve` to the new page state, on the demo
#   bench/batch.sh N        N demo studies in one command against N single cold runs
#   bench/bigblock.sh       a 100,000-row block in a 256 MiB heap
# then prints each target beside its measured figure. Run it on an otherwise idle machine: on 2
# cores any other work shows in every figure (the load average is printed before and after).
# Usage: bench/targets.sh [RUNS=5] [N=100]   (N=100 takes about 20 minutes on 2 cores)
set -euo pipefail
cd "$(dirname "$0")/.."
runs="${1:-5}"
n="${2:-100}"
log="$(mktemp -d)"
trap 'rm -rf "$log"' EXIT
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) cores; $(date -u +%FT%TZ)"
echo "######## bench/peer.sh $runs"
bench/peer.sh "$runs" | tee "$log/peer"
echo "######## bench/live-latency.sh"
bench/live-latency.sh demo-data/hmf-honey-validation.md 20 | tee "$log/live"
echo "######## bench/batch.sh $n"
bench/batch.sh "$n" | tee "$log/batch"
echo "######## bench/bigblock.sh"
bench/bigblock.sh | tee "$log/bigblock"
echo "load average after: $(cut -d' ' -f1-3 /proc/loadavg)"

python3 - "$log" "$n" <<'PY'
import re, sys
log, n = sys.argv[1], sys.argv[2]
text = {k: open(f"{log}/{k}").read() for k in ("peer", "live", "batch", "bigblock")}

def find(key, pattern):
    m = re.search(pattern, text[key], re.M)
    return m.groups() if m else None

ours = find("peer", r"^meritbook \(whole dossier\)\s+([\d.]+) s wall\s+[\d.]+ s user\s+(\d+) MB peak RSS")
ratio = find("peer", r"^ratio meritbook / R\s+([\d.]+) wall")
live = find("live", r"re-run (\d+) ms, save to new page state (\d+) ms")
batch = find("batch", r"batch / singles: wall ([\d.]+) %")
big_run = find("bigblock", r"^run 2: ([\d.]+) s wall, [\d.]+ s user, peak RSS (\d+) KB")
big_read = find("bigblock", r"^parse notebook \+ read \+ analyse:\s+([\d.]+) ms")
fresh = sorted(float(x) for x in re.findall(r"^fresh JVM, parse notebook \+ read \+ analyse:\s+([\d.]+) ms", text["bigblock"], re.M))
rows = [
    ("demo dossier cold, wall", "<= 1.2 s", f"{ours[0]} s" if ours else "?"),
    ("demo cold / R peer, wall", "<= 2x", f"{ratio[0]}x" if ratio else "?"),
    ("demo peak RSS", "<= 300 MB", f"{ours[1]} MB" if ours else "?"),
    ("live: server re-run after a save (median)", "<= 250 ms", f"{live[0]} ms" if live else "?"),
    ("live: file written to new page state", "(adds 300 ms quiet)", f"{live[1]} ms" if live else "?"),
    (f"batch of {n} / {n} single cold runs, wall", "<= 40 %", f"{batch[0]} %" if batch else "?"),
    ("100,000-row block: cold run in 256 MiB", "(whole run)", f"{big_run[0]} s, {int(big_run[1]) // 1024} MB" if big_run else "?"),
    ("100,000-row block: read + analyse, fresh JVM", "<= 3 s", f"{fresh[len(fresh) // 2]:.0f} ms (median)" if fresh else "?"),
    ("100,000-row block: read + analyse, 2nd pass", "<= 3 s", f"{big_read[0]} ms (one JVM)" if big_read else "?"),
]
print("== targets")
for what, target, measured in rows:
    print(f"{what:44s} {target:>20s} {measured:>16s}")
PY
