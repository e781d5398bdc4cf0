package dev.changeling.run;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardWatchEventKinds;
import java.nio.file.WatchService;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.function.Predicate;

/**
 * The real tool in a process of its own, its standard error read line by line as it comes, so that a test can
 * act at a given moment of the run (send a signal, say) and then see how it ended. Closing it kills what is left.
 */
final class ToolProcess implements AutoCloseable {

    static final long WAIT_SECONDS = 300;

    private final Process process;
    private final BlockingQueue<String> lines = new LinkedBlockingQueue<>();
    private final List<String> stderr = new ArrayList<>();
    private final Thread reader;

    private ToolProcess(Process process) {
        this.process = process;
        this.reader = new Thread(this::readLines, "tool-stderr");
        reader.setDaemon(true);
        reader.start();
    }

    /** Starts a command line with these variables added to the environment. */
    static ToolProcess start(List<String> command, Map<String, String> environment, ProcessBuilder.Redirect stdout) throws IOException {
        ProcessBuilder builder = new ProcessBuilder(command).redirectOutput(stdout);
        builder.environment().putAll(environment);
        return new ToolProcess(builder.start());
    }

    long pid() {
        return process.pid();
    }

    /** Waits for a line of standard error that passes the test; fails if the tool ends first. */
    String awaitLine(Predicate<String> wanted) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
        while (System.nanoTime() < deadline) {
            String line = lines.poll(1, TimeUnit.SECONDS);
            if (line != null) {
                stderr.add(line);
                if (wanted.test(line)) {
                    return line;
                }
            } else if (!process.isAlive()) {
                throw new AssertionError("the tool ended (exit " + process.exitValue() + ") before the line awaited: " + stderr);
            }
        }
        throw new AssertionError("the line awaited did not come within " + WAIT_SECONDS + " s: " + stderr);
    }

    /** Waits until a file exists (something the tool started writes it); fails if the tool ends first. */
    void awaitFile(Path file) throws IOException, InterruptedException {
        try (WatchService watch = FileSystems.getDefault().newWatchService()) {
            file.getParent().register(watch, StandardWatchEventKinds.ENTRY_CREATE);
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
            while (!Files.exists(file)) {
                if (!process.isAlive()) {
                    throw new AssertionError("the tool ended (exit " + process.exitValue() + ") before " + file + " appeared: " + stderr);
                }
                if (System.nanoTime() > deadline) {
                    throw new AssertionError(file + " did not appear within " + WAIT_SECONDS + " s: " + stderr);
                }
                var key = watch.poll(1, TimeUnit.SECONDS);
                if (key != null) {
                    key.pollEvents();
                    key.reset();
                }
            }
        }
    }

    /** Waits for the tool to end and for the rest of its standard error; its exit code. */
    int awaitEnd() throws InterruptedException {
        if (!process.waitFor(WAIT_SECONDS, TimeUnit.SECONDS)) {
            throw new AssertionError("the tool did not end within " + WAIT_SECONDS + " s: " + stderr);
        }
        reader.join(TimeUnit.SECONDS.toMillis(WAIT_SECONDS));
        lines.drainTo(stderr);
        return process.exitValue();
    }

    /** The lines of standard error read so far. */
    List<String> stderr() {
        return List.copyOf(stderr);
    }

    @Override
    public void close() {
        if (process.isAlive()) {
            ExternalCommand.killWithChildren(process.toHandle());
        }
    }

    private void readLines() {
        try (BufferedReader err = new BufferedReader(new InputStreamReader(process.getErrorStream(), StandardCharsets.UTF_8))) {
            for (String line = err.readLine(); line != null; line = err.readLine()) {
                lines.add(line);
            }
        } catch (IOException ended) {
            // the stream closes with the process
        }
    }
}
