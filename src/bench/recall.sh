#!/usr/bin/env bash
# Times re-runs that find most verdicts kept (recall.json) on commons-cli 1.11.0: a cold full run, then after
# editing one method of one class, then after adding one test method. After each edit the same tree is also run with
# --run-all (nothing recalled): the cold run of that tree, and the check that the warm run's verdicts are its
# verdicts (VerdictDiff). Prints each run's wall time, what it recalled and ran, and warm / cold (target <= 0.2).
# Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/recall.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" VerdictDiff.java
copy="$repo_root/target/bench/commons-cli-recall"
rm -rf "$copy"
cp -r "$project" "$copy"
rm -rf "$copy/target/changeling"
cd "$copy"
mkdir -p target
echo "load before: $(cut -d' ' -f1-3 /proc/loadavg) (2 cores; anything else running distorts the figures)"

timed() { # name, then run options; prints one line, keeps the output and results
  local name="$1"; shift
  local start end
  start=$(date +%s%N)
  java -jar "$jar" run . --plain "$@" > "target/$name.txt" 2>&1 || { cat "target/$name.txt"; exit 1; }
  end=$(date +%s%N)
  cp target/changeling/results.json "target/$name.json"
  local recalled
  recalled=$(grep -oE "^  recalled: [0-9]+" "target/$name.txt" | grep -oE "[0-9]+" || echo 0)
  echo "$(( (end - start) / 1000000 ))" > "target/$name.ms"
  printf '%-34s %8.1f s   recalled %5s   %s\n' "$name" "$(echo "$(cat "target/$name.ms") / 1000" | bc -l)" "$recalled" \
    "$(grep -E '^time:' "target/$name.txt")"
}
ratio() {
  printf '  %s / %s = %.2f (target <= 0.2)\n' "$1" "$2" "$(echo "$(cat "target/$1.ms") / $(cat "target/$2.ms")" | bc -l)"
}

warm_and_cold() { # what was changed, then run options: a warm run, a --run-all run of the same tree, their figures
  local change="$1"; shift
  timed "warm-$change" "$@"
  timed "cold-$change" --run-all "$@"
  ratio "warm-$change" cold
  ratio "warm-$change" "cold-$change"
  java -cp "$jar:$classes" VerdictDiff "target/cold-$change.json" "target/warm-$change.json" | tail -1
}

timed cold "$@"

python3 - <<'PY'
import re
path = "src/main/java/org/apache/commons/cli/TypeHandler.java"
text = open(path).read()
anchor = "public static Number createNumber(final String string) throws ParseException {"
assert anchor in text, "the method to edit is not where it was"
text = text.replace(anchor, anchor + "\n        final String given = string; // edited by the benchmark", 1)
open(path, "w").write(text)
PY
warm_and_cold after-method-edit "$@"

python3 - <<'PY'
path = "src/test/java/org/apache/commons/cli/TypeHandlerTest.java"
text = open(path).read().rstrip()
assert text.endswith("}")
text = text[:-1] + """
    @org.junit.jupiter.api.Test
    void testCreateNumberOfAWholeNumberAddedByTheBenchmark() throws ParseException {
        org.junit.jupiter.api.Assertions.assertEquals(Long.valueOf(42), TypeHandler.createNumber("42"));
    }
}
"""
open(path, "w").write(text)
PY
warm_and_cold after-test-added "$@"
