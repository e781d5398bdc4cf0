package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class WorkerTimeTest {

    @Test
    void describesEachUseThatHappened_withItsSecondsAndCount_thenTheReplacements() {
        WorkerTime time = new WorkerTime();
        time.add(WorkerTime.Use.MUTANTS, 1_500_000_000L);
        time.add(WorkerTime.Use.MUTANTS, 500_000_000L);
        time.add(WorkerTime.Use.KILL_CHECKS, 250_000_000L);
        time.replaced(WorkerTime.Replacement.SHARE_DONE);
        time.replaced(WorkerTime.Replacement.SHARE_DONE);
        assertEquals("worker time: mutants' tests 2.0 s (2) · kill checks 0.3 s (1); replaced: 2 after their share of mutants",
                time.describe());
    }

    @Test
    void timesWhatItRuns_andHandsBackItsAnswer() {
        WorkerTime time = new WorkerTime();
        assertEquals("done", time.timed(WorkerTime.Use.WARM_UPS, () -> "done"));
        assertEquals(1, time.count(WorkerTime.Use.WARM_UPS));
        assertEquals("worker time: warm-ups 0.0 s (1)", time.describe());
    }

    @Test
    void aFreshWorkerCostsItsAverageStartEndAndWarmUp_andAsMuchAsAnythingBeforeAnyStart() {
        WorkerTime time = new WorkerTime();
        assertEquals(Long.MAX_VALUE, time.freshWorkerNanos());
        time.add(WorkerTime.Use.STARTS, 600);
        time.add(WorkerTime.Use.STARTS, 800);
        assertEquals(700, time.freshWorkerNanos(), "no end or warm-up measured yet");
        time.add(WorkerTime.Use.ENDS, 100);
        time.add(WorkerTime.Use.WARM_UPS, 50);
        assertEquals(850, time.freshWorkerNanos());
    }
}
