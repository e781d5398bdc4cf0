package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

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
}
