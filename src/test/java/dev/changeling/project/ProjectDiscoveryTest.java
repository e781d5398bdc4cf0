package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.jar.JarFile;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * Discovery of tiny projects written into temporary folders. The nested classes tagged "maven" run the real
 * mvn (from PATH or MAVEN_HOME) and, on a machine with an empty local repository, download from Maven Central.
 */
@DisabledOnOs(OS.WINDOWS)
class ProjectDiscoveryTest {

    @Nested
    @Tag("maven")
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class JupiterProjectWithoutLauncher {

        Path folder;
        Path root;
        DiscoveredProject project;

        @BeforeAll
        void discover(@TempDir Path temporary) {
            folder = temporary;
            root = SampleProjects.calculator(folder.resolve("calc"), SampleProjects.JUPITER_TEST, "org.junit.jupiter:junit-jupiter:5.10.2");
            project = ProjectDiscovery.discover(root, DiscoveryOptions.defaults());
        }

        // The order Surefire uses and DESIGN.md records: test classes, main classes, then the dependency jars.
        @Test
        void testClasspath_startsWithTestClasses_thenClasses_thenTheJars() {
            List<Path> classpath = project.testClasspath();

            assertEquals(root.resolve("target/test-classes"), classpath.get(0));
            assertEquals(root.resolve("target/classes"), classpath.get(1));
            assertTrue(classpath.stream().skip(2).allMatch(entry -> entry.toString().endsWith(".jar") && Files.isRegularFile(entry)),
                    classpath::toString);
            assertTrue(classpath.stream().anyMatch(entry -> entry.getFileName().toString().equals("junit-jupiter-api-5.10.2.jar")));
        }

        @Test
        void compilesMainAndTestCode() {
            assertTrue(Files.isRegularFile(root.resolve("target/classes/demo/Calc.class")));
            assertTrue(Files.isRegularFile(root.resolve("target/test-classes/demo/CalcTest.class")));
            assertEquals(List.of(root.resolve("target/test-classes")), project.testClassRoots());
        }

        @Test
        void listsTheProductionClasses_withNestedOnes() {
            assertEquals(List.of("demo.Calc", "demo.Calc$Inner"), project.productionClasses());
        }

        @Test
        void compileClasspath_isClassesAndJars_withoutTestClasses() {
            assertEquals(root.resolve("target/classes"), project.compileClasspath().get(0));
            assertFalse(project.compileClasspath().contains(root.resolve("target/test-classes")));
            assertEquals(project.testClasspath().stream().skip(2).filter(jar -> !jar.getFileName().toString().startsWith("junit-platform-launcher")).toList(),
                    project.compileClasspath().stream().skip(1).toList());
        }

        @Test
        void layout_isTheMavenOne() {
            assertEquals(ProjectLayout.of(root), project.layout());
            assertEquals(project.classesDirectory(), root.resolve("target/classes"));
        }

        @Test
        void addsTheLauncherOfTheEnginesVersion() {
            assertEquals("1.10.2", project.junitPlatformVersion());
            Path launcher = onlyJar(project.testClasspath(), "junit-platform-launcher");
            // The version as the JUnit team stamped it into the published jar, not as its file name says.
            assertEquals("1.10.2", implementationVersion(launcher));
            assertEquals(project.testClasspath().size() - 1, project.testClasspath().indexOf(launcher), "added at the end");
            assertTrue(project.junitSetup().contains("junit-platform-launcher 1.10.2"), project.junitSetup());
        }

        @Test
        void theClasspathRunsTheTests_onTheJUnitPlatform() {
            String output = PlatformRun.run(project.testClasspath(), "demo.CalcTest", root, folder.resolve("run"));

            assertTrue(output.contains("found 1, succeeded 1"), output);
            assertTrue(output.contains("launcher 1.10.2, engine API 1.10.2"), output);
        }

        @Test
        void mavensOutput_goesToTheLog_andItsTimeIsMeasured() throws IOException {
            Path log = root.resolve("target/changeling/maven.log");
            assertTrue(Files.readString(log).contains("BUILD SUCCESS"));
            assertTrue(project.mavenTime().compareTo(Duration.ZERO) > 0);
        }

        @Test
        void theNextRun_takesTheLauncherFromTheCache_withoutMvn() {
            Path mustNotRun = failingMaven(folder);
            ExplicitProject sameProject = new ExplicitProject(List.of(root.resolve("src/main/java")), List.of(),
                    root.resolve("target/classes"), root.resolve("target/test-classes"), project.compileClasspath().subList(1, project.compileClasspath().size()));

            DiscoveredProject again = ProjectDiscovery.discover(root,
                    DiscoveryOptions.defaults().withMavenExecutable(mustNotRun).withExplicitProject(sameProject));

            assertEquals(project.testClasspath(), again.testClasspath());
            assertEquals(Duration.ZERO, again.mavenTime());
        }
    }

