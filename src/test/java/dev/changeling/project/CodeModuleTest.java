package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.ExitCode;
import dev.changeling.UserError;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CodeModuleTest {

    @TempDir
    Path folder;

    Path root;

    /** A dock-share build: {@code docks} and {@code parts/} (itself an aggregator of {@code bikes}), a {@code bom} without code. */
    @BeforeEach
    void build() {
        root = folder.resolve("share");
        aggregator(root, "docks", "parts", "bom");
        SampleProjects.write(root.resolve("docks/pom.xml"), "<project><artifactId>docks</artifactId></project>");
        SampleProjects.write(root.resolve("docks/src/main/java/share/Dock.java"), "package share; class Dock {}");
        SampleProjects.write(root.resolve("docks/src/test/java/share/DockTest.java"), "package share; class DockTest {}");
        aggregator(root.resolve("parts"), "bikes");
        SampleProjects.write(root.resolve("parts/bikes/pom.xml"), "<project><artifactId>bikes</artifactId></project>");
        SampleProjects.write(root.resolve("parts/bikes/src/main/java/share/Bike.java"), "package share; class Bike {}");
        SampleProjects.write(root.resolve("bom/pom.xml"), "<project><artifactId>bom</artifactId><packaging>pom</packaging></project>");
    }

    @Test
    void theModulesWithMainSources_followNestedAggregators_inTheOrderListed() {
        List<CodeModule> modules = CodeModule.below(root);

        assertEquals(List.of("docks", "parts/bikes"), modules.stream().map(CodeModule::path).toList());
        assertEquals(root.resolve("parts/bikes/src/main/java"), modules.get(1).sources());
        assertEquals(root.resolve("parts/bikes/target"), modules.get(1).buildDirectory());
        assertTrue(modules.get(0).hasTests());
        assertFalse(modules.get(1).hasTests());
    }

    @Test
    void aProjectOfOneModule_hasNone() {
        assertEquals(List.of(), CodeModule.below(root.resolve("docks")));
    }

    @Test
    void theLayoutOfTheRoot_holdsEveryModulesFolders_andKeepsItsResultsAtTheRoot() {
        ProjectLayout layout = ProjectLayout.of(root);

        assertEquals(List.of(root.resolve("docks/src/main/java"), root.resolve("parts/bikes/src/main/java")), layout.sourceRoots());
        assertEquals(root.resolve("target/changeling/results.json"), layout.resultsFile());
        assertEquals(List.of("docks/src/main/java/share/Dock.java", "parts/bikes/src/main/java/share/Bike.java"),
                layout.mainSources().stream().map(layout::relative).toList());
        ProjectLayout bikes = layout.module(CodeModule.below(root).get(1));
        assertEquals(root, bikes.root());
        assertEquals(root.resolve("parts/bikes/target/changeling"), bikes.changelingDirectory());
    }

    @Test
    void aModuleIsNamedByItsPathFromTheRoot_withOrWithoutDotAndSlash() {
        assertEquals("parts/bikes", CodeModule.named(root, "./parts/bikes/").path());
    }

    @Test
    void anUnknownModule_isAUsageError_listingTheModules() {
        UserError error = assertThrows(UserError.class, () -> CodeModule.named(root, "bikes"));

        assertEquals(ExitCode.USAGE, error.exitCode());
        assertEquals("--module: " + root + " has no module 'bikes'; its modules: docks, parts/bikes", error.getMessage());
    }

    private static void aggregator(Path at, String... modules) {
        StringBuilder listed = new StringBuilder();
        for (String module : modules) {
            listed.append("<module>").append(module).append("</module>");
        }
        SampleProjects.write(at.resolve("pom.xml"), "<project><modelVersion>4.0.0</modelVersion><packaging>pom</packaging>"
                + "<modules>" + listed + "</modules></project>");
    }
}
