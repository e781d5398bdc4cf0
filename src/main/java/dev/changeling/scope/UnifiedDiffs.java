package dev.changeling.scope;

import com.github.difflib.patch.AbstractDelta;
import com.github.difflib.patch.Chunk;
import com.github.difflib.unifieddiff.UnifiedDiff;
import com.github.difflib.unifieddiff.UnifiedDiffFile;
import com.github.difflib.unifieddiff.UnifiedDiffParserException;
import com.github.difflib.unifieddiff.UnifiedDiffReader;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.logging.Level;
import java.util.logging.Logger;
import java.util.regex.Pattern;

/** Reads unified diffs (git's or {@code diff -u}'s) with java-diff-utils into {@link FileDiff}s. */
final class UnifiedDiffs {

    /** The reader logs every line it does not recognise; we report problems ourselves. Held so it is not collected. */
    private static final Logger READER_LOG = Logger.getLogger(UnifiedDiffReader.class.getName());

    private static final Pattern HUNK_HEADER = Pattern.compile("^@@ -\\d+(,\\d+)? \\+\\d+(,\\d+)? @@");
    private static final String NO_FILE = "/dev/null";

    static {
        READER_LOG.setLevel(Level.OFF);
    }

    private UnifiedDiffs() {
    }

    /** The problem with a diff the reader could not take, said so a person can act on it. */
    static final class Unreadable extends Exception {
        Unreadable(String message) {
            super(message);
        }
    }

    static List<FileDiff> parse(byte[] diff) throws Unreadable {
        byte[] prepared = emptyLinesAsContext(diff);
        UnifiedDiff parsed;
        try {
            parsed = UnifiedDiffReader.parseUnifiedDiff(new ByteArrayInputStream(prepared));
        } catch (UnifiedDiffParserException | IllegalStateException e) {
            throw new Unreadable(e.getMessage() == null ? "unrecognised layout" : e.getMessage());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<FileDiff> files = new ArrayList<>();
        int hunks = 0;
        for (UnifiedDiffFile file : parsed.getFiles()) {
            FileDiff converted = convert(file);
            hunks += converted.hunks().size();
            files.add(converted);
        }
        // The reader silently drops a last hunk that ends before its header's line counts are reached.
        int announced = countHunkHeaders(prepared);
        if (hunks < announced) {
            throw new Unreadable("a hunk ends before the line counts in its header say (is the file cut short?)");
        }
        return files;
    }

    private static FileDiff convert(UnifiedDiffFile file) {
        boolean renamed = file.getRenameTo() != null;
        String newName = renamed ? file.getRenameTo() : file.getToFile();
        boolean deleted = file.getDeletedFileMode() != null || newName == null || NO_FILE.equals(newName);
        List<FileDiff.Hunk> hunks = new ArrayList<>();
        int number = 0;
        for (AbstractDelta<String> delta : file.getPatch().getDeltas()) {
            Chunk<String> target = delta.getTarget();
            number++;
            hunks.add(new FileDiff.Hunk(number, target.getPosition() + 1, List.copyOf(target.getLines()),
                    List.copyOf(target.getChangePosition() == null ? List.of() : target.getChangePosition())));
        }
        return new FileDiff(deleted ? newName : GitPaths.fromDiff(newName, !renamed), deleted, hunks);
    }

    /**
     * Some tools and editors strip the single blank of an empty context line; the reader then stops.
     * An empty line anywhere else is header or trailer text, where a blank is just as harmless.
     */
    private static byte[] emptyLinesAsContext(byte[] diff) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(diff.length + 64);
        int lineStart = 0;
        for (int i = 0; i <= diff.length; i++) {
            if (i == diff.length || diff[i] == '\n') {
                int end = i > lineStart && diff[i - 1] == '\r' ? i - 1 : i;
                if (end == lineStart && i < diff.length) {
                    out.write(' ');
                }
                out.write(diff, lineStart, Math.min(i + 1, diff.length) - lineStart);
                lineStart = i + 1;
            }
        }
        return out.toByteArray();
    }

    private static int countHunkHeaders(byte[] diff) {
        int count = 0;
        for (String line : new String(diff, StandardCharsets.ISO_8859_1).split("\r?\n")) {
            if (HUNK_HEADER.matcher(line).find()) {
                count++;
            }
        }
        return count;
    }
}
