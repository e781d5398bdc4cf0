package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/** A per-line budget: which of a changed line's points it keeps, that it counts the others, and that k-order follows. */
class LineBudgetTest {

    /** A hand-made point: only the file, line, operator, place and fingerprint matter to a budget. */
    private static Point point(int line, String operator, int begin, String fingerprint) {
        Span edit = new Span(begin, begin + 1);
        return new Point("src/main/java/Pump.java", "Pump", "flow(int)", operator, HostKind.EXPRESSION, edit, edit, "x",
                "a < b", "a change", line, false, fingerprint);
    }

    private static List<String> kept(LineBudget budget, List<Point> points) {
        return budget.keep(points, new HashMap<>()).stream().map(Point::fingerprint).toList();
    }

    private static LineBudget oneALine(Map<String, Double> killRatios) {
        return new LineBudget(1, killRatios);
    }

    @Nested
    class WithoutHistory {

        @Test
        void keepsTheOperatorFirstInTheCatalogue() {
            List<Point> line = List.of(point(4, "statement-removal", 10, "c"), point(4, "arithmetic-swap", 12, "b"),
                    point(4, "relational-subset", 14, "a"));

            assertEquals(List.of("a"), kept(oneALine(Map.of()), line));
        }

        @Test
        void tiesOfOneOperator_goToTheEarlierPlace_thenTheSmallerFingerprint() {
            List<Point> line = List.of(point(4, "relational-subset", 20, "a"), point(4, "relational-subset", 12, "z"),
                    point(4, "relational-subset", 12, "m"));

            assertEquals(List.of("m"), kept(oneALine(Map.of()), line));
        }

        @Test
        void eachLineKeepsItsOwn_andTheOrderOfThePointsStays() {
            List<Point> points = List.of(point(7, "arithmetic-swap", 40, "e"), point(3, "arithmetic-swap", 5, "b"),
                    point(3, "relational-subset", 8, "a"), point(7, "statement-removal", 30, "f"));

            assertEquals(List.of("e", "a"), kept(oneALine(Map.of()), points));
        }
    }

    @Nested
    class WithHistory {

        private final List<Point> line = List.of(point(4, "relational-subset", 10, "a"), point(4, "arithmetic-swap", 12, "b"),
                point(4, "statement-removal", 14, "c"));

        @Test
        void theOperatorDetectedMostOftenInTheLastFullRun_isKept() {
            assertEquals(List.of("b"), kept(oneALine(Map.of("relational-subset", 0.5, "arithmetic-swap", 0.9,
                    "statement-removal", 0.7)), line));
        }

        @Test
        void equalRatios_fallBackToTheCatalogue() {
            assertEquals(List.of("b"), kept(oneALine(Map.of("statement-removal", 0.8, "arithmetic-swap", 0.8)), line));
        }

        @Test
        void anOperatorWithoutHistory_ranksAfterThoseWithOne_evenAFirstInTheCatalogue() {
            assertEquals(List.of("c"), kept(oneALine(Map.of("statement-removal", 0.1)), line));
        }
    }

    @Nested
    class Counting {

        @Test
        void everyPointLeftOut_isCountedUnderTheBudget() {
            List<Point> points = List.of(point(4, "relational-subset", 10, "a"), point(4, "arithmetic-swap", 12, "b"),
                    point(4, "statement-removal", 14, "c"), point(9, "arithmetic-swap", 50, "d"));
            Map<String, Integer> notMade = new HashMap<>(Map.of("logging call", 2));

            List<Point> kept = new LineBudget(2, Map.of()).keep(points, notMade);

            assertEquals(List.of("a", "b", "d"), kept.stream().map(Point::fingerprint).toList());
            assertEquals(Map.of("logging call", 2, LineBudget.REASON, 1), notMade);
        }

        @Test
        void noBudget_keepsEveryPoint_andCountsNothing() {
            List<Point> points = List.of(point(4, "relational-subset", 10, "a"), point(4, "arithmetic-swap", 12, "b"));
            Map<String, Integer> notMade = new HashMap<>();

            assertEquals(points, LineBudget.NONE.keep(points, notMade));
            assertEquals(Map.of(), notMade);
        }

        @Test
        void theNote_saysHowManyWereLeftOut_andWhatRankedThem() {
            assertTrue(oneALine(Map.of()).describe(3).contains("3 left out"));
            assertTrue(oneALine(Map.of()).describe(3).contains("catalogue order"));
            assertTrue(oneALine(Map.of("arithmetic-swap", 0.5)).describe(0).contains("last full run"));
        }
    }

    @Nested
    class ThroughGeneration {

        private static final String VALVE = """
                class Valve {
                    int open(int seconds, int cap) {
                        if (seconds <= 0 || seconds > cap) {
                            return seconds + cap * 2;
                        }
                        int left = cap - seconds;
                        return left < 10 ? left + 1 : left - 1;
                    }
                }
                """;

        private Generation.Generated generate(List<Integer> orders, LineBudget budget) {
            MutantRequest request = new MutantRequest(Operators.all(), orders, HigherOrder.Scope.METHOD, 5L, point -> true)
                    .withBudget(budget);
            return Generation.generate(List.of(SourceFile.of("src/main/java/Valve.java", VALVE)), request);
        }

        @Test
        void keepsOneMutantOnEachLine_andCountsTheRest() {
            Generation.Generated all = generate(List.of(1), LineBudget.NONE);
            Generation.Generated budgeted = generate(List.of(1), oneALine(Map.of()));

            Set<Integer> lines = all.mutants().stream().map(mutant -> mutant.first().line()).collect(Collectors.toSet());
            assertEquals(lines.size(), budgeted.mutants().size());
            assertEquals(lines, budgeted.mutants().stream().map(mutant -> mutant.first().line()).collect(Collectors.toSet()));
            assertEquals(all.mutants().size() - lines.size(), budgeted.notMade().get(LineBudget.REASON));
        }

        @Test
        void kOrderMutants_areMadeOnlyOfTheKeptPoints() {
            LineBudget twoALine = new LineBudget(2, Map.of());
            Set<String> keptPoints = generate(List.of(1), twoALine).mutants().stream()
                    .map(Mutant::fingerprint).collect(Collectors.toSet());
            List<Mutant> secondOrder = generate(List.of(2), twoALine).mutants();

            assertFalse(secondOrder.isEmpty(), "no second-order mutant to check");
            List<String> strays = new ArrayList<>();
            secondOrder.forEach(mutant -> mutant.points().stream().map(Point::fingerprint)
                    .filter(point -> !keptPoints.contains(point)).forEach(strays::add));
            assertEquals(List.of(), strays);
        }

        @Test
        void theSameTreeAndHistory_keepTheSameMutants() {
            LineBudget ranked = oneALine(Map.of("arithmetic-swap", 0.6, "relational-subset", 0.6, "return-value-blank", 0.2));

            assertEquals(generate(List.of(1, 2), ranked).mutants(), generate(List.of(1, 2), ranked).mutants());
        }
    }
}
