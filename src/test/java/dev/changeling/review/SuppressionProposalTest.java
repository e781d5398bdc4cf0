package dev.changeling.review;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.mutant.Suppressions;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

class SuppressionProposalTest {

    static final String FILE = "src/main/java/org/lanternworks/Rounds.java";

    /** A listed statement removal of the host in the member, its fingerprint all {@code digit}. */
    static EquivalentEntry removal(char digit, String member, String host) {
        return entry(digit, "statement-removal", member, host);
    }

    static EquivalentEntry entry(char digit, String operator, String member, String host) {
        return new EquivalentEntry(String.valueOf(digit).repeat(64), FILE, "Rounds", member, operator, host,
                "(statement removed)", "the tally only feeds the board");
    }

    static Optional<SuppressionProposal> after(List<EquivalentEntry> listed, String... rules) {
        return SuppressionProposal.after(listed.get(listed.size() - 1), listed,
                Suppressions.parse(List.of(rules), Suppressions.RELATIVE_PATH));
    }

    @Nested
    class Counting {

        final List<EquivalentEntry> threeCounts = List.of(
                removal('1', "dusk()", "tally.count(\"dusk\");"),
                removal('2', "midnight()", "tally.count(\"midnight\");"),
                removal('3', "dawn()", "tally.count(hour, \"dawn\");"));

        @Test
        void threeOfOneOperatorOnOneCallee_proposeARuleForThatCalleeWithAnyArguments() {
            SuppressionProposal proposal = after(threeCounts).orElseThrow();

            assertEquals("tally.count", proposal.kind().call().callee());
            assertEquals("statement-removal text tally.count(*); -- marked equivalent 3 times (ids 11111111, 22222222, 33333333)",
                    proposal.line());
        }

        @Test
        void twoOfAKind_proposeNothing() {
            assertEquals(Optional.empty(), after(threeCounts.subList(0, 2)));
        }

        @Test
        void threeCallsOfDifferentCallees_proposeNothing() {
            List<EquivalentEntry> listed = List.of(
                    removal('1', "dusk()", "tally.count(\"dusk\");"),
                    removal('2', "midnight()", "tally.reset();"),
                    removal('3', "dawn()", "board.count(\"dawn\");"));

            assertEquals(Optional.empty(), after(listed));
        }

        @Test
        void theSameCalleeUnderAnotherOperator_doesNotCount() {
            List<EquivalentEntry> listed = new ArrayList<>(threeCounts.subList(0, 2));
            listed.add(entry('3', "return-value-blank", "dawn()", "tally.count(\"dawn\")"));

            assertEquals(Optional.empty(), after(listed));
        }

        @Test
        void aKindAlreadySuppressed_proposesNothing() {
            assertEquals(Optional.empty(), after(threeCounts, "statement-removal text tally.* -- the tally only feeds the board"));
        }

        @Test
        void aRuleThatLeavesOutOnlySomeOfThem_doesNotCoverTheKind() {
            SuppressionProposal proposal = after(threeCounts, "* in dusk() -- checked by the night suite").orElseThrow();

            assertEquals(3, proposal.evidence().size());
        }

        @Test
        void moreThanThree_allCountAndAllIdsAreNamed() {
            List<EquivalentEntry> listed = new ArrayList<>(threeCounts);
            listed.add(0, removal('4', "storm()", "tally.count(\"storm\");"));

            assertTrue(after(listed).orElseThrow().line().endsWith("-- marked equivalent 4 times (ids 44444444, 11111111, 22222222, 33333333)"));
        }

        @Test
        void aMutantThatIsNotACall_proposesNothing() {
            List<EquivalentEntry> listed = List.of(
                    removal('1', "dusk()", "lit = true;"),
                    removal('2', "midnight()", "lit = true;"),
                    removal('3', "dawn()", "lit = true;"));

            assertEquals(Optional.empty(), after(listed));
        }

        @Test
        void secondOrderEntries_doNotCount() {
            List<EquivalentEntry> listed = List.of(
                    removal('1', "dusk()", "tally.count(\"dusk\");"),
                    removal('2', "midnight()", "tally.count(\"midnight\");"),
                    entry('3', "statement-removal+statement-removal", "dawn()", "tally.count(\"dawn\"); ; tally.count(\"dusk\");"));

            assertEquals(Optional.empty(), after(listed));
        }

        @Test
        void theRuleReadsBackAsOneRuleThatLeavesOutEveryOneOfThem() {
            Suppressions rules = Suppressions.parse(List.of(after(threeCounts).orElseThrow().line()), Suppressions.RELATIVE_PATH);

            assertEquals(1, rules.size());
            for (EquivalentEntry entry : threeCounts) {
                assertTrue(rules.leavesOut(entry.operator(), entry.original(), entry.member()), entry.original());
            }
            assertTrue(!rules.leavesOut("statement-removal", "tally.countAll(\"dawn\");", "dawn()"));
            assertTrue(!rules.leavesOut("statement-removal", "board.count(\"dawn\");", "dawn()"));
        }
    }

    @Nested
    class Callees {

        @Test
        void aCallStatement_isTheReceiverAndName_withAnyArgumentsAndTheSemicolon() {
            assertEquals(Optional.of(new CallHost("metrics.count", "metrics.count(*);")), CallHost.of("metrics.count(1, \"a\");"));
        }

        @Test
        void aCallExpression_hasNoSemicolon() {
            assertEquals(Optional.of(new CallHost("crops", "crops(*)")), CallHost.of("crops()"));
        }

        @Test
        void aChainedReceiver_isKeptAsWritten() {
            assertEquals("board.row(2).count", CallHost.of("board.row(2).count(x);").orElseThrow().callee());
        }

        @Test
        void hostsThatAreNotOneCall_haveNone() {
            for (String host : List.of("n = tally.count(1);", "tally.count(1) > 2", "(tally.count(1))", "new Tally()",
                    "return tally.count(1);", "hour >= dusk", "tally.count(")) {
                assertEquals(Optional.empty(), CallHost.of(host), host);
            }
        }

        @Test
        void aCalleeWithAGlobCharacter_hasNone_asNoRuleCouldMatchItNarrowly() {
            assertEquals(Optional.empty(), CallHost.of("(ready?day:night).count(1);"));
        }
    }
}
