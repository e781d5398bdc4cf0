package dev.changeling.compile;

import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.tree.DoWhileLoopTree;
import com.sun.source.tree.ExpressionTree;
import com.sun.source.tree.ForLoopTree;
import com.sun.source.tree.ParenthesizedTree;
import com.sun.source.tree.WhileLoopTree;
import com.sun.source.util.SourcePositions;
import com.sun.source.util.TreeScanner;
import dev.changeling.compile.RenderedFile.Branch;
import dev.changeling.compile.RenderedFile.HostRegion;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Finds switches that are a whole loop condition where one side is a constant. javac judges
 * reachability by constant loop conditions ({@code while (false)} is an error, code after
 * {@code while (true)} is unreachable), and a switch is never constant, so the schema would accept
 * a mutant its own file does not, or reject the original. (Operators already avoid making a
 * loop condition constant, {@code operator.syntax.LoopConditions}; this catches the conditions that
 * are constant on one side before any mutant.)
 */
final class LoopConditionSwitches {

    private static final Pattern NUMBER = Pattern.compile("(?<![\\w$])\\d[\\w.]*");
    private static final Pattern NAME = Pattern.compile("[\\p{L}_$][\\p{L}\\p{N}_$]*");

    private LoopConditionSwitches() {
    }

    /** The points of such switches, each with the reason. */
    static Map<Point, String> constantSides(Javac.Task task, CompilationUnitTree unit, RenderedFile file) {
        SourcePositions positions = task.trees().getSourcePositions();
        Map<Integer, HostRegion> hostsByBegin = new HashMap<>();
        for (HostRegion host : file.hosts()) {
            if (host.kind() != HostKind.STATEMENT) {
                hostsByBegin.put(host.begin(), host);
            }
        }
        Map<Point, String> found = new LinkedHashMap<>();
        new TreeScanner<Void, Void>() {
            @Override
            public Void visitWhileLoop(WhileLoopTree loop, Void unused) {
                check(loop.getCondition());
                return super.visitWhileLoop(loop, unused);
            }

            @Override
            public Void visitDoWhileLoop(DoWhileLoopTree loop, Void unused) {
                check(loop.getCondition());
                return super.visitDoWhileLoop(loop, unused);
            }

            @Override
            public Void visitForLoop(ForLoopTree loop, Void unused) {
                check(loop.getCondition());
                return super.visitForLoop(loop, unused);
            }

            private void check(ExpressionTree condition) {
                for (ExpressionTree at = condition; at != null; ) {
                    HostRegion host = hostsByBegin.get((int) positions.getStartPosition(unit, at));
                    if (host != null && positions.getEndPosition(unit, at) == host.end()) {
                        constantSides(file, host).forEach(found::putIfAbsent);
                        return;
                    }
                    at = at instanceof ParenthesizedTree parenthesized ? parenthesized.getExpression() : null;
                }
            }
        }.scan(unit, null);
        return found;
    }

    private static Map<Point, String> constantSides(RenderedFile file, HostRegion host) {
        Map<Point, String> found = new LinkedHashMap<>();
        String text = file.source().text();
        boolean originalConstant = constant(file.source().textOf(host.points().get(0).host()));
        for (Branch branch : host.mutated()) {
            if (originalConstant || constant(branch.point().mutatedHost(text))) {
                found.put(branch.point(), "a switch would make a constant loop condition variable");
            }
        }
        return found;
    }

    /** Whether the text is made of literals and operators only, and so is a constant expression. */
    static boolean constant(String text) {
        if (text.indexOf('"') >= 0 || text.indexOf('\'') >= 0) {
            return false;
        }
        Matcher names = NAME.matcher(NUMBER.matcher(text).replaceAll(" "));
        while (names.find()) {
            if (!names.group().equals("true") && !names.group().equals("false")) {
                return false;
            }
        }
        return true;
    }
}
