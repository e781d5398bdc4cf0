package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.RunResults;
import dev.changeling.results.RunSettings;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/** Hand-made results for the analysis tests: mutants placed on a line of a method, with the tests that reach and kill them. */
final class Made {

    private Made() {
    }

    static PointRecord point(String fingerprint, String type, String member, int line) {
        return new PointRecord(fingerprint, "relational-subset", type, member, line, 9, line, 9, "<", "<=", "a < b",
                "replaced < with <=");
    }

    /**
     * A first-order mutant on {@code file:line} in {@code Till.total(int)}: killed by {@code killers} (the first is
     * {@code killedBy}) when there are any, else survived when reached and unreached when not.
     */
    static MutantResult mutant(String id, String file, int line, List<String> reach, List<String> killers) {
        return mutant(id, file, line, "total(int)", reach, killers);
    }

    static MutantResult mutant(String id, String file, int line, String member, List<String> reach, List<String> killers) {
        Verdict verdict = !killers.isEmpty() ? Verdict.KILLED : reach.isEmpty() ? Verdict.UNREACHED : Verdict.SURVIVED;
        return new MutantResult(id, file, 1, List.of(point(id, "shop.Till", member, line)), verdict,
                killers.isEmpty() ? null : killers.get(0), null, reach, reach, 1.0, "", killers);
    }

    /** A killed mutant of a run that stopped at the first failure: only {@code killedBy} is known. */
    static MutantResult firstFailureOnly(String id, List<String> reach, String killedBy) {
        return new MutantResult(id, "Till.java", 1, List.of(point(id, "shop.Till", "total(int)", 10)), Verdict.KILLED,
                killedBy, null, reach, reach, 1.0, "", null);
    }

    static MutantResult withVerdict(MutantResult mutant, Verdict verdict) {
        return new MutantResult(mutant.id(), mutant.file(), mutant.order(), mutant.points(), verdict, mutant.killedBy(),
                mutant.detail(), mutant.testsRun(), mutant.reachedBy(), mutant.millis(), mutant.diff(), mutant.killers());
    }

    /** A higher-order mutant whose points carry the given fingerprints (the ids of its first-order parts). */
    static MutantResult higherOrder(String id, Verdict verdict, String... parts) {
        List<PointRecord> points = Arrays.stream(parts).map(part -> point(part, "shop.Till", "total(int)", 10)).toList();
        return new MutantResult(id, "Till.java", parts.length, points, verdict,
                verdict.detected() ? "t1" : null, null, List.of("t1"), List.of("t1"), 1.0,
                "--- a/Till.java\n+++ b/Till.java\n@@ -10 +10 @@\n-a < b\n+a <= b\n", null);
    }

    /** A complete run with these tests in the baseline, each named after its id. */
    static RunResults run(List<String> tests, List<MutantResult> mutants) {
        RunSettings settings = new RunSettings("/tmp/shop", List.of("relational-subset"), List.of(1, 2), "method", 1L,
                false, mutants.size(), null, 1, 2.0, 1000L, List.of(), List.of(), List.of(), "2g", null, null, 500, false, 0, false, null);
        return new RunResults(RunResults.FORMAT, true, settings,
                tests.stream().map(test -> new TestRecord(test, "name of " + test, 1.0)).toList(), Map.of(), mutants,
                List.of(), Map.of());
    }
}
