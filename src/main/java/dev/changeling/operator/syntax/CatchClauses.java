package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.BodyDeclaration;
import com.github.javaparser.ast.expr.LambdaExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.ObjectCreationExpr;
import com.github.javaparser.ast.stmt.CatchClause;
import com.github.javaparser.ast.stmt.ExplicitConstructorInvocationStmt;
import com.github.javaparser.ast.stmt.ThrowStmt;
import com.github.javaparser.ast.stmt.TryStmt;
import com.github.javaparser.ast.type.UnionType;
import java.util.Set;
import java.util.stream.Stream;

/**
 * Guards against removing the only code in a try block that may throw what a catch clause names:
 * javac rejects a catch of a checked exception that nothing in the try block can throw.
 */
public final class CatchClauses {

    /** Catch types that are legal whatever the try block holds. */
    private static final Set<String> ALWAYS_LEGAL = Set.of("Exception", "Throwable", "RuntimeException", "Error");

    private CatchClauses() {
    }

    /** Whether taking {@code host} away could leave a catch clause of an enclosing try with nothing to catch. */
    public static boolean wouldOrphan(Node host) {
        for (Node child = host, at = host.getParentNode().orElse(null); at != null;
                child = at, at = at.getParentNode().orElse(null)) {
            if (at instanceof LambdaExpr || at instanceof BodyDeclaration<?>) {
                return false;
            }
            if (at instanceof TryStmt attempt && attempt.getTryBlock() == child && attempt.getResources().isEmpty()
                    && catchesSomethingSpecific(attempt) && !throwsElsewhere(attempt, host)) {
                return true;
            }
        }
        return false;
    }

    private static boolean catchesSomethingSpecific(TryStmt attempt) {
        return attempt.getCatchClauses().stream().flatMap(CatchClauses::caughtTypes)
                .anyMatch(type -> !ALWAYS_LEGAL.contains(type.replaceFirst("^java\\.lang\\.", "")));
    }

    private static Stream<String> caughtTypes(CatchClause clause) {
        return clause.getParameter().getType() instanceof UnionType union
                ? union.getElements().stream().map(Node::toString)
                : Stream.of(clause.getParameter().getType().asString());
    }

    /** Whether the try block may throw from code outside {@code host}: a call, a constructor or a throw. */
    private static boolean throwsElsewhere(TryStmt attempt, Node host) {
        return attempt.getTryBlock().findAll(Node.class, node -> node instanceof MethodCallExpr
                        || node instanceof ObjectCreationExpr || node instanceof ThrowStmt
                        || node instanceof ExplicitConstructorInvocationStmt).stream()
                .anyMatch(thrower -> thrower != host && !host.isAncestorOf(thrower) && throwsInto(thrower, attempt));
    }

    /** Code in a lambda or a local or anonymous class body throws elsewhere, not into the try block. */
    private static boolean throwsInto(Node thrower, TryStmt attempt) {
        for (Node at = thrower.getParentNode().orElse(null); at != null && at != attempt; at = at.getParentNode().orElse(null)) {
            if (at instanceof LambdaExpr || at instanceof BodyDeclaration<?>) {
                return false;
            }
        }
        return true;
    }
}
