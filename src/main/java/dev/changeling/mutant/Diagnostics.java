package dev.changeling.mutant;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.CallableDeclaration;
import com.github.javaparser.ast.body.FieldDeclaration;
import com.github.javaparser.ast.body.MethodDeclaration;
import com.github.javaparser.ast.body.Parameter;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.FieldAccessExpr;
import com.github.javaparser.ast.expr.MethodCallExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.VariableDeclarationExpr;
import com.github.javaparser.ast.stmt.AssertStmt;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.type.Type;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Code whose only effect is diagnostics, where a mutant cannot matter to what the program does: calls on a
 * logger, {@code assert} statements, and the bodies of {@code toString()}. Such points are not made unless asked
 * for ({@code --mutate-diagnostics}), and are counted as not made.
 */
final class Diagnostics {

    static final String LOGGING = "logging call";
    static final String ASSERT = "assert statement";
    static final String TO_STRING = "body of toString()";

    /** Logger types by simple or qualified name (SLF4J, java.util.logging, System.Logger, commons-logging, log4j). */
    private static final Set<String> LOGGER_TYPES = Set.of("Logger", "Log", "org.slf4j.Logger", "java.util.logging.Logger",
            "System.Logger", "java.lang.System.Logger", "org.apache.commons.logging.Log", "org.apache.logging.log4j.Logger",
            "org.apache.log4j.Logger");
    /** A receiver whose declaration is not in the file (an inherited field) is a logger by its name alone. */
    private static final Pattern LOGGER_NAME = Pattern.compile("(?i)_?(log|logger)");

    private Diagnostics() {
    }

    /** Why the host only serves diagnostics, or empty when a mutant of it may change what the program does. */
    static Optional<String> only(Node host) {
        for (Node at = host; at != null; at = at.getParentNode().orElse(null)) {
            if (at instanceof AssertStmt) {
                return Optional.of(ASSERT);
            }
            if (at instanceof ExpressionStmt statement && isLoggerCall(statement.getExpression())) {
                return Optional.of(LOGGING);
            }
            if (at instanceof MethodCallExpr call && isLoggerCall(call)) {
                return Optional.of(LOGGING);
            }
            if (at instanceof MethodDeclaration method && method.getNameAsString().equals("toString")
                    && method.getParameters().isEmpty()) {
                return Optional.of(TO_STRING);
            }
            if (at instanceof CallableDeclaration<?> || at instanceof TypeDeclaration<?>) {
                return Optional.empty();
            }
        }
        return Optional.empty();
    }

    private static boolean isLoggerCall(Expression expression) {
        if (!(expression instanceof MethodCallExpr call) || call.getScope().isEmpty()) {
            return false;
        }
        Expression receiver = call.getScope().get();
        String name;
        if (receiver instanceof NameExpr simple) {
            name = simple.getNameAsString();
        } else if (receiver instanceof FieldAccessExpr field && field.getScope().isThisExpr()) {
            name = field.getNameAsString();
        } else {
            return false;
        }
        return declaredType(call, name).map(Diagnostics::isLoggerType).orElseGet(() -> LOGGER_NAME.matcher(name).matches());
    }

    /** The declared type of the variable a name refers to where the call stands, if the file declares it. */
    private static Optional<Type> declaredType(Node from, String name) {
        for (Node at = from; at != null; at = at.getParentNode().orElse(null)) {
            Optional<Type> found = declaredIn(at, name);
            if (found.isPresent()) {
                return found;
            }
        }
        return Optional.empty();
    }

    private static Optional<Type> declaredIn(Node scope, String name) {
        if (scope instanceof CallableDeclaration<?> callable) {
            Optional<Type> parameter = callable.getParameters().stream()
                    .filter(candidate -> candidate.getNameAsString().equals(name)).map(Parameter::getType).findFirst();
            if (parameter.isPresent()) {
                return parameter;
            }
            return callable.findAll(VariableDeclarationExpr.class).stream()
                    .flatMap(declaration -> declaration.getVariables().stream())
                    .filter(variable -> variable.getNameAsString().equals(name)).map(VariableDeclarator::getType).findFirst();
        }
        if (scope instanceof TypeDeclaration<?> type) {
            return type.getMembers().stream()
                    .filter(FieldDeclaration.class::isInstance).map(FieldDeclaration.class::cast)
                    .flatMap(field -> field.getVariables().stream())
                    .filter(variable -> variable.getNameAsString().equals(name)).map(VariableDeclarator::getType).findFirst();
        }
        return Optional.empty();
    }

    private static boolean isLoggerType(Type type) {
        String written = type.asString();
        return LOGGER_TYPES.contains(written) || LOGGER_TYPES.contains(written.replaceAll("<.*>", ""));
    }
}
