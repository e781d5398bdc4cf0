package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class PhaseClockTest {

    @Test
    void time_saysThePhaseBeforeItsWorkRuns_andTimesIt() {
        List<String> said = new ArrayList<>();
        PhaseClock clock = new PhaseClock(phase -> said.add("starting " + phase));

        String result = clock.time(PhaseClock.COMPILE, () -> {
            said.add("working");
            return "built";
        });

        assertEquals("built", result);
        assertEquals(List.of("starting compile", "working"), said);
        assertEquals(List.of(PhaseClock.COMPILE, "total"), List.copyOf(clock.withTotal().keySet()));
    }

    @Test
    void aPhaseRunAgain_asForEachModuleOfABuild_addsUp() {
        PhaseClock clock = new PhaseClock(phase -> { });

        clock.time(PhaseClock.BASELINE, () -> sleepless(3));
        clock.time(PhaseClock.EXECUTE, () -> sleepless(1));
        clock.time(PhaseClock.BASELINE, () -> sleepless(2));

        assertEquals(List.of(PhaseClock.BASELINE, PhaseClock.EXECUTE, "total"), List.copyOf(clock.withTotal().keySet()));
        assertTrue(clock.withTotal().get(PhaseClock.BASELINE) > 0);
    }

    /** Some work that takes a little time without waiting: common practice, no source. */
    private static long sleepless(int rounds) {
        long sum = 0;
        for (int i = 0; i < rounds * 10_000; i++) {
            sum += Long.numberOfTrailingZeros(i);
        }
        return sum;
    }
}
