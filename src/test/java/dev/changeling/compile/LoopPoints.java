package dev.changeling.compile;

import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;

/**
 * Loop-condition points made by hand. The operators never propose one that leaves a loop condition
 * constant or makes a constant one variable, but the build must still treat such a point rightly.
 */
final class LoopPoints {

    private LoopPoints() {
    }

    /** Replaces the whole of the first {@code condition} in the file by {@code replacement}. */
    static Point constant(SourceFile file, String condition, String replacement) {
        int begin = file.text().indexOf(condition);
        if (begin < 0) {
            throw new IllegalArgumentException("no '" + condition + "' in " + file.path());
        }
        Span host = new Span(begin, begin + condition.length());
        return new Point(file.path(), "Ladders", "by-hand", "by-hand", HostKind.EXPRESSION, host, host, replacement,
                condition.replace(" ", ""), "replaced the loop condition with " + replacement,
                file.lines().line(begin), false, "by-hand-" + condition + "-" + replacement);
    }
}
