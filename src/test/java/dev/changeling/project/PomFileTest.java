package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PomFileTest {

    @TempDir
    Path folder;

    @Nested
    class Modules {

        @Test
        void aPomPackagingWithModules_isAnAggregator() throws IOException {
            PomFile pom = pom("<packaging>pom</packaging><modules><module>a</module><module>nested/b/pom.xml</module></modules>");

            assertTrue(pom.isAggregator());
            assertEquals(List.of("a", "nested/b/pom.xml"), pom.modules());
            assertEquals(List.of(folder.resolve("a"), folder.resolve("nested/b")), pom.moduleFolders());
        }

        @Test
        void aParentPomWithoutModules_isNot() throws IOException {
            assertFalse(pom("<packaging>pom</packaging>").isAggregator());
        }

        @Test
        void aJarWithModules_isNot() throws IOException {
            assertFalse(pom("<modules><module>a</module></modules>").isAggregator());
        }
    }

    @Nested
    class Folders {

        // Maven's defaults: the Super POM of Maven 3 (maven-model-builder, pom-4.0.0.xml).
        @Test
        void mavenDefaults_whenThePomSaysNothing() throws IOException {
            PomFile.BuildFolders folders = pom("").folders();

            assertEquals(folder.resolve("target"), folders.directory());
            assertEquals(folder.resolve("target/classes"), folders.classes());
            assertEquals(folder.resolve("target/test-classes"), folders.testClasses());
            assertEquals(folder.resolve("src/main/java"), folders.sources());
            assertEquals(folder.resolve("src/test/java"), folders.testSources());
        }

        @Test
        void ownSettings_withTheirExpressionsFilledIn() throws IOException {
            PomFile.BuildFolders folders = pom("""
                    <properties><out>${project.basedir}/out</out></properties>
                    <build>
                      <directory>${out}</directory>
                      <outputDirectory>${project.build.directory}/main</outputDirectory>
                      <sourceDirectory>src</sourceDirectory>
                      <testSourceDirectory>${basedir}/test</testSourceDirectory>
                    </build>""").folders();

            assertEquals(folder.resolve("out"), folders.directory());
            assertEquals(folder.resolve("out/main"), folders.classes());
            assertEquals(folder.resolve("out/test-classes"), folders.testClasses());
            assertEquals(folder.resolve("src"), folders.sources());
            assertEquals(folder.resolve("test"), folders.testSources());
        }

        @Test
        void anExpressionItCannotFill_fallsBackToTheDefault() throws IOException {
            PomFile.BuildFolders folders = pom("<build><outputDirectory>${from.the.parent}/c</outputDirectory></build>").folders();

            assertEquals(folder.resolve("target/classes"), folders.classes());
        }
    }

    @Test
    void anUnreadablePom_isAUserError_namingTheFile() throws IOException {
        Files.writeString(folder.resolve("pom.xml"), "<project><build>");

        UserError error = assertThrows(UserError.class, () -> PomFile.read(folder.resolve("pom.xml")));
        assertTrue(error.getMessage().startsWith(folder.resolve("pom.xml") + ": not a readable pom.xml"), error.getMessage());
    }

    private PomFile pom(String inside) throws IOException {
        Path file = folder.resolve("pom.xml");
        Files.writeString(file, "<project xmlns=\"http://maven.apache.org/POM/4.0.0\"><modelVersion>4.0.0</modelVersion>"
                + "<groupId>g</groupId><artifactId>a</artifactId><version>1</version>" + inside + "</project>");
        return PomFile.read(file);
    }
}
