package dev.changeling.source;

import java.util.Arrays;

/**
 * Converts between offsets and 1-based line/column positions, counting lines the way JavaParser
 * does ({@code \n}, {@code \r\n} and a lone {@code \r} each end a line) and columns in UTF-16 units.
 */
public final class LineMap {

    private final int[] lineStarts;
    private final int length;

    public LineMap(String text) {
        int[] starts = new int[16];
        int count = 0;
        starts[count++] = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            boolean lineEnd = c == '\n' || (c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n'));
            if (lineEnd) {
                if (count == starts.length) {
                    starts = Arrays.copyOf(starts, count * 2);
                }
                starts[count++] = i + 1;
            }
        }
        this.lineStarts = Arrays.copyOf(starts, count);
        this.length = text.length();
    }

    /** The offset of a 1-based line and column. */
    public int offset(int line, int column) {
        if (line < 1 || line > lineStarts.length) {
            throw new IllegalArgumentException("line " + line + " is outside 1.." + lineStarts.length);
        }
        return Math.min(lineStarts[line - 1] + column - 1, length);
    }

    /** The 1-based line holding an offset. */
    public int line(int offset) {
        int found = Arrays.binarySearch(lineStarts, offset);
        return found >= 0 ? found + 1 : -found - 1;
    }

    /** The 1-based column of an offset within its line. */
    public int column(int offset) {
        return offset - lineStarts[line(offset) - 1] + 1;
    }

    public int lineCount() {
        return lineStarts.length;
    }
}
