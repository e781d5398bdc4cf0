package dev.changeling.project;

import dev.changeling.Text;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/** The binary names of the classes compiled into a folder, such as {@code demo.Calc$Inner}. */
final class ClassNames {

    private ClassNames() {
    }

    /** Sorted; leaves out module and package descriptors and everything under META-INF (multi-release copies). */
    static List<String> below(Path classes) {
        if (!Files.isDirectory(classes)) {
            return List.of();
        }
        try (Stream<Path> walk = Files.walk(classes)) {
            return walk.filter(Files::isRegularFile)
                    .map(file -> Text.relative(classes, file))
                    .filter(relative -> relative.endsWith(".class"))
                    .filter(relative -> !relative.startsWith("META-INF/"))
                    .map(relative -> relative.substring(0, relative.length() - ".class".length()))
                    .filter(relative -> !relative.endsWith("module-info") && !relative.endsWith("package-info"))
                    .map(relative -> relative.replace('/', '.'))
                    .sorted()
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
