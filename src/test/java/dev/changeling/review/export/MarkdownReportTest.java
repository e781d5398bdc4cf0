package dev.changeling.review.export;

import dev.changeling.review.Survivors;
import static dev.changeling.results.ResultsForTests.result;
import static dev.changeling.results.ResultsForTests.run;
import static dev.changeling.results.ResultsForTests.survivorsOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.source.SourceFile;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.commonmark.node.AbstractVisitor;
import org.commonmark.node.Code;
import org.commonmark.node.Emphasis;
import org.commonmark.node.FencedCodeBlock;
import org.commonmark.node.HtmlBlock;
import org.commonmark.node.HtmlInline;
import org.commonmark.node.Link;
import org.commonmark.node.Node;
import org.commonmark.node.Paragraph;
import org.commonmark.node.SoftLineBreak;
import org.commonmark.node.Text;
import org.commonmark.parser.Parser;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

// Read back with commonmark-java (org.commonmark:commonmark), an implementation of the CommonMark spec.
class MarkdownReportTest {

    /** Source text built to break a naive fence: a bare ``` line and a six-backtick literal next to the sites. */
    static final String HOSTILE = """
            package shop;

            class Quote {
                boolean brief(int words, int lines) {
                    String block = \"""
            ```
            \""";
                    String fence = "`````` ~~~";
                    return words < 3 && lines > 1;
                }
            }
            """;

    private static List<MutantResult> hostileSurvivors(String text, int order) {
        List<MutantResult> made = survivorsOf(List.of(SourceFile.of("src/main/java/shop/Quote.java", text)), List.of(order));
        return Survivors.unresolved(made, mutant -> false);
    }

    private static String render(List<MutantResult> mutants, Predicate<MutantResult> resolved) {
        RunResults results = run(mutants, false, mutants.size());
        return MarkdownReport.render(Standings.of(results, resolved));
    }

    private static Node parse(String markdown) {
        return Parser.builder().build().parse(markdown);
    }

    private static <T extends Node> List<T> all(Node root, Class<T> type) {
        List<T> found = new ArrayList<>();
        for (Node node = root.getFirstChild(); node != null; node = node.getNext()) {
            if (type.isInstance(node)) {
                found.add(type.cast(node));
            }
            found.addAll(all(node, type));
        }
        return found;
    }

    /** What a reader sees of a paragraph: its text and code, markup gone. */
    private static String plain(Node paragraph) {
        StringBuilder out = new StringBuilder();
        paragraph.accept(new AbstractVisitor() {
            @Override
            public void visit(Text text) {
                out.append(text.getLiteral());
            }

            @Override
            public void visit(Code code) {
                out.append(code.getLiteral());
            }

            @Override
            public void visit(SoftLineBreak lineBreak) {
                out.append('\n');
            }
        });
        return out.toString();
    }

    @Nested
    class DiffBlocks {

        private final List<MutantResult> survivors = hostileSurvivors(HOSTILE, 1);

        @Test
        void sampleIsHostile_aNaiveFenceWouldBreak() {
            String diff = survivors.get(0).diff();
            assertTrue(diff.contains("``````") && diff.contains("\n ```\n"), diff);

            List<FencedCodeBlock> naive = all(parse("```diff\n" + diff + "```\n"), FencedCodeBlock.class);

            assertNotEquals(diff, naive.get(0).getLiteral());
        }

        @Test
        void everyBlockReadsBackAsItsDiff_exactly() {
            String markdown = render(survivors, mutant -> false);

            List<FencedCodeBlock> blocks = all(parse(markdown), FencedCodeBlock.class);

            assertEquals(survivors.size(), blocks.size());
            assertTrue(survivors.size() >= 3, "one block per survivor: " + survivors.size());
            for (int i = 0; i < blocks.size(); i++) {
                assertEquals(survivors.get(i).diff(), blocks.get(i).getLiteral());
                assertEquals("diff", blocks.get(i).getInfo());
                assertEquals("`", blocks.get(i).getFenceCharacter());
            }
        }

        @Test
        void fenceIsLongerThanAnyBacktickRunInside() {
            String markdown = render(survivors, mutant -> false);

            assertTrue(markdown.contains("\n```````diff\n"), markdown);
        }

