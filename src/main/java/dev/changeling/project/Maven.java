package dev.changeling.project;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/** Runs the real mvn in batch mode with its output in a log file, and adds up how long the runs took. */
final class Maven {

    private static final Pattern PLAIN_WORD = Pattern.compile("[A-Za-z0-9_./:=@%+,-]+");
    private static final Pattern COLOUR = Pattern.compile("\u001B\\[[0-9;]*m");
    private static final int LONGEST_QUOTED_ERROR = 240;
    /** 128 plus the signal's number, as a shell reports a command a signal ended (POSIX sh, "Exit Status"). */
    private static final int SIGINT_EXIT = 128 + 2;
    private static final int SIGTERM_EXIT = 128 + 15;

    private final Path executable;
    private final List<String> extraArguments;
    private Duration total = Duration.ZERO;

    Maven(Path executable, List<String> extraArguments) {
        this.executable = executable;
        this.extraArguments = List.copyOf(extraArguments);
    }

    /** One finished run of mvn. */
    record Run(List<String> command, Path directory, Path log, int exitCode, Duration took) {

        boolean succeeded() {
            return exitCode == 0;
        }

        boolean logMentions(String text) {
            try (Stream<String> lines = Files.lines(log, StandardCharsets.UTF_8)) {
                return lines.anyMatch(line -> line.contains(text));
            } catch (IOException | UncheckedIOException e) {
                return false;
            }
        }

        /** A command line a user can paste into a shell to run the same thing. */
        String reproduction() {
            return "cd " + quoted(directory.toString()) + " && "
                    + command.stream().map(Maven::quoted).collect(Collectors.joining(" "));
        }

        /**
         * One line: what failed, Maven's first error, where the log is and how to run it again; or, when mvn was
         * ended by Ctrl-C or a termination signal (as a terminal's Ctrl-C reaches mvn and the tool at once), that.
         */
        UserError failure(String what) {
            if (exitCode == SIGINT_EXIT || exitCode == SIGTERM_EXIT) {
                return new UserError("mvn was interrupted (exit code " + exitCode + ") in " + directory + "; nothing was written",
                        ExitCode.INTERRUPTED);
            }
            String firstError = firstError().map(error -> ": " + error).orElse("");
            return new UserError(what + " (mvn exit code " + exitCode + ")" + firstError
                    + "; full log: " + log + "; to reproduce: " + reproduction());
        }

        private Optional<String> firstError() {
            try (Stream<String> lines = Files.lines(log, StandardCharsets.UTF_8)) {
                return lines.map(line -> COLOUR.matcher(line).replaceAll("").strip())
                        .filter(line -> line.startsWith("[ERROR]"))
                        .map(line -> line.substring("[ERROR]".length()).strip())
                        .filter(line -> !line.isEmpty() && !line.startsWith("COMPILATION ERROR"))
                        .findFirst()
                        .map(line -> line.length() <= LONGEST_QUOTED_ERROR ? line : line.substring(0, LONGEST_QUOTED_ERROR) + "…");
            } catch (IOException | UncheckedIOException e) {
                return Optional.empty();
            }
        }
    }

    /** Runs {@code mvn -B -ntp <extra arguments> <arguments>} in a folder, all output going to the log. */
    Run run(Path directory, List<String> arguments, Path log) {
        List<String> command = new ArrayList<>();
        command.add(executable.toString());
        command.add("-B");
        command.add("-ntp");
        command.addAll(extraArguments);
        command.addAll(arguments);
        try {
            Files.createDirectories(log.getParent());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        ProcessBuilder builder = new ProcessBuilder(command)
                .directory(directory.toFile())
                .redirectErrorStream(true)
                .redirectOutput(log.toFile());
        long start = System.nanoTime();
        Process process;
        try {
            process = builder.start();
        } catch (IOException e) {
            throw new UserError("could not start " + executable + ": " + e.getMessage() + "; check that it is a working mvn");
        }
        try {
            process.getOutputStream().close();
            int exitCode = process.waitFor();
            Duration took = Duration.ofNanos(System.nanoTime() - start);
            total = total.plus(took);
            return new Run(List.copyOf(command), directory, log, exitCode, took);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            process.descendants().forEach(ProcessHandle::destroy);
            process.destroy();
            Thread.currentThread().interrupt();
            throw new UserError("stopped while mvn was running in " + directory, ExitCode.INTERRUPTED);
        }
    }

    /** The arguments given for every call. */
    List<String> arguments() {
        return extraArguments;
    }

    /** The {@code -Dname=value} arguments given for every call ({@code -Dname} alone means true), as Maven's user properties. */
    Map<String, String> userProperties() {
        Map<String, String> properties = new LinkedHashMap<>();
        for (String argument : extraArguments) {
            if (argument.startsWith("-D") && argument.length() > 2) {
                int equals = argument.indexOf('=');
                if (equals < 0) {
                    properties.put(argument.substring(2), "true");
                } else {
                    properties.put(argument.substring(2, equals), argument.substring(equals + 1));
                }
            }
        }
        return properties;
    }

    /** The time of every run so far, added up. */
    Duration totalTime() {
        return total;
    }

    private static String quoted(String word) {
        return PLAIN_WORD.matcher(word).matches() ? word : "'" + word.replace("'", "'\\''") + "'";
    }
}
