package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class FingerprintTest {

    private static final String ORIGINAL = """
            package farm;

            class Silo {
                int fill(int grain, int capacity) {
                    if (grain > capacity) {
                        return capacity;
                    }
                    return grain;
                }

                boolean nearlyFull(int grain, int capacity) {
                    int margin = capacity / 10;
                    return grain >= capacity - margin;
                }
            }
            """;

    static List<Point> points(String text) {
        JavaSources.Parsed parsed = JavaSources.parse(SourceFile.of("src/main/java/farm/Silo.java", text));
        return new PointFinder(Operators.all()).find(parsed);
    }

    static Map<String, Point> byFingerprint(String text) {
        return points(text).stream().collect(Collectors.toMap(Point::fingerprint, Function.identity()));
    }

    static List<String> fingerprintsIn(String text, String member) {
        return points(text).stream().filter(p -> p.member().equals(member)).map(Point::fingerprint).toList();
    }

    @Nested
    class StaysTheSame {

        @Test
        void whenLinesAreInsertedAbove() {
            String edited = ORIGINAL.replace("package farm;\n", "package farm;\n\nimport java.util.List;\n// a note\n\n");
            assertEquals(byFingerprint(ORIGINAL).keySet(), byFingerprint(edited).keySet());
            assertNotEquals(points(ORIGINAL).get(0).line(), points(edited).get(0).line());
        }

        @Test
        void whenAnotherMethodIsReformatted() {
            String edited = ORIGINAL.replace("""
                        int margin = capacity / 10;
                        return grain >= capacity - margin;
                    """, """
                        int margin =
                            capacity / 10;
                        return grain   >=   capacity - margin;
                    """);
            assertEquals(fingerprintsIn(ORIGINAL, "fill(int,int)"), fingerprintsIn(edited, "fill(int,int)"));
            assertEquals(byFingerprint(ORIGINAL).keySet(), byFingerprint(edited).keySet(),
                    "white space is normalised out of the snippet, so even the reformatted method keeps its ids");
        }

        @Test
        void whenAnotherMethodIsEdited() {
            String edited = ORIGINAL.replace("return grain >= capacity - margin;",
                    "return grain > capacity - margin || grain == capacity;");
            assertEquals(fingerprintsIn(ORIGINAL, "fill(int,int)"), fingerprintsIn(edited, "fill(int,int)"));
            assertNotEquals(fingerprintsIn(ORIGINAL, "nearlyFull(int,int)"), fingerprintsIn(edited, "nearlyFull(int,int)"));
        }
    }

    @Nested
    class TellsApart {

        @Test
        void twoIdenticalEditsInOneMethod() {
            String twice = """
                    class Gate {
                        boolean open(int a, int b) {
                            if (a < b) {
                                return true;
                            }
                            return a < b;
                        }
                    }
                    """;
            List<Point> sameChange = points(twice).stream()
                    .filter(p -> p.operator().equals("relational-subset"))
                    .filter(p -> p.snippet().equals("a<b") && p.replacement().equals("<="))
                    .toList();
            assertEquals(2, sameChange.size());
            assertNotEquals(sameChange.get(0).fingerprint(), sameChange.get(1).fingerprint());
        }

        @Test
        void theSameChangeInTwoFiles() {
            Point here = points(ORIGINAL).get(0);
            Point there = new PointFinder(Operators.all())
                    .find(JavaSources.parse(SourceFile.of("src/main/java/farm/Barn.java", ORIGINAL))).get(0);
            assertNotEquals(here.fingerprint(), there.fingerprint());
        }
    }

    @Test
    void everyPointOfAFileHasItsOwnId() {
        List<Point> all = points(ORIGINAL);
        assertEquals(all.size(), all.stream().map(Point::fingerprint).distinct().count());
        assertTrue(all.size() > 4);
    }

    @Test
    void kOrderIdentityIgnoresTheOrderOfItsPoints() {
        List<Point> all = points(ORIGINAL);
        Point first = all.get(0);
        Point last = all.get(all.size() - 1);
        assertEquals(Fingerprint.ofCombination(List.of(first, last)), Fingerprint.ofCombination(List.of(last, first)));
        assertNotEquals(first.fingerprint(), Fingerprint.ofCombination(List.of(first, last)));
    }
}
