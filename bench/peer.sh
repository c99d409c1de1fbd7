#!/usr/bin/env bash
# meritbook's demo beside an R peer, timed side by side in one run (measured, not asserted):
# cold `./meritbook run` of the demo notebook (the whole dossier) against `Rscript bench/peer.R`
# (the demo's two calibrations and their six figures in plain R), alternated RUNS times, each
# measured with /usr/bin/time: wall and user seconds, peak RSS. Prints every run, the medians and
# the ratios meritbook / R, then checks that R's numbers agree with meritbook's results.json, so
# the two do the same calibration work.
# Usage: bench/peer.sh [RUNS]   (default 5)
# Exit status: 0 when every number agrees, 1 when one does not, 2 when a tool is missing.
set -euo pipefail
cd "$(dirname "$0")/.."
runs="${1:-5}"
notebook=demo-data/hmf-honey-validation.md
workbook=demo-data/hmf-honey-validation.xlsx
# Relative tolerance of the cross-check: far below any printed digit, far above the 1e-16 of double
# rounding; both sides use different algorithms (centred sums against lm's QR), so bits differ.
tolerance=1e-9

if ! command -v Rscript >/dev/null; then
  echo "bench/peer.sh: Rscript not found; install R and readxl: apt-get install -y r-base-core r-cran-readxl" >&2
  exit 2
fi
if ! Rscript -e 'suppressPackageStartupMessages(library(readxl))' >/dev/null 2>&1; then
  echo "bench/peer.sh: the R package readxl is missing; install it: apt-get install -y r-cran-readxl" >&2
  exit 2
fi
if [ ! -x /usr/bin/time ]; then
  echo "bench/peer.sh: /usr/bin/time not found (needed for user time and peak RSS): apt-get install -y time" >&2
  exit 2
fi
if ! command -v python3 >/dev/null; then
  echo "bench/peer.sh: python3 not found (reads results.json): apt-get install -y python3" >&2
  exit 2
fi

tmp="$(mktemp -d)"
trap 'rm -rf "$tmp"' EXIT

# The launcher builds when the sources are newer than the jar, and the first run after a build
# writes the class-data archive; neither belongs in a cold run's time.
echo "== warm-up: ./meritbook run (builds if needed, writes the class-data archive)"
./meritbook run "$notebook" -o "$tmp/warm" >/dev/null
Rscript bench/peer.R "$workbook" "$tmp/warm/peer.pdf" >/dev/null

echo "== $runs cold runs each, alternating (other processes on the machine add noise)"
echo "load average before: $(cut -d' ' -f1-3 /proc/loadavg) on $(nproc) cores"
printf '%-4s %-10s %9s %9s %12s\n' run tool "wall s" "user s" "peak RSS MB"
for i in $(seq 1 "$runs"); do
  /usr/bin/time -f '%e %U %M' -o "$tmp/meritbook.$i.time" \
    ./meritbook run "$notebook" -o "$tmp/meritbook.$i" >/dev/null
  mkdir -p "$tmp/r.$i"
  /usr/bin/time -f '%e %U %M' -o "$tmp/r.$i.time" \
    Rscript bench/peer.R "$workbook" "$tmp/r.$i/peer.pdf" >"$tmp/r.$i/numbers.txt"
  for tool in meritbook r; do
    read -r wall user rss <"$tmp/$tool.$i.time"
    printf '%-4s %-10s %9.2f %9.2f %12.0f\n' "$i" "$tool" "$wall" "$user" "$((rss / 1024))"
  done
done

echo "load average after:  $(cut -d' ' -f1-3 /proc/loadavg)"

python3 - "$tmp" "$runs" "$tolerance" <<'PY'
import json, re, statistics, sys

tmp, runs, tolerance = sys.argv[1], int(sys.argv[2]), float(sys.argv[3])

def times(tool):
    rows = [open(f"{tmp}/{tool}.{i}.time").read().split() for i in range(1, runs + 1)]
    return [[float(v) for v in row[-3:]] for row in rows]

med = {}
for tool in ("meritbook", "r"):
    t = times(tool)
    med[tool] = [statistics.median(col) for col in zip(*t)]
print("== medians")
for tool, label in (("meritbook", "meritbook (whole dossier)"), ("r", "R peer (calibrations)")):
    wall, user, rss = med[tool]
    print(f"{label:27s} {wall:7.2f} s wall {user:7.2f} s user {rss / 1024:7.0f} MB peak RSS")
ratio = [m / r for m, r in zip(med["meritbook"], med["r"])]
print(f"ratio meritbook / R        {ratio[0]:7.2f} wall {ratio[1]:9.2f} user {ratio[2]:9.2f} peak RSS")

print(f"== cross-check: R peer against results.json (relative tolerance {tolerance:g})")
results = json.load(open(f"{tmp}/meritbook.{runs}/hmf-honey-validation/rev1/results.json"))
sections = {s["id"]: s for s in results["sections"]}
peer = {}
for line in open(f"{tmp}/r.{runs}/numbers.txt"):
    section, name, value = line.split()
    peer[(section, name)] = value
failures = 0

def verdict(ok):
    global failures
    failures += 0 if ok else 1
    return "PASS" if ok else "FAIL"

print(f"{'section':17s} {'quantity':19s} {'meritbook':>22s} {'R peer':>22s} {'rel. diff':>9s}")
chosen = sections["linearity"]["settings"]["Weighting"].split(" ")[0]
print(f"{'linearity':17s} {'weighting (auto)':19s} {chosen:>22s} {peer[('linearity', 'weighting')]:>22s}"
      f" {'':>9s}  {verdict(chosen == peer[('linearity', 'weighting')])}")
names = ["n", "slope", "intercept", "r_squared", "residual_sd", "lack_of_fit_f", "lack_of_fit_p",
         "slope_se", "intercept_se", "intercept_t", "intercept_p", "r", "anova_regression_f",
         "mandel_f", "mandel_p", "shapiro_w", "shapiro_p"]
for section in ("linearity", "unweighted-check"):
    q = sections[section]["quantities"]
    for name in names:
        ours, theirs = q[name]["value"], float(peer[(section, name)])
        relative = abs(ours - theirs) / abs(ours) if ours != 0 else abs(theirs)
        print(f"{section:17s} {name:19s} {ours:22.15g} {theirs:22.15g} {relative:9.1e}  {verdict(relative <= tolerance)}")
    slope = q["slope"]["ci"]
    for end, name in (("low", "slope_ci_low"), ("high", "slope_ci_high")):
        ours, theirs = slope[end], float(peer[(section, name)])
        relative = abs(ours - theirs) / abs(ours)
        print(f"{section:17s} {name:19s} {ours:22.15g} {theirs:22.15g} {relative:9.1e}  {verdict(relative <= tolerance)}")

pdf = open(f"{tmp}/r.{runs}/peer.pdf", "rb").read()
pages = len(re.findall(rb"/Type\s*/Page\b", pdf))
print(f"R peer's PDF: {pages} pages of figures (6 expected)  {verdict(pages == 6)}")
print("cross-check: " + ("every number agrees" if failures == 0 else f"{failures} FAILED"))
sys.exit(1 if failures else 0)
PY
