package dev.changeling.mutant;

import com.github.javaparser.ast.CompilationUnit;
import com.github.javaparser.ast.Node;
import com.github.javaparser.ast.body.MethodDeclaration;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.expr.LambdaExpr;
import com.github.javaparser.ast.expr.ObjectCreationExpr;
import com.github.javaparser.ast.stmt.BlockStmt;
import com.github.javaparser.ast.stmt.LocalClassDeclarationStmt;
import com.github.javaparser.ast.stmt.LocalRecordDeclarationStmt;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The methods of a file whose every run the schema notes, so that a verdict depends on the code of the methods its
 * mutant's run entered and not on the code of the others. A method qualifies when it is declared in a named type (at
 * any depth of named types) and its body holds no lambda, anonymous class or local class: code in those can run after
 * the method has returned, without entering it again, so such a method counts as always run.
 */
public final class EntryMethods {

    /**
     * One method whose entry is noted.
     *
     * @param file the project-relative path of its file
     * @param name its file, its named types and its signature as written ({@code a/B.java#B.Inner.size(int)}):
     *             the same across edits of any body
     * @param body its body, braces included
     */
    public record EntryMethod(String file, String name, Span body) {

        /** Where the schema puts the note: just inside the opening brace. */
        public int noteAt() {
            return body.begin() + 1;
        }
    }

    private EntryMethods() {
    }

    /** The file's methods whose entry is noted, in the order of the text; none when the file does not parse. */
    public static List<EntryMethod> of(SourceFile file) {
        return of(JavaSources.parse(file));
    }

    /** The same, from the file's tree. */
    public static List<EntryMethod> of(JavaSources.Parsed parsed) {
        return parsed.ok() ? of(parsed.file(), parsed.unit()) : List.of();
    }

    private static List<EntryMethod> of(SourceFile file, CompilationUnit unit) {
        List<EntryMethod> methods = new ArrayList<>();
        for (MethodDeclaration method : unit.findAll(MethodDeclaration.class)) {
            BlockStmt body = method.getBody().orElse(null);
            if (body != null && inNamedTypesOnly(method) && !holdsDeferredCode(body)) {
                methods.add(new EntryMethod(file.path(), file.path() + "#" + Members.typeOf(method) + "." + Members.memberOf(method),
                        file.spanOf(body)));
            }
        }
        methods.sort(Comparator.comparing(EntryMethod::body));
        return List.copyOf(methods);
    }

    /**
     * The file's text with the bodies of these methods left out: what every test depends on, whichever of them it ran.
     */
    public static String skeleton(SourceFile file, List<EntryMethod> methods) {
        StringBuilder text = new StringBuilder(file.text().length());
        int at = 0;
        for (EntryMethod method : methods) {
            text.append(file.text(), at, method.body().begin()).append("{}");
            at = method.body().end();
        }
        return text.append(file.text(), at, file.text().length()).toString();
    }

    private static boolean inNamedTypesOnly(MethodDeclaration method) {
        Node parent = method.getParentNode().orElse(null);
        while (parent instanceof TypeDeclaration<?> type) {
            parent = type.getParentNode().orElse(null);
        }
        return parent instanceof CompilationUnit;
    }

    private static boolean holdsDeferredCode(BlockStmt body) {
        return body.stream().anyMatch(node -> node instanceof LambdaExpr || node instanceof LocalClassDeclarationStmt
                || node instanceof LocalRecordDeclarationStmt
                || node instanceof ObjectCreationExpr creation && creation.getAnonymousClassBody().isPresent());
    }
}
