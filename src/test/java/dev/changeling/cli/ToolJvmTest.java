package dev.changeling.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class ToolJvmTest {

    private static final Path JAVA_HOME = Path.of("/opt/jdk");

    private static Optional<List<String>> relaunch(List<String> jvmArguments, Map<String, String> environment, String... args) {
        return ToolJvm.relaunch(args, jvmArguments, environment, JAVA_HOME, "changeling.jar", false);
    }

    @Test
    void aRun_startsAgainWithTheClientCompilerOnly_keepingTheOptionsItWasGiven() {
        Optional<List<String>> command = relaunch(List.of("-Xmx512m", "-Dsome.flag=1"), Map.of(), "run", "--plain", "shop");
        assertEquals(Optional.of(List.of(JAVA_HOME.resolve("bin").resolve("java").toString(), "-XX:TieredStopAtLevel=1",
                "-Xmx512m", "-Dsome.flag=1", "-Dchangeling.relaunched=true", "-cp", "changeling.jar",
                "dev.changeling.cli.Main", "run", "--plain", "shop")), command);
    }

    @Test
    void optionsTheLauncherReadsFromTheEnvironment_areNotGivenTwice() {
        List<String> command = relaunch(List.of("-Xmx1g", "-Xlog:gc", "-Dfrom.tool.options=1"),
                Map.of("JAVA_TOOL_OPTIONS", " -Dfrom.tool.options=1 ", "JDK_JAVA_OPTIONS", "-Xlog:gc"), "run").orElseThrow();
        assertTrue(command.contains("-Xmx1g"));
        assertEquals(List.of(), command.stream().filter(option -> option.equals("-Xlog:gc") || option.startsWith("-Dfrom")).toList());
    }

    @Test
    void otherCommands_theRelaunchedJvm_andAnEmptyCommandLine_workWhereTheyAre() {
        assertEquals(Optional.empty(), relaunch(List.of(), Map.of(), "triage", "shop"));
        assertEquals(Optional.empty(), relaunch(List.of(), Map.of()));
        assertEquals(Optional.empty(), ToolJvm.relaunch(new String[] {"run"}, List.of(), Map.of(), JAVA_HOME, "changeling.jar", true));
    }

    @Test
    void aCompilerOptionOrAnAgentOfTheUsersOwn_keepsTheRunInThisJvm() {
        for (String own : List.of("-XX:TieredStopAtLevel=4", "-XX:-TieredCompilation", "-Xint",
                "-agentlib:jdwp=transport=dt_socket,server=y,address=5005", "-javaagent:/tmp/coverage.jar")) {
            assertEquals(Optional.empty(), relaunch(List.of("-Xmx1g", own), Map.of(), "run"), own);
        }
    }

    @Test
    void theRelaunchedCommandsExitCode_isHandedBack() {
        assertEquals(3, ToolJvm.exitOf(ToolJvm.start(List.of("sh", "-c", "exit 3")).orElseThrow()));
        assertEquals(Optional.empty(), ToolJvm.start(List.of("/no/such/java")));
    }
}
