package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The same settings read the same way, whatever order the pom or a map gave them in. */
class SuiteConfigurationTest {

    @Test
    void propertiesEnvironmentAndParameters_readInTheOrderOfTheirNames_soThatTheSameSettingsPrintTheSame() {
        SuiteConfiguration one = suite(ordered("apiary.units", "kg", "basedir", "/yard"), ordered("YARD", "north", "HIVES", "9"));
        SuiteConfiguration other = suite(ordered("basedir", "/yard", "apiary.units", "kg"), ordered("HIVES", "9", "YARD", "north"));

        assertEquals(one.toString(), other.toString());
        assertEquals(List.of("apiary.units", "basedir"), List.copyOf(one.systemProperties().keySet()));
        assertEquals(List.of("HIVES", "YARD"), List.copyOf(other.environment().keySet()));
    }

    private static SuiteConfiguration suite(Map<String, String> properties, Map<String, String> environment) {
        return new SuiteConfiguration(List.of("apiary.HiveTest"), "as the pom selects them", 0, List.of(), List.of(),
                properties, environment, environment, List.of(), Optional.empty(), Path.of("yard"), false, Optional.empty(), List.of());
    }

    private static Map<String, String> ordered(String... keysAndValues) {
        Map<String, String> map = new LinkedHashMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) {
            map.put(keysAndValues[i], keysAndValues[i + 1]);
        }
        return map;
    }
}
