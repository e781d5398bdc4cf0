package dev.changeling.cli;

import dev.changeling.analysis.LineCoverage;
import dev.changeling.analysis.Score;
import dev.changeling.analysis.Tally;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.review.SameClasses;
import dev.changeling.review.Standing;
import dev.changeling.review.export.Summary;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

/** The terminal report of a run: the summary and line coverage, figures per file and operator, and the survivors' ids. */
final class RunReport {

    private static final int SURVIVORS_LISTED = 40;

    private final Style style;

    RunReport(Style style) {
        this.style = style;
    }


    void print(PrintWriter out, Standing standing, Path resultsFile, ProjectLayout layout) {
        RunResults results = standing.results();
        Score score = standing.score();
        List<MutantResult> survivors = standing.toLookAt();
        out.println();
        out.println(style.bold(Summary.line(standing)));
        out.println(Summary.coverage(standing));
        if (!standing.unreadFiles().isEmpty()) {
            out.println(style.yellow(standing.unreadSummary() + ":"));
            standing.unreadFiles().forEach(problem -> out.println("  " + problem));
        }
        List<String> modules = Summary.modules(standing);
        if (!modules.isEmpty()) {
            out.println("by module (each module's mutants against its own tests):");
            modules.forEach(module -> out.println("  " + module));
        }
        if (score.byFile().size() > 1) {
            out.println("by file:");
            fileTable(out, score, LineCoverage.byFile(results.mutants(), score.equivalent()));
        }
        out.println("by operator:");
        table(out, score.byOperator().entrySet().stream().collect(Collectors.toMap(
                e -> e.getKey().operator() + (e.getKey().order() > 1 ? " (order " + e.getKey().order() + ")" : ""),
                e -> e.getValue(), (a, b) -> a, java.util.TreeMap::new)));
        if (!survivors.isEmpty()) {
            out.println(style.yellow("survived (" + survivors.size() + "):"));
            SameClasses sameClasses = SameClasses.of(results);
            survivors.stream().limit(SURVIVORS_LISTED).forEach(mutant -> out.println("  " + style.bold(mutant.shortId())
                    + "  " + mutant.file() + ":" + mutant.first().line() + "  " + mutant.first().operator()
                    + (mutant.order() > 1 ? " (order " + mutant.order() + ")" : "")
                    + "  " + mutant.first().description() + sameClasses.note(mutant)));
            if (survivors.size() > SURVIVORS_LISTED) {
                out.println("  … and " + (survivors.size() - SURVIVORS_LISTED) + " more (changeling export --markdown FILE lists all)");
            }
        }
        out.println(phases(results.timings()));
        out.println("results: " + resultsFile + "   next: changeling triage " + relative(layout));
    }

    /** Where the run's time went, phase by phase: {@code time: maven 3.4 s · generate 1.4 s · … · total 77.8 s}. */
    static String phases(Map<String, Double> timings) {
        if (timings == null || timings.isEmpty()) {
            return "time: not recorded";
        }
        return "time: " + timings.entrySet().stream()
                .map(phase -> String.format(Locale.ROOT, "%s %.1f s", phase.getKey(), phase.getValue() / 1000))
                .collect(Collectors.joining(" · "));
    }

    private static String relative(ProjectLayout layout) {
        Path here = Path.of("").toAbsolutePath();
        Path relative = here.relativize(layout.root());
        return relative.toString().isEmpty() ? "." : relative.toString();
    }

    /** Each file's mutants and score, with the share of its mutated lines the tests run beside the score. */
    static void fileTable(PrintWriter out, Score score, Map<String, LineCoverage> coverage) {
        int width = score.byFile().keySet().stream().mapToInt(String::length).max().orElse(0);
        score.byFile().forEach((file, tally) -> {
            LineCoverage lines = coverage.getOrDefault(file, new LineCoverage(0, 0, 0));
            out.printf(Locale.ROOT, "  %-" + width + "s  %5d mutants  %s  %s%n", file, tally.all(),
                    tally.score().isPresent() ? "score " + Summary.down(tally.score().getAsDouble()) : "score —   ",
                    lines.share().isPresent() ? "lines run " + Summary.down(lines.share().getAsDouble())
                            + (lines.unnoticed() > 0 ? " · " + lines.unnoticed() + " unnoticed on them" : "") : "lines run —");
        });
    }

    private static void table(PrintWriter out, Map<String, Tally> rows) {
        int width = rows.keySet().stream().mapToInt(String::length).max().orElse(0);
        rows.forEach((name, tally) -> out.printf(Locale.ROOT, "  %-" + width + "s  %5d mutants  %s%n", name, tally.all(),
                tally.score().isPresent() ? String.format(Locale.ROOT, "score %.2f", tally.score().getAsDouble()) : "—"));
    }
}
