package dev.changeling.review.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.review.EquivalentEntry;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.TriageMarks;
import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TriageTest {

    @TempDir
    Path root;

    TriageProject project;
    Triage.Ending ending;
    final List<MutantResult> rerunAsked = new ArrayList<>();

    @BeforeEach
    void project() throws IOException {
        project = TriageProject.in(root);
    }

    /** A re-run that answers with the verdicts given, one per call, and remembers what it was asked. */
    MutantRerun rerunSaying(Verdict... verdicts) {
        Deque<Verdict> left = new ArrayDeque<>(List.of(verdicts));
        return (mutant, progress) -> {
            rerunAsked.add(mutant);
            Verdict verdict = left.removeFirst();
            return mutant.withVerdict(verdict, verdict == Verdict.KILLED ? TriageProject.LIT_AT_DUSK.id() : null, null,
                    mutant.reachedBy(), 5.0);
        };
    }

    String session(String script) {
        return session(script, rerunSaying(), false);
    }

    String session(String script, MutantRerun rerun, boolean revisit) {
        StringWriter text = new StringWriter();
        PrintWriter out = new PrintWriter(text);
        ending = Triage.run(new Triage.Setup(root, project.results, revisit, Style.plain()),
                Answers.fromLines(new StringReader(script), out), out, rerun);
        out.flush();
        return text.toString();
    }

    String session(String script, Map<String, String> environment) {
        StringWriter text = new StringWriter();
        PrintWriter out = new PrintWriter(text);
        ending = Triage.run(new Triage.Setup(root, project.results, false, Style.plain(), environment),
                Answers.fromLines(new StringReader(script), out), out, rerunSaying());
        out.flush();
        return text.toString();
    }

    String id(int walked) {
        return project.walked(walked).id();
    }

    String shortId(int walked) {
        return project.walked(walked).shortId();
    }

    Optional<EquivalentEntry> listed(int walked) {
        return EquivalentsList.load(root).find(id(walked));
    }

    Optional<TriageMarks.Mark> mark(int walked) {
        return TriageMarks.open(root).get(id(walked));
    }

    @Test
    void fixtureHasSixSurvivorsInTwoMembers() {
        // Relational subset: three replacements for >= and three for > (Kaminski, Ammann & Offutt 2011, from memory).
        assertEquals(6, project.walked.size());
        assertEquals("lit(int,int)", project.walked(0).first().member());
        assertEquals("flashes(int)", project.walked(5).first().member());
    }

    @Nested
    class Showing {

        @Test
        void headerNamesIdPlaceOperatorOrderDescriptionAndMember() {
            String out = session("q\n");

            MutantResult first = project.walked(0);
            assertTrue(out.contains("survivor 1 of 6 · " + first.shortId() + " · " + TriageProject.BEACON + ":7 · relational-subset"
                    + " · first-order"), out);
            assertTrue(out.contains("  " + first.first().description() + " in Beacon#lit(int,int)"), out);
        }

        @Test
        void showsTheDiffAsItRanAndTheTestsThatReachedIt() {
            String out = session("s\ns\ns\ns\nq\n");

            assertTrue(out.contains(project.walked(0).diff()), out);
            assertTrue(out.contains("1 test reaches this code and passed with the change — the place to write the missing assertion:\n"
                    + "  BeaconTest > lit at dusk\n"), out);
            assertTrue(out.contains("2 tests reach this code and passed with the change — the place to write the missing assertion:\n"
                    + "  BeaconTest > flashes in fog\n  BeaconTest.Fog > thickFog()\n"), out);
        }

        @Test
        void secondOrder_headerNamesTheOrderAndEachChangeByLine() throws IOException {
            project = TriageProject.secondOrderIn(root.resolve("squall"));
            MutantResult first = project.walked(0);
            StringWriter text = new StringWriter();
            PrintWriter out = new PrintWriter(text);

            Triage.run(new Triage.Setup(project.root, project.results, false, Style.plain()),
                    Answers.fromLines(new StringReader("q\n"), out), out, rerunSaying());

            String shown = text.toString();
            assertEquals(2, first.order());
            assertTrue(shown.contains(first.shortId() + " · " + TriageProject.SQUALL + ":5 · relational-subset · order 2"), shown);
            for (var point : first.points()) {
                assertTrue(shown.contains("  line 5: " + point.description() + " in Squall#calm(int,int)\n"), shown);
            }
        }

        @Test
        void interruptedRun_saysOnlyItsFinishedMutantsAreHere() {
            RunResults whole = project.results;
            project = new TriageProject(root, new RunResults(whole.format(), false, whole.settings(), whole.tests(),
                    whole.timings(), whole.mutants().subList(0, 2), whole.problems(), whole.sourceHashes()));

            String out = session("q\n");

            assertTrue(out.startsWith("the last run was interrupted: only the mutants it finished are here\n"), out);
        }

        @Test
        void promptListsEveryChoiceByLetter() {
            String out = session("q\n");

            assertTrue(out.contains("e equivalent  t needs a test  f fixed  u undo  s skip  b back  g go to  l list  c context  o open  q quit  ? help > q\n"), out);
        }

        @Test
        void helpExplainsEveryChoiceAndStaysOnTheSurvivor() {
            String out = session("?\nt\nq\n");

            for (Choice choice : Choice.values()) {
                assertTrue(out.contains("  " + choice.key() + "  " + choice.label() + ": " + choice.help()), choice.name());
            }
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void unknownAnswer_saysSoAndStaysOnTheSurvivor() {
            String out = session("x\nequivalent\n\nt\nq\n");

            assertTrue(out.contains("'x' is not one of the choices; ? explains them"), out);
            assertTrue(out.contains("'equivalent' is not one of the choices"), out);
            assertTrue(mark(0).isPresent());
            assertTrue(listed(0).isEmpty());
        }

        @Test
        void countsSoFarByKind() {
            String out = session("e the hour never equals dusk here\nt\ns\nq\n");

            assertTrue(out.contains("0 of 6 decided (0 equivalent, 0 needs a test, 0 fixed) · 6 left\n"), out);
            assertTrue(out.contains("2 of 6 decided (1 equivalent, 1 needs a test, 0 fixed) · 4 left\n"), out);
            assertTrue(out.contains("2 of 6 decided (1 equivalent, 1 needs a test, 0 fixed) · 4 left, 1 of them skipped\n"), out);
        }
    }

    @Nested
    class Equivalent {

        @Test
        void asksForTheReasonAndWritesItToTheListAtOnce() {
            String out = session("e\nhour and dusk are whole hours, and at dusk both read lit\nq\n");

            EquivalentEntry entry = listed(0).orElseThrow();
            assertEquals("hour and dusk are whole hours, and at dusk both read lit", entry.reason());
            assertEquals(TriageProject.BEACON, entry.file());
            assertEquals("lit(int,int)", entry.member());
            assertTrue(out.contains("why can no test tell it from the original? (one line, required) > hour and dusk"), out);
            assertTrue(out.contains("listed " + shortId(0) + " as equivalent in .changeling/equivalent-mutants.txt"), out);
            assertTrue(out.contains("survivor 2 of 6"), out);
        }

        @Test
        void reasonMayFollowTheLetter() {
            session("E   dusk is never negative  \nq\n");

            assertEquals("dusk is never negative", listed(0).orElseThrow().reason());
        }

        @Test
        void blankReason_marksNothingAndStays() {
            String out = session("e\n   \nt\nq\n");

            assertTrue(out.contains("not marked: an equivalent needs a reason"), out);
            assertFalse(Files.exists(EquivalentsList.in(root)));
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void inputEndingBeforeTheReason_marksNothing() {
            String out = session("e\n");

            assertTrue(out.contains("end of input: not marked"), out);
            assertFalse(Files.exists(EquivalentsList.in(root)));
        }

        @Test
        void equivalentSurvivor_isNotWalkedAgain() {
            session("e reads the same at every whole hour\nq\n");

            String out = session("q\n");

            assertEquals(5, ending.survivors());
            assertTrue(out.contains("survivor 1 of 5 · " + shortId(1)), out);
        }
    }

    @Nested
    class NeedsTest {

        @Test
        void writesTheLocalMarkWithAnOptionalNote() {
            String out = session("t\nt check the hour just before dusk\nq\n");

            assertEquals(new TriageMarks.Mark(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().at(), null), mark(0).orElseThrow());
            assertEquals("check the hour just before dusk", mark(1).orElseThrow().note());
            assertTrue(out.contains("marked " + shortId(0) + " as needing a test in .changeling/local/triage.json"), out);
            assertFalse(Files.exists(EquivalentsList.in(root)));
        }

        @Test
        void replacesAnEarlierEquivalent() {
            session("e not reachable at dusk\nb\nt\nq\n");

            assertTrue(listed(0).isEmpty());
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }
    }

    @Nested
    class Fixed {

        @Test
        void killedOnTheRerun_isRecordedFixedWithTheTest() {
            String out = session("f\nq\n", rerunSaying(Verdict.KILLED), false);

            assertEquals(List.of(project.walked(0)), rerunAsked);
            TriageMarks.Mark mark = mark(0).orElseThrow();
            assertEquals(TriageMarks.Kind.FIXED, mark.kind());
            assertEquals("killed by BeaconTest > lit at dusk", mark.note());
            assertTrue(out.contains(shortId(0) + " is killed by BeaconTest > lit at dusk now: marked fixed"), out);
            assertTrue(out.contains("survivor 2 of 6"), out);
        }

        @Test
        void fixed_saysEachStepOfTheRerunAsItStarts_thenTheVerdict() {
            MutantRerun telling = (mutant, progress) -> {
                progress.accept("building the project");
                progress.accept("running the tests that reach it, with the mutant");
                return rerunSaying(Verdict.KILLED).rerun(mutant, progress);
            };

            String out = session("f\nq\n", telling, false);

            assertTrue(out.contains("running " + shortId(0) + " again against the code and tests as they are now …\n"
                    + "  building the project …\n"
                    + "  running the tests that reach it, with the mutant …\n"
                    + shortId(0) + " is killed by BeaconTest > lit at dusk now: marked fixed\n"), out);
        }

        @Test
        void timedOutOnTheRerun_countsAsDetected() {
            session("f\nq\n", rerunSaying(Verdict.TIMED_OUT), false);

            assertEquals("timed out", mark(0).orElseThrow().note());
        }

        @Test
        void stillSurviving_isNotRecordedAndStaysOnTheSurvivor() {
            String out = session("f\nq\n", rerunSaying(Verdict.SURVIVED), false);

            assertTrue(mark(0).isEmpty());
            assertTrue(out.contains(shortId(0) + " still survives (1 test ran and passed): not marked fixed"), out);
            assertFalse(out.contains("survivor 2 of 6"), out);
        }

        @Test
        void stillbornOnTheRerun_isNotRecorded() {
            String out = session("f\nq\n", rerunSaying(Verdict.STILLBORN), false);

            assertTrue(mark(0).isEmpty());
            assertTrue(out.contains(shortId(0) + " came out stillborn: not marked fixed"), out);
        }

        @Test
        void rerunThatCannotRun_saysWhyAndRecordsNothing() {
            MutantRerun unavailable = (mutant, progress) -> {
                throw new UserError("running a mutant again is not available yet");
            };

            String out = session("f\nt\nq\n", unavailable, false);

            assertTrue(out.contains("cannot run it again: running a mutant again is not available yet; nothing recorded"), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void fixedSurvivor_isNotWalkedAgain() {
            session("f\nq\n", rerunSaying(Verdict.KILLED), false);

            session("q\n");

            assertEquals(5, ending.survivors());
        }

        @Test
        void killedOnTheRerun_takesAnEarlierEquivalentOffTheList() {
            session("e looked equivalent\nb\nf\nq\n", rerunSaying(Verdict.KILLED), false);

            assertTrue(listed(0).isEmpty());
            assertEquals(TriageMarks.Kind.FIXED, mark(0).orElseThrow().kind());
        }
    }

    @Nested
    class Undo {

        @Test
        void undo_ofAnEquivalent_removesOnlyItsEntry_andKeepsEveryOtherDecision() {
            session("s\nt kept\nq\n");
            EquivalentsList list = EquivalentsList.load(root);
            list.put(EquivalentEntry.of(project.walked(5), "listed by hand"));
            list.save();

            String out = session("e at dusk both read lit\nb\nb\nu\nq\n");

            assertTrue(out.contains("cleared " + shortId(0) + ": no longer equivalent (at dusk both read lit)"
                    + " in .changeling/equivalent-mutants.txt\n"), out);
            assertTrue(listed(0).isEmpty());
            assertEquals("listed by hand", listed(5).orElseThrow().reason());
            assertEquals("kept", mark(1).orElseThrow().note());
            assertEquals(Optional.of(shortId(0)), ending.resumesAt());
        }

        @Test
        void undo_ofANeedsTestMark_removesOnlyThatMark() {
            String out = session("t first\nt second\nb\nu\nq\n");

            assertTrue(out.contains("cleared " + shortId(1) + ": no longer needs a test (second) in .changeling/local/triage.json\n"
                    + "1 of 6 decided (0 equivalent, 1 needs a test, 0 fixed) · 5 left\n"), out);
            assertTrue(mark(1).isEmpty());
            assertEquals("first", mark(0).orElseThrow().note());
        }

        @Test
        void undo_ofAFixedMark_removesIt() {
            session("f\nb\nu\nq\n", rerunSaying(Verdict.KILLED), false);

            assertTrue(mark(0).isEmpty());
            assertEquals(6, ending.survivors());
        }

        @Test
        void undo_withoutADecision_saysSoAndWritesNothing() {
            String out = session("u\nq\n");

            assertTrue(out.contains(shortId(0) + " has no decision to clear\n"), out);
            assertFalse(Files.exists(EquivalentsList.in(root)));
            assertFalse(Files.exists(TriageMarks.in(root)));
        }
    }

    @Nested
    class GoingTo {

        /** Four hex digits that start none of the survivors' ids. */
        String unusedPrefix() {
            for (int value = 0; ; value++) {
                String prefix = String.format("%04x", value);
                if (project.walked.stream().noneMatch(mutant -> mutant.id().startsWith(prefix))) {
                    return prefix;
                }
            }
        }

        @Test
        void goTo_byIdPrefix_showsThatSurvivorAndDecidesThere() {
            String out = session("g " + id(4).substring(0, 6).toUpperCase() + "\nt\nq\n");

            assertTrue(out.contains("survivor 5 of 6 · " + shortId(4)), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(4).orElseThrow().kind());
            assertTrue(mark(0).isEmpty());
        }

        @Test
        void goTo_ambiguousPrefix_saysWhichFitAndStays() {
            List<MutantResult> twins = new ArrayList<>();
            for (MutantResult mutant : project.results.mutants()) {
                boolean twin = mutant.id().equals(id(0)) || mutant.id().equals(id(1));
                twins.add(twin ? withId(mutant, "3fa2" + mutant.id().substring(4)) : mutant);
            }
            RunResults whole = project.results;
            project = new TriageProject(root, new RunResults(whole.format(), true, whole.settings(), whole.tests(),
                    whole.timings(), twins, whole.problems(), whole.sourceHashes()));

            String out = session("g 3fa2\nt\nq\n");

            assertTrue(out.contains("id 3fa2 fits 2 mutants (3fa2"), out);
            assertTrue(out.contains("); give more digits\ne equivalent"), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void goTo_unknownPrefix_saysSoInOneLineAndStays() {
            String prefix = unusedPrefix();

            String out = session("g " + prefix + "\nt\nq\n");

            assertTrue(out.contains("> g " + prefix + "\nno mutant " + prefix + " among the unresolved survivors here; l lists them\n"
                    + "e equivalent"), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void goTo_notAnIdOrNoId_saysWhatItNeeds() {
            String out = session("g beacon\ng\nq\n");

            assertTrue(out.contains("'beacon' is not a mutant id; give at least 4 of its hex digits\n"), out);
            assertTrue(out.contains("g needs the start of a survivor's id, such as g " + id(0).substring(0, 4) + "; l lists them\n"), out);
        }

        MutantResult withId(MutantResult mutant, String id) {
            return new MutantResult(id, mutant.file(), mutant.order(), mutant.points(), mutant.verdict(), mutant.killedBy(),
                    mutant.detail(), mutant.testsRun(), mutant.reachedBy(), mutant.millis(), mutant.diff());
        }
    }

    @Nested
    class Listing {

        @Test
        void list_showsEveryUnresolvedSurvivorOnALine_thenStaysOnTheCurrent() {
            String out = session("e at dusk both read lit\nt\ns\nl\nt\nq\n");

            String place7 = TriageProject.BEACON + ":7 ";
            String place11 = TriageProject.BEACON + ":11";
            assertTrue(out.contains("6 unresolved survivors (> marks this one):\n"
                    + "  1  " + shortId(0) + "  " + place7 + "  relational-subset  equivalent\n"
                    + "  2  " + shortId(1) + "  " + place7 + "  relational-subset  needs a test\n"
                    + "  3  " + shortId(2) + "  " + place7 + "  relational-subset  skipped\n"
                    + "> 4  " + shortId(3) + "  " + place11 + "  relational-subset\n"
                    + "  5  " + shortId(4) + "  " + place11 + "  relational-subset\n"
                    + "  6  " + shortId(5) + "  " + place11 + "  relational-subset\n"
                    + "back at survivor 4 of 6 · " + shortId(3) + "\n"), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(3).orElseThrow().kind());
        }
    }

    @Nested
    class Opening {

        @TempDir
        Path tools;

        /** A stand-in for an editor: writes the arguments it was given, one a line, to a file, and exits with a code. */
        Path fakeEditor(String name, int exitCode) throws IOException {
            Path script = tools.resolve(name);
            Files.writeString(script, "#!/bin/sh\nprintf '%s\\n' \"$@\" > '" + arguments(name) + "'\nexit " + exitCode + "\n");
            assertTrue(script.toFile().setExecutable(true));
            return script;
        }

        Path arguments(String editor) {
            return tools.resolve(editor + ".arguments");
        }

        List<String> argumentsGiven(String editor) throws IOException {
            return Files.readAllLines(arguments(editor));
        }

        String beacon() {
            return root.resolve(TriageProject.BEACON).toAbsolutePath().toString();
        }

        @Test
        void open_startsVisualAtTheMutatedLine_thenShowsTheSurvivorAgain() throws IOException {
            Path visual = fakeEditor("visual", 0);

            String out = session("o\nt\nq\n", Map.of("VISUAL", visual.toString(), "EDITOR", fakeEditor("editor", 0).toString()));

            assertEquals(List.of("+7", beacon()), argumentsGiven("visual"));
            assertFalse(Files.exists(arguments("editor")), "$VISUAL wins over $EDITOR");
            assertTrue(out.contains("opening " + TriageProject.BEACON + ":7 in " + visual + " ($VISUAL); triage goes on when it exits\n"
                    + "\nsurvivor 1 of 6 · " + shortId(0)), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void open_withoutVisual_startsEditor_keepingTheArgumentsItNames() throws IOException {
            Path editor = fakeEditor("editor", 0);

            session("s\ns\ns\no\nq\n", Map.of("VISUAL", " ", "EDITOR", editor + " --wait"));

            assertEquals(List.of("--wait", "+11", beacon()), argumentsGiven("editor"));
        }

        @Test
        void open_withNeitherVisualNorEditor_saysSoInOneLineAndStays() {
            String out = session("o\nt\nq\n", Map.of());

            assertTrue(out.contains("> o\nno editor to open " + TriageProject.BEACON + " in: set $VISUAL or $EDITOR"
                    + " (it is started as: editor +LINE FILE)\ne equivalent"), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(0).orElseThrow().kind());
        }

        @Test
        void open_afterLinesWereAddedAbove_opensWhereTheCodeIsNow() throws IOException {
            Files.writeString(root.resolve(TriageProject.BEACON),
                    TriageProject.BEACON_TEXT.replace("/** The harbour beacon. */", "/**\n * The harbour beacon,\n * lit at dusk.\n */"));
            Path visual = fakeEditor("visual", 0);

            session("o\nq\n", Map.of("VISUAL", visual.toString()));

            assertEquals(List.of("+10", beacon()), argumentsGiven("visual"));
        }

        @Test
        void open_editorThatFailsOrIsMissing_saysSoAndTriageGoesOn() throws IOException {
            String failed = session("o\nt\nq\n", Map.of("VISUAL", fakeEditor("visual", 3).toString()));
            String missing = session("o\nt\nq\n", Map.of("VISUAL", tools.resolve("no-such-editor").toString()));

            assertTrue(failed.contains("the editor exited with code 3\n"), failed);
            assertTrue(missing.contains("cannot start the editor '" + tools.resolve("no-such-editor") + "' ($VISUAL): "), missing);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(1).orElseThrow().kind());
        }
    }

    @Nested
    class Moving {

        @Test
        void skip_leavesNoDecisionAndGoesOn() {
            String out = session("s\nt\nq\n");

            assertTrue(mark(0).isEmpty());
            assertTrue(mark(1).isPresent());
            assertTrue(out.contains("survivor 2 of 6 · " + shortId(1)), out);
        }

        @Test
        void back_returnsToThePreviousAndShowsItsDecision() {
            String out = session("t before dusk\nb\nq\n");

            int second = out.lastIndexOf("survivor 1 of 6 · " + shortId(0));
            assertTrue(second > out.indexOf("survivor 2 of 6"), out);
            assertTrue(out.substring(second).contains("decided so far: needs a test (before dusk)"), out);
        }

        @Test
        void backAtTheFirst_saysSo() {
            String out = session("b\nq\n");

            assertTrue(out.contains("this is the first survivor"), out);
        }

        @Test
        void goingOnFromARevisitedSurvivor_passesThoseDecidedAlready() {
            String out = session("t\nt\nb\nb\ns\nq\n");

            // From the first, the next without a decision is the third.
            int lastShown = out.lastIndexOf("survivor ");
            assertTrue(out.startsWith("survivor 3 of 6", lastShown), out.substring(lastShown));
        }

        @Test
        void quit_stopsAtOnceAndSaysWhereTheNextStarts() {
            String out = session("t\nq\ne never read\n");

            assertTrue(listed(1).isEmpty());
            assertTrue(out.contains("every decision is saved; the next triage starts at " + shortId(1) + " "
                    + TriageProject.BEACON + ":7"), out);
            assertEquals(Optional.of(shortId(1)), ending.resumesAt());
        }

        @Test
        void skipOnTheLast_wrapsToTheFirstStillWithoutADecision() {
            String out = session("s\nt\nt\nt\nt\ns\nq\n");

            assertTrue(out.contains("that was the last survivor; round again from the first still without a decision\n"), out);
            int lastShown = out.lastIndexOf("survivor ");
            assertTrue(out.startsWith("survivor 1 of 6 · " + shortId(0), lastShown), out.substring(lastShown));
            assertTrue(mark(5).isEmpty());
            assertEquals(Optional.of(shortId(0)), ending.resumesAt());
        }

        @Test
        void skipOnTheLast_withNoOtherWithoutADecision_saysSoAndWaitsForAnotherKey() {
            String out = session("t\nt\nt\nt\nt\ns\nt\n");

            assertTrue(out.contains("no other survivor is without a decision: decide this one, go back with b, or quit with q\n"), out);
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(5).orElseThrow().kind());
            assertEquals(6, ending.decided());
        }

        @Test
        void skipOnTheLast_whenRevisiting_wrapsToTheVeryFirst() {
            session("t\nt\nt\nt\nt\nt\n");

            String out = session("s\ns\ns\ns\ns\ns\nq\n", rerunSaying(), true);

            int wrapped = out.indexOf("that was the last survivor; round again from the first\n");
            assertTrue(wrapped > out.indexOf("survivor 6 of 6"), out);
            assertTrue(out.indexOf("survivor 1 of 6 · " + shortId(0), wrapped) > wrapped, out);
        }

        @Test
        void afterTheLast_endsAndSaysEveryOneIsDecided() {
            String out = session("t\nt\nt\nt\nt\nt\n");

            assertTrue(out.contains("that was the last survivor"), out);
            assertTrue(out.contains("every decision is saved; every survivor here has one"), out);
            assertEquals(6, ending.decided());
        }
    }

    @Nested
    class Resuming {

        @Test
        void nextSessionStartsAtTheFirstSurvivorWithoutADecision() {
            session("t\ne the same at every whole hour\nq\n");

            String out = session("q\n");

            // The equivalent one is resolved and gone; the one needing a test stays in the list but is passed.
            assertEquals(5, ending.survivors());
            assertTrue(out.contains("5 survivors to triage, starting at 2, the first without a decision"), out);
            assertTrue(out.contains("survivor 2 of 5 · " + shortId(2)), out);
        }

        @Test
        void skippedSurvivorIsWhereTheNextSessionStarts() {
            session("s\nt\nq\n");

            String out = session("q\n");

            assertTrue(out.contains("survivor 1 of 6 · " + shortId(0)), out);
        }

        @Test
        void everySurvivorDecided_saysSoUnlessRevisiting() {
            session("t\nt\nt\nt\nt\nt\n");

            String out = session("q\n");
            assertTrue(out.contains("every one of the 6 unresolved survivors has a decision already; give --revisit"), out);
            assertFalse(out.contains("survivor 1 of 6"), out);

            String revisited = session("s\ns\nq\n", rerunSaying(), true);
            assertTrue(revisited.contains("survivor 1 of 6"), revisited);
            assertTrue(revisited.contains("survivor 3 of 6"), revisited);
        }

        @Test
        void everySurvivorResolved_leavesNothingToTriage() {
            session("e a\ne b\ne c\ne d\ne e\ne f\n");

            String out = session("q\n");

            assertTrue(out.contains("nothing to triage: every survivor of the last run is listed as equivalent or marked fixed"), out);
            assertEquals(0, ending.survivors());
        }

        @Test
        void noSurvivorAtAll_saysSo() {
            List<MutantResult> killed = project.results.mutants().stream()
                    .map(mutant -> mutant.withVerdict(Verdict.KILLED, TriageProject.LIT_AT_DUSK.id(), null, mutant.reachedBy(), 1.0))
                    .toList();
            project = new TriageProject(root, new RunResults(project.results.format(), true,
                    project.results.settings(), project.results.tests(), project.results.timings(), killed,
                    project.results.problems(), project.results.sourceHashes()));

            String out = session("q\n");

            assertTrue(out.contains("nothing to triage: no mutant survived the last run"), out);
        }
    }

    @Nested
    class AbruptEnd {

        @Test
        void answersBreakingOffMidSession_loseNoDecisionMadeBefore() {
            Deque<String> script = new ArrayDeque<>(List.of("e at dusk both read lit", "t"));
            Answers breaksOff = prompt -> {
                if (script.isEmpty()) {
                    throw new IllegalStateException("the terminal went away");
                }
                return script.removeFirst();
            };
            StringWriter text = new StringWriter();

            assertThrows(IllegalStateException.class, () -> Triage.run(
                    new Triage.Setup(root, project.results, false, Style.plain()), breaksOff, new PrintWriter(text), rerunSaying()));

            assertEquals("at dusk both read lit", listed(0).orElseThrow().reason());
            assertEquals(TriageMarks.Kind.NEEDS_TEST, mark(1).orElseThrow().kind());
            String out = session("q\n");
            assertTrue(out.contains("survivor 2 of 5 · " + shortId(2)), out);
        }

        @Test
        void inputEndingWithoutQuit_stopsLikeQuit() {
            String out = session("t\n");

            assertTrue(out.contains("end of input: stopping here"), out);
            assertTrue(out.contains("the next triage starts at " + shortId(1)), out);
            assertTrue(mark(0).isPresent());
        }
    }
}
