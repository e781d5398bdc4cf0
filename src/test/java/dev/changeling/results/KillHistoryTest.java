package dev.changeling.results;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The operators' kill history a full run leaves for budgeted runs: what it counts, when it is left, and its file. */
class KillHistoryTest {

    @TempDir
    Path folder;

    private static RunResults fullRun(List<MutantResult> mutants) {
        return ResultsForTests.run(mutants, false, mutants.size());
    }

    private static final List<MutantResult> MUTANTS = List.of(
            ResultsForTests.result("a1", "Till.java", "relational-subset", 1, Verdict.KILLED),
            ResultsForTests.result("a2", "Till.java", "relational-subset", 1, Verdict.SURVIVED),
            ResultsForTests.result("a3", "Till.java", "relational-subset", 1, Verdict.TIMED_OUT),
            ResultsForTests.result("a4", "Till.java", "relational-subset", 1, Verdict.STILLBORN),
            ResultsForTests.result("b1", "Till.java", "arithmetic-swap", 1, Verdict.UNREACHED),
            ResultsForTests.result("c1", "Till.java", "statement-removal", 1, Verdict.SKIPPED),
            ResultsForTests.result("d1", "Till.java", "condition-negation", 2, Verdict.KILLED));

    @Test
    void countsTheFirstOrderMutantsInTheScore_byOperator_detectedAsTheScoreDoes() {
        KillHistory history = KillHistory.of(fullRun(MUTANTS)).orElseThrow();

        assertEquals(Map.of("relational-subset", new KillHistory.Kills(2, 3), "arithmetic-swap", new KillHistory.Kills(0, 1)),
                history.operators());
        assertEquals(Map.of("relational-subset", 2.0 / 3, "arithmetic-swap", 0.0), history.ratios());
    }

    @Test
    void onlyACompleteRunOfTheWholeProject_unsampled_leavesOne() {
        RunResults full = fullRun(MUTANTS);
        RunSettings scoped = new RunSettings("/tmp/shop", List.of("relational-subset"), List.of(1), "method", 1L, false,
                7, "uncommitted changes", 1, 2.0, 1000L, List.of(), List.of(), List.of(), null, null, null, 500, false, 1,
                false, null);
        RunResults ofAChange = new RunResults(RunResults.FORMAT, true, scoped, List.of(), Map.of(), MUTANTS, List.of(), Map.of());
        RunResults partial = new RunResults(RunResults.FORMAT, false, full.settings(), List.of(), Map.of(), MUTANTS, List.of(),
                Map.of());

        assertTrue(KillHistory.of(full).isPresent());
        assertEquals(Optional.empty(), KillHistory.of(ofAChange));
        assertEquals(Optional.empty(), KillHistory.of(ResultsForTests.run(MUTANTS, true, 70)));
        assertEquals(Optional.empty(), KillHistory.of(partial));
    }

    @Test
    void readsBackWhatItWrote_andNoFileIsNoHistory() throws IOException {
        Path file = folder.resolve("target/changeling/kill-history.json");
        assertEquals(Optional.empty(), KillHistory.read(file));

        KillHistory history = KillHistory.of(fullRun(MUTANTS)).orElseThrow();
        history.write(file);

        assertEquals(Optional.of(history), KillHistory.read(file));
        assertTrue(Files.readString(file).contains("\"relational-subset\" : {\n      \"detected\" : 2,\n      \"counted\" : 3"),
                Files.readString(file));
    }

    @Test
    void aBrokenFile_orAnotherFormat_isOneLineWithTheFileAndWhatToDo() throws IOException {
        Path file = folder.resolve("kill-history.json");
        for (String text : List.of("{\"format\": 1, \"operators\": ", "{\"format\": 9, \"operators\": {}}")) {
            Files.writeString(file, text);
            UserError error = assertThrows(UserError.class, () -> KillHistory.read(file), text);
            assertTrue(error.getMessage().startsWith(file + ": "), error.getMessage());
            assertTrue(error.getMessage().endsWith("delete it, or run 'changeling run' on the whole project to write it again"),
                    error.getMessage());
            assertEquals(1, error.getMessage().lines().count(), error.getMessage());
        }
    }
}
