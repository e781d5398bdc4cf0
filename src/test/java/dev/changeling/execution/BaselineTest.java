package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class BaselineTest {

    /** A test whose own time is a tenth of what running it alone costs. */
    static RecordedTest test(String id, TestStatus status, long aloneNanos, int... reached) {
        return new RecordedTest(id, id, null, status, null, aloneNanos / 10, aloneNanos, reached);
    }

    static final Baseline SUITE = new Baseline(List.of(
            test("slow", TestStatus.PASSED, 900, 1, 2),
            test("fast", TestStatus.PASSED, 100, 2, 3),
            test("tie-b", TestStatus.PASSED, 500, 3),
            test("tie-a", TestStatus.PASSED, 500, 3),
            test("skipped", TestStatus.SKIPPED, 0),
            test("aborted", TestStatus.ABORTED, 50, 3)),
            List.of(), new int[] {9, 4}, List.of(), 2_000);

    @Nested
    class ChoosingTests {

        @Test
        void takesEveryPassingTestThatReachesAnyPoint_fastestFirst_tiesById() {
            assertEquals(List.of("fast", "tie-a", "tie-b"), SUITE.testsFor(3));
            assertEquals(List.of("fast", "slow"), SUITE.testsFor(1, 2));
        }

        @Test
        void ordersByTheCostOfRunningAlone_notByTheTestsOwnTime() {
            Baseline baseline = new Baseline(List.of(
                    new RecordedTest("quick-with-slow-setup", "q", null, TestStatus.PASSED, null, 10, 5_000, new int[] {1}),
                    new RecordedTest("plain", "p", null, TestStatus.PASSED, null, 100, 100, new int[] {1})),
                    List.of(), new int[0], List.of(), 0);
            assertEquals(List.of("plain", "quick-with-slow-setup"), baseline.testsFor(1));
            assertArrayEquals(new long[] {100, 5_000, 0}, baseline.aloneNanos(List.of("plain", "quick-with-slow-setup", "unknown")));
        }

        @Test
        void leavesOutTestsThatDidNotPass() {
            assertFalse(SUITE.testsFor(3).contains("aborted"));
        }

        @Test
        void findsNothingForAnUnreachedPoint() {
            assertEquals(List.of(), SUITE.testsFor(7));
        }
    }

    @Nested
    class Health {

        @Test
        void isGreenWithoutFailures() {
            assertTrue(SUITE.green());
        }

        @Test
        void isRedWithAFailedTest() {
            Baseline red = new Baseline(List.of(test("x", TestStatus.FAILED, 1)), List.of(), new int[0], List.of(), 1);
            assertFalse(red.green());
            assertEquals(1, red.failures().size());
        }

        @Test
        void isRedWithAFailedContainer() {
            Baseline red = new Baseline(List.of(), List.of(new FailedContainer("c", "C", "boom")), new int[0], List.of(), 1);
            assertFalse(red.green());
        }
    }

    @Test
    void keepsInitialisationReachSorted() {
        assertEquals(List.of(4, 9), java.util.Arrays.stream(SUITE.reachedWhileInitialising()).boxed().toList());
    }
}
