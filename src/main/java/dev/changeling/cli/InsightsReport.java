package dev.changeling.cli;

import dev.changeling.analysis.Coupling;
import dev.changeling.analysis.GreedyCover;
import dev.changeling.analysis.KillMatrix;
import dev.changeling.analysis.LineCoverage;
import dev.changeling.analysis.Score;
import dev.changeling.analysis.Subsumption;
import dev.changeling.analysis.Tally;
import dev.changeling.analysis.TestKills;
import dev.changeling.analysis.WeakTests;
import dev.changeling.analysis.WhySurvived;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.review.TestNames;
import dev.changeling.review.export.Summary;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * The insights of a run in plain text, section by section: line coverage beside the score, what each test kills, the
 * greedy subset, subsumption, weak tests and the coupling of higher-order mutants. Shares are rounded down.
 */
final class InsightsReport {

    /**
     * Offutt A.J. (1992), "Investigations of the software testing coupling effect", ACM TOSEM 1(1) (from memory): test
     * sets that killed all first-order mutants also killed over 99% of second-order and sampled third-order mutants.
     */
    static final String COUPLING_REFERENCE = "for reference: tests that killed every first-order mutant killed over 99%"
            + " of second- and third-order ones (Offutt 1992)";

    /** Every entry of every list. */
    static final int ALL = 0;

    private final Style style;
    private final int top;

    /** @param top how many entries each list shows at most; 0 for all */
    InsightsReport(Style style, int top) {
        this.style = style;
        this.top = top;
    }

    void print(PrintWriter out, RunResults results, Set<String> equivalent) {
        Score score = Score.of(results.mutants(), equivalent);
        KillMatrix matrix = KillMatrix.of(results, equivalent);
        out.println(style.bold("insights of " + count(results.mutants().size(), "mutant") + " and "
                + count(matrix.tests().size(), "test") + (results.complete() ? "" : " (partial run: it was interrupted)")));
        out.println(matrix.complete()
                ? "kill matrix: full (every reaching test ran against every mutant)"
                : "kill matrix: first failures only (the run stopped at each mutant's first failing test): kills per test"
                        + " are a lower bound, and tests may look redundant, idle or weak only for want of the rest");
        coverage(out, results, score, equivalent);
        whyUndetected(out, results, equivalent);
        tests(out, matrix);
        subset(out, matrix);
        subsumption(out, matrix, score.overall());
        weak(out, matrix);
        coupling(out, results, equivalent);
        out.flush();
    }

    private void coverage(PrintWriter out, RunResults results, Score score, Set<String> equivalent) {
        heading(out, "line coverage beside the score");
        Map<String, LineCoverage> byFile = LineCoverage.byFile(results.mutants(), equivalent);
        String total = results.settings() != null && results.settings().changeScope() != null
                ? "the change (" + results.settings().changeScope() + ")" : "all files";
        int width = Math.max(total.length(), byFile.keySet().stream().mapToInt(String::length).max().orElse(0));
        if (byFile.size() > 1) {
            byFile.forEach((file, lines) -> coverageRow(out, width, file, score.byFile().get(file), lines));
        }
        coverageRow(out, width, total, score.overall(), LineCoverage.of(results.mutants(), equivalent));
    }

    /** The undetected mutants by which of reach, infection and propagation failed, each with what it needs. */
    private void whyUndetected(PrintWriter out, RunResults results, Set<String> equivalent) {
        heading(out, "why the undetected went undetected (reach, infection, propagation)");
        TestNames names = new TestNames(results.tests());
        Map<WhySurvived.Kind, List<String>> byKind = new EnumMap<>(WhySurvived.Kind.class);
        results.mutants().stream().filter(mutant -> !Score.isEquivalent(mutant, equivalent))
                .forEach(mutant -> WhySurvived.of(mutant).ifPresent(why ->
                        byKind.computeIfAbsent(why.kind(), kind -> new ArrayList<>()).add("  " + mutant.shortId() + "  "
                                + mutant.file() + ":" + mutant.first().line() + "  " + mutant.first().operator() + "  "
                                + why.sentence(names::of))));
        byKind.forEach((kind, lines) -> {
            out.println("  " + kind.words() + ": " + lines.size());
            list(out, lines, line -> line);
        });
    }

    private static void coverageRow(PrintWriter out, int width, String name, Tally tally, LineCoverage lines) {
        out.printf(Locale.ROOT, "  %-" + width + "s  score %-4s  lines run %-4s (%d of %d)  unnoticed on them %d%n", name,
                share(tally.score()), share(lines.share()), lines.runLines(), lines.mutatedLines(), lines.unnoticed());
    }

