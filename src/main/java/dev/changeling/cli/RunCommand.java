package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.analysis.Score;
import dev.changeling.UserError;
import dev.changeling.execution.Deadlines;
import dev.changeling.execution.WorkerSettings;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.review.Gate;
import dev.changeling.review.Settled;
import dev.changeling.review.Standing;
import dev.changeling.run.MutationRun;
import dev.changeling.run.RunInput;
import dev.changeling.run.RunListener;
import dev.changeling.run.RunRequest;
import dev.changeling.terminal.Progress;
import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.ArrayList;
import java.util.List;
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
            "130:Stopped by Ctrl-C; the verdicts of the mutants that finished are in the results file."})
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
            description = "Leave out test classes matching this pattern, e.g. '*IT' or 'com.acme.db.**' (repeatable).")
    List<String> skipTests = new ArrayList<>();

    @Option(names = "--skip-tag", paramLabel = "TAG", description = "Leave out tests with this JUnit tag (repeatable).")
    List<String> skipTags = new ArrayList<>();

    @Option(names = "--min-score", paramLabel = "S",
            description = "Exit with code 3 when the mutation score is below S (0 to 1).")
    BigDecimal minScore;

    @Option(names = "--maven-arg", paramLabel = "ARG", description = "Pass an argument to every mvn call, e.g. -o or -s settings.xml (repeatable).")
    List<String> mavenArguments = new ArrayList<>();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws InterruptedException {
        Gate gate = new Gate(false, minScore);
        RunRequest request = new RunInput(project.paths, explicit.project(), mutants.input(), change.spec(), mavenArguments,
                workers, timeFactor, timeExtraMillis, workerHeap, mutantsPerWorker, skipTests, skipTags, recheckTimeouts)
                .resolve();
        ProjectLayout layout = request.layout();
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Style style = project.style();
        Set<String> equivalent = Settled.load(layout.root()).equivalent();
        ProgressListener listener = new ProgressListener(err, project.plain(), equivalent);
        MutationRun run = new MutationRun(request, listener);
        Path resultsFile = layout.resultsFile();
        CountDownLatch written = new CountDownLatch(1);
        Thread onInterrupt = new Thread(() -> {
            run.stop();
            try {
                written.await(30, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
            err.println("changeling: stopped; the verdicts so far are in " + resultsFile);
            err.flush();
        }, "changeling-interrupt");
        Runtime.getRuntime().addShutdownHook(onInterrupt);
        RunResults results;
        try {
            results = run.execute();
            write(resultsFile, results);
        } finally {
            written.countDown();
            listener.close();
        }
        try {
            Runtime.getRuntime().removeShutdownHook(onInterrupt);
        } catch (IllegalStateException shuttingDown) {
            return ExitCode.INTERRUPTED;
        }
        Standing standing = Standing.of(results, Settled.load(layout.root()));
        new RunReport(style).print(out, standing, resultsFile, layout);
        out.flush();
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
            err.println("  " + line);
            err.flush();
        }

        @Override
        public void running(int mutants) {
            progress = Progress.onStandardError(mutants, plain);
        }

        @Override
        public void finished(MutantResult result) {
            if (progress != null) {
                progress.finished(result.verdict().counted() && !Score.isEquivalent(result, equivalent),
                        result.verdict().detected());
            }
        }

        void close() {
            if (progress != null) {
                progress.close();
            }
        }
    }
}
