package dev.changeling.review;

import dev.changeling.support.GitFixture;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import dev.changeling.mutant.Generation;
import dev.changeling.mutant.Mutant;
import dev.changeling.results.RunResults;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EquivalentsListTest {

    static final String LOCK = "src/main/java/org/tidepool/Lock.java";

    static final String LOCK_TEXT = """
            package org.tidepool;

            public final class Lock {

                public static boolean canOpen(int inner, int outer) {
                    return inner == outer;
                }

                public static int fill(int level, int target) {
                    int missing = target - level;
                    if (missing > 0) {
                        return missing;
                    }
                    return 0;
                }

                public static boolean safe(int depth, int keel) {
                    return depth > keel + 1;
                }
            }
            """;

    @TempDir
    Path root;

    static String fingerprint(char c) {
        return String.valueOf(c).repeat(64);
    }

    static EquivalentEntry entry(String fingerprint, String file) {
        return new EquivalentEntry(fingerprint, file, "Lock", "canOpen(int,int)", "relational-subset",
                "inner==outer", "inner<=outer", "the gates are equal only when level");
    }

    Path listFile() {
        return EquivalentsList.in(root);
    }

    Generation.Generated generateLock() throws IOException {
        return RunFixtures.generate(SourceFile.of(LOCK, Files.readString(root.resolve(LOCK))));
    }

    void writeLock(String text) throws IOException {
        Files.createDirectories(root.resolve(LOCK).getParent());
        Files.writeString(root.resolve(LOCK), text);
    }

    @Nested
    class LoadingAndSaving {

        @Test
        void projectWithoutAListHasNoEntriesAndSavingNothingWritesNothing() {
            EquivalentsList list = EquivalentsList.load(root);
            list.save();

            assertTrue(list.entries().isEmpty());
            assertFalse(Files.exists(root.resolve(".changeling")));
        }

        @Test
        void firstSaveMakesTheFolderWithItsGitSettings() throws IOException {
            EquivalentsList list = EquivalentsList.load(root);
            list.put(entry(fingerprint('b'), "src/B.java"));
            list.put(entry(fingerprint('a'), "src/A.java"));
            list.save();

            assertEquals("local/\n", Files.readString(root.resolve(".changeling/.gitignore")));
            assertEquals("equivalent-mutants.txt merge=union\n", Files.readString(root.resolve(".changeling/.gitattributes")));
            List<String> lines = Files.readAllLines(listFile());
            assertEquals(EquivalentsFormat.DEFAULT_HEADER, lines.subList(0, 2));
            assertTrue(lines.get(2).startsWith(fingerprint('a') + " | src/A.java"));
            assertTrue(lines.get(3).startsWith(fingerprint('b') + " | src/B.java"));
            assertEquals(List.of(entry(fingerprint('a'), "src/A.java"), entry(fingerprint('b'), "src/B.java")),
                    EquivalentsList.load(root).entries());
        }

        @Test
        void putReplacesByFingerprintAndRemoveTakesOut() {
            EquivalentsList list = EquivalentsList.load(root);
            list.put(entry(fingerprint('a'), "src/A.java"));
            EquivalentEntry newer = entry(fingerprint('a'), "src/A.java").withReason("better words");

            assertEquals(entry(fingerprint('a'), "src/A.java"), list.put(newer).orElseThrow());
            assertEquals("better words", list.find(fingerprint('a')).orElseThrow().reason());
            assertEquals(List.of(newer), list.startingWith("aaaa"));
            assertEquals(List.of(newer), list.removeAll(List.of(fingerprint('a'), fingerprint('c'))));
            assertFalse(list.contains(fingerprint('a')));
        }

        @Test
        void handWrittenHeaderIsKeptAcrossSaves() throws IOException {
            Files.createDirectories(listFile().getParent());
            Files.writeString(listFile(), "# Reviewed in the tide-tables guild.\n");
            EquivalentsList list = EquivalentsList.load(root);
            list.put(entry(fingerprint('a'), "src/A.java"));
            list.save();

            assertEquals("# Reviewed in the tide-tables guild.", Files.readAllLines(listFile()).get(0));
        }

        @Test
        void brokenFileIsReportedWithItsLineAndLeftAsItWas() throws IOException {
            Files.createDirectories(listFile().getParent());
            byte[] broken = ("# h\n" + fingerprint('a') + " | src/A.java | Lock#m() | op\n").getBytes(StandardCharsets.UTF_8);
            Files.write(listFile(), broken);

            UserError error = assertThrows(UserError.class, () -> EquivalentsList.load(root));
            assertTrue(error.getMessage().startsWith(".changeling/equivalent-mutants.txt:2: expected 6 fields"), error.getMessage());
            assertArrayEquals(broken, Files.readAllBytes(listFile()));
        }

        @Test
        void neverWritesOverAFileThatChangedOrBrokeSinceItWasRead() throws IOException {
            EquivalentsList list = EquivalentsList.load(root);
            list.put(entry(fingerprint('a'), "src/A.java"));
            list.save();
            EquivalentsList stale = EquivalentsList.load(root);
            byte[] conflicted = ("<<<<<<< HEAD\n" + Files.readString(listFile()) + "=======\n>>>>>>> other\n")
                    .getBytes(StandardCharsets.UTF_8);
            Files.write(listFile(), conflicted);
            stale.put(entry(fingerprint('b'), "src/B.java"));

            UserError error = assertThrows(UserError.class, stale::save);
            assertEquals(".changeling/equivalent-mutants.txt: changed on disk since it was read; nothing was written. "
                    + "Run the command again", error.getMessage());
            assertArrayEquals(conflicted, Files.readAllBytes(listFile()));
        }

        @Test
        void savingTwiceFromOneListWorks() {
            EquivalentsList list = EquivalentsList.load(root);
            list.put(entry(fingerprint('a'), "src/A.java"));
            list.save();
            list.put(entry(fingerprint('b'), "src/B.java"));
            list.save();

            assertEquals(2, EquivalentsList.load(root).entries().size());
        }
    }

    @Nested
    class SurvivingEdits {

        @BeforeEach
        void lock() throws IOException {
            writeLock(LOCK_TEXT);
        }

        static Map<String, Mutant> byFingerprint(Generation.Generated generated) {
            return generated.mutants().stream().collect(Collectors.toMap(Mutant::fingerprint, Function.identity()));
        }

        static Set<String> fingerprintsOf(Generation.Generated generated, String member) {
            return generated.mutants().stream().filter(m -> m.first().member().equals(member))
                    .map(Mutant::fingerprint).collect(Collectors.toSet());
        }

        @Test
        void entriesStillMatchAfterLinesAboveARenameAndAReformatElsewhere() throws IOException {
            Generation.Generated before = generateLock();
            List<Mutant> judged = before.mutants().stream().filter(m -> m.first().member().equals("canOpen(int,int)")).toList();
            assertTrue(judged.size() >= 3, "the comparison in canOpen has several mutants");
            EquivalentsList list = EquivalentsList.load(root);
            for (Mutant mutant : judged) {
                list.put(EquivalentEntry.of(mutant, LOCK_TEXT, "the gates only open at equal levels"));
            }
            list.save();

            String edited = LOCK_TEXT
                    .replace("public final class Lock {\n", """
                            /** A lock between two basins. */
                            public final class Lock {

                                private static final int SLACK = 2;
                            """)
                    .replace("int missing = target - level;\n        if (missing > 0) {\n            return missing;",
                            "int shortfall = target - level;\n        if (shortfall > 0) {\n            return shortfall;")
                    .replace("        return depth > keel + 1;", "        return depth\n                >   keel+1 ;");
            assertNotEquals(LOCK_TEXT, edited);
            assertTrue(edited.contains("shortfall") && edited.contains(">   keel+1"), "every edit applied");
            writeLock(edited);
            Generation.Generated after = generateLock();

            Map<String, Mutant> now = byFingerprint(after);
            for (EquivalentEntry entry : EquivalentsList.load(root).entries()) {
                Mutant match = now.get(entry.fingerprint());
                assertTrue(match != null, "still made: " + entry);
                assertEquals(entry.member(), match.first().member());
                assertEquals(entry.original(), match.first().snippet());
            }
            assertTrue(EquivalentsList.load(root).stale(RunFixtures.runOf(after)).stale().isEmpty());
            // The lines did move, so a line-based identity would have lost them.
            Mutant first = judged.get(0);
            assertEquals(first.first().line() + 3, now.get(first.fingerprint()).first().line());
            // The same edits change what they touch: the renamed method's mutants are new ones; the reformatted method's are not.
            Set<String> fillBefore = fingerprintsOf(before, "fill(int,int)");
            Set<String> fillAfter = fingerprintsOf(after, "fill(int,int)");
            assertFalse(fillBefore.isEmpty());
            assertTrue(fillBefore.stream().noneMatch(fillAfter::contains));
            assertEquals(fingerprintsOf(before, "safe(int,int)"), fingerprintsOf(after, "safe(int,int)"));
        }

        @Test
        void editingTheJudgedCodeMakesItsEntriesStaleAndPruningRemovesThem() throws IOException {
            Generation.Generated before = generateLock();
            EquivalentsList list = EquivalentsList.load(root);
            Mutant canOpen = before.mutants().stream().filter(m -> m.first().member().equals("canOpen(int,int)")).findFirst().orElseThrow();
            Mutant safe = before.mutants().stream().filter(m -> m.first().member().equals("safe(int,int)")).findFirst().orElseThrow();
            list.put(EquivalentEntry.of(canOpen, LOCK_TEXT, "judged"));
            list.put(EquivalentEntry.of(safe, LOCK_TEXT, "judged too"));
            list.save();

            writeLock(LOCK_TEXT.replace("return inner == outer;", "return inner == outer - 1;"));
            RunResults run = RunFixtures.runOf(generateLock());
            EquivalentsList reloaded = EquivalentsList.load(root);
            Staleness staleness = reloaded.stale(run);

            assertEquals(List.of(canOpen.fingerprint()), staleness.stale().stream().map(EquivalentEntry::fingerprint).toList());
            assertTrue(staleness.unchecked().isEmpty());
            reloaded.removeAll(staleness.stale().stream().map(EquivalentEntry::fingerprint).toList());
            reloaded.save();
            assertEquals(List.of(safe.fingerprint()),
                    EquivalentsList.load(root).entries().stream().map(EquivalentEntry::fingerprint).toList());
        }

        @Test
        void entryFromTheResultsFileReadsLikeOneFromTheGenerator() throws IOException {
            Generation.Generated generated = generateLock();
            Mutant mutant = generated.mutants().stream()
                    .filter(m -> m.first().member().equals("fill(int,int)") && m.first().replacement().equals(">="))
                    .findFirst().orElseThrow();

            EquivalentEntry fromGenerator = EquivalentEntry.of(mutant, LOCK_TEXT, "same");
            EquivalentEntry fromResults = EquivalentEntry.of(RunFixtures.result(mutant, LOCK_TEXT), "same");
            assertEquals(fromGenerator, fromResults);
            assertEquals("missing>0", fromGenerator.original());
            assertEquals("missing>=0", fromGenerator.mutated());
        }
    }

    @Nested
    class StaleEntries {

        EquivalentsList listWith(EquivalentEntry... entries) {
            EquivalentsList list = EquivalentsList.load(root);
            for (EquivalentEntry entry : entries) {
                list.put(entry);
            }
            return list;
        }

        @Test
        void entriesTheRunCouldNotJudgeAreUncheckedNotStale() throws IOException {
            writeLock(LOCK_TEXT);
            Files.writeString(root.resolve("src/main/java/org/tidepool/Other.java"), "class Other {}\n");
            EquivalentEntry otherFile = entry(fingerprint('a'), "src/main/java/org/tidepool/Other.java");
            EquivalentEntry otherOperator = new EquivalentEntry(fingerprint('b'), LOCK, "Lock", "fill(int,int)",
                    "arithmetic-swap", "target-level", "target+level", "");
            EquivalentEntry secondOrder = new EquivalentEntry(fingerprint('c'), LOCK, "Lock", "fill(int,int)",
                    "relational-subset+relational-subset", "a ; b", "c ; d", "");
            EquivalentEntry gone = entry(fingerprint('d'), "src/main/java/org/tidepool/Removed.java");
            EquivalentEntry changed = entry(fingerprint('e'), LOCK);

            Staleness result = listWith(otherFile, otherOperator, secondOrder, gone, changed).stale(RunFixtures.runOf(generateLock()));
            assertEquals(Set.of(gone, changed), Set.copyOf(result.stale()));
            assertEquals(Set.of(otherFile, otherOperator, secondOrder), Set.copyOf(result.unchecked()));
        }

        @Test
        void aSampleOrAChangeScopedOrUnfinishedRunCannotTell() throws IOException {
            writeLock(LOCK_TEXT);
            Generation.Generated generated = generateLock();
            EquivalentsList list = listWith(entry(fingerprint('e'), LOCK));

            UserError sampled = assertThrows(UserError.class,
                    () -> list.stale(RunFixtures.runOf(generated, RunFixtures.settings(true, null))));
            assertTrue(sampled.getMessage().startsWith("the last run was a sample"), sampled.getMessage());
            UserError scoped = assertThrows(UserError.class,
                    () -> list.stale(RunFixtures.runOf(generated, RunFixtures.settings(false, "changes since origin/main"))));
            assertTrue(scoped.getMessage().startsWith("the last run was limited to changes since origin/main"), scoped.getMessage());
            RunResults full = RunFixtures.runOf(generated);
            RunResults unfinished = new RunResults(full.format(), false, full.settings(), full.tests(), full.timings(),
                    full.mutants(), full.problems(), full.sourceHashes());
            assertThrows(UserError.class, () -> list.stale(unfinished));
        }
    }

    @Nested
    class MergingInGit {

        GitFixture repo;
        String base;

        @BeforeEach
        void sharedList() {
            repo = GitFixture.init(root);
            EquivalentsList list = EquivalentsList.load(root);
            list.put(entry(fingerprint('1'), "src/main/java/org/tidepool/Aqueduct.java"));
            list.put(entry(fingerprint('3'), "src/main/java/org/tidepool/Lock.java"));
            list.put(entry(fingerprint('9'), "src/main/java/org/tidepool/Weir.java"));
            list.save();
            repo.commitAll("equivalents so far");
            base = repo.git("rev-parse", "HEAD").strip();
        }

        void addOnBranch(String branch, EquivalentEntry added) {
            repo.git("checkout", "-q", "-b", branch, base);
            EquivalentsList list = EquivalentsList.load(root);
            list.put(added);
            list.save();
            repo.commitAll("judged one on " + branch);
        }

        @Test
        void twoBranchesAddingNeighbouringEntriesMergeWithoutConflict() {
            EquivalentEntry fromVents = entry(fingerprint('4'), "src/main/java/org/tidepool/Lock.java");
            EquivalentEntry fromSluices = entry(fingerprint('5'), "src/main/java/org/tidepool/Lock.java");
            addOnBranch("vents", fromVents);
            addOnBranch("sluices", fromSluices);
            // Reference: git itself says which merge driver applies to the file.
            assertEquals(".changeling/equivalent-mutants.txt: merge: union",
                    repo.git("check-attr", "merge", ".changeling/equivalent-mutants.txt").strip());

            GitFixture.Result merge = repo.tryGit("merge", "--no-edit", "-q", "vents");
            assertEquals(0, merge.exitCode(), merge.out() + merge.err());
            EquivalentsList merged = EquivalentsList.load(root);
            assertEquals(5, merged.entries().size());
            assertTrue(merged.contains(fromVents.fingerprint()) && merged.contains(fromSluices.fingerprint()));
            assertTrue(repo.git("status", "--porcelain").isEmpty());
        }

        @Test
        void entriesApartInTheSortOrderMergeEvenWithoutTheUnionDriver() throws IOException {
            Files.delete(root.resolve(".changeling/.gitattributes"));
            repo.commitAll("plain merges");
            base = repo.git("rev-parse", "HEAD").strip();
            addOnBranch("vents", entry(fingerprint('2'), "src/main/java/org/tidepool/Basin.java"));
            addOnBranch("sluices", entry(fingerprint('7'), "src/main/java/org/tidepool/Sluice.java"));

            GitFixture.Result merge = repo.tryGit("merge", "--no-edit", "-q", "vents");
            assertEquals(0, merge.exitCode(), merge.out() + merge.err());
            assertEquals(5, EquivalentsList.load(root).entries().size());
        }

        @Test
        void withoutTheUnionDriverNeighbouringEntriesWouldConflict() throws IOException {
            Files.delete(root.resolve(".changeling/.gitattributes"));
            repo.commitAll("plain merges");
            base = repo.git("rev-parse", "HEAD").strip();
            addOnBranch("vents", entry(fingerprint('4'), "src/main/java/org/tidepool/Lock.java"));
            addOnBranch("sluices", entry(fingerprint('5'), "src/main/java/org/tidepool/Lock.java"));

            assertNotEquals(0, repo.tryGit("merge", "--no-edit", "-q", "vents").exitCode());
            UserError error = assertThrows(UserError.class, () -> EquivalentsList.load(root));
            assertTrue(error.getMessage().contains("unresolved git merge conflict"), error.getMessage());
        }
    }
}
