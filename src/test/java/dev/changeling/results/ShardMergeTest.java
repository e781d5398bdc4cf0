package dev.changeling.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.mutant.Fingerprint;
import dev.changeling.mutant.Shard;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ShardMergeTest {

    private static final String LAMP = "src/main/java/coast/Lamp.java";
    private static final String HORN = "src/main/java/coast/Foghorn.java";
    private static final String FLASHES = "[engine:junit-jupiter]/[class:coast.LampTest]/[method:flashesEveryTenSeconds()]";
    private static final String SOUNDS = "[engine:junit-jupiter]/[class:coast.FoghornTest]/[method:soundsInFog()]";
    private static final Verdict[] VERDICTS = {Verdict.KILLED, Verdict.SURVIVED, Verdict.TIMED_OUT, Verdict.SURVIVED,
        Verdict.UNREACHED, Verdict.STILLBORN};
    /** Every survivor of the lamp compiles to the same classes, one shape; each of the horn to its own. */
    private static final String LAMP_SHAPE = "a1".repeat(32);

    /** The mutants of the whole run, in its order: real fingerprints of made-up points of a lighthouse. */
    private static final List<MutantResult> WHOLE = IntStream.range(0, 18).mapToObj(ShardMergeTest::mutant).toList();

    private static MutantResult mutant(int i) {
        String file = i % 3 == 0 ? HORN : LAMP;
        String id = Fingerprint.of(file, "Lamp", "flash(int)", "relational-subset", "beats > " + i, "beats >= " + i, 0);
        Verdict verdict = VERDICTS[i % VERDICTS.length];
        MutantResult made = ResultsForTests.result(id, file, "relational-subset", 1, verdict);
        return new MutantResult(id, file, 1, made.points(), verdict, verdict.detected() ? SOUNDS : null, null,
                verdict == Verdict.UNREACHED ? List.of() : List.of(SOUNDS, FLASHES),
                verdict == Verdict.UNREACHED ? List.of() : List.of(FLASHES, SOUNDS), 2.0, made.diff(), null,
                verdict == Verdict.SURVIVED ? List.of(FLASHES) : null);
    }

    private static List<String> order() {
        return WHOLE.stream().map(MutantResult::id).toList();
    }

    private static List<MutantResult> survivors() {
        return WHOLE.stream().filter(mutant -> mutant.verdict() == Verdict.SURVIVED).toList();
    }

    private static String shapeOf(MutantResult survivor) {
        return survivor.file().equals(LAMP) ? LAMP_SHAPE : new StringBuilder(survivor.id()).reverse().toString();
    }

    /** What a run with {@code --shard index/count} writes: its share, with its own baseline and its own times. */
    private static RunResults shard(int index, int count) {
        Shard shard = new Shard(index, count);
        List<MutantResult> mine = shard.of(WHOLE, MutantResult::id);
        Map<String, String> shapes = new LinkedHashMap<>();
        mine.stream().filter(mutant -> mutant.verdict() == Verdict.SURVIVED).forEach(survivor -> shapes.put(survivor.id(), shapeOf(survivor)));
        List<TestRecord> tests = index == 1
                ? List.of(new TestRecord(FLASHES, "flashesEveryTenSeconds()", 4.0), new TestRecord(SOUNDS, "soundsInFog()", 3.0))
                : List.of(new TestRecord(SOUNDS, "soundsInFog()", 5.0 + index), new TestRecord(FLASHES, "flashesEveryTenSeconds()", 1.0));
        Map<String, Double> timings = new LinkedHashMap<>();
        timings.put("maven", 100.0 * index);
        timings.put("execute", 10.0);
        timings.put("total", 1000.0 + index);
        return new RunResults(RunResults.FORMAT, true, settings(), tests, timings, mine, List.of("Beacon.java:3: cannot parse"),
                Map.of(LAMP, "lamp-hash", HORN, "horn-hash"), Map.of("assert statement", 2),
                new CompiledAlike(Map.of(), List.of(), shapes.size(), shapes), new ShardRecord(index, count, order()), List.of());
    }

    private static RunSettings settings() {
        return ResultsForTests.run(List.of(), false, 0).settings();
    }

    /** What one run without {@code --shard} would have written: shard 1's suite, every mutant, each phase's time summed. */
    private static RunResults unsharded() {
        List<String> lampSurvivors = survivors().stream().filter(survivor -> survivor.file().equals(LAMP)).map(MutantResult::id).toList();
        Map<String, Double> timings = new LinkedHashMap<>();
        timings.put("maven", 600.0);
        timings.put("execute", 30.0);
        timings.put("total", 3006.0);
        return new RunResults(RunResults.FORMAT, true, settings(), shard(1, 3).tests(), timings, WHOLE, List.of("Beacon.java:3: cannot parse"),
                Map.of(LAMP, "lamp-hash", HORN, "horn-hash"), Map.of("assert statement", 2),
                new CompiledAlike(Map.of(), List.of(lampSurvivors), survivors().size()));
    }

    private static List<ShardMerge.Part> parts(RunResults... shards) {
        List<ShardMerge.Part> parts = new ArrayList<>();
        for (RunResults shard : shards) {
            parts.add(new ShardMerge.Part(Path.of("shard-" + (shard.shard() == null ? "whole" : shard.shard().index()) + ".json"), shard));
        }
        return parts;
    }

    @Nested
    class AllShardsOfOneRun {

        @Test
        void mergeIntoExactlyWhatOneUnshardedRunGives_givenInAnyOrder() {
            assertEquals(unsharded(), ShardMerge.merge(parts(shard(3, 3), shard(1, 3), shard(2, 3))));
        }

        @Test
        void findTheDuplicatesOneRunFinds_acrossShards() {
            List<String> lampSurvivors = survivors().stream().filter(survivor -> survivor.file().equals(LAMP)).map(MutantResult::id).toList();
            long shardsHoldingThem = IntStream.rangeClosed(1, 3)
                    .filter(index -> lampSurvivors.stream().anyMatch(new Shard(index, 3)::holds)).count();
            assertTrue(shardsHoldingThem > 1, "the made-up lamp's survivors must lie in more than one shard for this case");

            CompiledAlike merged = ShardMerge.merge(parts(shard(1, 3), shard(2, 3), shard(3, 3))).compiledAlike();
            assertEquals(List.of(lampSurvivors), merged.duplicates());
            assertEquals(Map.of(), merged.shapes(), "a merged file is a whole run's: no shapes");
        }

        @Test
        void throughTheirFiles_keepEveryTestReference_withShard1sSuite(@TempDir Path folder) throws Exception {
            List<ShardMerge.Part> parts = new ArrayList<>();
            for (int index = 1; index <= 3; index++) {
                Path file = folder.resolve("shard-" + index + ".json");
                ResultsFile.write(file, shard(index, 3));
                parts.add(new ShardMerge.Part(file, ResultsFile.read(file)));
            }
            Path merged = folder.resolve("merged.json");
            ResultsFile.write(merged, ShardMerge.merge(parts));

            assertEquals(unsharded(), ResultsFile.read(merged));
            JsonNode tree = new ObjectMapper().readTree(merged.toFile());
            assertFalse(tree.has("shard"), "a merged file is not a shard's");
            assertFalse(tree.get("compiledAlike").has("shapes"));
            assertEquals(FLASHES, tree.get("tests").get(0).get("id").asText(), "shard 1's suite, in its order");
            assertEquals("[1,0]", tree.get("mutants").get(1).get("testsRun").toString(), "numbers into shard 1's suite");
        }

        @Test
        void mayComeFromMachinesWithOtherNumbersOfWorkers() {
            RunResults two = shard(2, 3);
            RunSettings s = two.settings();
            RunSettings moreWorkers = new RunSettings(s.project(), s.operators(), s.orders(), s.scope(), s.seed(), s.sampled(),
                    s.population(), s.changeScope(), s.workers() + 7, s.timeFactor(), s.timeExtraMillis(), s.skipTests(),
                    s.skipTags(), s.mavenArguments(), s.workerHeap(), s.mavenExecutable(), s.explicitProject(),
                    s.mutantsPerWorker(), s.mutateDiagnostics(), s.perLine(), s.everyTest(), s.mix());
            RunResults merged = ShardMerge.merge(parts(shard(1, 3), withSettings(two, moreWorkers), shard(3, 3)));
            assertEquals(settings(), merged.settings(), "shard 1's settings");
        }

        @Test
        void oneInterrupted_makeIncompleteResults() {
            RunResults two = shard(2, 3);
            RunResults interrupted = new RunResults(two.format(), false, two.settings(), two.tests(), two.timings(),
                    two.mutants().subList(0, 1), two.problems(), two.sourceHashes(), two.notMade(), two.compiledAlike(), two.shard(), List.of());
            RunResults merged = ShardMerge.merge(parts(shard(1, 3), interrupted, shard(3, 3)));
            assertFalse(merged.complete());
            assertEquals(WHOLE.size() - two.mutants().size() + 1, merged.mutants().size());
        }
    }

    @Nested
    class Refused {

        private static UserError refused(RunResults... shards) {
            UserError error = assertThrows(UserError.class, () -> ShardMerge.merge(parts(shards)));
            assertEquals(ExitCode.SHARDS_APART, error.exitCode());
            assertFalse(error.getMessage().contains("\n"), "one line: " + error.getMessage());
            return error;
        }

        @Test
        void aMissingShard_namingIt() {
            UserError error = refused(shard(1, 3), shard(3, 3));
            assertEquals("shard 2/3 is missing: 2 of 3 shards given (1/3, 3/3); give the results files of all 3 shards,"
                    + " or run the missing ones", error.getMessage());
        }

        @Test
        void aShardGivenTwice() {
            UserError error = refused(shard(1, 3), shard(2, 3), shard(2, 3), shard(3, 3));
            assertEquals("shard-2.json: shard 2/3 is given twice (also shard-2.json); give each shard's results file once",
                    error.getMessage());
        }

        @Test
        void shardsOfRunsCutIntoOtherNumbers() {
            String message = refused(shard(1, 3), shard(2, 2), shard(3, 3)).getMessage();
            assertTrue(message.startsWith("shard-2.json: shard 2/2 is of a run cut into 2 shards, but shard-1.json is of one cut"
                    + " into 3"), message);
        }

        @Test
        void aWholeRunsResults() {
            String message = refused(shard(1, 1), ResultsForTests.run(WHOLE, false, 0)).getMessage();
            assertTrue(message.startsWith("shard-whole.json: these are the results of a whole run, not of a shard"), message);
        }

        @Test
        void aShardRunWithOtherSettings_namingTheSetting() {
            RunSettings s = settings();
            RunSettings otherSeed = new RunSettings(s.project(), s.operators(), s.orders(), s.scope(), 7L, s.sampled(),
                    s.population(), s.changeScope(), s.workers(), s.timeFactor(), s.timeExtraMillis(), s.skipTests(),
                    s.skipTags(), s.mavenArguments(), s.workerHeap(), s.mavenExecutable(), s.explicitProject(),
                    s.mutantsPerWorker(), s.mutateDiagnostics(), s.perLine(), s.everyTest(), s.mix());
            String message = refused(shard(1, 3), shard(2, 3), withSettings(shard(3, 3), otherSeed)).getMessage();
            assertEquals("shard-3.json: shard 3/3 was run with another setting seed (7, not 1) than shard 1/3 (shard-1.json);"
                    + " run every shard with the same options", message);
        }

        @Test
        void aShardOfOtherSources_namingTheFile() {
            RunResults two = shard(2, 3);
            RunResults edited = new RunResults(two.format(), true, two.settings(), two.tests(), two.timings(), two.mutants(),
                    two.problems(), Map.of(LAMP, "lamp-edited", HORN, "horn-hash"), two.notMade(), two.compiledAlike(), two.shard(), List.of());
            String message = refused(shard(1, 3), edited, shard(3, 3)).getMessage();
            assertEquals("shard-2.json: shard 2/3 was run on another version of " + LAMP + " than shard 1/3 (shard-1.json);"
                    + " run every shard on the same revision", message);
        }

        @Test
        void aShardCutFromOtherMutants() {
            RunResults two = shard(2, 3);
            RunResults otherCut = new RunResults(two.format(), true, two.settings(), two.tests(), two.timings(), two.mutants(),
                    two.problems(), two.sourceHashes(), two.notMade(), two.compiledAlike(),
                    new ShardRecord(2, 3, order().subList(1, order().size())), List.of());
            String message = refused(shard(1, 3), otherCut, shard(3, 3)).getMessage();
            assertTrue(message.startsWith("shard-2.json: shard 2/3 was cut from other mutants (17, against 18)"), message);
        }

        @Test
        void aShardWhoseBaselineRanOtherTests() {
            RunResults three = shard(3, 3);
            RunResults fewer = new RunResults(three.format(), true, three.settings(), three.tests().subList(1, 2), three.timings(),
                    three.mutants(), three.problems(), three.sourceHashes(), three.notMade(), three.compiledAlike(), three.shard(), List.of());
            String message = refused(shard(1, 3), shard(2, 3), fewer).getMessage();
            assertTrue(message.startsWith("shard-3.json: shard 3/3's baseline ran other tests than shard 1/3 (shard-1.json), "
                    + SOUNDS + " in one only"), message);
        }

        @Test
        void aShardHoldingAMutantOfAnother() {
            RunResults one = shard(1, 3);
            List<MutantResult> more = new ArrayList<>(one.mutants());
            MutantResult stray = shard(2, 3).mutants().get(0);
            more.add(stray);
            RunResults tampered = new RunResults(one.format(), true, one.settings(), one.tests(), one.timings(), more,
                    one.problems(), one.sourceHashes(), one.notMade(), one.compiledAlike(), one.shard(), List.of());
            String message = refused(tampered, shard(2, 3), shard(3, 3)).getMessage();
            assertEquals("shard-1.json: mutant " + stray.shortId() + " is not in shard 1/3; give the results files as the"
                    + " shards' runs wrote them", message);
        }
    }

    private static RunResults withSettings(RunResults shard, RunSettings settings) {
        return new RunResults(shard.format(), shard.complete(), settings, shard.tests(), shard.timings(), shard.mutants(),
                shard.problems(), shard.sourceHashes(), shard.notMade(), shard.compiledAlike(), shard.shard(), List.of());
    }
}
