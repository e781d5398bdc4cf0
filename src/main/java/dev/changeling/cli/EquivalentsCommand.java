package dev.changeling.cli;

import dev.changeling.Text;
import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.project.ProjectLayout;
import dev.changeling.review.EquivalentEntry;
import dev.changeling.review.EquivalentRules;
import dev.changeling.review.IdPrefix;
import dev.changeling.review.EquivalentsList;
import dev.changeling.review.Staleness;
import java.io.Console;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** Shows and maintains the project's committed list of mutants judged equivalent. */
@Command(name = "equivalents", mixinStandardHelpOptions = true,
        description = {"The project's list of mutants judged equivalent (.changeling/equivalent-mutants.txt).",
            "Without a subcommand, lists it for the current folder."},
        subcommands = {
            EquivalentsCommand.Show.class,
            EquivalentsCommand.Stale.class,
            EquivalentsCommand.Prune.class,
            EquivalentsCommand.Add.class,
            EquivalentsCommand.Drop.class,
        })
final class EquivalentsCommand implements Callable<Integer> {

    private static final int MIN_ID_LENGTH = IdPrefix.MIN_LENGTH;

    @Mixin
    OutputOptions output = new OutputOptions();

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        return show(ProjectLayout.of(Path.of("")).root(), spec.commandLine().getOut());
    }

    @Command(name = "show", mixinStandardHelpOptions = true, description = "List every entry with its change and reason.")
    static final class Show extends ProjectCommand {

        @Override
        public Integer call() {
            return show(project.layout().root(), out());
        }
    }

    @Command(name = "stale", mixinStandardHelpOptions = true,
            description = "List the entries whose mutant the last run no longer made: the code they judged has changed.")
    static final class Stale extends ProjectCommand {

        @Override
        public Integer call() {
            PrintWriter out = out();
            Staleness staleness = Checked.reported(project, out).staleness();
            if (!staleness.stale().isEmpty()) {
                out.println("remove them with: changeling equivalents prune");
            }
            out.flush();
            return ExitCode.OK;
        }
    }

    @Command(name = "prune", mixinStandardHelpOptions = true,
            description = "Show the stale entries, then remove them once confirmed.",
            exitCodeList = {"6:No terminal to confirm in, and --yes was not given."})
    static final class Prune extends ProjectCommand {

        @Option(names = "--yes", description = "Remove them without asking (for scripts and CI).")
        boolean yes;

        @Override
        public Integer call() {
            PrintWriter out = out();
            Checked checked = Checked.reported(project, out);
            Path root = checked.root();
            EquivalentsList list = checked.list();
            List<EquivalentEntry> stale = checked.staleness().stale();
            if (stale.isEmpty()) {
                out.flush();
                return ExitCode.OK;
            }
            if (!yes && !confirmed(out, stale.size(), shown(root, list))) {
                out.println("nothing removed");
                out.flush();
                return ExitCode.OK;
            }
            list.removeAll(stale.stream().map(EquivalentEntry::fingerprint).toList());
            list.save();
            out.println("removed " + count(stale.size(), "stale entry", "stale entries") + " from " + shown(root, list));
            out.flush();
            return ExitCode.OK;
        }

        private static boolean confirmed(PrintWriter out, int count, String file) {
            out.flush();
            Console console = System.console();
            if (console == null) {
                throw new UserError("not removing the " + count(count, "stale entry", "stale entries")
                        + " above without a terminal to confirm; add --yes to remove them", ExitCode.NO_TERMINAL);
            }
            String answer = console.readLine("remove %s from %s? [y/N] ", count(count, "entry", "entries"), file);
            return answer != null && List.of("y", "yes").contains(answer.strip().toLowerCase(Locale.ROOT));
        }
    }

    @Command(name = "add", mixinStandardHelpOptions = true,
            description = "List a mutant of the last run as equivalent, with the reason (replaces an earlier entry for it).")
    static final class Add implements Callable<Integer> {

        @Parameters(index = "0", paramLabel = "ID", description = "The mutant's id from the last run (at least " + MIN_ID_LENGTH + " hex digits).")
        String id;

        @Parameters(index = "1", arity = "0..1", paramLabel = "PATH", description = "The project folder (default: the current folder).")
        Path folder;

        @Option(names = "--reason", required = true, paramLabel = "TEXT", description = "Why the tests cannot tell it from the original.")
        String reason;

        @Mixin
        OutputOptions output = new OutputOptions();

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            ProjectLayout layout = ProjectLayout.of(folder == null ? Path.of("") : folder);
            RunResults run = ResultsFile.read(layout.resultsFile());
            MutantResult mutant = EquivalentRules.mutantOf(id, run);
            EquivalentEntry entry = EquivalentRules.entry(mutant, reason, run);
            EquivalentsList list = EquivalentsList.load(layout.root());
            boolean replaced = list.put(entry).isPresent();
            list.save();
            PrintWriter out = spec.commandLine().getOut();
            out.println((replaced ? "updated " : "listed ") + mutant.shortId() + " as equivalent in " + shown(layout.root(), list));
            out.flush();
            return ExitCode.OK;
        }
    }

    @Command(name = "drop", mixinStandardHelpOptions = true, description = "Remove entries from the list by mutant id.")
    static final class Drop implements Callable<Integer> {

        @Parameters(arity = "1..*", paramLabel = "ID",
                description = {"Ids of listed mutants (at least " + MIN_ID_LENGTH + " hex digits),",
                    "optionally followed by the project folder (default: the current folder)."})
        List<String> arguments = new ArrayList<>();

        @Mixin
        OutputOptions output = new OutputOptions();

        @Spec
        CommandSpec spec;

        @Override
        public Integer call() {
            String last = arguments.get(arguments.size() - 1);
            boolean folderGiven = arguments.size() > 1 && Files.isDirectory(Path.of(last));
            Path root = ProjectLayout.of(folderGiven ? Path.of(last) : Path.of("")).root();
            List<String> ids = folderGiven ? arguments.subList(0, arguments.size() - 1) : arguments;
            EquivalentsList list = EquivalentsList.load(root);
            List<String> fingerprints = new ArrayList<>();
            for (String id : ids) {
                fingerprints.add(EquivalentRules.entryOf(id, list, "in " + shown(root, list)).fingerprint());
            }
            list.removeAll(fingerprints);
            list.save();
            PrintWriter out = spec.commandLine().getOut();
            out.println("removed " + count(fingerprints.size(), "entry", "entries") + " from " + shown(root, list));
            out.flush();
            return ExitCode.OK;
        }
    }

    private static int show(Path root, PrintWriter out) {
        EquivalentsList list = EquivalentsList.load(root);
        List<EquivalentEntry> entries = list.entries();
        entries.forEach(entry -> print(out, entry));
        out.println(entries.isEmpty()
                ? "no equivalent mutants listed in " + shown(root, list)
                : count(entries.size(), "equivalent mutant", "equivalent mutants") + " in " + shown(root, list));
        out.flush();
        return ExitCode.OK;
    }

    /** The list held against the last run, the comparison already printed. */
    private record Checked(Path root, EquivalentsList list, Staleness staleness) {

        static Checked reported(ProjectOptions project, PrintWriter out) {
            Path root = project.layout().root();
            EquivalentsList list = EquivalentsList.load(root);
            Staleness staleness = list.stale(ResultsFile.read(project.layout().resultsFile()));
            report(out, root, list, staleness);
            return new Checked(root, list, staleness);
        }
    }

    private static void report(PrintWriter out, Path root, EquivalentsList list, Staleness staleness) {
        List<EquivalentEntry> stale = staleness.stale();
        if (stale.isEmpty()) {
            out.println("no stale entries in " + shown(root, list));
        } else {
            out.println(count(stale.size(), "stale entry", "stale entries")
                    + " (the last run no longer makes these mutants, or their file is gone):");
            stale.forEach(entry -> print(out, entry));
        }
        if (!staleness.unchecked().isEmpty()) {
            out.println(count(staleness.unchecked().size(), "entry", "entries")
                    + " not checked: the last run did not cover their file, operator or order");
        }
    }

    private static void print(PrintWriter out, EquivalentEntry entry) {
        out.println("  " + entry.shortId() + "  " + entry.file() + "  " + entry.type() + "#" + entry.member()
                + "  " + entry.operator());
        out.println("            " + oneLine(entry.original()) + " → " + oneLine(entry.mutated()));
        if (!entry.reason().isEmpty()) {
            out.println("            why: " + oneLine(entry.reason()));
        }
    }

    private static String shown(Path root, EquivalentsList list) {
        return Text.relative(root, list.file());
    }

    private static String oneLine(String text) {
        return text.replace("\n", "\\n").replace("\r", "\\r");
    }

    private static String count(int n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }
}
