package dev.changeling.review.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** docs/triage.md must name the keys the loop takes, so that the page cannot drift from the code. */
class TriageDocsTest {

    static String doc() throws IOException {
        return Files.readString(Path.of("docs/triage.md"));
    }

    @Test
    void keysTableHasARowForEveryChoiceAndNoOther() throws IOException {
        List<String> rows = doc().lines().filter(line -> line.matches("\\| `.` \\|.*")).toList();

        assertEquals(Choice.values().length, rows.size(), String.join("\n", rows));
        for (Choice choice : Choice.values()) {
            assertTrue(rows.stream().anyMatch(row -> row.startsWith("| `" + choice.key() + "` | " + choice.label() + " |")),
                    "no row for " + choice.key() + " " + choice.label());
        }
    }

    @Test
    void suppressionsPageShowsTheProposalPromptAsTriageShowsIt() throws IOException {
        String page = Files.readString(Path.of("docs/suppressions-format.md"));

        assertTrue(page.contains("\n" + RuleOffer.prompt().stripTrailing() + "\n"), RuleOffer.prompt());
        assertTrue(doc().contains("**`" + RuleOffer.ADD + "`** adds") && doc().contains("**`" + RuleOffer.NOT_NOW + "`** leaves"));
    }

    @Test
    void examplePromptIsTheOneTheLoopShows() throws IOException {
        assertTrue(doc().contains("\n" + Choice.menu() + " >\n"), Choice.menu());
    }
}
