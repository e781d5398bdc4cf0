package dev.changeling.cli;

import dev.changeling.review.KillGrid;
import dev.changeling.review.LineMarks;
import dev.changeling.review.Standing;
import dev.changeling.review.TestNames;
import dev.changeling.terminal.KillShades;
import dev.changeling.terminal.LineStripText;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;

/** The terminal pictures of a run that {@code export --glance} prints: a line strip per file, then the shaded kill table. */
final class Glance {

    private Glance() {
    }

    static void print(PrintWriter out, Standing standing, Style style) {
        out.println(style.bold("where the survivors are") + " (" + LineStripText.KEY + "):");
        LineStripText strips = new LineStripText(style);
        LineMarks.of(standing).forEach(file -> strips.render(file).forEach(out::println));
        out.println(style.bold("which tests kill which operators") + " (mutants killed: ░ few … █ most):");
        new KillShades(style).render(KillGrid.of(standing.results(), KillShades.TOP_TESTS), new TestNames(standing.results().tests()))
                .forEach(out::println);
    }
}
