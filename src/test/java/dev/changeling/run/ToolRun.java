package dev.changeling.run;

import dev.changeling.project.ProjectLayout;
import dev.changeling.cli.Main;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import dev.changeling.results.Verdict;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * One {@code changeling run} on a copied sample, in this JVM through {@link Main#execute}: its exit code, its
 * output, the results file it wrote, and the project's files before and after.
 */
record ToolRun(Path project, int exitCode, String out, String err, RunResults results,
               Map<String, String> filesBefore, Map<String, String> filesAfter, double seconds) {

    /** Copies {@code sample} to {@code folder} and runs {@code changeling run <arguments> <folder>} on it. */
    static ToolRun onCopyOf(String sample, Path folder, String... arguments) {
        return onCopyOfProject(SampleProjects.copy(sample, folder), arguments);
    }

    /** Runs {@code changeling run <arguments> <project>} on a project folder that is itself a copy. */
    static ToolRun onCopyOfProject(Path project, String... arguments) {
        Map<String, String> before = SampleProjects.fingerprint(project);
        List<String> command = new ArrayList<>(List.of("run", "--plain"));
        command.addAll(List.of(arguments));
        command.add(project.toString());
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        long start = System.nanoTime();
        int exit = Main.execute(new PrintWriter(out, true), new PrintWriter(err, true), command.toArray(String[]::new));
        double seconds = (System.nanoTime() - start) / 1e9;
        Path resultsFile = ProjectLayout.of(project).resultsFile();
        RunResults results = Files.isRegularFile(resultsFile) ? ResultsFile.read(resultsFile) : null;
        ToolRun run = new ToolRun(project, exit, out.toString(), err.toString(), results, before,
                SampleProjects.fingerprint(project), seconds);
        System.out.printf("changeling run %s on %s took %.1f s (exit %d)%n", String.join(" ", arguments), project.getFileName(), seconds, exit);
        return run;
    }

    List<MutantResult> withVerdict(Verdict verdict) {
        return results.mutants().stream().filter(mutant -> mutant.verdict() == verdict).toList();
    }

    /** Everything the run printed, for failure messages. */
    String transcript() {
        return "exit " + exitCode + "\n--- out:\n" + out + "\n--- err:\n" + err;
    }
}
