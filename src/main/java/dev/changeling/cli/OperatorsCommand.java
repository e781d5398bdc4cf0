package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.operator.Catalogue;
import dev.changeling.operator.Operators;
import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Lists the mutation operators from the catalogue, or prints one operator's whole entry. */
@Command(name = "operators", mixinStandardHelpOptions = true,
        description = "List the mutation operators: id, whether it is used by default, and what it changes.")
final class OperatorsCommand implements Callable<Integer> {

    @Mixin
    OutputOptions output = new OutputOptions();

    @Option(names = "--details", paramLabel = "ID",
            description = "Print the whole catalogue entry of one operator: what it models, what it skips, worked examples.")
    String details;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (details != null) {
            if (Operators.byId(details).isEmpty()) {
                throw new UserError("--details: no operator '" + details + "'; 'changeling operators' lists them");
            }
            out.print(Catalogue.entry(details).text());
            out.flush();
            return ExitCode.OK;
        }
        List<Catalogue.Entry> entries = Catalogue.all();
        int width = entries.stream().mapToInt(entry -> entry.id().length()).max().orElse(0);
        for (Catalogue.Entry entry : entries) {
            // Backticks mark code in the markdown; on a terminal they are noise.
            out.printf("%-" + width + "s  %-10s  %s%n", entry.id(), entry.set(), entry.summary().replace("`", ""));
        }
        out.println();
        out.println("Without --operators the default ones run; 'changeling operators --details ID' shows one in full.");
        out.flush();
        return ExitCode.OK;
    }
}
