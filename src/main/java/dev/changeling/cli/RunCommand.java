package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.analysis.Score;
import dev.changeling.UserError;
import dev.changeling.execution.Deadlines;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.KillHistory;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.review.Gate;
import dev.changeling.review.Settled;
import dev.changeling.review.Standing;
import dev.changeling.run.MutationRun;
import dev.changeling.recall.Recall;
import dev.changeling.recall.ReachMap;
import dev.changeling.run.RunInput;
import dev.changeling.run.RunListener;
import dev.changeling.run.RunRequest;
import dev.changeling.run.Reuse;
import dev.changeling.terminal.Progress;
import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** Runs the project's tests against every mutant in scope and prints the score and the survivors. */
@Command(name = "run", mixinStandardHelpOptions = true,
        description = {"Compile the mutants, run the project's tests against each, and report what the tests missed.",
            "Results go to results.json in the build folder's changeling/ (target/changeling/ by default), which triage and export read."},
        exitCodeList = {
            "0:The run completed and --min-score, if given, was met.",
            "1:A mistake to fix: no project, a build that fails, an unreadable file, a bad change scope.",
            "3:The mutation score is under --min-score.",
            "5:The project's tests fail without any mutant.",
            "130:Stopped by Ctrl-C; the verdicts of the mutants that finished, if any did, are in the results file."})
final class RunCommand implements Callable<Integer> {

    @Mixin
    ProjectOptions project = new ProjectOptions();

    @Mixin
    MutantOptions mutants = new MutantOptions();

    @Mixin
    ChangeOptions change = new ChangeOptions();

    @Mixin
    ExplicitOptions explicit = new ExplicitOptions();

    @Option(names = "--workers", paramLabel = "N", description = "Worker JVMs running tests at once (default: one per core).")
    Integer workers;

    @Option(names = "--time-factor", paramLabel = "F",
            description = "Each step of a mutant's tests (the group a worker runs in one go) may take F times its tests' unmutated time (default: ${DEFAULT-VALUE}) ...")
    double timeFactor = Deadlines.DEFAULT.factor();

    @Option(names = "--recheck-timeouts",
            description = "After the run, run every timed-out mutant again with ten times its deadline and say which then"
                    + " finish (a check of the deadlines; the verdicts stay as they were).")
    boolean recheckTimeouts;

    @Option(names = "--every-test",
            description = "Run every test that reaches a mutant, not stopping at the first that fails, and record each failing"
                    + " one (the full kill matrix, in results.json); the verdicts stay the same.")
    boolean everyTest;

    @Option(names = "--run-all",
            description = "Run every mutant and the whole unmutated suite, also where an earlier run found the verdict, or the"
                    + " tests' reach, with the same code, tests, classpath and settings (kept in target/changeling/"
                    + Recall.FILE_NAME + " and " + ReachMap.FILE_NAME + ", which this run still updates).")
    boolean runAll;

    @Option(names = "--reach-map", paramLabel = "FILE",
            description = "Choose the baseline's tests by this reach map (one a whole run wrote, handed over by CI, say): only"
                    + " test classes that are new, changed, or reached changed code run; the others' reach is taken from the map."
                    + " Default: target/changeling/" + ReachMap.FILE_NAME + " when there is one.")
    Path reachMap;

    @Option(names = "--map-only",
            description = "Make every mutation point, run the unmutated suite, write the reach map (target/changeling/"
                    + ReachMap.FILE_NAME + ") and stop: no mutant runs and no results are written.")
    boolean mapOnly;

    @Option(names = "--time-extra", paramLabel = "MS",
            description = "... plus this many milliseconds (" + Deadlines.FIRST_RUN_EXTRA_MILLIS + " more when the worker first meets a test class), before the worker is stopped and the mutant counts as timed out (default: ${DEFAULT-VALUE}).")
    long timeExtraMillis = Deadlines.DEFAULT.constantMillis();

    @Option(names = "--worker-heap", paramLabel = "SIZE",
            description = "Heap of each worker JVM, e.g. 512m or 2g (default: the -Xmx of the pom's Surefire argLine, else "
                    + WorkerSettings.DEFAULT_MAX_HEAP + ").")
    String workerHeap;

    @Option(names = "--mutants-per-worker", paramLabel = "N",
            description = "Replace a worker JVM after this many mutants (default: ${DEFAULT-VALUE}).")
    int mutantsPerWorker = WorkerSettings.DEFAULT_MUTANTS_PER_WORKER;

    @Option(names = "--skip-tests", paramLabel = "PATTERN",
            description = {"Leave out test classes matching this pattern (repeatable); a pattern that matches no test class"
                    + " is noted on the tests: line.",
                "- PerformanceTest is the simple name, in any package; com.acme.perf.PerformanceTest the fully qualified name.",
                "- * stays within one package segment or name ('*IT', 'com.acme.*.SlowTest'); ? is one character.",
                "- A leading *. or **. stands for any package prefix, none included ('*.perf.PerformanceTest').",
                "- ** stands for any number of package segments, none included ('com.acme.db.**', '**.perf.*').",
                "- A nested class (Outer$Inner) follows its outer class; a path (com/acme/PerfTest.java) reads as a name."})
    List<String> skipTests = new ArrayList<>();

