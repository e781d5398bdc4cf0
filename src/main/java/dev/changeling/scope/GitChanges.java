package dev.changeling.scope;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Turns git's diff of the working tree, and its untracked files, into a {@link ChangeScope}. */
final class GitChanges {

    private GitChanges() {
    }

    static ChangeScope collect(Path projectRoot, Git git, String base, String description) {
        List<FileDiff> diffs;
        try {
            diffs = UnifiedDiffs.parse(git.diffAgainst(base));
        } catch (UnifiedDiffs.Unreadable e) {
            throw new IllegalStateException("git diff printed a diff the reader cannot take: " + e.getMessage(), e);
        }
        Map<String, ChangedLines> files = new HashMap<>();
        for (FileDiff diff : diffs) {
            if (diff.deleted() || !diff.path().endsWith(".java")) {
                continue;
            }
            ChangedLines lines = ChangedLines.some();
            diff.hunks().forEach(hunk -> hunk.addedLines().forEach(lines::add));
            if (!lines.isEmpty()) {
                files.put(diff.path(), lines);
            }
        }
        for (String path : git.untracked()) {
            if (path.endsWith(".java")) {
                files.put(path, ChangedLines.wholeFile());
            }
        }
        return new ChangeScope(projectRoot, description, files);
    }
}
