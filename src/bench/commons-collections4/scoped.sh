#!/usr/bin/env bash
# Times a review's run scoped to a one-method change of commons-collections4 4.5.0 with a reach map from an earlier
# run (`run --map-only` on the unchanged tree, as a CI job on the main branch would), beside plain `mvn -q test` of
# the changed tree (target: scoped run <= 0.5 of it), and the same scoped run with --run-all (the whole suite in the
# baseline, as without a map). The change: ListUtils.intersection compares its lists' sizes the other way round
# (same behaviour, one changed line). Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/commons-collections4/scoped.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/../prepare.sh" RunFigures.java --no-project
"$repo_root/src/bench/commons-collections4/setup.sh" "$repo_root/target/bench/commons-collections4"
copy="$repo_root/target/bench/commons-collections4-scoped"
rm -rf "$copy"
cp -r "$repo_root/target/bench/commons-collections4" "$copy"
rm -rf "$copy/target/changeling"
cd "$copy"
echo "load before: $(cut -d' ' -f1-3 /proc/loadavg) (2 cores; anything else running distorts the figures)"
printf 'target/\n' > .gitignore
git init -q . && git add -A && git -c user.name=bench -c user.email=bench@localhost commit -qm "the tree the map is made of"
mvn -B -q -o test-compile >/dev/null 2>&1 || mvn -B -q test-compile >/dev/null

seconds() { echo "scale=1; $1 / 1000" | bc -l; }
timed() { # name, then command; keeps the output in target/NAME.txt and the milliseconds in target/NAME.ms
  local name="$1"; shift
  local start
  start=$(date +%s%N)
  "$@" > "target/$name.txt" 2>&1 || { cat "target/$name.txt"; exit 1; }
  echo $(( ($(date +%s%N) - start) / 1000000 )) > "target/$name.ms"
}

timed map java -jar "$jar" run . --plain --map-only "$@"
echo "map-only run of the unchanged tree (once, on the main branch): $(seconds "$(cat target/map.ms)") s"
grep -E "^  (mutants|baseline|reach map)" target/map.txt || true

python3 - <<'PY'
path = "src/main/java/org/apache/commons/collections4/ListUtils.java"
text = open(path).read()
old = "if (list1.size() > list2.size()) {"
assert text.count(old) == 1, "the line to change is not where it was"
open(path, "w").write(text.replace(old, "if (list2.size() < list1.size()) {"))
PY
git diff --stat

timed maven mvn -B -q -o test
timed scoped java -jar "$jar" run . --plain --uncommitted "$@"
timed scoped-whole-suite java -jar "$jar" run . --plain --uncommitted --run-all "$@"

for name in scoped scoped-whole-suite; do
  echo "$name:"
  grep -E "^  (maven|mutants|reach map|baseline|recalled)|^time:|^mutation score" "target/$name.txt" | sed 's/^/  /' || true
done
printf 'plain mvn -q test of the changed tree        %6s s\n' "$(seconds "$(cat target/maven.ms)")"
printf 'scoped run with the reach map               %6s s   ratio %.2f (target <= 0.5)\n' "$(seconds "$(cat target/scoped.ms)")" \
  "$(echo "$(cat target/scoped.ms) / $(cat target/maven.ms)" | bc -l)"
printf 'scoped run, whole suite (--run-all)         %6s s   ratio %.2f\n' "$(seconds "$(cat target/scoped-whole-suite.ms)")" \
  "$(echo "$(cat target/scoped-whole-suite.ms) / $(cat target/maven.ms)" | bc -l)"
