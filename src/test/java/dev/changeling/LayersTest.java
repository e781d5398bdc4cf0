package dev.changeling;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The packages keep the pipeline's direction: the engine never reaches up into the views, the change
 * scope stays below the engine, and the code that runs inside test JVMs uses nothing else of ours.
 * Read from the sources, so a fully qualified name in code counts as much as an import.
 */
class LayersTest {

    private static final Path SOURCES = Path.of("src/main/java/dev/changeling");
    private static final Pattern REFERENCE = Pattern.compile("\\bdev\\.changeling\\.([a-z]+)\\b");
    private static final Set<String> VIEWS = Set.of("cli", "review", "terminal");
    private static final Set<String> ENGINE = Set.of("run", "execution", "compile", "mutant", "operator", "project",
            "scope", "source", "results", "analysis", "recall");

    @Test
    void theEngineImportsNoView() throws IOException {
        Map<String, Set<String>> uses = packageUses();
        for (String engine : ENGINE) {
            Set<String> upward = new TreeSet<>(uses.getOrDefault(engine, Set.of()));
            upward.retainAll(VIEWS);
            assertEquals(Set.of(), upward, engine + " must not use the views");
        }
    }

    @Test
    void theChangeScopeStaysBelowTheEngine() throws IOException {
        Set<String> used = new TreeSet<>(packageUses().getOrDefault("scope", Set.of()));
        used.retainAll(Set.of("run", "execution", "compile", "results", "analysis", "project"));
        assertEquals(Set.of(), used, "scope must not use the engine's later phases");
    }

    @Test
    void workerAndProbeUseNothingElseOfOurs() throws IOException {
        Map<String, Set<String>> uses = packageUses();
        assertEquals(Set.of(), uses.get("probe"), "the probe uses the JDK only");
        Set<String> worker = new TreeSet<>(uses.get("worker"));
        worker.remove("probe");
        assertEquals(Set.of(), worker, "the worker runs inside the test JVM with the JDK, JUnit and the probe only");
    }

    @Test
    void everyPackageIsPlacedInALayer() throws IOException {
        Set<String> placed = new TreeSet<>(VIEWS);
        placed.addAll(ENGINE);
        placed.addAll(List.of("worker", "probe"));
        Set<String> unplaced = new TreeSet<>(packageUses().keySet());
        unplaced.removeAll(placed);
        assertTrue(unplaced.isEmpty(), "packages without a layer here: " + unplaced);
    }

    /** For each top-level package, the top-level packages of ours its code names. */
    private static Map<String, Set<String>> packageUses() throws IOException {
        Map<String, Set<String>> uses = new TreeMap<>();
        try (Stream<Path> files = Files.walk(SOURCES)) {
            for (Path file : files.filter(path -> path.toString().endsWith(".java")).toList()) {
                Path relative = SOURCES.relativize(file);
                if (relative.getNameCount() < 2) {
                    continue;
                }
                String owner = relative.getName(0).toString();
                String code = withoutComments(Files.readString(file));
                Set<String> used = uses.computeIfAbsent(owner, key -> new TreeSet<>());
                Matcher matcher = REFERENCE.matcher(code);
                while (matcher.find()) {
                    used.add(matcher.group(1));
                }
                used.remove(owner);
            }
        }
        return uses;
    }

    private static String withoutComments(String code) {
        return code.replaceAll("(?s)/\\*.*?\\*/", "").replaceAll("//[^\n]*", "");
    }
}
