package dev.changeling.run;

import dev.changeling.project.ProjectLayout;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.changeling.ExitCode;
import dev.changeling.cli.Main;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.RunResults;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * The real binary in a JVM of its own, stopped by SIGINT while its mutants run: it keeps the verdicts so far,
 * exits with 130, and leaves neither a changed source file nor a worker JVM behind. The signal goes to the tool
 * alone, and, as Ctrl-C in a terminal sends it, to the tool and its worker JVMs at once. Also what it says when
 * stopped while mvn runs or after the last mutant, and that a failure with no signal never claims a stop.
 */
@Tag("e2e")
@DisabledOnOs(value = OS.WINDOWS, disabledReason = "sends SIGINT with the kill command")
class InterruptedRunTest {

    /** The hostile sample's blocked uploader thread, given ten minutes, keeps the run busy until the signal. */
    static final String BLOCKED = "Uploader count<expectedBatches → <=";

    /** The command line of the real {@code changeling}, on this test run's classpath (the jar may not be built yet). */
    static List<String> javaCommand(String... arguments) {
        String classpath = System.getProperty("java.class.path");
        if (List.of(classpath.split(File.pathSeparator)).stream().noneMatch(entry -> entry.endsWith("classes"))) {
            throw new IllegalStateException("the test classpath does not list target/classes: " + classpath);
        }
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", classpath, Main.class.getName()));
        command.addAll(List.of(arguments));
        return command;
    }

