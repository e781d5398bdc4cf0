package dev.changeling.review.export;

import static dev.changeling.results.ResultsForTests.result;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.RunResults;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class HtmlReportTest {

    private static final String SHOP = "src/main/java/shop/Till.java";
    private static final String SNEAKY_TEST = "[engine:junit-jupiter]/[class:shop.TillTest]/[method:sneaky()]";

    /** A survivor whose diff, member and reaching test hold markup and a web address, as source text can. */
    private static MutantResult hostileSurvivor() {
        MutantResult made = result("aaaaaaaa01", SHOP, "relational-subset", 1, Verdict.SURVIVED);
        String diff = "--- a/" + SHOP + "\n+++ b/" + SHOP + "\n@@ -10 +10 @@\n"
                + "-        String s = \"<script>alert('x')</script> https://example.org\";\n"
                + "+        String s = \"\";\n";
        return new MutantResult(made.id(), made.file(), 1, made.points(), Verdict.SURVIVED, null, null,
                List.of(SNEAKY_TEST), List.of(SNEAKY_TEST), 1.0, diff, null, List.of());
    }

    private static RunResults withTests(List<MutantResult> mutants, boolean sampled, List<TestRecord> tests) {
        RunResults run = ResultsForTests.run(mutants, sampled, 400);
        return new RunResults(run.format(), true, run.settings(), tests, Map.of(), run.mutants(), List.of(), Map.of());
    }

    private static String render(RunResults results) {
        return HtmlReport.render(Standings.of(results, mutant -> false));
    }

    private static String hostilePage() {
        return render(withTests(List.of(hostileSurvivor(), result("cccccccc03", SHOP, "relational-subset", 1, Verdict.KILLED)),
                false, List.of(new TestRecord(SNEAKY_TEST, "TillTest > <script>steal()</script>", 3.0))));
    }

    @Nested
    class Escaping {

        @Test
        void sourceAndTestText_appearAsText_neverAsMarkup() {
            String page = hostilePage();

            assertFalse(page.toLowerCase(Locale.ROOT).contains("<script"), page);
            assertTrue(page.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt;"), page);
            assertTrue(page.contains("TillTest &gt; &lt;script&gt;steal()&lt;/script&gt;"), page);
        }

        @Test
        void diffLines_areMarkedRemovedAndAdded() {
            String page = hostilePage();

            assertTrue(page.contains("<span class=\"del\">-        String s = &quot;&lt;script&gt;"), page);
            assertTrue(page.contains("<span class=\"add\">+        String s = &quot;&quot;;</span>"), page);
        }
    }

    @Nested
    class SelfContained {

        private static final Pattern TAG = Pattern.compile("<[^>]*>");

        @Test
        void noTagFetchesAnything_andWebAddressesAreOnlyText() {
            String page = hostilePage();

            for (String forbidden : List.of("<script", "<link", "@import", "url(", "<img", "<iframe")) {
                assertFalse(page.toLowerCase(Locale.ROOT).contains(forbidden), forbidden);
            }
            Matcher tags = TAG.matcher(page);
            while (tags.find()) {
                String tag = tags.group().toLowerCase(Locale.ROOT);
                assertFalse(tag.contains("http:") || tag.contains("https:") || tag.contains("src=") || tag.contains("href="), tag);
            }
            assertTrue(page.contains("https://example.org"), "the address in the diff is kept as text");
        }

        @Test
        void isOneHtmlDocument_withItsStyleInline() {
            String page = hostilePage();

            assertTrue(page.startsWith("<!DOCTYPE html>\n<html lang=\"en\">"), page);
            assertTrue(page.contains("<meta charset=\"utf-8\">"), page);
            assertTrue(page.contains("<style>"), page);
            assertTrue(page.endsWith("</html>\n"), page);
        }
    }

    @Nested
    class ScoreAndInterval {

        private final List<MutantResult> mutants = List.of(
                result("aaaaaaaa01", SHOP, "relational-subset", 1, Verdict.SURVIVED),
                result("bbbbbbbb02", SHOP, "relational-subset", 1, Verdict.KILLED),
                result("cccccccc03", SHOP, "relational-subset", 1, Verdict.KILLED),
                result("dddddddd04", SHOP, "arithmetic-swap", 1, Verdict.UNREACHED));

        @Test
        void aSampledRun_showsTheWilsonInterval() {
            String page = render(withTests(mutants, true, List.of()));

            // 2 of 4: the Wilson 95% interval is 0.150 to 0.850 (Wilson 1927, formula as in analysis/Interval), rounded outwards.
            assertTrue(page.contains("<p class=\"interval\">95% interval 0.15 to 0.85"), page);
            assertTrue(page.contains("a sample of 4 mutants from 400"), page);
        }

        @Test
        void aFullRun_showsNoInterval() {
            String page = render(withTests(mutants, false, List.of()));

            assertFalse(page.contains("class=\"interval\""), page);
            assertTrue(page.contains("<span class=\"figure\">0.50</span> 2 of 4 counted mutants detected"), page);
        }

        @Test
        void countsEachVerdict_andTabulatesFilesAndOperators() {
            String page = render(withTests(mutants, false, List.of()));

            assertTrue(page.contains("<li><span class=\"swatch\" style=\"background:#3f8f5a\"></span>killed 2</li>"), page);
            assertTrue(page.contains("survived 1</li>"), page);
            assertTrue(page.contains("unreached 1</li>"), page);
            assertTrue(page.contains("<td class=\"name\">arithmetic-swap</td><td class=\"num\">1</td>"), page);
            assertTrue(page.contains("<td class=\"name\">" + SHOP.replace("/", "/<wbr>") + "</td><td class=\"num\">4</td>"), page);
        }

        @Test
        void theStrip_marksTheSurvivorsLine() {
            String page = render(withTests(mutants, false, List.of()));

            assertTrue(page.contains("<title>line 10: survived</title>"), page);
            assertTrue(page.contains("<div class=\"strip-lines\">survivor at 10</div>"), page);
        }
    }

    @Nested
    class HeatMap {

        private static final String T1 = "[engine:junit-jupiter]/[class:shop.TillTest]/[method:totals()]";
        private static final String T2 = "[engine:junit-jupiter]/[class:shop.TillTest]/[method:change()]";

        private static MutantResult killed(String id, String operator, List<String> killers) {
            MutantResult made = result(id, SHOP, operator, 1, Verdict.KILLED);
            return new MutantResult(made.id(), SHOP, 1, made.points(), Verdict.KILLED, killers.get(0), null, killers, killers,
                    1.0, made.diff(), killers, null);
        }

        @Test
        void fromTheFullKillMatrix_countsEachTestsKillsPerOperator() {
            String page = render(withTests(List.of(
                    killed("a1", "arithmetic-swap", List.of(T1, T2)),
                    killed("a2", "arithmetic-swap", List.of(T1)),
                    killed("r1", "relational-subset", List.of(T2))), false, List.of()));

            String row = "<tr><td class=\"name\">TillTest &gt; totals()</td>";
            int at = page.indexOf(row);
            assertTrue(at > 0, page);
            String rest = page.substring(at + row.length(), page.indexOf("</tr>", at));
            assertEquals("<td class=\"cell\" style=\"background:hsl(212,65%,32%);color:#fff\">2</td>"
                    + "<td class=\"cell\"></td><td class=\"num\">2</td>", rest);
            assertTrue(page.contains("(the full kill matrix)"), page);
            assertFalse(page.contains("lower bound"), page);
        }

        @Test
        void fromTheFirstFailureOnly_saysTheCountsAreALowerBound() {
            String page = render(withTests(List.of(result("bbbbbbbb02", SHOP, "relational-subset", 1, Verdict.KILLED)),
                    false, List.of()));

            assertTrue(page.contains("these counts are a lower bound"), page);
        }
    }

    @Nested
    class FurtherFigures {

        @Test
        void aSectionFromElsewhere_isSetApart_andItsTextEscaped() {
            RunResults results = withTests(List.of(hostileSurvivor()), false, List.of());
            HtmlSection section = HtmlSection.table("Redundant tests", "Tests whose kills others cover.",
                    List.of("test", "covered by"), List.of(List.of("a<b", "c & d")));

            String page = HtmlReport.render(Standings.of(results, mutant -> false), Optional.of(section));

            assertTrue(page.contains("<section id=\"further\" class=\"further\">\n<h2>Redundant tests</h2>"), page);
            assertTrue(page.contains("<td>a&lt;b</td><td>c &amp; d</td>"), page);
        }

        @Test
        void withoutOne_thePageHasNoFurtherSection() {
            assertFalse(hostilePage().contains("id=\"further\""));
        }
    }
}
