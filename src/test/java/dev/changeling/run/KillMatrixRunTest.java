package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.MixedSample;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.Verdict;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The greenhouse sample run twice on copies with one mixed sample of first-order and second-order mutants: once
 * stopping each mutant at its first failure, once with {@code --every-test}. The matrix must leave every verdict as
 * it was, and the sample must hold every part of each second-order mutant. Greenhouse has nothing a mutant can make
 * loop ({@code GreenhouseRunTest}), so the order of a mutant's tests, which follows each run's own baseline times, cannot
 * move a verdict between killed and timed out here.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class KillMatrixRunTest {

    static final String MIX = "16:5:2";
    /** A seed whose sample holds killed and surviving mutants of both orders. */
    static final String SEED = "7";

    ToolRun firstFailure;
    ToolRun everyTest;

    @BeforeAll
    void runTheSameSampleBothWays(@TempDir Path temporary) {
        firstFailure = ToolRun.onCopyOf("greenhouse", temporary.resolve("first-failure"), "--mix", MIX, "--seed", SEED);
        everyTest = ToolRun.onCopyOf("greenhouse", temporary.resolve("every-test"), "--mix", MIX, "--seed", SEED, "--every-test");
        assertNotNull(firstFailure.results(), firstFailure::transcript);
        assertNotNull(everyTest.results(), everyTest::transcript);
        assertTrue(firstFailure.results().complete() && everyTest.results().complete(), everyTest::transcript);
    }

    @Test
    void theSameSeedGivesTheSameMutants_andTheSettingsSayHowTheyWereMade() {
        assertEquals(ids(firstFailure.results().mutants()), ids(everyTest.results().mutants()));
        assertEquals(MixedSample.parse(MIX), everyTest.results().settings().mix());
        assertEquals(List.of(1, 2), everyTest.results().settings().orders());
        assertTrue(everyTest.results().settings().everyTest());
        assertFalse(firstFailure.results().settings().everyTest());
        assertTrue(everyTest.err().contains("mixed sample: 16 first-order and 5 of order 2 drawn"), everyTest::transcript);
    }

    @Test
    void everyPartOfEachSecondOrderMutant_isInTheRun() {
        List<MutantResult> mutants = everyTest.results().mutants();
        Set<String> firstOrder = mutants.stream().filter(mutant -> mutant.order() == 1).map(MutantResult::id).collect(Collectors.toSet());
        List<MutantResult> secondOrder = mutants.stream().filter(mutant -> mutant.order() == 2).toList();
        assertEquals(5, secondOrder.size());
        for (MutantResult combined : secondOrder) {
            for (PointRecord part : combined.points()) {
                assertTrue(firstOrder.contains(part.fingerprint()), () -> "a part of " + combined.shortId() + " is missing");
            }
        }
    }

    @Test
    void theMatrixLeavesEveryVerdictAsItWas_andHoldsEveryKillerTheOtherRunFound() {
        Map<String, MutantResult> before = byId(firstFailure.results().mutants());
        Set<Verdict> seen = everyTest.results().mutants().stream().map(MutantResult::verdict).collect(Collectors.toSet());
        assertTrue(seen.containsAll(Set.of(Verdict.KILLED, Verdict.SURVIVED)), seen::toString);
        for (MutantResult after : everyTest.results().mutants()) {
            MutantResult was = before.get(after.id());
            assertEquals(was.verdict(), after.verdict(), () -> after.shortId() + "\n" + after.diff());
            if (was.verdict() == Verdict.KILLED) {
                // Each run orders the tests by its own baseline times, so the first to fail may differ; it is a killer either way.
                assertTrue(after.killers().contains(was.killedBy()), () -> after.shortId() + ": " + was.killedBy() + " not among " + after.killers());
            }
        }
    }

    @Test
    void withoutTheOption_noMutantHasKillers() {
        List<String> withKillers = firstFailure.results().mutants().stream()
                .filter(mutant -> mutant.killers() != null).map(MutantResult::shortId).toList();
        assertEquals(List.of(), withKillers);
    }

    @Test
    void withIt_eachMutantThatRanListsEveryFailingTest_theFirstBeingItsKiller() {
        boolean someKilledTwice = false;
        for (MutantResult mutant : everyTest.results().mutants()) {
            if (mutant.testsRun().isEmpty()) {
                assertNull(mutant.killers(), mutant.shortId() + " ran no test");
                continue;
            }
            assertNotNull(mutant.killers(), mutant.shortId());
            assertTrue(mutant.reachedBy().containsAll(mutant.testsRun()), mutant.shortId() + " ran only reaching tests");
            assertTrue(mutant.testsRun().containsAll(mutant.killers()), mutant.shortId());
            if (mutant.verdict() == Verdict.KILLED) {
                assertEquals(mutant.killedBy(), mutant.killers().get(0), mutant.shortId());
                // a watched mutant's reaching tests that never saw its expression differ pass as unmutated, and do not run
                List<String> couldFail = mutant.infectedBy() == null ? mutant.reachedBy() : mutant.infectedBy();
                assertEquals(Set.copyOf(couldFail), Set.copyOf(mutant.testsRun()), mutant.shortId() + " ran every reaching test that could fail");
                someKilledTwice |= mutant.killers().size() > 1;
            } else {
                assertEquals(List.of(), mutant.killers(), mutant.shortId());
            }
        }
        assertTrue(someKilledTwice, "some mutant fails more than one test, or the sample shows nothing a first failure would not");
    }

    private static Set<String> ids(List<MutantResult> mutants) {
        return mutants.stream().map(MutantResult::id).collect(Collectors.toSet());
    }

    private static Map<String, MutantResult> byId(List<MutantResult> mutants) {
        return mutants.stream().collect(Collectors.toMap(MutantResult::id, Function.identity()));
    }
}
