#!/usr/bin/env bash
# Times one study end to end: `sigmawalk run` on an invented universe written by the sample
# generator, with long-only minimum variance (bounds [0, 0.02]) under the single-index, sample
# and shrinkage (single-index target) models, rebalanced every 21 rows.
#
#   bench/end-to-end.sh                                   # 500 assets x 3,000 days, windows 500, 1000
#   bench/end-to-end.sh --assets 2000 --days 5000 --windows 250,500,1000,2000 --heap 12g
#
# Options:
#   --assets N        invented companies (default 500)
#   --days N          daily rows (default 3000)
#   --windows LIST    window lengths, comma-separated (default 500,1000)
#   --heap SIZE       maximum Java heap, as for -Xmx (default 2g)
#   --work DIR        folder for the data, the study and the outputs (default: a new temporary folder)
#   --rebuild         rebuild the jar even when reports/target/sigmawalk.jar exists
#
# Prints the wall time and the peak resident memory of the run (from /usr/bin/time -v when it is
# installed; otherwise the wall time only). The generator's data are invented and seeded, so
# every run of the same options measures the same study.
set -euo pipefail

assets=500
days=3000
windows=500,1000
heap=2g
work=
rebuild=no
while [ "$#" -gt 0 ]; do
  case "$1" in
    --assets) assets=$2; shift 2 ;;
    --days) days=$2; shift 2 ;;
    --windows) windows=$2; shift 2 ;;
    --heap) heap=$2; shift 2 ;;
    --work) work=$2; shift 2 ;;
    --rebuild) rebuild=yes; shift ;;
    -h|--help) sed -n '2,20p' "$0"; exit 0 ;;
    *) echo "unknown option '$1' (see --help)" >&2; exit 2 ;;
  esac
done

root=$(cd "$(dirname "$0")/.." && pwd)
jar="$root/reports/target/sigmawalk.jar"
generator_classes="$root/sample-universe/target/classes"

if [ "$rebuild" = yes ] || [ ! -f "$jar" ]; then
  echo "building the jar (mvn -o -q package -DskipTests)"
  (cd "$root" && mvn -o -q package -DskipTests)
fi
if [ ! -f "$generator_classes/dev/sigmawalk/sample/UniverseGenerator.class" ]; then
  (cd "$root" && mvn -o -q -pl sample-universe compile)
fi

if [ -z "$work" ]; then
  work=$(mktemp -d "${TMPDIR:-/tmp}/sigmawalk-bench.XXXXXX")
fi
mkdir -p "$work"
data="$work/data"
if [ ! -f "$data/assets-daily.csv" ]; then
  echo "generating $assets invented companies x $days days into $data"
  java -cp "$generator_classes" dev.sigmawalk.sample.UniverseGenerator \
      --into "$data" --companies "$assets" --trading-days "$days"
fi

study="$work/study.yaml"
cat > "$study" <<EOF
title: Timing case, $assets invented companies, $days daily rows
data:
  assets: data/assets-daily.csv
  values: returns
  market: data/market-daily.csv
  riskfree: data/riskfree-daily.csv
  periods_per_year: 261
walkforward:
  windows: [${windows//,/, }]
  rebalance_every: 21
  cost_bps: 10
strategies:
  - name: index-minvar
    risk: single-index
    objective: min-variance
    bounds: [0, 0.02]
  - name: sample-minvar
    risk: sample
    objective: min-variance
    bounds: [0, 0.02]
  - name: shrunk-minvar
    risk: shrinkage
    shrinkage_target: single-index
    objective: min-variance
    bounds: [0, 0.02]
output: out
EOF

out="$work/out"
rm -rf "$out"
timing="$work/time.txt"
echo "running: java -Xmx$heap -jar reports/target/sigmawalk.jar run $study --out $out --quiet"
start=$(date +%s.%N)
if [ -x /usr/bin/time ]; then
  /usr/bin/time -v -o "$timing" java "-Xmx$heap" -jar "$jar" run "$study" --out "$out" --quiet
else
  java "-Xmx$heap" -jar "$jar" run "$study" --out "$out" --quiet
fi
end=$(date +%s.%N)

echo "case:        $assets assets x $days rows, windows [$windows], 3 models, rebalance every 21 rows"
echo "machine:     $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ *//'), load average $(cut -d' ' -f1-3 /proc/loadavg)"
awk -v a="$start" -v b="$end" 'BEGIN { printf "wall time:   %.1f s\n", b - a }'
if [ -f "$timing" ]; then
  rss_kb=$(grep 'Maximum resident set size' "$timing" | awk '{print $NF}')
  awk -v k="$rss_kb" -v h="$heap" 'BEGIN { printf "peak memory: %.0f MiB resident (heap limit %s)\n", k / 1024, h }'
  grep -E 'User time|System time' "$timing" | sed 's/^\s*/             /'
fi
echo "rebalances:  $(($(wc -l < "$out/rebalances.csv") - 1)) rows in $out/rebalances.csv"
echo "outputs in:  $out"