    @Nested
    @Tag("maven")
    class CompileError {

        @TempDir
        Path folder;

        @Test
        void isAUserError_withMavensFirstError_theLog_andTheCommand() throws IOException {
            Path root = SampleProjects.calculator(folder.resolve("broken"), SampleProjects.JUPITER_TEST, "org.junit.jupiter:junit-jupiter:5.10.2");
            SampleProjects.write(root.resolve("src/main/java/demo/Calc.java"), SampleProjects.CALC.replace("return a + b;", "return a + ;"));

            UserError error = assertThrows(UserError.class, () -> ProjectDiscovery.discover(root, DiscoveryOptions.defaults()));

            String message = error.getMessage();
            Path log = root.resolve("target/changeling/maven.log");
            assertFalse(message.contains("\n"), "one line: " + message);
            assertTrue(message.startsWith("mvn could not compile " + root), message);
            assertTrue(message.contains("Calc.java"), "names the file javac complained about: " + message);
            assertTrue(message.contains("full log: " + log), message);
            assertTrue(message.contains("to reproduce: cd " + root + " && "), message);
            assertTrue(message.contains(" test-compile org.apache.maven.plugins:maven-dependency-plugin:3.8.1:build-classpath "), message);
            assertTrue(Files.readString(log).contains("COMPILATION ERROR"));
        }
    }

    @Nested
    class Aggregator {

        @TempDir
        Path folder;

        @Test
        void isAUserError_namingTheModules_withoutRunningMvn() {
            Path root = SampleProjects.twoModules(folder.resolve("multi"));

            UserError error = assertThrows(UserError.class,
                    () -> ProjectDiscovery.discover(root, DiscoveryOptions.defaults().withMavenExecutable(failingMaven(folder))));

            assertEquals(root + ": this pom.xml only groups the modules a, b; give one module folder, e.g. `changeling run "
                    + root + "/a`", error.getMessage());
        }
    }

    @Nested
    @Tag("maven")
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class ModulesFromTheRoot {

        Path root;
        List<DiscoveredModule> modules;

        @BeforeAll
        void discover(@TempDir Path temporary) {
            root = SampleProjects.twoModules(temporary.resolve("multi"));
            modules = ProjectDiscovery.discoverModules(ProjectLayout.of(root), DiscoveryOptions.defaults(), Optional.empty());
        }

        @Test
        void aModuleWithoutTestsOfItsOwn_isLeftOut() {
            assertEquals(List.of("b"), modules.stream().map(DiscoveredModule::path).toList());
            assertEquals(List.of(), modules.get(0).testedAlsoBy());
        }

        @Test
        void theModuleKeepsItsOwnFolders_andItsPathsFromTheRoot() {
            ProjectLayout layout = modules.get(0).project().layout();
            assertEquals(root, layout.root());
            assertEquals(List.of(root.resolve("b/src/main/java")), layout.sourceRoots());
            assertEquals(root.resolve("b/target"), layout.buildDirectory());
            assertTrue(modules.get(0).project().compileClasspath().contains(root.resolve("a/target/classes")));
            assertEquals(List.of("demo.b.B"), modules.get(0).project().productionClasses());
        }

        @Test
        void oneMvnCall_fromTheRoot_builtEveryModule() throws IOException {
            String log = Files.readString(root.resolve("target/changeling/maven.log"));
            assertTrue(log.contains("Reactor Build Order"), log);
            assertTrue(Files.isRegularFile(root.resolve("a/target/changeling/classpath.txt")));
            assertTrue(modules.get(0).project().build().startsWith("compiled every module and found its test classpath in "),
                    modules.get(0).project().build());
        }
    }

