package dev.changeling.recall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import javax.tools.ToolProvider;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Classes compiled by the JDK's own javac, read back as a graph of the classes their constant pools name. */
class ClassGraphTest {

    @TempDir
    Path folder;

    @Test
    void aClassReaches_whatItNames_directlyOrNot_andItsNestedClasses_butNotClassesThatOnlyNameIt() throws IOException {
        ClassGraph graph = compile(Path.of("src/main/java/tide/Almanac.java"), """
                package tide;
                public class Almanac {
                    static class Page { }
                    public int highWater() { return new Gauge().level() + Moon.PHASES.length; }
                }
                """, "tide/Gauge.java", """
                package tide;
                class Gauge { int level() { return new Float[] {1f}.length + Buoy.count(); } }
                """, "tide/Buoy.java", """
                package tide;
                class Buoy { static int count() { return 3; } }
                """, "tide/Moon.java", """
                package tide;
                class Moon { static final String[] PHASES = {"new", "full"}; }
                """, "tide/Harbour.java", """
                package tide;
                class Harbour { int water() { return new Almanac().highWater(); } }
                """);

        assertEquals(Set.of("tide/Almanac", "tide/Almanac$Page", "tide/Gauge", "tide/Buoy", "tide/Moon"), graph.closure("tide/Almanac"));
        assertEquals(Set.of("tide/Buoy"), graph.closure("tide/Buoy"));
        assertEquals(List.of("tide/Almanac", "tide/Almanac$Page"), graph.classesOf("src/main/java/tide/Almanac.java").stream().sorted().toList());
        assertEquals(List.of(), graph.classesOf("src/main/java/tide/Lighthouse.java"));
    }

    @Test
    void theDigestOfClassesChanges_whenTheirBytesDo_andNotOtherwise() throws IOException {
        String buoy = """
                package tide;
                class Buoy { static int count() { return 3; } }
                """;
        String first = compile(Path.of("tide/Buoy.java"), buoy).digestOf(Set.of("tide/Buoy"));
        String again = compile(Path.of("tide/Buoy.java"), buoy).digestOf(Set.of("tide/Buoy"));
        String edited = compile(Path.of("tide/Buoy.java"), buoy.replace("3", "4")).digestOf(Set.of("tide/Buoy"));

        assertEquals(first, again);
        assertNotEquals(first, edited);
        assertNotEquals(first, compile(Path.of("tide/Buoy.java"), buoy).digestOf(Set.of("tide/Buoy", "tide/Absent")));
    }

    @Test
    void whatCompilingAgainstAClassReads_changesWithItsSignaturesAndConstants_notWithTheCodeOfItsMethods() throws IOException {
        String buoy = """
                package tide;
                class Buoy { static final int LIGHTS = 2; static int count() { return 3; } }
                """;
        String first = compile(Path.of("tide/Buoy.java"), buoy).apiDigestOf(Set.of("tide/Buoy"));

        assertEquals(first, compile(Path.of("tide/Buoy.java"), buoy.replace("return 3", "return 4")).apiDigestOf(Set.of("tide/Buoy")));
        assertNotEquals(first, compile(Path.of("tide/Buoy.java"), buoy.replace("LIGHTS = 2", "LIGHTS = 5")).apiDigestOf(Set.of("tide/Buoy")));
        assertNotEquals(first, compile(Path.of("tide/Buoy.java"), buoy.replace("static int count()", "static long count()"))
                .apiDigestOf(Set.of("tide/Buoy")));
    }

    /** Compiles the sources (path, text, path, text, ...) with javac into a fresh folder and reads the graph. */
    private ClassGraph compile(Path firstPath, String firstText, String... more) throws IOException {
        Path sources = Files.createTempDirectory(folder, "sources");
        Path classes = Files.createTempDirectory(folder, "classes");
        write(sources.resolve(firstPath), firstText);
        for (int index = 0; index < more.length; index += 2) {
            write(sources.resolve(more[index]), more[index + 1]);
        }
        List<String> files;
        try (var walk = Files.walk(sources)) {
            files = walk.filter(path -> path.toString().endsWith(".java")).map(Path::toString).toList();
        }
        String[] arguments = java.util.stream.Stream.concat(java.util.stream.Stream.of("-d", classes.toString()), files.stream())
                .toArray(String[]::new);
        assertEquals(0, ToolProvider.getSystemJavaCompiler().run(null, null, null, arguments));
        assertTrue(Files.isDirectory(classes.resolve("tide")));
        return ClassGraph.read(List.of(classes));
    }

    private static void write(Path file, String text) throws IOException {
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
    }
}
