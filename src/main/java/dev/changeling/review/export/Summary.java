package dev.changeling.review.export;

import dev.changeling.analysis.Interval;
import dev.changeling.analysis.LineCoverage;
import dev.changeling.analysis.Score;
import dev.changeling.analysis.Tally;
import dev.changeling.mutant.LineBudget;
import dev.changeling.results.ModuleRecord;
import dev.changeling.results.RunResults;
import dev.changeling.review.SameClasses;
import dev.changeling.review.Standing;
import dev.changeling.results.Verdict;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

/**
 * The one-line summary of a run in plain text: score, interval for a sample, counts. Figures are
 * rounded so they never flatter: the score and the interval's lower end down, its upper end up.
 */
public final class Summary {

    private static final String DOT = " · ";

    private Summary() {
    }

    /** The line for a run as it stands: figures of every mutant in view, survivors to look at, files not read. */
    public static String line(Standing standing) {
        RunResults results = standing.results();
        Tally overall = standing.score().overall();
        int unresolved = standing.toLookAt().size();
        StringBuilder line = new StringBuilder("mutation score ");
        if (overall.score().isPresent()) {
            line.append(down(overall.score().getAsDouble()))
                    .append(" (").append(overall.detected()).append(" of ").append(overall.denominator()).append(" detected");
            if (sampled(results) && overall.interval95().isPresent()) {
                Interval interval = overall.interval95().get();
                line.append("; 95% interval ").append(down(interval.lower())).append('–').append(up(interval.upper()))
                        .append(", a sample of ").append(results.mutants().size())
                        .append(" from ").append(results.settings().population());
            }
            line.append(')');
        } else {
            line.append("n/a (no mutant counts)");
        }
        line.append(DOT).append(String.join(DOT, counts(overall)));
        line.append(DOT).append(unresolved).append(unresolved == 1 ? " survivor" : " survivors").append(" to look at");
        SameClasses.of(results).clause(standing.toLookAt()).ifPresent(clause -> line.append(" (").append(clause).append(')'));
        if (!standing.unreadFiles().isEmpty()) {
            line.append(DOT).append(standing.unreadSummary());
        }
        if (results.notMadeCount() > 0) {
            line.append(DOT).append(notMade(results.notMade()));
        }
        if (!results.complete()) {
            line.append(DOT).append("partial run: it was interrupted");
        }
        return line.toString();
    }

    /**
     * The line under the summary: the share of mutated lines some test runs, and the mutants on those lines that no test
     * detects; "of the change" when the run was scoped to one (it then mutated the changed lines only).
     */
    public static String coverage(Standing standing) {
        RunResults results = standing.results();
        LineCoverage coverage = LineCoverage.of(results.mutants(), standing.score().equivalent());
        StringBuilder line = new StringBuilder("line coverage");
        if (results.settings() != null && results.settings().changeScope() != null) {
            line.append(" of the change");
        }
        if (coverage.share().isEmpty()) {
            return line.append(" n/a (no mutated line counts)").toString();
        }
        line.append(' ').append(down(coverage.share().getAsDouble())).append(" (").append(coverage.runLines()).append(" of ")
                .append(coverage.mutatedLines()).append(coverage.mutatedLines() == 1 ? " mutated line" : " mutated lines")
                .append(" run by a test)");
        line.append(DOT).append(unnoticed(coverage.unnoticed()));
        return line.toString();
    }

    /** "3 mutants on lines the tests run go unnoticed". */
    public static String unnoticed(int count) {
        return count + (count == 1 ? " mutant on lines the tests run goes" : " mutants on lines the tests run go") + " unnoticed";
    }

    /** "9 not made (3 in logging calls, 4 over the per-line budget, 2 by rule at line 4: counters only feed dashboards)". */
    public static String notMade(Map<String, Integer> byReason) {
        int total = byReason.values().stream().mapToInt(Integer::intValue).sum();
        return total + " not made (" + byReason.entrySet().stream()
                .map(reason -> reason.getValue() + " " + notMadeBecause(reason.getKey(), reason.getValue()))
                .collect(Collectors.joining(", ")) + ")";
    }

    private static String notMadeBecause(String reason, int count) {
        if (reason.startsWith("rule ")) {
            return "by " + reason;
        }
        if (reason.equals(LineBudget.REASON)) {
            return reason;
        }
        return "in " + (count == 1 ? reason : plural(reason));
    }

    private static String plural(String reason) {
        return reason.startsWith("body of") ? reason.replace("body of", "bodies of") : reason + "s";
    }

    static boolean sampled(RunResults results) {
        return results.settings() != null && results.settings().sampled();
    }

    private static List<String> counts(Tally overall) {
        List<String> counts = new ArrayList<>();
        counts.add(overall.all() + (overall.all() == 1 ? " mutant" : " mutants"));
        for (Verdict verdict : Verdict.values()) {
            int count = overall.count(verdict);
            if (count > 0 || verdict == Verdict.KILLED || verdict == Verdict.SURVIVED) {
                counts.add(verdict.word() + " " + count);
            }
        }
        if (overall.equivalent() > 0) {
            counts.add("equivalent " + overall.equivalent());
        }
        return counts;
    }

    /**
     * One line per module of a multi-module build, in the reactor's order: its score by its own tests, and the other
     * modules whose tests have its classes on their classpath; none for a project of one module.
     */
    public static List<String> modules(Standing standing) {
        List<String> lines = new ArrayList<>();
        for (ModuleRecord module : standing.results().modules()) {
            Tally tally = Score.of(module.mutantsOf(standing.results()), standing.score().equivalent()).overall();
            StringBuilder line = new StringBuilder("module ").append(module.path()).append(": ");
            if (tally.score().isPresent()) {
                line.append("score ").append(down(tally.score().getAsDouble())).append(" (").append(tally.detected()).append(" of ")
                        .append(tally.denominator()).append(" detected by its own tests)");
            } else {
                line.append("score n/a (").append(tally.all()).append(tally.all() == 1 ? " mutant" : " mutants").append(", none counts)");
            }
            if (!module.testedAlsoBy().isEmpty()) {
                line.append(DOT).append("its classes are also on the test classpath of ").append(String.join(", ", module.testedAlsoBy()))
                        .append(", whose tests did not run against its mutants");
            }
            lines.add(line.toString());
        }
        return lines;
    }

    /** A share to two places, rounded down so it never flatters: 0.999 reads 0.99. */
    public static String down(double value) {
        return BigDecimal.valueOf(value).setScale(2, RoundingMode.FLOOR).toPlainString();
    }

    /** Two decimals, rounded up: an interval's upper end. */
    static String up(double value) {
        return BigDecimal.valueOf(value).setScale(2, RoundingMode.CEILING).toPlainString();
    }
}
