package dev.changeling.terminal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.review.LineMarks;
import dev.changeling.review.LineMarks.Mark;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class LineStripTextTest {

    @Test
    void aShortFile_getsACharacterPerLine() {
        LineMarks file = new LineMarks("A.java", 10, new TreeMap<>(Map.of(3, Mark.SURVIVED, 5, Mark.DETECTED, 9, Mark.UNREACHED)));

        List<String> lines = new LineStripText(Style.plain()).render(file);

        assertEquals(List.of("  A.java", "    1 ..#.:...o. 10   survivor at 3 · unreached at 9"), lines);
    }

    @Test
    void aLongFile_isFoldedToTheWidth_eachCharacterShowingTheWorstOfItsLines() {
        LineMarks file = new LineMarks("B.java", 600, new TreeMap<>(Map.of(1, Mark.DETECTED, 5, Mark.SURVIVED, 600, Mark.DETECTED)));

        String strip = new LineStripText(Style.plain()).render(file).get(1);

        assertEquals("    1 #" + ".".repeat(LineStripText.WIDTH - 2) + ": 600   survivor at 5", strip);
    }

    @Test
    void coloured_paintsSurvivorsRed() {
        LineMarks file = new LineMarks("A.java", 2, new TreeMap<>(Map.of(2, Mark.SURVIVED)));

        String strip = new LineStripText(Style.coloured()).render(file).get(1);

        assertTrue(strip.contains(Style.coloured().red("#")), strip);
    }
}
