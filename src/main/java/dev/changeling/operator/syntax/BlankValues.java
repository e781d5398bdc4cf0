package dev.changeling.operator.syntax;

import com.github.javaparser.ast.CompilationUnit;
import com.github.javaparser.ast.ImportDeclaration;
import com.github.javaparser.ast.body.TypeDeclaration;
import com.github.javaparser.ast.expr.BooleanLiteralExpr;
import com.github.javaparser.ast.expr.CharLiteralExpr;
import com.github.javaparser.ast.expr.DoubleLiteralExpr;
import com.github.javaparser.ast.expr.Expression;
import com.github.javaparser.ast.expr.NullLiteralExpr;
import com.github.javaparser.ast.expr.StringLiteralExpr;
import com.github.javaparser.ast.type.ClassOrInterfaceType;
import com.github.javaparser.ast.type.PrimitiveType;
import com.github.javaparser.ast.type.Type;
import com.github.javaparser.ast.type.VoidType;
import java.util.List;
import java.util.Map;

/** The blank values of a declared type, written so that they compile wherever that type is expected. */
public final class BlankValues {

    private static final Map<String, String> JAVA_UTIL_EMPTY = Map.of(
            "List", "java.util.Collections.emptyList()",
            "Collection", "java.util.Collections.emptyList()",
            "Iterable", "java.util.Collections.emptyList()",
            "Set", "java.util.Collections.emptySet()",
            "SortedSet", "java.util.Collections.emptySortedSet()",
            "NavigableSet", "java.util.Collections.emptyNavigableSet()",
            "Map", "java.util.Collections.emptyMap()",
            "SortedMap", "java.util.Collections.emptySortedMap()",
            "NavigableMap", "java.util.Collections.emptyNavigableMap()",
            "Optional", "java.util.Optional.empty()");

    private BlankValues() {
    }

    /** Blank values for {@code type}; none for {@code void}. */
    public static List<String> of(Type type) {
        if (type instanceof VoidType) {
            return List.of();
        }
        if (type instanceof PrimitiveType primitive) {
            return switch (primitive.getType()) {
                case BOOLEAN -> List.of("true", "false");
                case CHAR -> List.of("'\\0'");
                case LONG -> List.of("0L");
                case FLOAT -> List.of("0.0f");
                case DOUBLE -> List.of("0.0");
                case BYTE, SHORT, INT -> List.of("0");
            };
        }
        if (type instanceof ClassOrInterfaceType named) {
            String name = named.getNameAsString();
            String scope = named.getScope().map(ClassOrInterfaceType::asString).orElse(null);
            if (Declarations.isString(named) && !shadowed(named, name)) {
                return List.of("\"\"");
            }
            if (JAVA_UTIL_EMPTY.containsKey(name) && isJavaUtil(named, name, scope)) {
                return List.of(JAVA_UTIL_EMPTY.get(name));
            }
        }
        return List.of("null");
    }

    /** Whether {@code value} already is {@code blank}, so that returning the blank would change nothing. */
    public static boolean alreadyIs(Expression value, String blank) {
        Expression bare = Precedence.unparenthesised(value);
        return switch (blank) {
            case "0", "0L" -> IntegerLiterals.isZero(bare);
            case "0.0f", "0.0" -> bare instanceof DoubleLiteralExpr literal && literal.asDouble() == 0
                    || IntegerLiterals.isZero(bare);
            case "'\\0'" -> bare instanceof CharLiteralExpr literal && literal.asChar() == 0 || IntegerLiterals.isZero(bare);
            case "true", "false" -> bare instanceof BooleanLiteralExpr literal && Boolean.toString(literal.getValue()).equals(blank);
            case "\"\"" -> bare instanceof StringLiteralExpr literal && literal.getValue().isEmpty();
            case "null" -> bare instanceof NullLiteralExpr;
            default -> {
                String written = bare.toString().replaceAll("\\s+", "");
                yield written.equals(blank) || ("java.util." + written).equals(blank);
            }
        };
    }

    private static boolean isJavaUtil(ClassOrInterfaceType type, String name, String scope) {
        if (scope != null) {
            return scope.equals("java.util") || name.equals("Iterable") && scope.equals("java.lang");
        }
        if (shadowed(type, name)) {
            return false;
        }
        List<ImportDeclaration> imports = type.findCompilationUnit().<List<ImportDeclaration>>map(CompilationUnit::getImports).orElse(List.of());
        return name.equals("Iterable")
                || imports.stream().anyMatch(i -> !i.isStatic() && i.getNameAsString().equals(
                        i.isAsterisk() ? "java.util" : "java.util." + name));
    }

    /** A simple name that the file itself gives another meaning, by a declared type or a single-type import. */
    private static boolean shadowed(ClassOrInterfaceType type, String name) {
        CompilationUnit unit = type.findCompilationUnit().orElse(null);
        if (unit == null) {
            return false;
        }
        boolean declared = unit.findAll(TypeDeclaration.class).stream().anyMatch(t -> t.getNameAsString().equals(name));
        boolean importedElsewhere = unit.getImports().stream().anyMatch(i -> !i.isAsterisk() && !i.isStatic()
                && i.getName().getIdentifier().equals(name)
                && !i.getNameAsString().equals("java.util." + name) && !i.getNameAsString().equals("java.lang." + name));
        return declared || importedElsewhere;
    }
}
