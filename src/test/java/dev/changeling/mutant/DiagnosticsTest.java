package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Code whose only effect is diagnostics gets no mutant by default, is counted as not made, and is made when asked. */
class DiagnosticsTest {

    private static final String KILN = """
            import java.util.ArrayList;
            import java.util.List;
            import org.slf4j.Logger;

            class Kiln extends Workshop {
                private static final Logger LOG = null;
                private final List<String> log = new ArrayList<>();

                int fire(int heat) {
                    LOG.info("heat {}", heat + 1);
                    log.add("fired at " + (heat - 1));
                    assert heat > 0 : "cold";
                    logger.debug("inherited " + (heat * 2));
                    if (heat > 900) {
                        heat = heat - 1;
                    }
                    return heat;
                }

                @Override
                public String toString() {
                    return "Kiln" + (1 + 2);
                }
            }
            """;

    private static List<Point> points(PointFinder finder) {
        JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("Kiln.java", KILN));
        assertTrue(parsed.ok(), () -> "does not parse: " + parsed.problem());
        return finder.find(parsed);
    }

    private static List<Point> on(List<Point> points, String text) {
        int at = KILN.indexOf(text);
        return points.stream().filter(point -> at <= point.host().begin() && point.host().end() <= at + text.length()).toList();
    }

    @Test
    void loggerCalls_asserts_andToString_areNotMade_andCountedByReason() {
        PointFinder finder = new PointFinder(Operators.all(), false, point -> true);
        List<Point> made = points(finder);

        assertEquals(List.of(), on(made, "LOG.info(\"heat {}\", heat + 1);"), "a call on a field declared as a Logger");
        assertEquals(List.of(), on(made, "logger.debug(\"inherited \" + (heat * 2));"), "an inherited field named logger");
        assertEquals(List.of(), on(made, "assert heat > 0 : \"cold\";"));
        assertEquals(List.of(), on(made, "return \"Kiln\" + (1 + 2);"));
        Map<String, Integer> notMade = finder.notMade();
        assertEquals(List.of(Diagnostics.ASSERT, Diagnostics.TO_STRING, Diagnostics.LOGGING), List.copyOf(notMade.keySet()));
        assertTrue(notMade.values().stream().allMatch(count -> count > 0), notMade::toString);
    }

    @Test
    void aFieldNamedLog_ofAnotherType_isMutatedAsAnyCode() {
        List<Point> made = points(new PointFinder(Operators.all(), false, point -> true));

        assertFalse(on(made, "log.add(\"fired at \" + (heat - 1));").isEmpty(), "a List named log is no logger");
        assertFalse(on(made, "heat = heat - 1;").isEmpty());
    }

    @Test
    void askedFor_everyPointIsMade_withTheSameFingerprints() {
        PointFinder asked = new PointFinder(Operators.all(), true, point -> true);
        List<Point> all = points(asked);
        List<Point> byDefault = points(new PointFinder(Operators.all(), false, point -> true));

        assertTrue(asked.notMade().isEmpty());
        assertFalse(on(all, "LOG.info(\"heat {}\", heat + 1);").isEmpty());
        assertTrue(all.containsAll(byDefault), "leaving diagnostics out changes no other point's identity");
    }
}
