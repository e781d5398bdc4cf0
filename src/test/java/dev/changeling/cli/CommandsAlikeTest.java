package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.project.ProjectLayout;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Every command takes the same shared options, explains itself the same way, and finds the project the same way. */
class CommandsAlikeTest {

    @TempDir
    Path temp;

    @ParameterizedTest
    @ValueSource(strings = {"run", "mutants", "triage", "export", "equivalents", "equivalents show", "equivalents stale",
        "equivalents prune", "equivalents add", "equivalents drop", "operators", "insights", "merge"})
    void everyCommandListsItsExitCodesAndTakesTheOutputOptions(String command) {
        List<String> words = List.of(command.split(" "));
        CommandOutcome help = CommandOutcome.of(concat(words, "--help"));
        assertEquals(ExitCode.OK, help.code(), help.err());
        assertTrue(help.out().contains("Exit codes:"), help.out());
        assertTrue(help.out().matches("(?s).*\n  70 +A fault inside the tool.*"), help.out());
        assertTrue(help.out().contains("--plain") && help.out().contains("--verbose"), help.out());
    }

    @Test
    void theHelpCommandShowsACommandsHelp() {
        CommandOutcome help = CommandOutcome.of("help", "export");
        assertEquals(ExitCode.OK, help.code(), help.err());
        assertEquals(CommandOutcome.of("export", "--help").out(), help.out());
    }

    @Test
    void verboseOnAnyCommandGivesTheStackTrace() {
        CommandOutcome missing = CommandOutcome.of("export", temp.resolve("nowhere").toString(), "--verbose");
        assertEquals(ExitCode.USER_ERROR, missing.code());
        assertTrue(missing.err().contains("at dev.changeling."), missing.err());
    }

    /** A pom that moves both its source folder and its build folder: listing and every path agree with it. */
    @Test
    void aPomThatMovesItsFoldersIsFollowedByEveryCommand() throws IOException {
        Path project = temp.resolve("bellows");
        Files.createDirectories(project.resolve("code/dev/forge"));
        Files.writeString(project.resolve("pom.xml"), """
                <project>
                  <modelVersion>4.0.0</modelVersion>
                  <groupId>dev.forge</groupId><artifactId>bellows</artifactId><version>1</version>
                  <build>
                    <sourceDirectory>code</sourceDirectory>
                    <testSourceDirectory>checks</testSourceDirectory>
                    <directory>out</directory>
                  </build>
                </project>
                """);
        Files.writeString(project.resolve("code/dev/forge/Draught.java"), """
                package dev.forge;

                final class Draught {
                    static boolean strong(int pumps) {
                        return pumps > 3;
                    }
                }
                """);
        Files.createDirectories(project.resolve("src/main/java/dev/forge"));
        Files.writeString(project.resolve("src/main/java/dev/forge/Stray.java"), "package dev.forge; final class Stray { int a = 1 + 2; }\n");

        ProjectLayout layout = ProjectLayout.of(project);
        assertEquals(List.of(project.resolve("code")), layout.sourceRoots());
        assertEquals(List.of(project.resolve("checks")), layout.testRoots());
        assertEquals(project.resolve("out/changeling/results.json"), layout.resultsFile());

        CommandOutcome listed = CommandOutcome.of("mutants", project.toString(), "--plain");
        assertEquals(ExitCode.OK, listed.code(), listed.err());
        assertTrue(listed.out().contains("code/dev/forge/Draught.java"), listed.out());
        assertTrue(!listed.out().contains("Stray"), "the default source folder is not the pom's: " + listed.out());

        CommandOutcome exported = CommandOutcome.of("export", project.toString());
        assertEquals(ExitCode.USER_ERROR, exported.code());
        assertTrue(exported.err().contains(project.resolve("out/changeling/results.json").toString()), exported.err());
    }

    private static String[] concat(List<String> words, String last) {
        String[] all = words.toArray(new String[words.size() + 1]);
        all[words.size()] = last;
        return all;
    }
}
