#!/usr/bin/env bash
# Rebuilds a published Maven library from its `sources` and `test-sources` jars as a Maven project of
# our own that `mvn test` can run: a real suite of the size the tool is meant for. The project gets the
# published build's test dependencies at the versions that build resolves, and its Surefire settings.
#
#   src/bench/rebuild.sh GROUP:ARTIFACT:VERSION DIR
#
# Safe to run again: a finished project is left as it is; one made by an older version of this script
# is made anew. Needs mvn, a JDK and python3 on the PATH and Maven Central (or a local repository that
# already holds the artifacts).
set -euo pipefail

# Raise when the project this script makes changes, so that older ones are made anew.
readonly RECIPE=2
readonly DEPENDENCY_PLUGIN=org.apache.maven.plugins:maven-dependency-plugin:3.8.1
readonly HELP_PLUGIN=org.apache.maven.plugins:maven-help-plugin:3.5.1
readonly SUREFIRE_VERSION=3.5.4
readonly MARKER=.changeling-bench-source

if [[ $# -ne 2 || ! "$1" =~ ^[^:]+:[^:]+:[^:]+$ ]]; then
  echo "usage: $0 GROUP:ARTIFACT:VERSION DIR" >&2
  exit 2
fi
IFS=: read -r GROUP ARTIFACT VERSION <<<"$1"
readonly GROUP ARTIFACT VERSION
readonly STAMP="$GROUP:$ARTIFACT:$VERSION recipe $RECIPE"

mkdir -p "$(dirname "$2")"
target="$(cd "$(dirname "$2")" && pwd)/$(basename "$2")"

if [[ -f "$target/$MARKER" && "$(cat "$target/$MARKER")" == "$STAMP" ]]; then
  echo "$ARTIFACT $VERSION is ready in $target"
  exit 0
fi
# A folder holding the marker was made by this script (an older version, or for another release), so
# it may be replaced; any other folder is left alone.
replace=no
if [[ -f "$target/$MARKER" ]]; then
  echo "$target was made by an older version of this script ($(head -n 1 "$target/$MARKER")); making it anew"
  replace=yes
elif [[ -e "$target" ]]; then
  echo "error: $target exists but was not made by this script; remove it or pass another folder" >&2
  exit 1
fi

# Everything is built in a scratch folder beside the target and moved into place at the end, so an
# interrupted run leaves no half-made project behind.
scratch="$(mktemp -d "$target.partial.XXXXXX")"
trap 'rm -rf "$scratch"' EXIT
downloads="$scratch/downloads"
project="$scratch/project"
mkdir -p "$downloads" "$project/src/main/java" "$project/src/test/java"

# Runs Maven quietly; its output is shown only when it fails.
maven() {
  if ! mvn -q -B "$@" >"$scratch/maven.log" 2>&1; then
    cat "$scratch/maven.log" >&2
    echo "error: mvn $* failed" >&2
    exit 1
  fi
}

fetch() {
  maven "$DEPENDENCY_PLUGIN:copy" -Dartifact="$1" -DoutputDirectory="$downloads" -Dmdep.overWriteReleases=true
}
fetch "$GROUP:$ARTIFACT:$VERSION:jar:sources"
fetch "$GROUP:$ARTIFACT:$VERSION:jar:test-sources"
fetch "$GROUP:$ARTIFACT:$VERSION:pom"
published_pom="$downloads/$ARTIFACT-$VERSION.pom"

# Copies the .java files of a jar into one folder and, when a second folder is named, every other file
# except the jar's own META-INF into that one.
unpack() {
  local jar="$1" java_dir="$2" other_dir="${3:-}" contents="$scratch/unpacked"
  rm -rf "$contents" && mkdir -p "$contents"
  (cd "$contents" && jar xf "$jar")
  rm -rf "$contents/META-INF"
  (cd "$contents" && find . -type f -name '*.java' -print0 | tar --null -cf - -T -) | (cd "$java_dir" && tar -xf -)
  if [[ -n "$other_dir" ]] && [[ -n "$(find "$contents" -type f ! -name '*.java' -print -quit)" ]]; then
    mkdir -p "$other_dir"
    (cd "$contents" && find . -type f ! -name '*.java' -print0 | tar --null -cf - -T -) | (cd "$other_dir" && tar -xf -)
  fi
}
unpack "$downloads/$ARTIFACT-$VERSION-sources.jar" "$project/src/main/java"
unpack "$downloads/$ARTIFACT-$VERSION-test-sources.jar" "$project/src/test/java" "$project/src/test/resources"

# Maven itself reads the published pom (with its parent and imported BOMs) and tells the concrete
# versions: the direct test dependencies, and everything they pull in, as the real build resolves it.
list_dependencies() {
  local out="$scratch/$1.txt"
  maven -f "$published_pom" "$DEPENDENCY_PLUGIN:list" -DincludeScope=test \
    -DexcludeTransitive="$2" -DoutputFile="$out" -DoutputAbsoluteArtifactFilename=false
  # lines read "group:artifact:type[:classifier]:version:scope -- module ..."
  sed -n 's/^ *\([^ :]*:[^ :]*:[^ ]*\).*$/\1/p' "$out" | grep -E '^[^:]+:[^:]+:[^:]+:' || true
}
direct="$(list_dependencies direct true)"
resolved="$(list_dependencies resolved false)"
if [[ -z "$direct" ]]; then
  echo "error: found no test dependencies in the published pom of $ARTIFACT $VERSION" >&2
  exit 1
fi

dependency_xml() {
  local list="$1" indent="$2" with_scope="$3" line group artifact type classifier version scope part
  while IFS= read -r line; do
    IFS=: read -r -a part <<<"$line"
    group="${part[0]}" artifact="${part[1]}" type="${part[2]}"
    if [[ ${#part[@]} -ge 6 ]]; then
      classifier="${part[3]}" version="${part[4]}" scope="${part[5]}"
    else
      classifier="" version="${part[3]}" scope="${part[4]}"
    fi
    printf '%s<dependency>\n' "$indent"
    printf '%s  <groupId>%s</groupId>\n' "$indent" "$group"
    printf '%s  <artifactId>%s</artifactId>\n' "$indent" "$artifact"
    printf '%s  <version>%s</version>\n' "$indent" "$version"
    [[ "$type" != jar ]] && printf '%s  <type>%s</type>\n' "$indent" "$type"
    [[ -n "$classifier" ]] && printf '%s  <classifier>%s</classifier>\n' "$indent" "$classifier"
    [[ "$with_scope" == yes ]] && printf '%s  <scope>%s</scope>\n' "$indent" "$scope"
    printf '%s</dependency>\n' "$indent"
  done <<<"$list"
}

# Maven also tells the published build's Surefire settings, with its parents and the profiles active on
# this machine applied: the effective pom. Its Surefire <configuration> (plugin level, and the default-test
# execution's where that differs) goes into our pom. A setting that still holds an unresolved ${...}
# (a property the published build's profiles or environment supply) or a path of the downloaded pom's
# folder refers to something the rebuilt project lacks and is left out; the comment above the plugin
# names what was taken and what was left out.
maven -f "$published_pom" "$HELP_PLUGIN:effective-pom" -Doutput="$scratch/effective-pom.xml"
surefire_plugin="$(python3 - "$scratch/effective-pom.xml" "$downloads" "$SUREFIRE_VERSION" <<'PY'
import sys
import xml.etree.ElementTree as ET

effective, foreign_dir, version = sys.argv[1:4]
ns = "{http://maven.apache.org/POM/4.0.0}"
root = ET.parse(effective).getroot()
plugin = next((p for p in root.findall(f"{ns}build/{ns}plugins/{ns}plugin")
               if p.findtext(f"{ns}artifactId") == "maven-surefire-plugin"
               and p.findtext(f"{ns}groupId", "org.apache.maven.plugins") == "org.apache.maven.plugins"), None)

def refers_elsewhere(element):
    texts = [t for e in element.iter() for t in [e.text or "", *e.attrib.values()]]
    return any("${" in t or foreign_dir in t for t in texts)

def local_name(tag):
    return tag.rsplit("}", 1)[-1]

def clean(configuration, left_out):
    """Strips namespaces and removes settings (or entries of a list or map setting) that refer elsewhere."""
    for element in configuration.iter():
        element.tag = local_name(element.tag)
    for setting in list(configuration):
        entries = list(setting)
        for entry in entries:
            if refers_elsewhere(entry):
                left_out.append(f"{setting.tag}/{entry.tag} ({(entry.text or '').strip()})")
                setting.remove(entry)
        if (entries and len(setting) == 0) or (not entries and refers_elsewhere(setting)):
            if not entries:
                left_out.append(f"{setting.tag} ({(setting.text or '').strip()})")
            configuration.remove(setting)
    return configuration

def render(element, level):
    ET.indent(element, space="  ", level=level)
    element.tail = None
    return "  " * level + ET.tostring(element, encoding="unicode")

def names(configuration):
    return ", ".join(s.tag for s in configuration) or "nothing"

if plugin is None:
    plugin = ET.Element("plugin")
left_out = []
found = plugin.find(f"{ns}configuration")
plugin_level = clean(found if found is not None else ET.Element("configuration"), left_out)
default_test = None
other_executions = []
for execution in plugin.findall(f"{ns}executions/{ns}execution"):
    configuration = execution.find(f"{ns}configuration")
    if execution.findtext(f"{ns}id") != "default-test":
        other_executions.append(execution.findtext(f"{ns}id"))
    elif configuration is not None:
        default_test = clean(configuration, left_out)

def content(element):
    return (element.tag, (element.text or "").strip(), sorted(element.attrib.items()), [content(c) for c in element])

if default_test is not None and content(default_test) == content(plugin_level):
    default_test = None

published = plugin.findtext(f"{ns}version")
summary = [f"Surefire settings taken from the published build's effective pom (its version: {published or 'none'}; {version} here).",
           f"Plugin level: {names(plugin_level)}.",
           "default-test execution: " + (names(default_test) if default_test is not None else "the same as plugin level") + "."]
if left_out:
    summary.append("Left out, as they refer to what this project lacks: " + "; ".join(dict.fromkeys(left_out)) + ".")
if other_executions:
    summary.append("Not taken: the executions " + ", ".join(other_executions) + ".")
print("      <!--")
for line in summary:
    print("        " + line.replace("--", "- -"))
print("      -->")
print("      <plugin>")
print("        <groupId>org.apache.maven.plugins</groupId>")
print("        <artifactId>maven-surefire-plugin</artifactId>")
print(f"        <version>{version}</version>")
if len(plugin_level):
    print(render(plugin_level, 4))
if default_test is not None:
    print("        <executions>")
    print("          <execution>")
    print("            <id>default-test</id>")
    print(render(default_test, 6))
    print("          </execution>")
    print("        </executions>")
print("      </plugin>")
PY
)"

cat >"$project/pom.xml" <<EOF
<?xml version="1.0" encoding="UTF-8"?>
<!-- Made by src/bench/rebuild.sh from the published sources of $GROUP:$ARTIFACT:$VERSION. -->
<project xmlns="http://maven.apache.org/POM/4.0.0"
         xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
         xsi:schemaLocation="http://maven.apache.org/POM/4.0.0 https://maven.apache.org/xsd/maven-4.0.0.xsd">
  <modelVersion>4.0.0</modelVersion>

  <groupId>dev.changeling.bench</groupId>
  <artifactId>$ARTIFACT</artifactId>
  <version>$VERSION</version>
  <name>$ARTIFACT $VERSION rebuilt from its source jars</name>

  <properties>
    <maven.compiler.release>17</maven.compiler.release>
    <project.build.sourceEncoding>UTF-8</project.build.sourceEncoding>
  </properties>

  <!-- Every version the published build resolves, so that transitive ones match it too. -->
  <dependencyManagement>
    <dependencies>
$(dependency_xml "$resolved" "      " no)
    </dependencies>
  </dependencyManagement>

  <dependencies>
$(dependency_xml "$direct" "    " yes)
  </dependencies>

  <build>
    <plugins>
      <plugin>
        <groupId>org.apache.maven.plugins</groupId>
        <artifactId>maven-compiler-plugin</artifactId>
        <version>3.13.0</version>
      </plugin>
      <plugin>
        <groupId>org.apache.maven.plugins</groupId>
        <artifactId>maven-resources-plugin</artifactId>
        <version>3.3.1</version>
      </plugin>
$surefire_plugin
    </plugins>
  </build>
</project>
EOF

echo "$STAMP" >"$project/$MARKER"
if [[ "$replace" == yes ]]; then
  mv "$target" "$scratch/replaced"
fi
mv "$project" "$target"
echo "$ARTIFACT $VERSION is ready in $target"
echo "  $(find "$target/src/main/java" -name '*.java' | wc -l) main and $(find "$target/src/test/java" -name '*.java' | wc -l) test source files; run: (cd $target && mvn -q test)"
