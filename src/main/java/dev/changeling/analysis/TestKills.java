package dev.changeling.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.List;

/**
 * What each test of a kill matrix contributes: the mutants it kills and those only it kills; from these, the redundant
 * tests (they kill something, and every one of their kills is also made by another test) and the tests that kill
 * nothing. Redundant tests are redundant one at a time: dropping two of them together can lose a kill they share.
 */
public final class TestKills {

    /**
     * One row's figures.
     *
     * @param test  the row in the matrix
     * @param kills mutants it kills
     * @param alone mutants no other test kills
     */
    public record Row(int test, int kills, int alone) {
    }

    /** Most kills first, then most kills alone, then by unique id. */
    private final List<Row> rows;
    private final KillMatrix matrix;

    private TestKills(KillMatrix matrix, List<Row> rows) {
        this.matrix = matrix;
        this.rows = List.copyOf(rows);
    }

    public static TestKills of(KillMatrix matrix) {
        int[] alone = new int[matrix.tests().size()];
        for (int column = 0; column < matrix.mutants().size(); column++) {
            BitSet killers = matrix.killersOf(column);
            if (killers.cardinality() == 1) {
                alone[killers.nextSetBit(0)]++;
            }
        }
        List<Row> rows = new ArrayList<>();
        for (int test = 0; test < matrix.tests().size(); test++) {
            rows.add(new Row(test, matrix.killsOf(test).cardinality(), alone[test]));
        }
        rows.sort(Comparator.comparingInt(Row::kills).reversed().thenComparing(Comparator.comparingInt(Row::alone).reversed())
                .thenComparing(row -> matrix.tests().get(row.test())));
        return new TestKills(matrix, rows);
    }

    /** Every test, most kills first (then most kills alone, then by unique id). */
    public List<Row> byKills() {
        return rows;
    }

    /** Tests with at least one kill no other test makes, most such kills first. */
    public List<Row> killingAlone() {
        return rows.stream().filter(row -> row.alone() > 0)
                .sorted(Comparator.comparingInt(Row::alone).reversed().thenComparing(row -> matrix.tests().get(row.test())))
                .toList();
    }

    /** Tests that kill something, every kill also made by another test. */
    public List<Row> redundant() {
        return rows.stream().filter(row -> row.kills() > 0 && row.alone() == 0).toList();
    }

    /** Tests that kill no mutant at all, by unique id. */
    public List<Row> killingNothing() {
        return rows.stream().filter(row -> row.kills() == 0).toList();
    }
}
