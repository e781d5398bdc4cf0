package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.MutantDiff;
import dev.changeling.mutant.Selection;
import dev.changeling.mutant.Suppressions;
import dev.changeling.review.export.Summary;
import dev.changeling.run.ProjectSelection;
import dev.changeling.scope.ChangeScope;
import dev.changeling.project.ProjectLayout;
import dev.changeling.source.ParseProblem;
import dev.changeling.terminal.DiffPrinter;
import dev.changeling.terminal.Style;
import java.io.PrintWriter;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Function;
import java.util.stream.Collectors;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Lists the mutants that would be run, with counts per operator and file, and optionally their diffs. */
@Command(name = "mutants", mixinStandardHelpOptions = true,
        description = "List the mutants of a project (nothing is compiled or run).")
final class MutantsCommand extends ProjectCommand {

    @Mixin
    MutantOptions mutants = new MutantOptions();

    @Mixin
    ChangeOptions change = new ChangeOptions();

    @Option(names = "--diffs", description = "Print every mutant as a unified diff.")
    boolean diffs;

    @Override
    public Integer call() {
        ProjectLayout layout = project.layout();
        Optional<ChangeScope> scope = change.spec().map(spec -> spec.resolve(layout.root()));
        Selection selection = ProjectSelection.of(mutants.input(), scope.isPresent(), layout);
        Selection.Chosen chosen = scope.map(changed -> selection.narrowedTo(changed.filter())).orElse(selection)
                .choose(layout, project.limits(layout), scope.map(ChangeScope::files));
        PrintWriter out = out();
        PrintWriter err = err();
        for (ParseProblem problem : chosen.generated().problems()) {
            err.println("skipped " + problem);
        }
        Style style = project.style();
        if (diffs) {
            for (Mutant mutant : chosen.mutants()) {
                String text = chosen.generated().files().get(mutant.file()).text();
                out.println(style.bold("# mutant " + mutant.shortId()) + " " + mutant.file() + ":" + mutant.first().line()
                        + " " + mutant.first().operator() + (mutant.order() > 1 ? " (order " + mutant.order() + ")" : "")
                        + " — " + mutant.first().description());
                out.print(DiffPrinter.render(MutantDiff.unified(mutant, text), style));
            }
            out.println();
        }
        printCounts(out, "operator", chosen, mutant -> mutant.first().operator());
        printCounts(out, "file", chosen, Mutant::file);
        if (!chosen.generated().notMade().isEmpty()) {
            out.println(Summary.notMade(chosen.generated().notMade()) + "; --mutate-diagnostics, --per-line and "
                    + Suppressions.RELATIVE_PATH + " decide which");
        }
        selection.budgetNote(chosen).ifPresent(out::println);
        selection.mixNote(chosen).ifPresent(out::println);
        out.println(chosen.mutants().size() + " mutants"
                + scope.map(changed -> " (" + changed.description() + ")").orElse("")
                + (chosen.sampled() ? " (a sample of " + chosen.population() + ")" : "")
                + " in " + chosen.generated().files().size() + " files"
                + (chosen.generated().problems().isEmpty() ? "" : ", " + chosen.generated().problems().size() + " files skipped"));
        out.flush();
        return ExitCode.OK;
    }

    private static void printCounts(PrintWriter out, String what, Selection.Chosen chosen, Function<Mutant, String> key) {
        Map<String, Long> counts = chosen.mutants().stream()
                .collect(Collectors.groupingBy(key, TreeMap::new, Collectors.counting()));
        int width = counts.keySet().stream().mapToInt(String::length).max().orElse(0);
        out.println("by " + what + ":");
        counts.forEach((name, count) -> out.printf("  %-" + width + "s %6d%n", name, count));
    }
}
