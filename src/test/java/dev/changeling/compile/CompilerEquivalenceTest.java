package dev.changeling.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.Mutant;
import dev.changeling.mutant.Point;
import dev.changeling.operator.Operators;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CompilerEquivalenceTest {

    /**
     * A comparison of compile-time constants is folded by javac (JLS 15.29, constant expressions): every mutant of
     * {@code LEVEL > 3} compiles to {@code true} or {@code false}. A mutant of the count nothing reads changes
     * bytes but no behaviour. A mutant of {@code reading * 2} changes both.
     */
    private static final String GAUGE = """
            package sample;

            public class Gauge {
                static final int LEVEL = 7;

                public int scale(int reading) {
                    if (LEVEL > 3) {
                        return reading * 2;
                    }
                    return reading;
                }

                public int total(int[] readings) {
                    int sum = 0;
                    int seen = 9;
                    for (int reading : readings) {
                        sum += reading;
                        seen++;
                    }
                    return sum;
                }
            }
            """;

    @TempDir
    Path dir;

    private TestProject project;

    private Mutant only(String snippet, String mutated) {
        return only("Gauge", snippet, mutated);
    }

    /** The first point (in the order the operators make them) that turns {@code host} into {@code mutated}. */
    private Mutant only(String type, String host, String mutated) {
        String text = project.file("sample/" + type + ".java").text();
        Point point = project.points("sample/" + type + ".java", Operators.all()).stream()
                .filter(candidate -> candidate.snippet().equals(host.replace(" ", "")) && candidate.mutatedHost(text).equals(mutated))
                .findFirst().orElseThrow(() -> new AssertionError("no point " + host + " -> " + mutated));
        return Mutant.firstOrder(point);
    }

    private CompilerEquivalence.Findings compare(Mutant... mutants) {
        return CompilerEquivalence.compare(List.of(mutants), project.files, project.classpath());
    }

    @Test
    void aMutantJavacFoldsAway_matchesTheOriginalByteForByte() {
        project = TestProject.create(dir, Map.of("sample/Gauge.java", GAUGE));
        Mutant stillTrue = only("LEVEL > 3", "LEVEL >= 3");

        CompilerEquivalence.Findings findings = compare(stillTrue);

        assertEquals(Map.of(stillTrue.fingerprint(), CompilerEquivalence.Match.BYTES), findings.asOriginal());
        assertEquals(List.of(), findings.duplicates());
        assertEquals(1, findings.compared());
    }

    @Test
    void mutantsOfAStoreNothingReads_matchTheOriginalOnlyAsAShape() {
        project = TestProject.create(dir, Map.of("sample/Gauge.java", GAUGE));
        Mutant countsDown = only("seen++", "seen--");
        Mutant startsAtTen = only("9", "10");

        CompilerEquivalence.Findings findings = compare(countsDown, startsAtTen);

        assertEquals(Map.of(countsDown.fingerprint(), CompilerEquivalence.Match.SHAPE,
                startsAtTen.fingerprint(), CompilerEquivalence.Match.SHAPE), findings.asOriginal());
    }

    @Test
    void aMutantOfAStoreThatIsRead_matchesNothing() {
        project = TestProject.create(dir, Map.of("sample/Gauge.java", GAUGE));
        Mutant subtracts = only("sum += reading", "sum -= reading");

        CompilerEquivalence.Findings findings = compare(subtracts);

        assertEquals(Map.of(), findings.asOriginal());
    }

    @Test
    void twoMutantsThatBothFoldToFalse_areDuplicates_andTheFirstStandsForTheGroup() {
        project = TestProject.create(dir, Map.of("sample/Gauge.java", GAUGE));
        Mutant less = only("LEVEL > 3", "LEVEL < 3");
        Mutant atMost = only("LEVEL > 3", "LEVEL <= 3");
        Mutant differs = only("reading * 2", "reading / 2");

        CompilerEquivalence.Findings findings = compare(less, differs, atMost);

        assertEquals(List.of(List.of(less.fingerprint(), atMost.fingerprint())), findings.duplicates());
        assertTrue(findings.asOriginal().isEmpty(), findings.asOriginal().toString());
    }

    @Test
    void aMutantThatChangesWhatTheCodeComputes_matchesNothing() {
        project = TestProject.create(dir, Map.of("sample/Gauge.java", GAUGE));
        Mutant differs = only("reading * 2", "reading / 2");
        Mutant other = only("reading * 2", "reading - 2");

        CompilerEquivalence.Findings findings = compare(differs, other);

        assertEquals(Map.of(), findings.asOriginal());
        assertEquals(List.of(), findings.duplicates());
        assertEquals(2, findings.compared());
    }

    @Test
    void mutantsOfTwoFiles_shareTasks_andEachIsComparedWithItsOwnOriginal() {
        String meter = GAUGE.replace("Gauge", "Meter");
        project = TestProject.create(dir, Map.of("sample/Gauge.java", GAUGE, "sample/Meter.java", meter));
        Mutant meterFolded = only("Meter", "LEVEL > 3", "LEVEL != 3");
        Mutant gaugeFolded = only("LEVEL > 3", "LEVEL >= 3");
        Mutant gaugeDiffers = only("reading * 2", "reading / 2");

        CompilerEquivalence.Findings findings = compare(gaugeFolded, meterFolded, gaugeDiffers);

        assertEquals(Set.of(gaugeFolded.fingerprint(), meterFolded.fingerprint()), findings.asOriginal().keySet());
        assertFalse(findings.asOriginal().containsKey(gaugeDiffers.fingerprint()));
    }
}