        @Test
        void crlfDiff_readsBackWithLfLineEndings() {
            String crlf = HOSTILE.replace("\n", "\r\n");
            List<MutantResult> windows = hostileSurvivors(crlf, 1);
            assertTrue(windows.get(0).diff().contains("\r\n"));

            List<FencedCodeBlock> blocks = all(parse(render(windows, mutant -> false)), FencedCodeBlock.class);

            assertEquals(windows.get(0).diff().replace("\r\n", "\n"), blocks.get(0).getLiteral());
        }

        @Test
        void diffWithoutTrailingNewline_readsBackWithTheMarker() {
            String unterminated = "class Cut { boolean f(int a) { return a < 1; } }";
            List<MutantResult> cut = Survivors.unresolved(survivorsOf(List.of(SourceFile.of("Cut.java", unterminated)), List.of(1)), mutant -> false);

            List<FencedCodeBlock> blocks = all(parse(render(cut, mutant -> false)), FencedCodeBlock.class);

            assertTrue(blocks.get(0).getLiteral().endsWith("\\ No newline at end of file\n"));
            assertEquals(cut.get(0).diff(), blocks.get(0).getLiteral());
        }
    }

    @Nested
    class SurvivorLines {

        private MutantResult tricky() {
            PointRecord point = new PointRecord("f0", "relational_subset", "shop.Till", "<init>(int)", 42, 9, 42, 9,
                    "<", "<=", "a < b", "replaced *a* with <b>x</b> & `y` | $z$ ~~w~~ [l](u) !\\");
            return new MutantResult("0123456789abcdef", "src/my_file`s.java", 1, List.of(point), Verdict.SURVIVED,
                    null, null, List.of(), List.of(), 0, "--- a/x\n+++ b/x\n");
        }

        @Test
        void placeOperatorIdAndDescription_readBackAsPlainText() {
            Node document = parse(render(List.of(tricky()), mutant -> false));

            Paragraph line = all(document, Paragraph.class).get(3);

            assertEquals("src/my_file`s.java:42 · relational_subset · 01234567 · "
                    + "replaced *a* with <b>x</b> & `y` | $z$ ~~w~~ [l](u) !\\ in <init>(int)", plain(line));
        }

        @Test
        void noMarkupSurvivesFromTheText() {
            Node document = parse(render(List.of(tricky()), mutant -> false));

            assertTrue(all(document, HtmlInline.class).isEmpty());
            assertTrue(all(document, HtmlBlock.class).isEmpty());
            assertTrue(all(document, Link.class).isEmpty());
            assertTrue(all(document, Emphasis.class).isEmpty());
        }

        @Test
        void kOrderSurvivor_namesItsOrderAndEveryChange() {
            List<MutantResult> mutants = hostileSurvivors(HOSTILE, 2);
            assertFalse(mutants.isEmpty());
            MutantResult second = mutants.get(0);

            String line = MarkdownReport.heading(second);

            assertTrue(line.contains(" · order 2 · "), line);
            assertEquals(2, line.split(" in `brief\\(", -1).length - 1, line);
        }
    }

    @Nested
    class Selection {

        @Test
        void onlyUnresolvedSurvivorsAreListed() {
            List<MutantResult> mutants = List.of(
                    result("aaaaaaaa01", "A.java", "op", 1, Verdict.SURVIVED),
                    result("bbbbbbbb02", "B.java", "op", 1, Verdict.SURVIVED),
                    result("cccccccc03", "C.java", "op", 1, Verdict.KILLED),
                    result("dddddddd04", "D.java", "op", 1, Verdict.UNREACHED));

            String markdown = render(mutants, mutant -> mutant.id().startsWith("b"));

            assertTrue(markdown.contains("`aaaaaaaa`"), markdown);
            assertFalse(markdown.contains("`bbbbbbbb`"), markdown);
            assertFalse(markdown.contains("`cccccccc`"), markdown);
            assertFalse(markdown.contains("`dddddddd`"), markdown);
            assertEquals(1, all(parse(markdown), FencedCodeBlock.class).size());
        }

        @Test
        void noUnresolvedSurvivors_saysSoWithoutBlocks() {
            List<MutantResult> mutants = List.of(result("cccccccc03", "C.java", "op", 1, Verdict.KILLED));

            String markdown = render(mutants, mutant -> false);

            assertTrue(markdown.contains("No survivors to look at"), markdown);
            assertTrue(all(parse(markdown), FencedCodeBlock.class).isEmpty());
        }
    }

