package dev.changeling.results;

import com.fasterxml.jackson.databind.annotation.JsonDeserialize;
import com.fasterxml.jackson.databind.annotation.JsonSerialize;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * One mutant and what became of it.
 *
 * @param id        the fingerprint, full length
 * @param file      project-relative path
 * @param order     how many points it has (1 for first-order)
 * @param points    its changes, in file order
 * @param verdict   what became of it
 * @param killedBy  the test that failed, for killed mutants
 * @param detail    the failure message, the reason it was skipped, or the compiler's error
 * @param testsRun  the tests run against it, in the order they ran (stored as numbers into the run's tests)
 * @param reachedBy every test that reaches its points in the baseline (stored the same way)
 * @param millis    the time spent running its tests
 * @param diff      the unified diff of exactly what was run
 * @param killers   every reaching test that fails with it, when the run ran them all (the full kill matrix); null
 *                  when the run stopped at the first failure (stored the same way as {@code testsRun})
 * @param infectedBy the reaching tests for which the mutated expression gave another value than the original in the
 *                   baseline (stored the same way); empty when it never did; null when that could not be watched
 */
public record MutantResult(
        String id,
        String file,
        int order,
        List<PointRecord> points,
        Verdict verdict,
        String killedBy,
        String detail,
        @JsonSerialize(using = TestRefs.Writer.class) @JsonDeserialize(using = TestRefs.Reader.class) List<String> testsRun,
        @JsonSerialize(using = TestRefs.Writer.class) @JsonDeserialize(using = TestRefs.Reader.class) List<String> reachedBy,
        double millis,
        String diff,
        @JsonSerialize(using = TestRefs.Writer.class) @JsonDeserialize(using = TestRefs.Reader.class) List<String> killers,
        @JsonSerialize(using = TestRefs.Writer.class) @JsonDeserialize(using = TestRefs.Reader.class) List<String> infectedBy) {

    /** A mutant of a run that stopped at the first failure: no kill matrix, infection not watched. */
    public MutantResult(String id, String file, int order, List<PointRecord> points, Verdict verdict, String killedBy,
                        String detail, List<String> testsRun, List<String> reachedBy, double millis, String diff) {
        this(id, file, order, points, verdict, killedBy, detail, testsRun, reachedBy, millis, diff, null, null);
    }

    /** A mutant whose infection was not watched. */
    public MutantResult(String id, String file, int order, List<PointRecord> points, Verdict verdict, String killedBy,
                        String detail, List<String> testsRun, List<String> reachedBy, double millis, String diff,
                        List<String> killers) {
        this(id, file, order, points, verdict, killedBy, detail, testsRun, reachedBy, millis, diff, killers, null);
    }

    public String shortId() {
        return id.substring(0, Math.min(8, id.length()));
    }

    public PointRecord first() {
        return points.get(0);
    }

    /** The tests known to detect it: {@code killedBy} and every stored killer when it was detected; none otherwise. */
    public List<String> knownKillers() {
        if (!verdict.detected()) {
            return List.of();
        }
        Set<String> known = new LinkedHashSet<>();
        if (killedBy != null) {
            known.add(killedBy);
        }
        if (killers != null) {
            known.addAll(killers);
        }
        return List.copyOf(known);
    }

    /** Whether {@link #knownKillers()} are all its killers: it was not detected, or the run stored every one. */
    public boolean everyKillerKnown() {
        return !verdict.detected() || killers != null;
    }

    public MutantResult withVerdict(Verdict newVerdict, String newKilledBy, String newDetail,
                                    List<String> newTestsRun, double newMillis) {
        return new MutantResult(id, file, order, points, newVerdict, newKilledBy, newDetail, newTestsRun,
                reachedBy, newMillis, diff, killers, infectedBy);
    }
}
