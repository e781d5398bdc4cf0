#!/usr/bin/env bash
# Times, in one go, a plain `mvn -q test` of commons-cli 1.11.0 and a full first-order
# `changeling run` of it, and prints both, their ratio, mutants per second, where the run's time
# went, and the engine's own overhead. Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/run.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" RunFigures.java

cd "$project"
# One untimed build so that both timed commands start from the same warm local repository.
mvn -B -q -o test-compile >/dev/null 2>&1 || mvn -B -q test-compile >/dev/null

start=$(date +%s%N)
mvn -B -q -o test >/dev/null
maven_ms=$(( ($(date +%s%N) - start) / 1000000 ))

# A cold run: nothing kept from an earlier one (Maven's answers, the schema, verdicts).
rm -rf target/changeling
start=$(date +%s%N)
java -jar "$jar" run . --plain "$@" > target/changeling-run.txt 2>&1 || { cat target/changeling-run.txt; exit 1; }
run_ms=$(( ($(date +%s%N) - start) / 1000000 ))

grep -E "^(mutation score|  (maven|mutants|compiled|baseline|[0-9]+ workers started)[:;])" target/changeling-run.txt || true
java -cp "$jar:$classes" RunFigures target/changeling/results.json "$maven_ms" "$run_ms"
