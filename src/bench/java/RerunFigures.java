import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import dev.changeling.run.Rerun;
import java.nio.file.Path;

/**
 * Times what triage's "fixed" answer costs: one survivor of the last run run again, in this JVM, against the
 * project as it is now. Prints the wall time and the verdict.
 */
public final class RerunFigures {

    public static void main(String[] args) {
        Path project = Path.of(args[0]).toAbsolutePath();
        RunResults results = ResultsFile.read(ProjectLayout.of(project).resultsFile());
        MutantResult survivor = results.mutants().stream().filter(mutant -> mutant.verdict() == Verdict.SURVIVED)
                .filter(mutant -> args.length < 2 || mutant.id().startsWith(args[1]))
                .findFirst().orElseThrow(() -> new IllegalStateException("no survivor to run again"));
        long start = System.nanoTime();
        MutantResult again = new Rerun(project, results).rerun(survivor);
        long millis = (System.nanoTime() - start) / 1_000_000;
        System.out.printf("%-40s %6d ms   %s -> %s%n", args.length > 2 ? args[2] : "rerun of " + survivor.shortId(), millis,
                survivor.verdict().word(), again.verdict().word());
    }
}
