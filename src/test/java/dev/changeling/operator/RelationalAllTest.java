package dev.changeling.operator;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.mutant.Point;
import java.util.List;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RelationalAllTest {

    static String site(String operator) {
        return "class C { boolean f(int a, int b) { return a " + operator + " b; } }";
    }

    /** The mutated texts of {@code a OP b}, white space dropped. */
    static TreeSet<String> mutated(String operator, MutationOperator mutationOperator) {
        String source = site(operator);
        List<Point> points = Mutate.points(source, mutationOperator);
        return points.stream().map(point -> point.mutatedHost(source).replace(" ", ""))
                .collect(Collectors.toCollection(TreeSet::new));
    }

    // King K.N. & Offutt A.J. (1991), "A Fortran language system for mutation-based software testing",
    // SP&E 21(7); also Ammann & Offutt, Introduction to Software Testing: each relational operator by
    // each of the other five, and the whole comparison by true and by false — 7 mutants per site.
    @ParameterizedTest
    @ValueSource(strings = {"<", "<=", ">", ">=", "==", "!="})
    void makesTheFullSetOfSeven(String operator) {
        TreeSet<String> expected = new TreeSet<>(List.of("true", "false"));
        for (String other : List.of("<", "<=", ">", ">=", "==", "!=")) {
            if (!other.equals(operator)) {
                expected.add("a" + other + "b");
            }
        }
        assertEquals(7, expected.size());
        assertEquals(expected, mutated(operator, new RelationalAll()));
        assertEquals(7, Mutate.points(site(operator), new RelationalAll()).size());
    }
}
