package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class HigherOrderTest {

    private static final String SOURCE = """
            class Scales {
                boolean balanced(int left, int right, int tolerance) {
                    if (left > right && left - right > tolerance) {
                        return false;
                    }
                    if (right > left && right - left > tolerance) {
                        return false;
                    }
                    return left >= 0 && right >= 0 && tolerance != 0;
                }

                int heavier(int left, int right) {
                    return left < right ? right : left == right ? 0 : left;
                }
            }
            """;

    private static List<Point> points() {
        return new PointFinder(Operators.all())
                .find(JavaSources.parse(SourceFile.of("src/main/java/Scales.java", SOURCE)));
    }

    private static List<String> ids(List<Mutant> mutants) {
        return mutants.stream().map(Mutant::fingerprint).toList();
    }

    @ParameterizedTest
    @ValueSource(ints = {2, 3, 4, 5})
    void sameSeedGivesTheSameMutants(int order) {
        assertEquals(ids(HigherOrder.combine(points(), order, HigherOrder.Scope.FILE, 7)),
                ids(HigherOrder.combine(points(), order, HigherOrder.Scope.FILE, 7)));
    }

    @Test
    void anotherSeedGivesOtherMutants() {
        assertNotEquals(ids(HigherOrder.combine(points(), 2, HigherOrder.Scope.FILE, 7)),
                ids(HigherOrder.combine(points(), 2, HigherOrder.Scope.FILE, 8)));
    }

    @ParameterizedTest
    @ValueSource(ints = {2, 3, 4, 5})
    void eachMutantHasKPointsAtDistinctNonOverlappingHosts(int order) {
        List<Mutant> mutants = HigherOrder.combine(points(), order, HigherOrder.Scope.FILE, 3);
        assertFalse(mutants.isEmpty());
        for (Mutant mutant : mutants) {
            assertEquals(order, mutant.order());
            for (int i = 0; i < order; i++) {
                for (int j = i + 1; j < order; j++) {
                    assertFalse(mutant.points().get(i).host().overlaps(mutant.points().get(j).host()),
                            "hosts overlap in " + mutant.points());
                }
            }
        }
    }

    @Test
    void aPointJoinsAtMostOneMutant() {
        Set<String> used = new HashSet<>();
        for (Mutant mutant : HigherOrder.combine(points(), 2, HigherOrder.Scope.FILE, 11)) {
            for (Point point : mutant.points()) {
                assertTrue(used.add(point.fingerprint()), "point used twice: " + point);
            }
        }
    }

    @Test
    void methodScopeKeepsEachMutantInsideOneMember() {
        for (Mutant mutant : HigherOrder.combine(points(), 2, HigherOrder.Scope.METHOD, 5)) {
            assertEquals(1, mutant.points().stream().map(Point::member).distinct().count());
        }
    }

    @Test
    void aKOrderMutantAppliesAllItsChanges() {
        Mutant mutant = HigherOrder.combine(points(), 3, HigherOrder.Scope.FILE, 5).get(0);
        String mutated = mutant.apply(SOURCE);
        for (Point point : mutant.points()) {
            assertTrue(mutated.contains(point.mutatedHost(SOURCE)), "missing " + point.mutatedHost(SOURCE));
        }
        assertTrue(JavaSources.parse(SourceFile.of("Scales.java", mutated)).ok());
    }

    @Test
    void anOrderOutsideTwoToFiveIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> HigherOrder.combine(points(), 6, HigherOrder.Scope.FILE, 1));
        assertThrows(IllegalArgumentException.class, () -> HigherOrder.combine(points(), 1, HigherOrder.Scope.FILE, 1));
    }
}
