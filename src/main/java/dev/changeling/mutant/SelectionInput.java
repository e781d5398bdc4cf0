package dev.changeling.mutant;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.operator.MutationOperator;
import dev.changeling.operator.Operators;
import java.nio.file.FileSystems;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;

/**
 * Which mutants to make, as the user typed it: operator ids, orders, where k-order mutants combine, the seed,
 * file globs, a sample size or margin or a mixed sample, and a change's per-line budget. {@link #resolve(boolean)} checks it and makes
 * the {@link Selection}.
 *
 * @param operators     operator ids; empty for the default set
 * @param orders        mutant orders, 1 for first-order
 * @param combineWithin method, class or file
 * @param seed          the seed of combination and sampling
 * @param fileGlobs     project-relative path globs; empty for every file
 * @param sample        a sample size, or null
 * @param margin        a margin for a sample sized by Cochran's formula, or null
 * @param mutateDiagnostics whether code whose only effect is diagnostics is mutated too
 * @param perLine       mutants to keep on each changed line as typed (a number, or {@code all}), or null when not given
 * @param mix           a mixed sample as typed ({@link MixedSample#FORM}), or null when not given
 */
public record SelectionInput(List<String> operators, List<Integer> orders, String combineWithin, long seed,
                             List<String> fileGlobs, Integer sample, Double margin, boolean mutateDiagnostics,
                             String perLine, String mix) {

    /** What {@code --per-line} takes for every mutant of each changed line. */
    public static final String EVERY_ONE = "all";

    public SelectionInput {
        operators = List.copyOf(operators);
        orders = List.copyOf(orders);
        fileGlobs = List.copyOf(fileGlobs);
    }

    /**
     * The selection the input names.
     *
     * @param scoped whether the command is limited to a change, where each changed line keeps
     *               {@link LineBudget#DEFAULT_PER_LINE} mutants unless {@code --per-line} says otherwise
     * @throws UserError (exit code 2) naming the option whose value cannot be used
     */
    public Selection resolve(boolean scoped) {
        if (sample != null && margin != null) {
            throw usage("--sample and --sample-for-margin both choose the sample size; give one of them");
        }
        MixedSample mixed = mixedSample();
        List<MutationOperator> chosen;
        try {
            chosen = operators.isEmpty() ? Operators.defaults() : Operators.named(operators);
        } catch (IllegalArgumentException e) {
            throw usage(e.getMessage());
        }
        HigherOrder.Scope scope;
        try {
            scope = HigherOrder.Scope.valueOf(combineWithin.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw usage("--combine-within takes method, class or file, not '" + combineWithin + "'");
        }
        MutantRequest request;
        try {
            request = new MutantRequest(chosen, mixed == null ? orders : mixed.orders(), scope, seed, filesFilter(), mutateDiagnostics);
        } catch (IllegalArgumentException e) {
            throw usage("--orders: " + e.getMessage());
        }
        if (margin != null && !(margin > 0 && margin < 1)) {
            throw usage("--sample-for-margin takes a margin between 0 and 1, such as 0.05, not " + margin);
        }
        if (sample != null && sample < 1) {
            throw usage("--sample takes a positive number of mutants, not " + sample);
        }
        return new Selection(request.withBudget(budget(scoped)), sample, margin, seed, mixed);
    }

    /** The mixed sample asked for, or null; it chooses the orders and the sample itself, so it takes no other option that does. */
    private MixedSample mixedSample() {
        if (mix == null) {
            return null;
        }
        if (sample != null || margin != null) {
            throw usage("--mix chooses the sample itself; leave out --sample and --sample-for-margin");
        }
        if (!orders.equals(List.of(1))) {
            throw usage("--mix makes first-order mutants and those of the order it names; leave out --orders");
        }
        try {
            return MixedSample.parse(mix);
        } catch (IllegalArgumentException e) {
            throw usage("--mix: " + e.getMessage());
        }
    }

    private LineBudget budget(boolean scoped) {
        if (perLine == null) {
            return scoped ? new LineBudget(LineBudget.DEFAULT_PER_LINE, Map.of()) : LineBudget.NONE;
        }
        if (!scoped) {
            throw usage("--per-line limits the mutants on each line of a change; name the change with --changed-since REV,"
                    + " --uncommitted or --diff-file FILE, or leave --per-line out");
        }
        if (perLine.equalsIgnoreCase(EVERY_ONE)) {
            return LineBudget.NONE;
        }
        try {
            int count = Integer.parseInt(perLine.strip());
            if (count >= 0) {
                return new LineBudget(count, Map.of());
            }
        } catch (NumberFormatException notANumber) {
            // said below, as for a negative number
        }
        throw usage("--per-line takes a number of mutants per changed line, or " + EVERY_ONE + " (also 0) for every one, not '"
                + perLine + "'");
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

    private static UserError usage(String message) {
        return new UserError(message, ExitCode.USAGE);
    }
}
