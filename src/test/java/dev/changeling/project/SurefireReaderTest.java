package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * The suite as {@code mvn test} runs it, read through the real mvn from a module whose Surefire settings come
 * from a parent's plugin management, a profile and properties: Maven resolves them, the tool only reads its answer.
 */
@Tag("maven")
@DisabledOnOs(OS.WINDOWS)
class SurefireReaderTest {

    private static final String PARENT = """
            <project xmlns="http://maven.apache.org/POM/4.0.0">
              <modelVersion>4.0.0</modelVersion>
              <groupId>demo</groupId><artifactId>parent</artifactId><version>1.0-SNAPSHOT</version><packaging>pom</packaging>
              <properties>
                <maven.compiler.release>17</maven.compiler.release>
                <project.build.sourceEncoding>UTF-8</project.build.sourceEncoding>
                <excludedGroups>slow</excludedGroups>
                <shelf.unit>kg</shelf.unit>
              </properties>
              <build><pluginManagement><plugins>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-compiler-plugin</artifactId><version>3.13.0</version></plugin>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-resources-plugin</artifactId><version>3.3.1</version></plugin>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-surefire-plugin</artifactId><version>3.5.4</version>
                  <configuration>
                    <includes><include>**/*Check.java</include></includes>
                    <excludes><exclude>%regex[.*Slow.*]</exclude></excludes>
                    <systemPropertyVariables><shelf.unit>${shelf.unit}</shelf.unit></systemPropertyVariables>
                  </configuration>
                </plugin>
              </plugins></pluginManagement></build>
              <profiles><profile><id>ci</id><activation><property><name>ci</name></property></activation>
                <properties><shelf.unit>lb</shelf.unit></properties>
              </profile></profiles>
            </project>
            """;

    private static final String MODULE = """
            <project xmlns="http://maven.apache.org/POM/4.0.0">
              <modelVersion>4.0.0</modelVersion>
              <parent><groupId>demo</groupId><artifactId>parent</artifactId><version>1.0-SNAPSHOT</version>
                <relativePath>../parent/pom.xml</relativePath></parent>
              <artifactId>shelf</artifactId>
              <dependencies><dependency><groupId>org.junit.jupiter</groupId><artifactId>junit-jupiter</artifactId>
                <version>5.10.2</version><scope>test</scope></dependency></dependencies>
              <build><plugins><plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-surefire-plugin</artifactId>
                <configuration>
                  <argLine>@{coverageAgent} -Dshelf.zone=north -Xmx300m</argLine>
                  <environmentVariables><SHELF_MODE>audit</SHELF_MODE></environmentVariables>
                  <workingDirectory>${project.basedir}/fixtures</workingDirectory>
                  <reuseForks>false</reuseForks>
                  <properties><configurationParameters>junit.jupiter.displayname.generator.default = \\
                      org.junit.jupiter.api.DisplayNameGenerator$ReplaceUnderscores</configurationParameters></properties>
                </configuration>
              </plugin></plugins></build>
            </project>
            """;

    private static final String PLAIN = """
            <project xmlns="http://maven.apache.org/POM/4.0.0">
              <modelVersion>4.0.0</modelVersion>
              <groupId>demo</groupId><artifactId>calc</artifactId><version>1</version>
              <properties><maven.compiler.release>17</maven.compiler.release></properties>
              <dependencies><dependency><groupId>org.junit.jupiter</groupId><artifactId>junit-jupiter</artifactId>
                <version>5.10.2</version><scope>test</scope></dependency></dependencies>
              <build><plugins>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-compiler-plugin</artifactId><version>3.13.0</version></plugin>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-resources-plugin</artifactId><version>3.3.1</version></plugin>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-surefire-plugin</artifactId><version>3.5.4</version></plugin>
              </plugins></build>
            </project>
            """;

