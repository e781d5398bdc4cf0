package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import java.io.PrintWriter;
import picocli.CommandLine;

/** The {@code changeling} command: picocli parses, one subcommand class does the work. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(execute(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args));
    }

    /** Runs a command line with the given output streams and returns the exit code. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        CommandLine line = new CommandLine(new ChangelingCommand());
        line.setOut(out);
        line.setErr(err);
        line.setExecutionExceptionHandler((exception, commandLine, parsed) -> report(exception, commandLine, err, args));
        return line.execute(args);
    }

    private static int report(Exception exception, CommandLine commandLine, PrintWriter err, String... args) {
        boolean verbose = java.util.Arrays.asList(args).contains("--verbose");
        if (exception instanceof UserError user) {
            err.println("changeling: " + user.getMessage());
            if (verbose) {
                exception.printStackTrace(err);
            }
            err.flush();
            return user.exitCode();
        }
        err.println("changeling: internal error: " + exception
                + (verbose ? "" : " (run again with --verbose for the stack trace, and please report it)"));
        if (verbose) {
            exception.printStackTrace(err);
        }
        err.flush();
        return ExitCode.INTERNAL;
    }
}
