package dev.changeling.probe;

/**
 * Thrown by a mutation switch once the running step of tests has passed its deadline: an error, so that it
 * unwinds the test like any other and fails it, without a stack trace, as it may be thrown many times over.
 */
public final class MutantStopped extends Error {

    private static final long serialVersionUID = 1L;

    MutantStopped() {
        super("the mutant ran past its deadline and was stopped", null, false, false);
    }
}
