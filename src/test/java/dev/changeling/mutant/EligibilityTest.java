package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/** Every registered operator together: no mutant where one cannot mean anything or cannot compile by construction. */
class EligibilityTest {

    private static List<Point> points(String source) {
        JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("Example.java", source));
        assertTrue(parsed.ok(), () -> "does not parse: " + parsed.problem());
        return new PointFinder(Operators.all()).find(parsed);
    }

    /** The points whose host lies inside the first occurrence of {@code marker}. */
    private static List<Point> inside(String source, String marker) {
        int at = source.indexOf(marker);
        assertTrue(at >= 0, marker);
        return points(source).stream()
                .filter(point -> at <= point.host().begin() && point.host().end() <= at + marker.length())
                .toList();
    }

    @Nested
    class Annotations {

        private static final String SOURCE = """
                @interface Limit {
                    int value() default 2 + 3;
                    boolean strict() default !false;
                }

                class Plot {
                    @Limit(value = 4 * 5, strict = true)
                    @SuppressWarnings("unused" + "")
                    int rows(int a) {
                        return a + 1;
                    }
                }
                """;

        @Test
        void noMutant_inAnnotationValues() {
            assertEquals(List.of(), inside(SOURCE, "@Limit(value = 4 * 5, strict = true)"));
            assertEquals(List.of(), inside(SOURCE, "@SuppressWarnings(\"unused\" + \"\")"));
        }

        @Test
        void noMutant_inAnnotationTypeDefaults() {
            assertEquals(List.of(), inside(SOURCE, "int value() default 2 + 3;"));
            assertEquals(List.of(), inside(SOURCE, "boolean strict() default !false;"));
        }

        @Test
        void theMethodBelowTheAnnotations_isStillMutated() {
            assertFalse(inside(SOURCE, "return a + 1;").isEmpty());
        }
    }

    @Nested
    class CaseLabels {

        private static final String SOURCE = """
                class Season {
                    static final int WINTER = 12;

                    String name(int month, String word) {
                        switch (month) {
                            case 1 + 1:
                                return "feb";
                            case WINTER:
                                return "dec";
                            default:
                                break;
                        }
                        return switch (word) {
                            case "spring", "summer" -> "warm";
                            default -> month > 6 ? "late" : "early";
                        };
                    }
                }
                """;

        @Test
        void noMutant_inCaseLabels() {
            assertEquals(List.of(), inside(SOURCE, "1 + 1"));
            assertEquals(List.of(), inside(SOURCE, "\"spring\", \"summer\""));
        }

        @Test
        void theArmsAreStillMutated() {
            assertFalse(inside(SOURCE, "month > 6").isEmpty());
            assertFalse(inside(SOURCE, "\"warm\"").isEmpty());
        }
    }

    @Nested
    class ConstantInitialisers {

        private static final String SOURCE = """
                interface Sizes {
                    int TRAY = 6 * 4;
                }

                class Plot {
                    static final int ROWS = 10 + 2;
                    static final String NAME = "bed " + 1;
                    static final boolean WIDE = ROWS > 8;
                    private final int depth = 3;
                    private int loose = 7;

                    int area(int width) {
                        final int margin = -1;
                        return width * ROWS + margin;
                    }
                }
                """;

        @Test
        void noMutant_inConstantFinalInitialisers() {
            assertEquals(List.of(), inside(SOURCE, "6 * 4"));
            assertEquals(List.of(), inside(SOURCE, "10 + 2"));
            assertEquals(List.of(), inside(SOURCE, "\"bed \" + 1"));
            assertEquals(List.of(), inside(SOURCE, "= 3;"));
            assertEquals(List.of(), inside(SOURCE, "-1;"));
        }

        @Test
        void finalInitialisersThatAreNotLiteralOnly_andNonFinalOnes_areMutated() {
            assertFalse(inside(SOURCE, "ROWS > 8").isEmpty());
            assertFalse(inside(SOURCE, "7;").isEmpty());
        }
    }

    @Nested
    class GeneratedTypes {

        @Test
        void noMutant_inATypeMarkedGenerated() {
            String source = """
                    @javax.annotation.processing.Generated("by a tool")
                    class Stub {
                        int f(int a) {
                            return a + 1;
                        }
                    }
                    """;
            assertEquals(List.of(), points(source));
        }
    }
}
