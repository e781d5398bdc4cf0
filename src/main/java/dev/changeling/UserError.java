package dev.changeling;

/**
 * A mistake the user can fix (a bad path, a file that cannot be read back, a red baseline): shown
 * as one line saying what, where and what to do, with a documented exit code, never a stack trace.
 */
public class UserError extends RuntimeException {

    private final int exitCode;

    public UserError(String message) {
        this(message, ExitCode.USER_ERROR);
    }

    public UserError(String message, int exitCode) {
        super(message);
        this.exitCode = exitCode;
    }

    public int exitCode() {
        return exitCode;
    }
}
