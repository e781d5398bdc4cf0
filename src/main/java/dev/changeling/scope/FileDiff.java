package dev.changeling.scope;

import java.util.List;

/**
 * One file of a unified diff, seen from its new side.
 *
 * @param path    the new path as the diff names it (prefix {@code b/} removed, quoting undone)
 * @param deleted whether the change removes the file
 * @param hunks   its hunks, in the order of the diff
 */
record FileDiff(String path, boolean deleted, List<Hunk> hunks) {

    /**
     * One hunk, new side only.
     *
     * @param number     1-based position of the hunk within its file
     * @param firstLine  the 1-based new-side line the hunk starts at
     * @param lines      the new-side lines (context and added), in order
     * @param addedLines the 1-based new-side numbers of the added lines
     */
    record Hunk(int number, int firstLine, List<String> lines, List<Integer> addedLines) {

        /** How the hunk header names its new side, e.g. {@code +12,3}. */
        String newSide() {
            return "+" + firstLine + "," + lines.size();
        }
    }
}
