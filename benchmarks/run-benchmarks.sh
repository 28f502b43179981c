#!/usr/bin/env bash
# Runs Trundle's benchmark suite (JMH benchmarks with the GC profiler, the work-precision table and
# the long-run memory check) and writes benchmarks/results/*.json|md|txt plus benchmarks/RESULTS.md.
# Takes about 6 minutes on 2 cores. Override the JMH options with JMH_OPTS, the long run's step
# count with LONG_RUN_STEPS; set REBUILD=1 to rebuild the jar first.
set -euo pipefail
cd "$(dirname "$0")/.."
JAR=benchmarks/jmh/target/trundle-benchmarks.jar
OUT=benchmarks/results
JMH_OPTS=${JMH_OPTS:-"-f 1 -wi 3 -i 6 -w 1s -r 2s"}
LONG_RUN_STEPS=${LONG_RUN_STEPS:-10000000}
if [ ! -f "$JAR" ] || [ "${REBUILD:-0}" = 1 ]; then
  mvn -B -q package -pl benchmarks/jmh -am -DskipTests -Dmaven.javadoc.skip=true
fi
mkdir -p "$OUT"
START_LOAD=$(cut -d" " -f1-3 /proc/loadavg 2>/dev/null || echo unknown)
# shellcheck disable=SC2086
java -cp "$JAR" org.openjdk.jmh.Main $JMH_OPTS -prof gc -rf json -rff "$OUT/jmh.json" 'org\.trundle\.bench\..*' \
  | tee "$OUT/jmh.txt"
java -cp "$JAR" org.trundle.bench.WorkPrecision "$OUT/work-precision.md"
java -cp "$JAR" org.trundle.bench.SweepScaling | tee "$OUT/sweep.md"
java -Xmx64m -cp "$JAR" org.trundle.bench.LongRunMemoryCheck "$LONG_RUN_STEPS" | tee "$OUT/memory.txt"
java -cp "$JAR" org.trundle.bench.ResultsReport "$OUT/jmh.json" "$OUT/work-precision.md" "$OUT/memory.txt" \
  "benchmarks/run-benchmarks.sh (JMH_OPTS=\"$JMH_OPTS\", LONG_RUN_STEPS=$LONG_RUN_STEPS)" "$START_LOAD" \
  > benchmarks/RESULTS.md
{ echo; echo "## Sweep"; echo; cat "$OUT/sweep.md"; } >> benchmarks/RESULTS.md
# hand-measured figures (start-up with hyperfine, tolerance counts, profiles), kept across runs
if [ -f "$OUT/round-two.md" ]; then { echo; cat "$OUT/round-two.md"; } >> benchmarks/RESULTS.md; fi
echo "wrote benchmarks/RESULTS.md and $OUT/"
