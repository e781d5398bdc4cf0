package dev.changeling.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.Mutant;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A schema built again after an edit: the same build is taken whole; after an edit of method bodies only, the points
 * that left the last schema from the files that did not change leave again before the first round, and the build is the
 * one a build from nothing gives; any other edit compiles from nothing.
 */
class SchemaReuseTest {

    @TempDir
    Path dir;

    /** A file whose every point compiles in the schema, so that an edit of it leaves nothing to find in a first round. */
    private static final String DIAL = """
            package sample;

            public final class Dial {

                private final int notches = 12;

                public int turn(int from, int by) {
                    return (from + by) % notches;
                }

                public boolean past(int at, int mark) {
                    return at > mark;
                }
            }
            """;

    private TestProject project;

    private List<Mutant> mutants() {
        List<Mutant> mutants = new ArrayList<>();
        project.points("sample/Sacks.java", List.of(SampleOperators.LITERALS, SampleOperators.BINARY)).forEach(point -> mutants.add(Mutant.firstOrder(point)));
        project.points("sample/Dial.java", List.of(SampleOperators.BINARY)).forEach(point -> mutants.add(Mutant.firstOrder(point)));
        return mutants;
    }

    /** Every mutant's placement, by fingerprint, as kind and detail. */
    private static Map<String, String> placements(BuildResult build) {
        Map<String, String> all = new TreeMap<>();
        build.placements().forEach((fingerprint, placement) -> all.put(fingerprint, placement.kind() + " " + placement.detail()));
        return all;
    }

    private BuildResult fromNothing(List<Mutant> mutants) throws IOException {
        Files.deleteIfExists(dir.resolve("target/changeling").resolve(SchemaReuse.FILE_NAME));
        return project.build(mutants);
    }

    @Test
    void afterAnEditOfABodyOnly_theUnchangedFilesEvictionsAreCarried_andTheBuildIsTheOneFromNothing() throws IOException {
        project = TestProject.create(dir, Map.of("sample/Sacks.java", Samples.SACKS, "sample/Dial.java", DIAL));
        BuildResult first = project.build(mutants());
        assertTrue(first.timings().schemaRounds() >= 2, "a point of Sacks leaves the schema in the first round");
        assertEquals(0, project.build(mutants()).timings().schemaRounds(), "nothing changed: the last build is taken whole");

        project.edit("sample/Dial.java", "return (from + by) % notches;", "int sum = from + by;\n        return sum % notches;");
        List<Mutant> edited = mutants();
        BuildResult warm = project.build(edited);
        assertEquals(1, warm.timings().schemaRounds(), "the eviction from Sacks is carried, so one round compiles the schema");
        BuildResult cold = fromNothing(edited);
        assertTrue(cold.timings().schemaRounds() >= 2);
        assertEquals(cold.points(), warm.points());
        assertEquals(placements(cold), placements(warm));
        assertEquals(cold.entries(), warm.entries());
    }

    @Test
    void afterAnEditOutsideTheBodies_nothingIsCarried() {
        project = TestProject.create(dir, Map.of("sample/Sacks.java", Samples.SACKS, "sample/Dial.java", DIAL));
        project.build(mutants());
        project.edit("sample/Dial.java", "private final int notches = 12;", "private final int notches = 24;");
        assertTrue(project.build(mutants()).timings().schemaRounds() >= 2, "a field's initial value is outside the noted bodies");
    }
}
