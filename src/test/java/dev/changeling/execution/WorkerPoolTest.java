package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CountDownLatch;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** Drives real worker JVMs on a small compiled project; see {@link TinyProject} for what each point does. */
class WorkerPoolTest {

    private static final long GENEROUS = 60_000;

    @TempDir
    static Path folder;
    static TinyProject project;

    @BeforeAll
    static void compileTheProject() throws Exception {
        project = TinyProject.create(folder.resolve("shop"));
    }

    @AfterAll
    static void noWorkerOutlivesTheTests() {
        assertEquals(List.of(), liveWorkers(), "worker JVMs still running");
    }

    static WorkerSettings settings(String name) {
        return WorkerSettings.builder(project.root, project.classpath(), project.root.resolve("target/changeling/" + name))
                .workers(1)
                .maxHeap("96m")
                .jvmArguments(List.of("-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC")).build();
    }

    static SuiteSetup setup() {
        return SuiteSetup.of(TinyProject.POINTS, testClassNames()).withPreinitialise(List.of("shop.Rates", "shop.Missing"));
    }

    static List<String> testClassNames() {
        try {
            return project.testClassNames();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static String method(String className, String method) {
        return "[engine:junit-jupiter]/[class:shop." + className + "]/[method:" + method + "()]";
    }

    static MutantJob job(String key, int point, String... tests) {
        return MutantJob.schema(key, new int[] {point}, List.of(tests), GENEROUS);
    }

    /** Worker JVMs below this one, found by their main class on the command line. */
    static List<Long> liveWorkers() {
        return ProcessHandle.current().descendants()
                .filter(ProcessHandle::isAlive)
                .filter(process -> process.info().arguments().map(List::of).orElse(List.of()).contains(WorkerClasses.MAIN_CLASS))
                .map(ProcessHandle::pid)
                .toList();
    }

    static List<String> keys(List<JobResult> results) {
        return results.stream().map(JobResult::key).toList();
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class UnmutatedSuite {

        WorkerPool pool;
        Baseline baseline;
        final List<String> progress = new ArrayList<>();

        @BeforeAll
        void runTheBaseline() {
            pool = WorkerPool.open(settings("baseline"), setup());
            baseline = pool.baseline(progress::add);
        }

        @AfterAll
        void close() {
            pool.close();
        }

        RecordedTest test(String id) {
            RecordedTest test = baseline.test(id);
            assertTrue(test != null, () -> "no test " + id + " in " + baseline.tests());
            return test;
        }

        @Test
        void isGreen_andTellsEachFinishedTestAsItGoes() {
            assertTrue(baseline.green(), () -> baseline.failures() + " " + baseline.failedContainers());
            long ran = baseline.tests().stream().filter(test -> test.status() != TestStatus.SKIPPED).count();
            assertEquals(ran, progress.size());
            assertTrue(progress.contains("PricesTest > addsTwoNumbers()"), progress::toString);
        }

        @Test
        void recordsThePointsEachTestReaches() {
            assertArrayEquals(new int[] {0}, test(method("PricesTest", "addsTwoNumbers")).reached());
            assertArrayEquals(new int[] {1}, test(method("PricesTest", "multiplies")).reached());
            assertArrayEquals(new int[] {2}, test(method("HostileTest", "countsToThree")).reached());
            assertArrayEquals(new int[] {8}, test(method("HostileTest", "measuresDepth")).reached());
        }

        @Test
        void countsTheClassSetupInTheCostOfRunningATestAlone() {
            RecordedTest first = test(method("SetupTest", "first"));
            assertTrue(first.aloneNanos() > first.nanos(), first::toString);
        }

        @Test
        void givesPointsReachedInClassSetupToEveryTestOfTheClass() {
            assertArrayEquals(new int[] {5}, test(method("SetupTest", "first")).reached());
            assertArrayEquals(new int[] {5}, test(method("SetupTest", "second")).reached());
        }

        @Test
        void keepsStaticInitialisationApart_whenTheClassWasPreinitialised() {
            assertArrayEquals(new int[] {7}, baseline.reachedWhileInitialising());
            assertArrayEquals(new int[0], test(method("RatesTest", "hasABase")).reached());
            assertEquals(1, baseline.initialisationFailures().size(), baseline.initialisationFailures()::toString);
            assertTrue(baseline.initialisationFailures().get(0).startsWith("shop.Missing: ClassNotFoundException"),
                    baseline.initialisationFailures()::toString);
        }

        @Test
        void findsNestedAndParameterisedTests() {
            String nested = "[engine:junit-jupiter]/[class:shop.PricesTest]/[nested-class:WhenEmpty]/[method:addsNothing()]";
            assertEquals(TestStatus.PASSED, test(nested).status());
            assertEquals("PricesTest > WhenEmpty > addsNothing()", test(nested).name());
            long invocations = baseline.tests().stream().filter(test -> test.id().contains("[test-template:doubles(int)]")).count();
            assertEquals(2, invocations);
        }

        @Test
        void leavesOutClassesTheDefaultPatternsDoNotName() {
            assertTrue(baseline.tests().stream().noneMatch(test -> test.id().contains("PriceChecks")));
            assertTrue(baseline.tests().stream().noneMatch(test -> test.id().contains("StaticInnerTest")));
            assertTrue(baseline.tests().stream().anyMatch(test -> test.id().contains("TaggedTest")));
        }

        @Test
        void reportsDisabledTestsAsSkipped_andBrokenAssumptionsAsAborted() {
            assertEquals(TestStatus.SKIPPED, test(method("PricesTest", "disabled")).status());
            assertEquals("kept for later", test(method("PricesTest", "disabled")).message());
            RecordedTest assuming = test(method("PricesTest", "assumesSomething"));
            assertEquals(TestStatus.ABORTED, assuming.status());
            assertTrue(assuming.message().contains("not here"), assuming.message());
        }

        @Test
        void namesTheClassOfEachTest() {
            assertEquals("shop.PricesTest", test(method("PricesTest", "addsTwoNumbers")).className());
        }

        @Test
        void choosesThePassingTestsThatReachAPoint() {
            List<String> tests = baseline.testsFor(6);
            assertEquals(List.of(), tests);
            List<String> reachingTimes = baseline.testsFor(1);
            assertEquals(3, reachingTimes.size());
            assertTrue(reachingTimes.containsAll(List.of(method("PricesTest", "multiplies"),
                    method("PricesTest", "multipliesTwos"), method("PricesTest", "multipliesByOne"))));
        }

        @Test
        void killsWithTheFirstFailingTest_afterTheOnesThatPass() {
            JobResult result = run(job("m0", 0, method("PricesTest", "addsZero"), method("PricesTest", "addsTwoNumbers")));
            assertEquals(Outcome.KILLED, result.outcome());
            assertEquals(method("PricesTest", "addsTwoNumbers"), result.testId());
            assertTrue(result.message().startsWith("AssertionFailedError: expected: <5> but was: <-1>"), result.message());
            assertEquals(List.of(TestStatus.PASSED, TestStatus.FAILED), result.testsRun().stream().map(TestRun::status).toList());
        }

        @Test
        void survivesWhenEveryTestPasses() {
            String nested = "[engine:junit-jupiter]/[class:shop.PricesTest]/[nested-class:WhenEmpty]/[method:addsNothing()]";
            JobResult result = run(job("m0", 0, method("PricesTest", "addsZero"), nested));
            assertEquals(Outcome.SURVIVED, result.outcome());
            assertNull(result.testId());
            assertEquals(List.of(method("PricesTest", "addsZero"), nested), result.testsRun().stream().map(TestRun::testId).toList());
        }

        @Test
        void stopsAtTheFirstFailure() {
            JobResult result = run(job("m1", 1, method("PricesTest", "multipliesTwos"), method("PricesTest", "multiplies"),
                    method("PricesTest", "multipliesByOne")));
            assertEquals(Outcome.KILLED, result.outcome());
            assertEquals(method("PricesTest", "multiplies"), result.testId());
            assertEquals(2, result.testsRun().size());
        }

        @Test
        void killsOnAnErrorAsOnABrokenAssertion() {
            JobResult result = run(job("m8", 8, method("HostileTest", "measuresDepth")));
            assertEquals(Outcome.KILLED, result.outcome());
            assertTrue(result.message().startsWith("StackOverflowError"), result.message());
        }

        @Test
        void killsWhenTheClassSetupFails() {
            JobResult result = run(job("m5", 5, method("SetupTest", "second")));
            assertEquals(Outcome.KILLED, result.outcome());
            assertEquals(method("SetupTest", "second"), result.testId());
            assertEquals("IllegalStateException: bad setup", result.message());
        }

        @Test
        void runsOneInvocationOfAParameterisedTest() {
            List<String> invocations = baseline.tests().stream().map(RecordedTest::id)
                    .filter(id -> id.contains("[test-template:doubles(int)]")).sorted().toList();
            JobResult zero = run(job("m0", 0, invocations.get(0)));
            JobResult four = run(job("m0", 0, invocations.get(1)));
            assertEquals(Outcome.SURVIVED, zero.outcome());
            assertEquals(1, zero.testsRun().size());
            assertEquals(Outcome.KILLED, four.outcome());
            assertEquals(invocations.get(1), four.testId());
        }

        @Test
        void switchesThePointsOffAfterEachJob() {
            assertEquals(Outcome.KILLED, run(job("m0", 0, method("PricesTest", "addsTwoNumbers"))).outcome());
            JobResult after = run(MutantJob.schema("none", new int[0], List.of(method("PricesTest", "addsTwoNumbers")), GENEROUS));
            assertEquals(Outcome.SURVIVED, after.outcome());
        }

        @Test
        void neitherAnAbortedNorAMissingTestKills() {
            JobResult result = run(job("m0", 0, method("PricesTest", "assumesSomething"), method("PricesTest", "noSuchTest")));
            assertEquals(Outcome.SURVIVED, result.outcome(), result::toString);
            assertEquals(List.of(TestStatus.ABORTED, TestStatus.MISSING), result.testsRun().stream().map(TestRun::status).toList());
        }

        @Test
        void tellsEachResult_andReturnsThemInJobOrder() {
            List<String> told = Collections.synchronizedList(new ArrayList<>());
            List<JobResult> results = pool.run(List.of(job("a", 0, method("PricesTest", "addsZero")),
                    job("b", 0, method("PricesTest", "addsTwoNumbers")), job("c", 1, method("PricesTest", "multiplies"))),
                    result -> told.add(result.key()));
            assertEquals(List.of("a", "b", "c"), keys(results));
            assertEquals(List.of("a", "b", "c"), told);
            assertEquals(1, pool.workersStarted());
        }

        JobResult run(MutantJob job) {
            List<JobResult> results = pool.run(List.of(job), result -> { });
            assertEquals(1, results.size());
            return results.get(0);
        }
    }

    @Nested
    class Deadlines {

        @Test
        void stopsALoopThroughMutatedCodeInPlace_andKeepsTheWorker() {
            try (WorkerPool pool = WorkerPool.open(settings("deadline"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        MutantJob.schema("loops", new int[] {2}, List.of(method("PricesTest", "addsZero"), method("HostileTest", "countsToThree")), 1_000),
                        job("after", 0, method("PricesTest", "addsTwoNumbers"))), result -> { });
                assertEquals(Outcome.TIMED_OUT, results.get(0).outcome());
                assertEquals(method("HostileTest", "countsToThree"), results.get(0).testId());
                assertTrue(results.get(0).message().endsWith("; stopped in place"), results.get(0).message());
                assertEquals(List.of(TestStatus.PASSED, TestStatus.STOPPED), results.get(0).testsRun().stream().map(TestRun::status).toList());
                assertEquals(Outcome.KILLED, results.get(1).outcome());
                assertEquals(1, pool.workersStarted(), "the stopped test's class passes unmutated, so the worker goes on");
            }
        }

        @Test
        void killsAWorkerWhoseLoopSwallowsTheStop_andGoesOnInAFreshOne() {
            List<List<Long>> workersWhenTold = new ArrayList<>();
            try (WorkerPool pool = WorkerPool.open(settings("swallowed"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        MutantJob.schema("retries", new int[] {12}, List.of(method("HostileTest", "retries")), 1_000),
                        job("after", 0, method("PricesTest", "addsTwoNumbers"))),
                        result -> workersWhenTold.add(liveWorkers()));
                assertEquals(Outcome.TIMED_OUT, results.get(0).outcome());
                assertEquals(method("HostileTest", "retries"), results.get(0).testId());
                assertTrue(results.get(0).message().endsWith("the worker was ended"), results.get(0).message());
                assertEquals(List.of(), workersWhenTold.get(0), "the killed worker is gone before its result is told");
                assertEquals(Outcome.KILLED, results.get(1).outcome());
                assertEquals(2, pool.workersStarted());
            }
        }

        /**
         * The hoarding loop passes no switch, so the stop sent at its 100 ms deadline cannot end it; the heap running out
         * (an array every 20 ms: after about a quarter of a second in the 96 MB heap) does, a failure of the test's own,
         * which kills the mutant as it would under any longer deadline. A test of the same class runs first, and the
         * deadline is long, so that starting the request on a busy machine cannot use up the deadline before the
         * hoarding test passes its one switch (a stop that arrives before that stops the test, as it should).
         */
        @Test
        void aTestThatFailsByItselfPastItsDeadline_withNoSwitchThrowing_killsTheMutant() {
            try (WorkerPool pool = WorkerPool.open(settings("own-failure"), setup())) {
                JobResult result = pool.run(List.of(
                        MutantJob.schema("loads the class", new int[0], List.of(method("HostileTest", "measuresDepth")), 10_000),
                        MutantJob.schema("hogs", new int[] {4}, List.of(method("HostileTest", "hogs")), 100)), done -> { }).get(1);
                assertEquals(Outcome.KILLED, result.outcome(), result::toString);
                assertTrue(result.message().startsWith("OutOfMemoryError"), result.message());
                assertEquals(List.of(TestStatus.FAILED), result.testsRun().stream().map(TestRun::status).toList());
                assertTrue(result.nanos() > 100_000_000L, "the heap ran out after the deadline: " + result.nanos() / 1_000_000 + " ms");
            }
        }

        /** Stopped in place in its first test, the mutant goes on with the next one, which fails normally: killed by it. */
        @Test
        void aMutantStoppedInOneTest_goesOnWithTheRest_andAFailureThereKillsIt() {
            try (WorkerPool pool = WorkerPool.open(settings("resumed"), setup())) {
                JobResult result = pool.run(List.of(MutantJob.schema("loops-then-fails", new int[] {0, 2},
                        List.of(method("HostileTest", "countsToThree"), method("PricesTest", "addsTwoNumbers")), 1_000)),
                        done -> { }).get(0);
                assertEquals(Outcome.KILLED, result.outcome(), result::toString);
                assertEquals(method("PricesTest", "addsTwoNumbers"), result.testId());
                assertEquals(List.of(TestStatus.STOPPED, TestStatus.FAILED), result.testsRun().stream().map(TestRun::status).toList());
                assertTrue(result.message().contains("stopped at its deadline"), result.message());
                assertEquals(1, pool.workersStarted(), "the stop and the failure both leave the worker fit");
            }
        }

        /** The stop unwinds the test before it tidies its class's shared note, so the class fails unmutated afterwards. */
        @Test
        void replacesTheWorker_whenTheStoppedTestsClassFailsUnmutatedAfterTheStop() {
            try (WorkerPool pool = WorkerPool.open(settings("untidy"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        MutantJob.schema("loops", new int[] {2}, List.of(method("NotepadTest", "notesThenCounts")), 1_000),
                        job("after", 0, method("NotepadTest", "findsNoNote"))), result -> { });
                assertEquals(Outcome.TIMED_OUT, results.get(0).outcome());
                assertTrue(results.get(0).message().endsWith("stopped in place"), results.get(0).message());
                assertEquals(Outcome.SURVIVED, results.get(1).outcome(), "the fresh worker's note is clean");
                assertEquals(2, pool.workersStarted());
            }
        }

        /** Under one deadline for the whole mutant, the loop would run for the 30 s the second test is allowed. */
        @Test
        void givesEachStepItsOwnDeadline_soALoopInTheFirstTestIsStoppedAfterThatTestsAllowance() {
            MutantJob loops = new MutantJob("loops", new int[] {2},
                    List.of(method("HostileTest", "countsToThree"), method("PricesTest", "addsZero")),
                    new long[] {0, 30_000_000_000L}, new dev.changeling.execution.Deadlines(1, 500), null);
            try (WorkerPool pool = WorkerPool.open(settings("steps"), setup())) {
                JobResult result = pool.run(List.of(loops), done -> { }).get(0);
                assertEquals(Outcome.TIMED_OUT, result.outcome());
                assertEquals(method("HostileTest", "countsToThree"), result.testId());
                // The fresh worker ran the first test once unmutated to warm up, so its class is no longer new to it.
                assertEquals("no answer within 500 ms; stopped in place", result.message());
                assertTrue(result.nanos() < 5_000_000_000L, "stopped after " + result.nanos() / 1_000_000 + " ms");
            }
        }

        @Test
        void killsTheProcessesATestStarted() throws Exception {
            assumeTrue(Files.isExecutable(Path.of("/bin/sleep")) || Files.isExecutable(Path.of("/usr/bin/sleep")),
                    "needs the sleep command (Unix)");
            Path pidFile = project.root.resolve("target/child.pid");
            Files.deleteIfExists(pidFile);
            try (WorkerPool pool = WorkerPool.open(settings("children"), setup())) {
                List<JobResult> results = pool.run(List.of(MutantJob.schema("spawns", new int[] {9},
                        List.of(method("HostileTest", "spawns")), 5_000)), result -> { });
                assertEquals(Outcome.TIMED_OUT, results.get(0).outcome());
            }
            long child = Long.parseLong(Files.readString(pidFile).strip());
            assertFalse(ProcessHandle.of(child).map(ProcessHandle::isAlive).orElse(false), "child process " + child + " still alive");
        }
    }

    @Nested
    class LeftoverState {

        /**
         * The first mutant's test fails before it cleans the sheet its class shares, which stays dirty in that
         * worker; the second mutant does not touch the sheet, yet its test fails there. Under Maven, with only the
         * second mutant applied, the sheet starts clean and the test passes.
         */
        @Test
        void aKillWhoseTestAlsoFailsUnmutatedIsRunAgainInAFreshWorker() {
            try (WorkerPool pool = WorkerPool.open(settings("leftover"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        job("dirties", 11, method("SharedSheetTest", "writesOneMark")),
                        job("innocent", 0, method("SharedSheetTest", "findsTheSheetClean"))), result -> { });
                assertEquals(List.of(Outcome.KILLED, Outcome.SURVIVED), results.stream().map(JobResult::outcome).toList(),
                        results::toString);
            }
        }
    }

    /** With every test run, each failing test is recorded, and the check on unmutated code covers each of them. */
    @Nested
    class EveryTest {

        @Test
        void recordsEveryFailingTest_andKeepsTheFirstAsTheKiller() {
            try (WorkerPool pool = WorkerPool.open(settings("every"), setup())) {
                List<String> tests = List.of(method("PricesTest", "multipliesTwos"), method("PricesTest", "multiplies"),
                        method("PricesTest", "multipliesByOne"));
                List<JobResult> results = pool.run(List.of(job("first", 1, tests.toArray(String[]::new)),
                        job("every", 1, tests.toArray(String[]::new)).runningEveryTest()), result -> { });
                JobResult first = results.get(0);
                JobResult every = results.get(1);
                assertEquals(List.of(method("PricesTest", "multiplies")), first.failedTests());
                assertEquals(2, first.testsRun().size(), "without it the run stops at the first failure");
                assertEquals(Outcome.KILLED, every.outcome());
                assertEquals(method("PricesTest", "multiplies"), every.testId());
                assertEquals(List.of(method("PricesTest", "multiplies"), method("PricesTest", "multipliesByOne")), every.failedTests());
                assertEquals(List.of(TestStatus.PASSED, TestStatus.FAILED, TestStatus.FAILED),
                        every.testsRun().stream().map(TestRun::status).toList());
            }
        }

        @Test
        void survivesAsBefore_withEveryTestRunAndNoneFailing() {
            try (WorkerPool pool = WorkerPool.open(settings("every-survives"), setup())) {
                JobResult result = pool.run(List.of(job("passes", 0, method("PricesTest", "addsZero"),
                        method("PricesTest", "multiplies")).runningEveryTest()), done -> { }).get(0);
                assertEquals(Outcome.SURVIVED, result.outcome());
                assertEquals(List.of(), result.failedTests());
                assertEquals(2, result.testsRun().size());
            }
        }

        /**
         * The first mutant leaves the shared sheet dirty in its worker. The second fails one test by its own doing and
         * one by the dirty sheet; the check of its first killer alone would pass, so each killer is checked, and the
         * mutant runs again in a fresh worker, where only its own failure is left.
         */
        @Test
        void aSecondKillerThatAlsoFailsUnmutated_sendsTheMutantToAFreshWorker() {
            try (WorkerPool pool = WorkerPool.open(settings("every-leftover"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        job("dirties", 11, method("SharedSheetTest", "writesOneMark")),
                        job("innocent", 0, method("PricesTest", "addsTwoNumbers"),
                                method("SharedSheetTest", "findsTheSheetClean")).runningEveryTest()), result -> { });
                JobResult innocent = results.get(1);
                assertEquals(Outcome.KILLED, innocent.outcome(), results::toString);
                assertEquals(List.of(method("PricesTest", "addsTwoNumbers")), innocent.failedTests(), innocent::toString);
                assertEquals(List.of(TestStatus.FAILED, TestStatus.PASSED), innocent.testsRun().stream().map(TestRun::status).toList());
            }
        }

        /**
         * The loop is stopped in place at its step's deadline. A run that stops at the first failure never reaches the
         * loop, so the failure before it decides: killed, as without every test, the detail saying how the run ended.
         */
        @Test
        void aFailureBeforeALoop_killsTheMutantAsWithoutEveryTest_andTheLoopIsStillStoppedInPlace() {
            try (WorkerPool pool = WorkerPool.open(settings("every-timeout"), setup())) {
                JobResult result = pool.run(List.of(MutantJob.schema("fails-then-loops", new int[] {0, 2},
                        List.of(method("PricesTest", "addsTwoNumbers"), method("HostileTest", "countsToThree")), 1_000)
                        .runningEveryTest()), done -> { }).get(0);
                assertEquals(Outcome.KILLED, result.outcome(), result::toString);
                assertEquals(method("PricesTest", "addsTwoNumbers"), result.testId());
                assertTrue(result.message().endsWith("; a later test then ended the run: no answer within 3000 ms; stopped in place"),
                        result.message());
                assertEquals(List.of(method("PricesTest", "addsTwoNumbers")), result.failedTests());
                assertEquals(List.of(TestStatus.FAILED, TestStatus.STOPPED), result.testsRun().stream().map(TestRun::status).toList());
                assertEquals(1, pool.workersStarted(), "the killer passes unmutated and the stopped class too: the worker goes on");
            }
        }

        /** The exit comes after the failure; a run that stops at the first failure would not have reached it. */
        @Test
        void aFailureBeforeACrash_killsTheMutant_andTheDeadWorkerIsReplaced() {
            try (WorkerPool pool = WorkerPool.open(settings("every-crash"), setup())) {
                List<JobResult> results = pool.run(List.of(MutantJob.schema("fails-then-exits", new int[] {0, 3},
                        List.of(method("PricesTest", "addsTwoNumbers"), method("HostileTest", "checksOut")), GENEROUS)
                        .runningEveryTest(), job("after", 0, method("PricesTest", "addsZero"))), done -> { });
                JobResult crashed = results.get(0);
                assertEquals(Outcome.KILLED, crashed.outcome(), crashed::toString);
                assertEquals(List.of(method("PricesTest", "addsTwoNumbers")), crashed.failedTests());
                assertTrue(crashed.message().contains("; a later test then ended the run: the worker JVM exited with code 7"),
                        crashed.message());
                assertEquals(Outcome.SURVIVED, results.get(1).outcome(), "the next mutant runs in a live worker");
            }
        }
    }

    @Nested
    class ColdStart {

        /** The worker starts its launcher when it runs its first tests; here that takes 3 s, beyond the mutants' deadlines. */
        @Test
        void aFreshWorkersStartIsNotChargedToItsFirstMutant_evenAfterATimeout() {
            WorkerSettings slow = settings("cold").toBuilder().jvmArguments(List.of("-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC",
                    "-Dshop.slowStart=3000")).build();
            try (WorkerPool pool = WorkerPool.open(slow, setup())) {
                List<JobResult> results = pool.run(List.of(
                        MutantJob.schema("loops", new int[] {2}, List.of(method("HostileTest", "countsToThree")), 2_000),
                        MutantJob.schema("fails", new int[] {0}, List.of(method("PricesTest", "addsTwoNumbers")), 2_000),
                        MutantJob.schema("passes", new int[] {0}, List.of(method("PricesTest", "addsZero")), 2_000)), result -> { });
                assertEquals(List.of(Outcome.TIMED_OUT, Outcome.KILLED, Outcome.SURVIVED), results.stream().map(JobResult::outcome).toList(),
                        results::toString);
                assertEquals(1, pool.workersStarted(), "the loop was stopped in place");
            }
        }
    }

    @Nested
    class Crashes {

        @Test
        void reportsSystemExitAsCrashed_exhaustedMemoryAsKilled_andGoesOnInAFreshWorkerAfterEach() {
            try (WorkerPool pool = WorkerPool.open(settings("crash"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        job("exits", 3, method("HostileTest", "checksOut")),
                        job("hogs", 4, method("HostileTest", "hogs")),
                        job("after", 0, method("PricesTest", "addsTwoNumbers"))), result -> { });
                assertEquals(Outcome.CRASHED, results.get(0).outcome());
                assertEquals(method("HostileTest", "checksOut"), results.get(0).testId());
                assertTrue(results.get(0).message().contains("exited with code 7"), results.get(0).message());
                assertTrue(results.get(0).message().endsWith("; again in a fresh worker"), results.get(0).message());
                // the error fails the test as Surefire's own run would fail it; no JVM flag of ours turns it into an exit
                assertEquals(Outcome.KILLED, results.get(1).outcome());
                assertTrue(results.get(1).message().startsWith("OutOfMemoryError"), results.get(1).message());
                assertEquals(Outcome.KILLED, results.get(2).outcome());
                // one for each job, and one more for the exit, which is confirmed in a fresh worker
                assertEquals(4, pool.workersStarted());
            }
        }

        /**
         * The till test sends its worker's pid the first time it runs, and waits; the worker is then killed from
         * outside, as kill -9 or the kernel's out-of-memory killer would. Exit 137 is 128 + 9, SIGKILL's number:
         * how the JDK reports a process ended by a signal on Unix (java.lang.Process#exitValue, from memory).
         */
        @Test
        void aWorkerKilledFromOutside_isNoCrash_theMutantRunsAgainInAFreshWorkerThatGivesTheVerdict() throws Exception {
            assumeTrue(!System.getProperty("os.name").startsWith("Windows"), "exit codes of killed processes are Unix's");
            Path marker = project.root.resolve("target/till-marker");
            Files.deleteIfExists(marker);
            try (java.net.ServerSocket till = new java.net.ServerSocket(0, 1, java.net.InetAddress.getLoopbackAddress())) {
                WorkerSettings settings = settings("killed-outside").toBuilder().systemProperties(java.util.Map.of(
                        "shop.till", Integer.toString(till.getLocalPort()), "shop.tillMarker", marker.toString())).build();
                Thread killer = new Thread(() -> killTheWorkerThatCalls(till), "killer");
                killer.start();
                try (WorkerPool pool = WorkerPool.open(settings, setup())) {
                    List<JobResult> results = pool.run(List.of(job("warm", 0, method("PricesTest", "addsZero")),
                            job("till", 0, method("TillTest", "addsUpTheTill"))), result -> { });
                    killer.join();
                    JobResult tallied = results.get(1);
                    assertEquals(Outcome.KILLED, tallied.outcome(), tallied::toString);
                    assertTrue(tallied.message().startsWith("AssertionFailedError"), tallied.message());
                    assertTrue(tallied.message().endsWith("; the first worker died (exit 137) and the mutant ran again in a fresh one"),
                            tallied.message());
                    assertEquals(2, pool.workersStarted());
                }
            }
        }

        private void killTheWorkerThatCalls(java.net.ServerSocket till) {
            try (java.net.Socket call = till.accept()) {
                String pid = new java.io.BufferedReader(new java.io.InputStreamReader(call.getInputStream())).readLine();
                ProcessHandle worker = ProcessHandle.of(Long.parseLong(pid.strip())).orElseThrow();
                worker.destroyForcibly();
                worker.onExit().join();
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }
    }

    /**
     * A worker the tool is done with exits as a test JVM exits, so the tests' shutdown hooks run: a folder marked
     * {@code deleteOnExit} (by {@code ScratchTest}) is gone once the worker has been replaced or stopped.
     */
    @Nested
    class Ending {

        Path scratch(String name) {
            return project.root.resolve("target/scratch-" + name);
        }

        WorkerSettings marking(String name) {
            return settings(name).toBuilder().systemProperties(java.util.Map.of("shop.scratch", scratch(name).toString())).build();
        }

        MutantJob marks() {
            return job("marks", 6, method("ScratchTest", "keepsAScratchFolderWhileTheJvmRuns"));
        }

        @Test
        void aWorkerEndedAfterALoopThatSwallowsTheStop_runsItsShutdownHooks() {
            try (WorkerPool pool = WorkerPool.open(marking("swallowing"), setup())) {
                List<JobResult> results = pool.run(List.of(job("warm", 0, method("PricesTest", "addsZero")), marks(),
                        MutantJob.schema("retries", new int[] {12}, List.of(method("HostileTest", "retries")), 1_000)),
                        result -> { });
                assertFalse(Files.exists(scratch("swallowing")), "the worker was killed before its shutdown hooks ran");
                assertEquals(Outcome.TIMED_OUT, results.get(2).outcome());
                assertTrue(results.get(2).message().endsWith("the worker was ended"), results.get(2).message());
            }
        }

        @Test
        void aWorkerReplacedAfterItsHeapRanOut_runsItsShutdownHooks() {
            try (WorkerPool pool = WorkerPool.open(marking("hoarding"), setup())) {
                List<JobResult> results = pool.run(List.of(job("warm", 0, method("PricesTest", "addsZero")), marks(),
                        job("hogs", 4, method("HostileTest", "hogs"))), result -> { });
                assertEquals(Outcome.KILLED, results.get(2).outcome());
                assertFalse(Files.exists(scratch("hoarding")), "the worker was killed before its shutdown hooks ran");
            }
        }

        @Test
        void workersStoppedMidTest_runTheirShutdownHooks() throws Exception {
            CountDownLatch marked = new CountDownLatch(2);
            try (WorkerPool pool = WorkerPool.open(marking("stopped"), setup())) {
                Thread stopper = new Thread(() -> {
                    try {
                        marked.await();
                        pool.stop();
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                });
                stopper.start();
                List<JobResult> results = pool.run(List.of(job("warm", 0, method("PricesTest", "addsZero")), marks(),
                        MutantJob.schema("loops", new int[] {2}, List.of(method("HostileTest", "countsToThree")), 600_000)),
                        result -> marked.countDown());
                stopper.join();
                assertEquals(List.of("warm", "marks"), keys(results));
                assertEquals(List.of(), liveWorkers());
                assertFalse(Files.exists(scratch("stopped")), "the worker was killed before its shutdown hooks ran");
            }
        }
    }

    @Nested
    class Recycling {

        @Test
        void replacesAWorkerAfterItsShareOfMutants_evenOneThatLeftAThreadRunning() {
            try (WorkerPool pool = WorkerPool.open(settings("recycle").toBuilder().mutantsPerWorker(2).build(), setup())) {
                List<JobResult> results = pool.run(List.of(
                        job("leaks", 10, method("HostileTest", "leaks")),
                        job("b", 0, method("PricesTest", "addsZero")),
                        job("c", 0, method("PricesTest", "addsTwoNumbers"))), result -> { });
                assertEquals(List.of(Outcome.SURVIVED, Outcome.SURVIVED, Outcome.KILLED), results.stream().map(JobResult::outcome).toList());
                assertEquals(2, pool.workersStarted());
                assertEquals(1, liveWorkers().size());
            }
            assertEquals(List.of(), liveWorkers());
        }

        @Test
        void emptiesTheWorkersTempFolderWhenItIsReplaced() throws Exception {
            WorkerSettings settings = settings("temp").toBuilder().mutantsPerWorker(1).build();
            Path temp = settings.workDirectory().resolve("tmp-1");
            try (WorkerPool pool = WorkerPool.open(settings, setup())) {
                pool.run(List.of(job("a", 0, method("PricesTest", "addsZero"))), result -> { });
                assertTrue(Files.isDirectory(temp));
                Files.writeString(temp.resolve("left-by-a-test.txt"), "x");
                pool.run(List.of(job("b", 0, method("PricesTest", "addsZero"))), result -> { });
                assertFalse(Files.exists(temp.resolve("left-by-a-test.txt")));
            }
        }
    }

    @Nested
    class MutantsCompiledAlone {

        @Test
        void runInAFreshWorkerOfTheirOwn_withTheirClassesFirst() throws Exception {
            Path alone = project.compileAlone("or", TinyProject.PRICES.replace("a + b;", "a | b;"));
            try (WorkerPool pool = WorkerPool.open(settings("alone"), setup())) {
                List<JobResult> results = pool.run(List.of(
                        MutantJob.alone("or-killed", alone, List.of(method("PricesTest", "addsTwoNumbers")), GENEROUS),
                        MutantJob.alone("or-survived", alone, List.of(method("PricesTest", "addsZero")), GENEROUS),
                        job("schema", 0, method("PricesTest", "addsZero"))), result -> { });
                assertEquals(List.of(Outcome.KILLED, Outcome.SURVIVED, Outcome.SURVIVED), results.stream().map(JobResult::outcome).toList());
                assertEquals(3, pool.workersStarted());
                assertEquals(1, liveWorkers().size(), "only the shared worker stays");
            }
        }
    }

    @Nested
    class Filters {

        @Test
        void runsTheClassesGiven_leavesOutExcludedTags_andWithoutPreinitialisationTheTestReachesTheInitialiser() {
            List<String> classes = new ArrayList<>(testClassNames().stream().filter(name -> !name.contains("Hostile")).toList());
            classes.add("shop.PriceChecks");
            SuiteSetup setup = SuiteSetup.of(TinyProject.POINTS, classes).withTags(List.of(), List.of("slow"));
            try (WorkerPool pool = WorkerPool.open(settings("filters"), setup)) {
                Baseline baseline = pool.baseline(name -> { });
                assertTrue(baseline.tests().stream().noneMatch(test -> test.id().contains("HostileTest")));
                assertTrue(baseline.tests().stream().noneMatch(test -> test.id().contains("TaggedTest")));
                assertTrue(baseline.tests().stream().anyMatch(test -> test.id().contains("PriceChecks")));
                // a static nested class is not found through the class around it; Maven's default exclude leaves it out too
                assertTrue(baseline.tests().stream().noneMatch(test -> test.id().contains("StaticInnerTest")));
                assertTrue(baseline.tests().stream().anyMatch(test -> test.id().contains("[nested-class:WhenEmpty]")), baseline.tests()::toString);
                assertArrayEquals(new int[] {7}, baseline.test(method("RatesTest", "hasABase")).reached());
                assertArrayEquals(new int[0], baseline.reachedWhileInitialising());
            }
        }
    }

    @Nested
    class Stopping {

        @Test
        void returnsWhatFinished_killsTheRest_andRunsNothingMore() throws Exception {
            CountDownLatch twoTold = new CountDownLatch(2);
            try (WorkerPool pool = WorkerPool.open(settings("stop"), setup())) {
                Thread stopper = new Thread(() -> {
                    try {
                        twoTold.await();
                        pool.stop();
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                });
                stopper.start();
                List<JobResult> results = pool.run(List.of(
                        job("a", 0, method("PricesTest", "addsZero")),
                        job("b", 0, method("PricesTest", "addsTwoNumbers")),
                        MutantJob.schema("loops", new int[] {2}, List.of(method("HostileTest", "countsToThree")), 600_000),
                        job("d", 0, method("PricesTest", "addsTwoNumbers"))), result -> twoTold.countDown());
                stopper.join();
                assertEquals(List.of("a", "b"), keys(results));
                assertTrue(pool.stopped());
                assertEquals(List.of(), liveWorkers());
                assertEquals(List.of(), pool.run(List.of(job("e", 0, method("PricesTest", "addsZero"))), result -> { }));
                assertThrows(CancellationException.class, () -> pool.baseline(name -> { }));
            }
        }
    }

    /** The same suite on the oldest platform the worker supports, compiled as it is against a newer one. */
    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class OnPlatform110 {

        WorkerPool pool;
        Baseline baseline;

        @BeforeAll
        void runTheBaseline() {
            List<Path> jars = MavenJars.resolve(MavenJars.PLATFORM_1_10);
            assumeTrue(jars != null, "JUnit Platform 1.10.2 is neither in the local Maven repository nor to be fetched with mvn");
            List<Path> classpath = new ArrayList<>(List.of(project.testClasses, project.classes));
            classpath.addAll(jars);
            pool = WorkerPool.open(WorkerSettings.builder(project.root, classpath, project.root.resolve("target/changeling/platform-1.10"))
                    .workers(1).mutantsPerWorker(100).maxHeap("96m")
                    .startTimeout(Duration.ofMinutes(1)).baselineTimeout(Duration.ofMinutes(5)).build(), setup());
            baseline = pool.baseline(name -> { });
        }

        @AfterAll
        void close() {
            if (pool != null) {
                pool.close();
            }
        }

        @Test
        void recordsTheSameTestsAndReach() {
            assertTrue(baseline.green(), () -> baseline.failures() + " " + baseline.failedContainers());
            assertArrayEquals(new int[] {5}, baseline.test(method("SetupTest", "second")).reached());
            assertArrayEquals(new int[] {0}, baseline.test(method("PricesTest", "addsTwoNumbers")).reached());
            assertEquals(2, baseline.testsFor(0).stream().filter(id -> id.contains("[test-template:doubles(int)]")).count());
            assertEquals(TestStatus.SKIPPED, baseline.test(method("PricesTest", "disabled")).status());
        }

        @Test
        void killsAndSurvives_andFindsNoMissingTest() {
            String invocation = baseline.tests().stream().map(RecordedTest::id)
                    .filter(id -> id.contains("[test-template:doubles(int)]")).sorted().toList().get(1);
            List<JobResult> results = pool.run(List.of(
                    job("killed", 0, method("PricesTest", "addsZero"), method("PricesTest", "addsTwoNumbers")),
                    job("survived", 1, method("PricesTest", "multipliesTwos")),
                    job("invocation", 0, invocation),
                    job("missing", 0, method("PricesTest", "noSuchTest"))), result -> { });
            assertEquals(List.of(Outcome.KILLED, Outcome.SURVIVED, Outcome.KILLED, Outcome.SURVIVED),
                    results.stream().map(JobResult::outcome).toList());
            assertEquals(method("PricesTest", "addsTwoNumbers"), results.get(0).testId());
            assertEquals(TestStatus.MISSING, results.get(3).testsRun().get(0).status());
        }
    }

    @Nested
    class WhenTheToolEnds {

        /** Runs {@link PoolHolder} in a JVM of its own and returns it with the pid of the worker it started. */
        long[] holder(String mode) throws Exception {
            List<String> command = new ArrayList<>(List.of(WorkerSettings.currentJava().toString(), "-cp",
                    TinyProject.codeSource(WorkerPool.class) + java.io.File.pathSeparator + TinyProject.codeSource(PoolHolder.class),
                    PoolHolder.class.getName(), mode, project.root.toString(), project.testClasses.toString(),
                    project.root.resolve("target/changeling/holder-" + mode).toString(), method("PricesTest", "addsZero")));
            project.classpath().forEach(entry -> command.add(entry.toString()));
            Process holder = new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD).start();
            String line = new java.io.BufferedReader(new java.io.InputStreamReader(holder.getInputStream())).readLine();
            assertTrue(line != null, "the holder printed no worker pid");
            return new long[] {holder.pid(), Long.parseLong(line.strip())};
        }

        static void assertGone(long pid) throws Exception {
            java.util.Optional<ProcessHandle> worker = ProcessHandle.of(pid);
            if (worker.isPresent()) {
                worker.get().onExit().get(60, java.util.concurrent.TimeUnit.SECONDS);
            }
            assertFalse(ProcessHandle.of(pid).map(ProcessHandle::isAlive).orElse(false), "worker " + pid + " outlived the tool");
        }

        @Test
        void exitingWithoutClosingThePool_killsTheWorkersOnShutdown() throws Exception {
            long[] pids = holder("exit");
            ProcessHandle.of(pids[0]).ifPresent(tool -> tool.onExit().join());
            assertGone(pids[1]);
        }

        @Test
        void aToolKilledOutright_isNoticedByTheWorkerItself() throws Exception {
            long[] pids = holder("wait");
            ProcessHandle tool = ProcessHandle.of(pids[0]).orElseThrow();
            tool.destroyForcibly();
            tool.onExit().join();
            assertGone(pids[1]);
        }
    }

    @Nested
    class StartFailures {

        @Test
        void aJavaThatIsNotThere_isAUserError() {
            try (WorkerPool pool = WorkerPool.open(settings("no-java").toBuilder().javaExecutable(project.root.resolve("no/such/java")).build(), setup())) {
                dev.changeling.UserError error = assertThrows(dev.changeling.UserError.class,
                        () -> pool.run(List.of(job("a", 0, method("PricesTest", "addsZero"))), result -> { }));
                assertTrue(error.getMessage().startsWith("cannot start a worker JVM with "), error.getMessage());
            }
        }

        @Test
        void aJvmThatDiesAtOnce_isAUserErrorThatShowsItsLastWords() {
            try (WorkerPool pool = WorkerPool.open(settings("bad-option").toBuilder().jvmArguments(List.of("-XX:+NoSuchOptionAnywhere")).build(), setup())) {
                dev.changeling.UserError error = assertThrows(dev.changeling.UserError.class, () -> pool.baseline(name -> { }));
                assertTrue(error.getMessage().contains("exited with code 1"), error.getMessage());
                assertTrue(error.getMessage().contains("NoSuchOptionAnywhere"), error.getMessage());
            }
        }
    }

    /** JUnit 4 tests, run through the vintage engine. */
    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class OnJUnit4 {

        static final String TESTS = """
                package shop;

                import static org.junit.Assert.assertEquals;

                import org.junit.BeforeClass;
                import org.junit.Ignore;
                import org.junit.Test;

                public class LegacyPricesTest {
                    static int value;
                    @BeforeClass public static void setUp() {
                        value = Prices.setupValue();
                        if (value < 0) { throw new IllegalStateException("bad setup"); }
                    }
                    @Test public void addsTwoNumbers() { assertEquals(5, Prices.add(2, 3)); }
                    @Test public void addsZero() { assertEquals(2, Prices.add(2, 0)); }
                    @Test public void readsTheSetup() { assertEquals(1, value); }
                    @Ignore("kept for later") @Test public void ignored() { }
                }
                """;

        WorkerPool pool;
        Baseline baseline;

        String test(String method) {
            return "[engine:junit-vintage]/[runner:shop.LegacyPricesTest]/[test:" + method + "(shop.LegacyPricesTest)]";
        }

        @BeforeAll
        void runTheBaseline() throws Exception {
            List<Path> jars = MavenJars.resolve(MavenJars.JUNIT_4);
            assumeTrue(jars != null, "JUnit 4.13.2 and its engine are neither in the local Maven repository nor to be fetched with mvn");
            Path testClasses = project.root.resolve("target/junit4-test-classes");
            Path source = project.root.resolve("src/junit4/shop/LegacyPricesTest.java");
            Files.createDirectories(source.getParent());
            Files.writeString(source, TESTS);
            TinyProject.compile(List.of(source), List.of(jars.get(0), project.classes), testClasses);
            List<Path> classpath = new ArrayList<>(List.of(testClasses, project.classes));
            classpath.addAll(jars);
            classpath.addAll(TinyProject.junitJars());
            WorkerSettings settings = WorkerSettings.builder(project.root, classpath, project.root.resolve("target/changeling/junit4"))
                    .workers(1).maxHeap("96m").build();
            pool = WorkerPool.open(settings, SuiteSetup.of(TinyProject.POINTS, TinyProject.defaultTestClasses(testClasses)));
            baseline = pool.baseline(name -> { });
        }

        @AfterAll
        void close() {
            if (pool != null) {
                pool.close();
            }
        }

        @Test
        void recordsEachTestWithItsReach_classSetupIncluded() {
            assertTrue(baseline.green(), () -> baseline.failures() + " " + baseline.failedContainers());
            assertArrayEquals(new int[] {0, 5}, baseline.test(test("addsTwoNumbers")).reached());
            assertArrayEquals(new int[] {5}, baseline.test(test("readsTheSetup")).reached());
            assertEquals(TestStatus.SKIPPED, baseline.test(test("ignored")).status());
        }

        @Test
        void killsAtTheFirstFailure_includingAFailedClassSetup_andSkipsWhatIsNotThere() {
            List<JobResult> results = pool.run(List.of(
                    job("add", 0, test("addsZero"), test("addsTwoNumbers"), test("readsTheSetup")),
                    job("setup", 5, test("readsTheSetup")),
                    job("missing", 0, test("noSuchTest"))), result -> { });
            assertEquals(List.of(Outcome.KILLED, Outcome.KILLED, Outcome.SURVIVED), results.stream().map(JobResult::outcome).toList(), results::toString);
            assertEquals(test("addsTwoNumbers"), results.get(0).testId());
            assertEquals(2, results.get(0).testsRun().size());
            assertEquals("IllegalStateException: bad setup", results.get(1).message());
            assertEquals(TestStatus.MISSING, results.get(2).testsRun().get(0).status());
        }

        @Test
        void logsTheEnginesDiscoveryNoticesOnlyUntilSingleTestsRun() throws Exception {
            pool.run(List.of(job("a", 0, test("addsZero")), job("b", 0, test("addsZero")), job("c", 0, test("addsZero"))), result -> { });
            String log = Files.readString(project.root.resolve("target/changeling/junit4/worker-1.log"));
            long notices = log.lines().filter(line -> line.contains("non-critical issue during test discovery")).count();
            assertTrue(notices <= 2, () -> notices + " notices in\n" + log);
        }
    }
}
