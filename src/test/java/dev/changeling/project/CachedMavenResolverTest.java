package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/** The cache and the throwaway pom, with a stand-in mvn that notes each call and writes the classpath file it is asked for. */
@DisabledOnOs(OS.WINDOWS)
class CachedMavenResolverTest {

    private static final List<String> LAUNCHER = List.of("org.junit.platform:junit-platform-launcher:1.10.2");

    @TempDir
    Path folder;

    Path jar;
    Path calls;
    Path cache;

    @BeforeEach
    void standInMaven() throws IOException {
        jar = Files.write(folder.resolve("junit-platform-launcher-1.10.2.jar"), new byte[0]);
        calls = folder.resolve("calls.txt");
        cache = folder.resolve("target/changeling/launcher");
    }

    @Test
    void writesAPomOfTheCoordinates_andReadsTheClasspathMvnWrote() throws IOException {
        List<Path> resolved = resolver(mavenAnswering(0)).resolve(LAUNCHER);

        assertEquals(List.of(jar), resolved);
        String pom = Files.readString(cache.resolve("junit-platform-launcher-1.10.2/pom.xml"));
        assertTrue(pom.contains("<groupId>org.junit.platform</groupId><artifactId>junit-platform-launcher</artifactId><version>1.10.2</version>"), pom);
        assertTrue(Files.readString(calls).contains("org.apache.maven.plugins:maven-dependency-plugin:3.8.1:build-classpath"));
    }

    @Test
    void theSecondResolution_readsTheCache_withoutMvn() throws IOException {
        Path maven = mavenAnswering(0);
        resolver(maven).resolve(LAUNCHER);

        assertEquals(List.of(jar), resolver(maven).resolve(LAUNCHER));
        assertEquals(1, Files.readAllLines(calls).size());
    }

    @Test
    void aCacheListingAJarThatIsGone_isResolvedAgain() throws IOException {
        Path maven = mavenAnswering(0);
        resolver(maven).resolve(LAUNCHER);
        Files.delete(jar);

        UserError error = assertThrows(UserError.class, () -> resolver(maven).resolve(LAUNCHER));
        assertTrue(error.getMessage().contains("listed jars that are not there"), error.getMessage());
        assertEquals(2, Files.readAllLines(calls).size());
    }

    @Test
    void otherCoordinates_getTheirOwnFolder() throws IOException {
        Path maven = mavenAnswering(0);
        resolver(maven).resolve(LAUNCHER);
        resolver(maven).resolve(List.of("org.junit.vintage:junit-vintage-engine:5.14.4", "org.junit.platform:junit-platform-launcher:1.14.4"));

        assertEquals(2, Files.readAllLines(calls).size());
        assertTrue(Files.isDirectory(cache.resolve("junit-vintage-engine-5.14.4+junit-platform-launcher-1.14.4")));
    }

    @Test
    void aFailingMvn_isAUserError_withTheLogAndTheCommand() throws IOException {
        UserError error = assertThrows(UserError.class, () -> resolver(mavenAnswering(1)).resolve(LAUNCHER));

        Path folderOfTheCoordinates = cache.resolve("junit-platform-launcher-1.10.2");
        assertTrue(error.getMessage().startsWith("mvn could not resolve org.junit.platform:junit-platform-launcher:1.10.2 from Maven Central"
                + " (mvn exit code 1): Could not find artifact"), error.getMessage());
        assertTrue(error.getMessage().contains("full log: " + folderOfTheCoordinates.resolve("maven.log")), error.getMessage());
        assertTrue(error.getMessage().contains("to reproduce: cd " + folderOfTheCoordinates + " && "), error.getMessage());
    }

    private CachedMavenResolver resolver(Path maven) {
        return new CachedMavenResolver(() -> new Maven(maven, List.of()), cache);
    }

    /** A shell script standing in for mvn: notes its arguments, then writes the jar into the asked file or fails like mvn. */
    private Path mavenAnswering(int exitCode) throws IOException {
        Path script = folder.resolve("bin/mvn");
        Files.createDirectories(script.getParent());
        Files.writeString(script, """
                #!/bin/sh
                echo "$@" >> '%s'
                if [ %d -ne 0 ]; then echo '[ERROR] Could not find artifact org.junit.platform:junit-platform-launcher:jar:1.10.2'; exit %d; fi
                for argument in "$@"; do
                  case "$argument" in -Dmdep.outputFile=*) printf '%%s' '%s' > "${argument#-Dmdep.outputFile=}";; esac
                done
                """.formatted(calls, exitCode, exitCode, jar));
        assertTrue(script.toFile().setExecutable(true));
        return script;
    }
}
