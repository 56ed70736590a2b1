#!/usr/bin/env bash
# Times one study end to end: `sigmawalk run` on an invented universe written by the sample
# generator, with long-only minimum variance under the single-index, sample and shrinkage
# (single-index target) models.
#
#   bench/end-to-end.sh                          # the research case (below)
#   bench/end-to-end.sh --case large             # 2,000 assets x 5,000 days
#   bench/end-to-end.sh --case broad             # 10,000 assets, monthly, 30 years
#   bench/end-to-end.sh --case intake            # reading a 200 MB wide CSV
#   bench/end-to-end.sh --case research --jar /tmp/old/sigmawalk.jar --work /tmp/w   # another build, same data
#
# Cases (each sets the options below; options given after --case override it):
#   research  500 assets x 3,000 daily rows, windows [500, 1000], bounds [0, 0.02], every 21 rows, -Xmx2g
#   large     2,000 assets x 5,000 daily rows, windows [250, 500, 1000, 2000], bounds [0, 0.02],
#             every 21 rows, -Xmx4g
#   broad     10,000 assets, 360 month-end rows (30 years; the generator's monthly file of
#             7,830 daily rows), windows [60, 120], bounds [0, 0.01], every row, -Xmx7g
#   intake    2,000 assets x 8,000 daily rows (a 200 MB wide CSV), one window [250], bounds
#             [0, 0.02], every 2,000 rows (4 rebalances), -Xmx3g: the manifest's read_and_check
#             seconds are the figure
#
# Options:
#   --case NAME       one of the cases above (default research)
#   --assets N        invented companies
#   --days N          daily rows the generator writes
#   --frequency F     daily or monthly: which of the generator's files the study reads
#   --windows LIST    window lengths, comma-separated
#   --bounds LO,HI    weight bounds of every strategy
#   --every N         rebalance every N rows
#   --heap SIZE       maximum Java heap, as for -Xmx
#   --threads N       worker threads of the run (default: all cores)
#   --jar PATH        time this jar instead of reports/target/sigmawalk.jar (an older build, say)
#   --work DIR        folder for the data, the study and the outputs (default: a new temporary
#                     folder); data already there are reused
#   --rebuild         rebuild the jar even when reports/target/sigmawalk.jar exists
#   --reruns N        afterwards, also time N reruns in one process: `sigmawalk watch --stop-after N+1`
#                     while the study file is touched every half second; prints each run's own time
#   --peer            afterwards, also time the numpy implementation of the same study on the same
#                     data (bench/peer/walk.py, python3 with numpy and scipy; outputs in DIR/peer-out;
#                     --threads N gives it N processes of one BLAS thread) and check with agree.py
#                     that its weights and returns equal the run's to 1e-9 (a speed yardstick only)
#
# Prints the wall time, the peak resident memory and the CPU time of the run (from
# /usr/bin/time -v when it is installed; otherwise the wall time only), the load average before
# and after, and the phases the manifest records. The generator's data are invented and seeded,
# so every run of the same options measures the same study.
set -euo pipefail

case_name=research
jar=
work=
rebuild=no
threads=
reruns=0
peer=no
args=("$@")
for ((k = 0; k < ${#args[@]}; k++)); do
  if [ "${args[$k]}" = --case ]; then case_name=${args[$((k + 1))]:-}; fi
done
case "$case_name" in
  research) assets=500; days=3000; frequency=daily; windows=500,1000; bounds=0,0.02; every=21; heap=2g ;;
  large) assets=2000; days=5000; frequency=daily; windows=250,500,1000,2000; bounds=0,0.02; every=21; heap=4g ;;
  broad) assets=10000; days=7830; frequency=monthly; windows=60,120; bounds=0,0.01; every=1; heap=7g ;;
  intake) assets=2000; days=8000; frequency=daily; windows=250; bounds=0,0.02; every=2000; heap=3g ;;
  *) echo "unknown case '$case_name' (research, large, broad or intake)" >&2; exit 2 ;;
esac
while [ "$#" -gt 0 ]; do
  case "$1" in
    --case) shift 2 ;;
    --assets) assets=$2; shift 2 ;;
    --days) days=$2; shift 2 ;;
    --frequency) frequency=$2; shift 2 ;;
    --windows) windows=$2; shift 2 ;;
    --bounds) bounds=$2; shift 2 ;;
    --every) every=$2; shift 2 ;;
    --heap) heap=$2; shift 2 ;;
    --threads) threads=$2; shift 2 ;;
    --jar) jar=$2; shift 2 ;;
    --work) work=$2; shift 2 ;;
    --rebuild) rebuild=yes; shift ;;
    --reruns) reruns=$2; shift 2 ;;
    --peer) peer=yes; shift ;;
    -h|--help) sed -n '2,46p' "$0"; exit 0 ;;
    *) echo "unknown option '$1' (see --help)" >&2; exit 2 ;;
  esac
done
case "$frequency" in
  daily) periods=261 ;;
  monthly) periods=12 ;;
  *) echo "frequency must be daily or monthly, not '$frequency'" >&2; exit 2 ;;
