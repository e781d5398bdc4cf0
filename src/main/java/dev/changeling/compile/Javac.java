package dev.changeling.compile;

import dev.changeling.Text;
import com.sun.source.tree.CompilationUnitTree;
import com.sun.source.util.JavacTask;
import com.sun.source.util.Trees;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import javax.tools.Diagnostic;
import javax.tools.DiagnosticCollector;
import javax.tools.FileObject;
import javax.tools.ForwardingJavaFileManager;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileManager;
import javax.tools.JavaFileObject;
import javax.tools.SimpleJavaFileObject;
import javax.tools.StandardJavaFileManager;
import javax.tools.StandardLocation;
import javax.tools.ToolProvider;

/**
 * The in-process compiler, set up once per build with the compile classpath (so jars are opened
 * once), running one task per call, one call at a time.
 */
final class Javac implements AutoCloseable {

    static final String PROBE_CLASS = "dev.changeling.probe.Probe";

    /** Keep checking every class after the first error, so one round finds the errors of all files. */
    private static final List<String> COMMON = List.of(
            "-proc:none", "-encoding", "UTF-8", "-nowarn", "-Xlint:none", "-implicit:none",
            "-Xmaxerrs", "100000", "-XDshould-stop.ifError=FLOW");

    /** Line numbers and names for the stack traces and reflection of the tests that run the classes. */
    private static final List<String> WITH_DEBUG_INFO = List.of("-g", "-parameters");

    private final JavaCompiler compiler;
    private final StandardJavaFileManager files;
    private final List<String> options;

    Javac(List<Path> classpath) {
        this(classpath, WITH_DEBUG_INFO);
    }

    /** A compiler whose classes carry nothing but code: two sources that mean the same compile to the same bytes. */
    static Javac withoutDebugInfo(List<Path> classpath) {
        return new Javac(classpath, List.of("-g:none"));
    }

