package dev.changeling.review.triage;

import dev.changeling.project.ProjectLayout;
import dev.changeling.results.MutantResult;
import dev.changeling.results.ResultsFile;
import dev.changeling.results.ResultsForTests;
import dev.changeling.results.RunResults;
import dev.changeling.results.TestRecord;
import dev.changeling.review.Survivors;
import dev.changeling.source.SourceFile;
import dev.changeling.source.SourceHash;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * A small project with a results file built from the real generator, every mutant a survivor, for
 * tests of triage: a harbour beacon that is lit from dusk and flashes twice in thick fog.
 */
public final class TriageProject {

    public static final String BEACON = "src/main/java/org/lanternworks/Beacon.java";
    public static final String BEACON_TEXT = """
            package org.lanternworks;

            /** The harbour beacon. */
            final class Beacon {

                boolean lit(int hour, int dusk) {
                    return hour >= dusk;
                }

                int flashes(int fog) {
                    if (fog > 3) {
                        return 2;
                    }
                    return 1;
                }
            }
            """;

    public static final String SQUALL = "src/main/java/org/lanternworks/Squall.java";
    public static final String SQUALL_TEXT = """
            package org.lanternworks;

            final class Squall {
                boolean calm(int wind, int swell) {
                    return wind < 5 && swell <= 2;
                }
            }
            """;

    public static final String ROUNDS = "src/main/java/org/lanternworks/Rounds.java";
    public static final String ROUNDS_TEXT = """
            package org.lanternworks;

            /** The keeper's rounds, each one counted on the harbour's tally board. */
            final class Rounds {

                private final Tally tally = new Tally();

                void dusk() {
                    tally.count("dusk");
                }

                void midnight() {
                    tally.count("midnight");
                }

                void dawn() {
                    tally.count("dawn");
                }

                void storm() {
                    tally.count("storm");
                    tally.reset();
                }
            }
            """;

    public static final TestRecord LIT_AT_DUSK = new TestRecord(
            "[engine:junit-jupiter]/[class:org.lanternworks.BeaconTest]/[method:litAtDusk()]", "BeaconTest > lit at dusk", 4.0);
    public static final TestRecord FLASHES_IN_FOG = new TestRecord(
            "[engine:junit-jupiter]/[class:org.lanternworks.BeaconTest]/[method:flashesInFog()]", "BeaconTest > flashes in fog", 3.0);
    /** Reaches the fog code but has no record in the baseline, so its name is made from its id. */
    public static final String THICK_FOG_ID = "[engine:junit-jupiter]/[class:org.lanternworks.BeaconTest$Fog]/[method:thickFog()]";

    public final Path root;
    public final RunResults results;
    /** The survivors in the order triage walks them. */
    public final List<MutantResult> walked;

    TriageProject(Path root, RunResults results) {
        this.root = root;
        this.results = results;
        this.walked = Survivors.unresolved(results.mutants(), mutant -> false);
    }

    /** Writes the beacon project and its results file (first-order mutants) into an empty folder. */
    public static TriageProject in(Path root) throws IOException {
        return write(root, BEACON, BEACON_TEXT, 1);
    }

    /** Writes a project whose one method has two comparisons, with its second-order mutants as results. */
    public static TriageProject secondOrderIn(Path root) throws IOException {
        return write(root, SQUALL, SQUALL_TEXT, 2);
    }

    /** Writes a project whose rounds each count on a tally, with its statement removals as results. */
    public static TriageProject roundsIn(Path root) throws IOException {
        return write(root, ROUNDS, ROUNDS_TEXT, 1, "statement-removal");
    }

    private static TriageProject write(Path root, String path, String text, int order) throws IOException {
        return write(root, path, text, order, "relational-subset");
    }

    private static TriageProject write(Path root, String path, String text, int order, String operator) throws IOException {
        Files.createDirectories(root);
        Files.writeString(root.resolve("pom.xml"), "<project/>\n");
        Path file = root.resolve(path);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
        List<MutantResult> mutants = ResultsForTests.survivorsOf(List.of(SourceFile.of(path, text)), List.of(order), List.of(operator))
                .stream().map(TriageProject::reached).toList();
        RunResults plain = ResultsForTests.run(mutants, false, mutants.size());
        RunResults results = new RunResults(plain.format(), true, plain.settings(), List.of(LIT_AT_DUSK, FLASHES_IN_FOG),
                Map.of(), mutants, List.of(), Map.of(path, SourceHash.sha256(text)));
        ResultsFile.write(ProjectLayout.of(root).resultsFile(), results);
        return new TriageProject(root, results);
    }

    private static MutantResult reached(MutantResult mutant) {
        List<String> tests = mutant.first().member().startsWith("lit")
                ? List.of(LIT_AT_DUSK.id())
                : List.of(FLASHES_IN_FOG.id(), THICK_FOG_ID);
        return new MutantResult(mutant.id(), mutant.file(), mutant.order(), mutant.points(), mutant.verdict(), null, null,
                tests, tests, 2.0, mutant.diff());
    }

    public MutantResult walked(int index) {
        return walked.get(index);
    }
}
