package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class YardReportTest {

    private final Hive clover = new Hive("clover", 19_850);

    @Test
    void theYardComesFromTheEnvironment() {
        // set by the pom's environmentVariables
        assertEquals("north-meadow", System.getenv("APIARY_YARD"));
    }

    @Test
    void theUnitsComeFromASystemProperty() {
        // set by the pom's systemPropertyVariables
        assertEquals("kg", System.getProperty("apiary.units"));
    }

    @Test
    void reportsTheNetWeightInTheConfiguredUnits() {
        String line = YardReport.line(System.getenv("APIARY_YARD"), clover, 31_100, System.getProperty("apiary.units"));

        assertEquals("north-meadow/clover: 11.3 kg", line);
    }

    @Test
    void reportsPoundsWhenAskedTo() {
        // 4,536 g net / 453.59237 g per pound = 10.0 lb
        assertEquals("yard/clover: 10.0 lb", YardReport.line("yard", clover, 24_386, "lb"));
    }

    @Test
    void refusesOtherUnits() {
        assertThrows(IllegalArgumentException.class, () -> YardReport.line("yard", clover, 24_386, "st"));
    }
}
