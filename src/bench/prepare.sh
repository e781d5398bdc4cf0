#!/usr/bin/env bash
# Shared by the benchmarks: checks that the tool's jar is built, makes sure commons-cli 1.11.0 is set
# up as a project, and compiles one benchmark class against the jar. Sourced, not run.
#
#   source src/bench/prepare.sh BenchmarkClass.java [--no-project]     (--no-project: leave commons-cli alone)
# sets: repo_root, jar, project, classes

repo_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$repo_root/target/changeling.jar"
project="$repo_root/target/bench/commons-cli"
classes="$repo_root/target/bench/classes"

if [[ ! -f "$jar" ]]; then
  echo "error: $jar is missing; build it first with: mvn -q package -DskipTests" >&2
  exit 1
fi
if [[ "${2:-}" != "--no-project" ]]; then
  "$repo_root/src/bench/commons-cli/setup.sh" "$project"
fi
rm -rf "$classes"
mkdir -p "$classes"
javac --release 17 -cp "$jar" -d "$classes" "$repo_root/src/bench/java/$1"
