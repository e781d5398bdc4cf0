package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.operator.Operators;
import dev.changeling.source.JavaSources;
import dev.changeling.source.SourceFile;
import dev.changeling.support.Git;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MutantDiffTest {

    private static final String PATH = "src/main/java/farm/Trough.java";

    @TempDir
    Path folder;

    private static String body(String newline) {
        return String.join(newline,
                "package farm;",
                "",
                "class Trough {",
                "    int refill(int level, int max) {",
                "        if (level < max / 2) {",
                "            return max;",
                "        }",
                "        return level;",
                "    }",
                "",
                "    boolean dry(int level) {",
                "        return level <= 0;",
                "    }",
                "}");
    }

    /** Writes the file, commits it, and checks that git accepts every mutant's diff against the clean tree. */
    private void assertEveryDiffApplies(String text, List<Integer> orders) throws IOException {
        Path file = folder.resolve(PATH);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text, StandardCharsets.UTF_8);
        Git git = Git.initCommitted(folder);
        git.run("config", "core.autocrlf", "false");
        SourceFile source = SourceFile.of(PATH, text);
        MutantRequest request = new MutantRequest(Operators.all(), orders, HigherOrder.Scope.FILE, 3, point -> true);
        List<Mutant> mutants = Generation.generate(List.of(source), request).mutants();
        assertFalse(mutants.isEmpty());
        Path patch = folder.resolve("../mutant.patch").normalize();
        for (Mutant mutant : mutants) {
            Files.writeString(patch, MutantDiff.unified(mutant, text), StandardCharsets.UTF_8);
            Git.Result check = git.tryRun("apply", "--check", patch.toString());
            assertEquals(0, check.exitCode(), () -> check.output() + "\n" + MutantDiff.unified(mutant, text));
            git.run("apply", patch.toString());
            assertEquals(mutant.apply(text), Files.readString(file, StandardCharsets.UTF_8));
            git.run("checkout", "--", PATH);
        }
    }

    @Test
    void diffsApplyToAnUnixFile() throws IOException {
        assertEveryDiffApplies(body("\n") + "\n", List.of(1));
    }

    @Test
    void diffsApplyToACrlfFile() throws IOException {
        assertEveryDiffApplies(body("\r\n") + "\r\n", List.of(1));
    }

    @Test
    void diffsApplyWhenTheLastLineHasNoNewline() throws IOException {
        assertEveryDiffApplies(body("\n").replace("return level <= 0;\n    }\n}", "return level <= 0; }}"), List.of(1));
    }

    @Test
    void kOrderDiffsWithChangesFarApartApply() throws IOException {
        String spaced = body("\n").replace("    boolean dry", "\n\n\n\n\n\n\n\n    boolean dry") + "\n";
        assertEveryDiffApplies(spaced, List.of(2));
    }

    @Test
    void headerNamesTheProjectRelativePathAndThreeLinesOfContext() {
        String text = body("\n") + "\n";
        Mutant mutant = Mutant.firstOrder(new PointFinder(Operators.defaults())
                .find(JavaSources.parse(SourceFile.of(PATH, text))).get(0));
        String diff = MutantDiff.unified(mutant, text);
        assertTrue(diff.startsWith("--- a/" + PATH + "\n+++ b/" + PATH + "\n@@ -2,7 +2,7 @@\n"), diff);
        assertTrue(diff.contains("-        if (level < max / 2) {\n+        if (level <= max / 2) {\n"), diff);
    }
}
