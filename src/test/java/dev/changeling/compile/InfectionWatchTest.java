package dev.changeling.compile;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class InfectionWatchTest {

    @ParameterizedTest
    @ValueSource(strings = {"a < b", "rows + extra * 2", "-level", "!(wet && warm)", "~mask ^ flags", "count >>> 2", "1L + 'a'",
            "this.rows > 0", "plot.rows.length - 1", "(double) rows == 0", "Math.abs(sea - basin) <= margin",
            "StrictMath.max(a, b) + 1"})
    void operatorsOverNamesFieldsLiteralsAndPureMath_canBeEvaluatedBesideTheOriginal(String expression) {
        assertTrue(InfectionWatch.pure(expression), expression);
    }

    @ParameterizedTest
    @ValueSource(strings = {"total / count", "total % 7", "size() > 0", "rows[i] < 3", "i++ < 3", "(x = 3) > 0",
            "new int[2].length", "a <", "text == null", "(Integer) boxed > 0", "Math.floorMod(a, b) > 0", "Math.random() > a",
            "Math.<Integer>max(a, b) > 0"})
    void callsAssignmentsIndexingDivisionNullAndReferenceCasts_areNotWatched(String expression) {
        assertFalse(InfectionWatch.pure(expression), expression);
    }
}
