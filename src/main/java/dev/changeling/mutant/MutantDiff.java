package dev.changeling.mutant;

import com.github.difflib.DiffUtils;
import com.github.difflib.patch.AbstractDelta;
import com.github.difflib.patch.Patch;
import java.util.ArrayList;
import java.util.List;

/**
 * A mutant as a unified diff ({@code diff -u} / {@code git diff} format) with {@code a/} and {@code b/}
 * paths, that {@code git apply} accepts: line endings are kept as they are in the file, and a last
 * line without a newline gets the {@code \ No newline at end of file} marker.
 */
public final class MutantDiff {

    public static final int CONTEXT = 3;
    private static final String NO_NEWLINE = "\\ No newline at end of file";

    private MutantDiff() {
    }

    public static String unified(Mutant mutant, String originalText) {
        return unified(mutant.file(), originalText, mutant.apply(originalText), CONTEXT);
    }

    public static String unified(String path, String original, String revised, int context) {
        List<String> before = lines(original);
        List<String> after = lines(revised);
        Patch<String> patch = DiffUtils.diff(before, after);
        StringBuilder out = new StringBuilder();
        out.append("--- a/").append(path).append('\n');
        out.append("+++ b/").append(path).append('\n');
        for (List<AbstractDelta<String>> hunk : hunks(patch.getDeltas(), context)) {
            appendHunk(out, hunk, before, after, context);
        }
        return out.toString();
    }

    /** Deltas close enough that their context would touch print as one hunk. */
    private static List<List<AbstractDelta<String>>> hunks(List<AbstractDelta<String>> deltas, int context) {
        List<List<AbstractDelta<String>>> hunks = new ArrayList<>();
        for (AbstractDelta<String> delta : deltas) {
            List<AbstractDelta<String>> last = hunks.isEmpty() ? null : hunks.get(hunks.size() - 1);
            if (last != null) {
                AbstractDelta<String> previous = last.get(last.size() - 1);
                int gap = delta.getSource().getPosition() - (previous.getSource().getPosition() + previous.getSource().size());
                if (gap <= 2 * context) {
                    last.add(delta);
                    continue;
                }
            }
            List<AbstractDelta<String>> fresh = new ArrayList<>();
            fresh.add(delta);
            hunks.add(fresh);
        }
        return hunks;
    }

    private static void appendHunk(StringBuilder out, List<AbstractDelta<String>> hunk,
                                   List<String> before, List<String> after, int context) {
        AbstractDelta<String> first = hunk.get(0);
        AbstractDelta<String> last = hunk.get(hunk.size() - 1);
        int start = Math.max(0, first.getSource().getPosition() - context);
        int end = Math.min(before.size(), last.getSource().getPosition() + last.getSource().size() + context);
        int shift = first.getTarget().getPosition() - first.getSource().getPosition();
        int targetStart = start + shift;
        int targetEnd = end + (last.getTarget().getPosition() + last.getTarget().size())
                - (last.getSource().getPosition() + last.getSource().size());
        out.append("@@ -").append(range(start, end - start))
                .append(" +").append(range(targetStart, targetEnd - targetStart)).append(" @@\n");
        int at = start;
        for (AbstractDelta<String> delta : hunk) {
            for (; at < delta.getSource().getPosition(); at++) {
                appendLine(out, ' ', before, at);
            }
            for (int i = 0; i < delta.getSource().size(); i++) {
                appendLine(out, '-', before, delta.getSource().getPosition() + i);
            }
            for (int i = 0; i < delta.getTarget().size(); i++) {
                appendLine(out, '+', after, delta.getTarget().getPosition() + i);
            }
            at = delta.getSource().getPosition() + delta.getSource().size();
        }
        for (; at < end; at++) {
            appendLine(out, ' ', before, at);
        }
    }

    private static void appendLine(StringBuilder out, char mark, List<String> lines, int index) {
        String line = lines.get(index);
        boolean terminated = line.endsWith("\n");
        out.append(mark).append(line);
        if (!terminated) {
            out.append('\n').append(NO_NEWLINE).append('\n');
        }
    }

    private static String range(int start, int length) {
        int first = length == 0 ? start : start + 1;
        return length == 1 ? Integer.toString(first) : first + "," + length;
    }

    /** Lines with their terminators kept, so CRLF files round-trip through {@code git apply}. */
    static List<String> lines(String text) {
        List<String> lines = new ArrayList<>();
        int start = 0;
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                lines.add(text.substring(start, i + 1));
                start = i + 1;
            }
        }
        if (start < text.length()) {
            lines.add(text.substring(start));
        }
        return lines;
    }
}
