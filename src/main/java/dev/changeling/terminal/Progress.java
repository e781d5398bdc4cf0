package dev.changeling.terminal;

import java.io.PrintStream;
import java.time.Duration;
import java.util.Locale;
import org.fusesource.jansi.internal.CLibrary;

/**
 * Shows how far a run has come on standard error: a bar redrawn in place on a terminal, a plain
 * line every few seconds in a CI log.
 */
public final class Progress {

    private static final int BAR_WIDTH = 24;
    private static final long PLAIN_EVERY_NANOS = Duration.ofSeconds(5).toNanos();

    private final PrintStream err;
    private final boolean terminal;
    private final int total;
    private final long startNanos = System.nanoTime();
    private long lastPlainNanos = startNanos;
    private int done;
    private int detected;
    private int counted;

    Progress(PrintStream err, boolean terminal, int total) {
        this.err = err;
        this.terminal = terminal;
        this.total = total;
    }

    /** Progress for {@code total} mutants on the process's standard error; {@code plain} asks for lines, not a bar. */
    public static Progress onStandardError(int total, boolean plain) {
        return new Progress(System.err, !plain && standardErrorIsTerminal(), total);
    }

    /** One more mutant finished; {@code counts} says whether it counts in the score, {@code caught} whether it was detected. */
    public synchronized void finished(boolean counts, boolean caught) {
        done++;
        if (counts) {
            counted++;
            if (caught) {
                detected++;
            }
        }
        long now = System.nanoTime();
        if (terminal) {
            err.print("\r" + bar() + " " + status(now) + "\u001b[K");
            err.flush();
        } else if (now - lastPlainNanos >= PLAIN_EVERY_NANOS || done == total) {
            lastPlainNanos = now;
            err.println("progress: " + status(now));
        }
    }

    /** Ends the bar's line so that what follows starts on a fresh one. */
    public synchronized void close() {
        if (terminal && done > 0) {
            err.println();
        }
    }

    private String bar() {
        int filled = total == 0 ? BAR_WIDTH : (int) ((long) done * BAR_WIDTH / total);
        return "[" + "=".repeat(filled) + " ".repeat(BAR_WIDTH - filled) + "]";
    }

    String status(long nowNanos) {
        StringBuilder line = new StringBuilder();
        line.append(done).append('/').append(total).append(" mutants");
        if (counted > 0) {
            // Rounded down, as the final summary is, so that the two never disagree.
            line.append(String.format(Locale.ROOT, ", score so far %.2f", Math.floor(100.0 * detected / counted) / 100));
        }
        if (done > 0 && done < total) {
            long left = (nowNanos - startNanos) / done * (total - done);
            line.append(", about ").append(clock(Duration.ofNanos(left))).append(" left");
        }
        return line.toString();
    }

    static String clock(Duration duration) {
        long seconds = duration.toSeconds();
        return seconds >= 60 ? String.format(Locale.ROOT, "%d:%02d", seconds / 60, seconds % 60) : seconds + "s";
    }

    private static boolean standardErrorIsTerminal() {
        try {
            return CLibrary.isatty(CLibrary.STDERR_FILENO) != 0;
        } catch (Throwable unavailable) {
            return System.console() != null;
        }
    }
}
