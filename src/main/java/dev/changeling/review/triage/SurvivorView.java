package dev.changeling.review.triage;

import dev.changeling.review.TestNames;
import dev.changeling.analysis.WhySurvived;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.review.SameClasses;
import dev.changeling.terminal.DiffPrinter;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.util.List;
import java.util.Optional;
import java.util.stream.Collectors;

/** Shows one survivor: where and what the change is, its diff, and the tests that ran past it unaware. */
final class SurvivorView {

    private final PrintWriter out;
    private final Style style;
    private final TestNames names;
    private final SameClasses sameClasses;

    SurvivorView(PrintWriter out, Style style, TestNames names, SameClasses sameClasses) {
        this.out = out;
        this.style = style;
        this.names = names;
        this.sameClasses = sameClasses;
    }

    void show(MutantResult mutant, int position, int size, CurrentSources.State fileState, Optional<Decision> decision) {
        PointRecord first = mutant.first();
        out.println();
        out.println(style.bold("survivor " + position + " of " + size + " · " + mutant.shortId() + " · "
                + mutant.file() + ":" + first.line()) + " · " + operators(mutant) + " · " + order(mutant.order()));
        for (PointRecord point : mutant.points()) {
            out.println("  " + (mutant.order() > 1 ? "line " + point.line() + ": " : "") + point.description()
                    + " in " + point.type() + "#" + point.member());
        }
        if (fileState == CurrentSources.State.CHANGED) {
            out.println(style.yellow("  " + mutant.file() + " has changed since the run: the diff shows the code as it ran;"
                    + " f runs it again against the code as it is now"));
        } else if (fileState == CurrentSources.State.GONE) {
            out.println(style.yellow("  " + mutant.file() + " is gone since the run"));
        }
        out.print(DiffPrinter.render(mutant.diff() == null ? "" : mutant.diff(), style));
        showTests(mutant.reachedBy());
        WhySurvived.of(mutant).ifPresent(why -> out.println("why it survived: " + why.sentence(names::of)));
        sameClasses.proposedReason(mutant).ifPresent(reason -> out.println(style.cyan("proposed equivalent: it " + reason
                + "; e alone lists it with that reason")));
        List<MutantResult> duplicates = sameClasses.duplicatesOf(mutant);
        if (!duplicates.isEmpty()) {
            out.println(style.cyan("stands for " + duplicates.size() + " more with the very same classes ("
                    + duplicates.stream().map(MutantResult::shortId).collect(Collectors.joining(", "))
                    + "): a decision here is theirs too"));
        }
        decision.ifPresent(made -> out.println(style.cyan("decided so far: " + made.shown())));
    }

    private void showTests(List<String> reachedBy) {
        if (reachedBy == null || reachedBy.isEmpty()) {
            out.println("the run names no test that reaches this code");
            return;
        }
        out.println((reachedBy.size() == 1 ? "1 test reaches" : reachedBy.size() + " tests reach")
                + " this code and passed with the change — the place to write the missing assertion:");
        reachedBy.forEach(id -> out.println("  " + names.of(id)));
    }

    /** The mutant's operators, joined by {@code +} for a higher-order mutant made by several. */
    static String operators(MutantResult mutant) {
        return mutant.points().stream().map(PointRecord::operator).distinct().collect(Collectors.joining("+"));
    }

    static String order(int order) {
        return order == 1 ? "first-order" : "order " + order;
    }
}
