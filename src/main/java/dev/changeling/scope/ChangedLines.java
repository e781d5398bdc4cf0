package dev.changeling.scope;

import java.util.BitSet;

/** The added or changed lines of one file in its new version: some lines, or the whole file when it is new. */
final class ChangedLines {

    private final boolean wholeFile;
    private final BitSet lines = new BitSet();

    private ChangedLines(boolean wholeFile) {
        this.wholeFile = wholeFile;
    }

    static ChangedLines some() {
        return new ChangedLines(false);
    }

    static ChangedLines wholeFile() {
        return new ChangedLines(true);
    }

    void add(int line) {
        lines.set(line);
    }

    /** Whether any line from {@code first} to {@code last} (1-based, inclusive) was added or changed. */
    boolean anyBetween(int first, int last) {
        if (wholeFile) {
            return true;
        }
        int next = lines.nextSetBit(first);
        return next >= 0 && next <= last;
    }

    boolean isEmpty() {
        return !wholeFile && lines.isEmpty();
    }

    boolean isWholeFile() {
        return wholeFile;
    }

    int count() {
        return lines.cardinality();
    }
}
