package dev.changeling.compile;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;
import com.github.javaparser.ast.expr.CastExpr;
import com.github.javaparser.ast.expr.CharLiteralExpr;
import com.github.javaparser.ast.expr.DoubleLiteralExpr;
import com.github.javaparser.ast.expr.EnclosedExpr;
import com.github.javaparser.ast.expr.FieldAccessExpr;
import com.github.javaparser.ast.expr.IntegerLiteralExpr;
import com.github.javaparser.ast.expr.LongLiteralExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.SimpleName;
import com.github.javaparser.ast.expr.ThisExpr;
import com.github.javaparser.ast.expr.UnaryExpr;
import com.github.javaparser.ast.type.PrimitiveType;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.JavaSources;
import java.util.Set;

/**
 * Which points the schema also watches for infection: where the original expression and the mutated one can both be
 * evaluated side by side without any effect — operators over names, fields, literals, casts to primitive types and
 * {@code Math}'s {@code abs}, {@code min}, {@code max} and {@code signum}; nothing that calls anything else, assigns,
 * allocates, indexes (a nudged index would throw where the original does not) or divides (so would a divisor of
 * zero) — and where the value is a number or a truth value, so that {@code !=} compares values. Reading a field of a
 * null reference throws in the original as well, since a mutant changes operators and literals only. While the baseline records reach, such
 * a point's switch also evaluates its mutated expression and notes each test for which the two values ever differed.
 */
final class InfectionWatch {

    private static final Set<String> VALUE_OPERATORS = Set.of("relational-subset", "relational-all", "connective-swap",
            "condition-negation", "boolean-literal-flip", "arithmetic-swap", "bitwise-swap", "shift-swap",
            "unary-minus-removal", "negation-removal", "complement-removal", "integer-literal-nudge");

    private static final Set<String> PURE_MATH = Set.of("abs", "min", "max", "signum");

    private static final Set<UnaryExpr.Operator> PURE_UNARY = Set.of(UnaryExpr.Operator.MINUS, UnaryExpr.Operator.PLUS,
            UnaryExpr.Operator.LOGICAL_COMPLEMENT, UnaryExpr.Operator.BITWISE_COMPLEMENT);

    private InfectionWatch() {
    }

    /** Whether the schema watches this point: a first-order switch whose infection the baseline can observe. */
    static boolean watchable(Point point, String fileText) {
        if (point.kind() != HostKind.EXPRESSION || !VALUE_OPERATORS.contains(point.operator())) {
            return false;
        }
        return pure(fileText.substring(point.host().begin(), point.host().end())) && pure(point.mutatedHost(fileText));
    }

    static boolean pure(String expression) {
        return JavaSources.parseExpression(expression)
                .map(tree -> tree.stream().allMatch(InfectionWatch::pureNode))
                .orElse(false);
    }

    private static boolean pureNode(Node node) {
        if (node instanceof BinaryExpr binary) {
            return binary.getOperator() != BinaryExpr.Operator.DIVIDE && binary.getOperator() != BinaryExpr.Operator.REMAINDER;
        }
        if (node instanceof UnaryExpr unary) {
            return PURE_UNARY.contains(unary.getOperator());
        }
        if (node instanceof MethodCallExpr call) {
            return PURE_MATH.contains(call.getNameAsString()) && call.getTypeArguments().isEmpty()
                    && call.getScope().filter(scope -> scope instanceof NameExpr name
                            && (name.getNameAsString().equals("Math") || name.getNameAsString().equals("StrictMath"))).isPresent();
        }
        if (node instanceof CastExpr cast) {
            return cast.getType().isPrimitiveType();
        }
        return node instanceof NameExpr || node instanceof FieldAccessExpr || node instanceof ThisExpr
                || node instanceof PrimitiveType || node instanceof SimpleName || node instanceof EnclosedExpr
                || node instanceof IntegerLiteralExpr || node instanceof LongLiteralExpr || node instanceof CharLiteralExpr
                || node instanceof DoubleLiteralExpr || node instanceof BooleanLiteralExpr;
    }
}
