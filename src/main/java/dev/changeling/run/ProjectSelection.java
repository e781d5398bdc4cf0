package dev.changeling.run;

import dev.changeling.mutant.Selection;
import dev.changeling.mutant.SelectionInput;
import dev.changeling.mutant.Suppressions;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.KillHistory;
import java.util.Map;

/**
 * The mutants a command makes in a located project, the same for {@code run} and for the listing that previews it:
 * the selection as typed, the project's suppression rules, and for a change the per-line budget, ranked by the
 * operators' kill history of the project's last full run when there is one.
 */
public final class ProjectSelection {

    private ProjectSelection() {
    }

    /**
     * @param scoped whether the command is limited to a change
     * @throws dev.changeling.UserError (exit code 2) for an option value that cannot be used, or (exit code 1) when the
     *                                  suppression rules or the kill history cannot be read
     */
    public static Selection of(SelectionInput input, boolean scoped, ProjectLayout layout) {
        Selection selection = input.resolve(scoped).withSuppressions(Suppressions.load(layout.root()));
        if (!selection.request().budget().limits()) {
            return selection;
        }
        return selection.rankedBy(KillHistory.read(layout.killHistoryFile()).map(KillHistory::ratios).orElse(Map.of()));
    }
}
