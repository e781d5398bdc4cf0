package dev.changeling.compile;

import dev.changeling.mutant.HigherOrder;
import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Prints how long the build takes on the greenhouse sample (three files, a few hundred lines): all
 * first-order mutants of the sample operators, then those plus second-order ones. With
 * {@code --verify} it also compiles every mutant's own file the plain way and counts disagreements;
 * {@code --keep} leaves the project and its output in place for a look; {@code --copies N} builds N
 * copies of the sample in packages of their own, to see how the build scales.
 * Run after {@code mvn test-compile}:
 * {@code java -cp target/test-classes:target/classes:$(cat cp.txt) dev.changeling.compile.SchemaBuildBenchmark}
 * where {@code cp.txt} comes from {@code mvn dependency:build-classpath -Dmdep.outputFile=cp.txt}.
 */
public final class SchemaBuildBenchmark {

    static final List<String> GREENHOUSE = List.of("IrrigationPlan.java", "SeedInventory.java", "ClimateLog.java");

    private SchemaBuildBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        boolean verify = List.of(args).contains("--verify");
        boolean keep = List.of(args).contains("--keep");
        int copies = List.of(args).contains("--copies") ? Integer.parseInt(args[List.of(args).indexOf("--copies") + 1]) : 1;
        Path root = Files.createTempDirectory("changeling-benchmark");
        try {
            TestProject project = greenhouse(root, copies);
            List<Point> points = new ArrayList<>();
            long lines = 0;
            for (String path : project.files.keySet()) {
                String name = path.substring(TestProject.SOURCE_ROOT.length());
                points.addAll(project.points(name, SampleOperators.all()));
                lines += project.file(name).lines().lineCount();
            }
            List<Mutant> firstOrder = points.stream().map(Mutant::firstOrder).toList();
            List<Mutant> withPairs = new ArrayList<>(firstOrder);
            withPairs.addAll(HigherOrder.combine(points, 2, HigherOrder.Scope.METHOD, 5L));
            System.out.printf("greenhouse sample: %d files, %d lines, %d points%n", project.files.size(), lines, points.size());

            project.build(firstOrder);
            plainCompile(project);
            report("first-order (warm JIT)", project, firstOrder, verify);
            report("first-order + second-order", project, withPairs, verify);
        } finally {
            if (keep) {
                System.out.println("kept " + root);
            } else {
                Outputs.deleteTree(root);
            }
        }
    }

    /** The same files, unmutated, compiled once the same way: the yardstick for one schema round. */
    private static void plainCompile(TestProject project) {
        try (Javac javac = new Javac(project.classpath())) {
            long started = System.nanoTime();
            Javac.Task task = javac.task(project.files.values().stream()
                    .map(file -> new Javac.Source(file.path(), file.text())).toList(), project.root.resolve("plain"));
            task.analyze();
            task.generate();
            System.out.printf("plain compile of the unmutated files: %d ms%n", (System.nanoTime() - started) / 1_000_000);
        }
    }

    private static void report(String label, TestProject project, List<Mutant> mutants, boolean verify) {
        long started = System.nanoTime();
        BuildResult result = project.build(mutants);
        long wall = (System.nanoTime() - started) / 1_000_000;
        Map<Placement.Kind, Integer> counts = new EnumMap<>(Placement.Kind.class);
        result.placements().values().forEach(placement -> counts.merge(placement.kind(), 1, Integer::sum));
        System.out.printf("%s: %d mutants, %d schema points, %d classes; %s; wall %d ms; %s%n", label, mutants.size(),
                result.pointCount(), result.schemaClassNames().size(), counts, wall, result.timings().summary());
        if (verify) {
            verify(project, result, mutants);
        }
    }

    /** Every in-schema or alone mutant's own file must compile, and no stillborn one may, failing with the error reported. */
    private static void verify(TestProject project, BuildResult result, List<Mutant> mutants) {
        int agree = 0;
        List<String> disagreements = new ArrayList<>();
        for (Mutant mutant : mutants) {
            Placement placement = result.placementOf(mutant);
            List<String> errors = new ArrayList<>();
            boolean compiles = project.compileStandalone(mutant, errors) != null;
            boolean expected = placement.kind() != Placement.Kind.STILLBORN;
            if (compiles == expected && (compiles || errors.get(0).equals(placement.detail()))) {
                agree++;
            } else {
                disagreements.add(Equivalence.describe(mutant) + " " + placement + " " + errors);
            }
        }
        System.out.printf("verify: %d of %d agree with their own files%n", agree, mutants.size());
        disagreements.forEach(line -> System.out.println("  disagrees: " + line));
        result.placements().values().stream().filter(p -> p.kind() != Placement.Kind.IN_SCHEMA)
                .forEach(p -> System.out.println("  " + p.kind() + ": " + p.detail()));
    }

    /** The greenhouse sources, {@code copies} times over in packages of their own when more than once. */
    static TestProject greenhouse(Path root, int copies) {
        Map<String, String> sources = new LinkedHashMap<>();
        for (String name : GREENHOUSE) {
            try (InputStream in = SchemaBuildBenchmark.class.getResourceAsStream("greenhouse/greenhouse/" + name)) {
                String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
                for (int copy = 0; copy < copies; copy++) {
                    String pack = copies == 1 ? "greenhouse" : "greenhouse" + copy;
                    sources.put(pack + "/" + name, text.replace("package greenhouse;", "package " + pack + ";"));
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return TestProject.create(root, sources);
    }
}
