package dev.changeling.execution;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Jars from Maven Central for tests that need a JUnit other than the one this JVM runs: taken from the
 * local Maven repository, fetched into it with {@code mvn dependency:get} when missing.
 */
final class MavenJars {

    /** JUnit Platform 1.10.2 with Jupiter 5.10.2, the oldest platform the worker supports. */
    static final List<String> PLATFORM_1_10 = List.of(
            "org.junit.platform:junit-platform-launcher:1.10.2",
            "org.junit.platform:junit-platform-engine:1.10.2",
            "org.junit.platform:junit-platform-commons:1.10.2",
            "org.junit.jupiter:junit-jupiter-api:5.10.2",
            "org.junit.jupiter:junit-jupiter-engine:5.10.2",
            "org.junit.jupiter:junit-jupiter-params:5.10.2",
            "org.opentest4j:opentest4j:1.3.0",
            "org.apiguardian:apiguardian-api:1.1.2");

    /** JUnit 4 itself and the engine that runs its tests on this JVM's platform version. */
    static final List<String> JUNIT_4 = List.of(
            "junit:junit:4.13.2",
            "org.hamcrest:hamcrest-core:1.3",
            "org.junit.vintage:junit-vintage-engine:6.1.3");

    private MavenJars() {
    }

    /** The jars, or null when one of them is neither in the local repository nor to be fetched. */
    static List<Path> resolve(List<String> artifacts) {
        Path repository = Path.of(System.getProperty("maven.repo.local", System.getProperty("user.home") + "/.m2/repository"));
        List<Path> jars = new ArrayList<>();
        for (String artifact : artifacts) {
            Path jar = locate(repository, artifact);
            if (!Files.isRegularFile(jar) && !fetch(artifact)) {
                return null;
            }
            jars.add(jar);
        }
        return jars.stream().allMatch(Files::isRegularFile) ? jars : null;
    }

    private static Path locate(Path repository, String artifact) {
        String[] parts = artifact.split(":");
        return repository.resolve(parts[0].replace('.', '/')).resolve(parts[1]).resolve(parts[2])
                .resolve(parts[1] + "-" + parts[2] + ".jar");
    }

    private static boolean fetch(String artifact) {
        try {
            Process mvn = new ProcessBuilder("mvn", "-q", "-B", "dependency:get", "-Dtransitive=false", "-Dartifact=" + artifact)
                    .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            if (!mvn.waitFor(3, TimeUnit.MINUTES)) {
                mvn.destroyForcibly();
                return false;
            }
            return mvn.exitValue() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }
}
