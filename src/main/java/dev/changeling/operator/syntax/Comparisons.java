package dev.changeling.operator.syntax;

import com.github.javaparser.ast.expr.ArrayCreationExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;
import com.github.javaparser.ast.expr.ClassExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.NullLiteralExpr;
import com.github.javaparser.ast.expr.ObjectCreationExpr;
import com.github.javaparser.ast.expr.StringLiteralExpr;
import com.github.javaparser.ast.expr.TextBlockLiteralExpr;
import com.github.javaparser.ast.expr.ThisExpr;
import java.util.List;

/** What the relational operators share: the six comparisons, and which of them can be ordered. */
public final class Comparisons {

    public static final List<BinaryExpr.Operator> RELATIONAL = List.of(
            BinaryExpr.Operator.LESS, BinaryExpr.Operator.LESS_EQUALS,
            BinaryExpr.Operator.GREATER, BinaryExpr.Operator.GREATER_EQUALS,
            BinaryExpr.Operator.EQUALS, BinaryExpr.Operator.NOT_EQUALS);

    private Comparisons() {
    }

    /**
     * Whether swapping in another comparison can compile: not when either side is evidently not a
     * number ({@code null}, a boolean or a string literal, {@code this}, a new object or array, a class literal).
     */
    public static boolean ordered(BinaryExpr comparison) {
        return !evidentlyUnordered(comparison.getLeft()) && !evidentlyUnordered(comparison.getRight());
    }

    public static boolean isEquality(BinaryExpr.Operator operator) {
        return operator == BinaryExpr.Operator.EQUALS || operator == BinaryExpr.Operator.NOT_EQUALS;
    }

    private static boolean evidentlyUnordered(Expression side) {
        Expression bare = Precedence.unparenthesised(side);
        return bare instanceof NullLiteralExpr
                || bare instanceof BooleanLiteralExpr
                || bare instanceof StringLiteralExpr
                || bare instanceof TextBlockLiteralExpr
                || bare instanceof ThisExpr
                || bare instanceof ObjectCreationExpr
                || bare instanceof ArrayCreationExpr
                || bare instanceof ClassExpr;
    }
}
