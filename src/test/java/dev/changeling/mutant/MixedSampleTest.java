package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.SourceFile;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class MixedSampleTest {

    private static final String SOURCE = """
            class Pantry {
                int shelvesFor(int jars, int perShelf) {
                    if (jars <= 0 || perShelf <= 0) {
                        return 0;
                    }
                    return (jars + perShelf - 1) / perShelf;
                }

                boolean isFull(int jars, int shelves, int perShelf) {
                    return jars >= shelves * perShelf && shelves > 0;
                }

                int spare(int jars, int shelves, int perShelf) {
                    int room = shelves * perShelf - jars;
                    return room < 0 ? 0 : room;
                }
            }
            """;

    /** Every first-order mutant of the pantry and those of {@code order} combined within the file, as a mixed run makes them. */
    private static List<Mutant> population(int order) {
        MutantRequest request = new MutantRequest(Operators.defaults(), List.of(1, order), HigherOrder.Scope.FILE, 3,
                point -> true);
        return Generation.generate(List.of(SourceFile.of("src/main/java/Pantry.java", SOURCE)), request).mutants();
    }

    private static List<Mutant> ofOrder(List<Mutant> mutants, int order) {
        return mutants.stream().filter(mutant -> mutant.order() == order).toList();
    }

    private static Set<String> ids(List<Mutant> mutants) {
        return mutants.stream().map(Mutant::fingerprint).collect(Collectors.toSet());
    }

    @Nested
    class Picking {

        @ParameterizedTest
        @ValueSource(ints = {2, 3})
        void everyPartOfEachHigherOrderMutant_isInTheSample(int order) {
            List<Mutant> population = population(order);
            List<Mutant> picked = new MixedSample(3, 4, order).pick(population, 11);
            Set<String> chosen = ids(picked);
            List<Mutant> combined = ofOrder(picked, order);
            assertEquals(4, combined.size());
            for (Mutant mutant : combined) {
                for (Point part : mutant.points()) {
                    assertTrue(chosen.contains(part.fingerprint()), () -> "part " + part.fingerprint() + " of " + mutant.shortId() + " is missing");
                }
            }
        }

        @Test
        void theSameSeedGivesTheSameSample_anotherSeedAnother() {
            List<Mutant> population = population(2);
            MixedSample mix = new MixedSample(5, 3, 2);
            assertEquals(mix.pick(population, 11), mix.pick(population, 11));
            assertNotEquals(ids(mix.pick(population, 11)), ids(mix.pick(population, 12)));
        }

        @Test
        void theDrawnFirstOrderMutantsComeOnTopOfTheParts() {
            List<Mutant> population = population(2);
            List<Mutant> picked = new MixedSample(5, 3, 2).pick(population, 11);
            Set<String> parts = ofOrder(picked, 2).stream().flatMap(mutant -> mutant.points().stream())
                    .map(Point::fingerprint).collect(Collectors.toSet());
            long drawn = ofOrder(picked, 1).stream().filter(mutant -> !parts.contains(mutant.fingerprint())).count();
            assertTrue(ofOrder(picked, 1).size() >= 5 && drawn <= 5, () -> ofOrder(picked, 1).size() + " first-order, " + drawn + " not parts");
            assertEquals(ofOrder(picked, 1).size() - 5, countedAsParts(new MixedSample(5, 3, 2).describe(picked, population)));
        }

        @Test
        void noFirstOrderDrawn_leavesJustTheCombinedMutantsAndTheirParts() {
            List<Mutant> population = population(2);
            List<Mutant> picked = new MixedSample(0, 2, 2).pick(population, 11);
            assertEquals(2, ofOrder(picked, 2).size());
            assertEquals(4, ofOrder(picked, 1).size(), "two parts each, and the parts of one mutant never overlap another's");
        }

        @Test
        void keepsThePopulationsOrder() {
            List<Mutant> population = population(2);
            List<Mutant> picked = new MixedSample(4, 3, 2).pick(population, 5);
            List<Integer> positions = picked.stream().map(population::indexOf).toList();
            assertEquals(positions.stream().sorted().toList(), positions);
        }

        @Test
        void takesEveryMutantOfAnOrderWhenFewerExistThanAskedFor() {
            List<Mutant> population = population(2);
            List<Mutant> picked = new MixedSample(1_000, 1_000, 2).pick(population, 5);
            assertEquals(population, picked);
        }

        private static int countedAsParts(String description) {
            java.util.regex.Matcher matcher = java.util.regex.Pattern.compile(", and (\\d+) first-order part").matcher(description);
            assertTrue(matcher.find(), description);
            return Integer.parseInt(matcher.group(1));
        }
    }

    @Nested
    class Reading {

        @Test
        void readsFirstHigherAndOrder() {
            assertEquals(new MixedSample(30, 10, 2), MixedSample.parse("30:10:2"));
            assertEquals(List.of(1, 3), MixedSample.parse(" 0 : 5 : 3 ").orders());
        }

        @Test
        void refusesWhatIsNotThreeNumbers_anOrderOutOfRange_andNoCombinedMutant() {
            assertThrows(IllegalArgumentException.class, () -> MixedSample.parse("30:10"));
            assertThrows(IllegalArgumentException.class, () -> MixedSample.parse("a:10:2"));
            assertThrows(IllegalArgumentException.class, () -> MixedSample.parse("30:10:1"));
            assertThrows(IllegalArgumentException.class, () -> MixedSample.parse("30:10:6"));
            assertThrows(IllegalArgumentException.class, () -> MixedSample.parse("30:0:2"));
            assertThrows(IllegalArgumentException.class, () -> MixedSample.parse("-1:3:2"));
        }
    }
}
