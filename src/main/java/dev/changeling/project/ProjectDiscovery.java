package dev.changeling.project;

import dev.changeling.UserError;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Finds what a run needs to know of a project: it compiles a Maven project through the real mvn (one call)
 * or takes the folders given by hand, and makes the test classpath ready for JUnit workers.
 */
public final class ProjectDiscovery {

    private ProjectDiscovery() {
    }

    /** Discovers the project a folder belongs to, its layout located as every command locates it. */
    public static DiscoveredProject discover(Path folder, DiscoveryOptions options) {
        return discover(ProjectLayout.locate(folder, options.explicitProject()), options);
    }

    /**
     * Discovers the project of a layout.
     *
     * @throws UserError when the folder is no project, the build fails (the message names mvn's log and the
     *                   command to run it again), or the tests cannot be run on the JUnit Platform
     */
    public static DiscoveredProject discover(ProjectLayout layout, DiscoveryOptions options) {
        Path root = layout.root();
        LazyMaven maven = new LazyMaven(options);
        if (options.explicitProject().isPresent()) {
            return explicit(layout, options.explicitProject().get(), maven);
        }
        if (!Files.isRegularFile(root.resolve("pom.xml"))) {
            throw new UserError(root + ": no pom.xml here; give a Maven project folder, or name the source folders,"
                    + " classes, test classes and classpath by hand (--source-root, --classes, --test-classes, --classpath)");
        }
        return finish(layout, MavenDiscovery.compile(root, maven.get()), maven);
    }

    /**
     * Discovers the modules a run analyses: for the root of a multi-module build, every module with main sources and
     * tests of its own, or only the one {@code module} names, compiled by one mvn call from the root, in the reactor's
     * order; for any other project, the project as its only module.
     *
     * @param module the path of the one module to analyse, if one was picked; checked before mvn runs
     * @throws UserError as {@link #discover(ProjectLayout, DiscoveryOptions)}, and when no module has tests of its own
     */
    public static List<DiscoveredModule> discoverModules(ProjectLayout layout, DiscoveryOptions options, Optional<String> module) {
        Path root = layout.root();
        Optional<CodeModule> picked = module.map(path -> CodeModule.named(root, path));
        List<CodeModule> modules = options.explicitProject().isPresent() ? List.of() : CodeModule.below(root);
        if (modules.isEmpty()) {
            return List.of(new DiscoveredModule("", discover(layout, options), List.of()));
        }
        List<CodeModule> chosen = picked.map(List::of).orElseGet(() -> modules.stream().filter(CodeModule::hasTests).toList());
        if (chosen.isEmpty()) {
            throw new UserError(root + ": none of its modules (" + CodeModule.paths(modules)
                    + ") has tests of its own; changeling runs each module's mutants against that module's tests");
        }
        LazyMaven maven = new LazyMaven(options);
        List<ReactorBuild.Built> built = ReactorBuild.compile(root, layout.changelingDirectory(), chosen, picked.isPresent(), maven.get());
        List<DiscoveredModule> discovered = new ArrayList<>();
        for (ReactorBuild.Built one : built) {
            MavenDiscovery.Compiled compiled = one.compiled();
            List<String> testedAlsoBy = built.stream()
                    .filter(other -> other != one && other.compiled().dependencies().contains(compiled.classes()))
                    .map(other -> other.module().path())
                    .toList();
            discovered.add(new DiscoveredModule(one.module().path(), finish(layout.module(one.module()), compiled, maven), testedAlsoBy));
        }
        return List.copyOf(discovered);
    }

    private static DiscoveredProject finish(ProjectLayout layout, MavenDiscovery.Compiled compiled, LazyMaven maven) {
        List<Path> compileClasspath = new ArrayList<>();
        compileClasspath.add(compiled.classes());
        compileClasspath.addAll(compiled.dependencies());
        return finish(layout, compiled.classes(), compiled.testClasses(), compiled.dependencies(), compileClasspath,
                compiled.suite(), compiled.build(), maven);
    }

    private static DiscoveredProject explicit(ProjectLayout layout, ExplicitProject given, LazyMaven maven) {
        Path root = layout.root();
        given.sourceRoots().forEach(path -> mustExist(path, "source folder", true));
        given.testSourceRoots().forEach(path -> mustExist(path, "test source folder", true));
        Path classes = mustExist(given.classesDirectory(), "classes folder", true);
        Path testClasses = mustExist(given.testClassesDirectory(), "test classes folder", true);
        List<Path> dependencies = new ArrayList<>();
        for (Path entry : given.classpath()) {
            Path absolute = mustExist(entry, "classpath entry", false);
            if (!absolute.equals(classes) && !absolute.equals(testClasses) && !dependencies.contains(absolute)) {
                dependencies.add(absolute);
            }
        }
        List<Path> compileClasspath = new ArrayList<>();
        compileClasspath.add(classes);
        compileClasspath.addAll(dependencies);
        return finish(layout, classes, testClasses, dependencies, compileClasspath, SurefireReader.defaults(root, testClasses),
                "not run: the folders and classpath were given by hand", maven);
    }

    private static DiscoveredProject finish(ProjectLayout layout, Path classes, Path testClasses, List<Path> dependencies,
                                            List<Path> compileClasspath, SuiteConfiguration suite, String build, LazyMaven maven) {
        List<Path> testClasspath = new ArrayList<>();
        testClasspath.add(testClasses);
        testClasspath.add(classes);
        testClasspath.addAll(dependencies);
        ArtifactResolver resolver = new CachedMavenResolver(maven::get, layout.changelingDirectory().resolve("launcher"));
        JUnitAlignment.Aligned aligned = JUnitAlignment.align(testClasspath, resolver, layout.root());
        return new DiscoveredProject(layout, classes, List.of(testClasses), compileClasspath, aligned.classpath(),
                ClassNames.below(classes), suite, maven.time(), build, aligned.platformVersion(), aligned.description());
    }

    private static Path mustExist(Path given, String what, boolean folder) {
        Path absolute = given.toAbsolutePath().normalize();
        if (folder ? !Files.isDirectory(absolute) : !Files.exists(absolute)) {
            throw new UserError(given + ": no such " + (folder ? "folder" : "file or folder") + " (given as " + what + "); check the path");
        }
        return absolute;
    }

    /** Finds mvn only when something needs it, so a project given by hand with a launcher never looks for one. */
    private static final class LazyMaven {

        private final DiscoveryOptions options;
        private Maven maven;

        LazyMaven(DiscoveryOptions options) {
            this.options = options;
        }

        Maven get() {
            if (maven == null) {
                maven = new Maven(MavenExecutable.find(options.mavenExecutable(), System.getenv()), options.mavenArguments());
            }
            return maven;
        }

        Duration time() {
            return maven == null ? Duration.ZERO : maven.totalTime();
        }
    }
}
