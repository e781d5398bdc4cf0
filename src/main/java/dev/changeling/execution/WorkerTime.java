package dev.changeling.execution;

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

    private final Map<Use, LongAdder> nanos = new EnumMap<>(Use.class);
    private final Map<Use, LongAdder> counts = new EnumMap<>(Use.class);

    WorkerTime() {
        for (Use use : Use.values()) {
            nanos.put(use, new LongAdder());
            counts.put(use, new LongAdder());
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

    public long nanos(Use use) {
        return nanos.get(use).sum();
    }

    public long count(Use use) {
        return counts.get(use).sum();
    }

    /** One line: each use with its seconds and how many times, those that never happened left out. */
    public String describe() {
        return "worker time: " + java.util.Arrays.stream(Use.values())
                .filter(use -> count(use) > 0)
                .map(use -> String.format(Locale.ROOT, "%s %.1f s (%d)", use.words, nanos(use) / 1e9, count(use)))
                .collect(Collectors.joining(" · "));
    }
}
