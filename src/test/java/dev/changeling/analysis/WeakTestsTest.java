package dev.changeling.analysis;

import static dev.changeling.analysis.Made.mutant;
import static dev.changeling.analysis.Made.run;
import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.changeling.analysis.WeakTests.Method;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

class WeakTestsTest {

    @Test
    void aTestThatReachesAMethodButKillsNoneOfItsMutants_isWeakThere() {
        // total(int): t1 kills m1, t2 kills m2, t3 reaches m1 only. tax(): t1 reaches the survivor m3. rate(): t2 kills m4.
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2", "t3"), List.of(
                mutant("m1", "A.java", 1, "total(int)", List.of("t1", "t2", "t3"), List.of("t1")),
                mutant("m2", "A.java", 2, "total(int)", List.of("t2"), List.of("t2")),
                mutant("m3", "A.java", 5, "tax()", List.of("t1"), List.of()),
                mutant("m4", "A.java", 8, "rate()", List.of("t2"), List.of("t2")))), Set.of());

        List<Method> weak = WeakTests.of(matrix);

        assertEquals(List.of(
                new Method("A.java", "shop.Till", "tax()", 1, 1, List.of(0)),
                new Method("A.java", "shop.Till", "total(int)", 2, 3, List.of(2))), weak);
    }

    @Test
    void mostWeakTestsFirst() {
        KillMatrix matrix = KillMatrix.of(run(List.of("t1", "t2", "t3"), List.of(
                mutant("m1", "A.java", 1, "a()", List.of("t1"), List.of()),
                mutant("m2", "A.java", 2, "b()", List.of("t1", "t2", "t3"), List.of("t3")))), Set.of());

        assertEquals(List.of("b()", "a()"), WeakTests.of(matrix).stream().map(Method::member).toList());
    }
}
