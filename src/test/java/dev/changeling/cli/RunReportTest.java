package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.LinkedHashMap;
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
}
