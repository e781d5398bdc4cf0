package dev.changeling.run;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Supplier;

/** The time of each phase of a run, in the order they ran, and the whole run's as {@code total}. */
final class PhaseClock {

    private final long started = System.nanoTime();
    private final Map<String, Double> millis = new LinkedHashMap<>();

    <T> T time(String phase, Supplier<T> work) {
        long at = System.nanoTime();
        try {
            return work.get();
        } finally {
            millis.put(phase, (System.nanoTime() - at) / 1e6);
        }
    }

    Map<String, Double> withTotal() {
        Map<String, Double> all = new LinkedHashMap<>(millis);
        all.put("total", (System.nanoTime() - started) / 1e6);
        return all;
    }
}
