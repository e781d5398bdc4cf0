#!/usr/bin/env bash
# Measures first-order mutant generation on the main sources of commons-cli 1.11.0, single-threaded,
# and prints lines and mutants per second. Builds nothing of the tool: it uses target/changeling.jar.
#
#   src/bench/generation.sh [WARMUP_ITERATIONS] [MEASURED_ITERATIONS]     (defaults: 20 10)
set -euo pipefail

repo_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$repo_root/target/changeling.jar"
project="$repo_root/target/bench/commons-cli"
classes="$repo_root/target/bench/classes"

if [[ ! -f "$jar" ]]; then
  echo "error: $jar is missing; build it first with: mvn -q package -DskipTests" >&2
  exit 1
fi
"$repo_root/src/bench/commons-cli/setup.sh" "$project"

rm -rf "$classes"
mkdir -p "$classes"
javac --release 17 -cp "$jar" -d "$classes" "$repo_root/src/bench/java/GenerationBenchmark.java"
java -cp "$jar:$classes" GenerationBenchmark "$project" "${1:-20}" "${2:-10}"
