package dev.changeling.review.export;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.review.Standing;
import java.util.List;
import java.util.stream.Collectors;

/**
 * A review comment in CommonMark: the one-line summary, then every unresolved survivor with its
 * place, operator, short id, what changed, and its diff in a fenced block.
 */
public final class MarkdownReport {

    private MarkdownReport() {
    }

    /** The comment for a run as it stands: summary, the files not read, then every survivor to look at. */
    public static String render(Standing standing) {
        List<MutantResult> survivors = standing.toLookAt();
        StringBuilder out = new StringBuilder();
        out.append("**Changeling:** ")
                .append(MarkdownText.text(Summary.line(standing)))
                .append("\n\n");
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
        out.append("The tests still pass with each of these changes; a test that fails for one would show the code is checked.\n");
        for (MutantResult survivor : survivors) {
            out.append('\n').append(heading(survivor)).append("\n\n");
            if (survivor.diff() == null || survivor.diff().isEmpty()) {
                out.append("(no diff stored for this mutant)\n");
            } else {
                out.append(MarkdownText.fenced("diff", survivor.diff()));
            }
        }
        return out.toString();
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
