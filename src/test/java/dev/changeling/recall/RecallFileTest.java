package dev.changeling.recall;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The recall file is trusted only when it is ours and of this version; anything else is set aside, never fatal. */
class RecallFileTest {

    @TempDir
    Path folder;

    final List<String> notices = new ArrayList<>();

    @Test
    void noFileIsAnEmptyRecall_saidNothingAbout() {
        assertEquals(0, Recall.open(folder.resolve(Recall.FILE_NAME), notices::add).size());
        assertEquals(List.of(), notices);
    }

    @Test
    void aTruncatedFile_isSetAsideWithOneLineNamingIt() throws IOException {
        Path file = Files.writeString(folder.resolve(Recall.FILE_NAME), "{\"format\": 1, \"verdicts\": {\"ab");
        assertEquals(0, Recall.open(file, notices::add).size());
        assertEquals(1, notices.size());
        assertTrue(notices.get(0).startsWith(file + ": cannot read it ("), notices.get(0));
        assertTrue(notices.get(0).endsWith("set aside, every mutant runs and it is written again"), notices.get(0));
    }

    @Test
    void aFileOfAnotherVersionOrAnotherProgram_isSetAside() throws IOException {
        Path older = Files.writeString(folder.resolve("older.json"), "{\"format\": 0, \"verdicts\": {}, \"comparisons\": {}}");
        Path foreign = Files.writeString(folder.resolve("foreign.json"), "{\"name\": \"tide tables\"}");
        assertEquals(0, Recall.open(older, notices::add).size());
        assertEquals(0, Recall.open(foreign, notices::add).size());
        assertEquals(2, notices.size(), notices::toString);
        assertTrue(notices.get(0).contains("not a file of this version (format 0, not " + Recall.FORMAT + ")"), notices.get(0));
    }

    @Test
    void savingWritesAFileTheNextRunReads_andLeavesNoTemporaryFileBeside() throws IOException {
        Path file = folder.resolve("target/changeling").resolve(Recall.FILE_NAME);
        Recall.open(file, notices::add).save(path -> true, notices::add);
        assertEquals(0, Recall.open(file, notices::add).size());
        assertEquals(List.of(), notices);
        try (var files = Files.list(file.getParent())) {
            assertEquals(List.of(file), files.toList());
        }
    }
}
