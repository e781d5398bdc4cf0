package dev.changeling.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.changeling.results.MutantResult;
import dev.changeling.results.PointRecord;
import dev.changeling.results.Verdict;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class WhySurvivedTest {

    private static final String SEEDLINGS = "[engine:junit-jupiter]/[class:PlotTest]/[method:seedlings()]";

    private static MutantResult mutant(Verdict verdict, String from, String to, String snippet, List<String> infectedBy) {
        PointRecord point = new PointRecord("f", "some-operator", "Plot", "rows(int,int)", 7, 16, 7, 17, from, to, snippet,
                "replaced " + from + " with " + to);
        return new MutantResult("f", "Plot.java", 1, List.of(point), verdict, null, null, List.of(),
                List.of(SEEDLINGS), 1.0, "", null, infectedBy);
    }

    @Test
    void aMutantNoTestReaches_isNotReached() {
        WhySurvived why = WhySurvived.of(mutant(Verdict.UNREACHED, "<", "<=", "a<b", null)).orElseThrow();

        assertEquals(WhySurvived.Kind.NOT_REACHED, why.kind());
        assertEquals("not reached: it needs a test that runs this code", why.sentence(id -> id));
    }

    @Test
    void aSurvivorNoTestInfected_needsAnInput_andForABoundaryItIsEqualSides() {
        WhySurvived why = WhySurvived.of(mutant(Verdict.SURVIVED, "<", "<=", "a<b", List.of())).orElseThrow();

        assertEquals(WhySurvived.Kind.NOT_INFECTED, why.kind());
        assertEquals("reached, never infected: it needs an input where both sides of `a<b` are equal", why.sentence(id -> id));
    }

    @Test
    void theInputAConnectiveSwapNeeds_isOneSideTrueTheOtherFalse() {
        WhySurvived why = WhySurvived.of(mutant(Verdict.SURVIVED, "&&", "||", "wet&&warm", List.of())).orElseThrow();

        assertTrue(why.hint().contains("one side of `wet&&warm` is true and the other false"), why.hint());
    }

    @Test
    void theInputASumBecomingADifferenceNeeds_isANonZeroRightOperand() {
        WhySurvived why = WhySurvived.of(mutant(Verdict.SURVIVED, "+", "-", "rows+extra", List.of())).orElseThrow();

        assertTrue(why.hint().contains("the right operand of `rows+extra` is not zero"), why.hint());
    }

    @Test
    void aSurvivorSomeTestInfected_wasNotPropagated_andNamesThatTest() {
        WhySurvived why = WhySurvived.of(mutant(Verdict.SURVIVED, "*", "/", "rows*2", List.of(SEEDLINGS))).orElseThrow();

        assertEquals(WhySurvived.Kind.NOT_PROPAGATED, why.kind());
        assertEquals(List.of(SEEDLINGS), why.tests());
        assertEquals("infected, not propagated: PlotTest > seedlings() saw another value and passed; it needs an assertion"
                + " on the result in this test", why.sentence(id -> "PlotTest > seedlings()"));
    }

    @Test
    void theTestsThatSawAnotherValue_areNamedInAlphabeticalOrder_whateverOrderTheBaselineMetThemIn() {
        String weeding = "[engine:junit-jupiter]/[class:PlotTest]/[method:weeding()]";
        for (List<String> infected : List.of(List.of(weeding, SEEDLINGS), List.of(SEEDLINGS, weeding))) {
            WhySurvived why = WhySurvived.of(mutant(Verdict.SURVIVED, "*", "/", "rows*2", infected)).orElseThrow();
            assertEquals("infected, not propagated: PlotTest > seedlings(), PlotTest > weeding() saw another value and passed;"
                    + " it needs an assertion on the result in one of these tests",
                    why.sentence(id -> id.equals(weeding) ? "PlotTest > weeding()" : "PlotTest > seedlings()"));
        }
    }

    @Test
    void aSurvivorWhoseExpressionWasNotWatched_isUnknown_neverGuessed() {
        WhySurvived why = WhySurvived.of(mutant(Verdict.SURVIVED, "<", "<=", "a<b", null)).orElseThrow();

        assertEquals(WhySurvived.Kind.UNKNOWN, why.kind());
    }

    @Test
    void aDetectedMutant_hasNoReasonToSurvive() {
        assertEquals(Optional.empty(), WhySurvived.of(mutant(Verdict.KILLED, "<", "<=", "a<b", List.of())));
        assertEquals(Optional.empty(), WhySurvived.of(mutant(Verdict.TIMED_OUT, "<", "<=", "a<b", List.of(SEEDLINGS))));
    }
}
