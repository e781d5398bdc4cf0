package dev.changeling.execution;

import java.util.List;
import java.util.function.Consumer;
import java.util.function.Predicate;

/**
 * Worker JVMs that run the project's tests: the unmutated suite once, then mutant after mutant. Workers
 * start when first needed and are replaced after a crash, a timeout or a set number of mutants; none
 * outlives {@link #close()} or the tool itself.
 */
public interface WorkerPool extends AutoCloseable {

    /** A pool that starts its workers as needed; {@code settings.workers()} of them at most. */
    static WorkerPool open(WorkerSettings settings, SuiteSetup setup) {
        return new DefaultWorkerPool(settings, setup);
    }

    /**
     * Runs the whole unmutated suite once, its test classes spread over the workers, recording each test's
     * result, time and reach.
     *
     * @param onTestFinished told the name of each test as it finishes (for progress), one call at a time, from the pool's threads
     * @throws dev.changeling.UserError                 when the worker cannot start, dies or runs out of time
     * @throws java.util.concurrent.CancellationException when the pool was stopped
     */
    default Baseline baseline(Consumer<String> onTestFinished) {
        return baseline(testClass -> true, onTestFinished);
    }

    /**
     * Runs the test classes (top-level, binary names) that {@code runs} accepts, as {@link #baseline(Consumer)} runs them
     * all.
     */
    Baseline baseline(Predicate<String> runs, Consumer<String> onTestFinished);

    /**
     * Runs the jobs on all workers, each job's tests one at a time, and returns the results of the jobs
     * that finished, in job order: all of them, unless the pool was stopped meanwhile.
     *
     * @param onResult told each result as it comes, one call at a time, from the pool's threads
     * @throws dev.changeling.UserError when a worker cannot be started or prepared
     */
    List<JobResult> run(List<MutantJob> jobs, Consumer<JobResult> onResult);

    /**
     * Stops everything at once (for Ctrl-C): asks the workers to exit, as test JVMs exit (their shutdown hooks
     * run), kills those that have not within two seconds, and makes a running {@link #run} return what finished.
     * May be called from any thread; the pool runs nothing more afterwards.
     */
    void stop();

    boolean stopped();

    /** How many worker JVMs this pool has started so far. */
    int workersStarted();

    /** Where the workers' time went so far. */
    WorkerTime workerTime();

    /** Lets the workers quit, and kills any that have not within two seconds. */
    @Override
    void close();
}
