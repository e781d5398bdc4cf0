package dev.changeling.review;

import dev.changeling.analysis.Score;
import dev.changeling.results.MutantResult;
import dev.changeling.results.RunResults;
import java.util.List;

/**
 * Where a run stands for review: its score with the listed equivalents taken out, the survivors a reviewer still
 * has to look at (neither listed as equivalent nor marked fixed), and the files the run could not read, which are
 * in no figure. Every view asks here (the run's report, export, its gate), so they never disagree.
 *
 * @param results     the run, limited to what the view shows
 * @param score       its figures, the listed equivalents left out
 * @param toLookAt    the unresolved survivors, in file and position order
 * @param unreadFiles one line per file that could not be read ({@code path:line: why})
 */
public record Standing(RunResults results, Score score, List<MutantResult> toLookAt, List<String> unreadFiles) {

    public Standing {
        toLookAt = List.copyOf(toLookAt);
        unreadFiles = List.copyOf(unreadFiles);
    }

    public static Standing of(RunResults results, Settled settled) {
        return new Standing(results, Score.of(results.mutants(), settled.equivalent()),
                Survivors.unresolved(results.mutants(), settled::resolved),
                results.problems() == null ? List.of() : results.problems());
    }

    /** "2 files could not be read — not in the score", or empty when every file was read. */
    public String unreadSummary() {
        int count = unreadFiles.size();
        if (count == 0) {
            return "";
        }
        return count + (count == 1 ? " file" : " files") + " could not be read — not in the score";
    }
}
