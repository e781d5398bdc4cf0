package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * The calibration of the scale retired last spring, kept for the record. The pom's excludes leave this class out
 * by name; it fails if run, so a run that ignores the excludes starts from failing tests.
 */
class RetiredScaleTest {

    @Test
    void theOldScaleCountedThreeHundredMilligrams() {
        // the old scale counted 300 mg a step; today's calibration is 250 mg, so this no longer holds
        assertEquals(12_000, new ScaleCalibration(0, 250).grams(40_000));
    }
}
