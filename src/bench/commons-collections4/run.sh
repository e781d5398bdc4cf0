#!/usr/bin/env bash
# Times, in one go, a plain `mvn -q test` of commons-collections4 4.5.0 and `changeling run --sample 60 --seed 1`
# of it, and prints both and their ratio (target <= 1.5), the run's phases and engine overhead, and the baseline
# phase beside Surefire's own test time for the same suite, the sum of its reports' suite times (target <= 0.6).
# Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/commons-collections4/run.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/../prepare.sh" RunFigures.java --no-project
project="$repo_root/target/bench/commons-collections4"
"$repo_root/src/bench/commons-collections4/setup.sh" "$project"

cd "$project"
# One untimed build so that both timed commands start from the same warm local repository.
mvn -B -q -o test-compile >/dev/null 2>&1 || mvn -B -q test-compile >/dev/null

rm -rf target/surefire-reports
start=$(date +%s%N)
mvn -B -q -o test >/dev/null
maven_ms=$(( ($(date +%s%N) - start) / 1000000 ))
# Surefire's own time for the tests: the time of every test suite it reported, added up.
surefire_ms=$(cat target/surefire-reports/TEST-*.xml | grep -o '<testsuite [^>]*' \
  | grep -o ' time="[0-9.,]*"' | tr -d ', ' | sed 's/time=//; s/"//g' | awk '{ s += $1 } END { printf "%d", s * 1000 }')

# A cold run: nothing kept from an earlier one (Maven's answers, the schema, verdicts).
rm -rf target/changeling
start=$(date +%s%N)
java -jar "$jar" run . --plain --sample 60 --seed 1 "$@" > target/changeling-run.txt 2>&1 || { cat target/changeling-run.txt; exit 1; }
run_ms=$(( ($(date +%s%N) - start) / 1000000 ))

grep -E "^(mutation score|  (maven|mutants|compiled|baseline|[0-9]+ workers started)[:;])" target/changeling-run.txt || true
java -cp "$jar:$classes" RunFigures target/changeling/results.json "$maven_ms" "$run_ms" 1.5
baseline_ms=$(grep -o '"baseline" *: *[0-9.]*' target/changeling/results.json | head -1 | grep -o '[0-9.]*$')
awk -v b="$baseline_ms" -v s="$surefire_ms" 'BEGIN { printf "baseline phase %8.1f s   against Surefire'"'"'s own test time %.1f s: %.2f (target <= 0.6)\n", b / 1000, s / 1000, b / s }'
