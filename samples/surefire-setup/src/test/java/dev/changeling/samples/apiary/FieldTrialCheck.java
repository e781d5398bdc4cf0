package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * A check for the out-apiary field trial, run by hand out there. The pom's excludes leave it out by a regular
 * expression; it fails if run, so a run that ignores the excludes starts from failing tests.
 */
class FieldTrialCheck {

    @Test
    void theFieldTrialYardIsConfigured() {
        assertTrue("heath-trial".equals(System.getenv("APIARY_YARD")), "runs only in the field trial's yard");
    }
}
