package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/**
 * Surefire's argLine: split as a shell splits (quotes group), {@code @{name}} filled in late from the project's
 * properties (Surefire's documentation of the argLine parameter and of late property evaluation).
 */
class ArgLineTest {

    final List<String> notices = new ArrayList<>();

    ArgLine parse(String line, Map<String, String> properties) {
        return ArgLine.parse(line, properties, notices::add);
    }

    @Test
    void splitsAtSpaces_andQuotesGroup() {
        assertEquals(List.of("-Dgreeting=hello world", "-ea", "--add-opens", "java.base/java.lang=ALL-UNNAMED"),
                parse("-Dgreeting=\"hello world\"  -ea\n --add-opens 'java.base/java.lang=ALL-UNNAMED'", Map.of()).arguments());
    }

    @Test
    void takesTheHeapApart() {
        ArgLine line = parse("-Xmx512m -Dunit=kg", Map.of());
        assertEquals(Optional.of("512m"), line.maxHeap());
        assertEquals(List.of("-Dunit=kg"), line.arguments());
    }

    @Test
    void fillsInLateReferences_fromTheProperties() {
        ArgLine line = parse("@{extra} -Dzone=${zone}", Map.of("extra", "-Xmx1g -Dfast=true", "zone", "north"));
        assertEquals(List.of("-Dfast=true", "-Dzone=north"), line.arguments());
        assertEquals(Optional.of("1g"), line.maxHeap());
        assertEquals(List.of(), notices);
    }

    @Test
    void dropsAReferenceNobodyDefines_withANotice() {
        ArgLine line = parse("@{agentLine} -Dunit=kg", Map.of());
        assertEquals(List.of("-Dunit=kg"), line.arguments());
        assertEquals(1, notices.size());
        assertEquals(true, notices.get(0).contains("@{agentLine}"), notices::toString);
    }

    @Test
    void anEmptyProperty_leavesNothing() {
        assertEquals(List.of(), parse("@{argLine}", Map.of("argLine", "")).arguments());
    }
}
