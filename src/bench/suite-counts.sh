#!/usr/bin/env bash
# Checks that the tool's baseline runs the same tests as the project's own Maven build: for each bench
# project, runs plain `mvn test` and counts the test cases in Surefire's reports, runs a small sampled
# `changeling run` and counts the tests its baseline ran (the `tests` of results.json), and prints both
# side by side with the tests that only one of them ran, as class#method. Exits 1 when they differ.
# Uses target/changeling.jar; builds nothing of the tool.
#
#   src/bench/suite-counts.sh [PROJECT...]     (default: commons-cli commons-collections4)
set -euo pipefail

repo_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
jar="$repo_root/target/changeling.jar"
if [[ ! -f "$jar" ]]; then
  echo "error: $jar is missing; build it first with: mvn -q package -DskipTests" >&2
  exit 1
fi
if [[ $# -eq 0 ]]; then
  set -- commons-cli commons-collections4
fi
for name in "$@"; do
  if [[ ! -x "$repo_root/src/bench/$name/setup.sh" ]]; then
    echo "error: no bench project $name (there is no src/bench/$name/setup.sh)" >&2
    exit 1
  fi
done

# Reads Surefire's reports and the results file and compares the two lists of tests. Both sides are
# reduced to "class#method": a nested class joins its outer class with $, and parameters, invocation
# numbers and dynamic tests fold into their method, so one parameterised test is one name on each side.
compare() {
  python3 - "$@" <<'PY'
import glob, json, re, sys
from collections import Counter
import xml.etree.ElementTree as ET
from urllib.parse import unquote

project, reports, results = sys.argv[1:4]

def method_only(name):
    return re.split(r"[(\[]", name, maxsplit=1)[0].strip()

def from_unique_id(unique_id):
    """[engine:junit-jupiter]/[class:a.FooTest]/[nested-class:Inner]/[method:bar(int)]/... -> a.FooTest$Inner#bar;
    [engine:junit-vintage]/[runner:a.FooTest]/[test:bar(a.FooTest)] -> a.FooTest#bar."""
    type_name = method = None
    for kind, value in re.findall(r"\[([^:\]]+):([^\]]*)\]", unique_id):
        value = unquote(value)
        if kind in ("class", "runner"):
            type_name = value
        elif kind == "nested-class":
            type_name = f"{type_name}${value}"
        elif kind in ("method", "test-template", "test-factory") and method is None:
            method = value
        elif kind == "test":
            vintage = re.fullmatch(r"(.*)\(([^()]*)\)", value)
            if vintage:
                method, type_name = vintage.group(1), vintage.group(2)
    if type_name is None or method is None:
        return unique_id
    return f"{type_name}#{method_only(method)}"

# The <testcase> elements are counted, not a report's tests= header, which can fall short:
# commons-collections4's FixedOrderComparatorTest report lists 28 cases (its own and its @Nested class's)
# under tests="0", while Maven's closing summary counts them.
surefire, skipped = [], 0
for report in sorted(glob.glob(f"{reports}/TEST-*.xml")):
    for case in ET.parse(report).getroot().iter("testcase"):
        surefire.append(f"{case.get('classname')}#{method_only(case.get('name', ''))}")
        skipped += case.find("skipped") is not None
with open(results, encoding="utf-8") as file:
    tool = [from_unique_id(test["id"]) for test in json.load(file)["tests"]]

def classes(names):
    return {name.split("#", 1)[0] for name in names}

rows = [("test cases", len(surefire), len(tool)),
        ("  of them skipped", skipped, None),
        ("distinct class#method", len(set(surefire)), len(set(tool))),
        ("distinct classes", len(classes(surefire)), len(classes(tool)))]
print(f"{project}")
print(f"  {'':24}{'mvn test':>10}{'changeling':>12}")
for label, left, right in rows:
    print(f"  {label:24}{left:>10}{'' if right is None else right:>12}")

def only_in(label, these, others):
    missing = sorted(set(these) - set(others))
    if not missing:
        return
    print(f"  only in {label} ({len(missing)} class#method):")
    other_classes = classes(others)
    whole = {}
    for name in missing:
        type_name = name.split("#", 1)[0]
        if type_name not in other_classes:
            whole[type_name] = whole.get(type_name, 0) + 1
        else:
            print(f"    {name}")
    # A class that the other side did not run at all is one line.
    for type_name, count in sorted(whole.items()):
        print(f"    {type_name}#* ({count} method{'s' if count != 1 else ''}; the class is not in the other list)")

only_in("mvn test", surefire, tool)
only_in("changeling", tool, surefire)
by_maven, by_tool = Counter(surefire), Counter(tool)
uneven = sorted(n for n in by_maven.keys() & by_tool.keys() if by_maven[n] != by_tool[n])
if uneven:
    print(f"  in both, but run a different number of times ({len(uneven)} class#method):")
for name in uneven:
    print(f"    {name}: {by_maven[name]} in mvn test, {by_tool[name]} in changeling")
same = by_maven == by_tool
print("  same tests" if same else "  the two lists differ")
sys.exit(0 if same else 1)
PY
}

status=0
for name in "$@"; do
  project="$repo_root/target/bench/$name"
  "$repo_root/src/bench/$name/setup.sh" "$project" >/dev/null
  rm -rf "$project/target/surefire-reports" "$project/target/changeling/results.json"
  mkdir -p "$project/target"
  if ! (cd "$project" && mvn -B -q test >"$project/target/suite-counts-mvn.txt" 2>&1); then
    tail -n 30 "$project/target/suite-counts-mvn.txt"
    echo "error: mvn test fails in $project (log: $project/target/suite-counts-mvn.txt)" >&2
    status=1
    continue
  fi
  if ! java -jar "$jar" run "$project" --plain --operators relational-subset --sample 5 --seed 1 \
      >"$project/target/suite-counts-changeling.txt" 2>&1; then
    tail -n 30 "$project/target/suite-counts-changeling.txt"
    echo "error: changeling run fails in $project (log: $project/target/suite-counts-changeling.txt)" >&2
    status=1
    continue
  fi
  compare "$name" "$project/target/surefire-reports" "$project/target/changeling/results.json" || status=1
done
exit "$status"
