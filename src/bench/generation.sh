#!/usr/bin/env bash
# Measures first-order mutant generation on the main sources of commons-cli 1.11.0, single-threaded,
# and prints lines and mutants per second. Builds nothing of the tool: it uses target/changeling.jar.
#
#   src/bench/generation.sh [WARMUP_ITERATIONS] [MEASURED_ITERATIONS]     (defaults: 20 10)
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" GenerationBenchmark.java

java -cp "$jar:$classes" GenerationBenchmark "$project" "${1:-20}" "${2:-10}"
