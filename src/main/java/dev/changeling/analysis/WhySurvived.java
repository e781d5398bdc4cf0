package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.Verdict;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * Which of three things a survivor lacked, because each needs a different fix: a test that gets there (not reached),
 * an input that tells the mutated expression from the original (reached, never infected), or an assertion on the
 * result of a test that did see another value (infected, not propagated). Read from the baseline's watch of the
 * expression; where it could not be watched the answer is unknown, never a guess.
 *
 * @param kind  which of the three, or unknown
 * @param tests for "infected, not propagated": the tests that saw another value and still passed
 * @param hint  what the missing test needs, in words
 */
public record WhySurvived(Kind kind, List<String> tests, String hint) {

    /** The three ways to survive, and not knowing which. */
    public enum Kind {
        NOT_REACHED("not reached"),
        NOT_INFECTED("reached, never infected"),
        NOT_PROPAGATED("infected, not propagated"),
        UNKNOWN("unknown");

        private final String words;

        Kind(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    private static final Set<Set<String>> BOUNDARIES = Set.of(Set.of("<", "<="), Set.of(">", ">="));

    public WhySurvived {
        tests = List.copyOf(tests);
    }

    /** For a mutant no test detected (survived or unreached); empty for any other verdict. */
    public static Optional<WhySurvived> of(MutantResult mutant) {
        if (mutant.verdict() == Verdict.UNREACHED) {
            return Optional.of(new WhySurvived(Kind.NOT_REACHED, List.of(), "a test that runs this code"));
        }
        if (mutant.verdict() != Verdict.SURVIVED) {
            return Optional.empty();
        }
        if (mutant.infectedBy() == null) {
            return Optional.of(new WhySurvived(Kind.UNKNOWN, List.of(),
                    "the expression could not be evaluated beside the original without effects, so the run cannot tell"));
        }
        if (mutant.infectedBy().isEmpty()) {
            return Optional.of(new WhySurvived(Kind.NOT_INFECTED, List.of(), input(mutant.first())));
        }
        return Optional.of(new WhySurvived(Kind.NOT_PROPAGATED, mutant.infectedBy(),
                "an assertion on the result in " + (mutant.infectedBy().size() == 1 ? "this test" : "one of these tests")));
    }

    /**
     * One sentence: the kind, who saw another value, and what the missing test needs; {@code names} names a test. The
     * tests are named in alphabetical order, not in the order the baseline met them, which changes from run to run with
     * the tests' times, so the same tree gives the same sentence.
     */
    public String sentence(Function<String, String> names) {
        return switch (kind) {
            case UNKNOWN -> kind.words() + ": " + hint;
            case NOT_PROPAGATED -> kind.words() + ": " + tests.stream().map(names).sorted().collect(Collectors.joining(", "))
                    + " saw another value and passed; it needs " + hint;
            default -> kind.words() + ": it needs " + hint;
        };
    }

    /** The input that would tell the two expressions apart, where the operator says; else the change itself. */
    static String input(PointRecord point) {
        String from = point.original() == null ? "" : point.original().strip();
        String to = point.replacement() == null ? "" : point.replacement().strip();
        if (BOUNDARIES.contains(Set.of(from, to))) {
            return "an input where both sides of `" + point.snippet() + "` are equal";
        }
        if (Set.of(from, to).equals(Set.of("&&", "||"))) {
            return "an input where one side of `" + point.snippet() + "` is true and the other false";
        }
        if (Set.of(from, to).equals(Set.of("+", "-"))) {
            return "an input where the right operand of `" + point.snippet() + "` is not zero";
        }
        return "an input for which `" + point.snippet() + "` gives another value with `" + from + "` replaced by `" + to + "`";
    }
}
