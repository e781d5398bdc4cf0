#!/usr/bin/env bash
# Times what the full kill matrix costs: a full first-order `changeling run` of commons-cli 1.11.0 that stops each
# mutant at its first failing test, then the same run with --every-test, one after the other on fresh copies (so both
# build the project with mvn), and prints both wall times, their ratio (target: at most 3), the size of the matrix
# (tests x mutants, kill pairs) and how many verdicts differ. Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/matrix.sh [extra changeling run options...]      e.g. --files '**/Option.java' for a quick check
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" MatrixFigures.java

# One untimed build so that both timed runs start from the same warm local repository.
(cd "$project" && { mvn -B -q -o test-compile >/dev/null 2>&1 || mvn -B -q test-compile >/dev/null; })
work="$repo_root/target/bench/matrix"
rm -rf "$work"
mkdir -p "$work"
for side in first-kill every-test; do
  cp -r "$project" "$work/$side"
  rm -rf "$work/$side/target/changeling"
done

# Runs the tool on one copy and prints its wall time in milliseconds; its output goes to ../SIDE.txt.
timed_run() {
  local side="$1"
  shift
  local start
  start=$(date +%s%N)
  (cd "$work/$side" && java -jar "$jar" run . --plain "$@" > "../$side.txt" 2>&1) || { cat "$work/$side.txt" >&2; exit 1; }
  echo $(( ($(date +%s%N) - start) / 1000000 ))
}

first_kill_ms=$(timed_run first-kill "$@")
every_test_ms=$(timed_run every-test --every-test "$@")

grep -E "^mutation score" "$work/first-kill.txt" "$work/every-test.txt" || true
java -cp "$jar:$classes" MatrixFigures "$work/first-kill/target/changeling/results.json" \
  "$work/every-test/target/changeling/results.json" "$first_kill_ms" "$every_test_ms"
