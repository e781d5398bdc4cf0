package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.TestRecord;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Which test kills which mutant, as bit sets both ways: a row per test (the suite as the baseline ran it, then any other
 * test the mutants name), a column per counted mutant that is not equivalent. A mutant's killers are its stored
 * {@code killers} and its {@code killedBy}; when a detected mutant has no stored killers (the run stopped at its first
 * failing test), only {@code killedBy} is known and the matrix is {@linkplain #complete() incomplete}: every figure
 * drawn from it is then a lower bound of kills.
 */
public final class KillMatrix {

    private final List<String> tests;
    private final List<String> names;
    private final List<MutantResult> mutants;
    private final BitSet[] killsOf;
    private final BitSet[] killersOf;
    private final BitSet[] reachOf;
    private final boolean complete;

    private KillMatrix(List<String> tests, List<String> names, List<MutantResult> mutants, BitSet[] killsOf,
                       BitSet[] killersOf, BitSet[] reachOf, boolean complete) {
        this.tests = Collections.unmodifiableList(tests);
        this.names = Collections.unmodifiableList(names);
        this.mutants = List.copyOf(mutants);
        this.killsOf = killsOf;
        this.killersOf = killersOf;
        this.reachOf = reachOf;
        this.complete = complete;
    }

    /** The matrix of a run, leaving out stillborn and skipped mutants and those on the equivalents list. */
    public static KillMatrix of(RunResults results, Set<String> equivalent) {
        List<String> tests = new ArrayList<>();
        List<String> names = new ArrayList<>();
        Map<String, Integer> rows = new HashMap<>();
        for (TestRecord test : results.tests() == null ? List.<TestRecord>of() : results.tests()) {
            if (rows.putIfAbsent(test.id(), tests.size()) == null) {
                tests.add(test.id());
                names.add(test.name() == null || test.name().isBlank() ? test.id() : test.name());
            }
        }
        List<MutantResult> columns = results.mutants().stream()
                .filter(mutant -> mutant.verdict().counted() && !Score.isEquivalent(mutant, equivalent)).toList();
        BitSet[] killersOf = new BitSet[columns.size()];
        BitSet[] reachOf = new BitSet[columns.size()];
        boolean complete = true;
        for (int column = 0; column < columns.size(); column++) {
            MutantResult mutant = columns.get(column);
            BitSet killers = new BitSet();
            BitSet reach = new BitSet();
            killersOf[column] = killers;
            reachOf[column] = reach;
            mutant.knownKillers().forEach(test -> killers.set(row(test, rows, tests, names)));
            complete &= mutant.everyKillerKnown();
            if (mutant.reachedBy() != null) {
                mutant.reachedBy().forEach(test -> reach.set(row(test, rows, tests, names)));
            }
        }
        BitSet[] killsOf = new BitSet[tests.size()];
        for (int row = 0; row < tests.size(); row++) {
            killsOf[row] = new BitSet(columns.size());
        }
        for (int column = 0; column < columns.size(); column++) {
            for (int row = killersOf[column].nextSetBit(0); row >= 0; row = killersOf[column].nextSetBit(row + 1)) {
                killsOf[row].set(column);
            }
        }
        return new KillMatrix(tests, names, columns, killsOf, killersOf, reachOf, complete);
    }

    private static int row(String test, Map<String, Integer> rows, List<String> tests, List<String> names) {
        return rows.computeIfAbsent(test, unused -> {
            tests.add(test);
            names.add(test);
            return tests.size() - 1;
        });
    }

    /** Whether every detected mutant stored all its killers; when not, kills are a lower bound. */
    public boolean complete() {
        return complete;
    }

    /** The rows: each test's JUnit unique id. */
    public List<String> tests() {
        return tests;
    }

    /** The readable name of a row (the baseline's display names, else the unique id). */
    public String name(int test) {
        return names.get(test);
    }

    /** The columns: every counted, non-equivalent mutant, in the results' order. */
    public List<MutantResult> mutants() {
        return mutants;
    }

    /** The columns this test kills; do not change it. */
    public BitSet killsOf(int test) {
        return killsOf[test];
    }

    /** The rows that kill this column; do not change it. */
    public BitSet killersOf(int mutant) {
        return killersOf[mutant];
    }

    /** The rows that reach this column's code in the baseline; do not change it. */
    public BitSet reachOf(int mutant) {
        return reachOf[mutant];
    }

    /** The columns some test kills. */
    public BitSet killed() {
        BitSet killed = new BitSet(mutants.size());
        for (int column = 0; column < mutants.size(); column++) {
            if (!killersOf[column].isEmpty()) {
                killed.set(column);
            }
        }
        return killed;
    }
}
