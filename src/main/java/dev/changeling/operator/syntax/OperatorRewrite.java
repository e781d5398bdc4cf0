package dev.changeling.operator.syntax;

import dev.changeling.operator.Proposals;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.github.javaparser.ast.expr.Expression;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;

/**
 * Proposes the replacement of a binary or compound-assignment operator by another, touching only
 * the operator token when precedence allows and adding parentheses where it does not.
 */
public final class OperatorRewrite {

    private OperatorRewrite() {
    }

    public static void swap(BinaryExpr expression, BinaryExpr.Operator to, Proposals out) {
        SourceFile file = out.file();
        Span operatorSpan = operatorToken(file, expression.getLeft(), expression.getRight(), expression.getOperator().asString());
        int level = Precedence.of(to);
        boolean wrapLeft = Precedence.of(expression.getLeft()) < level;
        boolean wrapRight = Precedence.of(expression.getRight()) <= level;
        boolean wrapWhole = level < Precedence.of(expression.getOperator())
                && Precedence.needsParenthesesAt(expression, level);
        String description = "replaced " + expression.getOperator().asString() + " with " + to.asString();
        String token = Tokens.spliced(file.text(), operatorSpan, to.asString());
        if (!wrapLeft && !wrapRight && !wrapWhole) {
            out.replace(expression, operatorSpan, token, description);
            return;
        }
        Span whole = out.span(expression);
        String text = file.text();
        String rebuilt = parenthesised(out.text(expression.getLeft()), wrapLeft)
                + text.substring(out.span(expression.getLeft()).end(), operatorSpan.begin())
                + token
                + text.substring(operatorSpan.end(), out.span(expression.getRight()).begin())
                + parenthesised(out.text(expression.getRight()), wrapRight);
        out.replace(expression, whole, parenthesised(rebuilt, wrapWhole), description);
    }

    public static void swap(AssignExpr assignment, AssignExpr.Operator to, Proposals out) {
        Span operatorSpan = operatorToken(out.file(), assignment.getTarget(), assignment.getValue(),
                assignment.getOperator().asString());
        out.replace(assignment, operatorSpan, Tokens.spliced(out.file().text(), operatorSpan, to.asString()),
                "replaced " + assignment.getOperator().asString() + " with " + to.asString());
    }

    /** The span of the operator written between two operands, stepping over comments. */
    public static Span operatorToken(SourceFile file, Expression left, Expression right, String operator) {
        String text = file.text();
        int at = file.spanOf(left).end();
        int limit = file.spanOf(right).begin();
        while (at < limit) {
            if (Character.isWhitespace(text.charAt(at))) {
                at++;
            } else if (text.startsWith("//", at)) {
                at = text.indexOf('\n', at);
            } else if (text.startsWith("/*", at)) {
                at = text.indexOf("*/", at + 2) + 2;
            } else {
                break;
            }
        }
        if (!text.startsWith(operator, at)) {
            throw new IllegalStateException("operator " + operator + " not found at offset " + at + " of " + file.path());
        }
        return new Span(at, at + operator.length());
    }

    private static String parenthesised(String text, boolean wrap) {
        return wrap ? "(" + text + ")" : text;
    }
}
