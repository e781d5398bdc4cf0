package dev.changeling.scope;

import dev.changeling.support.GitFixture;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Predicate;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ChangeScopeTest {

    static final String TIDES = "src/main/java/org/tidepool/Tides.java";
    static final String BUOY = "src/main/java/org/tidepool/Buoy.java";

    @TempDir
    Path temp;

    GitFixture repo;
    Path root;

    @BeforeEach
    void commitSmallProject() {
        root = temp.resolve("project");
        repo = GitFixture.init(root);
        repo.write(TIDES, GitFixture.TIDES);
        repo.write(BUOY, GitFixture.BUOY);
        repo.write("pom.xml", "<project/>\n");
        repo.commitAll("small project");
    }

    static int lineOf(String text, String fragment) {
        int at = text.indexOf(fragment);
        assertTrue(at >= 0, fragment);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    /** The lines of the points of a file that the scope keeps. */
    static Set<Integer> keptLines(ChangeScope scope, Path projectRoot, String path) {
        SourceFile source = GitFixture.source(projectRoot, path);
        Predicate<Point> filter = scope.filter(Map.of(path, source));
        return GitFixture.points(projectRoot, path).stream().filter(filter).map(Point::line)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    static Set<Integer> allLines(Path projectRoot, String path) {
        return GitFixture.points(projectRoot, path).stream().map(Point::line)
                .collect(Collectors.toCollection(TreeSet::new));
    }

    @Nested
    class SinceRevision {

        @Test
        void keepsOnlyPointsOnTheChangedLine() {
            repo.replace(TIDES, "level > high", "level >= high");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            int changed = lineOf(repo.read(TIDES), "level >= high");
            assertEquals(Set.of(changed), keptLines(scope, root, TIDES));
            assertTrue(allLines(root, TIDES).size() > 3, "the file has points on other lines too");
            List<Point> kept = GitFixture.points(root, TIDES).stream().filter(scope.filter()).toList();
            assertFalse(kept.isEmpty());
            assertTrue(kept.stream().allMatch(point -> point.member().equals("clamp(int,int,int)")));
            assertEquals(Set.of(TIDES), scope.files());
            assertEquals("changes since HEAD", scope.description());
        }

        @Test
        void addedMethodIsInScopeAndShiftedLinesBelowAreNot() {
            repo.replace(TIDES, "    public static int clamp(", """
                        public static boolean isLow(int level) {
                            return level < 10;
                        }

                        public static int clamp(""");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            assertEquals(Set.of(lineOf(repo.read(TIDES), "level < 10")), keptLines(scope, root, TIDES));
        }

        @Test
        void editSpanningTwoLinesIsKeptWhenEitherLineChanged() {
            repo.replace(TIDES, "return level > 120;", "return level >\n                120;");
            repo.commitAll("wrap the comparison");
            repo.replace(TIDES, "                120;", "                121;");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            SourceFile source = GitFixture.source(root, TIDES);
            List<Point> onComparison = GitFixture.points(root, TIDES).stream()
                    .filter(point -> point.member().equals("isHigh(int)")).toList();
            List<Point> kept = onComparison.stream().filter(point -> scope.covers(point, source)).toList();
            assertFalse(kept.isEmpty());
            // Replacing the whole comparison edits both lines; swapping '>' edits only the first, which is unchanged.
            assertTrue(kept.stream().allMatch(point -> point.replacement().equals("true") || point.replacement().equals("false")),
                    kept.toString());
            assertTrue(onComparison.size() > kept.size());
        }

        @Test
        void renamedFileCountsOnlyItsChangedLines() {
            String moved = "src/main/java/org/tidepool/Mooring.java";
            repo.git("mv", BUOY, moved);
            repo.replace(moved, "depth >= 30", "depth >= 40");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            assertEquals(Set.of(moved), scope.files());
            assertEquals(Set.of(lineOf(repo.read(moved), "depth >= 40")), keptLines(scope, root, moved));
        }

        @Test
        void committedRenameWithoutChangesHasNoChangedLines() {
            repo.git("mv", BUOY, "src/main/java/org/tidepool/Mooring.java");
            repo.commitAll("rename");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD~1");

            assertTrue(scope.isEmpty(), scope.files().toString());
        }

        @Test
        void untrackedNewJavaFileIsInScopeWhole() {
            String harbour = "src/main/java/org/tidepool/Harbour.java";
            repo.write(harbour, """
                    package org.tidepool;

                    final class Harbour {
                        boolean open(int tide) {
                            return tide > 40 && tide < 300;
                        }
                    }
                    """);
            repo.write("notes.txt", "not java\n");
            repo.write(".gitignore", "Ignored.java\n");
            repo.write("src/main/java/org/tidepool/Ignored.java", "class Ignored { boolean b(int x) { return x < 1; } }\n");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            assertEquals(Set.of(harbour), scope.files());
            assertEquals(allLines(root, harbour), keptLines(scope, root, harbour));
            assertFalse(allLines(root, harbour).isEmpty());
        }

        @Test
        void deletedFileIsIgnored() throws IOException {
            Files.delete(root.resolve(BUOY));
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            assertTrue(scope.isEmpty());
            assertEquals(Set.of(), keptLines(scope, root, TIDES));
        }

        @Test
        void comparesWithWhereTheBranchLeftTheRevision() {
            repo.git("checkout", "-q", "-b", "feature");
            repo.replace(TIDES, "level > high", "level >= high");
            repo.commitAll("feature work");
            repo.git("checkout", "-q", "main");
            repo.replace(TIDES, "level > 120", "level > 150");
            repo.commitAll("main moves on");
            repo.git("checkout", "-q", "feature");
            ChangeScope scope = ChangeScope.sinceRevision(root, "main");

            // The working tree still reads 'level > 120', which main changed since: that is not the branch's change.
            assertEquals(Set.of(lineOf(repo.read(TIDES), "level >= high")), keptLines(scope, root, TIDES));
        }

        @Test
        void projectInSubfolderOfTheRepositoryGetsProjectRelativePaths() {
            Path outer = temp.resolve("monorepo");
            GitFixture mono = GitFixture.init(outer);
            mono.write("tools/tides/" + TIDES, GitFixture.TIDES);
            mono.write("other/src/main/java/Elsewhere.java", "class Elsewhere { boolean b(int x) { return x < 1; } }\n");
            mono.commitAll("two projects");
            mono.replace("tools/tides/" + TIDES, "level > high", "level >= high");
            mono.replace("other/src/main/java/Elsewhere.java", "x < 1", "x < 2");
            mono.write("tools/tides/src/main/java/org/tidepool/Fresh.java", "class Fresh { boolean b(int x) { return x < 1; } }\n");
            Path project = outer.resolve("tools/tides");
            ChangeScope scope = ChangeScope.sinceRevision(project, "HEAD");

            assertEquals(Set.of(TIDES, "src/main/java/org/tidepool/Fresh.java"), scope.files());
            assertEquals(Set.of(lineOf(mono.read("tools/tides/" + TIDES), "level >= high")),
                    keptLines(scope, project, TIDES));
        }

        @Test
        void pathNeedingGitQuotingIsFound() {
            String odd = "src/main/java/org/tidepool/Météo.java";
            repo.write(odd, "class Météo { boolean b(int x) { return x < 1; } }\n");
            repo.commitAll("accented name");
            repo.replace(odd, "x < 1", "x < 2");
            ChangeScope scope = ChangeScope.sinceRevision(root, "HEAD");

            assertEquals(Set.of(odd), scope.files());
        }
    }

    @Nested
    class Uncommitted {

        @Test
        void stagedUnstagedAndUntrackedWorkAllCount() {
            repo.replace(TIDES, "level > high", "level >= high");
            repo.git("add", TIDES);
            repo.replace(TIDES, "levels[i] >= mark", "levels[i] > mark");
            String fresh = "src/main/java/org/tidepool/Fresh.java";
            repo.write(fresh, "class Fresh { boolean b(int x) { return x < 1; } }\n");
            ChangeScope scope = ChangeScope.uncommitted(root);

            String text = repo.read(TIDES);
            assertEquals(Set.of(lineOf(text, "level >= high"), lineOf(text, "levels[i] > mark")), keptLines(scope, root, TIDES));
            assertEquals(Set.of(TIDES, fresh), scope.files());
            assertEquals("uncommitted changes", scope.description());
        }

        @Test
        void committedWorkIsNotUncommitted() {
            repo.replace(TIDES, "level > high", "level >= high");
            repo.commitAll("done");

            assertTrue(ChangeScope.uncommitted(root).isEmpty());
        }

        @Test
        void beforeTheFirstCommitEverythingIsNew() {
            Path fresh = temp.resolve("fresh");
            GitFixture young = GitFixture.init(fresh);
            young.write(TIDES, GitFixture.TIDES);
            young.write(BUOY, GitFixture.BUOY);
            young.git("add", BUOY);
            ChangeScope scope = ChangeScope.uncommitted(fresh);

            assertEquals(Set.of(TIDES, BUOY), scope.files());
            assertEquals(allLines(fresh, BUOY), keptLines(scope, fresh, BUOY));
            assertEquals(allLines(fresh, TIDES), keptLines(scope, fresh, TIDES));
        }
    }

    @Nested
    class DiffFile {

        Path saveDiff(String text) throws IOException {
            Path diff = temp.resolve("review.diff");
            Files.writeString(diff, text, StandardCharsets.UTF_8);
            return diff;
        }

        /** git's own judgement whether the diff's new side is what the working tree holds: it reverses cleanly. */
        boolean reversesCleanly(Path diff) {
            return repo.tryGit("apply", "--reverse", "--check", diff.toString()).exitCode() == 0;
        }

        @Test
        void gitDiffWithContextGivesTheSameScopeAsTheRevision() throws IOException {
            repo.replace(TIDES, "level > high", "level >= high");
            repo.replace(BUOY, "depth >= 30", "depth >= 31");
            Path diff = saveDiff(repo.git("diff", "HEAD"));
            ChangeScope fromFile = ChangeScope.fromDiffFile(root, diff);
            ChangeScope fromGit = ChangeScope.sinceRevision(root, "HEAD");

            assertTrue(reversesCleanly(diff));
            assertEquals(fromGit.files(), fromFile.files());
            assertEquals(keptLines(fromGit, root, TIDES), keptLines(fromFile, root, TIDES));
            assertEquals(keptLines(fromGit, root, BUOY), keptLines(fromFile, root, BUOY));
            assertEquals("changes in " + diff, fromFile.description());
        }

        @Test
        void diffFromGnuDiffutilsIsRead() throws Exception {
            Path before = temp.resolve("Tides.before");
            Files.writeString(before, GitFixture.TIDES);
            repo.replace(TIDES, "level > high", "level >= high");
            // Reference tool: GNU diffutils 'diff -u', the format's origin.
            Process process = new ProcessBuilder("diff", "-u", "--label", "a/" + TIDES, "--label", "b/" + TIDES,
                    before.toString(), root.resolve(TIDES).toString()).redirectErrorStream(true).start();
            String text = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            assertEquals(1, process.waitFor(), "diff exits 1 when the files differ");
            ChangeScope scope = ChangeScope.fromDiffFile(root, saveDiff(text));

            assertEquals(Set.of(lineOf(repo.read(TIDES), "level >= high")), keptLines(scope, root, TIDES));
        }

        @Test
        void emptyContextLinesWithoutTheirBlankAreRead() throws IOException {
            repo.replace(TIDES, "return level;", "return level + 0;");
            String stripped = repo.git("diff", "HEAD").lines()
                    .map(line -> line.equals(" ") ? "" : line)
                    .collect(Collectors.joining("\n", "", "\n"));
            assertTrue(stripped.contains("\n\n"), "the hunk has an empty context line to strip");
            ChangeScope scope = ChangeScope.fromDiffFile(root, saveDiff(stripped));

            assertEquals(Set.of(TIDES), scope.files());
        }

        @Test
        void diffMadeAtTheRepositoryRootFindsAProjectInASubfolder() throws IOException {
            Path outer = temp.resolve("monorepo");
            GitFixture mono = GitFixture.init(outer);
            mono.write("tools/tides/" + TIDES, GitFixture.TIDES);
            mono.commitAll("one project");
            mono.replace("tools/tides/" + TIDES, "level > high", "level >= high");
            Path project = outer.resolve("tools/tides");
            ChangeScope fromRoot = ChangeScope.fromDiffFile(project, saveDiff(mono.git("diff")));

            assertEquals(Set.of(TIDES), fromRoot.files());
            assertEquals(Set.of(lineOf(mono.read("tools/tides/" + TIDES), "level >= high")),
                    keptLines(fromRoot, project, TIDES));
        }

        @Test
        void diffRelativeToTheProjectFolderIsFoundToo() throws IOException {
            Path outer = temp.resolve("monorepo");
            GitFixture mono = GitFixture.init(outer);
            mono.write("tools/tides/" + TIDES, GitFixture.TIDES);
            mono.commitAll("one project");
            mono.replace("tools/tides/" + TIDES, "level > high", "level >= high");
            String relative = mono.git("diff", "--relative=tools/tides");
            ChangeScope scope = ChangeScope.fromDiffFile(outer.resolve("tools/tides"), saveDiff(relative));

            assertEquals(Set.of(TIDES), scope.files());
        }

        @Test
        void deletionInTheDiffIsIgnored() throws IOException {
            Files.delete(root.resolve(BUOY));
            ChangeScope scope = ChangeScope.fromDiffFile(root, saveDiff(repo.git("diff")));

            assertTrue(scope.isEmpty());
        }

        @Test
        void newSideThatDiffersFromTheFileIsRefusedWithHunkAndLine() throws IOException {
            repo.replace(TIDES, "level > high", "level >= high");
            Path diff = saveDiff(repo.git("diff", "HEAD"));
            repo.replace(TIDES, "level >= high", "level >= high + 1");

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, diff));
            int line = lineOf(repo.read(TIDES), "level >= high + 1");
            assertTrue(error.getMessage().startsWith(diff + ": hunk 1 (+"), error.getMessage());
            assertTrue(error.getMessage().contains("of " + TIDES + " does not match the file: line " + line
                    + " reads 'if (level >= high + 1) {' but the diff has 'if (level >= high) {'"), error.getMessage());
            assertFalse(reversesCleanly(diff), "git agrees the diff does not describe the working tree");
        }

        @Test
        void whiteSpaceDifferenceIsNamedAsSuch() throws IOException {
            repo.replace(TIDES, "level > high", "level >= high");
            Path diff = saveDiff(repo.git("diff", "HEAD"));
            repo.replace(TIDES, "level >= high) {", "level >= high) {  ");

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, diff));
            assertTrue(error.getMessage().contains("differs in white space only"), error.getMessage());
        }

        @Test
        void hunkPastTheEndOfTheFileIsRefused() throws IOException {
            repo.replace(TIDES, "return level;", "return level + 0;");
            Path diff = saveDiff(repo.git("diff", "HEAD"));
            String text = repo.read(TIDES);
            repo.write(TIDES, text.substring(0, text.indexOf("    public static int clamp")));

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, diff));
            assertTrue(error.getMessage().contains("but the file has 8 lines"), error.getMessage());
        }

        @Test
        void fileTheDiffNamesButTheTreeLacksIsRefused() throws IOException {
            Path file = saveDiff("""
                    --- a/src/main/java/org/tidepool/Ghost.java
                    +++ b/src/main/java/org/tidepool/Ghost.java
                    @@ -1 +1 @@
                    -class Ghost {}
                    +final class Ghost {}
                    """);

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, file));
            assertEquals(file + ": names src/main/java/org/tidepool/Ghost.java, which does not exist in " + root
                    + "; make the diff from the repository root against the files checked out here", error.getMessage());
        }

        @Test
        void pathEscapingTheProjectIsNotFollowed() throws IOException {
            Files.writeString(temp.resolve("Outside.java"), "class Outside {}\n");
            Path file = saveDiff("""
                    --- a/../Outside.java
                    +++ b/../Outside.java
                    @@ -1 +1 @@
                    -class Outside {}
                    +class Outside {}
                    """);

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, file));
            assertTrue(error.getMessage().contains("names ../Outside.java, which does not exist"), error.getMessage());
        }

        @Test
        void cutShortDiffIsRefused() throws IOException {
            repo.replace(TIDES, "return level;", "return level + 0;");
            List<String> lines = repo.git("diff", "HEAD").lines().toList();
            Path file = saveDiff(String.join("\n", lines.subList(0, lines.size() - 2)) + "\n");

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, file));
            assertTrue(error.getMessage().contains("a hunk ends before the line counts in its header say"), error.getMessage());
        }

        @Test
        void textThatIsNoDiffIsRefused() throws IOException {
            Path file = saveDiff("Please review my change to the tide tables.\nThanks!\n");

            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, file));
            assertEquals(file + ": no file changes found; give a unified diff (the output of git diff or diff -u)",
                    error.getMessage());
        }

        @Test
        void missingDiffFileIsNamed() {
            Path missing = temp.resolve("nope.diff");
            UserError error = assertThrows(UserError.class, () -> ChangeScope.fromDiffFile(root, missing));
            assertTrue(error.getMessage().startsWith(missing + ": no such diff file"), error.getMessage());
        }

        @Test
        void worksWithoutAnyGitRepository() throws IOException {
            Path plain = temp.resolve("plain");
            Files.createDirectories(plain.resolve("src/main/java/org/tidepool"));
            Files.writeString(plain.resolve(TIDES), GitFixture.TIDES.replace("level > high", "level >= high"));
            Path file = saveDiff(diffOfTidesChange());

            ChangeScope scope = ChangeScope.fromDiffFile(plain, file);
            assertEquals(Set.of(lineOf(Files.readString(plain.resolve(TIDES)), "level >= high")),
                    keptLines(scope, plain, TIDES));
        }

        private String diffOfTidesChange() {
            repo.replace(TIDES, "level > high", "level >= high");
            String diff = repo.git("diff");
            repo.replace(TIDES, "level >= high", "level > high");
            return diff;
        }
    }

    @Nested
    class Mistakes {

        @Test
        void folderOutsideAnyRepositoryIsNamed() throws IOException {
            Path loose = Files.createDirectories(temp.resolve("loose"));
            UserError error = assertThrows(UserError.class, () -> ChangeScope.sinceRevision(loose, "main"));
            assertTrue(error.getMessage().startsWith(loose + ": not inside a git working tree (git: fatal: not a git repository"),
                    error.getMessage());
            assertThrows(UserError.class, () -> ChangeScope.uncommitted(loose));
        }

        @Test
        void unknownRevisionIsNamed() {
            UserError error = assertThrows(UserError.class, () -> ChangeScope.sinceRevision(root, "origin/nowhere"));
            assertEquals("unknown revision 'origin/nowhere' in the git repository at " + root
                    + "; check the name (git branch -a, git log), or fetch it first (git fetch)", error.getMessage());
        }

        @Test
        void optionLookingRevisionIsNotPassedToGit() {
            UserError error = assertThrows(UserError.class, () -> ChangeScope.sinceRevision(root, "--output=/tmp/x"));
            assertTrue(error.getMessage().startsWith("'--output=/tmp/x' is not a revision"), error.getMessage());
        }

        @Test
        void missingProjectFolderIsNamed() {
            Path missing = temp.resolve("missing");
            UserError error = assertThrows(UserError.class, () -> ChangeScope.uncommitted(missing));
            assertEquals(missing + ": no such folder; give the project folder", error.getMessage());
        }

        @Test
        void readingTheChangeLeavesTheRepositoryAsItWas() {
            repo.replace(TIDES, "level > high", "level >= high");
            String before = repo.git("status", "--porcelain=v1", "--untracked-files=all");
            ChangeScope.sinceRevision(root, "HEAD");
            ChangeScope.uncommitted(root);

            assertEquals(before, repo.git("status", "--porcelain=v1", "--untracked-files=all"));
            assertNotEquals("", before);
        }
    }
}
