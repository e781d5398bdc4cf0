package dev.changeling.review.triage;

import dev.changeling.results.MutantResult;
import dev.changeling.terminal.Style;
import java.util.List;
import java.util.function.Function;

/** Every unresolved survivor on one line: its place in the walk, short id, file:line, operators and decision. */
final class SurvivorList {

    private static final String GAP = "  ";

    private SurvivorList() {
    }

    /**
     * The list, the survivor at {@code current} (0-based) marked with {@code >}.
     *
     * @param status the decision of a survivor as a word or two, empty when it has none
     */
    static String render(List<MutantResult> survivors, int current, Function<MutantResult, String> status, Style style) {
        int positionWidth = String.valueOf(survivors.size()).length();
        int placeWidth = survivors.stream().mapToInt(mutant -> place(mutant).length()).max().orElse(0);
        int operatorWidth = survivors.stream().mapToInt(mutant -> SurvivorView.operators(mutant).length()).max().orElse(0);
        StringBuilder list = new StringBuilder(survivors.size() + (survivors.size() == 1 ? " unresolved survivor" : " unresolved survivors")
                + " (> marks this one):\n");
        for (int index = 0; index < survivors.size(); index++) {
            MutantResult mutant = survivors.get(index);
            String row = (index == current ? "> " : "  ") + padLeft(String.valueOf(index + 1), positionWidth) + GAP
                    + mutant.shortId() + GAP + padRight(place(mutant), placeWidth) + GAP
                    + padRight(SurvivorView.operators(mutant), operatorWidth) + GAP + status.apply(mutant);
            list.append(index == current ? style.bold(row.stripTrailing()) : row.stripTrailing()).append('\n');
        }
        return list.toString();
    }

    private static String place(MutantResult mutant) {
        return mutant.file() + ":" + mutant.first().line();
    }

    private static String padRight(String text, int width) {
        return text + " ".repeat(width - text.length());
    }

    private static String padLeft(String text, int width) {
        return " ".repeat(width - text.length()) + text;
    }
}
