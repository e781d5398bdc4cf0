#!/usr/bin/env bash
# Runs a full first-order run of commons-cli 1.11.0 with an earlier build of the tool and with this one, one
# after the other on fresh copies, and compares every verdict (src/bench/java/VerdictDiff.java). For changes
# that must not move a verdict (a restructuring) or whose moves must be explained.
#
#   src/bench/verdicts.sh OLD_JAR [extra changeling run options...]
set -euo pipefail

old_jar="$(cd "$(dirname "$1")" && pwd)/$(basename "$1")"
shift
source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" VerdictDiff.java

work="$repo_root/target/bench/verdicts"
rm -rf "$work"
mkdir -p "$work"
for side in before after; do
  cp -r "$project" "$work/$side"
  rm -rf "$work/$side/target/changeling"
done
(cd "$work/before" && java -jar "$old_jar" run . --plain "$@" > ../before.txt 2>&1 || true)
(cd "$work/after" && java -jar "$jar" run . --plain "$@" > ../after.txt 2>&1 || true)
grep -E "^mutation score" "$work/before.txt" "$work/after.txt" || true
java -cp "$jar:$classes" VerdictDiff "$work/before/target/changeling/results.json" "$work/after/target/changeling/results.json"
