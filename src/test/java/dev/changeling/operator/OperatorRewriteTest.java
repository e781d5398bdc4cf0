package dev.changeling.operator;

import dev.changeling.operator.syntax.OperatorRewrite;
import dev.changeling.operator.syntax.UnaryRewrite;
import dev.changeling.operator.Mutate;
import dev.changeling.operator.NegationRemoval;
import dev.changeling.operator.Operators;
import dev.changeling.operator.Proposal;
import dev.changeling.operator.Proposals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.EnclosedExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.LiteralStringValueExpr;
import com.github.javaparser.ast.expr.SimpleName;
import com.github.javaparser.ast.expr.UnaryExpr;
import com.github.javaparser.ast.body.VariableDeclarator;
import dev.changeling.mutant.Point;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class OperatorRewriteTest {

    /** Expressions where precedence, associativity or adjacent tokens make a plain token swap go wrong. */
    private static final String[] CORPUS = {
        "a + b * c", "a - b - c", "a - (b - c)", "c - a * b", "a * b + c * d", "a / b % c", "a - b + c",
        "x << y + z", "x >> y >>> z", "-x * y", "a & b | c ^ d", "a < b == c > d", "a && b || c", "a || b && c",
        "!(a && b) || c", "(a + b) * c", "a ? b + c : d * e", "a || b ? c : d", "a + b instanceof Object",
        "(int) (a + b) * c", "m(a + b, c * d)", "a.f(b + c).g", "a[b + c] * d", "a+-b", "a-+b", "a+/*note*/b",
        "x = a + b", "x += a * b", "x <<= y + z", "x -= -y",
    };

    static Stream<String> corpus() {
        return Arrays.stream(CORPUS);
    }

    private static final String BEFORE = "class C {\n    void f() {\n        Object v = ";
    private static final String AFTER = ";\n    }\n}\n";

    private static SourceFile fileOf(String expression) {
        return SourceFile.of("C.java", BEFORE + expression + AFTER);
    }

    private static Expression statementIn(SourceFile file) {
        JavaSources.Parsed parsed = JavaSources.parse(file);
        assertTrue(parsed.ok(), () -> "does not parse: " + file.text());
        return parsed.unit().findFirst(VariableDeclarator.class).orElseThrow().getInitializer().orElseThrow();
    }

    /** The expression after the change, as text. */
    private static String mutatedExpression(SourceFile file, Proposal proposal) {
        String mutated = applied(file, proposal);
        return mutated.substring(BEFORE.length(), mutated.length() - AFTER.length());
    }

    /**
     * The tree as text, with parentheses dropped (they only spell the tree); {@code changed} is
     * shown with {@code operator} instead of its own.
     */
    private static String shape(Node node, Node changed, String operator) {
        if (node instanceof EnclosedExpr enclosed) {
            return shape(enclosed.getInner(), changed, operator);
        }
        StringBuilder out = new StringBuilder(node.getClass().getSimpleName());
        if (node instanceof BinaryExpr binary) {
            out.append(' ').append(node == changed ? operator : binary.getOperator().asString());
        } else if (node instanceof AssignExpr assignment) {
            out.append(' ').append(node == changed ? operator : assignment.getOperator().asString());
        } else if (node instanceof UnaryExpr unary) {
            out.append(' ').append(unary.getOperator().asString());
        } else if (node instanceof SimpleName name) {
            out.append(' ').append(name.getIdentifier());
        } else if (node instanceof LiteralStringValueExpr literal) {
            out.append(' ').append(literal.getValue());
        }
        out.append('(');
        node.getChildNodes().forEach(child -> out.append(shape(child, changed, operator)).append(' '));
        return out.append(')').toString();
    }

    private static String applied(SourceFile file, Proposal proposal) {
        String text = file.text();
        return text.substring(0, proposal.edit().begin()) + proposal.replacement() + text.substring(proposal.edit().end());
    }

    @Nested
    class EverySwap {

        @ParameterizedTest
        @MethodSource("dev.changeling.operator.OperatorRewriteTest#corpus")
        void ofEveryBinaryOperator_reparsesToTheSameTreeWithOnlyThatOperatorChanged(String expression) {
            SourceFile file = fileOf(expression);
            Expression original = statementIn(file);
            List<BinaryExpr> sites = original.findAll(BinaryExpr.class);
            for (BinaryExpr site : sites) {
                for (BinaryExpr.Operator to : BinaryExpr.Operator.values()) {
                    if (to == site.getOperator()) {
                        continue;
                    }
                    Proposals out = new Proposals(file);
                    OperatorRewrite.swap(site, to, out);
                    Proposal proposal = out.collected().get(0);
                    assertEquals(shape(original, site, to.asString()),
                            shape(statementIn(SourceFile.of("C.java", applied(file, proposal))), null, null),
                            () -> expression + " with " + to.asString() + " for " + site.getOperator().asString()
                                    + " became " + mutatedExpression(file, proposal));
                }
            }
        }

        @ParameterizedTest
        @ValueSource(strings = {"x += a * b", "x <<= y + z", "x -= -y", "x%=+y", "x|=y"})
        void ofEveryCompoundAssignment_reparsesToTheSameTreeWithOnlyThatOperatorChanged(String expression) {
            SourceFile file = fileOf(expression);
            AssignExpr site = (AssignExpr) statementIn(file);
            for (AssignExpr.Operator to : AssignExpr.Operator.values()) {
                if (to == site.getOperator() || to == AssignExpr.Operator.ASSIGN) {
                    continue;
                }
                Proposals out = new Proposals(file);
                OperatorRewrite.swap(site, to, out);
                Proposal proposal = out.collected().get(0);
                assertEquals(shape(site, site, to.asString()),
                        shape(statementIn(SourceFile.of("C.java", applied(file, proposal))), null, null),
                        () -> expression + " with " + to.asString() + " became " + mutatedExpression(file, proposal));
            }
        }
    }

    @Nested
    class RegisteredOperators {

        private static final Set<String> SWAPPING = Set.of("relational-subset", "relational-all", "arithmetic-swap",
                "connective-swap", "bitwise-swap", "shift-swap");

        @Test
        void everyOperatorSwapMutant_reparsesToTheSameTreeWithOneOperatorChanged() {
            int checked = 0;
            for (String expression : CORPUS) {
                SourceFile file = fileOf(expression);
                Expression original = statementIn(file);
                for (Point point : Mutate.points(file.text(), Operators.all())) {
                    Node host = original.findFirst(Node.class, node -> node.getRange().isPresent()
                            && file.spanOf(node).equals(point.host())).orElse(null);
                    if (!SWAPPING.contains(point.operator()) || isLiteral(point.mutatedHost(file.text()))) {
                        continue;
                    }
                    String mutated = Mutate.applied(point, file.text());
                    String mutatedShape = shape(statementIn(SourceFile.of("C.java", mutated)), null, null);
                    boolean oneOperatorChanged = Arrays.stream(allOperators())
                            .anyMatch(operator -> shape(original, host, operator).equals(mutatedShape));
                    assertTrue(oneOperatorChanged, () -> expression + " became " + point.mutatedHost(file.text()));
                    checked++;
                }
            }
            assertTrue(checked > 100, "checked " + checked + " mutants");
        }

        private static boolean isLiteral(String text) {
            return text.equals("true") || text.equals("false");
        }

        private static String[] allOperators() {
            return Stream.concat(
                    Arrays.stream(BinaryExpr.Operator.values()).map(BinaryExpr.Operator::asString),
                    Arrays.stream(AssignExpr.Operator.values()).map(AssignExpr.Operator::asString)).toArray(String[]::new);
        }
    }

    @Nested
    class Tokens_ {

        @Test
        void aSignAfterTheNewOperator_getsABlank() {
            SourceFile file = fileOf("a+-b");
            Proposals out = new Proposals(file);
            OperatorRewrite.swap((BinaryExpr) statementIn(file), BinaryExpr.Operator.MINUS, out);
            assertEquals("a- -b", mutatedExpression(file, out.collected().get(0)));
        }

        @Test
        void aCommentAfterTheNewOperator_isNotOpened() {
            SourceFile file = fileOf("a+/*note*/b");
            Proposals out = new Proposals(file);
            OperatorRewrite.swap((BinaryExpr) statementIn(file), BinaryExpr.Operator.DIVIDE, out);
            assertEquals("a/ /*note*/b", mutatedExpression(file, out.collected().get(0)));
        }

        @Test
        void anUnchangedNeighbourhood_getsNoBlank() {
            SourceFile file = fileOf("x=++i");
            Proposals out = new Proposals(file);
            UnaryRewrite.swap((UnaryExpr) ((AssignExpr) statementIn(file)).getValue(), UnaryExpr.Operator.PREFIX_DECREMENT, out);
            assertEquals("--", out.collected().get(0).replacement());
        }

        @Test
        void removingAnOperatorBetweenTwoWords_leavesABlank() {
            SourceFile file = SourceFile.of("C.java", "class C { boolean f(boolean b) { return!b; } }");
            List<Point> points = Mutate.points(file.text(), new NegationRemoval());
            assertEquals("class C { boolean f(boolean b) { return b; } }", Mutate.applied(points.get(0), file.text()));
        }
    }
}
