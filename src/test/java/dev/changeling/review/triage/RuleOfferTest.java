package dev.changeling.review.triage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.Suppressions;
import dev.changeling.results.MutantResult;
import dev.changeling.review.EquivalentEntry;
import dev.changeling.review.EquivalentsList;
import dev.changeling.terminal.Style;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Scripted triage on the keeper's rounds: three equivalent removals of one tally call bring a proposed rule. */
class RuleOfferTest {

    static final String REASON = "e the tally only feeds the harbour board\n";
    static final String RULE = "statement-removal text tally.count(*); -- marked equivalent ";

    @TempDir
    Path root;

    TriageProject project;

    @BeforeEach
    void project() throws IOException {
        project = TriageProject.roundsIn(root);
    }

    String session(String script) {
        StringWriter text = new StringWriter();
        PrintWriter out = new PrintWriter(text);
        Triage.run(new Triage.Setup(root, project.results, false, Style.plain()),
                Answers.fromLines(new StringReader(script), out), out, (mutant, progress) -> mutant);
        out.flush();
        return text.toString();
    }

    Path rules() {
        return root.resolve(Suppressions.RELATIVE_PATH);
    }

    /** The short ids of the listed entries, in the list's order, as the rule names them. */
    String listedIds() {
        return EquivalentsList.load(root).entries().stream().map(EquivalentEntry::shortId).collect(Collectors.joining(", "));
    }

    @Test
    void fixtureWalksFourTallyCountsThenAReset() {
        assertEquals(List.of("tally.count(\"dusk\");", "tally.count(\"midnight\");", "tally.count(\"dawn\");",
                        "tally.count(\"storm\");", "tally.reset();"),
                project.walked.stream().map(mutant -> mutant.first().snippet()).toList());
    }

    @Test
    void thirdEquivalentOfOneCallee_proposesTheRule_andAcceptingAppendsIt() throws IOException {
        String out = session(REASON + REASON + REASON + "a\nq\n");

        String line = RULE + "3 times (ids " + listedIds() + ")";
        List<String> written = Files.readAllLines(rules());
        assertEquals(line, written.get(written.size() - 1));
        assertEquals(1, Suppressions.load(root).size());
        assertTrue(out.contains("statement-removal on calls of tally.count is now listed as equivalent 3 times; a rule in "
                + ".changeling/suppressions.txt would stop making such mutants from the next run on:\n  " + line + "\n"
                + "a add this line to .changeling/suppressions.txt  n not now > a\n"
                + "added the rule to .changeling/suppressions.txt; it takes effect from the next run"), out);
        assertEquals(1, occurrences(out, "a add this line"), out);
    }

    @Test
    void afterTheRuleIsAdded_aFourthOfTheKindProposesNothingMore() throws IOException {
        String out = session(REASON + REASON + REASON + "a\n" + REASON + "q\n");

        assertEquals(4, EquivalentsList.load(root).entries().size());
        assertEquals(1, occurrences(out, "a add this line"), out);
        assertEquals(1, Suppressions.load(root).size());
    }

    @Test
    void declined_writesNothing_andIsNotProposedAgainThisSession() {
        String out = session(REASON + REASON + REASON + "n\n" + REASON + "q\n");

        assertFalse(Files.exists(rules()));
        assertEquals(1, occurrences(out, "a add this line"), out);
        assertTrue(out.contains("no rule added; triage will not propose it again in this session"), out);
    }

    @Test
    void twoEquivalentsOfTheCallee_proposeNothing() {
        String out = session(REASON + REASON + "q\n");

        assertEquals(0, occurrences(out, "a add this line"), out);
    }

    @Test
    void entriesListedBefore_countWithTheMarksOfThisSession() throws IOException {
        EquivalentsList list = EquivalentsList.load(root);
        for (MutantResult mutant : project.walked.subList(0, 2)) {
            list.put(EquivalentEntry.of(mutant, "listed in an earlier session"));
        }
        list.save();

        String out = session(REASON + "a\nq\n");

        assertTrue(Files.readString(rules()).contains(RULE + "3 times (ids " + listedIds() + ")"), out);
    }

    @Test
    void anOtherAnswer_asksAgain_andTheEndOfInputAddsNothing() {
        String out = session(REASON + REASON + REASON + "x\n");

        assertTrue(out.contains("answer a to add the rule or n to leave it out\n"), out);
        assertTrue(out.contains("end of input: no rule added"), out);
        assertFalse(Files.exists(rules()));
    }

    @Test
    void theProposalKeys_areNoneOfTriagesChoices_andTheHelpScreenNamesThem() {
        for (char key : new char[] {RuleOffer.ADD, RuleOffer.NOT_NOW}) {
            assertTrue(Arrays.stream(Choice.values()).noneMatch(choice -> choice.key() == key), String.valueOf(key));
        }
        String help = Choice.helpScreen(Style.plain());
        assertTrue(help.contains(" a adds it to .changeling/suppressions.txt (from the next run on), n leaves it out for this session."), help);
    }

    private static int occurrences(String text, String part) {
        return text.split(Pattern.quote(part), -1).length - 1;
    }
}
