package dev.changeling.review;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.analysis.Tally;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * What a CI job asks of a run before it lets a change through: no unresolved survivor, a score of at least
 * some value, or both. The one place that decides, for {@code run} and {@code export} alike. The score is
 * compared exactly ({@code detected ≥ minimum × counted}), so 0.8 means 4 of 5, never a rounding of it.
 *
 * @param failOnSurvivors whether an unresolved survivor fails the gate
 * @param minScore        the lowest score that passes, or null for no such rule
 */
public record Gate(boolean failOnSurvivors, BigDecimal minScore) {

    /** The outcome: the exit code, and one line per rule that failed. */
    public record Outcome(int exitCode, List<String> reasons) {

        public Outcome {
            reasons = List.copyOf(reasons);
        }

        /** Writes one line per reason, as every message of the tool, and gives the exit code. */
        public int reportedTo(PrintWriter err) {
            reasons.forEach(reason -> err.println("changeling: " + reason));
            err.flush();
            return exitCode;
        }
    }

    /** @throws UserError (exit code 2) when the minimum score is outside 0 to 1 */
    public Gate {
        if (minScore != null && (minScore.signum() < 0 || minScore.compareTo(BigDecimal.ONE) > 0)) {
            throw new UserError("--min-score takes a score from 0 to 1, such as 0.8, not " + minScore.toPlainString(),
                    ExitCode.USAGE);
        }
    }

    /** Whether any rule was asked for. */
    public boolean asked() {
        return failOnSurvivors || minScore != null;
    }

    /**
     * Checks the standing. A file the run could not read fails every rule asked for: the score is then not
     * about the whole change.
     */
    public Outcome check(Standing standing) {
        List<String> reasons = new ArrayList<>();
        int exit = ExitCode.OK;
        boolean unread = asked() && !standing.unreadFiles().isEmpty();
        int unresolved = standing.toLookAt().size();
        if (failOnSurvivors && (unresolved > 0 || unread)) {
            if (unresolved > 0) {
                reasons.add(unresolved + (unresolved == 1 ? " unresolved survivor remains" : " unresolved survivors remain")
                        + " (--fail-on-survivors)");
            }
            exit = ExitCode.SURVIVORS_REMAIN;
        }
        if (minScore != null) {
            Tally overall = standing.score().overall();
            if (overall.denominator() == 0) {
                reasons.add("no mutant counts towards a score, so --min-score passes");
            } else if (BigDecimal.valueOf(overall.detected()).compareTo(minScore.multiply(BigDecimal.valueOf(overall.denominator()))) < 0) {
                reasons.add(overall.detected() + " of " + overall.denominator() + " mutants detected is a score under --min-score "
                        + minScore.toPlainString());
                exit = ExitCode.SCORE_TOO_LOW;
            }
            if (unread) {
                exit = ExitCode.SCORE_TOO_LOW;
            }
        }
        if (unread) {
            reasons.add(standing.unreadSummary() + ", so the gate cannot pass: fix or exclude "
                    + String.join(", ", standing.unreadFiles().stream().map(Gate::pathOf).toList()));
        }
        return new Outcome(exit, reasons);
    }

    private static String pathOf(String problem) {
        int colon = problem.indexOf(':');
        return colon < 0 ? problem : problem.substring(0, colon);
    }
}
