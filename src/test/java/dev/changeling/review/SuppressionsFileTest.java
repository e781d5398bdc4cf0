package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import dev.changeling.mutant.Suppressions;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SuppressionsFileTest {

    static final String RULE = "statement-removal text tally.count(*); -- marked equivalent 3 times (ids 11111111, 22222222, 33333333)";

    @TempDir
    Path root;

    Path file() {
        return root.resolve(Suppressions.RELATIVE_PATH);
    }

    @Test
    void appendedRule_comesLast_andEveryEarlierLineStays() throws IOException {
        List<String> earlier = List.of("# the harbour's rules", "", "* in audit(*) -- checked by the compliance suite");
        Files.createDirectories(file().getParent());
        Files.writeString(file(), String.join("\n", earlier));

        SuppressionsFile.append(root, RULE);

        List<String> lines = Files.readAllLines(file());
        assertEquals(earlier, lines.subList(0, 3));
        assertEquals(List.of(RULE), lines.subList(3, lines.size()));
        Suppressions read = Suppressions.load(root);
        assertEquals(2, read.size());
        assertTrue(read.leavesOut("statement-removal", "tally.count(\"dusk\");", "dusk()"));
        assertTrue(read.leavesOut("negation-removal", "!open", "audit(int)"));
    }

    @Test
    void withoutAFile_makesItWithACommentSayingWhatItHolds() throws IOException {
        SuppressionsFile.append(root, RULE);

        List<String> lines = Files.readAllLines(file());
        assertEquals(2, lines.size());
        assertTrue(lines.get(0).startsWith("# "), lines.get(0));
        assertEquals(RULE, lines.get(1));
        assertEquals(1, Suppressions.load(root).size());
        assertTrue(Files.exists(root.resolve(".changeling/.gitignore")), "the folder is made as the equivalents list makes it");
    }

    @Test
    void windowsLineEnds_areKept() throws IOException {
        Files.createDirectories(file().getParent());
        Files.writeString(file(), "* in audit(*) -- checked by the compliance suite\r\n");

        SuppressionsFile.append(root, RULE);

        assertEquals("* in audit(*) -- checked by the compliance suite\r\n" + RULE + "\r\n", Files.readString(file()));
    }

    @Test
    void aLineThatIsNotARule_isRefused_andNothingIsWritten() {
        UserError refused = assertThrows(UserError.class, () -> SuppressionsFile.append(root, "statement-removal tally.count(*);"));

        assertTrue(refused.getMessage().startsWith(".changeling/suppressions.txt:2: not a rule"), refused.getMessage());
        assertFalse(Files.exists(file()));
    }

    @Test
    void aFileThatIsNotRulesAlready_isLeftAsItIs() throws IOException {
        Files.createDirectories(file().getParent());
        Files.writeString(file(), "drop the counters\n");

        assertThrows(UserError.class, () -> SuppressionsFile.append(root, RULE));

        assertEquals("drop the counters\n", Files.readString(file()));
    }
}
