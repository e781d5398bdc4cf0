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
import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.LinkedBlockingQueue;
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
 * alone, and, as Ctrl-C in a terminal sends it, to the tool and its worker JVMs at once.
 */
@Tag("e2e")
@DisabledOnOs(value = OS.WINDOWS, disabledReason = "sends SIGINT with the kill command")
class InterruptedRunTest {

    /** The hostile sample's blocked uploader thread, given ten minutes, keeps the run busy until the signal. */
    static final String BLOCKED = "Uploader count<expectedBatches → <=";
    static final long WAIT_SECONDS = 300;

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
            Process tool = new ProcessBuilder(command).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            BlockingQueue<String> lines = new LinkedBlockingQueue<>();
            Thread reader = new Thread(() -> readLines(tool, lines), "tool-stderr");
            reader.setDaemon(true);
            reader.start();
            try {
                awaitLine(tool, lines, "  baseline: ");
                workersWhileRunning = Workers.aliveFor(project);
                signal(tool.pid());
                if (!tool.waitFor(WAIT_SECONDS, TimeUnit.SECONDS)) {
                    throw new AssertionError("the tool did not stop within " + WAIT_SECONDS + " s of SIGINT: " + stderr);
                }
                exitCode = tool.exitValue();
                reader.join(TimeUnit.SECONDS.toMillis(WAIT_SECONDS));
                lines.drainTo(stderr);
            } finally {
                if (tool.isAlive()) {
                    ExternalCommand.killWithChildren(tool.toHandle());
                }
            }
            results = ResultsFile.read(ProjectLayout.of(project).resultsFile());
        }

        private void awaitLine(Process tool, BlockingQueue<String> lines, String start) throws InterruptedException {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(WAIT_SECONDS);
            while (System.nanoTime() < deadline) {
                String line = lines.poll(1, TimeUnit.SECONDS);
                if (line != null) {
                    stderr.add(line);
                    if (line.startsWith(start)) {
                        return;
                    }
                } else if (!tool.isAlive()) {
                    throw new AssertionError("the tool ended (exit " + tool.exitValue() + ") before printing '" + start + "': " + stderr);
                }
            }
            throw new AssertionError("no line starting '" + start + "' within " + WAIT_SECONDS + " s: " + stderr);
        }

        private static void readLines(Process tool, BlockingQueue<String> lines) {
            try (BufferedReader err = new BufferedReader(new InputStreamReader(tool.getErrorStream(), StandardCharsets.UTF_8))) {
                for (String line = err.readLine(); line != null; line = err.readLine()) {
                    lines.add(line);
                }
            } catch (IOException ended) {
                // the stream closes with the process
            }
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
