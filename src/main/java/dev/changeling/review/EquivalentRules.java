package dev.changeling.review;

import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import dev.changeling.results.TestRecord;
import dev.changeling.results.Verdict;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * What may go on the equivalents list, and which mutant a short id means. Every way of editing the list
 * (the command line, triage) asks here, so the rules are the same everywhere.
 */
public final class EquivalentRules {

    /** The fewest hex digits of a fingerprint that name a mutant. */
    public static final int MIN_ID_LENGTH = 4;

    private EquivalentRules() {
    }

    /** The run's one mutant whose id starts with {@code id}. */
    public static MutantResult mutantOf(String id, RunResults run) {
        return single(id, run.mutants().stream().filter(mutant -> mutant.id().startsWith(lower(id))).toList(),
                MutantResult::id, "in the last run");
    }

    /** The list's one entry whose fingerprint starts with {@code id}. */
    public static EquivalentEntry entryOf(String id, EquivalentsList list, String where) {
        return single(id, list.startingWith(lower(id)), EquivalentEntry::fingerprint, where);
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

    private static <T> T single(String id, List<T> matches, Function<T, String> fingerprint, String where) {
        if (id.length() < MIN_ID_LENGTH || !id.matches("[0-9a-fA-F]+")) {
            throw new UserError("'" + id + "' is not a mutant id; give at least " + MIN_ID_LENGTH + " of its hex digits");
        }
        if (matches.isEmpty()) {
            throw new UserError("no mutant " + id + " " + where + "; copy the id from 'changeling equivalents' or the run's report");
        }
        if (matches.size() > 1) {
            throw new UserError("id " + id + " fits " + matches.size() + " mutants ("
                    + matches.stream().map(match -> fingerprint.apply(match).substring(0, 12)).collect(Collectors.joining(", "))
                    + "); give more digits");
        }
        return matches.get(0);
    }

    private static String lower(String id) {
        return id.toLowerCase(Locale.ROOT);
    }
}
