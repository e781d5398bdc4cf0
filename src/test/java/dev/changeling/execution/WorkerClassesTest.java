package dev.changeling.execution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.probe.Probe;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WorkerClassesTest {

    @TempDir
    Path folder;

    static Path classesFolder() {
        return TinyProject.codeSource(Probe.class);
    }

    static List<String> files(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            return walk.filter(Files::isRegularFile).map(path -> root.relativize(path).toString().replace('\\', '/')).sorted().toList();
        }
    }

    static void assertOnlyWorkerAndProbe(List<String> files) {
        assertTrue(files.contains("dev/changeling/worker/WorkerMain.class"), files::toString);
        assertTrue(files.contains("dev/changeling/probe/Probe.class"), files::toString);
        assertTrue(files.stream().allMatch(name -> name.startsWith("dev/changeling/worker/") || name.startsWith("dev/changeling/probe/")),
                files::toString);
        assertTrue(files.stream().allMatch(name -> name.endsWith(".class")), files::toString);
    }

    @Nested
    class FromAClassesFolder {

        @Test
        void copiesOnlyTheWorkerAndProbeClasses() throws IOException {
            Path out = WorkerClasses.extract(classesFolder(), folder.resolve("out"));
            assertOnlyWorkerAndProbe(files(out));
        }

        @Test
        void emptiesTheFolderFirst() throws IOException {
            Path out = folder.resolve("out");
            Files.createDirectories(out.resolve("stale"));
            Files.writeString(out.resolve("stale/Old.class"), "x");
            WorkerClasses.extract(classesFolder(), out);
            assertFalse(Files.exists(out.resolve("stale/Old.class")));
        }

        @Test
        void findsTheRunningToolsOwnClasses() throws IOException {
            assertOnlyWorkerAndProbe(files(WorkerClasses.extract(folder.resolve("own"))));
        }
    }

    @Nested
    class FromAJar {

        @Test
        void copiesOnlyTheWorkerAndProbeClasses_leavingTheRestOfTheJar() throws IOException {
            Path jar = folder.resolve("tool.jar");
            Path classes = classesFolder();
            try (OutputStream file = Files.newOutputStream(jar); ZipOutputStream zip = new ZipOutputStream(file)) {
                for (String name : files(classes)) {
                    zip.putNextEntry(new ZipEntry(name));
                    zip.write(Files.readAllBytes(classes.resolve(name)));
                    zip.closeEntry();
                }
                zip.putNextEntry(new ZipEntry("picocli/CommandLine.class"));
                zip.write(new byte[] {1});
                zip.closeEntry();
            }
            List<String> extracted = files(WorkerClasses.extract(jar, folder.resolve("out")));
            assertOnlyWorkerAndProbe(extracted);
            assertEquals(files(classes).stream().filter(name -> name.startsWith("dev/changeling/worker/")
                    || name.startsWith("dev/changeling/probe/")).filter(name -> name.endsWith(".class")).toList(), extracted);
        }
    }
}
