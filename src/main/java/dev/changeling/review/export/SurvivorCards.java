package dev.changeling.review.export;

import dev.changeling.analysis.WhySurvived;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.review.SameClasses;
import dev.changeling.review.Standing;
import dev.changeling.review.TestNames;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;

/**
 * The HTML report's survivors, file by file in position order: what changed where, why it survived, the tests
 * that ran it and passed, what compiling it on its own found, and its unified diff with coloured lines.
 */
final class SurvivorCards {

    /** How many reaching tests a card names before counting the rest. */
    private static final int TESTS_NAMED = 8;

    private SurvivorCards() {
    }

    static String render(Standing standing, SameClasses sameClasses, TestNames names) {
        Map<String, List<MutantResult>> byFile = standing.toLookAt().stream()
                .filter(survivor -> !sameClasses.isDuplicate(survivor))
                .collect(Collectors.groupingBy(MutantResult::file, TreeMap::new, Collectors.toList()));
        StringBuilder out = new StringBuilder("<section id=\"survivors\">\n<h2>Survivors to look at</h2>\n");
        if (byFile.isEmpty()) {
            return out.append("<p>No survivors to look at: the tests detect every mutant still in question.</p>\n</section>\n")
                    .toString();
        }
        out.append("<p>The tests still pass with each of these changes; a test that fails for one would show the code is checked.</p>\n");
        byFile.forEach((file, survivors) -> {
            out.append(HtmlText.element("h3", file)).append('\n');
            survivors.forEach(survivor -> out.append(card(survivor, sameClasses, names)));
        });
        return out.append("</section>\n").toString();
    }

    private static String card(MutantResult survivor, SameClasses sameClasses, TestNames names) {
        PointRecord first = survivor.first();
        StringBuilder out = new StringBuilder("<article class=\"survivor\" id=\"m-").append(HtmlText.escape(survivor.shortId()))
                .append("\">\n<h4>").append(HtmlText.element("code", "line " + first.line())).append(" · ")
                .append(HtmlText.escape(first.operator())).append(survivor.order() > 1 ? " · order " + survivor.order() : "")
                .append(" · ").append(HtmlText.element("code", survivor.shortId())).append("</h4>\n");
        for (PointRecord point : survivor.points()) {
            out.append("<p>").append(HtmlText.escape(point.description())).append(" in ")
                    .append(HtmlText.element("code", point.member())).append("</p>\n");
        }
        WhySurvived.of(survivor).ifPresent(why -> out.append("<p class=\"why\">")
                .append(HtmlText.element("span", "why-kind", "why it survived")).append(' ')
                .append(HtmlText.escape(why.sentence(names::of))).append("</p>\n"));
        out.append(reaching(survivor, names));
        sameClasses.proposedReason(survivor).ifPresent(reason ->
                out.append(HtmlText.element("p", "note", "Proposed equivalent: it " + reason + ".")).append('\n'));
        List<MutantResult> duplicates = sameClasses.duplicatesOf(survivor);
        if (!duplicates.isEmpty()) {
            out.append(HtmlText.element("p", "note", "Also stands for " + duplicates.size()
                    + (duplicates.size() == 1 ? " survivor" : " survivors") + " with the very same classes: "
                    + duplicates.stream().map(MutantResult::shortId).collect(Collectors.joining(", ")) + ".")).append('\n');
        }
        return out.append(DiffHtml.render(survivor.diff())).append("</article>\n").toString();
    }

    /** The tests that run it, the first few named in alphabetical order: the baseline's order moves with the tests' times. */
    private static String reaching(MutantResult survivor, TestNames names) {
        List<String> tests = survivor.reachedBy() == null ? List.of() : survivor.reachedBy();
        if (tests.isEmpty()) {
            return "";
        }
        String named = tests.stream().map(names::of).sorted().limit(TESTS_NAMED).collect(Collectors.joining(", "));
        int rest = tests.size() - Math.min(TESTS_NAMED, tests.size());
        return HtmlText.element("p", "tests", (tests.size() == 1 ? "1 test runs it and passes: " : tests.size()
                + " tests run it and pass: ") + named + (rest > 0 ? " and " + rest + " more" : "")) + "\n";
    }
}
