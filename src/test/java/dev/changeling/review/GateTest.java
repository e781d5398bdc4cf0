package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** The one gate of run and export: survivors, the minimum score, and files the score does not cover. */
class GateTest {

    private static Standing standing(int detected, int total, List<String> unread) {
        List<MutantResult> mutants = new ArrayList<>();
        for (int i = 0; i < total; i++) {
            mutants.add(ResultsForTests.result("m" + i, "A.java", "op", 1, i < detected ? Verdict.KILLED : Verdict.SURVIVED));
        }
        RunResults run = ResultsForTests.run(mutants, false, 0);
        RunResults withUnread = new RunResults(run.format(), true, run.settings(), run.tests(), run.timings(), run.mutants(),
                unread, run.sourceHashes());
        return Standing.of(withUnread, new Settled(Set.of(), java.util.Map.of(), java.time.Instant.EPOCH));
    }

    @Test
    void exactlyTheMinimumPasses_evenWhereDoublesWouldRoundIt() {
        // 0.7 of 10 is 7 exactly; in doubles 0.7 * 10 is 7.000000000000001, which a double comparison would fail
        assertEquals(ExitCode.OK, new Gate(false, new BigDecimal("0.7")).check(standing(7, 10, List.of())).exitCode());
        assertEquals(ExitCode.SCORE_TOO_LOW, new Gate(false, new BigDecimal("0.71")).check(standing(7, 10, List.of())).exitCode());
    }

    @Test
    void survivorsFailTheSurvivorRule_andTheScoreRuleWinsWhenBothFail() {
        assertEquals(ExitCode.SURVIVORS_REMAIN, new Gate(true, null).check(standing(9, 10, List.of())).exitCode());
        Gate.Outcome both = new Gate(true, new BigDecimal("0.95")).check(standing(9, 10, List.of()));
        assertEquals(ExitCode.SCORE_TOO_LOW, both.exitCode());
        assertEquals(2, both.reasons().size(), both.reasons()::toString);
    }

    @Test
    void aFileThatCouldNotBeRead_failsEveryRuleAskedFor_evenAPerfectScore() {
        List<String> unread = List.of("src/main/java/shop/Ledger.java:4: Parse error");
        Gate.Outcome survivors = new Gate(true, null).check(standing(3, 3, unread));
        assertEquals(ExitCode.SURVIVORS_REMAIN, survivors.exitCode());
        assertTrue(survivors.reasons().get(0).startsWith("1 file could not be read — not in the score, so the gate cannot pass"),
                survivors.reasons()::toString);
        assertTrue(survivors.reasons().get(0).endsWith("src/main/java/shop/Ledger.java"), survivors.reasons()::toString);
        assertEquals(ExitCode.SCORE_TOO_LOW, new Gate(false, BigDecimal.ZERO).check(standing(3, 3, unread)).exitCode());
        assertEquals(ExitCode.OK, new Gate(false, null).check(standing(3, 3, unread)).exitCode(), "no rule asked, nothing fails");
    }

    @Test
    void aMinimumOutsideZeroToOne_isACommandLineMistake() {
        UserError error = assertThrows(UserError.class, () -> new Gate(false, new BigDecimal("1.5")));
        assertEquals(ExitCode.USAGE, error.exitCode());
    }
}