    private void tests(PrintWriter out, KillMatrix matrix) {
        TestKills kills = TestKills.of(matrix);
        heading(out, "tests (" + count(matrix.killed().cardinality(), "mutant") + " killed)");
        List<TestKills.Row> killing = kills.byKills().stream().filter(row -> row.kills() > 0).toList();
        out.println("  most kills:");
        list(out, killing, row -> String.format(Locale.ROOT, "%4d killed, %d alone  %s", row.kills(), row.alone(),
                matrix.name(row.test())));
        out.println("  kill alone, no other test kills what they do: " + kills.killingAlone().size());
        list(out, kills.killingAlone(), row -> String.format(Locale.ROOT, "%4d alone  %s", row.alone(), matrix.name(row.test())));
        out.println("  redundant, every kill also made by another test (one at a time: two may share a kill): "
                + kills.redundant().size());
        list(out, kills.redundant(), row -> "    " + matrix.name(row.test()));
        BitSet reached = new BitSet();
        for (int mutant = 0; mutant < matrix.mutants().size(); mutant++) {
            reached.or(matrix.reachOf(mutant));
        }
        long reachNothing = kills.killingNothing().stream().filter(row -> !reached.get(row.test())).count();
        out.println("  kill nothing: " + kills.killingNothing().size() + " (" + reachNothing + " of them reach no mutant)");
        list(out, kills.killingNothing(), row -> "    " + matrix.name(row.test())
                + (reached.get(row.test()) ? "" : "  (reaches no mutant)"));
    }

    private void subset(PrintWriter out, KillMatrix matrix) {
        GreedyCover cover = GreedyCover.of(matrix);
        heading(out, "a smaller suite (greedy set cover: not guaranteed minimal; ties go to the smaller test id)");
        out.printf(Locale.ROOT, "  %d of %d tests (%s of the suite) kill all %d mutants the suite kills%n",
                cover.picks().size(), cover.suite(), cover.suite() == 0 ? "—" : Summary.down(cover.share()), cover.killed());
        list(out, cover.picks(), pick -> String.format(Locale.ROOT, "%+5d  %s", pick.added(), matrix.name(pick.test())));
    }

    private static void subsumption(PrintWriter out, KillMatrix matrix, Tally overall) {
        Subsumption subsumption = Subsumption.of(matrix);
        out.println();
        out.println("subsumption" + (matrix.complete() ? "" : " (from first failures only: approximate)"));
        out.printf(Locale.ROOT, "  %s in %s of the same killers; %d of those subsume the rest%n",
                count(subsumption.killed(), "killed mutant"), count(subsumption.groups(), "group"), subsumption.subsuming().size());
        out.printf(Locale.ROOT, "  subsuming mutants %d (%d killed groups + %d undetected) · score over them %s (mutation score %s)%n",
                subsumption.subsumingMutants(), subsumption.subsuming().size(), subsumption.undetected(),
                share(subsumption.score()), share(overall.score()));
    }

    private void weak(PrintWriter out, KillMatrix matrix) {
        List<WeakTests.Method> methods = WeakTests.of(matrix);
        heading(out, "weak tests (they run a method and kill none of its mutants): "
                + count(methods.size(), "method") + (matrix.complete() ? "" : " (from first failures only: an upper bound)"));
        list(out, methods, method -> "  " + method.type() + "." + method.member() + "  " + method.file() + "  "
                + method.weak().size() + " of " + method.reach() + " reaching tests, " + count(method.mutants(), "mutant") + ": "
                + names(matrix, method.weak()));
    }

    private void coupling(PrintWriter out, RunResults results, Set<String> equivalent) {
        Coupling coupling = Coupling.of(results.mutants(), equivalent);
        heading(out, "combined faults (higher-order mutants whose first-order parts are all detected)");
        out.printf(Locale.ROOT, "  coupling ratio %s (%d of %d detected; %d left out: a part missing or undetected)%n",
                share(coupling.ratio()), coupling.detected(), coupling.eligible(), coupling.incomplete());
        out.println("  " + COUPLING_REFERENCE);
        out.println("  subtle, alive although every part alone is detected: " + coupling.subtle().size());
        list(out, coupling.subtle(), this::subtle);
    }

    private String subtle(MutantResult mutant) {
        StringBuilder text = new StringBuilder("  " + style.bold(mutant.shortId()) + "  " + mutant.file() + ":"
                + mutant.first().line() + "  order " + mutant.order());
        if (mutant.diff() != null && !mutant.diff().isEmpty()) {
            mutant.diff().lines().forEach(line -> text.append("\n      ").append(line));
        }
        return text.toString();
    }

    private <T> void list(PrintWriter out, List<T> items, Function<T, String> line) {
        int shown = top == 0 ? items.size() : Math.min(top, items.size());
        items.subList(0, shown).forEach(item -> out.println("  " + line.apply(item)));
        if (shown < items.size()) {
            out.println("    … and " + (items.size() - shown) + " more (--top 0 lists all)");
        }
    }

    private void heading(PrintWriter out, String text) {
        out.println();
        out.println(style.bold(text));
    }

    private static String names(KillMatrix matrix, List<Integer> tests) {
        return tests.stream().map(matrix::name).collect(Collectors.joining(", "));
    }

    private static String share(OptionalDouble value) {
        return value.isPresent() ? Summary.down(value.getAsDouble()) : "—";
    }

    private static String count(int count, String noun) {
        return count + " " + noun + (count == 1 ? "" : "s");
    }
}
