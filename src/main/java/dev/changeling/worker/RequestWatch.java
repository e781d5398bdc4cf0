package dev.changeling.worker;

import org.junit.platform.launcher.TestExecutionListener;

/**
 * Watches one request's tests, and is told when an error the engines do not catch ({@code OutOfMemoryError}, which
 * the JUnit Platform treats as unrecoverable and rethrows) unwinds the whole request: the test running then failed by it.
 */
interface RequestWatch extends TestExecutionListener {

    void unwound(Throwable error);
}
