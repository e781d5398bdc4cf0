package dev.changeling.analysis;

import dev.changeling.results.Verdict;
import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The verdict counts of one group of mutants (all of them, one file, one operator) and the mutation
 * score they give.
 *
 * @param verdicts   how many mutants got each verdict; every verdict is present, zeros included
 * @param equivalent how many undetected mutants (survived or unreached) are known to be equivalent
 */
public record Tally(Map<Verdict, Integer> verdicts, int equivalent) {

    public Tally {
        EnumMap<Verdict, Integer> complete = new EnumMap<>(Verdict.class);
        for (Verdict verdict : Verdict.values()) {
            complete.put(verdict, verdicts.getOrDefault(verdict, 0));
        }
        verdicts = Collections.unmodifiableMap(complete);
        int undetected = complete.get(Verdict.SURVIVED) + complete.get(Verdict.UNREACHED);
        if (equivalent < 0 || equivalent > undetected) {
            throw new IllegalArgumentException(equivalent + " equivalent mutants, but only " + undetected + " undetected");
        }
    }

    public static Tally empty() {
        return new Tally(Map.of(), 0);
    }

    public int count(Verdict verdict) {
        return verdicts.get(verdict);
    }

    /** Every mutant in the group, whatever became of it. */
    public int all() {
        return verdicts.values().stream().mapToInt(Integer::intValue).sum();
    }

    /** Killed, timed out or crashed. */
    public int detected() {
        return sum(Verdict.KILLED, Verdict.TIMED_OUT, Verdict.CRASHED);
    }

    /** The mutants the score is over: all but the stillborn, the skipped and the equivalent. */
    public int denominator() {
        return all() - sum(Verdict.STILLBORN, Verdict.SKIPPED) - equivalent;
    }

    /** Survived or unreached, and not known to be equivalent. */
    public int undetected() {
        return denominator() - detected();
    }

    /** Detected over the denominator; empty when no mutant counts. */
    public OptionalDouble score() {
        int denominator = denominator();
        return denominator == 0 ? OptionalDouble.empty() : OptionalDouble.of((double) detected() / denominator);
    }

    /** The 95% Wilson interval of the score, for a sample; empty when no mutant counts. */
    public Optional<Interval> interval95() {
        int denominator = denominator();
        return denominator == 0 ? Optional.empty() : Optional.of(Interval.wilson95(detected(), denominator));
    }

    Tally plus(Verdict verdict, boolean isEquivalent) {
        EnumMap<Verdict, Integer> more = new EnumMap<>(verdicts);
        more.merge(verdict, 1, Integer::sum);
        return new Tally(more, equivalent + (isEquivalent ? 1 : 0));
    }

    private int sum(Verdict... chosen) {
        int total = 0;
        for (Verdict verdict : chosen) {
            total += verdicts.get(verdict);
        }
        return total;
    }
}
