package dev.changeling.run;

import dev.changeling.ExitCode;
import dev.changeling.Text;
import dev.changeling.UserError;
import dev.changeling.execution.Baseline;
import dev.changeling.execution.SuiteSetup;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/** Mutation analysis needs tests that run and pass without any mutant; this says which do not. */
final class GreenBaseline {

    private static final int FAILURES_LISTED = 8;

    private GreenBaseline() {
    }

    /** @throws UserError (exit code 5) when no test ran, or some failed, naming the first few */
    static void require(Baseline baseline, SuiteSetup setup, Path projectRoot) {
        if (baseline.tests().isEmpty()) {
            throw new UserError("no tests found in " + projectRoot + " (" + setup.testClasses().size()
                    + " test classes selected as `mvn test` selects them, none holding a test that runs);"
                    + " mutation analysis needs the project's tests", ExitCode.BASELINE_RED);
        }
        if (baseline.green()) {
            return;
        }
        List<String> failing = new ArrayList<>();
        baseline.failedContainers().forEach(container -> failing.add(container.toString()));
        baseline.failures().forEach(test -> failing.add(test.name()
                + (test.message() == null ? "" : " (" + Text.firstLine(test.message()) + ")")));
        String listed = failing.stream().limit(FAILURES_LISTED).collect(Collectors.joining("; "));
        String more = failing.size() > FAILURES_LISTED ? " and " + (failing.size() - FAILURES_LISTED) + " more" : "";
        throw new UserError("the tests fail without any mutant: " + listed + more
                + ". Mutation analysis needs a green suite: fix them, or leave them out with --skip-tests CLASS_PATTERN or --skip-tag TAG",
                ExitCode.BASELINE_RED);
    }

    /** The part of the baseline line that says which classes ran again in a fresh worker, if any. */
    static String freshWorkers(Baseline baseline) {
        int count = baseline.classesRunInFreshWorkers().size();
        return count == 0 ? "" : "; " + count + (count == 1 ? " class" : " classes")
                + " failed in a shared worker and ran again in a fresh one, as the pom runs every class in its own JVM (reuseForks=false)";
    }
}
