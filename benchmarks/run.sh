#!/usr/bin/env bash
# Runs the JMH benchmarks and prints the tables of docs/performance.md.
#   benchmarks/run.sh quick   a few minutes on 2 cores: 1 fork, short warm-up and measurement
#   benchmarks/run.sh full    the figures published in docs/performance.md
#   benchmarks/run.sh quick Decoder -prof gc   extra arguments go to JMH (a benchmark regex first)
# Build first, from the repository root: mvn -B -q package -DskipTests
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
jar="$here/target/benchmarks.jar"
mode="${1:-quick}"
shift || true
[[ -f "$jar" ]] || { echo "missing $jar: run 'mvn -B -q package -DskipTests' in $(dirname "$here") first" >&2; exit 1; }
case "$mode" in
  quick) timing=(-f 1 -wi 2 -i 3 -w 1s -r 1s) ;;
  full)  timing=(-f 2 -wi 5 -i 5 -w 2s -r 2s) ;;
  *) echo "usage: $0 quick|full [benchmark regex] [JMH options]" >&2; exit 2 ;;
esac
filter=".*Benchmark"
if [[ $# -gt 0 && "$1" != -* ]]; then filter="$1"; shift; fi
out="$here/target/jmh-$mode.json"
# single-shot training runs take their warm-up and measurement counts from the same options;
# the heap settings are the same for every fork so that no benchmark is favoured
java -jar "$jar" "$filter" "${timing[@]}" -jvmArgs "-Xms1g -Xmx1g" -foe true -rf json -rff "$out" "$@"
echo
# JOL sizes records through the instrumentation agent it attaches to its own JVM
java -Djdk.attach.allowAttachSelf=true -Xms1g -Xmx1g -cp "$jar" org.wordclass.benchmarks.ModelHeap
echo
java -cp "$jar" org.wordclass.benchmarks.Report "$out"
