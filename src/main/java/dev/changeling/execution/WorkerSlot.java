package dev.changeling.execution;

import dev.changeling.UserError;
import dev.changeling.worker.UniqueIds;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.function.Consumer;

/**
 * One place in the pool for a worker: it keeps its worker between jobs, replaces it when it is spent,
 * and starts a fresh one of its own for a mutant compiled alone. Its log and temp folder stay the same.
 */
final class WorkerSlot {

    /** How the JVM refuses an array longer than it can ever allocate (HotSpot's message). */
    static final String ARRAY_BEYOND_LIMIT = "OutOfMemoryError: Requested array size exceeds VM limit";

    private final DefaultWorkerPool pool;
    private final WorkerSettings settings;
    private final SuiteSetup setup;
    private final Path log;
    private final Path temp;
    private final Path aloneTemp;
    private final Path argumentFile;
    private final Path aloneArgumentFile;
    private WorkerProcess worker;
    private WorkerProcess.Prepared prepared;
    private int mutantsOnWorker;
    private boolean warm;
    private volatile WorkerProcess live;
    private volatile WorkerProcess liveAlone;
    private final WorkerTime time;

    WorkerSlot(DefaultWorkerPool pool, int number) {
        this.pool = pool;
        this.settings = pool.settings();
        this.setup = pool.setup();
        this.time = pool.workerTime();
        Path folder = settings.workDirectory();
        this.log = folder.resolve("worker-" + number + ".log");
        this.temp = folder.resolve("tmp-" + number);
        this.aloneTemp = folder.resolve("tmp-" + number + "-alone");
        this.argumentFile = folder.resolve("worker-" + number + ".args");
        this.aloneArgumentFile = folder.resolve("worker-" + number + "-alone.args");
    }

    /** Runs these test classes unmutated in this slot's worker; in a fresh one, if asked, that is then replaced. */
    Baseline baseline(List<String> testClasses, boolean freshWorker, Consumer<String> onTestFinished) {
        if (freshWorker) {
            close();
            emptyFolder(temp);
        }
        ensureWorker();
        try {
            Baseline baseline = worker.baseline(prepared, testClasses, onTestFinished, settings.baselineTimeout().toMillis());
            if (freshWorker) {
                close();
                emptyFolder(temp);
            }
            warm = true;
            return baseline;
        } catch (RuntimeException e) {
            // The conversation broke off in the middle (a listener threw, the worker said something odd).
            retire();
            throw e;
        } catch (WorkerProcess.Lost lost) {
            retire();
            pool.throwIfStopped();
            throw new UserError("the unmutated test suite did not finish: " + lost.getMessage()
                    + "; the tests' output is in " + log);
        }
    }

    /**
     * Runs a mutant's tests. A mutant stopped in place at a test's deadline goes on with the tests after that one, under
     * shorter deadlines: a later test that fails normally makes it killed, which is the verdict a longer deadline could
     * have given too; otherwise it stays timed out. Only then is the worker's fitness settled, once for every stop
     * ({@link #settleStops}): a kill among the later tests is checked on unmutated code as any kill is. A mutant compiled
     * alone, and one whose worker had to be ended, is not resumed.
     */
    JobResult execute(MutantJob job) {
        if (job.aloneClasses() != null) {
            return executeAlone(job);
        }
        JobResult result = executeShared(job);
        if (!job.everyTest() && result.outcome() == Outcome.TIMED_OUT && result.stoppedTest() != null) {
            MutantJob rest = job.resumedAfter(result.stoppedTest());
            if (!rest.tests().isEmpty() && worker != null) {
                pool.throwIfStopped();
                result = result.resumedWith(executeShared(rest));
            }
        }
        settleStops(job.key(), result.stoppedTests());
        return result;
    }

    private JobResult executeShared(MutantJob job) {
        JobResult result;
        try {
            result = runInWorker(job);
            if (!failuresPassUnmutated(job.key(), result)) {
                // A killing test fails without the mutant too: an earlier mutant's tests left this worker's
                // static state broken (a test class's shared fixture, say). Only a fresh worker gives the verdict.
                retire(WorkerTime.Replacement.KILL_CHECK_FAILED);
                pool.throwIfStopped();
                result = runInWorker(job);
            }
            if (result.outcome() == Outcome.CRASHED) {
                String death = worker == null ? null : worker.death();
                retire(WorkerTime.Replacement.CRASHED);
                pool.throwIfStopped();
                result = CrashCheck.settle(result, death, runInWorker(job));
            }
        } catch (RuntimeException e) {
            retire();
            throw e;
        }
        mutantsOnWorker++;
        // A kill can come from a worker that is gone: every test was run, and a later one ran past its deadline or
        // crashed the worker.
        boolean workerGone = worker == null || !worker.alive();
        if (workerGone || result.outcome() == Outcome.CRASHED) {
            retire(workerGone ? WorkerTime.Replacement.GONE : WorkerTime.Replacement.CRASHED);
        } else if (exhaustedMemory(result)) {
            retire(WorkerTime.Replacement.HEAP_EXHAUSTED);
        } else if (result.stoppedTest() == null && mutantsOnWorker >= settings.mutantsPerWorker()) {
            retire(WorkerTime.Replacement.SHARE_DONE);
        }
        return result;
    }

