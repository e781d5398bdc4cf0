package dev.changeling.project;

import dev.changeling.AtomicFiles;
import dev.changeling.UserError;
import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

/** Compiles a Maven module's main and test code and writes its test classpath, in one mvn call. */
final class MavenDiscovery {

    /** Words in Maven's log that mean a dependency could not be had, such as a sibling module never installed. */
    private static final List<String> UNRESOLVED = List.of("Could not resolve dependencies", "Could not find artifact",
            "Failed to collect dependencies", "Failed to read artifact descriptor", "Non-resolvable parent POM");

    /**
     * What the mvn call left behind, before the JUnit launcher is aligned.
     *
     * @param build how the module was built, in words for the user
     */
    record Compiled(Path classes, Path testClasses, List<Path> dependencies, SuiteConfiguration suite,
                    String build) {
    }

    private MavenDiscovery() {
    }

    /**
     * Runs {@code mvn test-compile dependency:build-classpath help:effective-pom} in the module; when the module needs siblings
     * that are not installed, runs it again from the outermost aggregator with {@code -pl module -am}, and
     * remembers that for the next run.
     */
    static Compiled compile(Path module, Maven maven) {
        PomFile pom = PomFile.read(module.resolve("pom.xml"));
        if (pom.isAggregator()) {
            String first = module.resolve(pom.modules().get(0)).toString().replace('\\', '/');
            throw new UserError(module + ": this pom.xml only groups the modules " + String.join(", ", pom.modules())
                    + "; give one module folder, e.g. `changeling run " + first + "`");
        }
        PomFile.BuildFolders folders = pom.folders();
        Path work = folders.directory().resolve("changeling");
        Path classpathFile = work.resolve("classpath.txt");
        Path log = work.resolve("maven.log");
        Path effectivePom = work.resolve("effective-pom.xml");
        Path reactorMarker = work.resolve("maven-reactor.txt");
        Path memoFile = work.resolve(MavenMemo.FILE);
        MavenMemo inputs = MavenMemo.now(module, maven.arguments(), List.of(folders.sources(), folders.testSources(),
                module.resolve("src/main/resources"), module.resolve("src/test/resources")));
        if (!Files.exists(reactorMarker)) {
            Optional<Compiled> reused = reuse(module, folders, classpathFile, effectivePom, MavenMemo.read(memoFile), inputs, maven);
            if (reused.isPresent()) {
                inputs.write(memoFile);
                return reused.get();
            }
        }
        try {
            Files.createDirectories(work);
            Files.deleteIfExists(classpathFile);
            Files.deleteIfExists(effectivePom);
            Files.deleteIfExists(memoFile);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        List<String> build = goals(classpathFile.toString(), effectivePom);
        Optional<Reactor> reactor = Reactor.around(module);
        Maven.Run run;
        if (reactor.isPresent() && Files.isRegularFile(reactorMarker)) {
            run = inReactor(reactor.get(), build, log, maven);
        } else {
            run = maven.run(module, build, log);
            if (!run.succeeded() && reactor.isPresent() && UNRESOLVED.stream().anyMatch(run::logMentions)) {
                run = inReactor(reactor.get(), build, log, maven);
                if (run.succeeded()) {
                    remember(reactorMarker, reactor.get());
                }
            }
        }
        if (!run.succeeded()) {
            throw run.failure("mvn could not compile " + module);
        }
        Compiled compiled = afterwards(run, module, folders, classpathFile, effectivePom, maven,
                String.format(java.util.Locale.ROOT, "compiled and found the test classpath in %.1f s", maven.totalTime().toMillis() / 1000.0));
        inputs.write(memoFile);
        return compiled;
    }

    /**
     * The goals of the one mvn call: compile main and test code, write the test classpath to {@code classpathFile}
     * (an expression Maven fills in per module, such as {@code ${project.build.directory}}, may be part of it) and the
     * effective POM to {@code effectivePom}.
     */
    static List<String> goals(String classpathFile, Path effectivePom) {
        return List.of("test-compile", CachedMavenResolver.DEPENDENCY_PLUGIN + ":build-classpath",
                "-Dmdep.outputFile=" + classpathFile, "-Dmdep.includeScope=test",
                EffectivePom.HELP_PLUGIN + ":effective-pom", "-Doutput=" + effectivePom);
    }

    /** What a successful mvn call left for one module, checked: its test classpath, its compiled tests, its effective POM. */
    static Compiled afterwards(Maven.Run run, Path module, PomFile.BuildFolders folders, Path classpathFile, Path effectivePom,
                               Maven maven, String how) {
        if (!Files.isRegularFile(classpathFile)) {
            throw run.failure("mvn finished but wrote no test classpath to " + classpathFile);
        }
        if (!Files.isDirectory(folders.testClasses())) {
            throw new UserError(module + ": mvn compiled no tests (there is no " + folders.testClasses()
                    + "); changeling needs the project's own tests, in " + folders.testSources());
        }
        if (!Files.isRegularFile(effectivePom)) {
            throw run.failure("mvn finished but wrote no effective POM to " + effectivePom);
        }
        return compiled(module, folders, classpathFile, EffectivePom.read(effectivePom, folders.directory()), maven, how);
    }

    /**
     * The answer of the last mvn call again, when nothing Maven decides on changed since (no pom, argument or
     * resource; no source removed): changed Java sources are compiled in process, main ones first. Empty when mvn
     * must run.
     */
    private static Optional<Compiled> reuse(Path module, PomFile.BuildFolders folders, Path classpathFile, Path effectivePomFile,
                                            MavenMemo earlier, MavenMemo now, Maven maven) {
        if (earlier == null || !Files.isRegularFile(classpathFile) || !Files.isRegularFile(effectivePomFile)
                || !Files.isDirectory(folders.testClasses())) {
            return Optional.empty();
        }
        List<Path> changed = now.changedJavaSourcesSince(earlier);
        if (changed == null) {
            return Optional.empty();
        }
        long start = System.nanoTime();
        EffectivePom pom = EffectivePom.read(effectivePomFile, folders.directory());
        List<Path> dependencies = read(classpathFile);
        List<Path> mainClasspath = new ArrayList<>(List.of(folders.classes()));
        mainClasspath.addAll(dependencies);
        List<Path> testClasspath = new ArrayList<>(List.of(folders.testClasses()));
        testClasspath.addAll(mainClasspath);
        List<Path> main = changed.stream().filter(file -> file.startsWith(folders.sources())).toList();
        List<Path> tests = changed.stream().filter(file -> file.startsWith(folders.testSources())).toList();
        if (!InProcessCompile.compile(main, folders.classes(), mainClasspath, pom, "default-compile")
                || !InProcessCompile.compile(tests, folders.testClasses(), testClasspath, pom, "default-testCompile")) {
            return Optional.empty();
        }
        String how = changed.isEmpty() ? "not run: nothing it decides on changed since its last call"
                : String.format(java.util.Locale.ROOT, "not run: nothing it decides on changed since its last call;"
                        + " %d changed Java source%s compiled in process in %.1f s", changed.size(), changed.size() == 1 ? "" : "s",
                        (System.nanoTime() - start) / 1e9);
        return Optional.of(compiled(module, folders, classpathFile, pom, maven, how));
    }

    private static Compiled compiled(Path module, PomFile.BuildFolders folders, Path classpathFile, EffectivePom pom, Maven maven,
                                     String how) {
        SuiteConfiguration suite = SurefireReader.read(pom, module, folders.testClasses(), maven.userProperties());
        return new Compiled(folders.classes(), folders.testClasses(), read(classpathFile), suite, how);
    }

    private static Maven.Run inReactor(Reactor reactor, List<String> build, Path log, Maven maven) {
        List<String> arguments = new ArrayList<>(List.of("-pl", reactor.modulePath(), "-am"));
        arguments.addAll(build);
        return maven.run(reactor.root(), arguments, log);
    }

    private static void remember(Path marker, Reactor reactor) {
        try {
            AtomicFiles.writeString(marker, "This module is built from " + reactor.root() + " with -pl " + reactor.modulePath()
                    + " -am, because it needs sibling modules that are not installed. Delete this file to try the module alone.\n");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static List<Path> read(Path classpathFile) {
        try {
            String text = Files.readString(classpathFile, StandardCharsets.UTF_8).strip();
            return text.isEmpty() ? List.of() : Stream.of(text.split(File.pathSeparator)).map(Path::of).toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
