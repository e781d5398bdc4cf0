package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.review.triage.Answers;
import dev.changeling.review.triage.MutantRerun;
import dev.changeling.run.Rerun;
import dev.changeling.review.triage.Triage;
import dev.changeling.terminal.Style;
import java.io.Console;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Walks the unresolved survivors of the last run one at a time and records a decision for each. */
@Command(name = "triage", mixinStandardHelpOptions = true,
        description = {
            "Go through the unresolved survivors of the last run (its results file, target/changeling/results.json by default) one at a time:"
                    + " see the change and the tests that missed it, then decide. Answer with a letter and Enter:"
                    + " e equivalent, t needs a test, f fixed (runs it again first), u undo (clears the"
                    + " decision), s skip, b back, g go to (g <id>), l list, c context (more lines), o open (in $VISUAL or"
                    + " $EDITOR), q quit, ? help (explains each).",
            "Every decision is saved the moment it is made; the next triage starts at the first survivor without one."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:Done, quit, or nothing to triage.",
            "1:A mistake to fix: no results yet, an unreadable equivalents list or triage file.",
            "2:The command line is wrong.",
            "6:No terminal to ask in, and --scripted was not given.",
            "130:Stopped by Ctrl-C; every decision made so far is saved."},
        footerHeading = "%nSee also:%n",
        footer = "  docs/triage.md for the keys and the flow")
final class TriageCommand implements Callable<Integer> {

    @Mixin
    ProjectOptions project = new ProjectOptions();

    @Option(names = "--scripted",
            description = "Read the answers line by line from standard input instead of a terminal (for scripts and tests);"
                    + " the end of the input stops like q.")
    boolean scripted;

    @Option(names = "--revisit",
            description = "Start at the first unresolved survivor and stop at every one, including those already marked needs a test.")
    boolean revisit;

    @Spec
    CommandSpec spec;

    /** Triage re-runs a mutant marked fixed through the same engine as {@code changeling run}. */
    static MutantRerun rerun(ProjectLayout layout, RunResults results) {
        return new Rerun(layout.root(), results)::rerun;
    }

    @Override
    public Integer call() {
        Console console = System.console();
        if (console == null && !scripted) {
            throw new UserError("triage asks questions but standard input or output is not a terminal;"
                    + " run it in a terminal, or give --scripted to read the answers line by line from standard input",
                    ExitCode.NO_TERMINAL);
        }
        ProjectLayout layout = project.layout();
        RunResults results = ResultsFile.read(layout.resultsFile()).limitedTo(layout.root(), project.limits(layout));
        PrintWriter out = spec.commandLine().getOut();
        Answers answers = scripted
                ? Answers.fromLines(new InputStreamReader(System.in, StandardCharsets.UTF_8), out)
                : Answers.fromConsole(console, out);
        Style style = project.style();
        Thread onCtrlC = scripted ? null : new Thread(() -> {
            System.err.println();
            System.err.println("changeling: stopped; every decision made so far is saved");
        });
        if (onCtrlC != null) {
            Runtime.getRuntime().addShutdownHook(onCtrlC);
        }
        try {
            Triage.run(new Triage.Setup(layout.root(), results, revisit, style, System.getenv()), answers, out, rerun(layout, results));
        } finally {
            if (onCtrlC != null) {
                try {
                    Runtime.getRuntime().removeShutdownHook(onCtrlC);
                } catch (IllegalStateException shuttingDown) {
                    // Ctrl-C arrived meanwhile: the hook is running and says what happened.
                }
            }
        }
        out.flush();
        return ExitCode.OK;
    }
}
