#!/usr/bin/env bash
# Checks that the cost of a mutant stays flat as a project grows: for each size, generates a seed
# catalogue (a made-up project of classes of one shape, each with the same mutants -- 94 under today's
# default operators -- and one cheap JUnit test per method) with about that many mutants, runs a full
# `changeling run` of it with the tool's own heap logged by the JVM (-Xlog:gc), and prints one row per
# size: mutants, wall seconds, wall ms per mutant, execute-phase ms per mutant, the tool process's peak
# heap in use and largest heap after a collection. Then the ratios of the largest size to the smallest,
# and "flat" when ms per mutant grows by less than 1.5x. Uses target/changeling.jar; builds nothing of
# the tool. The projects are left in target/bench/flat-cost/ (run output, GC log, results.json).
#
#   src/bench/flat-cost.sh [SIZES...] [-- extra changeling run options...]    (default sizes: 1000 2500 5000 10000)
#   FLAT_COST_HEAP=512m src/bench/flat-cost.sh 1000     (the tool's -Xmx; default 1g)
set -euo pipefail

source "$(dirname "${BASH_SOURCE[0]}")/prepare.sh" FlatCost.java --no-project

sizes=()
while [[ $# -gt 0 && "$1" != "--" ]]; do
  if [[ ! "$1" =~ ^[1-9][0-9]*$ ]]; then
    echo "error: a size is a number of mutants (a positive whole number), not '$1'" >&2
    echo "usage: src/bench/flat-cost.sh [SIZES...] [-- extra changeling run options...]" >&2
    exit 2
  fi
  sizes+=("$1")
  shift
done
[[ "${1:-}" == "--" ]] && shift
[[ ${#sizes[@]} -gt 0 ]] || sizes=(1000 2500 5000 10000)
readonly heap="${FLAT_COST_HEAP:-1g}"
readonly work="$repo_root/target/bench/flat-cost"
# Common practice, no source: growth below 1.5x over a tenfold size counts as flat (a quadratic cost would be 10x).
readonly FLAT_LIMIT=1.5

echo "flat cost of a mutant: $(date -u '+%Y-%m-%d %H:%M UTC'); $jar built $(date -u -r "$jar" '+%Y-%m-%d %H:%M UTC')" \
  "in a checkout at $(git -C "$repo_root" rev-parse --short HEAD 2>/dev/null || echo '?')"
echo "sizes: ${sizes[*]} mutants wanted; tool heap -Xmx$heap; run options: ${*:-(none)}"
# The load average, and the processes that used a CPU over one second (top's second frame: its first is since boot).
what_else_runs() {
  local load1 load5 load15 tasks pid cpu args
  read -r load1 load5 load15 tasks _ < /proc/loadavg
  echo "$1: load average $load1 (1 min) $load5 (5 min) $load15 (15 min) on $(nproc) cores, $tasks runnable/all tasks"
  echo "  busy over one second (%CPU of one core):"
  top -b -n 2 -d 1 -o %CPU -w 512 2>/dev/null | awk '/^top -/ { frame++ } frame == 2 && $1 ~ /^[0-9]+$/ && $9 + 0 >= 1 { print $1, $9 }' \
    | head -n 5 | while read -r pid cpu; do
        if args="$(ps -o args= -p "$pid" 2>/dev/null)"; then printf '  %6s%%  pid %-7s %.90s\n' "$cpu" "$pid" "$args"; fi
      done
}

what_else_runs before
echo

rows="$work/rows.txt"
workers="$work/workers.txt"
mkdir -p "$work"
: > "$rows"
: > "$workers"
printf '%8s %5s %7s %8s %6s %8s %9s %10s %9s %8s %4s %6s\n' \
  mutants lots killed survived other "wall s" "ms/mutant" "execute ms" "peak MB" "live MB" GCs load1
printf '%8s %5s %7s %8s %6s %8s %9s %10s %9s %8s %4s %6s\n' \
  "" "" "" "" "" "" "(wall)" "per mutant" "in use" "after GC" "" "after"
for size in "${sizes[@]}"; do
  dir="$work/n$size"
  rm -rf "$dir"
  read -r lots _ < <(java -cp "$jar:$classes" FlatCost project "$dir" "$size")
  cd "$dir"
  # One untimed build, so that the timed run starts from a warm local repository and finds every dependency.
  mvn -B -q -o test-compile >/dev/null 2>&1 || mvn -B -q test-compile >/dev/null
  rm -rf target/changeling
  start=$(date +%s%N)
  java "-Xmx$heap" "-Xlog:gc:file=$dir/target/flat-cost-gc.log" -jar "$jar" run . --plain "$@" \
    > target/flat-cost-run.txt 2>&1 || { tail -n 30 target/flat-cost-run.txt; exit 1; }
  wall_ms=$(( ($(date +%s%N) - start) / 1000000 ))
  read -r after_load _ < /proc/loadavg
  read -r mutants killed survived other maven generate compile baseline execute compare total \
    < <(java -cp "$jar:$classes" FlatCost figures target/changeling/results.json)
  # Lines such as "[1.234s][info][gc] GC(3) Pause Young (Normal) (G1 Evacuation Pause) 120M->40M(512M) 3.456ms"
  read -r peak live collections < <(awk 'match($0, /[0-9]+M->[0-9]+M\([0-9]+M\)/) {
         split(substr($0, RSTART, RLENGTH), part, /M->|M\(|M\)/)
         if (part[1] + 0 > before) before = part[1] + 0
         if (part[2] + 0 > after) after = part[2] + 0
         count++
       }
       END { print before + 0, after + 0, count + 0 }' "$dir/target/flat-cost-gc.log")
  echo "$mutants $(grep -m 1 -o '[0-9]* workers\{0,1\} started.*' target/flat-cost-run.txt || echo '(no workers line)')" >> "$workers"
  echo "$mutants $wall_ms $execute $live $maven $generate $compile $baseline $compare $total $survived" >> "$rows"
  awk -v m="$mutants" -v lots="$lots" -v k="$killed" -v s="$survived" -v o="$other" -v w="$wall_ms" -v e="$execute" \
      -v p="$peak" -v l="$live" -v c="$collections" -v load="$after_load" 'BEGIN {
    printf "%8d %5d %7d %8d %6d %8.1f %9.2f %10.2f %9d %8d %4d %6s\n", m, lots, k, s, o, w / 1000, w / m, e / m, p, l, c, load
  }'
done

echo
echo "where the time went, ms per mutant by phase (compare: per survivor, compiled on its own):"
printf '%8s %8s %9s %8s %9s %8s %8s %9s\n' mutants maven generate compile baseline execute compare "run total"
sort -n "$rows" | awk '{
  printf "%8d %8.2f %9.2f %8.2f %9.2f %8.2f %8.2f %9.2f\n", $1, $5 / $1, $6 / $1, $7 / $1, $8 / $1, $3 / $1, ($11 > 0 ? $9 / $11 : 0), $10 / $1
}'

echo "the workers' time, as each run reports it (a worker is replaced after its share of mutants, 500 by default):"
sort -n "$workers" | awk '{ mutants = $1; sub(/^[^ ]+ /, ""); printf "%8d  %s\n", mutants, $0 }'
echo
what_else_runs after
echo
if [[ ${#sizes[@]} -lt 2 ]]; then
  echo "one size only: no ratios (give two sizes or more, e.g. src/bench/flat-cost.sh 1000 10000)"
  exit 0
fi
sort -n "$rows" | awk -v limit="$FLAT_LIMIT" '
  NR == 1 { m1 = $1; w1 = $2 / $1; e1 = $3 / $1; l1 = $4 }
  NR > 1 && $1 > mn { slopes = slopes sprintf("  %d->%d: %.2f", mn, $1, ($2 - wall) / ($1 - mn)) }
  { mn = $1; wn = $2 / $1; en = $3 / $1; ln = $4; wall = $2 }
  END {
    printf "largest / smallest (%d / %d mutants, %.1fx the mutants):\n", mn, m1, mn / m1
    printf "  wall ms per mutant     %6.2fx  (%.2f -> %.2f)  %s\n", wn / w1, w1, wn, (wn / w1 < limit ? "flat" : "grows")
    printf "  execute ms per mutant  %6.2fx  (%.2f -> %.2f)  %s\n", en / e1, e1, en, (en / e1 < limit ? "flat" : "grows")
    if (l1 > 0) printf "  live set after GC      %6.2fx  (%d MB -> %d MB)\n", ln / l1, l1, ln
    else printf "  live set after GC      n/a (no collection at the smallest size)\n"
    printf "  wall ms per added mutant, size to size (fixed costs cancel out):%s\n", slopes
    printf "flat: ms per mutant grows by less than %.1fx from the smallest size to the largest (common practice, no source; a\n", limit
    printf "quadratic cost would grow by the ratio of the sizes). The wall time carries fixed costs (mvn, JVM starts) that small\n"
    printf "sizes spread over few mutants, so wall ms per mutant falls with size; the execute phase is the per-mutant work.\n"
  }'
