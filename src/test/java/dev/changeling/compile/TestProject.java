package dev.changeling.compile;

import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.mutant.PointFinder;
import dev.changeling.operator.MutationOperator;
import dev.changeling.probe.MutantStopped;
import dev.changeling.probe.Probe;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Predicate;
import javax.tools.Diagnostic;
import javax.tools.DiagnosticCollector;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileObject;
import javax.tools.StandardJavaFileManager;
import javax.tools.StandardLocation;
import javax.tools.ToolProvider;

/**
 * A throwaway project on disk for build tests: its sources, their classes compiled by the real javac,
 * a folder holding only the probe, and loaders that keep every compiled variant apart.
 */
final class TestProject {

    static final String SOURCE_ROOT = "src/main/java/";

    final Path root;
    final Path classes;
    final Path probe;
    final Path output;
    final Map<String, SourceFile> files = new LinkedHashMap<>();
    private final JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
    private final StandardJavaFileManager fileManager;
    private int standaloneCount;

    private TestProject(Path root) {
        this.root = root;
        this.classes = root.resolve("target/classes");
        this.probe = root.resolve("probe");
        this.output = root.resolve("target/changeling");
        this.fileManager = javac.getStandardFileManager(null, Locale.ROOT, StandardCharsets.UTF_8);
    }

    /** Writes the sources (paths below src/main/java), compiles them, and places the probe. */
    static TestProject create(Path root, Map<String, String> sources) {
        TestProject project = new TestProject(root);
        try {
            for (Map.Entry<String, String> source : sources.entrySet()) {
                Path file = root.resolve(SOURCE_ROOT + source.getKey());
                Files.createDirectories(file.getParent());
                Files.writeString(file, source.getValue(), StandardCharsets.UTF_8);
                project.files.put(SOURCE_ROOT + source.getKey(), JavaSources.read(root, file));
            }
            for (String name : List.of("Probe.class", "Probe$Notes.class", MutantStopped.class.getSimpleName() + ".class")) {
                Path probeClass = project.probe.resolve("dev/changeling/probe/" + name);
                Files.createDirectories(probeClass.getParent());
                try (InputStream in = Probe.class.getResourceAsStream(name)) {
                    Files.write(probeClass, in.readAllBytes());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Map<String, String> texts = new LinkedHashMap<>();
        project.files.forEach((path, file) -> texts.put(path, file.text()));
        List<String> errors = project.compile(texts, project.classes);
        if (!errors.isEmpty()) {
            throw new IllegalArgumentException("the test project does not compile: " + errors);
        }
        return project;
    }

    /** Replaces text in a source (path below src/main/java) and compiles the project again, as a developer's edit would. */
    void edit(String name, String from, String to) {
        String text = file(name).text();
        if (!text.contains(from)) {
            throw new IllegalArgumentException(name + " does not hold " + from);
        }
        try {
            Path path = root.resolve(SOURCE_ROOT + name);
            Files.writeString(path, text.replace(from, to), StandardCharsets.UTF_8);
            files.put(SOURCE_ROOT + name, JavaSources.read(root, path));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Map<String, String> texts = new LinkedHashMap<>();
        files.forEach((path, file) -> texts.put(path, file.text()));
        List<String> errors = compile(texts, classes);
        if (!errors.isEmpty()) {
            throw new IllegalArgumentException("the edited project does not compile: " + errors);
        }
    }

    SourceFile file(String name) {
        return files.get(SOURCE_ROOT + name);
    }

    List<Point> points(String name, List<MutationOperator> operators) {
        return new PointFinder(operators).find(JavaSources.parse(file(name)));
    }

    /** The points of a file, leaving out any whose host mentions the loop guard (their mutants could loop for ever). */
    List<Point> guardedPoints(String name, List<MutationOperator> operators) {
        Predicate<Point> touchesGuard = point -> point.snippet().contains("guard");
        return points(name, operators).stream().filter(touchesGuard.negate()).toList();
    }

    List<Path> classpath() {
        return List.of(classes, probe);
    }

    BuildResult build(List<Mutant> mutants) {
        return MutantBuild.compile(new BuildRequest(mutants, files, classpath(), output));
    }

    /**
     * Compiles a mutant's standalone file the plain way; null when it does not compile, with {@code errors}
     * filled as {@code file:line: message} in javac's order.
     */
    Path compileStandalone(Mutant mutant, List<String> errors) {
        Path folder = root.resolve("standalone/" + standaloneCount++);
        List<String> found = compile(Map.of(mutant.file(), mutant.apply(files.get(mutant.file()).text())), folder);
        errors.addAll(found);
        return found.isEmpty() ? folder : null;
    }

    private List<String> compile(Map<String, String> texts, Path folder) {
        try {
            Files.createDirectories(folder);
            fileManager.setLocationFromPaths(StandardLocation.CLASS_OUTPUT, List.of(folder));
            fileManager.setLocationFromPaths(StandardLocation.CLASS_PATH, List.of(classes, probe));
            List<Path> written = new ArrayList<>();
            Path sourceCopy = folder.resolveSibling(folder.getFileName() + "-sources");
            for (Map.Entry<String, String> text : texts.entrySet()) {
                Path file = sourceCopy.resolve(text.getKey());
                Files.createDirectories(file.getParent());
                Files.writeString(file, text.getValue(), StandardCharsets.UTF_8);
                written.add(file);
            }
            DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
            boolean ok = javac.getTask(null, fileManager, diagnostics, List.of("-proc:none", "-encoding", "UTF-8"), null,
                    fileManager.getJavaFileObjectsFromPaths(written)).call();
            return ok ? List.of() : diagnostics.getDiagnostics().stream()
                    .filter(d -> d.getKind() == Diagnostic.Kind.ERROR)
                    .map(d -> relative(d.getSource().toUri().getPath(), sourceCopy) + ":" + d.getLineNumber() + ": "
                            + d.getMessage(Locale.ROOT).lines().findFirst().orElse("").trim())
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String relative(String absolute, Path root) {
        return root.toAbsolutePath().relativize(Path.of(absolute)).toString().replace('\\', '/');
    }

    /** A loader that sees {@code first}, then the probe, then the original classes, and nothing of the test's own. */
    URLClassLoader loader(Path first) {
        try {
            return new URLClassLoader(new URL[] {first.toUri().toURL(), probe.toUri().toURL(), classes.toUri().toURL()},
                    ClassLoader.getPlatformClassLoader());
        } catch (MalformedURLException e) {
            throw new IllegalArgumentException(e);
        }
    }
}
