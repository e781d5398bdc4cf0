package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The HTML report of a real run of the harbour sample, drawn by headless Chromium: the screenshot is a picture, not a
 * blank page, the browser logs nothing from the page's console, and the loaded DOM holds every part of the report.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class HtmlReportInChromiumTest {

    HeadlessChromium chromium;
    Path page;

    @BeforeAll
    void exportTheHarbourRun(@TempDir Path temporary) throws IOException {
        chromium = HeadlessChromium.find(Files.createDirectories(temporary.resolve("profiles"))).orElse(null);
        Assumptions.assumeTrue(chromium != null,
                "no chromium on the PATH: the browser check of the HTML report is skipped (Debian: apt-get install chromium)");
        ToolRun run = ToolRun.onCopyOf("harbour", temporary.resolve("harbour"));
        assertNotNull(run.results(), run::transcript);
        page = temporary.resolve("report.html");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true),
                "export", run.project().toString(), "--plain", "--html", page.toString());
        assertEquals(ExitCode.OK, exit, () -> out + "\n" + err);
    }

    @Test
    void theScreenshot_isAPicture_andThePageLogsNothing() throws IOException {
        Path png = page.resolveSibling("report.png");

        ExternalCommand.Ended drawn = chromium.screenshot(page, png);

        assertTrue(drawn.finished() && drawn.exitCode() == 0, drawn::output);
        BufferedImage image = ImageIO.read(png.toFile());
        assertNotNull(image, "not a PNG: " + png);
        assertEquals(1200, image.getWidth());
        Set<Integer> colours = new HashSet<>();
        long notWhite = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y) & 0xFFFFFF;
                colours.add(rgb);
                if (rgb != 0xFFFFFF) {
                    notWhite++;
                }
            }
        }
        // Thresholds: common practice, no source. A blank or unstyled page has a handful of colours (text
        // anti-aliasing only); the report's header band, verdict bar, strips and heat map give hundreds.
        assertTrue(colours.size() >= 50, colours.size() + " distinct colours");
        assertTrue(notWhite > image.getWidth() * image.getHeight() / 10, notWhite + " pixels that are not white");
        List<String> console = drawn.output().lines()
                .filter(line -> line.contains(":CONSOLE") || line.contains("Uncaught")).toList();
        assertEquals(List.of(), console, "the page logged to the console");
    }

    @Test
    void theLoadedDom_holdsEveryPartOfTheReport() {
        ExternalCommand.Ended dumped = chromium.dumpDom(page);

        assertTrue(dumped.finished() && dumped.exitCode() == 0, dumped::output);
        String dom = dumped.output();
        assertTrue(dom.contains("</html>"), dom);
        for (String heading : List.of("Mutation score", "By file and by operator", "Where the survivors are",
                "Which tests kill which operators", "Survivors to look at")) {
            assertTrue(dom.contains("<h2>" + heading + "</h2>"), heading + " missing in\n" + dom);
        }
        assertTrue(dom.contains("LockGate.java"), dom);
        assertTrue(dom.contains("<svg class=\"strip-bar\""), dom);
    }
}
