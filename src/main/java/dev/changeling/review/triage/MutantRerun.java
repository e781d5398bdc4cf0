package dev.changeling.review.triage;

import dev.changeling.results.MutantResult;
import java.util.function.Consumer;

/**
 * Runs one mutant again against the project's code and tests as they are now, so that triage can
 * check a fix before recording it.
 */
@FunctionalInterface
public interface MutantRerun {

    /**
     * Runs the mutant's change again with the tests that reach it today.
     *
     * @param mutant   the mutant as the last run recorded it (its points, diff and {@code reachedBy})
     * @param progress told each slow step in a few words as it starts (such as "building the project")
     * @return the mutant with its new verdict, {@code killedBy}, {@code detail} and {@code testsRun}
     * @throws dev.changeling.UserError when it cannot be run again (no build, the change no longer applies);
     *                                  triage shows the message and records nothing
     */
    MutantResult rerun(MutantResult mutant, Consumer<String> progress);
}
