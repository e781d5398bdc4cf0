package dev.changeling.review;

import dev.changeling.support.GitFixture;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class TriageMarksTest {

    static final String FP_A = "a".repeat(64);
    static final String FP_B = "b".repeat(64);
    static final Instant NOON = Instant.parse("2025-03-14T12:00:00Z");

    @TempDir
    Path root;

    TriageMarks open() {
        return TriageMarks.open(root, Clock.fixed(NOON, ZoneOffset.UTC));
    }

    Path file() {
        return TriageMarks.in(root);
    }

    @Nested
    class Recording {

        @Test
        void eachDecisionIsOnDiskBeforeTheCallReturns() {
            TriageMarks marks = open();
            marks.mark(FP_A, TriageMarks.Kind.NEEDS_TEST, "boundary of the spring tide");

            // A second reader, as after a crash, sees the decision.
            assertEquals(new TriageMarks.Mark(TriageMarks.Kind.NEEDS_TEST, NOON, "boundary of the spring tide"),
                    open().get(FP_A).orElseThrow());
            marks.mark(FP_B, TriageMarks.Kind.FIXED, null);
            assertEquals(2, open().all().size());
        }

        @Test
        void writesReadableJsonWithTheMarkWordTimeAndNote() throws IOException {
            open().mark(FP_A, TriageMarks.Kind.NEEDS_TEST, "  add a test at level 0  ");
            open().mark(FP_B, TriageMarks.Kind.FIXED, " ");

            JsonNode json = new ObjectMapper().readTree(file().toFile());
            assertEquals(1, json.get("format").asInt());
            assertEquals("needs-test", json.get("marks").get(FP_A).get("mark").asText());
            assertEquals("2025-03-14T12:00:00Z", json.get("marks").get(FP_A).get("at").asText());
            assertEquals("add a test at level 0", json.get("marks").get(FP_A).get("note").asText());
            assertEquals("fixed", json.get("marks").get(FP_B).get("mark").asText());
            assertFalse(json.get("marks").get(FP_B).has("note"));
        }

        @Test
        void laterDecisionReplacesTheEarlierAndClearForgetsIt() {
            TriageMarks marks = open();
            marks.mark(FP_A, TriageMarks.Kind.NEEDS_TEST, null);
            marks.mark(FP_A, TriageMarks.Kind.FIXED, "test added");

            assertEquals(TriageMarks.Kind.FIXED, open().get(FP_A).orElseThrow().kind());
            assertTrue(marks.clear(FP_A));
            assertFalse(marks.clear(FP_A));
            assertTrue(open().all().isEmpty());
        }

        @Test
        void localFolderIsKeptOutOfGit() {
            GitFixture repo = GitFixture.init(root);
            open().mark(FP_A, TriageMarks.Kind.NEEDS_TEST, null);

            assertEquals("local/\n", repo.read(".changeling/.gitignore"));
            // Reference: git's own answer whether it ignores the file.
            assertEquals(".changeling/local/triage.json",
                    repo.git("check-ignore", ".changeling/local/triage.json").strip());
            assertEquals(List.of("?? .changeling/"), repo.git("status", "--porcelain").lines().toList());
        }
    }

    @Test
    void handMadeFolderWithoutIgnoreFileGetsOneBeforeLocalStateIsWritten() throws IOException {
        Files.createDirectories(root.resolve(".changeling"));
        open().mark(FP_A, TriageMarks.Kind.FIXED, null);

        assertEquals("local/\n", Files.readString(root.resolve(".changeling/.gitignore")));
    }

    @Nested
    class Refusing {

        void writeFile(String text) throws IOException {
            Files.createDirectories(file().getParent());
            Files.writeString(file(), text);
        }

        @Test
        void unreadableFileIsReportedAndLeftAsItWas() throws IOException {
            writeFile("{\"format\": 1, \"marks\": {");
            byte[] before = Files.readAllBytes(file());

            UserError error = assertThrows(UserError.class, TriageMarksTest.this::open);
            assertTrue(error.getMessage().startsWith(".changeling/local/triage.json: cannot read the triage marks ("),
                    error.getMessage());
            assertArrayEquals(before, Files.readAllBytes(file()));
        }

        @Test
        void unknownMarkOrTimeIsNamed() throws IOException {
            writeFile("{\"format\":1,\"marks\":{\"" + FP_A + "\":{\"mark\":\"maybe\",\"at\":\"2025-03-14T12:00:00Z\"}}}");
            assertTrue(assertThrows(UserError.class, TriageMarksTest.this::open).getMessage()
                    .contains("the mark of " + FP_A + " is not one of needs-test, fixed"));
            writeFile("{\"format\":1,\"marks\":{\"" + FP_A + "\":{\"mark\":\"fixed\",\"at\":\"yesterday\"}}}");
            assertTrue(assertThrows(UserError.class, TriageMarksTest.this::open).getMessage()
                    .contains("has no readable time ('yesterday')"));
        }

        @Test
        void otherFormatIsNamed() throws IOException {
            writeFile("{\"format\":7,\"marks\":{}}");
            assertTrue(assertThrows(UserError.class, TriageMarksTest.this::open).getMessage()
                    .contains("triage marks of format 7, expected 1"));
        }

        @Test
        void fileChangedByAnotherCommandIsNotOverwritten() throws IOException {
            TriageMarks first = open();
            TriageMarks second = open();
            first.mark(FP_A, TriageMarks.Kind.NEEDS_TEST, null);
            byte[] afterFirst = Files.readAllBytes(file());

            UserError error = assertThrows(UserError.class, () -> second.mark(FP_B, TriageMarks.Kind.FIXED, null));
            assertTrue(error.getMessage().contains("changed on disk since it was read"), error.getMessage());
            assertArrayEquals(afterFirst, Files.readAllBytes(file()));
            assertTrue(second.get(FP_B).isEmpty(), "a decision that was not written is not kept either");
        }
    }
}
