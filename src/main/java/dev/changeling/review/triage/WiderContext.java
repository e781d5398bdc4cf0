package dev.changeling.review.triage;

import dev.changeling.mutant.MutantDiff;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.source.LineMap;
import dev.changeling.terminal.DiffPrinter;
import dev.changeling.terminal.Style;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.OptionalInt;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The mutant's diff regenerated from the file as it is now, with more lines around the change. Where
 * the file changed since the run, the change is looked for where it was, then where the first changed
 * line has moved to; where it cannot be placed, the diff as it ran is shown and the reason said.
 */
final class WiderContext {

    static final int STEP = 10;

    private static final Pattern HUNK_START = Pattern.compile("^@@ -(\\d+)");

    private WiderContext() {
    }

    static String render(CurrentSources.Current file, MutantResult mutant, int contextLines, Style style) {
        if (file.state() == CurrentSources.State.GONE) {
            return style.yellow(file.path() + " is gone or unreadable since the run; the diff as it ran:") + "\n"
                    + DiffPrinter.render(mutant.diff(), style);
        }
        LineMap lines = new LineMap(file.text());
        OptionalInt shift = shift(file.text(), lines, mutant);
        if (shift.isEmpty()) {
            return style.yellow(file.path() + " changed since the run and the mutated code is no longer at line "
                    + mutant.first().line() + ", so it cannot be shown with more context; the diff as it ran:") + "\n"
                    + DiffPrinter.render(mutant.diff(), style);
        }
        String mutated = apply(file.text(), lines, mutant, shift.getAsInt());
        String diff = MutantDiff.unified(mutant.file(), file.text(), mutated, contextLines);
        return style.yellow(note(file, mutant, shift.getAsInt(), contextLines)) + "\n" + DiffPrinter.render(diff, style);
    }

    /** The line the mutated code starts at in the file as it is now; empty when the file is gone or the code not found. */
    static OptionalInt lineNow(CurrentSources.Current file, MutantResult mutant) {
        if (file.text() == null) {
            return OptionalInt.empty();
        }
        OptionalInt shift = shift(file.text(), new LineMap(file.text()), mutant);
        return shift.isPresent() ? OptionalInt.of(mutant.first().line() + shift.getAsInt()) : OptionalInt.empty();
    }

    /** How many lines the mutated code moved since the run: 0 where it was, empty when it cannot be placed. */
    private static OptionalInt shift(String text, LineMap lines, MutantResult mutant) {
        return placed(text, lines, mutant, 0) ? OptionalInt.of(0) : movedBy(text, lines, mutant);
    }

    private static String note(CurrentSources.Current file, MutantResult mutant, int shift, int contextLines) {
        String wide = contextLines + " lines of context from " + file.path() + " as it is now";
        return switch (file.state()) {
            case UNCHANGED -> wide + " (unchanged since the run):";
            case UNKNOWN -> wide + " (the run kept no hash of it, so it may differ from what ran):";
            default -> shift == 0
                    ? wide + " — it changed since the run, but the mutated code is still at line " + mutant.first().line() + ":"
                    : wide + " — it changed since the run; the mutated code moved from line " + mutant.first().line()
                            + " to " + (mutant.first().line() + shift) + ":";
        };
    }

    /** Whether every point's original text sits at its recorded position moved by {@code shift} lines. */
    private static boolean placed(String text, LineMap lines, MutantResult mutant, int shift) {
        for (PointRecord point : mutant.points()) {
            int line = point.line() + shift;
            if (line < 1 || line > lines.lineCount() || point.original() == null) {
                return false;
            }
            int offset = lines.offset(line, point.column());
            if (!text.startsWith(point.original(), offset)) {
                return false;
            }
        }
        return true;
    }

    /** The shift of lines that puts the diff's first removed line at its one place in the file now, if it fits. */
    private static OptionalInt movedBy(String text, LineMap lines, MutantResult mutant) {
        String[] diff = mutant.diff() == null ? new String[0] : mutant.diff().split("\n", -1);
        int line = -1;
        String removed = null;
        for (String row : diff) {
            Matcher hunk = HUNK_START.matcher(row);
            if (hunk.find()) {
                line = Integer.parseInt(hunk.group(1));
            } else if (line > 0 && row.startsWith(" ")) {
                line++;
            } else if (line > 0 && row.startsWith("-")) {
                removed = strip(row.substring(1));
                break;
            }
        }
        if (removed == null) {
            return OptionalInt.empty();
        }
        List<Integer> found = new ArrayList<>();
        String[] now = text.split("\r\n|\r|\n", -1);
        for (int i = 0; i < now.length; i++) {
            if (now[i].equals(removed)) {
                found.add(i + 1);
            }
        }
        if (found.size() != 1) {
            return OptionalInt.empty();
        }
        int shift = found.get(0) - line;
        return placed(text, lines, mutant, shift) ? OptionalInt.of(shift) : OptionalInt.empty();
    }

    private static String apply(String text, LineMap lines, MutantResult mutant, int shift) {
        StringBuilder out = new StringBuilder(text);
        List<PointRecord> lastFirst = mutant.points().stream()
                .sorted(Comparator.comparingInt((PointRecord point) -> point.line()).thenComparingInt(PointRecord::column).reversed())
                .toList();
        for (PointRecord point : lastFirst) {
            int offset = lines.offset(point.line() + shift, point.column());
            out.replace(offset, offset + point.original().length(), point.replacement());
        }
        return out.toString();
    }

    private static String strip(String line) {
        return line.endsWith("\r") ? line.substring(0, line.length() - 1) : line;
    }
}
