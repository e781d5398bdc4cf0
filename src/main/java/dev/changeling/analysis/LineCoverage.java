package dev.changeling.analysis;

import dev.changeling.results.MutantResult;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * Line coverage of the mutated lines, read from what the probe recorded: a mutated line holds the first point of at
 * least one counted mutant, and it is run when some test reaches any mutant on it. Beside the score it tells "the
 * tests never run this" apart from "the tests run this but would not notice" ({@link #unnoticed}).
 *
 * @param mutatedLines lines holding the first point of a counted mutant
 * @param runLines     of those, the lines some test executes
 * @param unnoticed    counted mutants on run lines that no test detects (survived or unreached, not equivalent)
 */
public record LineCoverage(int mutatedLines, int runLines, int unnoticed) {

    public LineCoverage {
        if (mutatedLines < 0 || runLines < 0 || runLines > mutatedLines || unnoticed < 0) {
            throw new IllegalArgumentException(runLines + " of " + mutatedLines + " lines run, " + unnoticed + " unnoticed");
        }
    }

    /** Run lines over mutated lines; empty when no line holds a counted mutant. */
    public OptionalDouble share() {
        return mutatedLines == 0 ? OptionalDouble.empty() : OptionalDouble.of((double) runLines / mutatedLines);
    }

    /** The coverage of all these mutants together; equivalent ones (see {@link Score#isEquivalent}) do not count. */
    public static LineCoverage of(List<MutantResult> mutants, Set<String> equivalent) {
        return tally(mutants, equivalent);
    }

    /** The coverage of each file, by project-relative path. */
    public static SortedMap<String, LineCoverage> byFile(List<MutantResult> mutants, Set<String> equivalent) {
        Map<String, List<MutantResult>> files = new TreeMap<>();
        mutants.forEach(mutant -> files.computeIfAbsent(mutant.file(), unused -> new ArrayList<>()).add(mutant));
        SortedMap<String, LineCoverage> byFile = new TreeMap<>();
        files.forEach((file, inFile) -> byFile.put(file, tally(inFile, equivalent)));
        return Collections.unmodifiableSortedMap(byFile);
    }

    private record Line(String file, int line) {
    }

    private static LineCoverage tally(List<MutantResult> mutants, Set<String> equivalent) {
        Map<Line, Boolean> run = new HashMap<>();
        for (MutantResult mutant : mutants) {
            if (counts(mutant, equivalent)) {
                run.merge(lineOf(mutant), reached(mutant), Boolean::logicalOr);
            }
        }
        int unnoticed = 0;
        for (MutantResult mutant : mutants) {
            if (counts(mutant, equivalent) && !mutant.verdict().detected() && run.get(lineOf(mutant))) {
                unnoticed++;
            }
        }
        int runLines = (int) run.values().stream().filter(Boolean::booleanValue).count();
        return new LineCoverage(run.size(), runLines, unnoticed);
    }

    private static boolean counts(MutantResult mutant, Set<String> equivalent) {
        return mutant.verdict().counted() && !Score.isEquivalent(mutant, equivalent);
    }

    private static boolean reached(MutantResult mutant) {
        return mutant.reachedBy() != null && !mutant.reachedBy().isEmpty();
    }

    private static Line lineOf(MutantResult mutant) {
        return new Line(mutant.file(), mutant.first().line());
    }
}
