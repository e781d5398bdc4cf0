package dev.changeling.scope;

import dev.changeling.Text;
import dev.changeling.UserError;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.Charset;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Turns a unified diff file into a {@link ChangeScope}, after checking that it describes the files
 * on disk: every Java file it names exists and every new-side line it shows reads the same there.
 */
final class DiffFileChanges {

    private static final int SHOWN_TEXT = 60;

    private DiffFileChanges() {
    }

    static ChangeScope collect(Path projectRoot, Path diffFile) {
        if (!Files.isRegularFile(diffFile)) {
            throw new UserError(diffFile + ": no such diff file; give the path of a unified diff (the output of git diff or diff -u)");
        }
        List<FileDiff> diffs;
        try {
            diffs = UnifiedDiffs.parse(Files.readAllBytes(diffFile));
        } catch (IOException e) {
            throw new UserError(diffFile + ": cannot read (" + e.getMessage() + ")");
        } catch (UnifiedDiffs.Unreadable e) {
            throw new UserError(diffFile + ": not a unified diff that can be read (" + e.getMessage()
                    + "); give the output of git diff or diff -u");
        }
        if (diffs.isEmpty()) {
            throw new UserError(diffFile + ": no file changes found; give a unified diff (the output of git diff or diff -u)");
        }
        List<Path> bases = bases(projectRoot);
        Map<String, ChangedLines> files = new HashMap<>();
        for (FileDiff diff : diffs) {
            if (diff.deleted() || !diff.path().endsWith(".java")) {
                continue;
            }
            Path file = locate(diff, bases, diffFile);
            checkApplies(diff, file, diffFile);
            if (!file.startsWith(projectRoot)) {
                continue;
            }
            ChangedLines lines = ChangedLines.some();
            diff.hunks().forEach(hunk -> hunk.addedLines().forEach(lines::add));
            if (!lines.isEmpty()) {
                files.put(Text.relative(projectRoot, file), lines);
            }
        }
        return new ChangeScope(projectRoot, "changes in " + diffFile, files);
    }

    /** The folders a diff's paths may be relative to: the repository root first, then the project. */
    private static List<Path> bases(Path projectRoot) {
        Set<Path> bases = new LinkedHashSet<>();
        for (Path at = projectRoot; at != null; at = at.getParent()) {
            if (Files.exists(at.resolve(".git"))) {
                bases.add(at);
                break;
            }
        }
        bases.add(projectRoot);
        return new ArrayList<>(bases);
    }

    private static Path locate(FileDiff diff, List<Path> bases, Path diffFile) {
        for (Path base : bases) {
            Path candidate = base.resolve(diff.path()).normalize();
            if (candidate.startsWith(base) && Files.isRegularFile(candidate)) {
                return candidate;
            }
        }
        throw new UserError(diffFile + ": names " + diff.path() + ", which does not exist in "
                + String.join(" or ", bases.stream().map(Path::toString).toList())
                + "; make the diff from the repository root against the files checked out here");
    }

    private static void checkApplies(FileDiff diff, Path file, Path diffFile) {
        List<String> lines = readLines(file, diffFile);
        for (FileDiff.Hunk hunk : diff.hunks()) {
            for (int i = 0; i < hunk.lines().size(); i++) {
                int number = hunk.firstLine() + i;
                String where = diffFile + ": hunk " + hunk.number() + " (" + hunk.newSide() + ") of " + diff.path();
                if (number > lines.size()) {
                    throw new UserError(where + " reaches line " + number + " but the file has " + lines.size()
                            + " lines; the diff was made for other versions of the files");
                }
                String onDisk = lines.get(number - 1);
                String inDiff = hunk.lines().get(i);
                if (!onDisk.equals(inDiff)) {
                    String difference = onDisk.strip().equals(inDiff.strip())
                            ? "differs in white space only"
                            : "reads '" + shown(onDisk) + "' but the diff has '" + shown(inDiff) + "'";
                    throw new UserError(where + " does not match the file: line " + number + " " + difference
                            + "; make the diff against the files checked out here");
                }
            }
        }
    }

    /**
     * The file's lines decoded as the diff reader decodes the diff (the platform charset), so that
     * the same bytes compare equal even where that charset cannot show them.
     */
    private static List<String> readLines(Path file, Path diffFile) {
        try {
            String text = new String(Files.readAllBytes(file), Charset.defaultCharset());
            return new BufferedReader(new StringReader(text)).lines().toList();
        } catch (IOException e) {
            throw new UserError(file + ": cannot read (" + e.getMessage() + "), named in " + diffFile);
        }
    }

    private static String shown(String line) {
        String trimmed = line.strip();
        return trimmed.length() <= SHOWN_TEXT ? trimmed : trimmed.substring(0, SHOWN_TEXT) + "…";
    }
}
