package dev.changeling.execution;

/** What running the tests against one mutant came to. */
public enum Outcome {
    /** A test failed (a broken assertion or any other error). */
    KILLED,
    /** Every test given passed (or was aborted or skipped). */
    SURVIVED,
    /** No answer before the deadline; the worker was killed. */
    TIMED_OUT,
    /** The worker JVM died: System.exit, out of memory, a crash in native code. */
    CRASHED;

    /** Whether the tests noticed the mutant; a timeout or a crash counts as noticed. */
    public boolean detected() {
        return this != SURVIVED;
    }
}
