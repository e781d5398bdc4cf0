package dev.changeling.review;

import dev.changeling.AtomicFiles;
import dev.changeling.Text;
import dev.changeling.UserError;
import dev.changeling.mutant.Suppressions;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Adds a rule to the end of the project's suppressions file, keeping every line already there. */
public final class SuppressionsFile {

    private static final String HEADER = "# Mutants not made in this project: OPERATOR text|in GLOB -- REASON"
            + " (see Changeling's docs/suppressions-format.md)";

    private SuppressionsFile() {
    }

    /** Where a project keeps its rules. */
    public static Path in(Path projectRoot) {
        return projectRoot.resolve(Suppressions.RELATIVE_PATH);
    }

    /**
     * Appends the rule as the file's last line, making the file (with a comment saying what it holds) when there is
     * none; written atomically, and only when the whole file then reads as rules, one more than before.
     *
     * @throws UserError when the file cannot be read or written, or the file or the rule is not in the rules' syntax
     */
    public static void append(Path projectRoot, String rule) {
        Path file = in(projectRoot);
        String before = read(projectRoot, file);
        String lineEnd = before.contains("\r\n") ? "\r\n" : "\n";
        String after = (before.isEmpty() ? HEADER + lineEnd : before.endsWith("\n") ? before : before + lineEnd)
                + rule.strip() + lineEnd;
        String shown = Text.relative(projectRoot, file);
        int rulesBefore = Suppressions.parse(before.lines().toList(), shown).size();
        List<String> lines = after.lines().toList();
        if (Suppressions.parse(lines, shown).size() != rulesBefore + 1) {
            throw new UserError(shown + ":" + lines.size() + ": '" + rule.strip() + "' is not one rule; nothing was written");
        }
        try {
            ChangelingFolder.ensure(projectRoot);
            AtomicFiles.writeString(file, after);
        } catch (IOException e) {
            throw new UserError(shown + ": cannot write (" + e.getMessage() + "); the file on disk is unchanged");
        }
    }

    private static String read(Path projectRoot, Path file) {
        if (!Files.exists(file)) {
            return "";
        }
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UserError(Text.relative(projectRoot, file) + ": cannot read (" + e.getMessage()
                    + "); check its permissions; nothing was written");
        }
    }
}
