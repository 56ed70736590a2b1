#!/usr/bin/env bash
# Size-and-power benchmark of the tests the tool reports (residual diagnostics, difference tests,
# the family correction): empirical 5 % rejection rates under iid normal, t5 and GARCH(1,1) nulls
# at the demo studies' sizes, and power at one stated alternative. Prints Markdown tables.
#
#   bench/size-power.sh              # the draw counts of the developer guide's table
#   bench/size-power.sh 0.2          # a fifth of the draws, for a quick look
#   bench/size-power.sh 1.0 12345    # another seed
#
# The simulation lives in engine/src/test/java (dev.sigmawalk.engine.evidence.SizeAndPower), beside
# the unit guard that runs a few hundred draws in the normal build.
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
cd "$root"
mvn -o -q -pl engine test-compile dependency:build-classpath -Dmdep.outputFile=target/size-power-classpath.txt
classpath="engine/target/test-classes:engine/target/classes:$(cat engine/target/size-power-classpath.txt)"
exec java -Xmx1g -cp "$classpath" dev.sigmawalk.engine.evidence.SizeAndPower "$@"
