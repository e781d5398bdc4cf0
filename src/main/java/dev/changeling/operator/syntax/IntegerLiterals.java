package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.IntegerLiteralExpr;
import com.github.javaparser.ast.expr.LongLiteralExpr;
import java.util.OptionalLong;

/** Reads int and long literals in any radix, leaving out the two that only exist after a unary minus. */
public final class IntegerLiterals {

    private IntegerLiterals() {
    }

    /**
     * The value of an int or long literal; empty for other nodes and for {@code 2147483648} and
     * {@code 9223372036854775808L}, which are only legal as the operand of a unary minus.
     */
    public static OptionalLong value(Node node) {
        if (node instanceof IntegerLiteralExpr literal && literal.asNumber() instanceof Integer value) {
            return OptionalLong.of(value);
        }
        if (node instanceof LongLiteralExpr literal && literal.asNumber() instanceof Long value) {
            return OptionalLong.of(value);
        }
        return OptionalLong.empty();
    }

    /** Whether {@code node} is an int or long literal only legal after a unary minus. */
    public static boolean onlyNegatable(Node node) {
        return (node instanceof IntegerLiteralExpr || node instanceof LongLiteralExpr) && value(node).isEmpty();
    }

    /** Whether {@code expression} is an int or long literal zero, possibly in parentheses. */
    public static boolean isZero(Expression expression) {
        OptionalLong value = value(Precedence.unparenthesised(expression));
        return value.isPresent() && value.getAsLong() == 0;
    }
}
