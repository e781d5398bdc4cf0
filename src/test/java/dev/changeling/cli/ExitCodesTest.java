package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every exit code of docs/exit-codes.md that a command line alone can provoke, one row each: what was typed,
 * the code, and the start of the one line that says why. Code 5 (a red baseline) needs a real build and runs in
 * RunCommandLineTest; 130 (Ctrl-C) needs a signal and runs in InterruptedRunTest; 70 is a fault of the tool,
 * which no command line is meant to reach.
 */
class ExitCodesTest {

    @TempDir
    static Path folder;

    /** A project folder with a pom and a results file: 1 of 2 mutants detected, one survivor. */
    private static Path project() throws IOException {
        Path project = folder.resolve("meadow");
        if (!Files.exists(project)) {
            Files.createDirectories(project);
            Files.writeString(project.resolve("pom.xml"), "<project><modelVersion>4.0.0</modelVersion>"
                    + "<groupId>dev.meadow</groupId><artifactId>meadow</artifactId><version>1</version></project>\n");
            List<MutantResult> mutants = List.of(
                    ResultsForTests.result("aa11", "src/main/java/Hive.java", "relational-subset", 1, Verdict.KILLED),
                    ResultsForTests.result("bb22", "src/main/java/Hive.java", "relational-subset", 1, Verdict.SURVIVED));
            ResultsFile.write(ProjectLayout.of(project).resultsFile(), ResultsForTests.run(mutants, false, 0));
        }
        return project;
    }

    static Stream<Arguments> rows() throws IOException {
        String p = project().toString();
        String empty = Files.createDirectories(folder.resolve("empty")).toString();
        String results = ProjectLayout.of(Path.of(p)).resultsFile().toString();
        return Stream.of(
                row(ExitCode.OK, "", "operators"),
                row(ExitCode.OK, "", "export", p),
                row(ExitCode.OK, "", "insights", p),
                row(ExitCode.USER_ERROR, "changeling: " + empty, "insights", empty),
                row(ExitCode.USAGE, "changeling: --top takes a number of entries", "insights", p, "--top", "-1"),
                row(ExitCode.USER_ERROR, "changeling: " + empty, "export", empty),
                row(ExitCode.USER_ERROR, "changeling: " + folder.resolve("nowhere"), "mutants", folder.resolve("nowhere").toString()),
                row(ExitCode.USAGE, "changeling: --sample takes a positive number", "run", p, "--sample", "-5"),
                row(ExitCode.USAGE, "changeling: --workers takes a positive number", "run", p, "--workers", "0"),
                row(ExitCode.USAGE, "changeling: --min-score takes a score from 0 to 1", "run", p, "--min-score", "2"),
                row(ExitCode.USAGE, "changeling: --min-score takes a score from 0 to 1", "export", p, "--min-score", "2"),
                row(ExitCode.USAGE, "changeling: --orders:", "run", p, "--orders", "9"),
                row(ExitCode.USAGE, "changeling: --mix: three numbers are needed", "run", p, "--mix", "30:10"),
                row(ExitCode.USAGE, "changeling: --mix: the order must be from 2 to 5", "mutants", p, "--mix", "30:10:1"),
                row(ExitCode.USAGE, "changeling: --mix chooses the sample itself", "run", p, "--mix", "3:1:2", "--sample", "5"),
                row(ExitCode.USAGE, "changeling: --mix makes first-order mutants and those of the order it names", "run", p,
                        "--mix", "3:1:2", "--orders", "1,2"),
                row(ExitCode.USAGE, "changeling: --worker-heap takes a size", "run", p, "--worker-heap=lots"),
                row(ExitCode.USAGE, "changeling: --mutants-per-worker takes a positive number", "run", p, "--mutants-per-worker", "0"),
                row(ExitCode.USAGE, "changeling: --time-factor/--time-extra:", "run", p, "--time-factor", "0.5"),
                row(ExitCode.USAGE, "changeling: unknown operator 'no-such-op'", "mutants", p, "--operators", "no-such-op"),
                row(ExitCode.USAGE, "changeling: --per-line limits the mutants on each line of a change", "run", p, "--per-line", "2"),
                row(ExitCode.USAGE, "changeling: --shard '0/3': I, the shard, must be from 1 to 3", "run", p, "--shard", "0/3"),
                row(ExitCode.USAGE, "changeling: --shard '4/3': I, the shard, must be from 1 to 3", "run", p, "--shard", "4/3"),
                row(ExitCode.USAGE, "changeling: --shard 'x': it is not of the form I/N", "run", p, "--shard", "x"),
                row(ExitCode.USAGE, "changeling: --map-only maps the whole project", "run", p, "--map-only", "--sample", "5"),
                row(ExitCode.USER_ERROR, "changeling: " + folder.resolve("no-map.json") + ": no such reach map", "run", p,
                        "--reach-map", folder.resolve("no-map.json").toString()),
                row(ExitCode.SHARDS_APART, "changeling: " + results + ": these are the results of a whole run, not of a shard",
                        "merge", results, "--into", folder.resolve("merged.json").toString()),
                row(ExitCode.USER_ERROR, "changeling: " + folder.resolve("nowhere.json"), "merge", folder.resolve("nowhere.json").toString()),
                row(ExitCode.USAGE, "Unknown option: '--no-such-option'", "export", p, "--no-such-option"),
                row(ExitCode.USAGE, "Invalid value for option '--workers'", "run", p, "--workers", "many"),
                row(ExitCode.SCORE_TOO_LOW, "changeling: 1 of 2 mutants detected is a score under --min-score 0.75", "export", p,
                        "--min-score", "0.75"),
                row(ExitCode.SURVIVORS_REMAIN, "changeling: 1 unresolved survivor remains", "export", p, "--fail-on-survivors"),
                row(ExitCode.NO_TERMINAL, "changeling: triage asks questions", "triage", p),
                row(ExitCode.USER_ERROR, "changeling: --reason is empty", "equivalents", "add", "bb22", p, "--reason", ""));
    }

    private static Arguments row(int code, String firstLine, String... args) {
        return Arguments.of(code, firstLine, List.of(args));
    }

    @ParameterizedTest(name = "{2} → {0}")
    @MethodSource("rows")
    void eachMistakeHasItsCode_andOneLineSayingWhy(int code, String firstLine, List<String> args) {
        CommandOutcome outcome = CommandOutcome.of(args.toArray(String[]::new));

        assertEquals(code, outcome.code(), outcome::toString);
        List<String> lines = outcome.err().lines().toList();
        if (code == ExitCode.OK) {
            return;
        }
        assertTrue(!lines.isEmpty() && lines.get(0).startsWith(firstLine), outcome::toString);
        if (code != ExitCode.USAGE || firstLine.startsWith("changeling:")) {
            assertEquals(1, lines.stream().filter(line -> line.startsWith("changeling:")).count(), outcome::toString);
        }
    }
}
