package dev.changeling.worker;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.platform.engine.discovery.DiscoverySelectors.selectUniqueId;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.platform.launcher.TestPlan;
import org.junit.platform.launcher.core.LauncherDiscoveryRequestBuilder;
import org.junit.platform.launcher.core.LauncherFactory;

/** The worker's suite on real Jupiter tests (parameterised ones register their invocations only as they run). */
class SuiteTest {

    private static final String CLASS = "[engine:junit-jupiter]/[class:" + TogetherFixture.class.getName() + "]";
    private static final String PLAIN = CLASS + "/[method:plain()]";
    private static final String SECOND_POSITIVE = CLASS + "/[test-template:positive(int)]/[test-template-invocation:#2]";
    private static final String SECOND_OF_OTHER = CLASS + "/[test-template:positiveOrNot(int)]/[test-template-invocation:#2]";
    private static final String GONE = CLASS + "/[method:gone()]";

    private final Suite suite = new Suite(List.of(), List.of(), Map.of());

    @AfterEach
    void close() {
        suite.close();
    }

    @Test
    void runsPlainAndParameterisedTestsTogether_inOneRequest_eachWithItsOwnOutcome() {
        List<Byte> statuses = suite.runTogether(List.of(PLAIN, SECOND_POSITIVE, SECOND_OF_OTHER)).stream()
                .map(SingleTestRun.Result::status).toList();
        assertEquals(List.of(Wire.PASSED, Wire.PASSED, Wire.FAILED), statuses);
    }

    @Test
    void aTestThatIsGoneIsMissing_notFailed_andTheOthersStillRun() {
        List<Byte> statuses = suite.runTogether(List.of(PLAIN, GONE, SECOND_OF_OTHER)).stream()
                .map(SingleTestRun.Result::status).toList();
        assertEquals(List.of(Wire.PASSED, Wire.MISSING, Wire.FAILED), statuses);
        assertEquals(Wire.MISSING, suite.runOne(GONE).status());
    }

    @Test
    void aPlanMayHoldAnInvocationBelowItsTemplate_butNotAMethodItsClassLacks() {
        TestPlan plan = LauncherFactory.create().discover(LauncherDiscoveryRequestBuilder.request()
                .selectors(selectUniqueId(PLAIN), selectUniqueId(SECOND_POSITIVE)).build());
        PlannedIds planned = PlannedIds.of(plan);
        assertTrue(planned.mayHold(PLAIN));
        assertTrue(planned.mayHold(SECOND_POSITIVE), "an invocation appears only as its template runs");
        assertFalse(planned.mayHold(GONE), "the class is planned with tests, and this is not one of them");
        assertFalse(planned.mayHold("[engine:junit-jupiter]/[class:no.Such]/[method:x()]"));
        assertFalse(planned.mayHold("[engine:other]/[class:x]"));
    }
}
