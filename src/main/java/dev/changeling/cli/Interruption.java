package dev.changeling.cli;

import dev.changeling.run.MutationRun;
import java.io.PrintWriter;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/**
 * Ctrl-C (or a termination signal) during a run. The JVM ends as soon as its shutdown hooks have, so the hook
 * stops the run and then waits until the command has said what became of it; the command alone says so, as only
 * it knows whether a results file of this run was written. When no signal came, the hook is removed unused.
 */
final class Interruption {

    /** Ending the workers takes a few seconds at most (two seconds' grace, then they are killed). */
    private static final long WAIT_SECONDS = 30;

    private final Thread hook;
    private final CountDownLatch told = new CountDownLatch(1);
    private volatile boolean happened;

    private Interruption(MutationRun run, PrintWriter err) {
        hook = new Thread(() -> {
            happened = true;
            run.stop();
            if (!awaitTold()) {
                err.println("changeling: stopped; the run did not wind down within " + WAIT_SECONDS + " s");
                err.flush();
            }
        }, "changeling-interrupt");
    }

    /** Stops the run on Ctrl-C from now on, until {@link #told()}. */
    static Interruption watch(MutationRun run, PrintWriter err) {
        Interruption interruption = new Interruption(run, err);
        Runtime.getRuntime().addShutdownHook(interruption.hook);
        return interruption;
    }

    /** Whether the user stopped the run. */
    boolean happened() {
        return happened;
    }

    /** The command has said all it will: an interrupted JVM may now end; otherwise the hook goes unused. */
    void told() {
        told.countDown();
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException shuttingDown) {
            // the hook is running, and returns now
        }
    }

    private boolean awaitTold() {
        try {
            return told.await(WAIT_SECONDS, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