    @Nested
    @Tag("maven")
    @TestInstance(TestInstance.Lifecycle.PER_CLASS)
    class ModuleNeedingASiblingThatIsNotInstalled {

        Path folder;
        Path root;
        DiscoveredProject project;

        @BeforeAll
        void discover(@TempDir Path temporary) {
            folder = temporary;
            root = SampleProjects.twoModules(folder.resolve("multi"));
            project = ProjectDiscovery.discover(root.resolve("b"), DiscoveryOptions.defaults());
        }

        @Test
        void buildsTheSiblingToo_andPutsItsClassesOnTheClasspath() {
            assertEquals(root.resolve("b/target/test-classes"), project.testClasspath().get(0));
            assertEquals(root.resolve("b/target/classes"), project.testClasspath().get(1));
            assertTrue(project.testClasspath().contains(root.resolve("a/target/classes")), project.testClasspath()::toString);
            assertTrue(project.compileClasspath().contains(root.resolve("a/target/classes")));
        }

        @Test
        void theModuleIsTheProject() {
            assertEquals(ProjectLayout.of(root.resolve("b")), project.layout());
            assertEquals(List.of("demo.b.B"), project.productionClasses());
        }

        @Test
        void remembersToBuildFromTheAggregator() {
            assertTrue(Files.isRegularFile(root.resolve("b/target/changeling/maven-reactor.txt")));
        }

        @Test
        void theClasspathRunsTheTests() {
            String output = PlatformRun.run(project.testClasspath(), "demo.b.BTest", root.resolve("b"), folder.resolve("run"));

            assertTrue(output.contains("found 1, succeeded 1"), output);
        }
    }

    @Nested
    @Tag("maven")
    class MismatchedLauncher {

        @TempDir
        Path folder;

        // The engine is declared directly, so Maven's nearest-wins keeps it at 1.10.3 while the launcher stays at 1.9.3.
        @Test
        void isReplaced_byTheLauncherOfTheEnginesVersion() {
            Path root = SampleProjects.calculator(folder.resolve("mixed"), SampleProjects.JUPITER_TEST,
                    "org.junit.jupiter:junit-jupiter:5.10.3", "org.junit.platform:junit-platform-launcher:1.9.3",
                    "org.junit.platform:junit-platform-engine:1.10.3");

            DiscoveredProject project = ProjectDiscovery.discover(root, DiscoveryOptions.defaults());

            assertTrue(project.compileClasspath().stream().anyMatch(jar -> jar.getFileName().toString().equals("junit-platform-launcher-1.9.3.jar")),
                    "the project really has the old launcher: " + project.compileClasspath());
            assertEquals("1.10.3", project.junitPlatformVersion());
            assertEquals("1.10.3", implementationVersion(onlyJar(project.testClasspath(), "junit-platform-launcher")));
            String output = PlatformRun.run(project.testClasspath(), "demo.CalcTest", root, folder.resolve("run"));
            assertTrue(output.contains("found 1, succeeded 1"), output);
            assertTrue(output.contains("launcher 1.10.3"), output);
        }
    }

    @Nested
    @Tag("maven")
    class JUnit4Only {

        @TempDir
        Path folder;

        @Test
        void getsTheVintageEngine_andALauncherOfItsPlatform() {
            Path root = SampleProjects.calculator(folder.resolve("old"), SampleProjects.JUNIT4_TEST, "junit:junit:4.13.2");

            DiscoveredProject project = ProjectDiscovery.discover(root, DiscoveryOptions.defaults());

            assertEquals(JUnitAlignment.PLATFORM_FOR_JUNIT4, project.junitPlatformVersion());
            assertEquals(JUnitAlignment.VINTAGE_FOR_JUNIT4, implementationVersion(onlyJar(project.testClasspath(), "junit-vintage-engine")));
            assertEquals(JUnitAlignment.PLATFORM_FOR_JUNIT4, implementationVersion(onlyJar(project.testClasspath(), "junit-platform-launcher")));
            String output = PlatformRun.run(project.testClasspath(), "demo.CalcTest", root, folder.resolve("run"));
            assertTrue(output.contains("found 1, succeeded 1"), output);
        }
    }

    @Nested
    class GivenByHand {

        @TempDir
        Path folder;

