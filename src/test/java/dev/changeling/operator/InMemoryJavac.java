package dev.changeling.operator;

import com.sun.source.util.JavacTask;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URI;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import javax.tools.Diagnostic;
import javax.tools.DiagnosticCollector;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileObject;
import javax.tools.SimpleJavaFileObject;
import javax.tools.ToolProvider;

/**
 * Compiles many small sources in one javac run, each in a package of its own so that equal class
 * names do not clash. Only analysed (attribution and flow), never written out. Returns the errors per unit.
 */
final class InMemoryJavac {

    /** One source: {@code key} names it in the result, {@code typeName} is its public top-level type (or any name). */
    record Unit(String key, String typeName, String source) {
    }

    private static final JavaCompiler JAVAC = ToolProvider.getSystemJavaCompiler();

    private InMemoryJavac() {
    }

    /** The error messages of each unit that has any; an empty map means everything compiled. */
    static Map<String, List<String>> errors(List<Unit> units) {
        Map<URI, String> keys = new LinkedHashMap<>();
        List<JavaFileObject> files = new ArrayList<>();
        for (int i = 0; i < units.size(); i++) {
            Unit unit = units.get(i);
            String pkg = "unit" + i;
            URI uri = URI.create("string:///" + pkg + "/" + unit.typeName() + ".java");
            keys.put(uri, unit.key());
            // The package line goes on the same line as the first line of the source, so line numbers stay.
            String text = "package " + pkg + "; " + unit.source();
            files.add(new SimpleJavaFileObject(uri, JavaFileObject.Kind.SOURCE) {
                @Override
                public CharSequence getCharContent(boolean ignoreEncodingErrors) {
                    return text;
                }
            });
        }
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        JavaCompiler.CompilationTask task = JAVAC.getTask(null, null, diagnostics,
                List.of("-proc:none", "-Xlint:none", "-nowarn", "-implicit:none"), null, files);
        try {
            // Attribution and flow analysis find every compile error; no class file is written.
            ((JavacTask) task).analyze();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Map<String, List<String>> errors = new LinkedHashMap<>();
        for (Diagnostic<? extends JavaFileObject> diagnostic : diagnostics.getDiagnostics()) {
            if (diagnostic.getKind() != Diagnostic.Kind.ERROR) {
                continue;
            }
            String key = diagnostic.getSource() == null ? "(no source)" : keys.get(diagnostic.getSource().toUri());
            errors.computeIfAbsent(key, k -> new ArrayList<>())
                    .add("line " + diagnostic.getLineNumber() + ": " + diagnostic.getMessage(Locale.ROOT));
        }
        return errors;
    }
}
