package dev.changeling.run;

import dev.changeling.results.MutantResult;

/** What a run tells as it goes: a line per phase, then each mutant as it finishes. */
public interface RunListener {

    /**
     * A phase is about to start, named as the run's timings name it: {@code maven}, {@code generate},
     * {@code compile}, {@code baseline}, {@code execute}. For those who show where a run is; nothing by default.
     */
    default void starting(String phase) {
    }

    /** A phase finished; {@code line} says what it found, e.g. "baseline: 38 tests green in 0.4 s". */
    default void phase(String line) {
    }

    /** Mutants are about to run. */
    default void running(int mutants) {
    }

    /** One mutant has its verdict. */
    default void finished(MutantResult result) {
    }

    /** Says nothing. */
    RunListener SILENT = new RunListener() {
    };
}
