package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.Verdict;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every mutant of the hostile sample (endless loops, one of them swallowing every error, System.exit, endless
 * recursion, memory exhaustion, a thread blocked for good) run once by {@code changeling run}: each gets the verdict
 * its code calls for, the tests say which were stopped in place and which needed their worker ended, and no
 * worker JVM outlives the run.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HostileRunTest {

    /**
     * The verdict each mutant's code calls for, by "Type original-expression → replacement". The reasons are
     * worked out from the sample's code and tests (samples/README.md names the hostile spots).
     */
    static final Map<String, Verdict> EXPECTED = new TreeMap<>(Map.ofEntries(
            // perPass 0 passes the guard, and the recursion on readings - 0 ends in a StackOverflowError, not the exception expected
            Map.entry("Backlog perPass<=0 → <", Verdict.KILLED),
            // no test passes a negative perPass
            Map.entry("Backlog perPass<=0 → ==", Verdict.SURVIVED),
            Map.entry("Backlog perPass<=0 → true", Verdict.KILLED),
            Map.entry("Backlog readings<=0 → <", Verdict.KILLED),
            // hostile: 250 steps past 0 and recurses until the stack overflows, an error JUnit reports inside the JVM
            Map.entry("Backlog readings<=0 → ==", Verdict.KILLED),
            Map.entry("Backlog readings<=0 → true", Verdict.KILLED),
            // an interval of 0 then divides by zero: ArithmeticException where IllegalArgumentException is expected
            Map.entry("ReadingSchedule intervalSeconds<=0 → <", Verdict.KILLED),
            Map.entry("ReadingSchedule intervalSeconds<=0 → ==", Verdict.SURVIVED),
            Map.entry("ReadingSchedule intervalSeconds<=0 → true", Verdict.KILLED),
            Map.entry("ReadingSchedule second<toSecond → <=", Verdict.KILLED),
            // the counter steps by one from below, so it meets toSecond exactly
            Map.entry("ReadingSchedule second<toSecond → !=", Verdict.SURVIVED),
            // the remainder of non-negative numbers is never below 0
            Map.entry("ReadingSchedule second%intervalSeconds==0 → <=", Verdict.SURVIVED),
            Map.entry("ReadingSchedule second%intervalSeconds==0 → >=", Verdict.KILLED),
            Map.entry("ReadingSchedule second%intervalSeconds==0 → false", Verdict.KILLED),
            Map.entry("SampleBuffer reservedBytes<wantedBytes → <=", Verdict.KILLED),
            // hostile: the total jumps over a size that is no whole number of chunks, so it allocates until the heap is gone;
            // the OutOfMemoryError fails the test, as it fails Surefire's run, and the worker is replaced
            Map.entry("SampleBuffer reservedBytes<wantedBytes → !=", Verdict.KILLED),
            // hostile: the uploader waits for a fourth batch that never comes, and the test's join() with it
            Map.entry("Uploader count<expectedBatches → <=", Verdict.TIMED_OUT),
            // one upload more for a whole number of batches
            Map.entry("Uplink left>0 → >=", Verdict.KILLED),
            // hostile: 7 readings in batches of 5 step from 2 to -3 and on, past zero, for good; stopped in place
            Map.entry("Uplink left>0 → !=", Verdict.TIMED_OUT),
            Map.entry("Uplink batch<=0 → <", Verdict.SURVIVED),
            Map.entry("Uplink batch<=0 → ==", Verdict.SURVIVED),
            Map.entry("Uplink batch<=0 → true", Verdict.KILLED),
            Map.entry("Uplink attempt>failuresBeforeLink → >=", Verdict.KILLED),
            Map.entry("Uplink attempt>failuresBeforeLink → !=", Verdict.KILLED),
            // hostile: never links, and the catch-all swallows the stop too; the worker is ended
            Map.entry("Uplink attempt>failuresBeforeLink → false", Verdict.TIMED_OUT),
            Map.entry("Uploader count<expectedBatches → !=", Verdict.SURVIVED),
            // the tests try 0 and 2 faults only, for which these guards stay false
            Map.entry("Watchdog faults>=FATAL_FAULTS → >", Verdict.SURVIVED),
            Map.entry("Watchdog faults>=FATAL_FAULTS → ==", Verdict.SURVIVED),
            // Watchdog.java writes a plus of outlastsAnotherFault as a Unicode escape: the file is parsed all the same
            // (it used to be skipped whole, and these six mutants with it), and that comparison gets none
            // hostile: System.exit(70) ends the worker JVM
            Map.entry("Watchdog faults>=FATAL_FAULTS → true", Verdict.CRASHED),
            // faults are never negative
            Map.entry("Watchdog faults==0 → <=", Verdict.SURVIVED),
            Map.entry("Watchdog faults==0 → >=", Verdict.KILLED),
            Map.entry("Watchdog faults==0 → false", Verdict.KILLED)));

    /** The folder the sample's SpoolFolderTest makes and marks deleteOnExit. */
    static final String SPOOL = "target/station-spool";

    ToolRun run;

    /**
     * A small worker heap makes the memory-hungry mutant fail fast and always the same way. The limit only keeps a
     * hang from blocking the build; the run's time is printed, not judged.
     */
    @BeforeAll
    @Timeout(value = 10, unit = TimeUnit.MINUTES)
    void runEveryMutant(@TempDir Path temporary) {
        // The verdict table below was worked out for the comparison operator; the other operators are covered elsewhere.
        run = ToolRun.onCopyOf("hostile", temporary.resolve("station"), "--worker-heap", "256m", "--operators", "relational-subset");
        assertNotNull(run.results(), run::transcript);
    }

    static ExternalCommand.Ended plainMavenTest(Path project, boolean offline) {
        List<String> command = new ArrayList<>(List.of("mvn", "-B", "-q", "-Dstyle.color=never"));
        if (offline) {
            command.add("-o");
        }
        command.add("test");
        return ExternalCommand.run(project, Map.of(), 600, command);
    }

    static String key(MutantResult mutant) {
        PointRecord point = mutant.first();
        return point.type() + " " + point.snippet() + " → " + point.replacement();
    }

    MutantResult mutant(String key) {
        return run.results().mutants().stream().filter(mutant -> key(mutant).equals(key)).findFirst()
                .orElseThrow(() -> new AssertionError("no mutant " + key));
    }

    @Nested
    class TheRun {

        @Test
        void completes() {
            assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
            assertTrue(run.results().complete());
        }

        @Test
        void leavesNoWorkerJvm() {
            assertEquals(List.of(), Workers.aliveFor(run.project()));
        }

        @Test
        void keepsAFileWithAUnicodeEscapeOutsideLiterals_butLeavesTheEscapedCodeUnmutated() {
            assertEquals(List.of(), run.results().problems().stream().filter(problem -> problem.contains("Watchdog")).toList());
            assertTrue(run.results().mutants().stream().anyMatch(mutant -> mutant.first().type().equals("Watchdog")));
            assertEquals(List.of(), run.results().mutants().stream()
                    .filter(mutant -> mutant.first().member().startsWith("outlastsAnotherFault")).map(HostileRunTest::key).toList());
        }

        /**
         * The sample's SpoolFolderTest marks a folder deleteOnExit; workers ended by the run, some after their test
         * was stopped or ran past the stop, must have exited normally to delete it. If one was killed, the folder
         * stays and the sample's own build fails at that test.
         */
        @Test
        void endsItsWorkersAsTestJvmsEnd_soAPlainMavenTestPassesAfterwards() {
            assertFalse(Files.exists(run.project().resolve(SPOOL)), "a worker was killed before its shutdown hooks ran");
            ExternalCommand.Ended built = plainMavenTest(run.project(), true);
            if (!(built.finished() && built.exitCode() == 0) && built.output().contains("offline")) {
                built = plainMavenTest(run.project(), false);
            }
            assertEquals(0, built.exitCode(), built.output());
        }

        @Test
        void leavesTheSourceTreeAsItWas() {
            assertEquals(run.filesBefore(), run.filesAfter());
        }
    }

    @Nested
    class Verdicts {

        @Test
        void everyMutantGetsTheVerdictItsCodeCallsFor() {
            Map<String, Verdict> actual = new TreeMap<>();
            run.results().mutants().forEach(mutant -> actual.put(key(mutant), mutant.verdict()));
            assertEquals(EXPECTED, actual);
        }

        @Test
        void theEndlessWait_timesOut_inTheTestThatWaits_andNeedsItsWorkerEnded() {
            MutantResult blocked = mutant("Uploader count<expectedBatches → <=");
            assertEquals(Verdict.TIMED_OUT, blocked.verdict());
            assertTrue(blocked.killedBy().contains("sendsEveryBatchItWasToldOfAndStops"), blocked::toString);
            // the waiting threads never pass a mutant's switch, so nothing unwinds them
            assertTrue(blocked.detail().endsWith("the worker was ended"), blocked::toString);
        }

        @Test
        void anEndlessLoopThroughItsSwitch_isStoppedInPlace() {
            MutantResult loops = mutant("Uplink left>0 → !=");
            assertTrue(loops.killedBy().contains("aShortLastBatchIsOneMoreUpload"), loops::toString);
            assertTrue(loops.detail().endsWith("stopped in place"), loops::toString);
        }

        @Test
        void anEndlessLoopThatSwallowsEveryError_needsItsWorkerEnded() {
            MutantResult stubborn = mutant("Uplink attempt>failuresBeforeLink → false");
            assertTrue(stubborn.killedBy().contains("linksOnTheAttemptAfterTheFailures"), stubborn::toString);
            assertTrue(stubborn.detail().endsWith("the worker was ended"), stubborn::toString);
        }

        @Test
        void systemExit_crashesTheWorker_withItsExitCode() {
            MutantResult exits = mutant("Watchdog faults>=FATAL_FAULTS → true");
            assertEquals(Verdict.CRASHED, exits.verdict());
            assertTrue(exits.detail().contains("exited with code 70"), exits::toString);
        }

        @Test
        void exhaustedMemory_failsTheTest_sayingSo() {
            MutantResult hog = mutant("SampleBuffer reservedBytes<wantedBytes → !=");
            assertEquals(Verdict.KILLED, hog.verdict());
            assertTrue(hog.detail().startsWith("OutOfMemoryError"), hog::toString);
        }

        @Test
        void endlessRecursion_isKilledByTheStackOverflowError() {
            MutantResult recurses = mutant("Backlog readings<=0 → ==");
            assertEquals(Verdict.KILLED, recurses.verdict());
            assertTrue(recurses.detail().startsWith("StackOverflowError"), recurses::toString);
        }
    }
}