    @Option(names = "--skip-tag", paramLabel = "TAG",
            description = "Leave out tests with this JUnit tag or tag expression (repeatable); one that matches no test is noted after the baseline.")
    List<String> skipTags = new ArrayList<>();

    @Option(names = "--min-score", paramLabel = "S",
            description = "Exit with code 3 when the mutation score is below S (0 to 1).")
    BigDecimal minScore;

    @Option(names = "--shard", paramLabel = "I/N",
            description = "Run only shard I of N: the mutants whose fingerprint falls in share I of N, the same on every machine;"
                    + " N jobs with 1/N to N/N together run every mutant once. Merge their results files with 'changeling merge'"
                    + " (see docs/ci-sharding.md).")
    String shard;

    @Option(names = "--module", paramLabel = "PATH",
            description = "At the root of a multi-module build, analyse only this module (its folder from the root, e.g. core);"
                    + " by default every module with tests of its own is analysed, each against its own tests.")
    String module;

    @Option(names = "--maven-arg", paramLabel = "ARG", description = "Pass an argument to every mvn call, e.g. -o or -s settings.xml (repeatable).")
    List<String> mavenArguments = new ArrayList<>();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        Gate gate = new Gate(false, minScore);
        RunRequest request = new RunInput(project.paths, explicit.project(), mutants.input(), change.spec(), mavenArguments,
                workers, timeFactor, timeExtraMillis, workerHeap, mutantsPerWorker, skipTests, skipTags, recheckTimeouts,
                everyTest, shard, module, new Reuse(!runAll, Optional.ofNullable(reachMap), mapOnly)).resolve();
        ProjectLayout layout = request.layout();
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Set<String> equivalent = Settled.load(layout.root()).equivalent();
        ProgressListener listener = new ProgressListener(err, project.plain(), equivalent);
        MutationRun run = new MutationRun(request, listener);
        Interruption interruption = Interruption.watch(run, err);
        try {
            return runAndReport(run, listener, interruption, gate, out, err, layout, request.reuse().mapOnly());
        } finally {
            listener.close();
            interruption.told();
        }
    }

    /**
     * Runs, writes the results and says how it went. After Ctrl-C it says where this run's verdicts are only if
     * they were written; a run that completed before the stop took effect still gets its report.
     */
    private Integer runAndReport(MutationRun run, ProgressListener listener, Interruption interruption, Gate gate,
                                 PrintWriter out, PrintWriter err, ProjectLayout layout, boolean mapOnly) {
        RunResults results;
        try {
            results = run.execute();
        } catch (UserError failure) {
            if (failure.exitCode() != ExitCode.INTERRUPTED) {
                throw failure;
            }
            listener.close();
            err.println("changeling: " + failure.getMessage());
            return ExitCode.INTERRUPTED;
        }
        if (mapOnly) {
            listener.close();
            return results.complete() ? ExitCode.OK : ExitCode.INTERRUPTED;
        }
        Path resultsFile = layout.resultsFile();
        write(resultsFile, results);
        KillHistory.of(results).ifPresent(history -> write(layout.killHistoryFile(), history));
        listener.close();
        if (interruption.happened() && !results.complete()) {
            err.println("changeling: stopped; the verdicts so far are in " + resultsFile);
            return ExitCode.INTERRUPTED;
        }
        Standing standing = Standing.of(results, Settled.load(layout.root()));
        new RunReport(project.style()).print(out, standing, resultsFile, layout);
        out.flush();
        if (interruption.happened()) {
            err.println("changeling: stopped after every mutant had its verdict; the results are complete");
            return ExitCode.INTERRUPTED;
        }
        if (!results.complete()) {
            return ExitCode.INTERRUPTED;
        }
        return gate.check(standing).reportedTo(err);
    }

    private static void write(Path file, RunResults results) {
        try {
            ResultsFile.write(file, results);
        } catch (IOException e) {
            throw new UserError(file + ": cannot write the results (" + e.getMessage() + "); check the build folder is writable");
        }
    }

    private static void write(Path file, KillHistory history) {
        try {
            history.write(file);
        } catch (IOException e) {
            throw new UserError(file + ": cannot write the operators' kill history (" + e.getMessage()
                    + "); check the build folder is writable");
        }
    }

    /** Phases as lines on standard error, then the progress bar. */
    private static final class ProgressListener implements RunListener {
        private final PrintWriter err;
        private final boolean plain;
        private final Set<String> equivalent;
        private Progress progress;

        /** @param equivalent the listed equivalents, left out of the score so far as out of the final one */
        ProgressListener(PrintWriter err, boolean plain, Set<String> equivalent) {
            this.err = err;
            this.plain = plain;
            this.equivalent = equivalent;
        }

        @Override
        public void phase(String line) {
            close();
            err.println("  " + line);
            err.flush();
        }

        @Override
        public void running(int mutants) {
            close();
            progress = Progress.onStandardError(mutants, plain);
        }

        @Override
        public void finished(MutantResult result) {
            if (progress != null) {
                progress.finished(result.verdict().counted() && !Score.isEquivalent(result, equivalent),
                        result.verdict().detected());
            }
        }

        /** Ends the progress bar's line; again, it does nothing. */
        void close() {
            if (progress != null) {
                progress.close();
                progress = null;
            }
        }
    }
}
