package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class JarNameTest {

    @Nested
    class InALocalRepository {

        // Folder layout of a Maven repository: group/artifact/version/artifact-version[-classifier].jar (Maven's
        // repository layout, as in ~/.m2).
        @Test
        void readsArtifactAndVersion_fromTheFolders() {
            Path jar = Path.of("/home/u/.m2/repository/org/junit/platform/junit-platform-engine/1.10.2/junit-platform-engine-1.10.2.jar");
            assertEquals(Optional.of(new JarName("junit-platform-engine", "1.10.2")), JarName.of(jar));
        }

        @Test
        void keepsAMilestoneVersion_whole() {
            Path jar = Path.of("/r/org/junit/jupiter/junit-jupiter/5.11.0-M2/junit-jupiter-5.11.0-M2.jar");
            assertEquals(Optional.of(new JarName("junit-jupiter", "5.11.0-M2")), JarName.of(jar));
        }

        @Test
        void readsAClassifiedJar_asItsArtifact() {
            Path jar = Path.of("/r/com/acme/tools/2.0/tools-2.0-tests.jar");
            assertEquals(Optional.of(new JarName("tools", "2.0")), JarName.of(jar));
        }
    }

    @Nested
    class InAPlainFolder {

        @Test
        void splitsTheFileName_atTheFirstDashBeforeADigit() {
            assertEquals(Optional.of(new JarName("junit-platform-launcher", "1.9.3")),
                    JarName.of(Path.of("lib/junit-platform-launcher-1.9.3.jar")));
            assertEquals(Optional.of(new JarName("commons-lang3", "3.12.0")), JarName.of(Path.of("lib/commons-lang3-3.12.0.jar")));
            assertEquals(Optional.of(new JarName("junit", "4.13.2")), JarName.of(Path.of("lib/junit-4.13.2.jar")));
        }

        @Test
        void nothing_forAFolderOrAJarWithoutVersion() {
            assertEquals(Optional.empty(), JarName.of(Path.of("target/classes")));
            assertEquals(Optional.empty(), JarName.of(Path.of("lib/tools.jar")));
        }
    }

    @Nested
    class Versions {

        @Test
        void comparesMajorThenMinor() {
            assertTrue(new JarName("junit", "4.12").atLeast(4, 12));
            assertTrue(new JarName("junit", "4.13.2").atLeast(4, 12));
            assertTrue(new JarName("junit", "5.0").atLeast(4, 12));
            assertFalse(new JarName("junit", "4.11").atLeast(4, 12));
            assertFalse(new JarName("junit", "3.8.2").atLeast(4, 12));
        }

        @Test
        void aVersionWithoutNumbers_isNotAtLeastAnything() {
            assertFalse(new JarName("junit", "LATEST").atLeast(0, 0));
        }
    }
}
