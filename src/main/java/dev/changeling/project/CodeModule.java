package dev.changeling.project;

import dev.changeling.ExitCode;
import dev.changeling.Text;
import dev.changeling.UserError;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * A module of a multi-module build that has main Java sources, found by reading the aggregator poms from the root
 * down.
 *
 * @param path           the module's folder relative to the root, with forward slashes, as {@code -pl} and {@code --module} take it
 * @param folder         the module's folder, absolute
 * @param sources        its main source folder, as its pom names it
 * @param testSources    its test source folder
 * @param buildDirectory its build directory
 */
public record CodeModule(String path, Path folder, Path sources, Path testSources, Path buildDirectory) {

    /**
     * The modules below an aggregator root with main Java sources, in the order the poms list them (nested aggregators
     * followed); none when the folder's pom is not an aggregator.
     */
    public static List<CodeModule> below(Path root) {
        Path absolute = root.toAbsolutePath().normalize();
        Path pom = absolute.resolve("pom.xml");
        if (!Files.isRegularFile(pom) || !PomFile.read(pom).isAggregator()) {
            return List.of();
        }
        List<CodeModule> modules = new ArrayList<>();
        collect(absolute, absolute, modules);
        return List.copyOf(modules);
    }

    /**
     * The module of a build that {@code --module} names, by its path from the root ({@code ./} and a trailing
     * {@code /} allowed).
     *
     * @throws UserError (exit code 2) when the build has no modules, or none at that path, listing those it has
     */
    public static CodeModule named(Path root, String path) {
        List<CodeModule> modules = below(root);
        if (modules.isEmpty()) {
            throw new UserError("--module picks one module of a multi-module build, and " + root
                    + " is not the root of one (its pom.xml lists no modules with Java sources); leave the option out", ExitCode.USAGE);
        }
        String wanted = path.replace('\\', '/').replaceAll("^(\\./)+", "").replaceAll("/+$", "");
        return modules.stream().filter(module -> module.path().equals(wanted)).findFirst()
                .orElseThrow(() -> new UserError("--module: " + root + " has no module '" + path + "'; its modules: "
                        + paths(modules), ExitCode.USAGE));
    }

    /** The modules' paths, for a message: {@code core, app}. */
    public static String paths(List<CodeModule> modules) {
        return String.join(", ", modules.stream().map(CodeModule::path).toList());
    }

    /** Whether the module has test sources of its own: those its mutants run against. */
    public boolean hasTests() {
        return holdsJava(testSources);
    }

    private static void collect(Path root, Path aggregator, List<CodeModule> modules) {
        for (Path folder : PomFile.read(aggregator.resolve("pom.xml")).moduleFolders()) {
            Path pom = folder.resolve("pom.xml");
            if (!Files.isRegularFile(pom) || modules.stream().anyMatch(known -> known.folder().equals(folder))) {
                continue;
            }
            PomFile module = PomFile.read(pom);
            if (module.isAggregator()) {
                collect(root, folder, modules);
            } else if (holdsJava(module.folders().sources())) {
                PomFile.BuildFolders folders = module.folders();
                modules.add(new CodeModule(Text.relative(root, folder), folder, folders.sources(), folders.testSources(),
                        folders.directory()));
            }
        }
    }

    private static boolean holdsJava(Path folder) {
        if (!Files.isDirectory(folder)) {
            return false;
        }
        try (Stream<Path> walk = Files.walk(folder)) {
            return walk.anyMatch(file -> file.toString().endsWith(".java") && Files.isRegularFile(file));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
