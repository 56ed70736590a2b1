#!/usr/bin/env bash
# Times one 24-point sweep on an invented universe written by the sample generator, in-process
# and on Apache Spark local[2] (through Spark's own launcher class, as spark-submit runs it),
# each several times from a fresh output folder, and checks that both engines wrote the same
# bytes.
#
#   bench/sweep.sh                         # 500 assets x 2,000 daily rows, 3 repeats per engine
#   bench/sweep.sh --assets 300 --repeats 1
#
# Options:
#   --assets N     invented companies (default 500)
#   --days N       daily rows (default 2000)
#   --repeats N    timed runs per engine (default 3)
#   --heap SIZE    maximum Java heap, as for -Xmx (default 2g)
#   --work DIR     folder for data, study, sweep and outputs (default: a new temporary folder)
#   --jar FILE     the runnable jar to time (default reports/target/sigmawalk.jar, built if missing)
#
# The grid: cost 5, 10, 20 bps x rebalance every 42 or 63 rows x window 250 or 500 x upper
# bound 2 % or 5 % on the single-index strategy (3 x 2 x 2 x 2 = 24 points), two long-only
# minimum-variance strategies (single-index and sample covariance) per point.
# Spark's jars come from the local Maven repository (the build's provided dependency).
set -euo pipefail

assets=500
days=2000
repeats=3
heap=2g
work=
jar=
while [ "$#" -gt 0 ]; do
  case "$1" in
    --assets) assets=$2; shift 2 ;;
    --days) days=$2; shift 2 ;;
    --repeats) repeats=$2; shift 2 ;;
    --heap) heap=$2; shift 2 ;;
    --work) work=$2; shift 2 ;;
    --jar) jar=$2; shift 2 ;;
    -h|--help) sed -n '2,22p' "$0"; exit 0 ;;
    *) echo "unknown option '$1' (see --help)" >&2; exit 2 ;;
  esac
done

root=$(cd "$(dirname "$0")/.." && pwd)
generator_classes="$root/sample-universe/target/classes"
if [ -z "$jar" ]; then
  jar="$root/reports/target/sigmawalk.jar"
fi
if [ ! -f "$jar" ]; then
  (cd "$root" && mvn -o -q package -DskipTests)
fi
if [ ! -f "$generator_classes/dev/sigmawalk/sample/UniverseGenerator.class" ]; then
  (cd "$root" && mvn -o -q -pl sample-universe compile)
fi
if [ -z "$work" ]; then
  work=$(mktemp -d "${TMPDIR:-/tmp}/sigmawalk-sweep-bench.XXXXXX")
fi
mkdir -p "$work"
spark_cp="$work/spark.classpath"
if [ ! -s "$spark_cp" ]; then
  # The listing also names the project's own modules in the local repository, which may be
  # stale: only the jar under test may supply sigmawalk's classes.
  (cd "$root" && mvn -o -q -pl reports -am dependency:build-classpath -Dmdep.includeScope=provided \
      -Dmdep.outputFile="$spark_cp.all" > /dev/null)
  tr ':' '\n' < "$spark_cp.all" | grep -v '/dev/sigmawalk/' | paste -sd: > "$spark_cp"
fi

data="$work/data"
if [ ! -f "$data/assets-daily.csv" ]; then
  java -cp "$generator_classes" dev.sigmawalk.sample.UniverseGenerator \
      --into "$data" --companies "$assets" --trading-days "$days"
fi
cat > "$work/base.yaml" <<YAML
title: Sweep timing case, $assets invented companies, $days daily rows
data:
  assets: data/assets-daily.csv
  values: returns
  market: data/market-daily.csv
  riskfree: data/riskfree-daily.csv
  periods_per_year: 261
walkforward:
  windows: [250]
  rebalance_every: 63
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
YAML
cat > "$work/sweep.yaml" <<YAML
title: Sweep timing case, 24 points
study: base.yaml
vary:
  walkforward.cost_bps: [5, 10, 20]
  walkforward.rebalance_every: [42, 63]
  walkforward.windows: [[250], [500]]
  strategies.index-minvar.bounds: [[0, 0.02], [0, 0.05]]
YAML

median() { sort -n | awk '{ v[NR] = $1 } END { if (NR % 2) print v[(NR + 1) / 2]; else printf "%.1f\n", (v[NR / 2] + v[NR / 2 + 1]) / 2 }'; }

run_case() {  # engine repeat
  local out="$work/out-$1-$2"
  rm -rf "$out"
  local load; load=$(cut -d' ' -f1-3 /proc/loadavg)
  local start; start=$(date +%s.%N)
  if [ "$1" = in-process ]; then
    java "-Xmx$heap" -jar "$jar" sweep "$work/sweep.yaml" --out "$out" --quiet > /dev/null
  else
    java "-Xmx$heap" -cp "$(cat "$spark_cp"):$jar" org.apache.spark.deploy.SparkSubmit \
        --master 'local[2]' --conf spark.ui.enabled=false --driver-memory "$heap" \
        --class dev.sigmawalk.reports.cli.SigmawalkCommand \
        "$jar" sweep "$work/sweep.yaml" --out "$out" --quiet > /dev/null 2> "$work/spark-$2.log"
  fi
  local end; end=$(date +%s.%N)
  awk -v a="$start" -v b="$end" 'BEGIN { printf "%.1f\n", b - a }' > "$work/time-$1-$2"
  echo "$1 run $2: $(cat "$work/time-$1-$2") s wall (load average before: $load)"
}

for r in $(seq 1 "$repeats"); do
  run_case in-process "$r"
  run_case spark "$r"
done

inproc=$(cat "$work"/time-in-process-* | median)
spark=$(cat "$work"/time-spark-* | median)
echo "case:      24 points, $assets assets x $days rows, 2 strategies a point"
echo "machine:   $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ *//')"
echo "median:    in-process $inproc s, Spark local[2] $spark s"
awk -v a="$inproc" -v b="$spark" 'BEGIN { printf "overhead:  Spark takes %.1f s (%.0f %%) more\n", b - a, 100 * (b - a) / a }'
cmp "$work/out-in-process-1/sweep.csv" "$work/out-spark-1/sweep.csv" && echo "sweep.csv: identical across engines"
(cd "$work/out-in-process-1/points" && find . -name '*.csv' | sort) > "$work/csv-files"
while read -r f; do
  cmp -s "$work/out-in-process-1/points/$f" "$work/out-spark-1/points/$f" || { echo "differs: points/$f"; exit 1; }
done < "$work/csv-files"
echo "points:    $(wc -l < "$work/csv-files") CSV files byte-identical across engines"
echo "outputs in: $work"