esac
lower=${bounds%%,*}
upper=${bounds##*,}

root=$(cd "$(dirname "$0")/.." && pwd)
generator_classes="$root/sample-universe/target/classes"

if [ -z "$jar" ] && { [ "$rebuild" = yes ] || [ ! -f "$root/reports/target/sigmawalk.jar" ]; }; then
  echo "building the jar (mvn -o -q package -DskipTests)"
  (cd "$root" && mvn -o -q package -DskipTests)
fi
jar=${jar:-$root/reports/target/sigmawalk.jar}
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
title: Timing case, $assets invented companies, $frequency rows of $days generated days
data:
  assets: data/assets-$frequency.csv
  values: returns
  market: data/market-$frequency.csv
  riskfree: data/riskfree-$frequency.csv
  periods_per_year: $periods
walkforward:
  windows: [${windows//,/, }]
  rebalance_every: $every
  cost_bps: 10
strategies:
  - name: index-minvar
    risk: single-index
    objective: min-variance
    bounds: [$lower, $upper]
  - name: sample-minvar
    risk: sample
    objective: min-variance
    bounds: [$lower, $upper]
  - name: shrunk-minvar
    risk: shrinkage
    shrinkage_target: single-index
    objective: min-variance
    bounds: [$lower, $upper]
output: out
EOF

out="$work/out"
rm -rf "$out"
timing="$work/time.txt"
thread_option=()
if [ -n "$threads" ]; then thread_option=(--threads "$threads"); fi
load_before=$(cut -d' ' -f1-3 /proc/loadavg)
echo "running: java -Xmx$heap -jar $jar run $study --out $out --quiet ${thread_option[*]}"
start=$(date +%s.%N)
if [ -x /usr/bin/time ]; then
  /usr/bin/time -v -o "$timing" java "-Xmx$heap" -jar "$jar" run "$study" --out "$out" --quiet "${thread_option[@]}"
else
  java "-Xmx$heap" -jar "$jar" run "$study" --out "$out" --quiet "${thread_option[@]}"
fi
end=$(date +%s.%N)

echo "case:        $case_name: $assets assets, $frequency rows of $days generated days, windows [$windows], bounds [$bounds], 3 models, rebalance every $every rows"
echo "machine:     $(nproc) cores, $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ *//')"
echo "load:        $load_before before, $(cut -d' ' -f1-3 /proc/loadavg) after"
awk -v a="$start" -v b="$end" 'BEGIN { printf "wall time:   %.1f s\n", b - a }'
if [ -f "$timing" ]; then
  rss_kb=$(grep 'Maximum resident set size' "$timing" | awk '{print $NF}')
  awk -v k="$rss_kb" -v h="$heap" 'BEGIN { printf "peak memory: %.0f MiB resident (heap limit %s)\n", k / 1024, h }'
  grep -E 'User time|System time' "$timing" | sed 's/^\s*/             /'
fi
if [ -f "$out/manifest.json" ]; then
  echo "phases (s):  $(tr -d '\n' < "$out/manifest.json" | grep -o '"seconds" *: *{[^}]*}' | sed 's/"seconds" *: *//; s/  */ /g')"
fi
echo "rebalances:  $(($(wc -l < "$out/rebalances.csv") - 1)) rows in $out/rebalances.csv"
echo "outputs in:  $out"

if [ "$reruns" -gt 0 ]; then
  # Each save of the study file starts the next run once the one under way is done; the watch
  # prints every run's own time (from its start to its published outputs, without the waiting).
  (while sleep 0.5; do touch "$study"; done) &
  toucher=$!
  trap 'kill $toucher 2>/dev/null' EXIT
  load_before=$(cut -d' ' -f1-3 /proc/loadavg)
  times=$(java "-Xmx$heap" -jar "$jar" watch "$study" --out "$out" --quiet "${thread_option[@]}" \
      --stop-after $((reruns + 1)) | sed -n 's/.* in \([0-9.]*\) s$/\1/p')
  kill $toucher 2>/dev/null
  first=$(echo "$times" | head -1)
  rest=$(echo "$times" | tail -n +2 | tr '\n' ' ')
  median=$(echo "$times" | tail -n +2 | sort -n | awk '{v[NR]=$1} END {print (NR % 2) ? v[(NR+1)/2] : (v[NR/2] + v[NR/2+1]) / 2}')
  echo "watch:       first run $first s; reruns $rest(median $median s); load $load_before before, $(cut -d' ' -f1-3 /proc/loadavg) after"
fi

if [ "$peer" = yes ]; then
  # The same study in numpy (see DEVELOPERS.md, "A numpy yardstick"): same data, windows, step,
  # bounds and cost; --threads, when given, sets its worker processes, one BLAS thread each.
  peer_out="$work/peer-out"
  peer_timing="$work/peer-time.txt"
  rm -rf "$peer_out"
  jobs_option=()
  blas_threads=()
  if [ -n "$threads" ]; then jobs_option=(--jobs "$threads"); blas_threads=(env OPENBLAS_NUM_THREADS=1); fi
  peer_command=("${blas_threads[@]}" python3 "$root/bench/peer/walk.py" "$data" --frequency "$frequency" --windows "$windows"
      --every "$every" --bounds "$bounds" --cost-bps 10 --out "$peer_out" "${jobs_option[@]}")
  load_before=$(cut -d' ' -f1-3 /proc/loadavg)
  echo "running:     ${peer_command[*]}"
  start=$(date +%s.%N)
  if [ -x /usr/bin/time ]; then
    /usr/bin/time -v -o "$peer_timing" "${peer_command[@]}"
  else
    "${peer_command[@]}"
  fi
  end=$(date +%s.%N)
  echo "peer load:   $load_before before, $(cut -d' ' -f1-3 /proc/loadavg) after"
  awk -v a="$start" -v b="$end" 'BEGIN { printf "peer wall:   %.1f s\n", b - a }'
  if [ -f "$peer_timing" ]; then
    rss_kb=$(grep 'Maximum resident set size' "$peer_timing" | awk '{print $NF}')
    awk -v k="$rss_kb" 'BEGIN { printf "peer memory: %.0f MiB resident\n", k / 1024 }'
    grep -E 'User time|System time' "$peer_timing" | sed 's/^\s*/             /'
  fi
  python3 "$root/bench/peer/agree.py" "$peer_out/weights.csv" "$out/weights.csv" --returns
fi
