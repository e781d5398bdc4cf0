package dev.changeling.review;

import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * The kill matrix summed up for a picture: for each test (the busiest first) and each mutation operator, how many
 * mutants of that operator the test kills, as far as the run knows them ({@link MutantResult#knownKillers()}): all of
 * them when it ran every reaching test, otherwise only the first failing test, and the counts are a lower bound.
 *
 * @param operators  the columns: every operator of the run (of each mutant's first point), sorted
 * @param rows       the tests shown, most kills first
 * @param otherTests how many further tests kill something and are not shown
 * @param otherKills the kills of those further tests, summed
 * @param lowerBound true when some detected mutant names only its first failing test
 */
public record KillGrid(List<String> operators, List<Row> rows, int otherTests, int otherKills, boolean lowerBound) {

    /**
     * One test's kills.
     *
     * @param test   the test's unique id
     * @param counts mutants killed, one per operator, in the order of {@link KillGrid#operators()}
     */
    public record Row(String test, List<Integer> counts) {

        public Row {
            counts = List.copyOf(counts);
        }

        public int total() {
            return counts.stream().mapToInt(Integer::intValue).sum();
        }
    }

    public KillGrid {
        operators = List.copyOf(operators);
        rows = List.copyOf(rows);
    }

    /** The grid of a run with at most {@code topTests} rows. */
    public static KillGrid of(RunResults results, int topTests) {
        List<String> operators = List.copyOf(new TreeSet<>(results.mutants().stream().map(mutant -> mutant.first().operator()).toList()));
        Map<String, int[]> byTest = new HashMap<>();
        boolean lowerBound = false;
        for (MutantResult mutant : results.mutants()) {
            int column = operators.indexOf(mutant.first().operator());
            for (String test : mutant.knownKillers()) {
                byTest.computeIfAbsent(test, unused -> new int[operators.size()])[column]++;
            }
            lowerBound |= !mutant.everyKillerKnown();
        }
        List<Row> all = byTest.entrySet().stream()
                .map(entry -> new Row(entry.getKey(), Arrays.stream(entry.getValue()).boxed().toList()))
                .sorted(Comparator.comparingInt(Row::total).reversed().thenComparing(Row::test))
                .toList();
        List<Row> shown = all.subList(0, Math.min(topTests, all.size()));
        List<Row> rest = all.subList(shown.size(), all.size());
        return new KillGrid(operators, new ArrayList<>(shown), rest.size(), rest.stream().mapToInt(Row::total).sum(), lowerBound);
    }

    /** The largest count in any cell shown; 0 when no test kills anything. */
    public int largest() {
        return rows.stream().flatMap(row -> row.counts().stream()).mapToInt(Integer::intValue).max().orElse(0);
    }
}
