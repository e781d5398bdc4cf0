package dev.changeling.scope;

import dev.changeling.UserError;
import dev.changeling.mutant.Point;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Predicate;

/**
 * The lines a change adds or alters, by project-relative path: mutation points outside them are
 * left out of a review run. Made from a git revision, the uncommitted work, or a unified diff file.
 */
public final class ChangeScope {

    private final Path projectRoot;
    private final String description;
    private final Map<String, ChangedLines> files;

    ChangeScope(Path projectRoot, String description, Map<String, ChangedLines> files) {
        this.projectRoot = projectRoot;
        this.description = description;
        this.files = Collections.unmodifiableMap(new TreeMap<>(files));
    }

    /**
     * The working tree against where it left {@code revision} (their merge base with HEAD, which is
     * the revision itself when it is an ancestor), plus new files git does not track yet.
     */
    public static ChangeScope sinceRevision(Path projectRoot, String revision) {
        Path root = checkedRoot(projectRoot);
        Git git = Git.at(root);
        String commit = git.commitOf(revision);
        String base = git.head().flatMap(head -> git.mergeBase(commit, head)).orElse(commit);
        return GitChanges.collect(root, git, base, "changes since " + revision);
    }

    /** Staged, unstaged and untracked work against HEAD (against nothing before the first commit). */
    public static ChangeScope uncommitted(Path projectRoot) {
        Path root = checkedRoot(projectRoot);
        Git git = Git.at(root);
        String base = git.head().orElseGet(git::emptyTree);
        return GitChanges.collect(root, git, base, "uncommitted changes");
    }

    /**
     * The new side of a unified diff that a review system or a person hands over. Its paths are
     * read against the repository root when the project is in one, else against the project; the
     * diff must describe the files as they are on disk now.
     */
    public static ChangeScope fromDiffFile(Path projectRoot, Path diffFile) {
        Path root = checkedRoot(projectRoot);
        return DiffFileChanges.collect(root, diffFile);
    }

    /** One line for the results file and the summary, e.g. "changes since origin/main". */
    public String description() {
        return description;
    }

    /** The project-relative paths with added or changed lines. */
    public Set<String> files() {
        return files.keySet();
    }

    public boolean isEmpty() {
        return files.isEmpty();
    }

    /** Whether a line of the point's edit is an added or changed line. */
    public boolean covers(Point point, SourceFile file) {
        ChangedLines changed = files.get(point.file());
        if (changed == null) {
            return false;
        }
        int first = file.lines().line(point.edit().begin());
        int last = file.lines().line(Math.max(point.edit().begin(), point.edit().end() - 1));
        return changed.anyBetween(first, last);
    }

    /** Keeps the points on changed lines, given the files the points were found in. */
    public Predicate<Point> filter(Map<String, SourceFile> sources) {
        Predicate<Point> fromDisk = filter();
        return point -> {
            SourceFile source = sources.get(point.file());
            return source == null ? fromDisk.test(point) : covers(point, source);
        };
    }

    /** Keeps the points on changed lines, reading a changed file from the project when a point of it is first asked about. */
    public Predicate<Point> filter() {
        Map<String, SourceFile> read = new ConcurrentHashMap<>();
        return point -> files.containsKey(point.file())
                && covers(point, read.computeIfAbsent(point.file(), this::readSource));
    }

    private SourceFile readSource(String path) {
        try {
            return JavaSources.read(projectRoot, projectRoot.resolve(path));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Path checkedRoot(Path projectRoot) {
        Path root = projectRoot.toAbsolutePath().normalize();
        if (!Files.isDirectory(root)) {
            throw new UserError(projectRoot + ": no such folder; give the project folder");
        }
        return root;
    }
}
