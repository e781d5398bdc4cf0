package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.PatternExpr;

/**
 * Finds pattern variables ({@code o instanceof Fee f}): their scope follows from the conditions
 * around them, so negating or swapping such a condition would leave uses of the variable unbound.
 */
public final class Patterns {

    private Patterns() {
    }

    public static boolean bindIn(Node node) {
        return node.findFirst(PatternExpr.class).isPresent();
    }
}
