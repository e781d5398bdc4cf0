package dev.changeling.review.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.support.Git;
import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WiderContextTest {

    @TempDir
    Path root;

    @TempDir
    Path elsewhere;

    TriageProject project;
    MutantResult lit;

    @BeforeEach
    void project() throws IOException {
        project = TriageProject.in(root);
        lit = project.walked(0);
    }

    String render(int contextLines) {
        CurrentSources sources = new CurrentSources(root, project.results.sourceHashes());
        return WiderContext.render(sources.of(TriageProject.BEACON), lit, contextLines, Style.plain());
    }

    static String note(String rendered) {
        return rendered.substring(0, rendered.indexOf('\n'));
    }

    static String diff(String rendered) {
        return rendered.substring(rendered.indexOf('\n') + 1);
    }

    void rewriteBeacon(String from, String to) throws IOException {
        Path file = root.resolve(TriageProject.BEACON);
        String text = Files.readString(file);
        assertEquals(text.indexOf(from), text.lastIndexOf(from), "'" + from + "' must occur once");
        Files.writeString(file, text.replace(from, to));
    }

    static java.util.List<String> changedLines(String diff) {
        return diff.lines().filter(line -> (line.startsWith("-") || line.startsWith("+"))
                && !line.startsWith("---") && !line.startsWith("+++")).toList();
    }

    /** The real git must take the regenerated diff on the file as it is now (GNU/git unified diff format). */
    void assertGitApplies(String diff) throws IOException {
        assertGitApplies(root, diff);
    }

    void assertGitApplies(Path project, String diff) throws IOException {
        Path patch = elsewhere.resolve("wider.patch");
        Files.writeString(patch, diff);
        Git.Result check = Git.initCommitted(project).tryRun("apply", "--check", patch.toString());
        assertEquals(0, check.exitCode(), check.output() + "\n" + diff);
    }

    @Nested
    class FileUnchanged {

        @Test
        void regeneratesTheDiffWithMoreLinesFromTheCurrentFile() throws IOException {
            String rendered = render(10);

            assertEquals("10 lines of context from " + TriageProject.BEACON + " as it is now (unchanged since the run):", note(rendered));
            // The beacon has 16 lines; ten either side of line 7 take in all of them.
            assertTrue(diff(rendered).contains("@@ -1,16 +1,16 @@\n package org.lanternworks;\n"), rendered);
            assertTrue(diff(rendered).contains("-        return hour >= dusk;\n+        return true;\n"), rendered);
            assertGitApplies(diff(rendered));
        }

        @Test
        void secondOrder_bothChangesAreAppliedToTheCurrentFile() throws IOException {
            Path squallRoot = root.resolve("squall");
            TriageProject squall = TriageProject.secondOrderIn(squallRoot);
            MutantResult both = squall.walked(0);
            CurrentSources sources = new CurrentSources(squallRoot, squall.results.sourceHashes());

            String rendered = WiderContext.render(sources.of(TriageProject.SQUALL), both, 10, Style.plain());

            // The regenerated diff must carry the same change as the one that ran, only with more context.
            assertEquals(changedLines(both.diff()), changedLines(diff(rendered)));
            assertGitApplies(squallRoot, diff(rendered));
        }

        @Test
        void noHashFromTheRun_saysItCannotTell() {
            CurrentSources sources = new CurrentSources(root, Map.of());

            String rendered = WiderContext.render(sources.of(TriageProject.BEACON), lit, 10, Style.plain());

            assertTrue(note(rendered).endsWith("(the run kept no hash of it, so it may differ from what ran):"), rendered);
        }
    }

    @Nested
    class FileChanged {

        @Test
        void linesAddedAbove_followTheMoveAndSaySo() throws IOException {
            rewriteBeacon("/** The harbour beacon. */\n", "/**\n * The harbour beacon,\n * lit from dusk.\n */\n");

            String rendered = render(4);

            assertEquals("4 lines of context from " + TriageProject.BEACON + " as it is now — it changed since the run;"
                    + " the mutated code moved from line 7 to 10:", note(rendered));
            assertTrue(diff(rendered).contains("@@ -6,9 +6,9 @@\n"), rendered);
            assertGitApplies(diff(rendered));
        }

        @Test
        void changeBelow_leavesTheCodeInPlaceAndSaysSo() throws IOException {
            rewriteBeacon("return 1;", "return 0;");

            String rendered = render(10);

            assertTrue(note(rendered).endsWith("it changed since the run, but the mutated code is still at line 7:"), rendered);
            assertTrue(diff(rendered).contains(" return 0;"), rendered);
            assertGitApplies(diff(rendered));
        }

        @Test
        void mutatedCodeRewritten_showsTheDiffAsItRanAndSaysWhy() throws IOException {
            rewriteBeacon("hour >= dusk", "dusk <= hour");

            String rendered = render(10);

            assertEquals(TriageProject.BEACON + " changed since the run and the mutated code is no longer at line 7,"
                    + " so it cannot be shown with more context; the diff as it ran:", note(rendered));
            assertEquals(lit.diff(), diff(rendered));
        }

        @Test
        void fileGone_showsTheDiffAsItRan() throws IOException {
            Files.delete(root.resolve(TriageProject.BEACON));

            String rendered = render(10);

            assertEquals(TriageProject.BEACON + " is gone or unreadable since the run; the diff as it ran:", note(rendered));
            assertEquals(lit.diff(), diff(rendered));
        }
    }

    @Nested
    class InTheLoop {

        String session(String script) {
            StringWriter text = new StringWriter();
            PrintWriter out = new PrintWriter(text);
            Triage.run(new Triage.Setup(root, project.results, false, Style.plain()),
                    Answers.fromLines(new StringReader(script), out), out, (mutant, progress) -> mutant);
            out.flush();
            return text.toString();
        }

        @Test
        void eachAskWidensByTenLines() {
            String out = session("c\nc\nq\n");

            assertTrue(out.contains("10 lines of context from"), out);
            assertTrue(out.contains("20 lines of context from"), out);
        }

        @Test
        void headerWarnsWhenTheFileChangedSinceTheRun() throws IOException {
            rewriteBeacon("return 1;", "return 0;");

            String out = session("q\n");

            assertTrue(out.contains("  " + TriageProject.BEACON + " has changed since the run: the diff shows the code as it ran;"
                    + " f runs it again against the code as it is now"), out);
        }

        @Test
        void headerSaysNothingWhileTheFileIsUnchanged() {
            String out = session("q\n");

            assertTrue(!out.contains("changed since the run"), out);
        }
    }
}