        @Test
        void usesThePathsGiven_inTheWorkersOrder_withoutMvn() throws IOException {
            Path root = Files.createDirectories(folder.resolve("hand"));
            Path classes = Files.createDirectories(root.resolve("out/main"));
            Files.write(Files.createDirectories(classes.resolve("demo")).resolve("Calc.class"), new byte[0]);
            Path testClasses = Files.createDirectories(root.resolve("out/test"));
            Path engine = Files.write(Files.createDirectories(root.resolve("lib")).resolve("junit-platform-engine-1.12.2.jar"), new byte[0]);
            Path launcher = Files.write(root.resolve("lib/junit-platform-launcher-1.12.2.jar"), new byte[0]);
            Path sources = Files.createDirectories(root.resolve("src"));
            ExplicitProject given = new ExplicitProject(List.of(sources), List.of(), classes, testClasses, List.of(engine, launcher));

            DiscoveredProject project = ProjectDiscovery.discover(root,
                    DiscoveryOptions.defaults().withMavenExecutable(failingMaven(folder)).withExplicitProject(given));

            assertEquals(List.of(testClasses, classes, engine, launcher), project.testClasspath());
            assertEquals(List.of(classes, engine, launcher), project.compileClasspath());
            assertEquals(List.of("demo.Calc"), project.productionClasses());
            assertEquals(List.of(sources), project.layout().sourceRoots());
            assertEquals("1.12.2", project.junitPlatformVersion());
            assertEquals(Duration.ZERO, project.mavenTime());
        }

        @Test
        void aMissingPath_isAUserError_namingIt() throws IOException {
            Path root = Files.createDirectories(folder.resolve("hand"));
            Path classes = Files.createDirectories(root.resolve("classes"));
            Path missing = root.resolve("lib/gone-1.0.jar");
            ExplicitProject given = new ExplicitProject(List.of(root), List.of(), classes, classes, List.of(missing));

            UserError error = assertThrows(UserError.class,
                    () -> ProjectDiscovery.discover(root, DiscoveryOptions.defaults().withExplicitProject(given)));

            assertEquals(missing + ": no such file or folder (given as classpath entry); check the path", error.getMessage());
        }

        @Test
        void aMissingSourceFolder_isAUserError_namingIt() throws IOException {
            Path root = Files.createDirectories(folder.resolve("hand"));
            ExplicitProject given = new ExplicitProject(List.of(root.resolve("nope")), List.of(), root, root, List.of());

            UserError error = assertThrows(UserError.class,
                    () -> ProjectDiscovery.discover(root, DiscoveryOptions.defaults().withExplicitProject(given)));

            assertTrue(error.getMessage().startsWith(root.resolve("nope") + ": no such folder (given as source folder)"), error.getMessage());
        }
    }

    @Nested
    class NotAProject {

        @TempDir
        Path folder;

        @Test
        void aFolderWithoutPom_isAUserError() {
            UserError error = assertThrows(UserError.class, () -> ProjectDiscovery.discover(folder, DiscoveryOptions.defaults()));
            assertTrue(error.getMessage().startsWith(folder + ": no pom.xml here"), error.getMessage());
        }

        @Test
        void aMissingFolder_isAUserError() {
            Path missing = folder.resolve("nowhere");
            UserError error = assertThrows(UserError.class, () -> ProjectDiscovery.discover(missing, DiscoveryOptions.defaults()));
            assertTrue(error.getMessage().startsWith(missing + ": no such folder"), error.getMessage());
        }
    }

    /** An mvn that fails loudly if anything runs it, to show that nothing did. */
    private static Path failingMaven(Path folder) {
        Path script = folder.resolve("failing-mvn/mvn");
        SampleProjects.write(script, "#!/bin/sh\necho 'this mvn must not run' >&2\nexit 97\n");
        assertTrue(script.toFile().setExecutable(true));
        return script;
    }

    private static Path onlyJar(List<Path> classpath, String artifact) {
        List<Path> jars = classpath.stream()
                .filter(entry -> JarName.of(entry).map(JarName::artifact).equals(Optional.of(artifact)))
                .toList();
        assertEquals(1, jars.size(), () -> artifact + " in " + classpath);
        return jars.get(0);
    }

    private static String implementationVersion(Path jar) {
        try (JarFile file = new JarFile(jar.toFile())) {
            return file.getManifest().getMainAttributes().getValue("Implementation-Version");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
