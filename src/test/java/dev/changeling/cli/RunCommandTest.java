package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RunCommandTest {

    @TempDir
    Path folder;

    private String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void aProjectNamedByHandNeedsItsSourcesClassesAndTestClasses() throws IOException {
        Files.createDirectories(folder.resolve("src"));
        String[] outcome = run("run", folder.toString(), "--source-root", folder.resolve("src").toString());
        assertEquals(Integer.toString(ExitCode.USAGE), outcome[0], outcome[2]);
        assertTrue(outcome[2].startsWith("changeling: a project Maven does not build needs --source-root, --classes and --test-classes"), outcome[2]);
        assertEquals(1, outcome[2].strip().lines().count(), outcome[2]);
    }

    @Test
    void aMinimumScoreOutsideZeroToOneIsRefusedBeforeAnythingRuns() {
        String[] outcome = run("run", folder.toString(), "--min-score", "1.5");
        assertEquals(Integer.toString(ExitCode.USAGE), outcome[0], outcome[2]);
        assertTrue(outcome[2].contains("--min-score takes a score from 0 to 1"), outcome[2]);
    }

    @Test
    void theHelpShowsEveryFormOfSkipTestsPattern() {
        String help = run("run", "--help")[1].replaceAll("\\s+", " ");
        for (String form : new String[] {"PerformanceTest is the simple name", "com.acme.perf.PerformanceTest the fully qualified",
            "'*IT'", "'*.perf.PerformanceTest'", "'com.acme.db.**'", "'**.perf.*'", "(Outer$Inner) follows its outer class",
            "matches no test class is noted"}) {
            assertTrue(help.contains(form), form + " is missing from: " + help);
        }
    }

    @Test
    void twoWaysOfNamingTheChangeAreRefused() {
        String[] outcome = run("run", folder.toString(), "--uncommitted", "--changed-since", "HEAD");
        assertEquals(Integer.toString(ExitCode.USAGE), outcome[0], outcome[2]);
        assertTrue(outcome[2].contains("give one of them"), outcome[2]);
    }
}
