#!/usr/bin/env bash
# Runs a full first-order `changeling run` of commons-cli 1.11.0 and prints, beside the total of
# mutants, how many points the default unproductive-code rules left out, how many survivors compiled
# to the original's classes (proposed equivalent: by bytes, by shape) or to another survivor's
# (duplicates), and what the comparison cost against the whole run. Uses target/changeling.jar.
#
#   src/bench/compiled-alike.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" AlikeFigures.java

cd "$project"
java -jar "$jar" run . --plain "$@" > target/changeling-run.txt 2>&1 || { cat target/changeling-run.txt; exit 1; }
java -cp "$jar:$classes" AlikeFigures target/changeling/results.json
