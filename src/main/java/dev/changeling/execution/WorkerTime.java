package dev.changeling.execution;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.Supplier;
import java.util.stream.Collectors;

/** Where the workers' time went, summed over all workers: what the engine costs beside the mutants' own tests. */
public final class WorkerTime {

    /** What a worker spent its time on. */
    public enum Use {
        MUTANTS("mutants' tests"),
        KILL_CHECKS("kill checks"),
        CLASS_CHECKS("class checks after a stop"),
        WARM_UPS("warm-ups"),
        STARTS("starting workers"),
        ENDS("ending workers");

        private final String words;

        Use(String words) {
            this.words = words;
        }
    }

    /** Why a worker was replaced while mutants ran. */
    public enum Replacement {
        SHARE_DONE("after their share of mutants"),
        CLASS_CHECK_FAILED("after a stopped test's class failed unmutated"),
        FRESH_WORKER_CHEAPER("after a stop, where a fresh worker costs less than running the stopped test's class"),
        KILL_CHECK_FAILED("after a killing test failed unmutated"),
        GONE("ended at a deadline or dead"),
        CRASHED("crashed"),
        HEAP_EXHAUSTED("after their heap ran out");

        private final String words;

        Replacement(String words) {
            this.words = words;
        }
    }

    private final Map<Replacement, LongAdder> replacements = new EnumMap<>(Replacement.class);
    private final Map<Use, LongAdder> nanos = new EnumMap<>(Use.class);
    private final Map<Use, LongAdder> counts = new EnumMap<>(Use.class);

    WorkerTime() {
        for (Use use : Use.values()) {
            nanos.put(use, new LongAdder());
            counts.put(use, new LongAdder());
        }
        for (Replacement why : Replacement.values()) {
            replacements.put(why, new LongAdder());
        }
    }

    /** Runs {@code work} and counts its time under {@code use}. */
    <T> T timed(Use use, Supplier<T> work) {
        long start = System.nanoTime();
        try {
            return work.get();
        } finally {
            add(use, System.nanoTime() - start);
        }
    }

    /** Counts one use of {@code spent} nanoseconds. */
    void add(Use use, long spent) {
        nanos.get(use).add(spent);
        counts.get(use).increment();
    }

    void timed(Use use, Runnable work) {
        timed(use, () -> {
            work.run();
            return null;
        });
    }

    /** Counts a worker replaced for this reason. */
    void replaced(Replacement why) {
        replacements.get(why).increment();
    }

    public long replacements(Replacement why) {
        return replacements.get(why).sum();
    }

    /**
     * What a fresh worker has cost on average in this run: a start, an end and a warm-up (the last two as none until
     * measured); with no start measured yet, as much as anything could cost, so that no check is skipped for want of a
     * measure.
     */
    long freshWorkerNanos() {
        if (count(Use.STARTS) == 0) {
            return Long.MAX_VALUE;
        }
        return average(Use.STARTS) + average(Use.ENDS) + average(Use.WARM_UPS);
    }

    private long average(Use use) {
        long count = count(use);
        return count == 0 ? 0 : nanos(use) / count;
    }

    public long nanos(Use use) {
        return nanos.get(use).sum();
    }

    public long count(Use use) {
        return counts.get(use).sum();
    }

    /**
     * One line: each use with its seconds and how many times, then how many workers were replaced and why, those that
     * never happened left out.
     */
    public String describe() {
        String uses = Arrays.stream(Use.values())
                .filter(use -> count(use) > 0)
                .map(use -> String.format(Locale.ROOT, "%s %.1f s (%d)", use.words, nanos(use) / 1e9, count(use)))
                .collect(Collectors.joining(" · "));
        String replaced = Arrays.stream(Replacement.values())
                .filter(why -> replacements(why) > 0)
                .map(why -> replacements(why) + " " + why.words)
                .collect(Collectors.joining(", "));
        return "worker time: " + uses + (replaced.isEmpty() ? "" : "; replaced: " + replaced);
    }
}
