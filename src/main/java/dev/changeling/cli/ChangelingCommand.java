package dev.changeling.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.HelpCommand;

/** The root command; it only lists the subcommands. */
@Command(name = "changeling",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Mutation analysis for code review: would your tests notice if this code were subtly wrong?",
        subcommands = {
            MutantsCommand.class,
            InsightsCommand.class,
            ExportCommand.class,
            EquivalentsCommand.class,
            TriageCommand.class,
            RunCommand.class,
            MergeCommand.class,
            OperatorsCommand.class,
            HelpCommand.class,
        })
final class ChangelingCommand {
}
