package dev.changeling.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReactorTest {

    @TempDir
    Path folder;

    @Test
    void walksUp_toTheOutermostAggregatorListingTheModule() throws IOException {
        aggregator(folder, "parts");
        aggregator(folder.resolve("parts"), "b");
        Files.createDirectories(folder.resolve("parts/b"));

        assertEquals(Optional.of(new Reactor(folder, "parts/b")), Reactor.around(folder.resolve("parts/b")));
    }

    @Test
    void stopsAtAPomThatDoesNotListTheFolderBelow() throws IOException {
        aggregator(folder, "elsewhere");
        aggregator(folder.resolve("parts"), "b");
        Files.createDirectories(folder.resolve("parts/b"));

        assertEquals(Optional.of(new Reactor(folder.resolve("parts"), "b")), Reactor.around(folder.resolve("parts/b")));
    }

    @Test
    void nothing_forAStandAloneProject() throws IOException {
        Files.createDirectories(folder.resolve("alone"));

        assertEquals(Optional.empty(), Reactor.around(folder.resolve("alone")));
    }

    private static void aggregator(Path at, String module) throws IOException {
        Files.createDirectories(at);
        Files.writeString(at.resolve("pom.xml"), "<project><modelVersion>4.0.0</modelVersion><packaging>pom</packaging>"
                + "<modules><module>" + module + "</module></modules></project>");
    }
}
