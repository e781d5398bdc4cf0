package dev.changeling.review.triage;

import dev.changeling.results.RunResults;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * The triage loop's entry point: walks the unresolved survivors of a run one at a time, asks what to
 * do with each, and saves every decision the moment it is made.
 */
public final class Triage {

    /**
     * What to triage and how to show it.
     *
     * @param projectRoot the project folder, holding {@code .changeling/}
     * @param results     the run (already limited to the files asked for)
     * @param revisit     stop at every unresolved survivor from the first, including those already marked needs a test
     * @param style       colours, or none
     * @param environment the variables that name the editor to open a file in ({@code VISUAL}, {@code EDITOR})
     */
    public record Setup(Path projectRoot, RunResults results, boolean revisit, Style style, Map<String, String> environment) {
        public Setup {
            Objects.requireNonNull(projectRoot, "projectRoot");
            Objects.requireNonNull(results, "results");
            Objects.requireNonNull(style, "style");
            environment = Map.copyOf(Objects.requireNonNull(environment, "environment"));
        }

        /** Without an editor to open files in. */
        public Setup(Path projectRoot, RunResults results, boolean revisit, Style style) {
            this(projectRoot, results, revisit, style, Map.of());
        }
    }

    /**
     * How a session ended.
     *
     * @param survivors how many unresolved survivors it walked
     * @param decided   how many of them have a decision now
     * @param resumesAt the short id of the survivor the next session starts at, if any is left without a decision
     */
    public record Ending(int survivors, int decided, Optional<String> resumesAt) {
    }

    private Triage() {
    }

    /** Runs a session until the developer quits, the survivors run out, or the answers end. */
    public static Ending run(Setup setup, Answers answers, PrintWriter out, MutantRerun rerun) {
        return new Session(setup, answers, out, rerun).run();
    }
}
