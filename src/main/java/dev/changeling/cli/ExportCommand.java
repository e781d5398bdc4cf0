package dev.changeling.cli;

import dev.changeling.AtomicFiles;
import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.review.Gate;
import dev.changeling.review.Settled;
import dev.changeling.review.Standing;
import dev.changeling.review.export.HtmlReport;
import dev.changeling.review.export.HtmlSection;
import dev.changeling.review.export.MarkdownReport;
import dev.changeling.review.export.PatchFolder;
import dev.changeling.review.export.SarifReport;
import dev.changeling.review.export.Summary;
import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** Writes the attachments for a review from the results file, and can serve as a CI gate. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {
            "Write the survivors of the last run as attachments for the review: Markdown for a comment,"
                    + " SARIF 2.1.0 for code-scanning tools, one patch per survivor, a self-contained HTML page with pictures. Reads the results file"
                    + " (results.json in the build folder's changeling/, target/changeling/ by default); nothing is compiled or run.",
            "A survivor stays unresolved until triage settles it: marked equivalent, or marked fixed.",
            "As a CI gate, --fail-on-survivors and --min-score turn what is left into an exit code;"
                    + " they refuse results of an interrupted run."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:Done, and every gate asked for passed.",
            "1:A mistake to fix: no results yet, unreadable or interrupted results for a gate, a file that cannot be written.",
            "2:The command line is wrong.",
            "3:The mutation score is under --min-score (whether or not survivors remain).",
            "4:Unresolved survivors remain and --fail-on-survivors was given."},
        footerHeading = "%nExample:%n",
        footer = "  changeling export --markdown target/changeling/review.md --sarif target/changeling/survivors.sarif"
                + " --html target/changeling/report.html --patches target/changeling/patches --fail-on-survivors")
final class ExportCommand extends ProjectCommand {

    @Option(names = "--markdown", paramLabel = "FILE",
            description = "Write a review comment in Markdown: the summary line, then each unresolved survivor with its diff.")
    Path markdown;

    @Option(names = "--markdown-limit", paramLabel = "N",
            description = "List at most N survivors in the Markdown comment, worst first, and count the rest (default: ${DEFAULT-VALUE}; 0 lists all).")
    int markdownLimit = 40;

    @Option(names = "--sarif", paramLabel = "FILE",
            description = "Write the unresolved survivors as a SARIF 2.1.0 log, one result each.")
    Path sarif;

    @Option(names = "--html", paramLabel = "FILE",
            description = "Write one self-contained HTML page: the score, figures per file and operator, a strip per file of where"
                    + " the survivors are, a heat map of which tests kill which operators, and each survivor with its diff.")
    Path html;

    @Option(names = "--glance",
            description = "Also print on the terminal a strip per file of where the survivors are and a shaded table of"
                    + " which tests kill which operators (no colours with --plain).")
    boolean glance;

    @Option(names = "--patches", paramLabel = "DIR",
            description = "Write one <short id>.patch per unresolved survivor; 'git apply' takes each on an unmodified checkout."
                    + " Patches of an earlier export whose survivor is gone are removed; other files are left alone.")
    Path patches;

    @Option(names = "--fail-on-survivors",
            description = "Exit with " + ExitCode.SURVIVORS_REMAIN + " when unresolved survivors remain.")
    boolean failOnSurvivors;

    @Option(names = "--min-score", paramLabel = "S",
            description = "Exit with " + ExitCode.SCORE_TOO_LOW + " when the mutation score is under S (0 to 1, e.g. 0.8);"
                    + " for a sample, the point estimate counts. Results where no mutant counts pass.")
    BigDecimal minScore;

    /** What {@code changeling insights} prints, as a part of the HTML report. */
    private static HtmlSection insights(RunResults results, Set<String> equivalent) {
        StringWriter text = new StringWriter();
        new InsightsReport(Style.plain(), InsightsReport.ALL).print(new PrintWriter(text), results, equivalent);
        return HtmlSection.preformatted("Insights: coverage, tests, subsumption, combined faults", text.toString());
    }

    @Override
    public Integer call() {
        Gate gate = new Gate(failOnSurvivors, minScore);
        if (markdownLimit < 0) {
            throw new UserError("--markdown-limit takes a number of survivors, or 0 for all, not " + markdownLimit, ExitCode.USAGE);
        }
        ProjectLayout layout = project.layout();
        Path resultsFile = layout.resultsFile();
        RunResults results = ResultsFile.read(resultsFile).limitedTo(layout.root(), project.limits(layout));
        if (gate.asked() && !results.complete()) {
            throw new UserError(resultsFile + ": the run was interrupted, so its figures are incomplete;"
                    + " run 'changeling run' to the end before using --fail-on-survivors or --min-score");
        }
        Settled settled = Settled.load(layout.root());
        Standing standing = Standing.of(results, settled);
        List<MutantResult> survivors = standing.toLookAt();

        PrintWriter out = out();
        PrintWriter err = err();
        out.println(Summary.line(standing));
        if (markdown != null) {
            write(markdown, MarkdownReport.render(standing, markdownLimit));
            out.println("wrote " + markdown);
        }
        if (sarif != null) {
            write(sarif, SarifReport.render(standing, VersionProvider.number()));
            out.println("wrote " + sarif + " (" + survivors.size() + (survivors.size() == 1 ? " result)" : " results)"));
        }
        if (html != null) {
            write(html, HtmlReport.render(standing, Optional.of(insights(results, settled.equivalent()))));
            out.println("wrote " + html);
        }
        if (glance) {
            Glance.print(out, standing, project.style());
        }
        if (patches != null) {
            try {
                List<Path> written = PatchFolder.write(patches, survivors);
                out.println("wrote " + written.size() + (written.size() == 1 ? " patch" : " patches") + " to " + patches);
            } catch (IOException e) {
                throw new UserError(patches + ": cannot write the patches (" + e.getMessage() + "); give a folder you can write to");
            }
        }
        out.flush();
        return gate.check(standing).reportedTo(err);
    }

    private static void write(Path file, String text) {
        try {
            AtomicFiles.writeString(file, text);
        } catch (IOException e) {
            throw new UserError(file + ": cannot write it (" + e + "); give a path you can write to");
        }
    }
}
