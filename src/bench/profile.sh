#!/usr/bin/env bash
# Where a cold full run of commons-cli 1.11.0 spends its CPU: the run with a flight recording in every JVM (the tool
# and each worker, through JAVA_TOOL_OPTIONS), then its phases, its workers' time line, and the recordings summed up
# by ProfileFigures (the workers' Java samples by activity, the tool's by phase, JIT and collector time of each side).
# Recording costs a few percent; compare shares, not the wall time, with other runs. Uses target/changeling.jar.
#
#   src/bench/profile.sh [extra changeling run options...]
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" ProfileFigures.java

recordings="$repo_root/target/bench/profile"
rm -rf "$recordings"
mkdir -p "$recordings"
cd "$project"
rm -rf target/changeling
JAVA_TOOL_OPTIONS="-XX:StartFlightRecording=filename=$recordings/,settings=profile -XX:FlightRecorderOptions=stackdepth=256" \
  java -jar "$jar" run . --plain "$@" > target/changeling-profile.txt 2>&1 || { cat target/changeling-profile.txt; exit 1; }

grep -E "^(mutation score|time:|  [0-9]+ workers started)" target/changeling-profile.txt | cut -c1-400
started=$(grep -oE "^  [0-9]+ workers started" target/changeling-profile.txt | grep -oE "[0-9]+" || echo -1)
java -cp "$jar:$classes" ProfileFigures "$recordings" "$started"
