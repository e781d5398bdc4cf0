package dev.changeling.execution;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The jars of JUnit Platform 1.10.2 with Jupiter 5.10.2, taken from the local Maven repository and
 * fetched into it with {@code mvn dependency:get} when missing; null when they cannot be had.
 */
final class LegacyJUnit {

    private static final List<String> ARTIFACTS = List.of(
            "org.junit.platform:junit-platform-launcher:1.10.2",
            "org.junit.platform:junit-platform-engine:1.10.2",
            "org.junit.platform:junit-platform-commons:1.10.2",
            "org.junit.jupiter:junit-jupiter-api:5.10.2",
            "org.junit.jupiter:junit-jupiter-engine:5.10.2",
            "org.junit.jupiter:junit-jupiter-params:5.10.2",
            "org.opentest4j:opentest4j:1.3.0",
            "org.apiguardian:apiguardian-api:1.1.2");

    private LegacyJUnit() {
    }

    static List<Path> jars() {
        Path repository = Path.of(System.getProperty("maven.repo.local", System.getProperty("user.home") + "/.m2/repository"));
        List<Path> jars = new ArrayList<>();
        for (String artifact : ARTIFACTS) {
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
