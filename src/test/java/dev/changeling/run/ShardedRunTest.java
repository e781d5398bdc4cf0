package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * The harbour sample run once whole and once as three shards ({@code run --shard I/3}, one after the other on the same
 * copy, as three CI jobs on one revision would), the shards merged with {@code changeling merge}: the merged results
 * and the review export made from them are those of the whole run.
 */
@Tag("e2e")
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class ShardedRunTest {

    static final int SHARDS = 3;

    Path folder;
    Path project;
    RunResults whole;
    Export wholeExport;
    final List<RunResults> shards = new ArrayList<>();
    final List<Path> shardFiles = new ArrayList<>();
    Outcome merge;
    RunResults merged;
    Export mergedExport;

    /** What {@code export --markdown --sarif --html} wrote and printed, and what {@code insights} printed. */
    record Export(String summary, String markdown, String sarif, String html, String insights) {
    }

    /** A command line run in this JVM. */
    record Outcome(int code, String out, String err) {
        String transcript() {
            return "exit " + code + "\n--- out:\n" + out + "\n--- err:\n" + err;
        }
    }

    @BeforeAll
    void runWholeThenInShards_andMerge(@TempDir Path temporary) throws IOException {
        folder = temporary;
        project = SampleProjects.copy("harbour", temporary.resolve("harbour"));
        Path resultsFile = ProjectLayout.of(project).resultsFile();

        ToolRun wholeRun = ToolRun.onCopyOfProject(project);
        assertEquals(ExitCode.OK, wholeRun.exitCode(), wholeRun::transcript);
        whole = wholeRun.results();
        wholeExport = export("whole");

        for (int index = 1; index <= SHARDS; index++) {
            ToolRun shardRun = ToolRun.onCopyOfProject(project, "--shard", index + "/" + SHARDS);
            assertEquals(ExitCode.OK, shardRun.exitCode(), shardRun::transcript);
            shards.add(shardRun.results());
            Path file = Files.createDirectories(temporary.resolve("shard-" + index)).resolve("results.json");
            Files.copy(resultsFile, file);
            shardFiles.add(file);
        }

        Files.delete(resultsFile);
        merge = command("merge", shardFiles.get(2).toString(), shardFiles.get(0).toString(), shardFiles.get(1).toString(),
                "--into", resultsFile.toString());
        assertEquals(ExitCode.OK, merge.code(), merge::transcript);
        merged = ResultsFile.read(resultsFile);
        mergedExport = export("merged");
    }

    private Export export(String name) {
        Path markdown = folder.resolve(name + ".md");
        Path sarif = folder.resolve(name + ".sarif");
        Path html = folder.resolve(name + ".html");
        Outcome exported = command("export", project.toString(), "--markdown", markdown.toString(), "--sarif", sarif.toString(),
                "--html", html.toString());
        assertEquals(ExitCode.OK, exported.code(), exported::transcript);
        Outcome insights = command("insights", project.toString(), "--plain", "--top", "0");
        assertEquals(ExitCode.OK, insights.code(), insights::transcript);
        try {
            return new Export(exported.out().lines().findFirst().orElse(""), Files.readString(markdown), Files.readString(sarif),
                    Files.readString(html), insights.out());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Outcome command(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Outcome(code, out.toString(), err.toString());
    }

    private static Map<String, String> verdicts(RunResults results) {
        Map<String, String> verdicts = new LinkedHashMap<>();
        results.mutants().forEach(mutant -> verdicts.put(mutant.id(), mutant.verdict().name()));
        return verdicts;
    }

    @Nested
    class TheShards {

        @Test
        void holdEveryMutantOfTheWholeRunOnce_eachItsShareOnly() {
            Set<String> seen = new HashSet<>();
            int total = 0;
            for (RunResults shard : shards) {
                assertNotNull(shard.shard());
                assertEquals(SHARDS, shard.shard().count());
                assertEquals(whole.mutants().stream().map(MutantResult::id).toList(), shard.shard().selection(),
                        "each shard keeps the whole selection, in the whole run's order");
                shard.mutants().forEach(mutant -> seen.add(mutant.id()));
                total += shard.mutants().size();
                assertTrue(shard.mutants().size() < whole.mutants().size(), "shard " + shard.shard().label());
            }
            assertEquals(whole.mutants().size(), total, "no mutant in two shards");
            assertEquals(verdicts(whole).keySet(), seen);
        }

        @Test
        void keepTheSameSourceHashes_soAMergeCanTellTheRevision() {
            shards.forEach(shard -> assertEquals(whole.sourceHashes(), shard.sourceHashes()));
        }
    }

    @Nested
    class TheMerge {

        @Test
        void saysWhatItDid() {
            assertEquals("merged 3 shards into " + ProjectLayout.of(project).resultsFile() + ": " + whole.mutants().size()
                    + " mutants", merge.out().strip(), merge::transcript);
        }

        @Test
        void givesEveryMutantTheVerdictOfTheWholeRun_inItsOrder() {
            assertEquals(verdicts(whole), verdicts(merged));
            assertTrue(merged.complete());
            assertNull(merged.shard());
        }

        @Test
        void givesTheSameScore() {
            assertEquals(wholeExport.summary(), mergedExport.summary());
            assertTrue(mergedExport.summary().contains("mutation score"), mergedExport::summary);
        }

        @Test
        void givesTheSameReviewComment_andTheSameSarifLog() {
            assertEquals(wholeExport.markdown(), mergedExport.markdown());
            assertEquals(wholeExport.sarif(), mergedExport.sarif());
        }

        @Test
        void givesTheSameHtmlPage_andTheSameInsights() {
            assertEquals(wholeExport.html(), mergedExport.html());
            assertEquals(wholeExport.insights(), mergedExport.insights());
        }

        /** Harbour's two survivors with one set of classes fall in different shards: the merge groups them again. */
        @Test
        void findsTheSurvivorsCompiledAlike_asTheWholeRun() {
            assertEquals(whole.compiledAlike(), merged.compiledAlike());
            assertTrue(!whole.compiledAlike().duplicates().isEmpty(), "harbour has survivors with the same classes");
        }

        @Test
        void keepsTheSettingsAndTheSuite() {
            assertEquals(whole.settings(), merged.settings());
            assertEquals(whole.tests().stream().map(test -> test.id()).sorted().toList(),
                    merged.tests().stream().map(test -> test.id()).sorted().toList());
            assertEquals(whole.notMade(), merged.notMade());
        }
    }

    @Nested
    class Refused {

        @Test
        void aMissingShard_inOneLineNamingIt() {
            Outcome missing = command("merge", shardFiles.get(0).toString(), shardFiles.get(2).toString(),
                    "--into", folder.resolve("never.json").toString());
            assertEquals(ExitCode.SHARDS_APART, missing.code(), missing::transcript);
            assertEquals(List.of("changeling: shard 2/3 is missing: 2 of 3 shards given (1/3, 3/3); give the results files of all"
                    + " 3 shards, or run the missing ones"), missing.err().lines().toList());
            assertTrue(!Files.exists(folder.resolve("never.json")));
        }

        @Test
        void aShardGivenTwice_inOneLineNamingIt() {
            Outcome twice = command("merge", shardFiles.get(0).toString(), shardFiles.get(1).toString(),
                    shardFiles.get(1).toString(), shardFiles.get(2).toString(), "--into", folder.resolve("never.json").toString());
            assertEquals(ExitCode.SHARDS_APART, twice.code(), twice::transcript);
            assertEquals(List.of("changeling: " + shardFiles.get(1) + ": shard 2/3 is given twice (also " + shardFiles.get(1)
                    + "); give each shard's results file once"), twice.err().lines().toList());
        }
    }
}
