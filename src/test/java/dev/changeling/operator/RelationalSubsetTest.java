package dev.changeling.operator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.javaparser.StaticJavaParser;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.NameExpr;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RelationalSubsetTest {

    private static final List<String> OPERATORS = List.of("<", "<=", ">", ">=", "==", "!=");

    // Kaminski G., Ammann P. & Offutt J. (2011), "Better predicate testing", AST workshop (from memory,
    // as recorded in CHECKS.md; the Subsumption cases below check it by truth table).
    private static final Map<String, List<String>> SUFFICIENT = Map.of(
            "<", List.of("a<=b", "a!=b", "false"),
            "<=", List.of("a<b", "a==b", "true"),
            ">", List.of("a>=b", "a!=b", "false"),
            ">=", List.of("a>b", "a==b", "true"),
            "==", List.of("a<=b", "a>=b", "false"),
            "!=", List.of("a<b", "a>b", "true"));

    /** Truth tables over all pairs in this range; small, but it holds every ordering of two integers. */
    private static final int LOW = -3;
    private static final int HIGH = 3;

    @Nested
    class ReferenceTable {

        @ParameterizedTest
        @ValueSource(strings = {"<", "<=", ">", ">=", "==", "!="})
        void makesTheThreeSufficientReplacements(String operator) {
            assertEquals(new TreeSet<>(SUFFICIENT.get(operator)),
                    RelationalAllTest.mutated(operator, new RelationalSubset()));
        }
    }

    @Nested
    class Subsumption {

        @ParameterizedTest
        @ValueSource(strings = {"<", "<=", ">", ">=", "==", "!="})
        void theSubsetSubsumesTheOtherFourMutantsOfTheFullSet(String operator) {
            Expression original = StaticJavaParser.parseExpression("a" + operator + "b");
            Set<String> subset = RelationalAllTest.mutated(operator, new RelationalSubset());
            Set<String> full = RelationalAllTest.mutated(operator, new RelationalAll());
            assertTrue(full.containsAll(subset), "the subset is part of the full set");
            assertEquals(4, full.size() - subset.size());
            for (String kept : subset) {
                assertFalse(kills(original, kept).isEmpty(), kept + " is killed by some test");
            }
            for (String other : full) {
                if (subset.contains(other)) {
                    continue;
                }
                Set<List<Integer>> otherKills = kills(original, other);
                boolean subsumed = subset.stream().anyMatch(kept -> otherKills.containsAll(kills(original, kept)));
                assertTrue(subsumed, "every test set that kills the subset of " + operator + " also kills " + other);
            }
        }

        @ParameterizedTest
        @ValueSource(strings = {"<", "<=", ">", ">=", "==", "!="})
        void noneOfTheSubsetIsSubsumedByAnother_soAllThreeAreNeeded(String operator) {
            Expression original = StaticJavaParser.parseExpression("a" + operator + "b");
            List<String> subset = SUFFICIENT.get(operator);
            for (String kept : subset) {
                Set<List<Integer>> keptKills = kills(original, kept);
                boolean subsumedByAnother = subset.stream().filter(other -> !other.equals(kept))
                        .anyMatch(other -> keptKills.containsAll(kills(original, other)));
                assertFalse(subsumedByAnother, kept + " is needed beside the other two");
            }
        }
    }

    /** The inputs (a, b) on which {@code mutated} differs from {@code original}: the tests that kill it. */
    private static Set<List<Integer>> kills(Expression original, String mutated) {
        Expression mutant = StaticJavaParser.parseExpression(mutated);
        Set<List<Integer>> killing = new HashSet<>();
        for (int a = LOW; a <= HIGH; a++) {
            for (int b = LOW; b <= HIGH; b++) {
                if (evaluate(original, a, b) != evaluate(mutant, a, b)) {
                    killing.add(List.of(a, b));
                }
            }
        }
        return killing;
    }

    private static boolean evaluate(Expression expression, int a, int b) {
        if (expression instanceof BooleanLiteralExpr literal) {
            return literal.getValue();
        }
        BinaryExpr comparison = (BinaryExpr) expression;
        int left = valueOf(comparison.getLeft(), a, b);
        int right = valueOf(comparison.getRight(), a, b);
        return switch (comparison.getOperator()) {
            case LESS -> left < right;
            case LESS_EQUALS -> left <= right;
            case GREATER -> left > right;
            case GREATER_EQUALS -> left >= right;
            case EQUALS -> left == right;
            case NOT_EQUALS -> left != right;
            default -> throw new IllegalArgumentException("not a comparison: " + expression);
        };
    }

    private static int valueOf(Expression side, int a, int b) {
        return ((NameExpr) side).getNameAsString().equals("a") ? a : b;
    }
}
