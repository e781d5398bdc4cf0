package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class EquivalentsFormatTest {

    static final String FP_A = "a".repeat(64);
    static final String FP_B = "0123456789abcdef".repeat(4);

    static final String EXAMPLE = FP_B + " | src/main/java/org/tidepool/Tides.java | Tides#clamp(int,int,int) | relational-subset"
            + " | level<low → level<=low | at level == low both branches return low";

    static EquivalentEntry entry(String fingerprint, String file, String reason) {
        return new EquivalentEntry(fingerprint, file, "Tides", "clamp(int,int,int)", "relational-subset",
                "level<low", "level<=low", reason);
    }

    static EquivalentsFormat.Parsed parse(String text) {
        return EquivalentsFormat.parse(text.getBytes(StandardCharsets.UTF_8), "list.txt");
    }

    static String errorOf(String text) {
        return assertThrows(UserError.class, () -> parse(text)).getMessage();
    }

    @Nested
    class Reading {

        @Test
        void readsTheDocumentedExample() {
            EquivalentEntry read = parse("# header\n" + EXAMPLE + "\n").entries().get(0);

            assertEquals(new EquivalentEntry(FP_B, "src/main/java/org/tidepool/Tides.java", "Tides", "clamp(int,int,int)",
                    "relational-subset", "level<low", "level<=low", "at level == low both branches return low"), read);
        }

        @Test
        void theExampleInTheFormatDocumentReadsAndWritesBackUnchanged() throws java.io.IOException {
            String doc = java.nio.file.Files.readString(java.nio.file.Path.of("docs/equivalents-format.md"));
            int start = doc.indexOf("```\n") + 4;
            String example = doc.substring(start, doc.indexOf("```", start));
            EquivalentsFormat.Parsed parsed = parse(example);

            assertEquals(2, parsed.entries().size());
            assertEquals(EquivalentsFormat.DEFAULT_HEADER, parsed.header());
            assertEquals(example, EquivalentsFormat.render(parsed.header(), parsed.entries()));
        }

        @Test
        void keepsTheHeaderAsWritten() {
            EquivalentsFormat.Parsed parsed = parse("# ours\n# and a note of the team\n\n" + EXAMPLE + "\n");

            assertEquals(List.of("# ours", "# and a note of the team"), parsed.header());
            assertEquals(1, parsed.entries().size());
        }

        @Test
        void acceptsWindowsLineEndsAByteOrderMarkAndNoFinalLineBreak() {
            byte[] bom = {(byte) 0xef, (byte) 0xbb, (byte) 0xbf};
            byte[] text = ("# h\r\n" + EXAMPLE).getBytes(StandardCharsets.UTF_8);
            byte[] all = new byte[bom.length + text.length];
            System.arraycopy(bom, 0, all, 0, bom.length);
            System.arraycopy(text, 0, all, bom.length, text.length);

            EquivalentsFormat.Parsed parsed = EquivalentsFormat.parse(all, "list.txt");
            assertEquals(List.of("# h"), parsed.header());
            assertEquals("at level == low both branches return low", parsed.entries().get(0).reason());
        }

        @Test
        void identicalDuplicateLinesFromAMergeCountOnce() {
            assertEquals(1, parse(EXAMPLE + "\n" + EXAMPLE + "\n").entries().size());
        }

        @Test
        void upperCaseFingerprintIsTakenAsLowerCase() {
            assertEquals(FP_B, parse(EXAMPLE.replace(FP_B, FP_B.toUpperCase())).entries().get(0).fingerprint());
        }

        @Test
        void emptyReasonIsAllowed() {
            String line = EXAMPLE.substring(0, EXAMPLE.lastIndexOf('|') + 1);
            assertEquals("", parse(line + "\n").entries().get(0).reason());
        }
    }

    @Nested
    class Writing {

        @Test
        void writesTheDefaultHeaderThenEntriesSortedByFileMemberAndFingerprint() {
            String text = EquivalentsFormat.render(List.of(), List.of(
                    entry(FP_A, "src/b/Z.java", "second"), entry(FP_B, "src/a/Y.java", "first")));
            List<String> lines = text.lines().toList();

            assertEquals(EquivalentsFormat.DEFAULT_HEADER, lines.subList(0, 2));
            assertTrue(lines.get(2).startsWith(FP_B + " | src/a/Y.java"), lines.get(2));
            assertTrue(lines.get(3).startsWith(FP_A + " | src/b/Z.java"), lines.get(3));
            assertEquals(4, lines.size());
        }

        @Test
        void writesTheDocumentedExample() {
            EquivalentEntry example = parse(EXAMPLE).entries().get(0);
            assertEquals(EXAMPLE, EquivalentsFormat.line(example));
        }

        @Test
        void awkwardTextStaysOnOneLineAndReadsBack() {
            EquivalentEntry awkward = new EquivalentEntry(FP_A, "src/main/java/We|rd\\Name.java", "Outer.Inner",
                    "apply(java.util.function.Function<A,B>)", "relational-all",
                    "s.equals(\"a|b\\n\") && f.apply(x) → y", "x\t\u0001\u2028🌊 → z",
                    "one line\nsecond line | with a bar → and an arrow");
            String line = EquivalentsFormat.line(awkward);

            assertEquals(1, line.lines().count(), line);
            // The separator and the reason's own arrow; the arrows inside the code are escaped.
            assertEquals(2, line.chars().filter(c -> c == '→').count(), line);
            assertEquals(List.of(awkward), parse("# h\n" + line + "\n").entries());
        }
    }

    @Nested
    class Mistakes {

        @ParameterizedTest
        @ValueSource(strings = {"<<<<<<< HEAD", "=======", ">>>>>>> feature/vents", "||||||| merged common ancestors"})
        void mergeConflictMarkerIsNamedWithItsLine(String marker) {
            String message = errorOf("# h\n" + EXAMPLE + "\n" + marker + "\n");
            assertTrue(message.startsWith("list.txt:3: unresolved git merge conflict (a line starting with '"
                    + marker.substring(0, 7) + "')"), message);
        }

        @Test
        void missingFieldIsCounted() {
            String message = errorOf(FP_B + " | src/Y.java | Y#m() | relational-subset | a<b → a<=b\n");
            assertEquals("list.txt:1: expected 6 fields (fingerprint | file | type#member | operator | original → mutated"
                    + " | reason), found 5; a '|' inside a field is written \\|", message);
        }

        @Test
        void shortIdIsNotAFingerprint() {
            String message = errorOf(EXAMPLE.replace(FP_B, "01234567"));
            assertTrue(message.startsWith("list.txt:1: '01234567' is not a full fingerprint (64 hexadecimal digits)"), message);
        }

        @Test
        void locationWithoutHashIsRefused() {
            assertTrue(errorOf(EXAMPLE.replace("Tides#clamp", "Tides.clamp")).contains("should read type#member"));
        }

        @Test
        void changeWithoutArrowOrWithTwoIsRefused() {
            assertTrue(errorOf(EXAMPLE.replace("level<low → level<=low", "level<low -> level<=low"))
                    .contains("the change field should read 'original → mutated'"));
            assertTrue(errorOf(EXAMPLE.replace("level<low → level<=low", "a → b → c"))
                    .contains("the change field should read 'original → mutated'"));
        }

        @Test
        void unknownEscapeIsNamedWithItsField() {
            String message = errorOf(EXAMPLE.replace("return low", "return \\low"));
            assertTrue(message.startsWith("list.txt:1: field 6 has the unknown escape '\\l'"), message);
            assertTrue(errorOf(EXAMPLE.replace("level<low →", "level\\u12<low →")).contains("field 5 has '\\u' without four hex digits"));
        }

        @Test
        void sameFingerprintWithOtherTextIsRefused() {
            String message = errorOf(EXAMPLE + "\n" + EXAMPLE.replace("return low", "return it") + "\n");
            assertEquals("list.txt:2: mutant 01234567 is also listed on line 1 with other text; keep one of the two lines", message);
        }

        @Test
        void commentBelowTheEntriesIsRefusedRatherThanDropped() {
            String message = errorOf("# h\n" + EXAMPLE + "\n# a late note\n");
            assertTrue(message.startsWith("list.txt:3: a comment below the entries"), message);
        }

        @Test
        void textThatIsNotUtf8IsNamedWithItsLine() {
            byte[] latin1 = ("# h\n" + EXAMPLE.replace("both", "böth") + "\n").getBytes(StandardCharsets.ISO_8859_1);
            UserError error = assertThrows(UserError.class, () -> EquivalentsFormat.parse(latin1, "list.txt"));
            assertEquals("list.txt:2: not UTF-8 text; save the file as UTF-8", error.getMessage());
        }

        @Test
        void emptyFileOrOperatorIsRefused() {
            assertTrue(errorOf(EXAMPLE.replace("src/main/java/org/tidepool/Tides.java", " ")).contains("the file field is empty"));
            assertTrue(errorOf(EXAMPLE.replace("relational-subset", "")).contains("the operator field is empty"));
        }

        @Test
        void correctLineAfterAnEmptyOneKeepsItsOwnNumber() {
            String message = errorOf("# h\n\n" + EXAMPLE + "\n\nnot an entry\n");
            assertFalse(message.isEmpty());
            assertTrue(message.startsWith("list.txt:5: "), message);
        }
    }
}
