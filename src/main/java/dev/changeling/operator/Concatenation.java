package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.StringLiteralExpr;
import com.github.javaparser.ast.expr.TextBlockLiteralExpr;

/** Recognises string concatenation where the source shows it: a {@code +} or {@code +=} with a string operand in plain sight. */
final class Concatenation {

    private Concatenation() {
    }

    /** Whether {@code node} is a {@code +} or {@code +=} that evidently joins strings. */
    static boolean evident(Node node) {
        if (node instanceof BinaryExpr binary) {
            return binary.getOperator() == BinaryExpr.Operator.PLUS
                    && (stringValued(binary.getLeft()) || stringValued(binary.getRight()));
        }
        if (node instanceof AssignExpr assignment) {
            return assignment.getOperator() == AssignExpr.Operator.PLUS && stringValued(assignment.getValue());
        }
        return false;
    }

    /** A string or text-block literal, or an evident concatenation, possibly in parentheses. */
    private static boolean stringValued(Expression expression) {
        Expression bare = Precedence.unparenthesised(expression);
        return bare instanceof StringLiteralExpr || bare instanceof TextBlockLiteralExpr || evident(bare);
    }
}
