#!/usr/bin/env bash
# Runs the JMH benchmarks of strategies/src/jmh/java (window moments, risk models, solvers).
#
#   bench/jmh.sh                      # every benchmark, short settings (for a table, not a paper)
#   bench/jmh.sh 'SolverBenchmark' -p n=500 -p risk=shrinkage
#
# Arguments are passed to JMH (a benchmark-name regular expression, -p param=value, -f, -i ...);
# without any, the short settings below apply. Results also go to bench-out/jmh-result.json.
# The benchmarks build only under the Maven profile `bench`, so the normal build and the tests
# never compile them.
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
cd "$root"
mvn -o -q -P bench -pl strategies -am test-compile -DskipTests
classpath="strategies/target/test-classes:strategies/target/classes:$(cat strategies/target/jmh-classpath.txt)"
mkdir -p bench-out
if [ "$#" -eq 0 ]; then
  set -- -f 1 -wi 2 -w 1s -i 3 -r 1s
fi
exec java -cp "$classpath" org.openjdk.jmh.Main -rf json -rff bench-out/jmh-result.json "$@"
