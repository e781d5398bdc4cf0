#!/usr/bin/env bash
# Checks that the tool's own process stays within 512 MB of heap for more than 10,000 mutants: makes
# commons-cli 1.11.0 three times over (the original and two copies under other package names, tests
# included, so every copy's mutants are reached and run), runs every operator on it with -Xmx512m, and
# prints the number of mutants and the heap the garbage collector found in use (peak before a
# collection, and the largest live set after one). Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/memory.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" RunFigures.java

readonly HEAP=512m
tripled="$repo_root/target/bench/commons-cli-x3"
if [[ ! -d "$tripled" ]]; then
  scratch="$(mktemp -d "$tripled.partial.XXXXXX")"
  cp -r "$project/pom.xml" "$project/src" "$scratch/"
  for copy in clia clib; do
    for root in src/main/java src/test/java src/test/resources; do
      [[ -d "$project/$root/org/apache/commons/cli" ]] || continue
      mkdir -p "$scratch/$root/org/apache/commons/$copy"
      cp -r "$project/$root/org/apache/commons/cli/." "$scratch/$root/org/apache/commons/$copy/"
      find "$scratch/$root/org/apache/commons/$copy" -type f -exec sed -i \
        -e "s/org\.apache\.commons\.cli/org.apache.commons.$copy/g" -e "s#org/apache/commons/cli#org/apache/commons/$copy#g" {} +
    done
  done
  mv "$scratch" "$tripled"
fi

operators="$(java -jar "$jar" operators | awk 'NF > 1 && $1 ~ /^[a-z-]+$/ && ($2 == "default" || $2 == "on") { print $1 }' | paste -sd, -)"
cd "$tripled"
mvn -B -q -o test-compile >/dev/null 2>&1 || mvn -B -q test-compile >/dev/null
rm -f target/changeling-gc.log
# One test compares help output whose line breaks depend on the length of the package name; the copies' versions are left out.
java "-Xmx$HEAP" "-Xlog:gc:file=target/changeling-gc.log" -jar "$jar" run . --plain --operators "$operators" \
  --skip-tests 'org.apache.commons.clia.bug.BugCLI162Test' --skip-tests 'org.apache.commons.clib.bug.BugCLI162Test' "$@" \
  > target/changeling-run.txt 2>&1 || { tail -n 30 target/changeling-run.txt; exit 1; }
grep -E "^mutation score" target/changeling-run.txt
# Lines such as "[1.234s][info][gc] GC(3) Pause Young (Normal) (G1 Evacuation Pause) 120M->40M(512M) 3.456ms"
awk 'match($0, /[0-9]+M->[0-9]+M\([0-9]+M\)/) {
       split(substr($0, RSTART, RLENGTH), part, /M->|M\(|M\)/)
       if (part[1] + 0 > before) before = part[1] + 0
       if (part[2] + 0 > after) after = part[2] + 0
       count++
     }
     END { printf "heap of the tool process (-Xmx'"$HEAP"'): peak in use %d MB, largest live set after a collection %d MB, %d collections\n", before, after, count }' \
  target/changeling-gc.log
