package dev.changeling.review.export;

import dev.changeling.analysis.WhySurvived;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.review.SameClasses;
import dev.changeling.review.Standing;
import dev.changeling.review.TestNames;
import dev.changeling.review.Survivors;
import java.util.List;
import java.util.stream.Collectors;

/**
 * A review comment in CommonMark: the one-line summary and the line coverage under it, then every unresolved survivor with its
 * place, operator, short id, what changed, and its diff in a fenced block.
 */
public final class MarkdownReport {

    private MarkdownReport() {
    }

    /** The comment for a run as it stands: summary, line coverage, the files not read, then every survivor to look at. */
    public static String render(Standing standing) {
        return render(standing, ALL);
    }

    /** Every survivor, however many. */
    public static final int ALL = 0;

    /**
     * The comment, listing at most {@code limit} survivors (all for {@link #ALL}), worst first: those the most tests
     * run and still miss; a count of the rest ends the list.
     */
    public static String render(Standing standing, int limit) {
        SameClasses sameClasses = SameClasses.of(standing.results());
        TestNames names = new TestNames(standing.results().tests());
        List<MutantResult> survivors = standing.toLookAt().stream().filter(survivor -> !sameClasses.isDuplicate(survivor))
                .sorted(Survivors.WORST_FIRST).toList();
        int shown = limit == ALL ? survivors.size() : Math.min(limit, survivors.size());
        StringBuilder out = new StringBuilder();
        out.append("**Changeling:** ")
                .append(MarkdownText.text(Summary.line(standing)))
                .append("\n\n")
                .append(MarkdownText.text(Summary.coverage(standing)))
                .append("\n\n");
        List<String> modules = Summary.modules(standing);
        if (!modules.isEmpty()) {
            modules.forEach(module -> out.append("- ").append(MarkdownText.text(module)).append('\n'));
            out.append('\n');
        }
        if (!standing.unreadFiles().isEmpty()) {
            out.append("**").append(MarkdownText.text(standing.unreadSummary())).append(":**\n\n");
            standing.unreadFiles().forEach(problem -> out.append("- ").append(MarkdownText.text(problem)).append('\n'));
            out.append('\n');
        }
        if (survivors.isEmpty()) {
            out.append("No survivors to look at: the tests detect every mutant still in question.\n");
            return out.toString();
        }
        out.append("#### ").append(survivors.size()).append(survivors.size() == 1 ? " survivor" : " survivors")
                .append(" to look at\n\n");
        out.append("The tests still pass with each of these changes; a test that fails for one would show the code is checked."
                + " Those that the most tests run and still miss come first.\n");
        for (MutantResult survivor : survivors.subList(0, shown)) {
            out.append('\n').append(heading(survivor)).append("\n\n");
            out.append(alike(survivor, sameClasses));
            WhySurvived.of(survivor).ifPresent(why -> out.append("Why it survived: ")
                    .append(MarkdownText.text(why.sentence(names::of))).append(".\n\n"));
            if (survivor.diff() == null || survivor.diff().isEmpty()) {
                out.append("(no diff stored for this mutant)\n");
            } else {
                out.append(MarkdownText.fenced("diff", survivor.diff()));
            }
        }
        if (shown < survivors.size()) {
            int rest = survivors.size() - shown;
            out.append('\n').append("…and ").append(rest).append(rest == 1 ? " more survivor" : " more survivors")
                    .append(", fewer tests reaching each; the SARIF log and the patches list them all.\n");
        }
        return out.toString();
    }

    /** What compiling it on its own found, as lines before its diff; empty when nothing. */
    private static String alike(MutantResult survivor, SameClasses sameClasses) {
        StringBuilder lines = new StringBuilder();
        sameClasses.proposedReason(survivor).ifPresent(reason ->
                lines.append("Proposed equivalent: it ").append(MarkdownText.text(reason)).append(".\n\n"));
        List<MutantResult> duplicates = sameClasses.duplicatesOf(survivor);
        if (!duplicates.isEmpty()) {
            lines.append("Also stands for ").append(duplicates.size()).append(duplicates.size() == 1 ? " survivor" : " survivors")
                    .append(" with the very same classes: ")
                    .append(duplicates.stream().map(duplicate -> MarkdownText.code(duplicate.shortId())).collect(Collectors.joining(", ")))
                    .append(".\n\n");
        }
        return lines.toString();
    }

    /** One line: file:line, operator, short id, and what each point changed where. */
    static String heading(MutantResult survivor) {
        PointRecord first = survivor.first();
        String what = survivor.points().stream()
                .map(point -> MarkdownText.text(point.description()) + " in " + MarkdownText.code(point.member()))
                .collect(Collectors.joining("; "));
        return "**" + MarkdownText.code(survivor.file() + ":" + first.line()) + "**"
                + " · " + MarkdownText.text(first.operator())
                + (survivor.order() > 1 ? " · order " + survivor.order() : "")
                + " · " + MarkdownText.code(survivor.shortId())
                + " · " + what;
    }
}
