package dev.changeling.cli;

import dev.changeling.mutant.LineBudget;
import dev.changeling.mutant.MixedSample;
import dev.changeling.mutant.SelectionInput;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Option;

/** Which mutants to make: operators, orders, files, sampling. Shared by the commands that make mutants. */
final class MutantOptions {

    @Option(names = "--operators", split = ",", paramLabel = "ID",
            description = "Operators to apply, by id (see 'changeling operators'); default: the default set.")
    List<String> operators = new ArrayList<>();

    @Option(names = "--orders", split = ",", paramLabel = "K", defaultValue = "1",
            description = "Mutant orders to make: 1 is first-order, 2 to 5 combine that many changes (default: ${DEFAULT-VALUE}).")
    List<Integer> orders = new ArrayList<>();

    @Option(names = "--combine-within", paramLabel = "SCOPE", defaultValue = "method",
            description = "Where the changes of one k-order mutant come from: method, class or file (default: ${DEFAULT-VALUE}).")
    String combineWithin = "method";

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed for combining k-order mutants and for sampling; the same seed gives the same mutants (default: ${DEFAULT-VALUE}).")
    long seed = 1;

    @Option(names = "--files", paramLabel = "GLOB",
            description = "Only files whose project-relative path matches this glob (repeatable), e.g. '**/Fees*.java'.")
    List<String> fileGlobs = new ArrayList<>();

    @Option(names = "--sample", paramLabel = "N",
            description = "Pick N mutants uniformly at random (seeded) instead of all.")
    Integer sample;

    @Option(names = "--sample-for-margin", paramLabel = "E",
            description = "Pick as many mutants as give a score within ±E at 95%% (Cochran), e.g. 0.05.")
    Double margin;

    @Option(names = "--mix", paramLabel = MixedSample.FORM,
            description = "Pick FIRST first-order mutants and HIGHER mutants of order ORDER (2 to 5) at random (seeded), and"
                    + " add every first-order part of each of the latter, so a combined fault can be compared with its parts;"
                    + " the parts come on top of FIRST. Instead of --orders and --sample.")
    String mix;

    @Option(names = "--mutate-diagnostics",
            description = "Also mutate code whose only effect is diagnostics: calls on a logger, assert statements, bodies of"
                    + " toString(). Left alone by default, and counted as not made.")
    boolean mutateDiagnostics;

    @Option(names = "--per-line", paramLabel = "N",
            description = "With --changed-since, --uncommitted or --diff-file: at most N mutants on each changed line (default: "
                    + LineBudget.DEFAULT_PER_LINE + "), those of the operators the last full run saw detected most often;"
                    + " " + SelectionInput.EVERY_ONE + " (or 0) makes every one.")
    String perLine;

    /** What was typed; the core checks it and makes the selection ({@link SelectionInput#resolve()}). */
    SelectionInput input() {
        return new SelectionInput(operators, orders, combineWithin, seed, fileGlobs, sample, margin, mutateDiagnostics, perLine, mix);
    }
}
