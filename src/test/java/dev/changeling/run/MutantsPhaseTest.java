package dev.changeling.run;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The "mutants: N in M files" phase line counts the files that hold mutants. */
class MutantsPhaseTest {

    @Test
    void nineMutantsOfOneChangedFile_areInOneFile_notInEveryParsedFile() {
        // Regression: a run scoped to a change in one file reported "9 in 4 files", counting every parsed file.
        assertEquals("in 1 file", MutationRun.inFiles(List.of("src/A.java", "src/A.java", "src/A.java")));
    }

    @Test
    void mutantsOfTwoFiles_areInTwoFiles() {
        assertEquals("in 2 files", MutationRun.inFiles(List.of("src/A.java", "src/B.java", "src/A.java")));
    }

    @Test
    void noMutants_areInNoFiles() {
        assertEquals("in 0 files", MutationRun.inFiles(List.of()));
    }
}
