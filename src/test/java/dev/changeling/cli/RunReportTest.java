package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.analysis.LineCoverage;
import dev.changeling.analysis.Score;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.Verdict;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Set;
import java.util.Map;
import org.junit.jupiter.api.Test;

class RunReportTest {

    @Test
    void phases_inTheOrderTheyRan_inSeconds() {
        Map<String, Double> timings = new LinkedHashMap<>();
        timings.put("maven", 3405.3);
        timings.put("baseline", 2870.7);
        timings.put("total", 77771.1);
        assertEquals("time: maven 3.4 s · baseline 2.9 s · total 77.8 s", RunReport.phases(timings));
    }

    @Test
    void phases_ofAnOlderResultsFile_withoutTimings() {
        assertEquals("time: not recorded", RunReport.phases(Map.of()));
    }

    @Test
    void byFile_showsTheShareOfMutatedLinesRun_besideTheScore() {
        List<MutantResult> mutants = List.of(
                ResultsForTests.result("a1", "A.java", "op", 1, Verdict.KILLED),
                ResultsForTests.result("a2", "A.java", "op", 1, Verdict.SURVIVED),
                ResultsForTests.result("b1", "Bee.java", "op", 1, Verdict.STILLBORN));
        StringWriter text = new StringWriter();

        RunReport.fileTable(new PrintWriter(text, true), Score.of(mutants, Set.of()), LineCoverage.byFile(mutants, Set.of()));

        assertEquals("  A.java        2 mutants  score 0.50  lines run 1.00 · 1 unnoticed on them\n"
                + "  Bee.java      1 mutants  score —     lines run —\n", text.toString());
    }
}
