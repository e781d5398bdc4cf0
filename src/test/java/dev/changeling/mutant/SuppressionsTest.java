package dev.changeling.mutant;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.UserError;
import dev.changeling.operator.Operators;
import dev.changeling.source.SourceFile;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The committed suppression rules: what a rule looks like, what it matches, and that what it leaves out is counted. */
class SuppressionsTest {

    private static final String METER = """
            class Meter {
                private final Counters metrics = new Counters();
                private int total;

                void add(int litres) {
                    metrics.increment("litres", litres);
                    total = total + litres;
                    audit(litres > 100);
                }

                void audit(boolean large) {
                    metrics.flag(large && total > 0);
                }
            }
            """;

    private static Generation.Generated generate(Suppressions rules) {
        MutantRequest request = new MutantRequest(Operators.defaults(), List.of(1), HigherOrder.Scope.METHOD, 1L,
                point -> true, false).withSuppressions(rules);
        return Generation.generate(List.of(SourceFile.of("Meter.java", METER)), request);
    }

    private static Suppressions rules(String... lines) {
        return Suppressions.parse(List.of(lines), ".changeling/suppressions.txt");
    }

    @Test
    void aRuleOnTheHostsText_leavesOutThatOperatorThere_andCountsItUnderTheRule() {
        int all = generate(Suppressions.none()).mutants().size();
        Generation.Generated ruled = generate(rules(
                "# what we never mutate, and why",
                "statement-removal text metrics.* -- the counters only feed dashboards"));

        assertEquals(Map.of("rule at line 2: the counters only feed dashboards", 2), ruled.notMade());
        assertEquals(all - 2, ruled.mutants().size());
        assertTrue(ruled.mutants().stream().noneMatch(mutant -> mutant.first().operator().equals("statement-removal")
                && mutant.first().snippet().startsWith("metrics.")));
    }

    @Test
    void aRuleOnTheEnclosingMember_withEveryOperator_leavesOutTheWholeMember() {
        Generation.Generated ruled = generate(rules("* in audit(*) -- checked by the compliance suite"));

        assertTrue(ruled.mutants().stream().noneMatch(mutant -> mutant.first().member().startsWith("audit(")));
        assertTrue(ruled.notMade().get("rule at line 1: checked by the compliance suite") > 0, ruled.notMade()::toString);
    }

    @Test
    void aLineThatIsNoRule_isNamedWithItsLine_andWhatARuleLooksLike() {
        UserError error = assertThrows(UserError.class, () -> rules("statement-removal metrics.* because dashboards"));

        assertTrue(error.getMessage().startsWith(".changeling/suppressions.txt:1: not a rule; write OPERATOR text|in GLOB -- REASON"),
                error.getMessage());
    }
}
