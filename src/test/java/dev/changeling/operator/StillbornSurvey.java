package dev.changeling.operator;

import com.sun.source.util.JavacTask;
import dev.changeling.mutant.Point;
import java.io.IOException;
import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.stream.Stream;
import javax.tools.Diagnostic;
import javax.tools.DiagnosticCollector;
import javax.tools.JavaCompiler;
import javax.tools.JavaFileObject;
import javax.tools.SimpleJavaFileObject;
import javax.tools.ToolProvider;

/**
 * A benchmark, not a test: makes every mutant of every operator in a source tree, compiles each one
 * alone against the tree's compiled classes, and prints how many mutants each operator made and how
 * many of them do not compile. Arguments: the source folder, the classpath of its compiled classes.
 */
final class StillbornSurvey {

    private StillbornSurvey() {
    }

    public static void main(String[] args) throws IOException {
        Path root = Path.of(args[0]);
        List<Path> files;
        try (Stream<Path> walk = Files.walk(root)) {
            files = walk.filter(path -> path.toString().endsWith(".java") && !path.toString().endsWith("-info.java"))
                    .sorted().toList();
        }
        Map<String, Integer> made = new TreeMap<>();
        Map<String, Integer> stillborn = new TreeMap<>();
        // Round r compiles the r-th mutant of every file: one javac run, no two units of the same file.
        List<List<String[]>> rounds = new ArrayList<>();
        for (Path file : files) {
            String text = Files.readString(file);
            List<Point> points = Mutate.points(text, Operators.all());
            for (int i = 0; i < points.size(); i++) {
                Point point = points.get(i);
                made.merge(point.operator(), 1, Integer::sum);
                while (rounds.size() <= i) {
                    rounds.add(new ArrayList<>());
                }
                rounds.get(i).add(new String[] {root.relativize(file).toString(), Mutate.applied(point, text),
                        point.operator(), root.relativize(file) + ":" + point.line() + " " + Mutate.line(point, text)});
            }
        }
        long start = System.nanoTime();
        for (List<String[]> round : rounds) {
            // Once javac has seen an error it skips flow analysis of the units after it: compile the rest again.
            List<String[]> pending = new ArrayList<>(round);
            for (List<String[]> failed = failures(pending, args[1]); !failed.isEmpty(); failed = failures(pending, args[1])) {
                for (String[] mutant : failed) {
                    stillborn.merge(mutant[2], 1, Integer::sum);
                    System.out.println("does not compile: " + mutant[2] + " " + mutant[3]);
                }
                pending.removeAll(failed);
            }
        }
        int total = made.values().stream().mapToInt(Integer::intValue).sum();
        int failedTotal = stillborn.values().stream().mapToInt(Integer::intValue).sum();
        made.forEach((operator, count) -> System.out.printf("%-24s %6d mutants %5d do not compile%n",
                operator, count, stillborn.getOrDefault(operator, 0)));
        System.out.printf("%d files, %d mutants, %d do not compile (%.1f%%); compiling took %.1f s%n", files.size(),
                total, failedTotal, 100.0 * failedTotal / Math.max(1, total), (System.nanoTime() - start) / 1e9);
    }

    private static List<String[]> failures(List<String[]> round, String classpath) throws IOException {
        if (round.isEmpty()) {
            return List.of();
        }
        JavaCompiler javac = ToolProvider.getSystemJavaCompiler();
        Map<URI, String[]> byUri = new HashMap<>();
        List<JavaFileObject> units = new ArrayList<>();
        for (String[] mutant : round) {
            URI uri = URI.create("string:///" + mutant[0].replace('\\', '/'));
            byUri.put(uri, mutant);
            units.add(new SimpleJavaFileObject(uri, JavaFileObject.Kind.SOURCE) {
                @Override
                public CharSequence getCharContent(boolean ignoreEncodingErrors) {
                    return mutant[1];
                }
            });
        }
        DiagnosticCollector<JavaFileObject> diagnostics = new DiagnosticCollector<>();
        ((JavacTask) javac.getTask(null, null, diagnostics,
                List.of("-proc:none", "-nowarn", "-implicit:none", "-cp", classpath), null, units)).analyze();
        Set<String[]> failed = new HashSet<>();
        for (Diagnostic<? extends JavaFileObject> diagnostic : diagnostics.getDiagnostics()) {
            if (diagnostic.getKind() == Diagnostic.Kind.ERROR && diagnostic.getSource() != null) {
                failed.add(byUri.get(diagnostic.getSource().toUri()));
            }
        }
        return List.copyOf(failed);
    }
}
