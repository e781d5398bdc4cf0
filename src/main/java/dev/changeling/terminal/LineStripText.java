package dev.changeling.terminal;

import dev.changeling.review.LineMarks;
import dev.changeling.review.LineMarks.Mark;
import java.util.ArrayList;
import java.util.List;

/**
 * A file's mutants against its line numbers in one line of text: each character stands for a stretch of lines and
 * shows its most pressing mark ({@code #} a survivor to look at, {@code o} unreached, {@code :} detected, {@code .}
 * no mutant), coloured when the style colours.
 */
public final class LineStripText {

    /** The widest strip, in characters; a shorter file gets one character per line. */
    public static final int WIDTH = 60;

    /** The key to the characters, for a line above the strips. */
    public static final String KEY = "# survivor to look at  o unreached  : detected  . no mutant";

    private final Style style;

    public LineStripText(Style style) {
        this.style = style;
    }

    /** Two lines per file: its path, then the strip between its first and last line numbers and where the survivors are. */
    public List<String> render(LineMarks file) {
        int columns = Math.min(WIDTH, file.lastLine());
        StringBuilder strip = new StringBuilder();
        for (int column = 0; column < columns; column++) {
            int from = 1 + (int) ((long) column * file.lastLine() / columns);
            int to = (int) ((long) (column + 1) * file.lastLine() / columns);
            strip.append(paint(file.worstBetween(from, Math.max(from, to))));
        }
        List<String> lines = new ArrayList<>();
        lines.add("  " + file.file());
        lines.add("    1 " + strip + " " + file.lastLine() + "   " + file.inWords());
        return lines;
    }

    private String paint(Mark mark) {
        if (mark == null) {
            return style.dim(".");
        }
        return switch (mark) {
            case SURVIVED -> style.red("#");
            case UNREACHED -> style.yellow("o");
            case DETECTED -> style.green(":");
        };
    }
}
