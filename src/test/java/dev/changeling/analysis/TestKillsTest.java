package dev.changeling.analysis;

import static dev.changeling.analysis.Made.firstFailureOnly;
import static dev.changeling.analysis.Made.mutant;
import static dev.changeling.analysis.Made.run;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.analysis.TestKills.Row;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class TestKillsTest {

    /** t1 kills m1 and m2 (m2 alone); t2 kills m1 and m3; t3 kills m3; t4 reaches the survivor m4 and kills nothing. */
    private static final KillMatrix MATRIX = KillMatrix.of(run(List.of("t4", "t3", "t2", "t1"), List.of(
            mutant("m1", "A.java", 1, List.of("t1", "t2"), List.of("t1", "t2")),
            mutant("m2", "A.java", 2, List.of("t1"), List.of("t1")),
            mutant("m3", "A.java", 3, List.of("t2", "t3"), List.of("t2", "t3")),
            mutant("m4", "A.java", 4, List.of("t4", "t1"), List.of()))), Set.of());

    private static List<String> ids(List<Row> rows) {
        return rows.stream().map(row -> MATRIX.tests().get(row.test())).toList();
    }

    @Test
    void killsAndKillsAlone_perTest_mostFirst() {
        TestKills kills = TestKills.of(MATRIX);

        assertEquals(List.of("t1", "t2", "t3", "t4"), ids(kills.byKills()));
        assertEquals(List.of(new Row(3, 2, 1), new Row(2, 2, 0), new Row(1, 1, 0), new Row(0, 0, 0)), kills.byKills());
        assertEquals(List.of("t1"), ids(kills.killingAlone()));
    }

    @Test
    void redundantTests_killOnlyWhatOthersKill_andTheTestThatKillsNothingIsApart() {
        TestKills kills = TestKills.of(MATRIX);

        assertEquals(List.of("t2", "t3"), ids(kills.redundant()));
        assertEquals(List.of("t4"), ids(kills.killingNothing()));
    }

    @Test
    void withoutKillers_onlyTheFirstFailingTestKills() {
        KillMatrix firstOnly = KillMatrix.of(run(List.of("t1", "t2"), List.of(
                firstFailureOnly("m1", List.of("t1", "t2"), "t1"))), Set.of());

        TestKills kills = TestKills.of(firstOnly);

        assertEquals(List.of(new Row(0, 1, 1), new Row(1, 0, 0)), kills.byKills());
        assertEquals(List.of(), kills.redundant());
    }
}
