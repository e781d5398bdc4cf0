package dev.changeling.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * A private tmux server for driving a program in a real pseudo-terminal: its own socket file (in a
 * folder the test owns, so nothing is left behind), no user configuration, a fixed window size;
 * killed by {@link #close()}.
 */
final class Tmux implements AutoCloseable {

    static final Path EXECUTABLE = Path.of("/usr/bin/tmux");
    private static final int POLLS = 1200;
    private static final long POLL_PAUSE_MILLIS = 50;

    private final Path socket;

    Tmux(Path socket) {
        this.socket = socket;
    }

    static boolean installed() {
        return Files.isExecutable(EXECUTABLE);
    }

    /** Starts a session of 120 by 40 running a shell script. */
    void start(String session, Path script) {
        run("new-session", "-d", "-x", "120", "-y", "40", "-s", session, "sh " + script);
    }

    /** Types a line and presses Enter. */
    void typeLine(String session, String text) {
        if (!text.isEmpty()) {
            run("send-keys", "-t", session, "-l", text);
        }
        run("send-keys", "-t", session, "Enter");
    }

    /** Presses a key by tmux's name for it, such as {@code C-c}. */
    void press(String session, String key) {
        run("send-keys", "-t", session, key);
    }

    /** Everything the pane has shown, wrapped lines joined. */
    String screen(String session) {
        return run("capture-pane", "-p", "-J", "-S", "-", "-t", session);
    }

    /** Polls the pane until the text shows, a bounded number of times; fails with the screen otherwise. */
    String awaitText(String session, String text) {
        String screen = "";
        for (int poll = 0; poll < POLLS; poll++) {
            screen = screen(session);
            if (screen.contains(text)) {
                return screen;
            }
            try {
                Thread.sleep(POLL_PAUSE_MILLIS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError("interrupted while waiting for '" + text + "'", e);
            }
        }
        throw new AssertionError("'" + text + "' did not show in the terminal; it shows:\n" + screen);
    }

    @Override
    public void close() {
        tryRun("kill-server");
    }

    private String run(String... arguments) {
        Result result = tryRun(arguments);
        if (result.exitCode != 0) {
            throw new AssertionError("tmux " + String.join(" ", arguments) + " failed: " + result.output);
        }
        return result.output;
    }

    private record Result(int exitCode, String output) {
    }

    private Result tryRun(String... arguments) {
        List<String> command = new ArrayList<>(List.of(EXECUTABLE.toString(), "-S", socket.toString(), "-f", "/dev/null"));
        command.addAll(List.of(arguments));
        try {
            Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
            String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!process.waitFor(30, TimeUnit.SECONDS)) {
                process.destroyForcibly();
                throw new AssertionError("tmux " + String.join(" ", arguments) + " did not finish");
            }
            return new Result(process.exitValue(), output);
        } catch (IOException e) {
            throw new AssertionError("cannot run tmux: " + e.getMessage(), e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
    }
}
