package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ClassNamesTest {

    @TempDir
    Path classes;

    @Test
    void listsBinaryNames_sorted_withNestedClasses() throws IOException {
        touch("demo/Calc.class", "demo/Calc$Inner.class", "demo/sub/Util.class", "Top.class", "demo/notes.txt");

        assertEquals(List.of("Top", "demo.Calc", "demo.Calc$Inner", "demo.sub.Util"), ClassNames.below(classes));
    }

    @Test
    void leavesOutDescriptors_andMultiReleaseCopies() throws IOException {
        touch("module-info.class", "demo/package-info.class", "META-INF/versions/11/demo/Calc.class", "demo/Calc.class");

        assertEquals(List.of("demo.Calc"), ClassNames.below(classes));
    }

    @Test
    void nothing_whenTheFolderIsMissing() {
        assertEquals(List.of(), ClassNames.below(classes.resolve("absent")));
    }

    private void touch(String... files) throws IOException {
        for (String file : files) {
            Path path = classes.resolve(file);
            Files.createDirectories(path.getParent());
            Files.write(path, new byte[0]);
        }
    }
}
