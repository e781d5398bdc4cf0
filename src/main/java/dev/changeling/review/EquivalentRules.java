package dev.changeling.review;

import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import java.util.List;

/**
 * What may go on the equivalents list, and which mutant or entry a short id means there (matched by
 * {@link IdPrefix}). Every way of editing the list (the command line, triage) asks here, so the rules are the
 * same everywhere.
 */
public final class EquivalentRules {

    private static final String WHERE_TO_COPY = "copy the id from 'changeling equivalents' or the run's report";

    private EquivalentRules() {
    }

    /** The run's one mutant whose id starts with {@code id}. */
    public static MutantResult mutantOf(String id, RunResults run) {
        return IdPrefix.single(id, run.mutants(), MutantResult::id, "in the last run", WHERE_TO_COPY);
    }

    /** The list's one entry whose fingerprint starts with {@code id}. */
    public static EquivalentEntry entryOf(String id, EquivalentsList list, String where) {
        return IdPrefix.single(id, list.entries(), EquivalentEntry::fingerprint, where, WHERE_TO_COPY);
    }

    /**
     * The entry that lists a mutant as equivalent.
     *
     * @throws UserError when the reason is blank, or the mutant is not one a test fails to tell apart:
     *                   it does not compile, or a test detected it (named as the run shows it)
     */
    public static EquivalentEntry entry(MutantResult mutant, String reason, RunResults run) {
        if (reason == null || reason.isBlank()) {
            throw new UserError("--reason is empty; say why the tests cannot tell mutant " + mutant.shortId()
                    + " from the original, so the next reader can check it");
        }
        if (mutant.verdict() == Verdict.STILLBORN) {
            throw new UserError("mutant " + mutant.shortId() + " does not compile, so it is not counted: there is nothing to list");
        }
        if (mutant.verdict().detected()) {
            throw new UserError("mutant " + mutant.shortId() + " was " + mutant.verdict().word()
                    + (mutant.killedBy() == null ? "" : " by " + testName(mutant.killedBy(), run))
                    + ", so a test tells it from the original: it is not equivalent");
        }
        return EquivalentEntry.of(mutant, reason.strip());
    }

    private static String testName(String testId, RunResults run) {
        List<TestRecord> tests = run.tests() == null ? List.of() : run.tests();
        return tests.stream().filter(test -> test.id().equals(testId)).map(TestRecord::name).findFirst().orElse(testId);
    }
}
