package dev.changeling.compile;

import com.sun.source.tree.BlockTree;
import com.sun.source.tree.CaseTree;
import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.tree.Tree;
import com.sun.source.util.SourcePositions;
import com.sun.source.util.TreePathScanner;
import dev.changeling.compile.RenderedFile.HostRegion;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Finds statement switches that stand where only one statement may stand: the body of an
 * {@code if} or a loop without braces, a label's statement, an arrow case's body. The schema's block
 * is legal there whatever it holds, but the mutant's own file puts nothing or any statement there,
 * which may not compile ({@code case 1 -> }) or may take the next statement as the body.
 */
final class StatementContexts {

    private StatementContexts() {
    }

    /** The points of statement switches outside a block or a case's statement group, each with the reason. */
    static Map<Point, String> outsideBlocks(Javac.Task task, CompilationUnitTree unit, RenderedFile file) {
        SourcePositions positions = task.trees().getSourcePositions();
        Map<Integer, HostRegion> statementsByBegin = new HashMap<>();
        for (HostRegion host : file.hosts()) {
            if (host.kind() == HostKind.STATEMENT) {
                statementsByBegin.put(host.begin(), host);
            }
        }
        Map<Point, String> found = new LinkedHashMap<>();
        if (statementsByBegin.isEmpty()) {
            return found;
        }
        new TreePathScanner<Void, Void>() {
            @Override
            public Void visitBlock(BlockTree block, Void unused) {
                HostRegion host = statementsByBegin.get((int) positions.getStartPosition(unit, block));
                if (host != null && positions.getEndPosition(unit, block) == host.end()
                        && !inStatementList(getCurrentPath().getParentPath().getLeaf())) {
                    host.points().forEach(point -> found.put(point,
                            "its statement stands alone as a body, where its own file's text reads differently"));
                }
                return super.visitBlock(block, unused);
            }
        }.scan(unit, null);
        return found;
    }

    private static boolean inStatementList(Tree parent) {
        return parent instanceof BlockTree
                || parent instanceof CaseTree group && group.getCaseKind() == CaseTree.CaseKind.STATEMENT;
    }
}
