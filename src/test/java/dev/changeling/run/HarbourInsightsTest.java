package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The harbour sample with second-order mutants and the full kill matrix (seed 3 pairs the sump pump's two negations):
 * the insights and the HTML report name a redundant test, a subtle second-order mutant, the coupling ratio and an
 * undetected mutant of each of reach, infection and propagation.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HarbourInsightsTest {

    ToolRun run;
    String insights;
    String html;

    @BeforeAll
    void runAndReport(@TempDir Path temporary) throws IOException {
        run = ToolRun.onCopyOf("harbour", temporary.resolve("harbour"), "--orders", "1,2", "--every-test", "--seed", "3");
        assertNotNull(run.results(), run::transcript);
        insights = execute("insights", "--plain", "--top", "0", run.project().toString());
        Path page = temporary.resolve("report.html");
        execute("export", "--plain", "--html", page.toString(), run.project().toString());
        html = Files.readString(page);
    }

    private static String execute(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        assertEquals(ExitCode.OK, code, () -> String.join(" ", args) + "\n" + out + err);
        return out.toString();
    }

    @Test
    void theRunBuiltTheFullMatrix() {
        assertEquals(ExitCode.OK, run.exitCode(), run::transcript);
        assertTrue(run.results().mutants().stream().filter(mutant -> mutant.verdict().detected())
                .allMatch(mutant -> mutant.killers() != null && !mutant.killers().isEmpty()), run::transcript);
    }

    @Test
    void aTestThatKillsNothingAnotherDoesNot_isRedundant() {
        String redundant = section(insights, "redundant, every kill also made by another test");
        assertTrue(redundant.contains("countsASingleRound()"), insights);
    }

    @Test
    void theSumpPumpsTwoNegations_areASubtleSecondOrderMutant_besideTheCouplingRatio() {
        assertTrue(insights.contains("coupling ratio "), insights);
        String subtle = section(insights, "subtle, alive although every part alone is detected: 1");
        assertTrue(subtle.contains("SumpPump.java:7"), insights);
    }

    @Test
    void eachOfReachInfectionAndPropagation_hasAnUndetectedMutant() {
        String why = section(insights, "why the undetected went undetected");
        assertTrue(why.contains("not reached: "), insights);
        assertTrue(why.contains("reached, never infected: "), insights);
        assertTrue(why.contains("infected, not propagated: "), insights);
    }

    @Test
    void theHtmlReport_saysTheSame() {
        assertTrue(html.contains("countsASingleRound()"), "redundant test");
        assertTrue(html.contains("coupling ratio"), "coupling");
        assertTrue(html.contains("subtle, alive although every part alone is detected: 1"), "subtle");
        assertTrue(html.contains("not reached: ") && html.contains("reached, never infected")
                && html.contains("infected, not propagated"), "reach, infection, propagation");
    }

    /** The text from the line holding {@code start} to the next line that is not indented. */
    private static String section(String text, String start) {
        int from = text.indexOf(start);
        assertTrue(from >= 0, () -> "no '" + start + "' in\n" + text);
        StringBuilder section = new StringBuilder();
        boolean first = true;
        for (String line : text.substring(from).split("\n")) {
            if (!first && !line.startsWith("  ")) {
                break;
            }
            section.append(line).append('\n');
            first = false;
        }
        return section.toString();
    }
}