    /**
     * A mutant that ran the heap out failed its test like any error, but the worker it ran in may limp on (a
     * thread of a test or of the engine may have met the error too), so it is replaced. An array longer than any
     * JVM allows is refused before anything is allocated: that error leaves the heap as it was, and the worker goes on.
     */
    static boolean exhaustedMemory(JobResult result) {
        String message = result.message();
        return result.outcome() == Outcome.KILLED && message != null && message.startsWith("OutOfMemoryError")
                && !message.startsWith(ARRAY_BEYOND_LIMIT);
    }

    private JobResult runInWorker(MutantJob job) {
        ensureWorker();
        warmUp(job);
        return time.timed(WorkerTime.Use.MUTANTS, () -> worker.run(job));
    }

    /**
     * Runs the tests that failed with a mutant once more, with no mutant switched on, in one job that stops at the
     * first of them that fails: one such test is enough to distrust the worker. Under Maven every test class starts
     * from fresh static state; in a worker it carries whatever the tests of earlier mutants left, so a kill counts
     * only if its tests still pass on the unmutated code. With every test run this covers each killer recorded, at
     * the cost of one request per doubling step rather than one per killer. A worker that is gone (a later test ran
     * past its deadline or crashed it) cannot vouch for its killers, and a test that does not come back leaves the
     * worker gone: both mean "not passing".
     */
    private boolean failuresPassUnmutated(String key, JobResult result) {
        List<String> failed = result.failedTests();
        if (failed.isEmpty() || worker == null) {
            return true;
        }
        return worker.alive() && time.timed(WorkerTime.Use.KILL_CHECKS, () -> runUnmutated(key, failed)).outcome() == Outcome.SURVIVED;
    }

    /**
     * After a mutant was stopped in place, the classes of the stopped tests run once with nothing switched on: the stop
     * unwound a test from wherever it was, which may have left its class's static state half changed, and only a worker
     * whose tests still pass unmutated may go on. Where running those classes would take longer than a fresh worker
     * (its start, end and warm-up, as measured in this run), the worker is replaced instead, which settles it as well.
     */
    private void settleStops(String key, List<String> stoppedTests) {
        if (stoppedTests.isEmpty() || worker == null) {
            return;
        }
        List<String> classes = stoppedTests.stream().map(UniqueIds::outermostContainer).filter(Objects::nonNull).distinct().toList();
        if (classes.isEmpty()) {
            retire(WorkerTime.Replacement.CLASS_CHECK_FAILED);
        } else if (pool.baselineNanosWithin(classes) > time.freshWorkerNanos()) {
            retire(WorkerTime.Replacement.FRESH_WORKER_CHEAPER);
        } else if (time.timed(WorkerTime.Use.CLASS_CHECKS, () -> runUnmutated(key, classes)).outcome() != Outcome.SURVIVED) {
            retire(WorkerTime.Replacement.CLASS_CHECK_FAILED);
        }
    }

    /** Runs tests in the current worker with no point switched on, each step under the start timeout, up to the first failure. */
    private JobResult runUnmutated(String key, List<String> tests) {
        return worker.run(MutantJob.schema(key, new int[0], tests, settings.startTimeout().toMillis()));
    }

    /** Asks whatever this slot has running to exit now, whatever it does (Ctrl-C); {@link #awaitStop} follows. */
    void askToStop() {
        for (WorkerProcess running : new WorkerProcess[] {live, liveAlone}) {
            if (running != null) {
                running.askToExit();
            }
        }
    }

    /** Waits for what this slot ran to exit, and kills what has not within the grace period since it was asked. */
    void awaitStop() {
        for (WorkerProcess running : new WorkerProcess[] {live, liveAlone}) {
            if (running != null) {
                running.awaitExit();
            }
        }
    }

    void close() {
        if (worker != null) {
            worker.close();
            worker = null;
            live = null;
        }
    }

    /** A mutant compiled alone runs in a fresh worker of its own; a crash there is confirmed in another one. */
    private JobResult executeAlone(MutantJob job) {
        AloneRun first = runAlone(job);
        if (first.result().outcome() != Outcome.CRASHED) {
            return first.result();
        }
        pool.throwIfStopped();
        return CrashCheck.settle(first.result(), first.death(), runAlone(job).result());
    }

    /** The result of one run of a mutant compiled alone, and how its worker died, if it did. */
    private record AloneRun(JobResult result, String death) {
    }

