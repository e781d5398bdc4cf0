package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import java.io.PrintWriter;
import java.util.Comparator;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import picocli.CommandLine;
import picocli.CommandLine.Model.UsageMessageSpec;

/** The {@code changeling} command: picocli parses, one subcommand class does the work. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        Optional<Integer> elsewhere = ToolJvm.relaunch(args).flatMap(ToolJvm::runIn);
        System.exit(elsewhere.orElseGet(() -> execute(new PrintWriter(System.out, true), new PrintWriter(System.err, true), args)));
    }

    /** Runs a command line with the given output streams and returns the exit code. */
    public static int execute(PrintWriter out, PrintWriter err, String... args) {
        CommandLine line = new CommandLine(new ChangelingCommand());
        line.setOut(out);
        line.setErr(err);
        line.setExecutionExceptionHandler((exception, commandLine, parsed) -> report(exception, commandLine, err));
        listExitCodes(line);
        return line.execute(args);
    }

    /**
     * Every command's help ends with its exit codes: those the command declares, and the two any command
     * can end with (docs/exit-codes.md lists them all).
     */
    private static void listExitCodes(CommandLine line) {
        UsageMessageSpec usage = line.getCommandSpec().usageMessage();
        Map<String, String> codes = new TreeMap<>(Comparator.comparingInt((String code) -> Integer.parseInt(code.strip())));
        usage.exitCodeList().forEach((code, meaning) -> codes.put(code.strip(), meaning));
        codes.putIfAbsent("0", "Done.");
        codes.putIfAbsent("1", "A mistake to fix (a path, a file, the build); the message says what and where.");
        codes.putIfAbsent("2", "The command line is wrong.");
        codes.putIfAbsent("70", "A fault inside the tool: run again with --verbose and report it.");
        usage.exitCodeListHeading("%nExit codes:%n").exitCodeList(codes);
        line.getSubcommands().values().forEach(Main::listExitCodes);
    }

    private static int report(Exception exception, CommandLine commandLine, PrintWriter err) {
        boolean verbose = commandLine.getParseResult() != null && commandLine.getParseResult().hasMatchedOption("--verbose");
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
