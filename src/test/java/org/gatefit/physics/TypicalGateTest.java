package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class TypicalGateTest {

    @ParameterizedTest(name = "{1} V -> {2}")
    @CsvSource(textBlock = """
        # source,                                                          vgs,  zone
        'common practice, no source: most gates are not on below 5 V',    4.5,  TOO_LOW
        'common practice, no source: most gates are not on below 5 V',    4.999999, TOO_LOW
        'common practice, no source: 5 to 20 V turns most gates on',      5.0,  ON
        'common practice, no source: 5 to 20 V turns most gates on',      12,   ON
        'common practice, no source: 5 to 20 V turns most gates on',      15,   ON
        'common practice, no source: 5 to 20 V turns most gates on',      20,   ON
        'common practice, no source: more than 20 V damages most gates',  20.000001, DAMAGING
        'common practice, no source: more than 20 V damages most gates',  20.5, DAMAGING
        'common practice, no source: more than 20 V damages most gates',  25,   DAMAGING
        """)
    void typicalGateWindow(String source, double vgs, TypicalGate.Zone zone) {
        assertEquals(zone, TypicalGate.classify(vgs), source);
    }
}
