package dev.changeling.project;

import dev.changeling.UserError;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/**
 * Compiles the chosen modules of a multi-module build and writes each one's test classpath and the effective POM of
 * all of them, in one mvn call from the build's root.
 */
final class ReactorBuild {

    /** Where each module's test classpath goes: below its own build directory, which Maven fills in per module. */
    private static final String CLASSPATH_FILE = "${project.build.directory}/changeling/classpath.txt";

    /** One module as the mvn call left it. */
    record Built(CodeModule module, MavenDiscovery.Compiled compiled) {
    }

    private ReactorBuild() {
    }

    /**
     * Builds the whole reactor, or with {@code alone} the one module chosen and the modules it needs
     * ({@code -pl module -am}), and returns the chosen modules in the reactor's order.
     *
     * @param work the folder below the root's build directory for the log and the effective POM
     */
    static List<Built> compile(Path root, Path work, List<CodeModule> chosen, boolean alone, Maven maven) {
        Path log = work.resolve("maven.log");
        Path effectivePom = work.resolve("effective-pom.xml");
        try {
            Files.createDirectories(work);
            Files.deleteIfExists(effectivePom);
            for (CodeModule module : chosen) {
                Files.deleteIfExists(classpathFile(module));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<String> arguments = new ArrayList<>();
        if (alone) {
            arguments.addAll(List.of("-pl", chosen.get(0).path(), "-am"));
        }
        arguments.addAll(MavenDiscovery.goals(CLASSPATH_FILE, effectivePom));
        Maven.Run run = maven.run(root, arguments, log);
        if (!run.succeeded()) {
            throw run.failure("mvn could not compile the modules of " + root);
        }
        if (!Files.isRegularFile(effectivePom)) {
            throw run.failure("mvn finished but wrote no effective POM to " + effectivePom);
        }
        List<Path> reactorOrder = EffectivePom.buildDirectories(effectivePom);
        String how = String.format(Locale.ROOT, "compiled %s and found %s in %.1f s",
                alone ? "module " + chosen.get(0).path() + " from the build's root" : "every module",
                chosen.size() == 1 ? "its test classpath" : "their test classpaths", run.took().toMillis() / 1000.0);
        List<Built> built = new ArrayList<>();
        for (CodeModule module : chosen.stream().sorted(Comparator.comparingInt(module -> place(reactorOrder, module))).toList()) {
            PomFile.BuildFolders folders = PomFile.read(module.folder().resolve("pom.xml")).folders();
            built.add(new Built(module, MavenDiscovery.afterwards(run, module.folder(), folders, classpathFile(module), effectivePom,
                    maven, how)));
        }
        return List.copyOf(built);
    }

    private static Path classpathFile(CodeModule module) {
        return module.buildDirectory().resolve("changeling").resolve("classpath.txt");
    }

    private static int place(List<Path> reactorOrder, CodeModule module) {
        int at = reactorOrder.indexOf(module.buildDirectory());
        if (at < 0) {
            throw new UserError(module.folder() + ": Maven's effective POM has no module building into " + module.buildDirectory()
                    + "; delete the build directory and run again");
        }
        return at;
    }
}
