package dev.changeling.run;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/** Runs a program (git, mvn) to its end for a test, with its output captured and a limit after which it is killed. */
final class ExternalCommand {

    /** How a program ended: its exit code, or {@code null} when it was killed at the limit, and its combined output. */
    record Ended(Integer exitCode, String output) {

        boolean finished() {
            return exitCode != null;
        }
    }

    private ExternalCommand() {
    }

    static Ended run(Path folder, Map<String, String> environment, long limitSeconds, List<String> command) {
        ProcessBuilder builder = new ProcessBuilder(command).directory(folder.toFile()).redirectErrorStream(true);
        builder.environment().putAll(environment);
        Path output;
        Process process;
        try {
            output = Files.createTempFile("changeling-command", ".log");
            builder.redirectOutput(output.toFile());
            process = builder.start();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot start " + command, e);
        }
        try {
            process.getOutputStream().close();
            boolean ended = process.waitFor(limitSeconds, TimeUnit.SECONDS);
            if (!ended) {
                killWithChildren(process.toHandle());
            }
            String text = Files.readString(output, StandardCharsets.UTF_8);
            return new Ended(ended ? process.exitValue() : null, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            killWithChildren(process.toHandle());
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while " + command + " ran", e);
        } finally {
            try {
                Files.deleteIfExists(output);
            } catch (IOException ignored) {
                // a temporary log left behind is harmless
            }
        }
    }

    static void killWithChildren(ProcessHandle process) {
        List<ProcessHandle> children = process.descendants().toList();
        process.destroyForcibly();
        children.forEach(ProcessHandle::destroyForcibly);
        process.onExit().join();
    }
}
