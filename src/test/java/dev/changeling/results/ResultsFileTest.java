package dev.changeling.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.changeling.UserError;
import dev.changeling.ExitCode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResultsFileTest {

    private static final String FIRST = "[engine:junit-jupiter]/[class:shop.PricesTest]/[method:addsTwoNumbers()]";
    private static final String SECOND = "[engine:junit-jupiter]/[class:shop.PricesTest]/[method:addsZero()]";
    private static final String UNLISTED = "[engine:junit-jupiter]/[class:shop.Gone]/[method:gone()]";

    @TempDir
    Path folder;

    private static RunResults results() {
        PointRecord point = new PointRecord("f1", "arithmetic-swap", "Prices", "add(int, int)", 3, 5, 3, 9,
                "a + b", "a - b", "a + b", "replaced + with -");
        MutantResult killed = new MutantResult("f1", "src/main/java/shop/Prices.java", 1, List.of(point), Verdict.KILLED, FIRST,
                "expected 5", List.of(SECOND, FIRST), List.of(SECOND, FIRST, UNLISTED), 3.5, "--- a\n+++ b\n");
        RunResults template = ResultsForTests.run(List.of(killed), false, 1);
        return new RunResults(RunResults.FORMAT, true, template.settings(),
                List.of(new TestRecord(FIRST, "addsTwoNumbers()", 1.0), new TestRecord(SECOND, "addsZero()", 0.5)),
                Map.of("total", 10.0), List.of(killed), List.of(), Map.of());
    }

    @Test
    void readsBackWhatItWrote_withEachTestStoredAsItsNumberInTheSuite() throws Exception {
        Path file = folder.resolve("results.json");
        ResultsFile.write(file, results());
        assertEquals(results(), ResultsFile.read(file));

        JsonNode mutant = new ObjectMapper().readTree(file.toFile()).get("mutants").get(0);
        assertEquals("[1,0]", mutant.get("testsRun").toString());
        assertEquals("[1,0,\"" + UNLISTED.replace("\"", "\\\"") + "\"]", mutant.get("reachedBy").toString(),
                "an id the suite does not list is kept as itself");
        String text = Files.readString(file);
        assertEquals(text.indexOf(SECOND), text.lastIndexOf(SECOND), "the id is written once, in the suite");
    }

    @Test
    void theModulesOfABuild_areReadBack_andAFileWithoutThem_isOfOneModule() throws Exception {
        Path file = folder.resolve("results.json");
        RunResults plain = results();
        RunResults built = new RunResults(plain.format(), plain.complete(), plain.settings(), plain.tests(), plain.timings(),
                plain.mutants(), plain.problems(), plain.sourceHashes(), plain.notMade(), plain.compiledAlike(), null,
                List.of(new ModuleRecord("parts/core", List.of("app")), new ModuleRecord("app", List.of())));
        ResultsFile.write(file, built);
        assertEquals(built, ResultsFile.read(file));

        ObjectMapper json = new ObjectMapper();
        com.fasterxml.jackson.databind.node.ObjectNode tree = (com.fasterxml.jackson.databind.node.ObjectNode) json.readTree(file.toFile());
        tree.remove("modules");
        json.writeValue(file.toFile(), tree);
        assertEquals(List.of(), ResultsFile.read(file).modules(), "a file written before modules were kept");
    }

    @Test
    void refusesATestNumberOutsideTheSuite_andAnOlderFormat_withOneLineSayingWhatToDo() throws Exception {
        Path file = folder.resolve("results.json");
        ResultsFile.write(file, results());
        String text = Files.readString(file);

        Files.writeString(file, text.replaceFirst("\"testsRun\" : \\[ 1, 0 \\]", "\"testsRun\" : [ 7 ]"));
        UserError outside = assertThrows(UserError.class, () -> ResultsFile.read(file));
        assertTrue(outside.getMessage().contains("test number 7"), outside.getMessage());

        Files.writeString(file, text.replaceFirst("\"format\" : " + RunResults.FORMAT, "\"format\" : 1"));
        UserError older = assertThrows(UserError.class, () -> ResultsFile.read(file));
        assertTrue(older.getMessage().contains("results format 1 is not " + RunResults.FORMAT), older.getMessage());
        assertTrue(older.getMessage().contains("run 'changeling run' again"), older.getMessage());
    }

    @Test
    void aFileWithOnlyItsFormat_orCutOff_orOfWrongShape_isOneLineWithTheFile_neverALibrarysText() throws Exception {
        Path file = folder.resolve("results.json");
        for (String text : List.of("{\"format\":" + RunResults.FORMAT + "}", "[1,2",
                "{\"format\":" + RunResults.FORMAT + ",\"mutants\":\"many\"}")) {
            Files.writeString(file, text);
            UserError error = assertThrows(UserError.class, () -> ResultsFile.read(file), text);
            assertTrue(error.getMessage().startsWith(file + ": "), error.getMessage());
            assertTrue(error.getMessage().endsWith("run 'changeling run' again to rewrite it"), error.getMessage());
            assertFalse(error.getMessage().contains("`") || error.getMessage().contains("Source:")
                    || error.getMessage().contains("dev.changeling"), error.getMessage());
            assertEquals(ExitCode.USER_ERROR, error.exitCode());
        }
    }

    @Test
    void aWholeRunsFileHasNoShardFields_andAShardsKeepsThem() throws Exception {
        Path file = folder.resolve("results.json");
        ResultsFile.write(file, results());
        JsonNode whole = new ObjectMapper().readTree(file.toFile());
        assertFalse(whole.has("shard"));
        assertFalse(whole.get("compiledAlike").has("shapes"));

        RunResults plain = results();
        RunResults shard = new RunResults(plain.format(), true, plain.settings(), plain.tests(), plain.timings(), plain.mutants(),
                plain.problems(), plain.sourceHashes(), plain.notMade(),
                new CompiledAlike(Map.of(), List.of(), 1, Map.of("f1", "ab".repeat(32))), new ShardRecord(2, 3, List.of("f0", "f1")), List.of());
        ResultsFile.write(file, shard);
        assertEquals(shard, ResultsFile.read(file));
    }

    @Test
    void aFileWrittenBeforeShardsExisted_stillLoads_asAWholeRun() throws Exception {
        Path file = folder.resolve("results.json");
        ResultsFile.write(file, results());
        ObjectMapper json = new ObjectMapper();
        ObjectNode tree = (ObjectNode) json.readTree(file.toFile());
        tree.remove("compiledAlike");
        json.writeValue(file.toFile(), tree);

        RunResults read = ResultsFile.read(file);
        assertEquals(null, read.shard());
        assertEquals(CompiledAlike.NONE, read.compiledAlike());
    }
}
