package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.StringLiteralExpr;
import com.github.javaparser.ast.expr.TextBlockLiteralExpr;

/**
 * Recognises string concatenation where the source shows it: a {@code +} or {@code +=} with an
 * operand that is evidently a string, or whose result goes to a place declared {@code String}.
 */
public final class Concatenation {

    private Concatenation() {
    }

    /** Whether {@code node} is a {@code +} or {@code +=} that evidently joins strings. */
    public static boolean evident(Node node) {
        if (node instanceof BinaryExpr binary && binary.getOperator() == BinaryExpr.Operator.PLUS) {
            return stringValued(binary.getLeft()) || stringValued(binary.getRight())
                    || Declarations.ofDestination(binary).filter(Declarations::isString).isPresent();
        }
        if (node instanceof AssignExpr assignment && assignment.getOperator() == AssignExpr.Operator.PLUS) {
            return stringValued(assignment.getValue())
                    || Declarations.ofVariable(assignment.getTarget()).filter(Declarations::isString).isPresent();
        }
        return false;
    }

    /**
     * A string or text-block literal, a variable declared {@code String}, {@code x.toString()}, a
     * static method of {@code String}, or an evident concatenation; possibly in parentheses.
     */
    private static boolean stringValued(Expression expression) {
        Expression bare = Precedence.unparenthesised(expression);
        if (bare instanceof StringLiteralExpr || bare instanceof TextBlockLiteralExpr) {
            return true;
        }
        if (bare instanceof MethodCallExpr call) {
            boolean toString = call.getNameAsString().equals("toString") && call.getArguments().isEmpty();
            boolean ofString = call.getScope().filter(scope -> scope instanceof NameExpr name
                    && name.getNameAsString().equals("String")).isPresent();
            return toString || ofString;
        }
        return evident(bare) || Declarations.ofVariable(bare).filter(Declarations::isString).isPresent();
    }
}
