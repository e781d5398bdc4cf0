package dev.changeling.cli;

import dev.changeling.AtomicFiles;
import dev.changeling.ExitCode;
import dev.changeling.UserError;
import dev.changeling.analysis.Score;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.review.Settled;
import dev.changeling.review.export.MarkdownReport;
import dev.changeling.review.export.PatchFolder;
import dev.changeling.review.export.SarifReport;
import dev.changeling.review.export.Summary;
import dev.changeling.review.export.Survivors;
import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.function.Predicate;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Writes the attachments for a review from the results file, and can serve as a CI gate. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {
            "Write the survivors of the last run as attachments for the review: Markdown for a comment,"
                    + " SARIF 2.1.0 for code-scanning tools, one patch per survivor. Reads the results file"
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
                + " --patches target/changeling/patches --fail-on-survivors")
final class ExportCommand implements Callable<Integer> {

    @Mixin
    ProjectOptions project = new ProjectOptions();

    @Option(names = "--markdown", paramLabel = "FILE",
            description = "Write a review comment in Markdown: the summary line, then each unresolved survivor with its diff.")
    Path markdown;

    @Option(names = "--sarif", paramLabel = "FILE",
            description = "Write the unresolved survivors as a SARIF 2.1.0 log, one result each.")
    Path sarif;

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

    @Spec
    CommandSpec spec;

    /** Known equivalent mutants (by full id) and the test for mutants marked fixed locally. */
    @Override
    public Integer call() {
        if (minScore != null && (minScore.signum() < 0 || minScore.compareTo(BigDecimal.ONE) > 0)) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--min-score takes a score from 0 to 1, such as 0.8, not " + minScore.toPlainString());
        }
        ProjectLayout layout = project.layout();
        Path resultsFile = layout.resultsFile();
        RunResults all = ResultsFile.read(resultsFile);
        RunResults results = all.limitedTo(layout.root(), project.limits(layout));
        boolean gating = failOnSurvivors || minScore != null;
        if (gating && !results.complete()) {
            throw new UserError(resultsFile + ": the run was interrupted, so its figures are incomplete;"
                    + " run 'changeling run' to the end before using --fail-on-survivors or --min-score");
        }
        Settled settled = Settled.load(layout.root());
        Predicate<MutantResult> resolved = settled::resolved;
        Score score = Score.of(results.mutants(), settled.equivalent());
        List<MutantResult> survivors = Survivors.unresolved(results.mutants(), resolved);

        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        out.println(Summary.line(results, score.overall(), survivors.size()));
        if (markdown != null) {
            write(markdown, MarkdownReport.render(results, score, resolved));
            out.println("wrote " + markdown);
        }
        if (sarif != null) {
            write(sarif, SarifReport.render(results, resolved, VersionProvider.number()));
            out.println("wrote " + sarif + " (" + survivors.size() + (survivors.size() == 1 ? " result)" : " results)"));
        }
        if (patches != null) {
            try {
                List<Path> written = PatchFolder.write(patches, results.mutants(), resolved);
                out.println("wrote " + written.size() + (written.size() == 1 ? " patch" : " patches") + " to " + patches);
            } catch (IOException e) {
                throw new UserError(patches + ": cannot write the patches (" + e.getMessage() + "); give a folder you can write to");
            }
        }
        out.flush();
        return gate(score, survivors.size(), err);
    }

    private int gate(Score score, int unresolved, PrintWriter err) {
        int exit = ExitCode.OK;
        if (failOnSurvivors && unresolved > 0) {
            err.println("changeling: " + unresolved + (unresolved == 1 ? " unresolved survivor remains" : " unresolved survivors remain")
                    + " (--fail-on-survivors)");
            exit = ExitCode.SURVIVORS_REMAIN;
        }
        if (minScore != null) {
            int detected = score.overall().detected();
            int denominator = score.overall().denominator();
            if (denominator == 0) {
                err.println("changeling: no mutant counts towards a score, so --min-score passes");
            } else if (BigDecimal.valueOf(detected).compareTo(minScore.multiply(BigDecimal.valueOf(denominator))) < 0) {
                err.println("changeling: " + detected + " of " + denominator + " mutants detected is a score under --min-score "
                        + minScore.toPlainString());
                exit = ExitCode.SCORE_TOO_LOW;
            }
        }
        err.flush();
        return exit;
    }

    private static void write(Path file, String text) {
        try {
            AtomicFiles.writeString(file, text);
        } catch (IOException e) {
            throw new UserError(file + ": cannot write it (" + e + "); give a path you can write to");
        }
    }
}
