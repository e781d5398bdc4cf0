package dev.changeling.operator;

import dev.changeling.operator.syntax.ConstantExpressions;
import dev.changeling.operator.syntax.LoopConditions;
import dev.changeling.operator.InMemoryJavac;
import dev.changeling.operator.Mutate;
import dev.changeling.operator.Operators;
import dev.changeling.operator.RelationalAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.javaparser.ast.CompilationUnit;
import com.github.javaparser.ast.Node;
import dev.changeling.mutant.Point;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/** The rule every operator keeps: a loop condition never becomes a constant, and a constant one is never touched. */
class LoopConditionsTest {

    private static final String SOURCE = """
            class Loops {
                int run(int n, boolean go) {
                    int i = 0;
                    while (i < n) i++;
                    while (go) {
                        go = false;
                    }
                    while (!go) {
                        go = true;
                    }
                    do {
                        i--;
                    } while (i > 0 && go);
                    for (int j = 0; j < n; j++) {
                        i += j;
                    }
                    while ((i != 5)) {
                        i = 5;
                    }
                    while (i < 10 == true) {
                        i++;
                    }
                    while (true) {
                        if (i++ > 10) {
                            break;
                        }
                    }
                    return i;
                }

                int spin() {
                    while (1 + 1 == 2) {
                    }
                }
            }
            """;

    private static long constantLoopConditions(String source) {
        CompilationUnit unit = JavaSources.parse(SourceFile.of(Mutate.PATH, source)).unit();
        return unit.findAll(Node.class).stream()
                .map(LoopConditions::conditionOf)
                .filter(condition -> condition != null && ConstantExpressions.literalOnly(condition))
                .count();
    }

    @Test
    void noMutantOfAnyOperator_changesWhichLoopConditionsAreConstant() {
        List<Point> points = Mutate.points(SOURCE, Operators.all());
        assertEquals(2, constantLoopConditions(SOURCE));
        for (Point point : points) {
            assertEquals(2, constantLoopConditions(Mutate.applied(point, SOURCE)), Mutate.line(point, SOURCE));
        }
    }

    @Test
    void nothingInsideAConstantLoopCondition_isMutated() {
        int constantLoop = SOURCE.indexOf("while (true)");
        int otherConstantLoop = SOURCE.indexOf("while (1 + 1 == 2)");
        for (Point point : Mutate.points(SOURCE, Operators.all())) {
            int at = point.host().begin();
            assertTrue(!(at > constantLoop && at < constantLoop + "while (true)".length())
                    && !(at > otherConstantLoop && at < otherConstantLoop + "while (1 + 1 == 2)".length()),
                    Mutate.line(point, SOURCE));
        }
    }

    @Test
    void theDroppedConstants_areOnlyThoseThatWouldFreezeALoop() {
        List<String> lines = Mutate.lines(SOURCE, new RelationalAll());
        assertTrue(lines.contains("i>0 => false"), "i > 0 && go stays a variable condition with false for i > 0");
        assertTrue(lines.contains("i++>10 => true"), "the comparison inside the body of a constant loop is mutated");
        Stream.of("i<n => true", "i<n => false", "j<n => false", "i!=5 => true", "i<10 => false", "i<10==true => false")
                .forEach(dropped -> assertTrue(!lines.contains(dropped), dropped));
    }

    @Test
    void everyMutantCompiles() {
        List<InMemoryJavac.Unit> units = new ArrayList<>();
        units.add(new InMemoryJavac.Unit("original", "Loops", SOURCE));
        for (Point point : Mutate.points(SOURCE, Operators.all())) {
            units.add(new InMemoryJavac.Unit(Mutate.line(point, SOURCE), "Loops", Mutate.applied(point, SOURCE)));
        }
        Map<String, List<String>> errors = InMemoryJavac.errors(units);
        assertEquals(Map.of(), errors);
    }
}
