package dev.changeling.run;

import dev.changeling.results.MutantResult;
import dev.changeling.results.Verdict;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * The check of the tool's verdicts against Maven itself: each mutant's stored unified diff is applied with
 * the real {@code git apply} to a fresh copy of the sample, and the real {@code mvn test} runs there. The
 * reference is Maven Surefire's own verdict on the project's tests; the diff must apply as {@code git apply}
 * reads unified diffs (git's documentation of git-apply; the format of GNU diffutils' {@code diff -u}).
 */
final class MavenAgreement {

    /** What Maven made of one patched copy. */
    enum MavenOutcome { TESTS_PASS, TESTS_FAIL, COMPILE_FAILS, OTHER }

    /** One mutant, the tool's verdict and Maven's outcome; {@code log} is the end of Maven's output. */
    record Judged(MutantResult mutant, MavenOutcome maven, String log) {

        boolean agrees() {
            return expected(mutant.verdict()) == maven;
        }

        String describe() {
            return "mutant " + mutant.id() + " (" + mutant.file() + "): the tool says " + mutant.verdict().word()
                    + ", Maven says " + maven + "\n" + mutant.diff() + "\n--- end of Maven's output:\n" + log;
        }
    }

    /** Maven runs at once; the machine has two cores. */
    private static final int PARALLEL = 2;
    private static final long MAVEN_LIMIT_SECONDS = 600;
    private static final int LOG_TAIL = 3_000;

    /**
     * Speed only: both Maven's JVM and the JVM that Surefire forks for the tests stop at the first JIT tier, which
     * roughly halves the time of these short builds here; it changes no test's outcome.
     */
    private static final String QUICK_JVM = "-XX:TieredStopAtLevel=1 -XX:+UseSerialGC";

    private MavenAgreement() {
    }

    /** What Maven must do with a mutant of each verdict; {@code null} for verdicts Maven cannot confirm. */
    static MavenOutcome expected(Verdict verdict) {
        return switch (verdict) {
            case KILLED, TIMED_OUT, CRASHED -> MavenOutcome.TESTS_FAIL;
            case SURVIVED, UNREACHED -> MavenOutcome.TESTS_PASS;
            case STILLBORN -> MavenOutcome.COMPILE_FAILS;
            case SKIPPED -> null;
        };
    }

    /**
     * Applies and tests every mutant in its own copy of {@code sample} below {@code work}, two at a time; mutants
     * the tool skipped (code run once per JVM) have no verdict to confirm and are left out.
     */
    static List<Judged> judge(String sample, List<MutantResult> mutants, Path work) {
        ExecutorService maven = Executors.newFixedThreadPool(PARALLEL);
        try {
            List<Future<Judged>> pending = new ArrayList<>();
            for (MutantResult mutant : mutants) {
                if (expected(mutant.verdict()) == null) {
                    continue;
                }
                pending.add(maven.submit(() -> judgeOne(sample, mutant, work.resolve("mutant-" + mutant.shortId()))));
            }
            List<Judged> judged = new ArrayList<>();
            for (Future<Judged> future : pending) {
                judged.add(future.get());
            }
            return judged;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } catch (ExecutionException e) {
            throw new IllegalStateException("checking a mutant with Maven failed: " + e.getCause(), e.getCause());
        } finally {
            maven.shutdownNow();
        }
    }

    /** "agreement 23/24 on greenhouse": how many of the judged mutants Maven agrees with. */
    static String figure(String sample, List<Judged> judged) {
        long agreeing = judged.stream().filter(Judged::agrees).count();
        return "agreement " + agreeing + "/" + judged.size() + " on " + sample;
    }

    private static Judged judgeOne(String sample, MutantResult mutant, Path copy) {
        SampleProjects.copy(sample, copy);
        Path file = copy.resolve(mutant.file());
        String before = readString(file);
        Path patch = copy.resolveSibling(copy.getFileName() + ".diff");
        writeString(patch, mutant.diff());
        ExternalCommand.Ended applied = ExternalCommand.run(copy, noParentRepository(copy), 60,
                List.of("git", "apply", "--verbose", patch.toString()));
        if (!applied.finished() || applied.exitCode() != 0) {
            throw new AssertionError("git apply refused the diff of " + mutant.id() + ": " + applied.output() + "\n" + mutant.diff());
        }
        if (readString(file).equals(before)) {
            throw new AssertionError("the diff of " + mutant.id() + " changed nothing in " + mutant.file() + "\n" + mutant.diff());
        }
        ExternalCommand.Ended built = maven(copy, true);
        if (outcomeOf(built) == MavenOutcome.OTHER && mentionsOffline(built.output())) {
            built = maven(copy, false);
        }
        String log = built.output();
        return new Judged(mutant, outcomeOf(built), log.length() <= LOG_TAIL ? log : log.substring(log.length() - LOG_TAIL));
    }

    private static ExternalCommand.Ended maven(Path copy, boolean offline) {
        List<String> command = new ArrayList<>(List.of("mvn", "-B", "-q", "-Dstyle.color=never", "-DargLine=" + QUICK_JVM,
                // A mutant that loops for good must end Maven's run too: Surefire then fails it, as for a failing test.
                "-Dsurefire.timeout=300"));
        if (offline) {
            command.add("-o");
        }
        command.add("test");
        return ExternalCommand.run(copy, Map.of("MAVEN_OPTS", QUICK_JVM), MAVEN_LIMIT_SECONDS, command);
    }

    static MavenOutcome outcomeOf(ExternalCommand.Ended built) {
        if (!built.finished()) {
            return MavenOutcome.OTHER;
        }
        if (built.exitCode() == 0) {
            return MavenOutcome.TESTS_PASS;
        }
        String output = built.output();
        if (output.contains("maven-compiler-plugin") && output.contains("COMPILATION ERROR")) {
            return MavenOutcome.COMPILE_FAILS;
        }
        if (output.contains("maven-surefire-plugin")) {
            return MavenOutcome.TESTS_FAIL;
        }
        return MavenOutcome.OTHER;
    }

    private static boolean mentionsOffline(String output) {
        return output.contains("offline");
    }

    /** Keeps git from taking a repository around the temporary folder for the one to patch. */
    private static Map<String, String> noParentRepository(Path copy) {
        return Map.of("GIT_CEILING_DIRECTORIES", copy.getParent().toString());
    }

    private static String readString(Path file) {
        try {
            return Files.readString(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void writeString(Path file, String text) {
        try {
            Files.writeString(file, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
