#!/usr/bin/env bash
# Smoke run of the JMH benchmarks, for CI: builds the library into the local Maven repository,
# packages benchmarks/target/benchmarks.jar and runs every benchmark once, briefly. Each
# benchmark's setup verifies that the implementations agree before anything is timed.
# Exits non-zero if the build, a verification or a benchmark fails (-foe true).
# The timings of a smoke run mean nothing; see README.md for the full measurement.
# Set ADVECTA_SKIP_INSTALL=1 when the library is already installed.
set -euo pipefail
cd "$(dirname "$0")/.."
if [ "${ADVECTA_SKIP_INSTALL:-0}" != 1 ]; then
  mvn -B -q install -DskipTests
fi
mvn -B -q -f benchmarks/pom.xml package
SMOKE="-foe true -f 1 -wi 1 -i 1 -w 200ms -r 200ms"
if [ $# -gt 0 ]; then
  java -jar benchmarks/target/benchmarks.jar $SMOKE "$@"
else
  # ConvolutionPerformance's direct sum takes minutes per call at its larger sizes: smoke it
  # at its smallest size only
  java -jar benchmarks/target/benchmarks.jar $SMOKE -e ConvolutionPerformance
  java -jar benchmarks/target/benchmarks.jar $SMOKE -p size=1000 ConvolutionPerformance
fi
