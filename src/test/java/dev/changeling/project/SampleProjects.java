package dev.changeling.project;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Tiny Maven projects written into a temporary folder for tests that run the real mvn. */
final class SampleProjects {

    /** Plugin versions pinned because Maven 3.8's defaults (compiler 3.1) cannot compile for Java 17. */
    private static final String PLUGINS = """
              <build><pluginManagement><plugins>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-compiler-plugin</artifactId><version>3.13.0</version></plugin>
                <plugin><groupId>org.apache.maven.plugins</groupId><artifactId>maven-resources-plugin</artifactId><version>3.3.1</version></plugin>
              </plugins></pluginManagement></build>
            """;

    private static final String PROPERTIES = """
              <properties>
                <maven.compiler.release>17</maven.compiler.release>
                <project.build.sourceEncoding>UTF-8</project.build.sourceEncoding>
              </properties>
            """;

    static final String CALC = """
            package demo;

            public final class Calc {
                public static int add(int a, int b) {
                    return a + b;
                }

                static final class Inner {
                }
            }
            """;

    static final String JUPITER_TEST = """
            package demo;

            import static org.junit.jupiter.api.Assertions.assertEquals;

            import org.junit.jupiter.api.Test;

            class CalcTest {
                @Test
                void adds() {
                    assertEquals(3, Calc.add(1, 2));
                }
            }
            """;

    static final String JUNIT4_TEST = """
            package demo;

            import static org.junit.Assert.assertEquals;

            import org.junit.Test;

            public class CalcTest {
                @Test
                public void adds() {
                    assertEquals(3, Calc.add(1, 2));
                }
            }
            """;

    private SampleProjects() {
    }

    /** A one-module project with the class {@code demo.Calc}, a test {@code demo.CalcTest} and the given test dependencies. */
    static Path calculator(Path folder, String testSource, String... testDependencies) {
        write(folder.resolve("pom.xml"), pom("demo", "calc", "jar", "", dependencies(testDependencies), true));
        write(folder.resolve("src/main/java/demo/Calc.java"), CALC);
        write(folder.resolve("src/test/java/demo/CalcTest.java"), testSource);
        return folder;
    }

    /** An aggregator with modules a and b, where b uses a class of a, and only b has tests. */
    static Path twoModules(Path folder) {
        write(folder.resolve("pom.xml"), pom("demo.multi", "root", "pom", "<modules><module>a</module><module>b</module></modules>", "", true));
        String parent = "<parent><groupId>demo.multi</groupId><artifactId>root</artifactId><version>1.0-SNAPSHOT</version></parent>";
        write(folder.resolve("a/pom.xml"), pom("demo.multi", "a", "jar", parent, "", false));
        write(folder.resolve("a/src/main/java/demo/a/A.java"), "package demo.a;\n\npublic final class A {\n    public static int one() {\n        return 1;\n    }\n}\n");
        write(folder.resolve("b/pom.xml"), pom("demo.multi", "b", "jar", parent,
                dependencies("demo.multi:a:1.0-SNAPSHOT:compile", "org.junit.jupiter:junit-jupiter:5.10.2"), false));
        write(folder.resolve("b/src/main/java/demo/b/B.java"),
                "package demo.b;\n\npublic final class B {\n    public static int two() {\n        return demo.a.A.one() + 1;\n    }\n}\n");
        write(folder.resolve("b/src/test/java/demo/b/BTest.java"), """
                package demo.b;

                import org.junit.jupiter.api.Assertions;
                import org.junit.jupiter.api.Test;

                class BTest {
                    @Test
                    void two() {
                        Assertions.assertEquals(2, B.two());
                    }
                }
                """);
        return folder;
    }

    static void write(Path file, String text) {
        try {
            Files.createDirectories(file.getParent());
            Files.writeString(file, text);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** {@code group:artifact:version[:scope]}, test scope unless named. */
    private static String dependencies(String... coordinates) {
        StringBuilder xml = new StringBuilder("  <dependencies>\n");
        for (String coordinate : coordinates) {
            String[] parts = coordinate.split(":");
            xml.append("    <dependency><groupId>").append(parts[0]).append("</groupId><artifactId>").append(parts[1])
                    .append("</artifactId><version>").append(parts[2]).append("</version><scope>")
                    .append(parts.length > 3 ? parts[3] : "test").append("</scope></dependency>\n");
        }
        return xml.append("  </dependencies>\n").toString();
    }

    private static String pom(String group, String artifact, String packaging, String extra, String dependencies, boolean settings) {
        return "<project xmlns=\"http://maven.apache.org/POM/4.0.0\">\n  <modelVersion>4.0.0</modelVersion>\n  " + extra + "\n"
                + "  <groupId>" + group + "</groupId><artifactId>" + artifact + "</artifactId><version>1.0-SNAPSHOT</version>\n"
                + "  <packaging>" + packaging + "</packaging>\n"
                + (settings ? PROPERTIES + PLUGINS : "") + dependencies + "</project>\n";
    }
}
