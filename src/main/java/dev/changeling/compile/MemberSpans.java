package dev.changeling.compile;

import com.sun.source.tree.ClassTree;
import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.tree.Tree;
import com.sun.source.util.SourcePositions;
import com.sun.source.util.TreeScanner;
import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.List;

/** The extents of every member (method, constructor, field, initialiser) of every class in a compiled file. */
final class MemberSpans {

    private final List<Span> spans;

    private MemberSpans(List<Span> spans) {
        this.spans = spans;
    }

    static MemberSpans of(CompilationUnitTree unit, SourcePositions positions) {
        List<Span> spans = new ArrayList<>();
        new TreeScanner<Void, Void>() {
            @Override
            public Void visitClass(ClassTree type, Void unused) {
                for (Tree member : type.getMembers()) {
                    long begin = positions.getStartPosition(unit, member);
                    long end = positions.getEndPosition(unit, member);
                    if (begin >= 0 && end >= begin) {
                        spans.add(new Span((int) begin, (int) end));
                    }
                }
                return super.visitClass(type, unused);
            }
        }.scan(unit, null);
        return new MemberSpans(spans);
    }

    /** The innermost member holding the offset, or null outside every member. */
    Span innermostAt(int offset) {
        Span found = null;
        for (Span span : spans) {
            if (span.contains(offset) && (found == null || span.length() < found.length())) {
                found = span;
            }
        }
        return found;
    }
}
