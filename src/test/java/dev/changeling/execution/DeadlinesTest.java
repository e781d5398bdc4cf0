package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class DeadlinesTest {

    @Nested
    class Arithmetic {

        @Test
        void isFactorTimesBaselinePlusConstant() {
            assertEquals(2_000 + 3 * 250, new Deadlines(3, 2_000).millisFor(250_000_000L));
        }

        @Test
        void roundsPartialMillisecondsUp() {
            assertEquals(1_002, new Deadlines(1.5, 1_000).millisFor(1_000_001L));
        }

        @Test
        void aWorkersFirstRunOfAClassGetsTwoSecondsMore_butNotInAJobResumedAfterAStop() {
            Deadlines usual = new Deadlines(3, 300);
            assertEquals(300 + 3 * 10 + 2_000, usual.millisFor(10_000_000L, true));
            Deadlines resumed = usual.resumed();
            assertEquals(50 + 3 * 10, resumed.millisFor(10_000_000L, true));
            assertEquals(usual.factor(), resumed.factor());
        }

        @Test
        void isNeverZero() {
            assertEquals(1, new Deadlines(1, 0).millisFor(0));
        }

        @Test
        void aStepIsAllowedWhatItsOwnTestsCostAloneInTheBaseline() {
            Baseline baseline = new Baseline(List.of(
                    new RecordedTest("a", "A", null, TestStatus.PASSED, null, 1, 100_000_000L, new int[0]),
                    new RecordedTest("b", "B", null, TestStatus.PASSED, null, 1, 300_000_000L, new int[0])),
                    List.of(), new int[0], List.of(), 0);
            MutantJob job = MutantJob.schema("m", new int[] {0}, List.of("a", "b", "unknown"), new Deadlines(2, 500), baseline);
            assertEquals(500 + 2 * 100, job.stepMillis(0, 1, false));
            assertEquals(500 + 2 * 300, job.stepMillis(1, 2, false));
            assertEquals(500 + 2 * 400, job.stepMillis(0, 3, false));
            assertEquals(500, job.stepMillis(0, 0, false), "before the worker says what it runs");
            assertEquals(500 + 2 * 100 + Deadlines.FIRST_RUN_EXTRA_MILLIS, job.stepMillis(0, 1, true));
        }
    }

    @Nested
    class Limits {

        @Test
        void aFactorBelowOneIsRefused() {
            assertThrows(IllegalArgumentException.class, () -> new Deadlines(0.5, 0));
        }

        @Test
        void notANumberIsRefused() {
            assertThrows(IllegalArgumentException.class, () -> new Deadlines(Double.NaN, 0));
        }

        @Test
        void aNegativeConstantIsRefused() {
            assertThrows(IllegalArgumentException.class, () -> new Deadlines(2, -1));
        }
    }
}
