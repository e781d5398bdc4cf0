package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The tests that killed the last mutants go first on the next, with their baseline times; nothing else moves. */
class RecentKillersTest {

    private static final Deadlines DEADLINES = new Deadlines(3, 300);

    private static MutantJob job(String... tests) {
        long[] nanos = new long[tests.length];
        for (int i = 0; i < nanos.length; i++) {
            nanos[i] = (i + 1) * 1_000L;
        }
        return new MutantJob("m", new int[] {4}, List.of(tests), nanos, DEADLINES, null);
    }

    private static JobResult killedBy(String test) {
        return new JobResult("k", Outcome.KILLED, test, "expected 3", List.of(), 1);
    }

    @Test
    void theMostRecentKillersAmongAJobsTests_goFirst_carryingTheirTimes_andTheRestKeepsItsOrder() {
        RecentKillers recent = new RecentKillers();
        recent.note(killedBy("c"));
        recent.note(killedBy("x"));
        recent.note(killedBy("e"));
        MutantJob reordered = recent.first(job("a", "b", "c", "d", "e"));
        assertEquals(List.of("e", "c", "a", "b", "d"), reordered.tests());
        assertArrayEquals(new long[] {5_000, 3_000, 1_000, 2_000, 4_000}, reordered.testNanos());
    }

    @Test
    void onlyTheLastFewKillersAreKept_andSurvivorsChangeNothing() {
        RecentKillers recent = new RecentKillers();
        for (String test : List.of("a", "b", "c", "d")) {
            recent.note(killedBy(test));
        }
        recent.note(new JobResult("s", Outcome.SURVIVED, null, null, List.of(), 1));
        assertEquals(List.of("d", "c", "b", "e", "a"), recent.first(job("e", "a", "b", "c", "d")).tests());
    }

    @Test
    void aJobRunningEveryTest_keepsItsOrder() {
        RecentKillers recent = new RecentKillers();
        recent.note(killedBy("b"));
        MutantJob every = job("a", "b").runningEveryTest();
        assertSame(every, recent.first(every));
    }
}
