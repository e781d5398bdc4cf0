package dev.changeling.project;

import dev.changeling.Text;
import dev.changeling.UserError;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/**
 * Where a project keeps its sources and build output. The Maven defaults unless options say otherwise.
 *
 * @param root           the project directory; every reported path is relative to it
 * @param sourceRoots    main source folders
 * @param testRoots      test source folders
 * @param buildDirectory the build directory ({@code target}); the tool writes only below it and in {@code .changeling/}
 */
public record ProjectLayout(Path root, List<Path> sourceRoots, List<Path> testRoots, Path buildDirectory) {

    public static ProjectLayout maven(Path root) {
        Path absolute = root.toAbsolutePath().normalize();
        return new ProjectLayout(absolute,
                List.of(absolute.resolve("src/main/java")),
                List.of(absolute.resolve("src/test/java")),
                absolute.resolve("target"));
    }

    /** A folder of sources that is not a Maven project: the folder is both root and source root. */
    public static ProjectLayout plain(Path root) {
        Path absolute = root.toAbsolutePath().normalize();
        return new ProjectLayout(absolute, List.of(absolute), List.of(), absolute.resolve("target"));
    }

    /** A Maven project when the folder has a pom.xml, else a plain folder of sources. */
    public static ProjectLayout of(Path root) {
        if (!Files.isDirectory(root)) {
            throw new UserError(root + ": no such folder; give the project folder (the one with pom.xml)");
        }
        return Files.isRegularFile(root.resolve("pom.xml")) ? maven(root) : plain(root);
    }

    public Path changelingDirectory() {
        return buildDirectory.resolve("changeling");
    }

    /** Every main .java file, sorted, leaving out anything below a build directory. */
    public List<Path> mainSources() {
        return sourceRoots.stream().filter(Files::isDirectory).flatMap(ProjectLayout::javaFilesBelow).sorted().toList();
    }

    public String relative(Path file) {
        return Text.relative(root, file.toAbsolutePath().normalize());
    }

    private static Stream<Path> javaFilesBelow(Path folder) {
        try (Stream<Path> walk = Files.walk(folder)) {
            return walk.filter(path -> path.toString().endsWith(".java"))
                    .filter(Files::isRegularFile)
                    .filter(path -> !Text.relative(folder, path).matches("(.*/)?target/.*"))
                    .toList().stream();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
