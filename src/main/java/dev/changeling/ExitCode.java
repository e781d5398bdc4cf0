package dev.changeling;

/** The exit codes of every command; README.md and docs/exit-codes.md list them for users. */
public final class ExitCode {

    /** The command did what it was asked. */
    public static final int OK = 0;
    /** A mistake the user can fix; the message says what, where and what to do. */
    public static final int USER_ERROR = 1;
    /** The command line itself is wrong (unknown option, bad value). */
    public static final int USAGE = 2;
    /** The run completed but the mutation score is under the threshold asked for. */
    public static final int SCORE_TOO_LOW = 3;
    /** The run completed but survivors remain unresolved on the changed lines. */
    public static final int SURVIVORS_REMAIN = 4;
    /** The project's own tests fail without any mutant: mutation analysis needs a green suite. */
    public static final int BASELINE_RED = 5;
    /** An interactive command was started without a terminal. */
    public static final int NO_TERMINAL = 6;
    /** The results files given to merge are not the shards of one run: one missing or twice, or from different runs. */
    public static final int SHARDS_APART = 7;
    /** A fault inside the tool itself; the message asks for a report. */
    public static final int INTERNAL = 70;
    /** Stopped by Ctrl-C (128 + SIGINT); partial results were kept. */
    public static final int INTERRUPTED = 130;

    private ExitCode() {
    }
}
