package dev.changeling.operator.syntax;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.CallableDeclaration;
import com.github.javaparser.ast.body.InitializerDeclaration;
import com.github.javaparser.ast.body.MethodDeclaration;
import com.github.javaparser.ast.body.Parameter;
import com.github.javaparser.ast.body.RecordDeclaration;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.AssignExpr;
import com.github.javaparser.ast.expr.EnclosedExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.FieldAccessExpr;
import com.github.javaparser.ast.expr.LambdaExpr;
import com.github.javaparser.ast.expr.NameExpr;
import com.github.javaparser.ast.expr.ThisExpr;
import com.github.javaparser.ast.expr.VariableDeclarationExpr;
import com.github.javaparser.ast.nodeTypes.NodeWithStatements;
import com.github.javaparser.ast.stmt.ExpressionStmt;
import com.github.javaparser.ast.stmt.ForStmt;
import com.github.javaparser.ast.stmt.ReturnStmt;
import com.github.javaparser.ast.type.ClassOrInterfaceType;
import com.github.javaparser.ast.type.Type;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Reads what a source declares, without solving types: where a name is declared, and the type
 * written for a variable, for the place a value goes to, or for a method's result.
 */
public final class Declarations {

    private Declarations() {
    }

    /** Whether {@code type} is written as {@code String} or {@code java.lang.String}. */
    public static boolean isString(Type type) {
        return type instanceof ClassOrInterfaceType named && named.getNameAsString().equals("String")
                && named.getScope().map(scope -> scope.asString().equals("java.lang")).orElse(true);
    }

    /** The written type of where a value goes: the variable it initialises or is assigned to, or the method returning it. */
    public static Optional<Type> ofDestination(Expression value) {
        Node child = value;
        Node parent = value.getParentNode().orElse(null);
        while (parent instanceof EnclosedExpr) {
            child = parent;
            parent = parent.getParentNode().orElse(null);
        }
        if (parent instanceof VariableDeclarator variable) {
            return Optional.of(variable.getType());
        }
        if (parent instanceof AssignExpr assignment && assignment.getValue() == child
                && assignment.getOperator() == AssignExpr.Operator.ASSIGN) {
            return ofVariable(assignment.getTarget());
        }
        if (parent instanceof ReturnStmt statement) {
            return enclosingMethod(statement).map(MethodDeclaration::getType);
        }
        return Optional.empty();
    }

    /** The method a return belongs to; none inside a lambda (whose return type is not written) or an initialiser. */
    public static Optional<MethodDeclaration> enclosingMethod(ReturnStmt statement) {
        for (Node at = statement; at != null; at = at.getParentNode().orElse(null)) {
            if (at instanceof LambdaExpr || at instanceof InitializerDeclaration) {
                return Optional.empty();
            }
            if (at instanceof CallableDeclaration<?> callable) {
                return Optional.of(callable).filter(MethodDeclaration.class::isInstance).map(MethodDeclaration.class::cast);
            }
        }
        return Optional.empty();
    }

    /** The written type of a simple name or {@code this.name}: the nearest local, parameter or field of that name. */
    public static Optional<Type> ofVariable(Expression target) {
        return declarationOf(target).map(declaration -> declaration instanceof VariableDeclarator variable
                ? variable.getType() : ((Parameter) declaration).getType());
    }

    /**
     * Where a simple name or {@code this.name} is declared: the nearest local variable, parameter,
     * field or record component of that name ({@link VariableDeclarator} or {@link Parameter}).
     */
    public static Optional<Node> declarationOf(Expression target) {
        boolean field = target instanceof FieldAccessExpr access && access.getScope() instanceof ThisExpr;
        if (!(target instanceof NameExpr) && !field) {
            return Optional.empty();
        }
        String name = target instanceof NameExpr simple ? simple.getNameAsString() : ((FieldAccessExpr) target).getNameAsString();
        for (Node at = target; at != null; at = at.getParentNode().orElse(null)) {
            Optional<Node> found = field && !(at instanceof TypeDeclaration<?>) ? Optional.empty() : declaredIn(at, name);
            if (found.isPresent() || at instanceof LambdaExpr || at instanceof TypeDeclaration<?>) {
                return found;
            }
        }
        return Optional.empty();
    }

    private static Optional<Node> declaredIn(Node scope, String name) {
        Stream<VariableDeclarator> locals = Stream.empty();
        Stream<Parameter> parameters = Stream.empty();
        if (scope instanceof NodeWithStatements<?> block) {
            locals = block.getStatements().stream()
                    .filter(ExpressionStmt.class::isInstance)
                    .map(statement -> ((ExpressionStmt) statement).getExpression())
                    .flatMap(Declarations::variablesOf);
        } else if (scope instanceof ForStmt loop) {
            locals = loop.getInitialization().stream().flatMap(Declarations::variablesOf);
        } else if (scope instanceof CallableDeclaration<?> callable) {
            parameters = callable.getParameters().stream();
        } else if (scope instanceof LambdaExpr lambda) {
            parameters = lambda.getParameters().stream();
        } else if (scope instanceof TypeDeclaration<?> type) {
            locals = type.getFields().stream().flatMap(declaration -> declaration.getVariables().stream());
            parameters = type instanceof RecordDeclaration record ? record.getParameters().stream() : Stream.empty();
        }
        return Stream.<Node>concat(
                        locals.filter(variable -> variable.getNameAsString().equals(name)),
                        parameters.filter(parameter -> parameter.getNameAsString().equals(name)))
                .findFirst();
    }

    private static Stream<VariableDeclarator> variablesOf(Expression expression) {
        return expression instanceof VariableDeclarationExpr declaration ? declaration.getVariables().stream() : Stream.empty();
    }
}
