package dev.changeling.run;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.Supplier;

/**
 * The time of each phase of a run, in the order they first ran (a phase run again, as for each module of a build,
 * adds up), and the whole run's as {@code total}; says each phase's name as it starts.
 */
final class PhaseClock {

    static final String MAVEN = "maven";
    static final String GENERATE = "generate";
    static final String COMPILE = "compile";
    static final String BASELINE = "baseline";
    static final String COMPILE_ALONE = "compile alone";
    static final String EXECUTE = "execute";
    static final String COMPARE = "compare survivors";

    private final long started = System.nanoTime();
    private final Map<String, Double> millis = new LinkedHashMap<>();
    private final Consumer<String> onStart;

    PhaseClock(Consumer<String> onStart) {
        this.onStart = onStart;
    }

    <T> T time(String phase, Supplier<T> work) {
        onStart.accept(phase);
        long at = System.nanoTime();
        try {
            return work.get();
        } finally {
            millis.merge(phase, (System.nanoTime() - at) / 1e6, Double::sum);
        }
    }

    Map<String, Double> withTotal() {
        Map<String, Double> all = new LinkedHashMap<>(millis);
        all.put("total", (System.nanoTime() - started) / 1e6);
        return all;
    }
}
