package dev.changeling.compile;

import com.sun.source.tree.AssignmentTree;
import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.tree.ParenthesizedTree;
import com.sun.source.tree.ReturnTree;
import com.sun.source.tree.Tree;
import com.sun.source.tree.VariableTree;
import com.sun.source.util.SourcePositions;
import com.sun.source.util.TreePath;
import com.sun.source.util.TreePathScanner;
import com.sun.source.util.Trees;
import dev.changeling.compile.RenderedFile.Branch;
import dev.changeling.compile.RenderedFile.HostRegion;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import javax.lang.model.type.TypeKind;
import javax.lang.model.type.TypeMirror;
import javax.lang.model.util.Types;

/**
 * Checks, once javac has attributed a schema, that every mutated branch has its original branch's
 * type. A switch over branches of different types converts them (unboxing, numeric promotion,
 * another overload), and then neither side would mean what its own text means.
 */
final class BranchTypes {

    private final Trees trees;
    private final Types types;
    private final SourcePositions positions;
    private final CompilationUnitTree unit;
    private final RenderedFile file;
    private final Map<Integer, TypeMirror> typeAt = new HashMap<>();
    private final Set<Integer> assignedAt = new HashSet<>();

    private BranchTypes(Javac.Task task, CompilationUnitTree unit, RenderedFile file) {
        this.trees = task.trees();
        this.types = task.javac().getTypes();
        this.positions = trees.getSourcePositions();
        this.unit = unit;
        this.file = file;
    }

    /** The points whose branch would change type in the switch, each with the reason. */
    static Map<Point, String> mismatches(Javac.Task task, CompilationUnitTree unit, RenderedFile file) {
        return new BranchTypes(task, unit, file).check();
    }

    private Map<Point, String> check() {
        Set<Integer> branchStarts = new HashSet<>();
        Set<Integer> switchStarts = new HashSet<>();
        for (HostRegion host : file.hosts()) {
            if (host.kind() != HostKind.STATEMENT) {
                host.mutated().forEach(branch -> branchStarts.add(branch.begin()));
                branchStarts.add(host.original().begin());
                switchStarts.add(host.begin());
            }
        }
        new TreePathScanner<Void, Void>() {
            @Override
            public Void visitParenthesized(ParenthesizedTree node, Void unused) {
                int start = (int) positions.getStartPosition(unit, node);
                if (branchStarts.contains(start)) {
                    typeAt.put(start, trees.getTypeMirror(getCurrentPath()));
                }
                if (switchStarts.contains(start) && assignmentContext(getCurrentPath())) {
                    assignedAt.add(start);
                }
                return super.visitParenthesized(node, unused);
            }
        }.scan(unit, null);

        Map<Point, String> mismatched = new LinkedHashMap<>();
        for (HostRegion host : file.hosts()) {
            if (host.kind() == HostKind.STATEMENT) {
                continue;
            }
            TypeMirror original = typeAt.get(host.original().begin());
            boolean assigned = assignedAt.contains(host.begin());
            for (Branch branch : host.mutated()) {
                TypeMirror mutated = typeAt.get(branch.begin());
                if (original == null || mutated == null) {
                    mismatched.put(branch.point(), "the schema could not find its branch's type");
                } else if (original.getKind() != TypeKind.ERROR && mutated.getKind() != TypeKind.ERROR
                        && !interchangeable(mutated, original, assigned)) {
                    mismatched.put(branch.point(), "its type " + mutated + " differs from the original's " + original);
                }
            }
        }
        return mismatched;
    }

    private boolean interchangeable(TypeMirror mutated, TypeMirror original, boolean assigned) {
        if (mutated.getKind().isPrimitive() || original.getKind().isPrimitive()) {
            return mutated.getKind() == original.getKind();
        }
        if (types.isSameType(mutated, original)) {
            return true;
        }
        if (bothUnbox(mutated, original)) {
            // two boxed numbers or booleans make a numeric or boolean conditional, which unboxes both
            return false;
        }
        // a reference conditional in an assignment context converts each branch to the target on its own;
        // elsewhere, branches that agree up to type arguments (two captures of one wildcard) pick the same overloads
        return assigned || types.isSameType(types.erasure(mutated), types.erasure(original));
    }

    private boolean bothUnbox(TypeMirror left, TypeMirror right) {
        TypeKind a = unboxed(left);
        TypeKind b = unboxed(right);
        return a != null && b != null && (a == TypeKind.BOOLEAN) == (b == TypeKind.BOOLEAN);
    }

    private TypeKind unboxed(TypeMirror type) {
        if (type.getKind() != TypeKind.DECLARED) {
            return null;
        }
        try {
            return types.unboxedType(type).getKind();
        } catch (IllegalArgumentException notABox) {
            return null;
        }
    }

    /** Whether the switch is the whole value of a return (from a method), an initialiser with a declared type, or an assignment. */
    private boolean assignmentContext(TreePath path) {
        Tree node = path.getLeaf();
        Tree parent = path.getParentPath().getLeaf();
        if (parent instanceof ReturnTree) {
            for (TreePath at = path.getParentPath(); at != null; at = at.getParentPath()) {
                switch (at.getLeaf().getKind()) {
                    case METHOD:
                        return true;
                    case LAMBDA_EXPRESSION:
                    case CLASS:
                        return false;
                    default:
                        break;
                }
            }
            return false;
        }
        if (parent instanceof VariableTree variable) {
            return variable.getInitializer() == node && declaredType(variable);
        }
        return parent instanceof AssignmentTree assignment && assignment.getExpression() == node;
    }

    /** {@code var} takes the initialiser's own type, which the switch would change. */
    private boolean declaredType(VariableTree variable) {
        Tree type = variable.getType();
        if (type == null) {
            return false;
        }
        long begin = positions.getStartPosition(unit, type);
        long end = positions.getEndPosition(unit, type);
        return begin >= 0 && end > begin && !file.text().substring((int) begin, (int) end).equals("var");
    }
}
