package dev.changeling.run;

import dev.changeling.execution.Deadlines;
import dev.changeling.execution.JobResult;
import dev.changeling.execution.MutantJob;
import dev.changeling.execution.Outcome;
import dev.changeling.execution.WorkerPool;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * A check of the deadlines: every timed-out mutant runs again with ten times its deadline. One that then passes
 * or fails normally was a false timeout (one that passes even hid a survivor). The verdicts stay as they were.
 */
final class TimeoutRecheck {

    static final int FACTOR = 10;

    private TimeoutRecheck() {
    }

    /** Runs the timed-out jobs again and tells the listener what became of them, in one line and one per finisher. */
    static void run(WorkerPool pool, List<MutantJob> jobs, List<JobResult> results, Deadlines deadlines,
                    Function<String, String> describe, RunListener listener) {
        Map<String, MutantJob> byKey = jobs.stream().collect(Collectors.toMap(MutantJob::key, job -> job));
        Deadlines longer = new Deadlines(deadlines.factor() * FACTOR, deadlines.constantMillis() * FACTOR);
        List<MutantJob> again = results.stream()
                .filter(result -> result.outcome() == Outcome.TIMED_OUT)
                .map(result -> byKey.get(result.key()).withDeadlines(longer))
                .toList();
        List<JobResult> rechecked = pool.run(again, result -> { });
        Map<Outcome, Long> counts = rechecked.stream().collect(Collectors.groupingBy(JobResult::outcome, Collectors.counting()));
        listener.phase(String.format(java.util.Locale.ROOT,
                "timeouts rechecked with %d times the deadline: %d timed out again, %d were false (%d passed, %d failed), %d crashed",
                FACTOR, counts.getOrDefault(Outcome.TIMED_OUT, 0L),
                counts.getOrDefault(Outcome.SURVIVED, 0L) + counts.getOrDefault(Outcome.KILLED, 0L),
                counts.getOrDefault(Outcome.SURVIVED, 0L), counts.getOrDefault(Outcome.KILLED, 0L),
                counts.getOrDefault(Outcome.CRASHED, 0L)));
        rechecked.stream()
                .filter(result -> result.outcome() == Outcome.SURVIVED || result.outcome() == Outcome.KILLED)
                .forEach(result -> listener.phase("  false timeout: " + describe.apply(result.key()) + " "
                        + (result.outcome() == Outcome.SURVIVED ? "passed" : "failed") + " in "
                        + result.nanos() / 1_000_000 + " ms"));
    }
}
