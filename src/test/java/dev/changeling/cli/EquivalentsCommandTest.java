package dev.changeling.cli;

import dev.changeling.project.ProjectLayout;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.mutant.Generation;
import dev.changeling.mutant.Mutant;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.RunFixtures;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EquivalentsCommandTest {

    static final String GATE = "src/main/java/org/tidepool/Gate.java";
    static final String GATE_TEXT = """
            package org.tidepool;

            final class Gate {
                boolean opens(int inside, int outside) {
                    return inside == outside;
                }

                boolean floods(int level) {
                    return level > 300;
                }
            }
            """;

    @TempDir
    Path root;

    Generation.Generated generated;

    record Outcome(int exitCode, String out, String err) {
    }

    Outcome run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out), new PrintWriter(err), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    @BeforeEach
    void projectWithResults() throws IOException {
        Files.writeString(root.resolve("pom.xml"), "<project/>\n");
        writeGate(GATE_TEXT);
    }

    void writeGate(String text) throws IOException {
        Files.createDirectories(root.resolve(GATE).getParent());
        Files.writeString(root.resolve(GATE), text);
        generated = RunFixtures.generate(SourceFile.of(GATE, text));
        ResultsFile.write(ProjectLayout.of(root).resultsFile(), RunFixtures.runOf(generated));
    }

    Mutant mutantIn(String member, String replacement) {
        return generated.mutants().stream()
                .filter(m -> m.first().member().equals(member) && m.first().replacement().equals(replacement))
                .findFirst().orElseThrow();
    }

    String id(Mutant mutant) {
        return mutant.fingerprint().substring(0, 10);
    }

    @Test
    void isRegisteredUnderTheRootCommand() {
        Outcome help = run("--help");
        assertEquals(0, help.exitCode());
        assertTrue(help.out().contains("equivalents"), help.out());
    }

    @Nested
    class Listing {

        @Test
        void emptyListSaysSo() {
            Outcome shown = run("equivalents", "show", root.toString());
            assertEquals(ExitCode.OK, shown.exitCode());
            assertEquals("no equivalent mutants listed in .changeling/equivalent-mutants.txt\n", shown.out());
        }

        @Test
        void addedMutantIsListedWithItsChangeAndReason() {
            Mutant mutant = mutantIn("opens(int,int)", "<=");
            Outcome added = run("equivalents", "add", id(mutant), "--reason", "gates never differ here", root.toString());
            assertEquals(ExitCode.OK, added.exitCode(), added.err());
            assertEquals("listed " + mutant.shortId() + " as equivalent in .changeling/equivalent-mutants.txt\n", added.out());

            Outcome shown = run("equivalents", "show", root.toString());
            assertEquals("  " + mutant.shortId() + "  " + GATE + "  Gate#opens(int,int)  relational-subset\n"
                    + "            inside==outside → inside<=outside\n"
                    + "            why: gates never differ here\n"
                    + "1 equivalent mutant in .changeling/equivalent-mutants.txt\n", shown.out());
        }

        @Test
        void killedMutantCannotBeListed() throws IOException {
            Mutant mutant = mutantIn("floods(int)", ">=");
            RunResults run = RunFixtures.runOf(generated);
            List<MutantResult> mutants = new ArrayList<>();
            for (MutantResult result : run.mutants()) {
                mutants.add(result.id().equals(mutant.fingerprint())
                        ? result.withVerdict(Verdict.KILLED, "GateTest.floodsAtThreeHundred", "expected false", List.of(), 1.0)
                        : result);
            }
            ResultsFile.write(ProjectLayout.of(root).resultsFile(), new RunResults(run.format(), true, run.settings(), run.tests(),
                    run.timings(), mutants, run.problems(), run.sourceHashes()));

            Outcome added = run("equivalents", "add", id(mutant), "--reason", "surely", root.toString());
            assertEquals(ExitCode.USER_ERROR, added.exitCode());
            assertEquals("changeling: mutant " + mutant.shortId() + " was killed by GateTest.floodsAtThreeHundred, "
                    + "so a test tells it from the original: it is not equivalent\n", added.err());
        }

        @Test
        void killingTestIsNamedAsTheRunShowsIt() throws IOException {
            RunResults run = ResultsFile.read(ProjectLayout.of(root).resultsFile());
            Mutant mutant = generated.mutants().get(0);
            String uniqueId = "[engine:junit-jupiter]/[class:GateTest]/[method:floodsAtThreeHundred()]";
            List<MutantResult> mutants = run.mutants().stream()
                    .map(result -> result.id().equals(mutant.fingerprint())
                            ? result.withVerdict(Verdict.KILLED, uniqueId, "expected false", List.of(), 1.0) : result)
                    .toList();
            ResultsFile.write(ProjectLayout.of(root).resultsFile(), new RunResults(run.format(), true, run.settings(),
                    List.of(new TestRecord(uniqueId, "GateTest.floodsAtThreeHundred()", 2.0)),
                    run.timings(), mutants, run.problems(), run.sourceHashes()));

            Outcome added = run("equivalents", "add", id(mutant), "--reason", "surely", root.toString());

            assertEquals(ExitCode.USER_ERROR, added.exitCode());
            assertTrue(added.err().contains("killed by GateTest.floodsAtThreeHundred(), so"), added.err());
        }

        @Test
        void emptyReasonIsRefused() {
            Outcome added = run("equivalents", "add", id(generated.mutants().get(0)), "--reason", " ", root.toString());

            assertEquals(ExitCode.USER_ERROR, added.exitCode());
            assertTrue(added.err().startsWith("changeling: --reason is empty"), added.err());
            assertFalse(Files.exists(EquivalentsList.in(root)), "nothing is written");
        }

        @Test
        void unknownOrTooShortIdIsRefused() {
            Outcome unknown = run("equivalents", "add", "ffffffff", "--reason", "x", root.toString());
            assertEquals(ExitCode.USER_ERROR, unknown.exitCode());
            assertTrue(unknown.err().startsWith("changeling: no mutant ffffffff in the last run"), unknown.err());
            Outcome tooShort = run("equivalents", "drop", "ab", root.toString());
            assertTrue(tooShort.err().contains("'ab' is not a mutant id"), tooShort.err());
        }

        @Test
        void brokenListIsReportedWithFileAndLine() throws IOException {
            Path list = EquivalentsList.in(root);
            Files.createDirectories(list.getParent());
            Files.writeString(list, "# h\n<<<<<<< HEAD\n");

            Outcome shown = run("equivalents", "show", root.toString());
            assertEquals(ExitCode.USER_ERROR, shown.exitCode());
            assertTrue(shown.err().startsWith("changeling: .changeling/equivalent-mutants.txt:2: unresolved git merge conflict"),
                    shown.err());
        }

        @Test
        void dropRemovesByShortId() {
            Mutant mutant = mutantIn("opens(int,int)", "<=");
            run("equivalents", "add", id(mutant), "--reason", "r", root.toString());

            Outcome dropped = run("equivalents", "drop", mutant.shortId(), root.toString());
            assertEquals(ExitCode.OK, dropped.exitCode(), dropped.err());
            assertEquals("removed 1 entry from .changeling/equivalent-mutants.txt\n", dropped.out());
            assertTrue(EquivalentsList.load(root).entries().isEmpty());
        }
    }

    @Nested
    class StaleEntries {

        Mutant judged;
        Mutant kept;

        @BeforeEach
        void listTwoThenChangeOne() throws IOException {
            judged = mutantIn("opens(int,int)", "<=");
            kept = mutantIn("floods(int)", ">=");
            run("equivalents", "add", id(judged), "--reason", "gates never differ here", root.toString());
            run("equivalents", "add", id(kept), "--reason", "300 is never reached", root.toString());
            writeGate(GATE_TEXT.replace("return inside == outside;", "return inside == outside + 1;"));
        }

        @Test
        void staleListsOnlyTheEntryWhoseCodeChanged() {
            Outcome stale = run("equivalents", "stale", root.toString());
            assertEquals(ExitCode.OK, stale.exitCode(), stale.err());
            assertEquals("1 stale entry (the last run no longer makes these mutants, or their file is gone):\n"
                    + "  " + judged.shortId() + "  " + GATE + "  Gate#opens(int,int)  relational-subset\n"
                    + "            inside==outside → inside<=outside\n"
                    + "            why: gates never differ here\n"
                    + "remove them with: changeling equivalents prune\n", stale.out());
        }

        @Test
        void pruneWithoutATerminalOrConsentRemovesNothing() throws IOException {
            byte[] before = Files.readAllBytes(EquivalentsList.in(root));
            Outcome pruned = run("equivalents", "prune", root.toString());

            assertEquals(ExitCode.NO_TERMINAL, pruned.exitCode());
            assertTrue(pruned.out().startsWith("1 stale entry"), pruned.out());
            assertEquals("changeling: not removing the 1 stale entry above without a terminal to confirm; "
                    + "add --yes to remove them\n", pruned.err());
            assertArrayEquals(before, Files.readAllBytes(EquivalentsList.in(root)));
        }

        @Test
        void pruneWithYesShowsThenRemovesTheStaleEntry() {
            Outcome pruned = run("equivalents", "prune", "--yes", root.toString());

            assertEquals(ExitCode.OK, pruned.exitCode(), pruned.err());
            assertTrue(pruned.out().contains(judged.shortId()), pruned.out());
            assertTrue(pruned.out().endsWith("removed 1 stale entry from .changeling/equivalent-mutants.txt\n"), pruned.out());
            assertEquals(List.of(kept.fingerprint()),
                    EquivalentsList.load(root).entries().stream().map(e -> e.fingerprint()).toList());
            assertEquals("no stale entries in .changeling/equivalent-mutants.txt\n", run("equivalents", "stale", root.toString()).out());
        }

        @Test
        void withoutResultsTheUserIsToldToRunFirst() throws IOException {
            Files.delete(ProjectLayout.of(root).resultsFile());
            Outcome stale = run("equivalents", "stale", root.toString());
            assertEquals(ExitCode.USER_ERROR, stale.exitCode());
            assertTrue(stale.err().contains("no results yet"), stale.err());
        }
    }
}
