package dev.changeling.execution;

import dev.changeling.worker.Wire;

/** How one test ended in a worker. */
public enum TestStatus {
    PASSED,
    /** A broken assertion or any other error, in the test or in its containers' setup and teardown. */
    FAILED,
    /** An assumption did not hold: neither passed nor failed. */
    ABORTED,
    /** Disabled, or its container is. */
    SKIPPED,
    /** The worker found no test with that id. */
    MISSING,
    /** It was running when its step's deadline passed; the mutant was stopped in place. */
    STOPPED;

    static TestStatus fromWire(byte code) {
        return switch (code) {
            case Wire.PASSED -> PASSED;
            case Wire.FAILED -> FAILED;
            case Wire.ABORTED -> ABORTED;
            case Wire.SKIPPED -> SKIPPED;
            case Wire.MISSING -> MISSING;
            case Wire.STOPPED -> STOPPED;
            default -> throw new IllegalStateException("unknown test status " + code + " from a worker");
        };
    }
}
