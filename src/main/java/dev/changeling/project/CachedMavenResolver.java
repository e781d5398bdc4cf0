package dev.changeling.project;

import dev.changeling.AtomicFiles;
import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.stream.Collectors;

/**
 * Resolves artifacts through the real mvn with a throwaway pom, one folder per set of coordinates, and
 * keeps the answer there so that the next run reads it instead of calling mvn again.
 */
final class CachedMavenResolver implements ArtifactResolver {

    static final String DEPENDENCY_PLUGIN = "org.apache.maven.plugins:maven-dependency-plugin:3.8.1";

    private final Supplier<Maven> maven;
    private final Path cache;

    /** The mvn is asked for only when the cache cannot answer. */
    CachedMavenResolver(Supplier<Maven> maven, Path cache) {
        this.maven = maven;
        this.cache = cache;
    }

    @Override
    public List<Path> resolve(List<String> coordinates) {
        Path folder = cache.resolve(folderName(coordinates));
        Path pom = folder.resolve("pom.xml");
        Path answer = folder.resolve("classpath.txt");
        String pomText = pom(coordinates);
        Optional<List<Path>> cached = cached(pom, pomText, answer);
        if (cached.isPresent()) {
            return cached.get();
        }
        try {
            Files.deleteIfExists(answer);
            AtomicFiles.writeString(pom, pomText);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Maven.Run run = maven.get().run(folder, List.of("-f", pom.toString(),
                DEPENDENCY_PLUGIN + ":build-classpath", "-Dmdep.outputFile=" + answer), folder.resolve("maven.log"));
        if (!run.succeeded() || !Files.isRegularFile(answer)) {
            throw run.failure("mvn could not resolve " + String.join(", ", coordinates) + " from Maven Central");
        }
        return read(answer).orElseThrow(() -> run.failure("mvn resolved " + String.join(", ", coordinates)
                + " but listed jars that are not there"));
    }

    private static Optional<List<Path>> cached(Path pom, String pomText, Path answer) {
        try {
            if (!Files.isRegularFile(answer) || !Files.isRegularFile(pom) || !Files.readString(pom).equals(pomText)) {
                return Optional.empty();
            }
        } catch (IOException e) {
            return Optional.empty();
        }
        return read(answer);
    }

    /** The jars listed in a classpath file, or nothing when one of them has gone (a cleaned local repository). */
    private static Optional<List<Path>> read(Path answer) {
        try {
            String text = Files.readString(answer, StandardCharsets.UTF_8).strip();
            List<Path> jars = text.isEmpty() ? List.of()
                    : Arrays.stream(text.split(File.pathSeparator)).map(Path::of).toList();
            return jars.stream().allMatch(Files::isRegularFile) ? Optional.of(jars) : Optional.empty();
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    private static String folderName(List<String> coordinates) {
        return coordinates.stream()
                .map(coordinate -> coordinate.substring(coordinate.indexOf(':') + 1).replace(':', '-'))
                .map(name -> name.replaceAll("[^A-Za-z0-9._-]", "_"))
                .collect(Collectors.joining("+"));
    }

    private static String pom(List<String> coordinates) {
        StringBuilder pom = new StringBuilder("""
                <?xml version="1.0" encoding="UTF-8"?>
                <!-- Written by changeling to resolve the JUnit artifacts its workers need; safe to delete. -->
                <project xmlns="http://maven.apache.org/POM/4.0.0">
                  <modelVersion>4.0.0</modelVersion>
                  <groupId>dev.changeling.resolution</groupId>
                  <artifactId>junit-for-workers</artifactId>
                  <version>1</version>
                  <packaging>pom</packaging>
                  <dependencies>
                """);
        for (String coordinate : coordinates) {
            String[] parts = coordinate.split(":");
            pom.append("    <dependency><groupId>").append(parts[0]).append("</groupId><artifactId>").append(parts[1])
                    .append("</artifactId><version>").append(parts[2]).append("</version></dependency>\n");
        }
        return pom.append("  </dependencies>\n</project>\n").toString();
    }
}
