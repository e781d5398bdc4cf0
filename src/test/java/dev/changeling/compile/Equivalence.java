package dev.changeling.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.changeling.mutant.Mutant;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.URLClassLoader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * The check that what runs is what the user reviews: each mutant, run from wherever the build put
 * it, gives exactly the outcomes of its own mutated file compiled the plain way.
 */
final class Equivalence {

    private Equivalence() {
    }

    /** Asserts the equivalence for every mutant; how many mutants ended up in each place. */
    static Map<Placement.Kind, Integer> assertEachMutantRunsAsItsOwnFile(TestProject project, BuildResult result,
                                                                        List<Mutant> mutants, String className) {
        Map<Placement.Kind, Integer> counts = new EnumMap<>(Placement.Kind.class);
        try (URLClassLoader schema = project.loader(result.schemaClasses());
             URLClassLoader original = project.loader(project.classes)) {
            assertEquals(Outcomes.run(original, className), Outcomes.run(schema, className),
                    "the schema with every point off behaves as the original");
            for (Mutant mutant : mutants) {
                Placement placement = result.placementOf(mutant);
                counts.merge(placement.kind(), 1, Integer::sum);
                List<String> errors = new ArrayList<>();
                Path standalone = project.compileStandalone(mutant, errors);
                String what = describe(mutant) + " placed " + placement;
                switch (placement.kind()) {
                    case IN_SCHEMA -> {
                        assertNotNull(standalone, what + " is in the schema but its own file does not compile: " + errors);
                        assertEquals(outcomes(project, standalone, className),
                                Outcomes.run(schema, className, placement.activation()), what);
                    }
                    case ALONE -> {
                        assertNotNull(standalone, what + " compiled alone but its own file does not compile: " + errors);
                        assertEquals(outcomes(project, standalone, className),
                                outcomes(project, placement.classes(), className), what);
                    }
                    case STILLBORN -> {
                        assertNull(standalone, what + " is stillborn but its own file compiles");
                        assertEquals(errors.get(0), placement.detail(), what + ": the reported error is javac's first");
                    }
                    case ONCE_PER_JVM -> {
                    }
                    default -> throw new IllegalStateException(placement.kind().toString());
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return counts;
    }

    static String describe(Mutant mutant) {
        StringBuilder out = new StringBuilder("mutant");
        mutant.points().forEach(point -> out.append(" [line ").append(point.line()).append(' ')
                .append(point.operator()).append(": ").append(point.snippet()).append(" -> ")
                .append(point.replacement()).append(']'));
        return out.toString();
    }

    private static List<String> outcomes(TestProject project, Path classes, String className) {
        try (URLClassLoader loader = project.loader(classes)) {
            return Outcomes.run(loader, className);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
