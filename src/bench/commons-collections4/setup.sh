#!/usr/bin/env bash
# Rebuilds Apache Commons Collections 4.5.0 from its published source jars as a Maven project of our own
# (see src/bench/rebuild.sh).
#
#   src/bench/commons-collections4/setup.sh [DIR]     (default: target/bench/commons-collections4 under the repository)
set -euo pipefail
repo_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../../.." && pwd)"
exec "$repo_root/src/bench/rebuild.sh" org.apache.commons:commons-collections4:4.5.0 \
  "${1:-$repo_root/target/bench/commons-collections4}"
