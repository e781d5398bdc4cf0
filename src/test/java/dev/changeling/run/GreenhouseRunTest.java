package dev.changeling.run;

import dev.changeling.project.ProjectLayout;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * One seeded sample of the greenhouse sample's mutants, run once by {@code changeling run --min-score 0.99}
 * with the real mvn and worker JVMs, then checked against Maven mutant by mutant, and for what the run left.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class GreenhouseRunTest {

    static final int SAMPLE = 24;
    /** A seed whose sample holds killed, surviving and stillborn mutants alike. */
    static final String SEED = "7";

    ToolRun run;

    @BeforeAll
    void runASampleOnACopy(@TempDir Path temporary) {
        run = ToolRun.onCopyOf("greenhouse", temporary.resolve("greenhouse"),
                "--sample", Integer.toString(SAMPLE), "--seed", SEED, "--min-score", "0.99");
        assertNotNull(run.results(), run::transcript);
    }

    @Nested
    class Results {

        @Test
        void areComplete_andHoldTheSampleAskedFor() {
            assertTrue(run.results().complete(), run::transcript);
            assertEquals(SAMPLE, run.results().mutants().size());
            assertTrue(run.results().settings().sampled());
            assertEquals(Long.parseLong(SEED), run.results().settings().seed());
            assertTrue(run.results().settings().population() > SAMPLE, () -> "population " + run.results().settings().population());
        }

        @Test
        void holdEveryKindOfVerdictTheMavenCheckNeeds() {
            Set<Verdict> seen = run.results().mutants().stream().map(MutantResult::verdict)
                    .collect(Collectors.toCollection(() -> EnumSet.noneOf(Verdict.class)));
            assertTrue(seen.containsAll(EnumSet.of(Verdict.KILLED, Verdict.SURVIVED, Verdict.STILLBORN)), seen::toString);
        }

        /** Greenhouse has no loop or recursion a relational mutant can make endless, so a deadline can only be missed falsely. */
        @Test
        void noMutantTimesOut_forNoneOfTheSampleCanLoop() {
            List<String> timedOut = run.withVerdict(Verdict.TIMED_OUT).stream()
                    .map(mutant -> mutant.shortId() + " " + mutant.detail() + "\n" + mutant.diff()).toList();
            assertEquals(List.of(), timedOut);
        }
    }

    @Nested
    class AgreementWithMaven {

        @Test
        void everyVerdict_isWhatMavenTestSaysOfTheMutantAppliedWithGit(@TempDir Path work) {
            List<MavenAgreement.Judged> judged = MavenAgreement.judge("greenhouse", run.results().mutants(), work);
            String figure = MavenAgreement.figure("greenhouse", judged);
            System.out.println(figure);
            assertTrue(judged.size() >= 20, figure);
            List<String> disagreements = judged.stream().filter(one -> !one.agrees()).map(MavenAgreement.Judged::describe).toList();
            assertEquals(List.of(), disagreements, figure);
        }
    }

    @Nested
    class MinimumScore {

        @Test
        void aScoreUnderIt_exitsWith3_andSaysSoInOneLine() {
            assertEquals(ExitCode.SCORE_TOO_LOW, run.exitCode(), run::transcript);
            List<String> lines = run.err().lines().filter(line -> line.contains("--min-score")).toList();
            assertEquals(1, lines.size(), run::transcript);
            assertTrue(lines.get(0).matches("changeling: \\d+ of \\d+ mutants detected is a score under --min-score 0\\.99"),
                    lines::toString);
        }

        @Test
        void stillWritesTheResultsAndTheReport() {
            assertTrue(Files.isRegularFile(ProjectLayout.of(run.project()).resultsFile()));
            assertTrue(run.out().contains("mutation score"), run::transcript);
        }
    }

    @Nested
    class WhatTheRunLeaves {

        @Test
        void everyFileOutsideTarget_isByteIdentical() {
            assertEquals(run.filesBefore(), run.filesAfter());
            assertFalse(run.filesBefore().isEmpty());
        }

        @Test
        void itsOwnFilesOnlyBelowTarget() {
            assertTrue(Files.isDirectory(run.project().resolve("target/changeling")));
            assertFalse(Files.exists(run.project().resolve(".changeling")));
        }

        @Test
        void noWorkerJvm() {
            assertEquals(List.of(), Workers.aliveFor(run.project()));
        }
    }
}
