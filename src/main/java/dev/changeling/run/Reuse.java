package dev.changeling.run;

import java.nio.file.Path;
import java.util.Optional;

/**
 * What a run takes from earlier runs.
 *
 * @param recall   whether a mutant whose code, tests and settings are those an earlier run found its verdict with gets
 *                 that verdict again without running ({@code recall.Recall}); verdicts are kept for later runs either way
 * @param reachMap the reach map to choose the baseline's tests by, when given by hand; else the one in the build folder
 * @param mapOnly  whether the run makes every point, runs the baseline, writes the reach map and stops there
 */
public record Reuse(boolean recall, Optional<Path> reachMap, boolean mapOnly) {

    /** Everything earlier runs left in the build folder, and a whole run. */
    public static final Reuse DEFAULT = new Reuse(true, Optional.empty(), false);

    /** Whether the baseline may take tests' reach from a reach map instead of running them. */
    boolean selectsTests() {
        return recall && !mapOnly;
    }
}
