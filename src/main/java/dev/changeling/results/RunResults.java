package dev.changeling.results;

import com.fasterxml.jackson.annotation.JsonInclude;
import java.util.Collections;
import java.util.List;
import java.util.TreeMap;
import java.util.Map;

/**
 * Everything one run found: the single source every view reads (summary, triage, exports,
 * analysis). Documented field by field in {@code docs/results-format.md}.
 *
 * @param format    the version of this layout
 * @param complete  false when the run was interrupted and only part of the mutants have verdicts
 * @param settings  how the run was asked for
 * @param tests     the unmutated suite, as run in the baseline
 * @param timings   where the time went, in milliseconds by phase
 * @param mutants   every mutant in scope, with its verdict
 * @param problems  files skipped and other warnings, one line each
 * @param sourceHashes SHA-256 of each mutated file's text when the run began, by path
 * @param notMade   points in scope not made, by reason (code that only serves diagnostics, a suppression rule, the
 *                  per-line budget); empty when none
 * @param compiledAlike what compiling each survivor on its own found: proposed equivalents and duplicates
 * @param shard     which share of a sharded run this is, or null for a whole run (and for merged shards)
 * @param modules   the modules of a multi-module build the run analysed, each with its own tests, in the reactor's
 *                  order; empty for a project of one module (and in files written before modules were kept)
 */
public record RunResults(
        int format,
        boolean complete,
        RunSettings settings,
        List<TestRecord> tests,
        Map<String, Double> timings,
        List<MutantResult> mutants,
        List<String> problems,
        Map<String, String> sourceHashes,
        Map<String, Integer> notMade,
        CompiledAlike compiledAlike,
        @JsonInclude(JsonInclude.Include.NON_NULL) ShardRecord shard,
        List<ModuleRecord> modules) {

    public static final int FORMAT = 2;

    public RunResults {
        notMade = notMade == null ? Map.of() : Collections.unmodifiableMap(new TreeMap<>(notMade));
        compiledAlike = compiledAlike == null ? CompiledAlike.NONE : compiledAlike;
        modules = modules == null ? List.of() : List.copyOf(modules);
    }

    /** Results of a whole run, not a shard of one, of a project of one module. */
    public RunResults(int format, boolean complete, RunSettings settings, List<TestRecord> tests, Map<String, Double> timings,
                      List<MutantResult> mutants, List<String> problems, Map<String, String> sourceHashes,
                      Map<String, Integer> notMade, CompiledAlike compiledAlike) {
        this(format, complete, settings, tests, timings, mutants, problems, sourceHashes, notMade, compiledAlike, null, List.of());
    }

    /** Results of a run that compared no survivor's classes. */
    public RunResults(int format, boolean complete, RunSettings settings, List<TestRecord> tests, Map<String, Double> timings,
                      List<MutantResult> mutants, List<String> problems, Map<String, String> sourceHashes,
                      Map<String, Integer> notMade) {
        this(format, complete, settings, tests, timings, mutants, problems, sourceHashes, notMade, CompiledAlike.NONE);
    }

    /** Results with every point made. */
    public RunResults(int format, boolean complete, RunSettings settings, List<TestRecord> tests, Map<String, Double> timings,
                      List<MutantResult> mutants, List<String> problems, Map<String, String> sourceHashes) {
        this(format, complete, settings, tests, timings, mutants, problems, sourceHashes, Map.of());
    }

    /** How many points in scope were not made, whatever the reason. */
    public int notMadeCount() {
        return notMade.values().stream().mapToInt(Integer::intValue).sum();
    }

    /** Only the mutants in the files and folders named (absolute paths), or all when none are named. */
    public RunResults limitedTo(java.nio.file.Path projectRoot, List<java.nio.file.Path> limits) {
        if (limits.isEmpty()) {
            return this;
        }
        List<MutantResult> inside = mutants.stream()
                .filter(mutant -> limits.stream().anyMatch(limit -> projectRoot.resolve(mutant.file()).normalize().startsWith(limit)))
                .toList();
        return new RunResults(format, complete, settings, tests, timings, inside, problems, sourceHashes, notMade, compiledAlike, shard, modules);
    }
}
