package dev.changeling.cli;

import dev.changeling.UserError;
import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.MutantRequest;
import dev.changeling.mutant.Point;
import dev.changeling.mutant.Selection;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import java.nio.file.FileSystems;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
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

    Selection selection(Predicate<Point> extraFilter) {
        if (sample != null && margin != null) {
            throw new UserError("--sample and --sample-for-margin both choose the sample size; give one of them");
        }
        List<MutationOperator> chosen;
        try {
            chosen = operators.isEmpty() ? Operators.defaults() : Operators.named(operators);
        } catch (IllegalArgumentException e) {
            throw new UserError(e.getMessage());
        }
        HigherOrder.Scope scope;
        try {
            scope = HigherOrder.Scope.valueOf(combineWithin.toUpperCase(java.util.Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new UserError("--combine-within takes method, class or file, not '" + combineWithin + "'");
        }
        MutantRequest request;
        try {
            request = new MutantRequest(chosen, orders, scope, seed, filesFilter().and(extraFilter));
        } catch (IllegalArgumentException e) {
            throw new UserError("--orders: " + e.getMessage());
        }
        if (margin != null && !(margin > 0 && margin < 1)) {
            throw new UserError("--sample-for-margin takes a margin between 0 and 1, such as 0.05, not " + margin);
        }
        if (sample != null && sample < 1) {
            throw new UserError("--sample takes a positive number of mutants, not " + sample);
        }
        return new Selection(request, sample, margin, seed);
    }

    private Predicate<Point> filesFilter() {
        if (fileGlobs.isEmpty()) {
            return point -> true;
        }
        List<PathMatcher> matchers = fileGlobs.stream()
                .map(glob -> FileSystems.getDefault().getPathMatcher("glob:" + glob))
                .toList();
        return point -> matchers.stream().anyMatch(matcher -> matcher.matches(Path.of(point.file())));
    }
}
