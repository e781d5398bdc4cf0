package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

/** The decisions of the alignment, with a resolver that answers from a table instead of running mvn. */
class JUnitAlignmentTest {

    private static final Path TEST_CLASSES = Path.of("/p/target/test-classes");
    private static final Path CLASSES = Path.of("/p/target/classes");
    private static final Path PROJECT = Path.of("/p");

    private final TableResolver resolver = new TableResolver();

    @Nested
    class WithAPlatformEngine {

        @Test
        void keepsTheProjectsLauncher_whenItsVersionMatches() {
            List<Path> classpath = List.of(TEST_CLASSES, CLASSES, platform("engine", "1.12.2"), platform("launcher", "1.12.2"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(classpath, aligned.classpath());
            assertEquals("1.12.2", aligned.platformVersion());
            assertEquals(List.of(), resolver.asked);
        }

        @Test
        void addsTheLauncherOfTheEnginesVersion_whenThereIsNone() {
            List<Path> classpath = List.of(TEST_CLASSES, CLASSES, platform("commons", "1.10.2"), platform("engine", "1.10.2"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(List.of(List.of("org.junit.platform:junit-platform-launcher:1.10.2")), resolver.asked);
            assertEquals(List.of(TEST_CLASSES, CLASSES, platform("commons", "1.10.2"), platform("engine", "1.10.2"),
                    platform("launcher", "1.10.2"), opentest4j()), aligned.classpath());
            assertEquals("1.10.2", aligned.platformVersion());
            assertTrue(aligned.description().contains("none"), aligned.description());
        }

        @Test
        void replacesAMismatchedLauncher_whereItStands() {
            List<Path> classpath = List.of(TEST_CLASSES, CLASSES, platform("launcher", "1.9.3"), platform("engine", "1.10.3"),
                    platform("commons", "1.10.3"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(List.of(List.of("org.junit.platform:junit-platform-launcher:1.10.3")), resolver.asked);
            assertEquals(List.of(TEST_CLASSES, CLASSES, platform("launcher", "1.10.3"), platform("engine", "1.10.3"),
                    platform("commons", "1.10.3"), opentest4j()), aligned.classpath());
            assertTrue(aligned.description().contains("1.9.3"), aligned.description());
        }

        @Test
        void alignsToTheEngine_evenWhenTheLauncherIsNewer() {
            List<Path> classpath = List.of(TEST_CLASSES, platform("engine", "1.11.4"), platform("launcher", "1.12.2"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals("1.11.4", aligned.platformVersion());
            assertEquals(platform("launcher", "1.11.4"), aligned.classpath().get(2));
        }

        @Test
        void junit6_sharesOneVersion() {
            List<Path> classpath = List.of(TEST_CLASSES, jupiter("engine", "6.1.3"), platform("engine", "6.1.3"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(List.of(List.of("org.junit.platform:junit-platform-launcher:6.1.3")), resolver.asked);
            assertEquals("6.1.3", aligned.platformVersion());
        }
    }

    @Nested
    class WithoutAPlatformEngine {

        @Test
        void junit4Only_getsTheVintageEngineAndAMatchingLauncher() {
            List<Path> classpath = List.of(TEST_CLASSES, CLASSES, junit4("4.12"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(List.of(List.of("org.junit.vintage:junit-vintage-engine:5.14.4",
                    "org.junit.platform:junit-platform-launcher:1.14.4")), resolver.asked);
            assertEquals("1.14.4", aligned.platformVersion());
            assertEquals(junit4("4.12"), aligned.classpath().get(2), "the project's own JUnit 4 stays");
            assertTrue(aligned.classpath().contains(platform("launcher", "1.14.4")));
            assertTrue(aligned.classpath().stream().noneMatch(junit4("4.13.2")::equals), "the vintage engine's JUnit 4 is not added");
        }

        // Surefire's JUnit Platform provider adds the Jupiter engine of the API's version (JUnit user guide, "Build Support").
        @Test
        void jupiterApiOnly_getsItsEngineAndLauncher() {
            List<Path> classpath = List.of(TEST_CLASSES, jupiter("api", "5.11.4"), platform("commons", "1.11.4"));

            JUnitAlignment.Aligned aligned = JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(List.of(List.of("org.junit.jupiter:junit-jupiter-engine:5.11.4",
                    "org.junit.platform:junit-platform-launcher:1.11.4")), resolver.asked);
            assertEquals("1.11.4", aligned.platformVersion());
        }

        @Test
        void jupiterApiAndJunit4_getBothEngines() {
            List<Path> classpath = List.of(TEST_CLASSES, jupiter("api", "5.13.4"), junit4("4.13.2"));

            JUnitAlignment.align(classpath, resolver, PROJECT);

            assertEquals(List.of(List.of("org.junit.jupiter:junit-jupiter-engine:5.13.4",
                    "org.junit.vintage:junit-vintage-engine:5.13.4", "org.junit.platform:junit-platform-launcher:1.13.4")), resolver.asked);
        }

        // The vintage engine needs JUnit 4.12 or newer (JUnit user guide, "JUnit Vintage"; Surefire rejects older ones too).
        @Test
        void junit4OlderThan4_12_isAUserError_sayingWhatToRaise() {
            UserError error = assertThrows(UserError.class,
                    () -> JUnitAlignment.align(List.of(TEST_CLASSES, junit4("4.11")), resolver, PROJECT));
            assertTrue(error.getMessage().contains("JUnit 4.11"), error.getMessage());
            assertTrue(error.getMessage().contains("4.12 or newer"), error.getMessage());
        }

        @Test
        void noJUnitAtAll_isAUserError() {
            UserError error = assertThrows(UserError.class,
                    () -> JUnitAlignment.align(List.of(TEST_CLASSES, CLASSES), resolver, PROJECT));
            assertTrue(error.getMessage().startsWith("/p: no JUnit on the test classpath"), error.getMessage());
        }
    }

    @Test
    void platformVersion_ofJupiter5_isOneDotMinor_andFrom6TheSame() {
        assertEquals("1.10.2", JUnitAlignment.platformOf("5.10.2"));
        assertEquals("1.11.0-M2", JUnitAlignment.platformOf("5.11.0-M2"));
        assertEquals("6.0.3", JUnitAlignment.platformOf("6.0.3"));
    }

    private static Path platform(String module, String version) {
        return jar("org/junit/platform", "junit-platform-" + module, version);
    }

    private static Path jupiter(String module, String version) {
        return jar("org/junit/jupiter", "junit-jupiter-" + module, version);
    }

    private static Path junit4(String version) {
        return jar("junit", "junit", version);
    }

    private static Path opentest4j() {
        return jar("org/opentest4j", "opentest4j", "1.3.0");
    }

    private static Path jar(String group, String artifact, String version) {
        return Path.of("/repo", group, artifact, version, artifact + "-" + version + ".jar");
    }

    /** Answers like mvn's transitive resolution would for the artifacts asked, and notes every question. */
    private static final class TableResolver implements ArtifactResolver {

        final List<List<String>> asked = new ArrayList<>();

        @Override
        public List<Path> resolve(List<String> coordinates) {
            asked.add(coordinates);
            List<Path> jars = new ArrayList<>();
            for (String coordinate : coordinates) {
                String[] parts = coordinate.split(":");
                String version = parts[2];
                switch (parts[1]) {
                    case "junit-platform-launcher" -> {
                        jars.add(platform("launcher", version));
                        jars.add(platform("engine", version));
                        jars.add(platform("commons", version));
                        jars.add(opentest4j());
                    }
                    case "junit-vintage-engine" -> {
                        jars.add(jar("org/junit/vintage", "junit-vintage-engine", version));
                        jars.add(junit4("4.13.2"));
                    }
                    case "junit-jupiter-engine" -> jars.add(jupiter("engine", version));
                    default -> throw new AssertionError("not in the table: " + coordinate);
                }
            }
            return jars.stream().distinct().toList();
        }
    }
}
