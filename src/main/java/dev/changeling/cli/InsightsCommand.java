package dev.changeling.cli;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.review.Settled;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Prints what lies behind the score of the last run, computed from the results file alone. */
@Command(name = "insights", mixinStandardHelpOptions = true,
        description = {
            "Show what lies behind the score of the last run: line coverage beside it, what each test kills (alone,"
                    + " redundantly, or nothing), a smaller suite that kills as much, subsumption among the mutants,"
                    + " tests that run a method without checking it, and how combined faults fare. Reads the results"
                    + " file (results.json in the build folder's changeling/); nothing is compiled or run.",
            "With a full kill matrix (every reaching test run against every mutant) the figures are exact; otherwise"
                    + " only each mutant's first failing test is known, and the report says so."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:Done.",
            "1:A mistake to fix: no results yet, or a results file that cannot be read."},
        footerHeading = "%nExample:%n",
        footer = "  changeling insights --top 20")
final class InsightsCommand extends ProjectCommand {

    @Option(names = "--top", paramLabel = "N",
            description = "List at most N entries in each list (default: ${DEFAULT-VALUE}; 0 lists all).")
    int top = 10;

    @Override
    public Integer call() {
        if (top < 0) {
            throw new UserError("--top takes a number of entries, or 0 for all, not " + top, ExitCode.USAGE);
        }
        ProjectLayout layout = project.layout();
        RunResults results = ResultsFile.read(layout.resultsFile()).limitedTo(layout.root(), project.limits(layout));
        new InsightsReport(project.style(), top).print(out(), results, Settled.load(layout.root()).equivalent());
        return ExitCode.OK;
    }
}