    private AloneRun runAlone(MutantJob job) {
        long start = System.nanoTime();
        WorkerProcess alone = launch(List.of(job.aloneClasses()), aloneTemp, aloneArgumentFile, true);
        try {
            try {
                alone.prepare(setup, settings.startTimeout().toMillis());
                time.add(WorkerTime.Use.STARTS, System.nanoTime() - start);
            } catch (WorkerProcess.Lost lost) {
                pool.throwIfStopped();
                // Only the mutant's own classes differ from a worker that prepares fine: its static initialiser did this.
                return new AloneRun(new JobResult(job.key(), lost.timedOut ? Outcome.TIMED_OUT : Outcome.CRASHED, null,
                        "while its classes were initialised: " + lost.getMessage(), List.of(), System.nanoTime() - start),
                        alone.death());
            }
            return new AloneRun(time.timed(WorkerTime.Use.MUTANTS, () -> alone.run(job)), alone.death());
        } finally {
            time.timed(WorkerTime.Use.ENDS, alone::close);
            liveAlone = null;
            emptyFolder(aloneTemp);
        }
    }

    /**
     * A fresh worker loads the test engine and the tests' classes while it runs its first tests, which on a busy
     * machine takes seconds, far more than the few milliseconds of running them again; charged to the first
     * mutant's deadline, it turned mutants that merely fail or pass into false timeouts (and each timeout starts
     * another fresh worker). So the job's first test runs once unmutated first, under the start timeout; one test
     * is enough to load the engine, and keeps the cost low for a mutant that thousands of tests reach.
     */
    private void warmUp(MutantJob job) {
        if (warm || job.tests().isEmpty()) {
            return;
        }
        JobResult warming = time.timed(WorkerTime.Use.WARM_UPS, () -> runUnmutated(job.key(), List.of(job.tests().get(0))));
        if (warming.outcome() == Outcome.TIMED_OUT || warming.outcome() == Outcome.CRASHED) {
            // The unmutated tests did not come back: the mutant runs in a fresh worker as it would have without this.
            retire();
            pool.throwIfStopped();
            ensureWorker();
            return;
        }
        warm = true;
    }

    private void ensureWorker() {
        if (worker != null) {
            return;
        }
        long starting = System.nanoTime();
        WorkerProcess started = launch(List.of(), temp, argumentFile, false);
        try {
            WorkerProcess.Prepared answer = started.prepare(setup, settings.startTimeout().toMillis());
            time.add(WorkerTime.Use.STARTS, System.nanoTime() - starting);
            if (prepared == null) {
                prepared = answer;
            }
        } catch (WorkerProcess.Lost lost) {
            started.end();
            live = null;
            pool.throwIfStopped();
            throw new UserError("a worker JVM failed while the production classes were initialised: " + lost.getMessage()
                    + "; the output is in " + log);
        }
        worker = started;
        mutantsOnWorker = 0;
        warm = false;
    }

    private WorkerProcess launch(List<Path> first, Path folder, Path arguments, boolean alone) {
        pool.throwIfStopped();
        emptyFolder(folder);
        WorkerProcess started;
        try {
            started = WorkerProcess.launch(settings, pool.workerClasses(), first, log, folder, arguments);
        } catch (IOException e) {
            throw new UserError("cannot start a worker JVM with " + settings.javaExecutable() + ": " + e.getMessage()
                    + "; check the Java installation or give another one");
        }
        pool.counted();
        if (alone) {
            liveAlone = started;
        } else {
            live = started;
        }
        if (pool.stopped()) {
            started.end();
            throw new CancellationException("stopped");
        }
        try {
            started.connect(settings.startTimeout().toMillis());
        } catch (WorkerProcess.Lost lost) {
            started.end();
            pool.throwIfStopped();
            throw new UserError("a worker JVM did not start: " + lost.getMessage() + "; its output is in " + log);
        }
        return started;
    }

    /** Ends the current worker the way a test JVM ends (killed only if it will not), and empties its temp folder. */
    private void retire() {
        retire(null);
    }

    /**
     * {@link #retire()}, counting why the worker is replaced when it is; one that has run its share of mutants is let go
     * as at the end of a run (its test session closed first), and killed only if it will not exit.
     */
    private void retire(WorkerTime.Replacement why) {
        if (worker != null) {
            if (why != null) {
                time.replaced(why);
            }
            time.timed(WorkerTime.Use.ENDS, why == WorkerTime.Replacement.SHARE_DONE ? worker::close : worker::end);
        }
        worker = null;
        live = null;
        emptyFolder(temp);
    }

    private static void emptyFolder(Path folder) {
        try {
            WorkerClasses.deleteContents(folder);
        } catch (IOException | UncheckedIOException e) {
            // A file a test left behind and locked must not stop the run; the next worker shares the folder with it.
        }
    }
}
