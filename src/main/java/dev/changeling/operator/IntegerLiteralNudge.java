package dev.changeling.operator;

import dev.changeling.operator.syntax.IntegerLiterals;
import dev.changeling.operator.syntax.Tokens;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.CastExpr;
import com.github.javaparser.ast.expr.LongLiteralExpr;
import com.github.javaparser.ast.expr.UnaryExpr;
import com.github.javaparser.ast.type.PrimitiveType;
import dev.changeling.source.Span;
import java.util.LinkedHashSet;
import java.util.OptionalLong;
import java.util.Set;

/** Replaces an int or long literal {@code n} by {@code n + 1}, {@code n - 1} and {@code 0}, written in decimal. */
public final class IntegerLiteralNudge implements MutationOperator {

    @Override
    public String id() {
        return "integer-literal-nudge";
    }

    @Override
    public void visit(Node node, Proposals out) {
        OptionalLong literal = IntegerLiterals.value(node);
        if (literal.isEmpty()) {
            return;
        }
        long n = literal.getAsLong();
        boolean isLong = node instanceof LongLiteralExpr;
        String written = out.text(node);
        String suffix = isLong ? written.substring(written.length() - 1) : "";
        Set<Long> targets = new LinkedHashSet<>();
        if (n != (isLong ? Long.MAX_VALUE : Integer.MAX_VALUE)) {
            targets.add(n + 1);
        }
        if (n != (isLong ? Long.MIN_VALUE : Integer.MIN_VALUE)) {
            targets.add(n - 1);
        }
        targets.add(0L);
        targets.remove(n);
        Span span = out.span(node);
        for (long target : targets) {
            if (!fitsNarrowVariable(node, target)) {
                continue;
            }
            String text = target + suffix;
            boolean wrap = target < 0 && node.getParentNode().filter(p -> p instanceof CastExpr || p instanceof UnaryExpr).isPresent();
            out.replace(node, span, Tokens.spliced(out.file().text(), span, wrap ? "(" + text + ")" : text),
                    "replaced " + written + " with " + text);
        }
    }

    /** A literal that directly initialises a byte, short or char variable must keep to that type's range. */
    private static boolean fitsNarrowVariable(Node literal, long target) {
        Node parent = literal.getParentNode().orElse(null);
        long value = target;
        if (parent instanceof UnaryExpr unary && unary.getOperator() == UnaryExpr.Operator.MINUS) {
            value = -target;
            parent = parent.getParentNode().orElse(null);
        }
        if (!(parent instanceof VariableDeclarator variable) || !(variable.getType() instanceof PrimitiveType type)) {
            return true;
        }
        return switch (type.getType()) {
            case BYTE -> value >= Byte.MIN_VALUE && value <= Byte.MAX_VALUE;
            case SHORT -> value >= Short.MIN_VALUE && value <= Short.MAX_VALUE;
            case CHAR -> value >= Character.MIN_VALUE && value <= Character.MAX_VALUE;
            default -> true;
        };
    }
}
