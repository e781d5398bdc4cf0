package dev.changeling.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.compile.RenderedFile.HostRegion;
import dev.changeling.mutant.HostKind;
import dev.changeling.mutant.Point;
import dev.changeling.source.SourceFile;
import dev.changeling.source.Span;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class SchemaRendererTest {

    private static final String P = "dev.changeling.probe.Probe";

    /** Points made by hand on one file; ids are given in the order the points are added. */
    private static final class Sketch {
        final SourceFile file;
        final List<Point> points = new ArrayList<>();
        final Map<Point, Integer> ids = new HashMap<>();

        Sketch(String text) {
            file = SourceFile.of("A.java", text);
        }

        /** A point on the first occurrence of {@code host} (after {@code after}), replacing {@code edit} inside it. */
        Sketch point(String after, String host, String edit, String replacement, HostKind kind) {
            int hostBegin = file.text().indexOf(host, file.text().indexOf(after));
            int editBegin = file.text().indexOf(edit, hostBegin);
            Point point = new Point("A.java", "A", "f()", "by-hand", kind,
                    new Span(hostBegin, hostBegin + host.length()), new Span(editBegin, editBegin + edit.length()),
                    replacement, host, "by hand", 1, false, "f" + points.size());
            ids.put(point, points.size());
            points.add(point);
            return this;
        }

        Sketch point(String host, String edit, String replacement, HostKind kind) {
            return point("", host, edit, replacement, kind);
        }

        RenderedFile render() {
            return SchemaRenderer.render(file, points, ids, point -> InfectionWatch.watchable(point, file.text()));
        }

        String text() {
            return render().text();
        }
    }

    @Nested
    class EntryNotes {

        @Test
        void aNotedMethodBeginsWithItsNote_onTheLineOfItsBrace_beforeAStatementHostThatOpensIt() {
            Sketch sketch = new Sketch("class A {\n    void f(int a) {g(a);\n    }\n    int h() { return 1; }\n}")
                    .point("g(a);", "g(a);", "", HostKind.STATEMENT);
            java.util.NavigableMap<Integer, Integer> notes = new java.util.TreeMap<>();
            notes.put(sketch.file.text().indexOf("{g") + 1, 0);
            notes.put(sketch.file.text().indexOf("{ return 1") + 1, 1);
            String schema = SchemaRenderer.render(sketch.file, sketch.points, sketch.ids, point -> false, notes).text();
            assertEquals("class A {\n    void f(int a) {" + P + ".enter(0); { if (!" + P + ".on(0)) { g(a); } }\n    }\n"
                    + "    int h() {" + P + ".enter(1);  return 1; }\n}", schema);
            assertEquals(sketch.file.text().lines().count(), schema.lines().count(), "line numbers survive");
        }
    }

    @Nested
    class ExpressionHosts {

        @Test
        void twoPointsOnOneHost_chainTheirBranchesBeforeTheOriginal() {
            String schema = new Sketch("class A { int f(int a, int b) { return a + b; } }")
                    .point("a + b", "+", "-", HostKind.EXPRESSION)
                    .point("a + b", "+", "*", HostKind.EXPRESSION)
                    .text();
            assertEquals("class A { int f(int a, int b) { return (" + P + ".on(0) ? (a - b) : " + P
                    + ".on(1) ? (a * b) : (a + b)); } }", schema);
        }

        @Test
        void nestedHost_isSwitchedInsideTheOriginalBranchOnly() {
            String schema = new Sketch("class A { int f(int a, int b, int c) { return a * b + c; } }")
                    .point("a * b + c", "+", "-", HostKind.EXPRESSION)
                    .point("a * b", "*", "/", HostKind.EXPRESSION)
                    .text();
            assertEquals("class A { int f(int a, int b, int c) { return (" + P + ".on(0) ? (a * b - c) : (("
                    + P + ".on(1) ? (a / b) : (a * b)) + c)); } }", schema);
        }

        @Test
        void textOutsideHosts_staysByteForByte() {
            String text = "class A {\r\n  // note: a + b\r\n  int f(int a, int b) { /* keep */ return a + b; }\r\n}\r\n";
            String schema = new Sketch(text).point("return ", "a + b", "+", "-", HostKind.EXPRESSION).text();
            assertEquals(text.replace("return a + b;", "return (" + P + ".on(0) ? (a - b) : (a + b));"), schema);
        }
    }

    @Nested
    class StatementHosts {

        @Test
        void statementExpression_isWrappedInACallThatHandsItBack() {
            String schema = new Sketch("class A { int i; void f() { i++; } }")
                    .point("i++", "++", "--", HostKind.STATEMENT_EXPRESSION)
                    .text();
            assertEquals("class A { int i; void f() { " + P + ".pass(" + P + ".on(0) ? (i--) : (i++)); } }", schema);
        }

        @Test
        void deletion_becomesAGuardedBlockOfItsOwn() {
            String schema = new Sketch("class A { int i; void f() { if (i > 0) i++; else i--; } }")
                    .point("i++;", "i++;", "", HostKind.STATEMENT)
                    .text();
            assertEquals("class A { int i; void f() { if (i > 0) { if (!" + P + ".on(0)) { i++; } } else i--; } }", schema);
        }

        @Test
        void deletionHoldingAnIncrement_switchesTheIncrementInsideTheKeptStatement() {
            String schema = new Sketch("class A { int i; void f() { i++; } }")
                    .point("i++;", "i++;", "", HostKind.STATEMENT)
                    .point("i++", "++", "--", HostKind.STATEMENT_EXPRESSION)
                    .text();
            assertEquals("class A { int i; void f() { { if (!" + P + ".on(0)) { " + P + ".pass(" + P
                    + ".on(1) ? (i--) : (i++)); } } } }", schema);
        }

        @Test
        void statementChangedRatherThanDeleted_choosesBetweenBlocks() {
            String schema = new Sketch("class A { int f(int a) { return a; } }")
                    .point("return a;", "a", "0", HostKind.STATEMENT)
                    .text();
            assertEquals("class A { int f(int a) { { if (" + P + ".on(0)) { return 0; } else { return a; } } } }", schema);
        }
    }

    @Nested
    class Regions {

        @Test
        void branchesAndHosts_areFoundByOffset() {
            RenderedFile rendered = new Sketch("class A { int f(int a, int b, int c) { return a * b + c; } }")
                    .point("a * b + c", "+", "-", HostKind.EXPRESSION)
                    .point("a * b", "*", "/", HostKind.EXPRESSION)
                    .render();
            String text = rendered.text();
            HostRegion outer = rendered.hosts().get(0);
            HostRegion inner = rendered.hosts().get(1);
            assertSame(inner, rendered.innermostHostAt(text.indexOf("a / b")));
            assertEquals("/", inner.mutated().get(0).point().replacement());
            assertSame(inner.mutated().get(0), rendered.mutatedBranchAt(text.indexOf("a / b") + 2));
            assertSame(outer.mutated().get(0), rendered.mutatedBranchAt(text.indexOf("a * b - c") + 6));
            assertNull(rendered.mutatedBranchAt(text.indexOf(") + c)") + 3), "the original branch is not a mutated one");
            assertSame(outer, rendered.innermostHostAt(text.indexOf(") + c)") + 3));
            assertNull(rendered.innermostHostAt(text.indexOf("return")));
        }

        @Test
        void hostsOverlappingWithoutNesting_rejectTheLaterOne() {
            RenderedFile rendered = new Sketch("class A { int f(int a, int b, int c) { return a + b + c; } }")
                    .point("a + b", "+", "-", HostKind.EXPRESSION)
                    .point("b + c", "+", "-", HostKind.EXPRESSION)
                    .render();
            assertEquals(1, rendered.rejected().size());
            assertEquals("b + c", rendered.rejected().keySet().iterator().next().snippet());
            assertTrue(rendered.text().contains("(a - b)"));
        }

        @Test
        void statementHostThatIsALambdasExpressionBody_isRejected() {
            RenderedFile rendered = new Sketch("class A { int i; Runnable r = () -> i++; }")
                    .point("i++", "i++", "", HostKind.STATEMENT)
                    .render();
            assertEquals(List.of("its host is not a whole statement"), List.copyOf(rendered.rejected().values()));
            assertEquals("class A { int i; Runnable r = () -> i++; }", rendered.text());
        }
    }

    @Nested
    class LineBreaksInMutatedBranches {

        @Test
        void becomeSpaces_soLaterLinesKeepTheirNumbers() {
            assertEquals("a   - b", SchemaRenderer.oneLine("a\n  - b"));
            assertEquals("a  - b", SchemaRenderer.oneLine("a\r\n - b"));
        }

        @Test
        void lineCommentsAreDropped_blockCommentsKept() {
            assertEquals("a   /* why */ - b", SchemaRenderer.oneLine("a // note\n /* why */ - b"));
            assertEquals("a /* two lines */ - b", SchemaRenderer.oneLine("a /* two\nlines */ - b"));
        }

        @Test
        void slashesInsideLiterals_areNotComments() {
            assertEquals("\"http://x\" + '/' + c", SchemaRenderer.oneLine("\"http://x\"\n+ '/' + c"));
        }

        @Test
        void textBlock_keepsItsLineBreaks() {
            String text = "\"\"\"\n  two\n  lines\"\"\" + a";
            assertEquals(text, SchemaRenderer.oneLine(text));
        }
    }
}