    private Javac(List<Path> classpath, List<String> debugOptions) {
        options = Stream.concat(COMMON.stream(), debugOptions.stream()).toList();
        compiler = ToolProvider.getSystemJavaCompiler();
        if (compiler == null) {
            throw new IllegalStateException("no Java compiler in this runtime; run the tool on a JDK, not a JRE");
        }
        files = compiler.getStandardFileManager(null, Locale.ROOT, StandardCharsets.UTF_8);
        try {
            files.setLocationFromPaths(StandardLocation.CLASS_PATH, classpath);
            files.setLocationFromPaths(StandardLocation.SOURCE_PATH, List.of());
            if (files.getJavaFileForInput(StandardLocation.CLASS_PATH, PROBE_CLASS, JavaFileObject.Kind.CLASS) == null) {
                throw new IllegalArgumentException("the compile classpath lacks " + PROBE_CLASS + ": " + classpath);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A Java file held in memory under its project-relative path. */
    static final class Source extends SimpleJavaFileObject {

        static final String SCHEME = "source";

        private final String path;
        private final String text;

        Source(String path, String text) {
            super(uriOf(path), Kind.SOURCE);
            this.path = path;
            this.text = text;
        }

        String path() {
            return path;
        }

        String text() {
            return text;
        }

        @Override
        public CharSequence getCharContent(boolean ignoreEncodingErrors) {
            return text;
        }

        private static URI uriOf(String path) {
            try {
                return new URI(SCHEME, null, "/" + path, null);
            } catch (URISyntaxException e) {
                throw new IllegalArgumentException("cannot name " + path + " for the compiler", e);
            }
        }
    }

    /** One compiler task: parsed and attributed first, written to disk only when asked. */
    final class Task {

        private final JavacTask task;
        private final DiagnosticCollector<JavaFileObject> diagnostics;
        private final Set<String> written;
        private List<CompilationUnitTree> units = List.of();

        private Task(JavacTask task, DiagnosticCollector<JavaFileObject> diagnostics, Set<String> written) {
            this.task = task;
            this.diagnostics = diagnostics;
            this.written = written;
        }

        /** Parses and attributes every file; the errors are then in {@link #errors()}. */
        void analyze() {
            try {
                List<CompilationUnitTree> parsed = new ArrayList<>();
                task.parse().forEach(parsed::add);
                units = List.copyOf(parsed);
                task.analyze();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            for (Diagnostic<? extends JavaFileObject> error : errors()) {
                if (pathOf(error.getSource()) == null) {
                    throw new IllegalStateException("javac failed outside the sources: " + error.getMessage(Locale.ROOT));
                }
            }
        }

        List<Diagnostic<? extends JavaFileObject>> errors() {
            return diagnostics.getDiagnostics().stream().filter(d -> d.getKind() == Diagnostic.Kind.ERROR).toList();
        }

        List<CompilationUnitTree> units() {
            return units;
        }

        JavacTask javac() {
            return task;
        }

        Trees trees() {
            return Trees.instance(task);
        }

        /** Writes the class files of an error-free analysis; the binary names of every class written. */
        Set<String> generate() {
            try {
                task.generate();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            return written;
        }
    }

    /** A task over {@code sources} that writes its classes to {@code output}. */
    Task task(List<Source> sources, Path output) {
        try {
            Files.createDirectories(output);
            files.setLocationFromPaths(StandardLocation.CLASS_OUTPUT, List.of(output));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return task(sources, (path, className, standard) -> standard.open());
    }

    /**
     * A task over sources of distinct files that writes each file's classes to its own folder, so that
     * mutants of different files can share one task.
     */
    Task task(List<Source> sources, Map<String, Path> outputByPath) {
        return task(sources, (path, className, standard) -> {
            Path folder = outputByPath.get(path);
            if (folder == null) {
                throw new IllegalStateException("no output folder for " + path);
            }
            return new ClassFile(folder.resolve(className.replace('.', '/') + ".class"));
        });
    }

    /** Receives the bytes of each class compiled from one of the sources. */
    interface ClassSink {
        void accept(String path, String className, byte[] bytes);
    }

    /** A task over sources of distinct files that hands each class's bytes to {@code sink} instead of writing them. */
    Task taskInMemory(List<Source> sources, ClassSink sink) {
        return task(sources, (Output) (path, className, standard) -> new ClassInMemory(path, className, sink));
    }

    /** Where the class {@code className}, compiled from {@code path}, is written. */
    private interface Output {
        JavaFileObject fileFor(String path, String className, StandardOutput standard) throws IOException;
    }

    /** The file the standard file manager would write to. */
    private interface StandardOutput {
        JavaFileObject open() throws IOException;
    }

    private Task task(List<Source> sources, Output output) {
        Set<String> written = new TreeSet<>();
        JavaFileManager recording = new ForwardingJavaFileManager<>(files) {
            @Override
            public JavaFileObject getJavaFileForOutput(Location location, String className, JavaFileObject.Kind kind,
                                                       FileObject sibling) throws IOException {
                if (kind != JavaFileObject.Kind.CLASS) {
                    return super.getJavaFileForOutput(location, className, kind, sibling);
                }
                written.add(className);
                String path = sibling instanceof JavaFileObject source ? pathOf(source) : null;
                return output.fileFor(path, className, () -> super.getJavaFileForOutput(location, className, kind, sibling));
            }
        };
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        JavacTask task = (JavacTask) compiler.getTask(null, recording, diagnostics, options, null, sources);
        return new Task(task, diagnostics, written);
    }

    /** A class file written to a path of our choosing. */
    private static final class ClassFile extends SimpleJavaFileObject {

        private final Path path;

        ClassFile(Path path) {
            super(path.toUri(), Kind.CLASS);
            this.path = path;
        }

        @Override
        public OutputStream openOutputStream() throws IOException {
            Files.createDirectories(path.getParent());
            return Files.newOutputStream(path);
        }
    }

    /** A class file handed to a sink when javac closes it. */
    private static final class ClassInMemory extends SimpleJavaFileObject {

        private final String path;
        private final String className;
        private final ClassSink sink;

        ClassInMemory(String path, String className, ClassSink sink) {
            super(URI.create("memory:///" + className.replace('.', '/') + ".class"), Kind.CLASS);
            this.path = path;
            this.className = className;
            this.sink = sink;
        }

        @Override
        public OutputStream openOutputStream() {
            return new ByteArrayOutputStream() {
                @Override
                public void close() {
                    sink.accept(path, className, toByteArray());
                }
            };
        }
    }

    /** The project-relative path of one of our sources, also when javac hands it back wrapped. */
    static String pathOf(JavaFileObject file) {
        if (file instanceof Source source) {
            return source.path();
        }
        if (file != null && Source.SCHEME.equals(file.toUri().getScheme())) {
            return file.toUri().getPath().substring(1);
        }
        return null;
    }

    /** An error as {@code file:line: message}, the message cut to its first line. */
    static String describe(Diagnostic<? extends JavaFileObject> error) {
        String path = Objects.requireNonNullElse(pathOf(error.getSource()), "?");
        return path + ":" + error.getLineNumber() + ": " + firstLine(error);
    }

    /** The first line of an error's message; the rest repeats types and positions. */
    static String firstLine(Diagnostic<? extends JavaFileObject> error) {
        return Text.firstLine(error.getMessage(Locale.ROOT));
    }

    @Override
    public void close() {
        try {
            files.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