    @Nested
    class SummaryLine {

        @Test
        void firstParagraph_isTheSummary() {
            List<MutantResult> mutants = List.of(
                    result("aaaaaaaa01", "A.java", "op", 1, Verdict.SURVIVED),
                    result("cccccccc03", "C.java", "op", 1, Verdict.KILLED));

            Paragraph first = all(parse(render(mutants, mutant -> false)), Paragraph.class).get(0);

            assertEquals("Changeling: mutation score 0.50 (1 of 2 detected) · 2 mutants · killed 1 · survived 1"
                    + " · 1 survivor to look at", plain(first));
        }

        @Test
        void secondParagraph_isTheLineCoverage() {
            List<MutantResult> mutants = List.of(
                    result("aaaaaaaa01", "A.java", "op", 1, Verdict.SURVIVED),
                    result("cccccccc03", "C.java", "op", 1, Verdict.KILLED));

            Paragraph second = all(parse(render(mutants, mutant -> false)), Paragraph.class).get(1);

            assertEquals("line coverage 1.00 (2 of 2 mutated lines run by a test) · 1 mutant on lines the tests run goes unnoticed",
                    plain(second));
        }

        @Test
        void sampledRun_showsTheInterval() {
            List<MutantResult> mutants = new ArrayList<>();
            for (int i = 0; i < 20; i++) {
                mutants.add(result("m" + i, "A.java", "op", 1, i < 15 ? Verdict.KILLED : Verdict.SURVIVED));
            }
            RunResults sampled = run(mutants, true, 500);

            String markdown = MarkdownReport.render(Standings.of(sampled, mutant -> false));

            Paragraph first = all(parse(markdown), Paragraph.class).get(0);
            assertTrue(plain(first).startsWith("Changeling: mutation score 0.75 (15 of 20 detected; 95% interval 0.53–0.89,"
                    + " a sample of 20 from 500)"), plain(first));
        }
    }

    @Test
    void filesThatCouldNotBeRead_areListedUnderTheSummary() {
        RunResults read = run(List.of(), false, 0);
        RunResults unread = new RunResults(read.format(), true, read.settings(), read.tests(), read.timings(), read.mutants(),
                List.of("src/main/java/shop/Ledger.java:4: Parse error"), read.sourceHashes());

        String markdown = MarkdownReport.render(Standings.of(unread, mutant -> false));

        assertTrue(markdown.contains("**1 file could not be read — not in the score:**\n\n- src/main/java/shop/Ledger.java:4: Parse error\n"),
                markdown);
    }

    /** A survivor in {@code file} that {@code reaching} tests run and miss. */
    private static MutantResult reachedBy(String id, String file, int reaching) {
        MutantResult made = result(id, file, "relational-subset", 1, Verdict.SURVIVED);
        List<String> tests = new ArrayList<>();
        for (int i = 0; i < reaching; i++) {
            tests.add("[engine:junit-jupiter]/[class:shop.TillTest]/[method:case" + i + "()]");
        }
        return new MutantResult(made.id(), made.file(), made.order(), made.points(), made.verdict(), null, null,
                tests, tests, 1.0, made.diff());
    }

    @Test
    void survivorsThatTheMostTestsRunAndMiss_comeFirst_andTheLimitCountsTheRest() {
        List<MutantResult> mutants = List.of(reachedBy("aaaa0001", "A.java", 1), reachedBy("bbbb0002", "B.java", 7),
                reachedBy("cccc0003", "C.java", 3));
        String markdown = MarkdownReport.render(Standings.of(run(mutants, false, 3), mutant -> false), 2);

        assertTrue(markdown.indexOf("bbbb0002") < markdown.indexOf("cccc0003"), markdown);
        assertFalse(markdown.contains("aaaa0001"), markdown);
        assertTrue(markdown.contains("\n…and 1 more survivor, fewer tests reaching each;"), markdown);
        assertTrue(MarkdownReport.render(Standings.of(run(mutants, false, 3), mutant -> false), MarkdownReport.ALL)
                .contains("aaaa0001"));
    }
}