    private static String testClass(String name) {
        return "package demo;\n\nclass " + name + " {\n    @org.junit.jupiter.api.Test\n    void ok() {\n    }\n\n"
                + "    class Inner {\n    }\n}\n";
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class FromParentProfileAndProperties {

        SuiteConfiguration suite;
        Path module;

        @BeforeAll
        void discover(@TempDir Path folder) {
            SampleProjects.write(folder.resolve("parent/pom.xml"), PARENT);
            module = folder.resolve("shelf");
            SampleProjects.write(module.resolve("pom.xml"), MODULE);
            SampleProjects.write(module.resolve("src/main/java/demo/Shelf.java"), "package demo;\n\npublic final class Shelf {\n}\n");
            for (String name : List.of("ShelfCheck", "SlowShelfCheck", "ShelfTest", "TestShelf")) {
                SampleProjects.write(module.resolve("src/test/java/demo/" + name + ".java"), testClass(name));
            }
            suite = ProjectDiscovery.discover(module, DiscoveryOptions.defaults().withMavenArguments(List.of("-Dci"))).suite();
        }

        @Test
        void selectsTheParentsIncludes_lessItsRegexExclude_andNotTheDefaultNames() {
            assertEquals(List.of("demo.ShelfCheck"), suite.testClasses());
            assertEquals(1, suite.excludedByPom());
            assertTrue(suite.summary().startsWith("1 class as the pom's Surefire settings select them; 1 excluded by the pom"),
                    suite.summary());
        }

        @Test
        void takesTheExcludedGroups_fromAProperty() {
            assertEquals(List.of("slow"), suite.excludedTags());
            assertEquals(List.of(), suite.includedTags());
        }

        @Test
        void takesTheSystemProperty_asTheProfileSetsIt_andMavensOwnDArguments() {
            assertEquals("lb", suite.systemProperties().get("shelf.unit"));
            assertEquals("true", suite.systemProperties().get("ci"));
            assertEquals(module.toString(), suite.systemProperties().get("basedir"));
        }

        @Test
        void takesTheArgLine_withoutTheUnknownLateReference_andItsHeap() {
            assertEquals(List.of("-Dshelf.zone=north"), suite.jvmArguments());
            assertEquals(Optional.of("300m"), suite.maxHeap());
            assertEquals(1, suite.notices().size(), suite.notices()::toString);
            assertTrue(suite.notices().get(0).contains("@{coverageAgent}"), suite.notices()::toString);
        }

        @Test
        void takesTheEnvironment_theWorkingDirectory_freshForks_andPlatformParameters() {
            assertEquals(Map.of("SHELF_MODE", "audit"), suite.environment());
            assertEquals(module.resolve("fixtures"), suite.workingDirectory());
            assertTrue(suite.freshJvmPerClass());
            assertEquals("org.junit.jupiter.api.DisplayNameGenerator$ReplaceUnderscores",
                    suite.configurationParameters().get("junit.jupiter.displayname.generator.default"));
            assertFalse(suite.skipReason().isPresent());
        }
    }

    @Nested
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class WhenThePomSaysNothing {

        SuiteConfiguration suite;

        @BeforeAll
        void discover(@TempDir Path folder) {
            Path root = SampleProjects.calculator(folder.resolve("calc"), SampleProjects.JUPITER_TEST, "org.junit.jupiter:junit-jupiter:5.10.2");
            // Surefire pinned, as Maven's default version depends on Maven's own (3.8 binds 2.12.4, which lacks *Tests)
            SampleProjects.write(root.resolve("pom.xml"), PLAIN);
            SampleProjects.write(root.resolve("src/test/java/demo/CalcChecks.java"), testClass("CalcChecks"));
            SampleProjects.write(root.resolve("src/test/java/demo/CalcTests.java"), testClass("CalcTests"));
            suite = ProjectDiscovery.discover(root, DiscoveryOptions.defaults().withMavenArguments(List.of("-DskipTests"))).suite();
        }

        @Test
        void surefiresDefaults_selectTheConventionalNames_withoutNestedClasses() {
            assertEquals(List.of("demo.CalcTest", "demo.CalcTests"), suite.testClasses());
            assertEquals(0, suite.excludedByPom());
            assertTrue(suite.summary().startsWith("2 classes as Surefire selects them by default"), suite.summary());
        }

        @Test
        void skipTests_saysThereIsNothingToRun() {
            assertTrue(suite.skipReason().orElseThrow().contains("skipTests"), suite.skipReason()::toString);
        }
    }
}
