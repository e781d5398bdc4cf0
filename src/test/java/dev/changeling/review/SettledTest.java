package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A fixed mark holds only until a later run finds its mutant surviving again. */
class SettledTest {

    private static final Instant MARKED = Instant.parse("2026-11-20T10:00:00Z");

    @TempDir
    Path root;

    private MutantResult survivor() {
        return ResultsForTests.result("cafe01".repeat(10) + "cafe", "src/main/java/Till.java", "relational-subset", 1, Verdict.SURVIVED);
    }

    private void resultsWrittenAt(Instant when) throws IOException {
        Path file = ProjectLayout.of(root).resultsFile();
        ResultsFile.write(file, ResultsForTests.run(List.of(survivor()), false, 0));
        Files.setLastModifiedTime(file, FileTime.from(when));
    }

    private void markedFixed() {
        TriageMarks.open(root, Clock.fixed(MARKED, ZoneOffset.UTC)).mark(survivor().id(), TriageMarks.Kind.FIXED, "test added");
    }

    @Test
    void aFixedMark_madeOnTheResultsInView_resolvesTheSurvivor() throws IOException {
        resultsWrittenAt(MARKED.minusSeconds(3600));
        markedFixed();

        assertTrue(Settled.load(root).resolved(survivor()));
    }

    @Test
    void aFixedMark_whoseMutantSurvivesALaterRun_isUnresolvedAgain() throws IOException {
        markedFixed();
        resultsWrittenAt(MARKED.plusSeconds(3600));

        assertFalse(Settled.load(root).resolved(survivor()), "the run after the mark finds it surviving: the killing test may be gone");
        TriageMarks.Mark mark = TriageMarks.open(root).get(survivor().id()).orElseThrow();
        assertTrue(mark.lapse().startsWith("marked fixed 2026-11-20T10:00:00Z, but the run since finds it survives again"), mark.lapse());
    }

    @Test
    void aNeedsTestMark_neverResolves_andNeverLapses() throws IOException {
        resultsWrittenAt(MARKED.plusSeconds(3600));
        TriageMarks.open(root, Clock.fixed(MARKED, ZoneOffset.UTC)).mark(survivor().id(), TriageMarks.Kind.NEEDS_TEST, null);

        assertFalse(Settled.load(root).resolved(survivor()));
        assertTrue(TriageMarks.open(root).get(survivor().id()).orElseThrow().standsFor(survivor(), Instant.MAX));
    }
}
