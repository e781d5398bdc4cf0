package dev.changeling.mutant;

import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.CallableDeclaration;
import com.github.javaparser.ast.body.ConstructorDeclaration;
import com.github.javaparser.ast.body.EnumConstantDeclaration;
import com.github.javaparser.ast.body.FieldDeclaration;
import com.github.javaparser.ast.body.InitializerDeclaration;
import com.github.javaparser.ast.body.Parameter;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.body.VariableDeclarator;
import com.github.javaparser.ast.expr.ObjectCreationExpr;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.stream.Collectors;

/** Names the enclosing type and member of a node, in a form that survives edits elsewhere in the file. */
final class Members {

    private Members() {
    }

    /** The enclosing named types, outermost first, joined by dots; empty outside any type. */
    static String typeOf(Node node) {
        Deque<String> names = new ArrayDeque<>();
        for (Node at = node; at != null; at = at.getParentNode().orElse(null)) {
            if (at instanceof TypeDeclaration<?> type) {
                names.addFirst(type.getNameAsString());
            }
        }
        return String.join(".", names);
    }

    /** The members between the innermost named type and the node, outermost first, joined by {@code /}. */
    static String memberOf(Node node) {
        Deque<String> names = new ArrayDeque<>();
        for (Node at = node; at != null && !(at instanceof TypeDeclaration<?>); at = at.getParentNode().orElse(null)) {
            String name = nameOf(at);
            if (name != null) {
                names.addFirst(name);
            }
        }
        return String.join("/", names);
    }

    private static String nameOf(Node node) {
        if (node instanceof ConstructorDeclaration constructor) {
            return "<init>" + parameters(constructor);
        }
        if (node instanceof CallableDeclaration<?> callable) {
            return callable.getNameAsString() + parameters(callable);
        }
        if (node instanceof InitializerDeclaration initializer) {
            return initializer.isStatic() ? "<static>" : "<instance>";
        }
        if (node instanceof FieldDeclaration field) {
            return field.getVariables().stream().map(VariableDeclarator::getNameAsString).collect(Collectors.joining(","));
        }
        if (node instanceof EnumConstantDeclaration constant) {
            return constant.getNameAsString();
        }
        if (node instanceof ObjectCreationExpr creation && creation.getAnonymousClassBody().isPresent()) {
            return "new " + creation.getType().getNameAsString();
        }
        return null;
    }

    private static String parameters(CallableDeclaration<?> callable) {
        return callable.getParameters().stream()
                .map(Members::parameterType)
                .collect(Collectors.joining(",", "(", ")"));
    }

    private static String parameterType(Parameter parameter) {
        return parameter.getType().asString().replaceAll("\\s+", "") + (parameter.isVarArgs() ? "..." : "");
    }
}
