package dev.changeling.samples.apiary;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class NectarFlowTest {

    @ParameterizedTest(name = "{0} g a day is {1}")
    @CsvSource({
            "-300, DEARTH",
            "120, LIGHT",
            "800, MAIN",
            "2600, STRONG"
    })
    void judgesTheDailyGain(int gramsPerDay, NectarFlow expected) {
        assertEquals(expected, NectarFlow.ofDailyGain(gramsPerDay));
    }
}
