package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run after a run needs no mvn while nothing Maven decides on changed: changed Java sources are compiled in
 * process; a pom, an argument, a resource or a removed source brings mvn back.
 */
@Tag("maven")
@DisabledOnOs(OS.WINDOWS)
class RediscoveryTest {

    Path root;

    @BeforeEach
    void firstRun(@TempDir Path folder) {
        root = SampleProjects.calculator(folder.resolve("calc"), SampleProjects.JUPITER_TEST, "org.junit.jupiter:junit-jupiter:5.10.2");
        assertTrue(discover().build().startsWith("compiled and found the test classpath"));
    }

    DiscoveredProject discover(String... mavenArguments) {
        return ProjectDiscovery.discover(root, DiscoveryOptions.defaults().withMavenArguments(List.of(mavenArguments)));
    }

    @Test
    void nothingChanged_mvnDoesNotRun() {
        DiscoveredProject again = discover();
        assertEquals("not run: nothing it decides on changed since its last call", again.build());
        assertEquals(0, again.mavenTime().toMillis());
        assertEquals(List.of("demo.CalcTest"), again.suite().testClasses());
    }

    @Test
    void aChangedMainSource_andANewTest_areCompiledInProcess() throws IOException {
        Path calc = root.resolve("src/main/java/demo/Calc.java");
        Files.writeString(calc, Files.readString(calc).replace("return a + b;", "return b + a;"));
        SampleProjects.write(root.resolve("src/test/java/demo/SumTest.java"),
                "package demo;\n\nclass SumTest {\n    @org.junit.jupiter.api.Test\n    void sums() {\n"
                        + "        org.junit.jupiter.api.Assertions.assertEquals(5, Calc.add(2, 3));\n    }\n}\n");
        long before = Files.getLastModifiedTime(root.resolve("target/classes/demo/Calc.class")).toMillis();

        DiscoveredProject again = discover();

        assertTrue(again.build().startsWith("not run: nothing it decides on changed since its last call; 2 changed Java sources"
                + " compiled in process in "), again.build());
        assertTrue(Files.isRegularFile(root.resolve("target/test-classes/demo/SumTest.class")));
        assertTrue(Files.getLastModifiedTime(root.resolve("target/classes/demo/Calc.class")).toMillis() >= before);
        assertEquals(List.of("demo.CalcTest", "demo.SumTest"), again.suite().testClasses());
        assertEquals("not run: nothing it decides on changed since its last call", discover().build(), "the new state is remembered");
    }

    @Test
    void aSourceThatDoesNotCompile_isLeftToMaven_whichSaysWhy() throws IOException {
        SampleProjects.write(root.resolve("src/test/java/demo/BrokenTest.java"), "package demo;\n\nclass BrokenTest {\n    int x = ;\n}\n");
        dev.changeling.UserError error = org.junit.jupiter.api.Assertions.assertThrows(dev.changeling.UserError.class, this::discover);
        assertTrue(error.getMessage().startsWith("mvn could not compile"), error.getMessage());
    }

    @Test
    void aChangedPom_aNewArgument_aResource_orARemovedSource_bringMvnBack() throws IOException {
        Path pom = root.resolve("pom.xml");
        Files.writeString(pom, Files.readString(pom) + "\n<!-- edited -->\n");
        assertTrue(discover().build().startsWith("compiled"), "a changed pom");
        assertTrue(discover("-Dsomething=1").build().startsWith("compiled"), "another argument");
        SampleProjects.write(root.resolve("src/test/resources/fixture.txt"), "data\n");
        assertTrue(discover("-Dsomething=1").build().startsWith("compiled"), "a new resource");
        SampleProjects.write(root.resolve("src/main/java/demo/Extra.java"), "package demo;\n\nclass Extra {\n}\n");
        assertTrue(discover("-Dsomething=1").build().startsWith("not run"), "a new source alone");
        Files.delete(root.resolve("src/main/java/demo/Extra.java"));
        assertTrue(discover("-Dsomething=1").build().startsWith("compiled"), "a removed source");
    }
}