    static void kill(String... arguments) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("kill"));
        command.addAll(List.of(arguments));
        int exit = new ProcessBuilder(command).inheritIO().start().waitFor();
        if (exit != 0) {
            throw new AssertionError(String.join(" ", command) + " failed with " + exit);
        }
    }

    /** A stand-in for mvn under MAVEN_HOME, a shell script with this body; the environment that makes the tool use it. */
    static Map<String, String> fakeMaven(Path home, String body) throws IOException {
        Path mvn = Files.createDirectories(home.resolve("bin")).resolve("mvn");
        Files.writeString(mvn, "#!/bin/sh\n" + body + "\n");
        assertTrue(mvn.toFile().setExecutable(true), "cannot make " + mvn + " executable");
        return Map.of("MAVEN_HOME", home.toString());
    }

    static List<String> messages(List<String> stderr) {
        return stderr.stream().filter(line -> line.startsWith("changeling:")).toList();
    }

    /** Failures that stop nothing: only what failed is said, and never that a run was stopped. */
    @Nested
    class FailureWithoutAnySignal {

        @Test
        void noPom_saysOnlyThat_andNothingAboutStopping(@TempDir Path folder) throws Exception {
            Files.createDirectories(folder.resolve("src/shop"));
            Files.writeString(folder.resolve("src/shop/Till.java"), "package shop;\n\nclass Till {\n}\n");
            try (ToolProcess tool = ToolProcess.start(javaCommand("run", "--plain", folder.toString()), Map.of(),
                    ProcessBuilder.Redirect.DISCARD)) {
                assertEquals(ExitCode.USER_ERROR, tool.awaitEnd(), tool.stderr()::toString);
                assertEquals(1, tool.stderr().size(), tool.stderr()::toString);
                assertTrue(tool.stderr().get(0).startsWith("changeling: " + folder + ": no pom.xml here"), tool.stderr()::toString);
            }
        }

        @Test
        void mavenFails_saysWhatFailed_andNothingAboutStopping(@TempDir Path folder) throws Exception {
            Path project = SampleProjects.copy("greenhouse", folder.resolve("greenhouse"));
            Map<String, String> maven = fakeMaven(folder.resolve("maven"), "echo '[ERROR] cannot find symbol'\nexit 1");
            try (ToolProcess tool = ToolProcess.start(javaCommand("run", "--plain", project.toString()), maven,
                    ProcessBuilder.Redirect.DISCARD)) {
                assertEquals(ExitCode.USER_ERROR, tool.awaitEnd(), tool.stderr()::toString);
                List<String> messages = messages(tool.stderr());
                assertEquals(1, messages.size(), tool.stderr()::toString);
                assertTrue(messages.get(0).startsWith("changeling: mvn could not compile"), tool.stderr()::toString);
            }
        }
    }

    /** Ctrl-C while mvn builds the project (a stand-in that waits): the tool says it was interrupted, and mvn ends. */
    @Nested
    class SignalWhileMavenRuns {

        @Test
        void toTheToolAlone_saysItWasInterrupted_andEndsMaven(@TempDir Path folder) throws Exception {
            interruptWhileMavenRuns(folder, List.of(), pid -> kill("-INT", Long.toString(pid)));
        }

        /** The terminal's Ctrl-C reaches mvn too, which then fails: that is still an interruption, not a failed build. */
        @Test
        void toItsProcessGroup_saysItWasInterrupted_notThatMavenCouldNotCompile(@TempDir Path folder) throws Exception {
            assumeTrue(Files.isExecutable(Path.of("/usr/bin/setsid")) || Files.isExecutable(Path.of("/bin/setsid")), "needs setsid");
            interruptWhileMavenRuns(folder, List.of("setsid"), pid -> kill("-INT", "--", "-" + pid));
        }

        private void interruptWhileMavenRuns(Path folder, List<String> launcher, Signal signal) throws Exception {
            Path project = SampleProjects.copy("greenhouse", folder.resolve("greenhouse"));
            Path started = folder.resolve("mvn-started");
            Map<String, String> maven = fakeMaven(folder.resolve("maven"),
                    "echo $$ > '" + started + ".part' && mv '" + started + ".part' '" + started + "'\nexec sleep 300");
            List<String> command = new ArrayList<>(launcher);
            command.addAll(javaCommand("run", "--plain", project.toString()));
            ProcessHandle mvn = null;
            try (ToolProcess tool = ToolProcess.start(command, maven, ProcessBuilder.Redirect.DISCARD)) {
                tool.awaitFile(started);
                mvn = ProcessHandle.of(Long.parseLong(Files.readString(started).strip())).orElse(null);
                signal.send(tool.pid());

                assertEquals(ExitCode.INTERRUPTED, tool.awaitEnd(), tool.stderr()::toString);
                List<String> messages = messages(tool.stderr());
                assertEquals(1, messages.size(), tool.stderr()::toString);
                assertTrue(messages.get(0).contains("interrupted") && messages.get(0).endsWith("; nothing was written"),
                        tool.stderr()::toString);
                assertFalse(Files.exists(ProjectLayout.of(project).resultsFile()));
                if (mvn != null) {
                    mvn.onExit().get(ToolProcess.WAIT_SECONDS, TimeUnit.SECONDS);
                }
            } finally {
                if (mvn != null && mvn.isAlive()) {
                    mvn.destroyForcibly();
                }
            }
        }
    }

    /**
     * Ctrl-C once every mutant has its verdict, while the timed-out ones are checked again (the uploader's blocked
     * thread, given a short deadline first): the results are complete, and the report says so.
     */
    @Nested
    class SignalAfterTheLastMutant {

        static final Pattern ALL_FINISHED = Pattern.compile("progress: (\\d+)/\\1 mutants.*");

        @Test
        void printsTheReport_ofTheCompleteResults(@TempDir Path temporary) throws Exception {
            Path project = SampleProjects.copy("hostile", temporary.resolve("station"));
            Path report = temporary.resolve("report.txt");
            List<String> command = javaCommand("run", "--plain", "--files", "**/Uploader.java", "--time-extra", "1000",
                    "--recheck-timeouts", project.toString());
            int exitCode;
            List<String> stderr;
            try (ToolProcess tool = ToolProcess.start(command, Map.of(), ProcessBuilder.Redirect.to(report.toFile()))) {
                tool.awaitLine(line -> ALL_FINISHED.matcher(line).matches());
                kill("-INT", Long.toString(tool.pid()));
                exitCode = tool.awaitEnd();
                stderr = tool.stderr();
            }

            assertEquals(ExitCode.INTERRUPTED, exitCode, stderr::toString);
            Path resultsFile = ProjectLayout.of(project).resultsFile();
            assertTrue(ResultsFile.read(resultsFile).complete());
            String out = Files.readString(report);
            assertTrue(out.contains("results: " + resultsFile), () -> out + stderr);
            assertEquals(List.of("changeling: stopped after every mutant had its verdict; the results are complete"), messages(stderr),
                    stderr::toString);
        }
    }

    /** Sends a signal to a process. */
    @FunctionalInterface
    interface Signal {
        void send(long pid) throws Exception;
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class SignalToTheToolAlone extends Interrupted {

        @Override
        List<String> launcher() {
            return List.of();
        }

        @Override
        void signal(long pid) throws Exception {
            kill("-INT", Long.toString(pid));
        }
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class SignalToItsProcessGroup extends Interrupted {

        /** {@code setsid} gives the tool a process group of its own, which its workers join, as a terminal's foreground job. */
        @Override
        List<String> launcher() {
            assumeTrue(Files.isExecutable(Path.of("/usr/bin/setsid")) || Files.isExecutable(Path.of("/bin/setsid")), "needs setsid");
            return List.of("setsid");
        }

        @Override
        void signal(long pid) throws Exception {
            kill("-INT", "--", "-" + pid);
        }
    }

    /** One interrupted run on a copy of the hostile sample, and what it left. */
    abstract static class Interrupted {

        Path project;
        Map<String, String> filesBefore;
        List<String> workersWhileRunning;
        final List<String> stderr = new ArrayList<>();
        int exitCode;
        RunResults results;

        /** What the tool's command line starts with. */
        abstract List<String> launcher();

        abstract void signal(long pid) throws Exception;

        @BeforeAll
        void interruptARunWhileItsMutantsRun(@TempDir Path temporary) throws Exception {
            List<String> command = new ArrayList<>(launcher());
            project = SampleProjects.copy("hostile", temporary.resolve("station"));
            filesBefore = SampleProjects.fingerprint(project);
            command.addAll(javaCommand("run", "--plain", "--time-extra", "600000", project.toString()));
            try (ToolProcess tool = ToolProcess.start(command, Map.of(), ProcessBuilder.Redirect.DISCARD)) {
                // the last line before the mutants start: after the baseline come the lone compiles, which take a
                // while on a loaded machine, and a stop before any mutant ran writes nothing
                tool.awaitLine(line -> line.startsWith("  compiled: "));
                workersWhileRunning = Workers.aliveFor(project);
                signal(tool.pid());
                exitCode = tool.awaitEnd();
                stderr.addAll(tool.stderr());
            }
            results = ResultsFile.read(ProjectLayout.of(project).resultsFile());
        }

        /** 130 is 128 + 2, SIGINT's number: the shells' convention for a command ended by a signal (POSIX sh, "Exit Status"). */
        @Test
        void exitsWith130_andSaysWhereTheVerdictsAre() {
            assertEquals(ExitCode.INTERRUPTED, exitCode, stderr::toString);
            assertTrue(stderr.contains("changeling: stopped; the verdicts so far are in " + ProjectLayout.of(project).resultsFile()), stderr::toString);
        }

        @Test
        void keepsTheVerdictsSoFar_markedIncomplete() {
            assertFalse(results.complete());
            assertFalse(results.mutants().isEmpty());
        }

        /** A mutant whose worker the stop killed must not count as crashed or timed out. */
        @Test
        void givesTheMutantItStoppedNoVerdict() {
            List<String> blocked = results.mutants().stream().filter(mutant -> HostileRunTest.key(mutant).equals(BLOCKED))
                    .map(MutantResult::toString).toList();
            assertEquals(List.of(), blocked);
        }

        @Test
        void leavesTheSourceTreeAsItWas() {
            assertEquals(filesBefore, SampleProjects.fingerprint(project));
        }

        /** The baseline ran the sample's SpoolFolderTest, whose folder only a worker that exits normally deletes. */
        @Test
        void endsItsWorkersAsTestJvmsEnd_soTheirDeleteOnExitFilesGo() {
            assertFalse(Files.exists(project.resolve(HostileRunTest.SPOOL)), "a worker was killed before its shutdown hooks ran");
        }

        @Test
        void leavesNoWorkerJvm_ofTheOnesThatRan() {
            assertNotEquals(List.of(), workersWhileRunning, "no worker was found while the run went on, so the check below proves nothing");
            assertEquals(List.of(), Workers.aliveFor(project));
        }
    }
}
