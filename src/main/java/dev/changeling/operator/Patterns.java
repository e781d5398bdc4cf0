package dev.changeling.operator;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.expr.PatternExpr;

/**
 * Finds pattern variables ({@code o instanceof Fee f}): their scope follows from the conditions
 * around them, so negating or swapping such a condition would leave uses of the variable unbound.
 */
final class Patterns {

    private Patterns() {
    }

    static boolean bindIn(Node node) {
        return node.findFirst(PatternExpr.class).isPresent();
    }
}
