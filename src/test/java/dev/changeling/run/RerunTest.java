package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class RerunTest {

    @Test
    void announcing_putsTheSlowPhasesIntoWords_andLeavesTheQuickOneUnsaid() {
        List<String> steps = new ArrayList<>();
        RunListener listener = Rerun.announcing(steps::add);

        for (String phase : List.of(PhaseClock.MAVEN, PhaseClock.GENERATE, PhaseClock.COMPILE, PhaseClock.BASELINE,
                PhaseClock.EXECUTE)) {
            listener.starting(phase);
        }

        assertEquals(List.of("building the project", "compiling the mutant",
                "running the tests without the mutant, to find those that reach it",
                "running the tests that reach it, with the mutant"), steps);
    }
}
