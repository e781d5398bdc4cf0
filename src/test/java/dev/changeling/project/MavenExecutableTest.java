package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

@DisabledOnOs(OS.WINDOWS)
class MavenExecutableTest {

    @TempDir
    Path folder;

    @Test
    void takesTheNamedOne_first() throws IOException {
        Path named = executable(folder.resolve("custom/mvn"));
        executable(folder.resolve("home/bin/mvn"));

        assertEquals(named, MavenExecutable.find(Optional.of(named), Map.of("MAVEN_HOME", folder.resolve("home").toString())));
    }

    @Test
    void takesMavenHome_beforePath() throws IOException {
        Path inHome = executable(folder.resolve("home/bin/mvn"));
        executable(folder.resolve("path/mvn"));

        assertEquals(inHome, MavenExecutable.find(Optional.empty(),
                Map.of("MAVEN_HOME", folder.resolve("home").toString(), "PATH", folder.resolve("path").toString())));
    }

    @Test
    void takesTheFirstOnPath_thatIsExecutable() throws IOException {
        Path notExecutable = folder.resolve("one/mvn");
        Files.createDirectories(notExecutable.getParent());
        Files.writeString(notExecutable, "");
        Path second = executable(folder.resolve("two/mvn"));
        String path = folder.resolve("one") + File.pathSeparator + folder.resolve("two");

        assertEquals(second, MavenExecutable.find(Optional.empty(), Map.of("PATH", path)));
    }

    @Test
    void namedButMissing_isAUserError_namingIt() {
        UserError error = assertThrows(UserError.class,
                () -> MavenExecutable.find(Optional.of(folder.resolve("nope/mvn")), Map.of()));
        assertTrue(error.getMessage().contains("nope/mvn"), error.getMessage());
    }

    @Test
    void nowhere_isAUserError_sayingWhatToDo() {
        UserError error = assertThrows(UserError.class,
                () -> MavenExecutable.find(Optional.empty(), Map.of("PATH", folder.toString())));
        assertTrue(error.getMessage().startsWith("mvn not found on PATH"), error.getMessage());
        assertTrue(error.getMessage().contains("install Maven"), error.getMessage());
    }

    private static Path executable(Path file) throws IOException {
        Files.createDirectories(file.getParent());
        Files.writeString(file, "#!/bin/sh\n");
        assertTrue(file.toFile().setExecutable(true));
        return file.toAbsolutePath().normalize();
    }
}
