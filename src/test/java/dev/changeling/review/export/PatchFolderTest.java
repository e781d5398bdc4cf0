package dev.changeling.review.export;

import dev.changeling.review.Survivors;
import static dev.changeling.results.ResultsForTests.result;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.Verdict;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PatchFolderTest {

    private static final String TILL = """
            package shop;

            class Till {
                int total(int items, int coupons) {
                    int sum = 0;
                    if (items > 10) {
                        sum += 5;
                    }
                    sum += items * 3;
                    sum += items * 2;
                    sum += items;
                    sum -= coupons;
                    sum -= coupons;
                    sum -= coupons;
                    if (coupons >= 2) {
                        sum -= 1;
                    }
                    return sum;
                }
            }
            """;

    private static final String LEGACY_CRLF = "package shop;\r\n\r\nclass Legacy {\r\n"
            + "    boolean old(int a) {\r\n        return a != 0;\r\n    }\r\n}\r\n";

    private static final String CUT_NO_NEWLINE = "package shop;\n\nclass Cut {\n"
            + "    boolean tail(int a) { return a <= 9; }\n}";

    @TempDir
    Path repo;

    @TempDir
    Path patches;

    private List<MutantResult> survivors;

    @BeforeEach
    void cleanCheckout() throws IOException {
        write("src/main/java/shop/Till.java", TILL);
        write("src/main/java/shop/Legacy.java", LEGACY_CRLF);
        write("src/main/java/shop/Cut.java", CUT_NO_NEWLINE);
        git("init", "-q");
        git("add", "-A");
        git("commit", "-q", "-m", "sample");
        List<SourceFile> sources = new ArrayList<>();
        for (String path : List.of("src/main/java/shop/Till.java", "src/main/java/shop/Legacy.java", "src/main/java/shop/Cut.java")) {
            sources.add(JavaSources.read(repo, repo.resolve(path)));
        }
        survivors = Survivors.unresolved(ResultsForTests.survivorsOf(sources, List.of(1, 2)), mutant -> false);
    }

    private void write(String path, String text) throws IOException {
        Path file = repo.resolve(path);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text, StandardCharsets.UTF_8);
    }

    /** Runs git in the sample repository; the exit code and what it printed. */
    private Run git(String... args) throws IOException {
        List<String> command = new ArrayList<>(List.of("git", "-c", "core.autocrlf=false", "-c", "user.name=Sample",
                "-c", "user.email=sample@example.invalid", "-c", "commit.gpgsign=false"));
        command.addAll(List.of(args));
        Process process = new ProcessBuilder(command).directory(repo.toFile()).redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        try {
            return new Run(process.waitFor(), output);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while git ran", e);
        }
    }

    private record Run(int exit, String output) {
    }

    /** The file with the mutant's points applied, worked out from the stored positions alone. */
    private String expectedAfter(MutantResult mutant) throws IOException {
        SourceFile file = JavaSources.read(repo, repo.resolve(mutant.file()));
        StringBuilder text = new StringBuilder(file.text());
        List<PointRecord> points = new ArrayList<>(mutant.points());
        for (int i = points.size() - 1; i >= 0; i--) {
            PointRecord point = points.get(i);
            int begin = file.lines().offset(point.line(), point.column());
            int end = file.lines().offset(point.endLine(), point.endColumn()) + 1;
            text.replace(begin, end, point.replacement());
        }
        return text.toString();
    }

    @Nested
    class WithRealGit {

        @Test
        void samplesCoverCrlfNoTrailingNewlineAndSeveralHunks() {
            Set<String> files = survivors.stream().map(MutantResult::file).collect(Collectors.toSet());
            assertEquals(3, files.size());
            assertTrue(survivors.stream().anyMatch(s -> s.diff().contains("\r\n")), "a CRLF file");
            assertTrue(survivors.stream().anyMatch(s -> s.diff().contains("\\ No newline at end of file")), "no trailing newline");
            assertTrue(survivors.stream().anyMatch(s -> s.diff().split("\n@@ ", -1).length > 2), "a diff of two hunks");
        }

        @Test
        void everyPatch_passesGitApplyCheck_onTheCleanCheckout() throws IOException {
            List<Path> written = PatchFolder.write(patches, Survivors.unresolved(survivors, mutant -> false));

            assertEquals(survivors.size(), written.size());
            for (Path patch : written) {
                Run check = git("apply", "--check", patch.toString());
                assertEquals(0, check.exit(), patch.getFileName() + ": " + check.output());
            }
        }

        @Test
        void everyPatch_appliedForReal_givesTheMutantsText() throws IOException {
            List<Path> written = PatchFolder.write(patches, Survivors.unresolved(survivors, mutant -> false));

            for (int i = 0; i < written.size(); i++) {
                MutantResult mutant = survivors.get(i);
                String expected = expectedAfter(mutant);
                Run apply = git("apply", written.get(i).toString());
                assertEquals(0, apply.exit(), apply.output());
                assertEquals(expected, Files.readString(repo.resolve(mutant.file()), StandardCharsets.UTF_8),
                        written.get(i).getFileName().toString());
                assertEquals(0, git("checkout", "--", ".").exit());
            }
        }

        @Test
        void gitApplyCheck_failsOnceTheSiteChanged() throws IOException {
            List<Path> written = PatchFolder.write(patches, Survivors.unresolved(survivors, mutant -> false));
            int cut = indexOfFile("src/main/java/shop/Cut.java");
            write("src/main/java/shop/Cut.java", CUT_NO_NEWLINE.replace("a <= 9", "a <= 8"));

            assertNotEquals(0, git("apply", "--check", written.get(cut).toString()).exit());
        }

        private int indexOfFile(String file) {
            for (int i = 0; i < survivors.size(); i++) {
                if (survivors.get(i).file().equals(file)) {
                    return i;
                }
            }
            throw new AssertionError("no survivor in " + file);
        }
    }

    @Nested
    class Folder {

        @Test
        void namesAreShortIds_andContentIsTheStoredDiffByteForByte() throws IOException {
            List<Path> written = PatchFolder.write(patches, Survivors.unresolved(survivors, mutant -> false));

            for (int i = 0; i < written.size(); i++) {
                assertEquals(survivors.get(i).shortId() + ".patch", written.get(i).getFileName().toString());
                assertArrayEquals(survivors.get(i).diff().getBytes(StandardCharsets.UTF_8), Files.readAllBytes(written.get(i)));
            }
        }

        @Test
        void resolvedAndDetectedMutants_getNoPatch() throws IOException {
            List<MutantResult> mutants = List.of(
                    result("aaaaaaaa01", "A.java", "op", 1, Verdict.SURVIVED),
                    result("bbbbbbbb02", "B.java", "op", 1, Verdict.SURVIVED),
                    result("cccccccc03", "C.java", "op", 1, Verdict.KILLED));

            List<Path> written = PatchFolder.write(patches, Survivors.unresolved(mutants, mutant -> mutant.id().startsWith("b")));

            assertEquals(List.of(patches.resolve("aaaaaaaa.patch")), written);
            assertFalse(Files.exists(patches.resolve("bbbbbbbb.patch")));
            assertFalse(Files.exists(patches.resolve("cccccccc.patch")));
        }

        @Test
        void sharedShortId_usesTheFullIds() throws IOException {
            List<MutantResult> mutants = List.of(
                    result("abcdef0111", "A.java", "op", 1, Verdict.SURVIVED),
                    result("abcdef0122", "B.java", "op", 1, Verdict.SURVIVED));

            List<Path> written = PatchFolder.write(patches, Survivors.unresolved(mutants, mutant -> false));

            assertEquals(Set.of("abcdef0111.patch", "abcdef0122.patch"),
                    written.stream().map(p -> p.getFileName().toString()).collect(Collectors.toSet()));
        }

        @Test
        void stalePatchesOfAnEarlierExportGo_otherFilesStay() throws IOException {
            Files.writeString(patches.resolve("deadbeef.patch"), "--- a/Old.java\n+++ b/Old.java\n@@ -1 +1 @@\n-a\n+b\n");
            Files.writeString(patches.resolve("cafebabe.patch"), "my own notes\n");
            Files.writeString(patches.resolve("notes.txt"), "--- a/x\n+++ b/x\n");

            PatchFolder.write(patches, List.of(result("aaaaaaaa01", "A.java", "op", 1, Verdict.SURVIVED)));

            assertFalse(Files.exists(patches.resolve("deadbeef.patch")));
            assertTrue(Files.exists(patches.resolve("cafebabe.patch")));
            assertTrue(Files.exists(patches.resolve("notes.txt")));
            assertTrue(Files.exists(patches.resolve("aaaaaaaa.patch")));
        }

        @Test
        void missingFolder_isCreated() throws IOException {
            Path nested = patches.resolve("review/patches");

            PatchFolder.write(nested, List.of(result("aaaaaaaa01", "A.java", "op", 1, Verdict.SURVIVED)));

            assertTrue(Files.isRegularFile(nested.resolve("aaaaaaaa.patch")));
        }
    }
}
