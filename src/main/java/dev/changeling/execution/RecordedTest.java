package dev.changeling.execution;

import java.util.Arrays;
import java.util.Objects;

/**
 * One test of the unmutated suite.
 *
 * @param id         the JUnit unique id, which selects exactly this test again
 * @param name       display names from the class down, e.g. {@code PriceTest > rounds half up}
 * @param className  the test's class, when the engine says
 * @param status     how it ended
 * @param message    why it failed, was aborted or skipped; null when it passed
 * @param nanos      its own run time, its {@code @BeforeEach} and {@code @AfterEach} included
 * @param aloneNanos what running it on its own costs: its own time plus the time its containers took
 *                   apart from their children (class setup and teardown), which a run of this one test
 *                   pays again in full
 * @param reached    the mutation points it reached, ascending, its containers' setup included
 */
public record RecordedTest(String id, String name, String className, TestStatus status, String message, long nanos, long aloneNanos, int[] reached) {

    public RecordedTest {
        reached = reached.clone();
        Arrays.sort(reached);
    }

    @Override
    public int[] reached() {
        return reached.clone();
    }

    /** Whether it reached point {@code point}. */
    public boolean reaches(int point) {
        return Arrays.binarySearch(reached, point) >= 0;
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof RecordedTest test && id.equals(test.id) && name.equals(test.name)
                && Objects.equals(className, test.className) && status == test.status
                && Objects.equals(message, test.message) && nanos == test.nanos && aloneNanos == test.aloneNanos && Arrays.equals(reached, test.reached);
    }

    @Override
    public int hashCode() {
        return Objects.hash(id, status, nanos, Arrays.hashCode(reached));
    }

    @Override
    public String toString() {
        return "RecordedTest[" + id + ", " + status + ", " + nanos + " ns, alone " + aloneNanos + " ns, reached " + Arrays.toString(reached) + "]";
    }
}
