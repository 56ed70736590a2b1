#!/usr/bin/env bash
# Times data intake on a large wide CSV: `sigmawalk check` (a cold JVM that reads the study and
# every data file and runs every intake check) and the data load alone inside one warm JVM.
#
#   bench/intake.sh                          # 2,000 invented companies x 8,000 days (about 200 MB)
#   bench/intake.sh --assets 500 --days 3000 --runs 7
#
# Options:
#   --assets N   invented companies (default 2000)
#   --days N     daily rows (default 8000)
#   --runs N     timed runs of each kind; the median is printed (default 5)
#   --work DIR   folder for the data and the study (default: a new temporary folder)
#
# The heap is capped at twice the assets file's size, so a run that finishes shows that intake
# fits in that much memory; peak resident memory comes from /usr/bin/time -v when installed.
set -euo pipefail

assets=2000
days=8000
runs=5
work=
while [ "$#" -gt 0 ]; do
  case "$1" in
    --assets) assets=$2; shift 2 ;;
    --days) days=$2; shift 2 ;;
    --runs) runs=$2; shift 2 ;;
    --work) work=$2; shift 2 ;;
    -h|--help) sed -n '2,16p' "$0"; exit 0 ;;
    *) echo "unknown option '$1' (see --help)" >&2; exit 2 ;;
  esac
done

root=$(cd "$(dirname "$0")/.." && pwd)
jar="$root/reports/target/sigmawalk.jar"
if [ ! -f "$jar" ] || [ ! -f "$root/engine/target/test-classes/dev/sigmawalk/engine/data/IntakeTiming.class" ]; then
  echo "building (mvn -o -q package -DskipTests)"
  (cd "$root" && mvn -o -q package -DskipTests)
fi
if [ ! -f "$root/sample-universe/target/classes/dev/sigmawalk/sample/UniverseGenerator.class" ]; then
  (cd "$root" && mvn -o -q -pl sample-universe compile)
fi

if [ -z "$work" ]; then
  work=$(mktemp -d "${TMPDIR:-/tmp}/sigmawalk-intake.XXXXXX")
fi
mkdir -p "$work"
if [ ! -f "$work/data/assets-daily.csv" ]; then
  echo "generating $assets invented companies x $days days into $work/data"
  java -cp "$root/sample-universe/target/classes" dev.sigmawalk.sample.UniverseGenerator \
      --into "$work/data" --companies "$assets" --trading-days "$days"
fi
cat > "$work/study.yaml" <<YAML
title: Intake timing, $assets invented companies x $days days
data:
  assets: data/assets-daily.csv
  values: returns
  market: data/market-daily.csv
  riskfree: data/riskfree-daily.csv
  periods_per_year: 261
walkforward:
  windows: [250]
  rebalance_every: 21
strategies:
  - name: equal
    objective: equal-weight
YAML

bytes=$(stat -c %s "$work/data/assets-daily.csv")
heap_mb=$(( 2 * bytes / 1048576 ))
echo "file:        $work/data/assets-daily.csv, $(( bytes / 1048576 )) MiB; heap limit -Xmx${heap_mb}m (twice the file)"
echo "machine:     $(nproc) cores, load average $(cut -d' ' -f1-3 /proc/loadavg) before the runs"

times=()
for i in $(seq "$runs"); do
  start=$(date +%s.%N)
  if [ -x /usr/bin/time ]; then
    /usr/bin/time -v -o "$work/time-$i.txt" java "-Xmx${heap_mb}m" -jar "$jar" check "$work/study.yaml" > "$work/check.txt"
  else
    java "-Xmx${heap_mb}m" -jar "$jar" check "$work/study.yaml" > "$work/check.txt"
  fi
  end=$(date +%s.%N)
  times+=("$(awk -v a="$start" -v b="$end" 'BEGIN { printf "%.2f", b - a }')")
done
median=$(printf '%s\n' "${times[@]}" | sort -n | awk '{ a[NR] = $1 } END { print a[int((NR + 1) / 2)] }')
echo "check:       median ${median} s wall over $runs cold runs (${times[*]})"
if [ -x /usr/bin/time ]; then
  rss=$(grep -h 'Maximum resident set size' "$work"/time-*.txt | awk '{print $NF}' | sort -n | tail -1)
  awk -v k="$rss" 'BEGIN { printf "peak memory: %.0f MiB resident at most, over the check runs\n", k / 1024 }'
  cpu=$(for f in "$work"/time-*.txt; do
      awk '/User time/ { u = $NF } /System time/ { s = $NF } END { printf "%.2f\n", u + s }' "$f"; done | sort -n \
      | awk '{ a[NR] = $1 } END { print a[int((NR + 1) / 2)] }')
  echo "check cpu:   median ${cpu} s user + system (all threads; the wall time above includes waiting on a busy machine)"
fi
java "-Xmx${heap_mb}m" -cp "$jar:$root/engine/target/test-classes" dev.sigmawalk.engine.data.IntakeTiming \
    "$work/study.yaml" "$runs" | tail -1 | sed 's/^/warm JVM:    /'
echo "machine:     load average $(cut -d' ' -f1-3 /proc/loadavg) after the runs"
