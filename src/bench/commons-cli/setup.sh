#!/usr/bin/env bash
# Rebuilds Apache Commons CLI 1.11.0 from its published source jars as a Maven project of our own (see
# src/bench/rebuild.sh).
#
#   src/bench/commons-cli/setup.sh [DIR]     (default: target/bench/commons-cli under the repository)
set -euo pipefail
repo_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../../.." && pwd)"
exec "$repo_root/src/bench/rebuild.sh" commons-cli:commons-cli:1.11.0 "${1:-$repo_root/target/bench/commons-cli}"
