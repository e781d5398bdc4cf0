package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.review.EquivalentsList;
import dev.changeling.review.TriageMarks;
import dev.changeling.review.triage.TriageProject;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Drives the real binary in a real pseudo-terminal (tmux), as a developer would: letters, Enter, Ctrl-C. */
class TriageTerminalTest {

    @TempDir
    Path root;

    @TempDir
    Path scratch;

    Tmux tmux;
    TriageProject project;

    @BeforeEach
    void terminal() throws IOException {
        Assumptions.assumeTrue(Tmux.installed(), "tmux is not installed at " + Tmux.EXECUTABLE + ": the terminal test is skipped");
        tmux = new Tmux(scratch.resolve("tmux.socket"));
        project = TriageProject.in(root);
    }

    @AfterEach
    void killTheServer() {
        if (tmux != null) {
            tmux.close();
        }
    }

    /** A script that runs triage in the pane, then shows its exit code and waits, so the pane stays readable. */
    Path triageScript(String name) throws IOException {
        return triageScript(name, "");
    }

    /** The same, with lines of shell (such as exports) run before triage starts. */
    Path triageScript(String name, String before) throws IOException {
        List<String> command = RealBinary.command("triage", root.toString());
        for (String part : command) {
            if (part.contains("'")) {
                throw new IllegalStateException("cannot quote for sh: " + part);
            }
        }
        Path script = scratch.resolve(name + ".sh");
        // A trap with a command (not an ignored signal) leaves Ctrl-C at its default in the JVM, and keeps the shell going after.
        Files.writeString(script, "trap 'true' INT\n" + before
                + command.stream().map(part -> "'" + part + "'").collect(Collectors.joining(" ")) + "\n"
                + "echo \"[exit $?]\"\n"
                + "read unused\n");
        return script;
    }

    String prompt(int position) {
        return "survivor " + position + " of 6 · " + project.walked(position - 1).shortId();
    }

    @Test
    void marksOneEquivalentAndOneNeedingATest_thenQuits() throws IOException {
        tmux.start("triage", triageScript("first"));

        String first = tmux.awaitText("triage", "? help > ");
        assertTrue(first.contains(prompt(1)), first);
        assertTrue(first.contains("  BeaconTest > lit at dusk"), first);
        tmux.typeLine("triage", "e");
        tmux.awaitText("triage", "(one line, required) > ");
        tmux.typeLine("triage", "at dusk both read lit");
        tmux.awaitText("triage", prompt(2));
        tmux.typeLine("triage", "t");
        tmux.awaitText("triage", prompt(3));
        tmux.typeLine("triage", "q");
        String last = tmux.awaitText("triage", "[exit 0]");

        assertTrue(last.contains("the next triage starts at " + project.walked(2).shortId()), last);
        assertEquals("at dusk both read lit", EquivalentsList.load(root).find(project.walked(0).id()).orElseThrow().reason());
        assertTrue(Files.readString(EquivalentsList.in(root)).contains(project.walked(0).id() + " | " + TriageProject.BEACON));
        assertEquals(TriageMarks.Kind.NEEDS_TEST, TriageMarks.open(root).get(project.walked(1).id()).orElseThrow().kind());
        assertEquals(1, TriageMarks.open(root).all().size());
    }

    @Test
    void open_runsTheEditorOnTheTerminal_andTriageGoesOnAfterItExits() throws IOException {
        // A stand-in editor: records its arguments, then reads a line from the terminal, as an editor would.
        Path editor = scratch.resolve("editor.sh");
        Files.writeString(editor, "#!/bin/sh\n"
                + "printf '%s\\n' \"$@\" > '" + scratch.resolve("editor.arguments") + "'\n"
                + "printf 'stand-in editor: type a line\\n'\n"
                + "read typed\n"
                + "printf '%s\\n' \"$typed\" > '" + scratch.resolve("editor.typed") + "'\n");
        assertTrue(editor.toFile().setExecutable(true));
        tmux.start("editing", triageScript("editing", "VISUAL='" + editor + "'; export VISUAL\n"));

        tmux.awaitText("editing", prompt(1));
        tmux.typeLine("editing", "o");
        tmux.awaitText("editing", "stand-in editor: type a line");
        tmux.typeLine("editing", "written in the editor");
        tmux.typeLine("editing", "t");
        tmux.awaitText("editing", prompt(2));
        tmux.typeLine("editing", "q");
        tmux.awaitText("editing", "[exit 0]");

        assertEquals(List.of("+7", root.resolve(TriageProject.BEACON).toAbsolutePath().toString()),
                Files.readAllLines(scratch.resolve("editor.arguments")));
        assertEquals(List.of("written in the editor"), Files.readAllLines(scratch.resolve("editor.typed")));
        assertEquals(TriageMarks.Kind.NEEDS_TEST, TriageMarks.open(root).get(project.walked(0).id()).orElseThrow().kind());
    }

    @Test
    void ctrlC_losesNoDecision_andTheNextTriageStartsAfterIt() throws IOException {
        tmux.start("interrupted", triageScript("interrupted"));
        tmux.awaitText("interrupted", prompt(1));
        tmux.typeLine("interrupted", "t");
        tmux.awaitText("interrupted", prompt(2));
        tmux.press("interrupted", "C-c");
        String stopped = tmux.awaitText("interrupted", "[exit 130]");

        assertTrue(stopped.contains("changeling: stopped; every decision made so far is saved"), stopped);
        assertEquals(TriageMarks.Kind.NEEDS_TEST, TriageMarks.open(root).get(project.walked(0).id()).orElseThrow().kind());

        tmux.start("resumed", triageScript("resumed"));
        String resumed = tmux.awaitText("resumed", "? help > ");
        assertTrue(resumed.contains("6 survivors to triage, starting at 2, the first without a decision"), resumed);
        assertTrue(resumed.contains(prompt(2)), resumed);
        tmux.typeLine("resumed", "q");
        tmux.awaitText("resumed", "[exit 0]");
    }
}
