#!/usr/bin/env bash
# Rebuilds Apache Commons CLI 1.11.0 from its published source and test-source jars as a Maven project
# of our own that `mvn test` can run: a real suite of the size the tool is meant for.
#
#   src/bench/commons-cli/setup.sh [DIR]     (default: target/bench/commons-cli under the repository)
#
# Safe to run again: a finished project is left as it is. Needs mvn and a JDK on the PATH and Maven
# Central (or a local repository that already holds the artifacts).
set -euo pipefail

readonly GROUP=commons-cli
readonly ARTIFACT=commons-cli
readonly VERSION=1.11.0
readonly DEPENDENCY_PLUGIN=org.apache.maven.plugins:maven-dependency-plugin:3.8.1
readonly MARKER=.changeling-bench-source

repo_root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../../.." && pwd)"
target="${1:-$repo_root/target/bench/commons-cli}"
mkdir -p "$(dirname "$target")"
target="$(cd "$(dirname "$target")" && pwd)/$(basename "$target")"

if [[ -f "$target/$MARKER" && "$(cat "$target/$MARKER")" == "$GROUP:$ARTIFACT:$VERSION" ]]; then
  echo "commons-cli $VERSION is ready in $target"
  exit 0
fi
if [[ -e "$target" ]]; then
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
  maven -f "$downloads/$ARTIFACT-$VERSION.pom" "$DEPENDENCY_PLUGIN:list" -DincludeScope=test \
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

cat >"$project/pom.xml" <<EOF
<?xml version="1.0" encoding="UTF-8"?>
<!-- Made by src/bench/commons-cli/setup.sh from the published sources of $GROUP:$ARTIFACT:$VERSION. -->
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
      <plugin>
        <groupId>org.apache.maven.plugins</groupId>
        <artifactId>maven-surefire-plugin</artifactId>
        <version>3.5.4</version>
      </plugin>
    </plugins>
  </build>
</project>
EOF

echo "$GROUP:$ARTIFACT:$VERSION" >"$project/$MARKER"
mv "$project" "$target"
echo "commons-cli $VERSION is ready in $target"
echo "  $(find "$target/src/main/java" -name '*.java' | wc -l) main and $(find "$target/src/test/java" -name '*.java' | wc -l) test source files; run: (cd $target && mvn -q test)"
