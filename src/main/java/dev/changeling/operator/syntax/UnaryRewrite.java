package dev.changeling.operator.syntax;

import dev.changeling.operator.Proposals;
import com.github.javaparser.ast.expr.UnaryExpr;
import dev.changeling.source.Span;

/** Proposes changes to the operator token of a unary expression, prefix or postfix, leaving the operand's text alone. */
public final class UnaryRewrite {

    private UnaryRewrite() {
    }

    /** Replaces the operator token by {@code to}. */
    public static void swap(UnaryExpr unary, UnaryExpr.Operator to, Proposals out) {
        Span token = operatorToken(unary, out);
        out.replace(unary, token, Tokens.spliced(out.file().text(), token, to.asString()),
                "replaced " + unary.getOperator().asString() + " with " + to.asString());
    }

    /** Removes the operator token, keeping the operand. */
    public static void remove(UnaryExpr unary, Proposals out, String description) {
        Span token = operatorToken(unary, out);
        out.replace(unary, token, Tokens.spliced(out.file().text(), token, ""), description);
    }

    private static Span operatorToken(UnaryExpr unary, Proposals out) {
        Span whole = out.span(unary);
        String operator = unary.getOperator().asString();
        Span token = unary.isPostfix()
                ? new Span(whole.end() - operator.length(), whole.end())
                : new Span(whole.begin(), whole.begin() + operator.length());
        if (!out.file().textOf(token).equals(operator)) {
            throw new IllegalStateException("operator " + operator + " not found at offset " + token.begin()
                    + " of " + out.file().path());
        }
        return token;
    }
}
