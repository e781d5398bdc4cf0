#!/usr/bin/env bash
# Times triage's "fixed" answer on a copy of the greenhouse sample: one survivor run again (Rerun) against the
# project unchanged, after an edit of a main source that leaves the mutant where it is, and after a new test class
# that kills it. Each figure is a fresh JVM, as `changeling triage` is. Target: <= 3 s each.
#
#   src/bench/rerun.sh
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" RerunFigures.java --no-project
project="$repo_root/target/bench/greenhouse-rerun"
rm -rf "$project"
cp -r "$repo_root/samples/greenhouse" "$project"
cd "$project"
# The survivor: `hour < 21` -> `hour <= 21` in WaterTariff.bandAt (no test tries 21:00).
java -jar "$jar" run . --plain --files '**/WaterTariff.java' --operators relational-subset >/dev/null 2>&1
survivor="$(python3 -c "
import json
for m in json.load(open('target/changeling/results.json'))['mutants']:
    p = m['points'][0]
    if m['verdict'] == 'survived' and p['snippet'] == 'hour<21' and p['replacement'] == '<=':
        print(m['id']); break
")"
figures() {
  java -cp "$jar:$classes" RerunFigures . "$survivor" "$1"
}
figures "unchanged"
figures "again, unchanged"
sed -i 's|^}$|    /** A note for the benchmark. */\n    static String benchNote() {\n        return "edited";\n    }\n}|' \
  src/main/java/dev/changeling/samples/greenhouse/Zone.java
figures "after an edit of Zone.java"
cat > src/test/java/dev/changeling/samples/greenhouse/NineInTheEveningTest.java <<'JAVA'
package dev.changeling.samples.greenhouse;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class NineInTheEveningTest {

    @Test
    void nineInTheEveningIsNightAgain() {
        assertEquals(WaterTariff.Band.NIGHT, WaterTariff.bandAt(21));
    }
}
JAVA
figures "after a new test class that kills it"
