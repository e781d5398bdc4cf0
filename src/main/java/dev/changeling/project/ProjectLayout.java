package dev.changeling.project;

import dev.changeling.Text;
import dev.changeling.UserError;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/**
 * Where a project keeps its sources and build output, worked out once ({@link #locate}) and used by every command.
 *
 * @param root           the project directory; every reported path is relative to it
 * @param sourceRoots    main source folders
 * @param testRoots      test source folders
 * @param buildDirectory the build directory ({@code target}); the tool writes only below it and in {@code .changeling/}
 */
public record ProjectLayout(Path root, List<Path> sourceRoots, List<Path> testRoots, Path buildDirectory) {

    /**
     * The layout of the project a path belongs to, worked out once for every command: the folders given by
     * hand when there are any; else, from the nearest folder upward with a pom.xml, the folders that pom
     * names ({@code sourceDirectory}, {@code testSourceDirectory}, {@code directory}, Maven's defaults
     * otherwise), and for an aggregator pom the folders of every module below it with main sources (its results in
     * the aggregator's build directory); else the folder itself as a plain folder of sources.
     *
     * @param given    a project folder, or a file or folder inside it
     * @param explicit the folders given by hand, if any
     * @throws UserError when the path does not exist or the pom cannot be read
     */
    public static ProjectLayout locate(Path given, Optional<ExplicitProject> explicit) {
        Path start = given.toAbsolutePath().normalize();
        if (!Files.exists(start)) {
            throw new UserError(given + ": no such folder; give the project folder (the one with pom.xml), or a file or folder inside it");
        }
        Path folder = Files.isDirectory(start) ? start : start.getParent();
        Path root = folder;
        for (Path at = folder; at != null; at = at.getParent()) {
            if (Files.isRegularFile(at.resolve("pom.xml"))) {
                root = at;
                break;
            }
        }
        if (explicit.isPresent()) {
            return new ProjectLayout(root, absolute(explicit.get().sourceRoots()), absolute(explicit.get().testSourceRoots()),
                    root.resolve("target"));
        }
        if (!Files.isRegularFile(root.resolve("pom.xml"))) {
            return new ProjectLayout(root, List.of(root), List.of(), root.resolve("target"));
        }
        PomFile.BuildFolders folders = PomFile.read(root.resolve("pom.xml")).folders();
        List<CodeModule> modules = CodeModule.below(root);
        if (!modules.isEmpty()) {
            return new ProjectLayout(root, modules.stream().map(CodeModule::sources).toList(),
                    modules.stream().map(CodeModule::testSources).toList(), folders.directory());
        }
        return new ProjectLayout(root, List.of(folders.sources()), List.of(folders.testSources()), folders.directory());
    }

    /**
     * This multi-module build's layout with the folders of these modules' layouts ({@link #module}) only: what a run of
     * some of its modules mutates, its results still below this build directory.
     */
    public ProjectLayout withModules(List<ProjectLayout> modules) {
        return new ProjectLayout(root, modules.stream().flatMap(module -> module.sourceRoots().stream()).toList(),
                modules.stream().flatMap(module -> module.testRoots().stream()).toList(), buildDirectory);
    }

    /** One module of this build: its own folders and build directory, every path still relative to this root. */
    public ProjectLayout module(CodeModule module) {
        return new ProjectLayout(root, List.of(module.sources()), List.of(module.testSources()), module.buildDirectory());
    }

    /** The layout of the project the first of the paths a user typed belongs to (the current folder for none). */
    public static ProjectLayout locate(List<Path> paths, Optional<ExplicitProject> explicit) {
        return locate(paths.isEmpty() ? Path.of("") : paths.get(0), explicit);
    }

    /** The paths a user typed that limit the work to files and folders inside the project; none for all of it. */
    public List<Path> limits(List<Path> paths) {
        return paths.stream()
                .map(path -> path.toAbsolutePath().normalize())
                .filter(path -> !path.equals(root))
                .toList();
    }

    /** The layout of the project in a folder, with no folders given by hand. */
    public static ProjectLayout of(Path folder) {
        return locate(folder, Optional.empty());
    }

    /** The results file every view reads: {@code results.json} in the tool's folder under the build directory. */
    public Path resultsFile() {
        return changelingDirectory().resolve("results.json");
    }

    /** How often each operator's mutants were detected in the last full run, beside the results (docs/results-format.md). */
    public Path killHistoryFile() {
        return changelingDirectory().resolve("kill-history.json");
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

    private static List<Path> absolute(List<Path> paths) {
        return paths.stream().map(path -> path.toAbsolutePath().normalize()).toList();
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
