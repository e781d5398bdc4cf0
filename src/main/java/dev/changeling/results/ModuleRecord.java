package dev.changeling.results;

import java.util.List;

/**
 * One module of a multi-module build as a run analysed it: its mutants ran against its own tests only.
 *
 * @param path         the module's folder relative to the build's root; its mutants' files lie below it
 * @param testedAlsoBy the other modules of the run whose tests have this module's classes on their classpath, and so
 *                     may exercise them, though they did not run against its mutants
 */
public record ModuleRecord(String path, List<String> testedAlsoBy) {

    public ModuleRecord {
        testedAlsoBy = testedAlsoBy == null ? List.of() : List.copyOf(testedAlsoBy);
    }

    /** Whether a file of the results (a path from the build's root) belongs to this module. */
    public boolean holds(String file) {
        return path.isEmpty() || file.startsWith(path + "/");
    }

    /** The results' mutants of this module. */
    public List<MutantResult> mutantsOf(RunResults results) {
        return results.mutants().stream().filter(mutant -> holds(mutant.file())).toList();
    }
}
