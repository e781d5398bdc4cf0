package dev.changeling.operator.syntax;

import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.CastExpr;
import com.github.javaparser.ast.expr.ConditionalExpr;
import com.github.javaparser.ast.expr.EnclosedExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.LiteralExpr;
import com.github.javaparser.ast.expr.UnaryExpr;

/** Recognises expressions that are compile-time constants by their shape alone: literals joined by operators. */
public final class ConstantExpressions {

    private ConstantExpressions() {
    }

    /** Literals joined by operators, parentheses, casts and conditionals only; names are not looked up. */
    public static boolean literalOnly(Expression expression) {
        if (expression instanceof LiteralExpr) {
            return true;
        }
        if (expression instanceof BinaryExpr binary) {
            return literalOnly(binary.getLeft()) && literalOnly(binary.getRight());
        }
        if (expression instanceof UnaryExpr unary) {
            return literalOnly(unary.getExpression());
        }
        if (expression instanceof EnclosedExpr enclosed) {
            return literalOnly(enclosed.getInner());
        }
        if (expression instanceof CastExpr cast) {
            return literalOnly(cast.getExpression());
        }
        if (expression instanceof ConditionalExpr conditional) {
            return literalOnly(conditional.getCondition()) && literalOnly(conditional.getThenExpr())
                    && literalOnly(conditional.getElseExpr());
        }
        return false;
    }
}
