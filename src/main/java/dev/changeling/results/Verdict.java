package dev.changeling.results;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;

/** What became of one mutant. */
public enum Verdict {
    /** A test failed (by assertion or error) with the mutant switched on. */
    KILLED,
    /** Every test that reaches the mutant passed. */
    SURVIVED,
    /** No test reaches the mutant's code; nothing was run. */
    UNREACHED,
    /** The tests ran past their deadline; the worker was stopped. Counts as detected. */
    TIMED_OUT,
    /** The worker JVM died (System.exit, out of memory, a native stack overflow). Counts as detected. */
    CRASHED,
    /** The mutant does not compile; it is not counted. */
    STILLBORN,
    /** The mutant lives in code that runs once per JVM and was not run; it is not counted. */
    SKIPPED;

    public boolean detected() {
        return this == KILLED || this == TIMED_OUT || this == CRASHED;
    }

    /** Whether the mutant counts in the score at all. */
    public boolean counted() {
        return this != STILLBORN && this != SKIPPED;
    }

    /** The word users see: lower case, a space between words. */
    public String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', ' ');
    }

    @JsonValue
    public String json() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
