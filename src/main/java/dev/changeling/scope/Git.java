package dev.changeling.scope;

import dev.changeling.UserError;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;

/** Runs the real {@code git} in a project folder and reads what it prints; nothing it runs writes to the repository. */
final class Git {

    /** What one git command gave back. */
    record Outcome(int exitCode, byte[] out, String err) {
        boolean ok() {
            return exitCode == 0;
        }

        String text() {
            return new String(out, StandardCharsets.UTF_8).strip();
        }

        String firstErrorLine() {
            String first = err.strip().lines().findFirst().orElse("");
            return first.isEmpty() ? "exit code " + exitCode : first;
        }
    }

    /** A pathspec: git's wildcards cross folder boundaries, so this is every Java file below the folder. */
    private static final String JAVA_FILES = "*.java";

    private final Path folder;

    private Git(Path folder) {
        this.folder = folder;
    }

    /** The repository holding a project folder; a folder outside any repository is a user mistake. */
    static Git at(Path projectRoot) {
        Git git = new Git(projectRoot);
        Outcome inside = git.run("rev-parse", "--is-inside-work-tree");
        if (!inside.ok() || !inside.text().equals("true")) {
            throw new UserError(projectRoot + ": not inside a git working tree (git: " + inside.firstErrorLine()
                    + "); run in a git checkout, or give the change as a unified diff file");
        }
        return git;
    }

    /** The full id of the commit a revision names. */
    String commitOf(String revision) {
        if (revision.isBlank() || revision.startsWith("-")) {
            throw new UserError("'" + revision + "' is not a revision; give a branch, tag or commit such as origin/main");
        }
        Outcome resolved = run("rev-parse", "--verify", "--quiet", revision + "^{commit}");
        if (!resolved.ok()) {
            throw new UserError("unknown revision '" + revision + "' in the git repository at " + folder
                    + "; check the name (git branch -a, git log), or fetch it first (git fetch)");
        }
        return resolved.text();
    }

    Optional<String> head() {
        Outcome head = run("rev-parse", "--verify", "--quiet", "HEAD^{commit}");
        return head.ok() ? Optional.of(head.text()) : Optional.empty();
    }

    /** Where the branch left the revision: the base a review compares with. */
    Optional<String> mergeBase(String commit, String other) {
        Outcome base = run("merge-base", commit, other);
        return base.ok() ? Optional.of(base.text()) : Optional.empty();
    }

    /** The tree with no files, to compare with before the first commit (its id depends on the hash the repository uses). */
    String emptyTree() {
        return check(run("hash-object", "-t", "tree", "--stdin"), "hash-object").text();
    }

    /**
     * The working tree against a commit or tree: only changed lines (no context), renames found,
     * Java files only, paths relative to the project folder and limited to it, whatever the user's git settings.
     */
    byte[] diffAgainst(String base) {
        return check(run("-c", "core.quotePath=true", "diff", "--no-color", "--no-ext-diff", "--no-textconv",
                "--unified=0", "--find-renames", "--relative", "--src-prefix=a/", "--dst-prefix=b/",
                base, "--", JAVA_FILES), "diff").out();
    }

    /** New Java files git does not track and does not ignore, relative to the project folder. */
    List<String> untracked() {
        byte[] out = check(run("ls-files", "--others", "--exclude-standard", "-z", "--", JAVA_FILES), "ls-files").out();
        List<String> paths = new ArrayList<>();
        for (String path : new String(out, StandardCharsets.UTF_8).split("\0")) {
            if (!path.isEmpty()) {
                paths.add(path);
            }
        }
        return paths;
    }

    private Outcome check(Outcome outcome, String what) {
        if (!outcome.ok()) {
            throw new UserError("git " + what + " failed in " + folder + " (" + outcome.firstErrorLine()
                    + "); run it by hand to see why");
        }
        return outcome;
    }

    private Outcome run(String... arguments) {
        List<String> command = new ArrayList<>();
        command.add("git");
        command.addAll(List.of(arguments));
        ProcessBuilder builder = new ProcessBuilder(command).directory(folder.toFile());
        // Reading must not rewrite the index (git refreshes it on diff unless told not to).
        builder.environment().put("GIT_OPTIONAL_LOCKS", "0");
        builder.environment().put("GIT_PAGER", "cat");
        Process process;
        try {
            process = builder.start();
        } catch (IOException e) {
            throw new UserError("cannot run git (" + e.getMessage() + "); install git or put it on the PATH");
        }
        try {
            process.getOutputStream().close();
            CompletableFuture<byte[]> err = CompletableFuture.supplyAsync(() -> readAll(process.getErrorStream()));
            byte[] out = readAll(process.getInputStream());
            int exit = process.waitFor();
            return new Outcome(exit, out, new String(err.join(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            process.destroy();
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while git was running", e);
        }
    }

    private static byte[] readAll(InputStream in) {
        try (in) {
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
