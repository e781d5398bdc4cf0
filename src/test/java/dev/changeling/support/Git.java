package dev.changeling.support;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs the real git in a folder for tests; a failing command fails the test with git's own words. */
public final class Git {

    private final Path folder;

    private Git(Path folder) {
        this.folder = folder;
    }

    /** A fresh repository with one commit of everything in the folder. */
    public static Git initCommitted(Path folder) {
        Git git = new Git(folder);
        git.run("init", "-q");
        git.run("add", "-A");
        git.commit("initial");
        return git;
    }

    public static Git in(Path folder) {
        return new Git(folder);
    }

    public void commit(String message) {
        run("-c", "user.name=Test", "-c", "user.email=test@example.invalid", "-c", "commit.gpgsign=false",
                "commit", "-q", "--allow-empty", "-m", message);
    }

    /** Runs git and returns its standard output; throws with its error output when it fails. */
    public String run(String... arguments) {
        Result result = tryRun(arguments);
        if (result.exitCode() != 0) {
            throw new AssertionError("git " + String.join(" ", arguments) + " failed: " + result.output());
        }
        return result.output();
    }

    /** The exit code and combined output of a git command, without judging it. */
    public record Result(int exitCode, String output) {
    }

    public Result tryRun(String... arguments) {
        List<String> command = new ArrayList<>();
        command.add("git");
        command.addAll(List.of(arguments));
        try {
            Process process = new ProcessBuilder(command).directory(folder.toFile()).redirectErrorStream(true).start();
            String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!process.waitFor(60, TimeUnit.SECONDS)) {
                process.destroyForcibly();
                throw new AssertionError("git " + String.join(" ", arguments) + " did not finish");
            }
            return new Result(process.exitValue(), output);
        } catch (IOException e) {
            throw new AssertionError("cannot run git: " + e.getMessage(), e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
    }
}
