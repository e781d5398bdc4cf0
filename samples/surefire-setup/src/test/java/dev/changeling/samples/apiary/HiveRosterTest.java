package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class HiveRosterTest {

    /** A relative path: found only when the test JVM runs in the pom's workingDirectory, the yard/ folder. */
    private static final Path ROSTER = Path.of("hives.csv");

    @Test
    void readsTheYardsRosterFromTheWorkingDirectory() throws IOException {
        assertTrue(Files.isRegularFile(ROSTER), () -> ROSTER.toAbsolutePath() + " is missing: not run in yard/");

        List<Hive> hives = HiveRoster.parse(Files.readString(ROSTER));

        assertEquals(List.of(new Hive("linden", 21_400), new Hive("clover", 19_850), new Hive("heather", 23_100)), hives);
    }

    @Test
    void aLineWithoutItsWeightIsRefused() {
        IllegalArgumentException refused = assertThrows(IllegalArgumentException.class, () -> HiveRoster.parse("# yard\nlinden\n"));

        assertTrue(refused.getMessage().startsWith("line 2:"), refused.getMessage());
    }
}
