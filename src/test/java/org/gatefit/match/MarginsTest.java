package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * {@link Margins}: the documented defaults, the range each margin accepts (ends included) and
 * {@code --margin name=value}. The defaults are the ones Margins' javadoc documents (common
 * practice, no source; the README's "Margins:" line prints them); the ranges are the class's own
 * contract, checked at both ends and just outside.
 */
class MarginsTest {

    @Test
    void defaultsAreTheDocumentedOnesInPrintingOrder() {
        Map<String, Double> m = Margins.DEFAULT.asMap();
        assertEquals(List.of("drive-current", "gate-headroom", "uvlo-headroom", "logic-noise", "offset", "isolation",
                "driver-power", "dv-dt", "cmti", "uvlo-plateau", "boot-cap-bias", "protection-bus", "dead-time"),
                List.copyOf(m.keySet()));
        assertEquals(List.of(1.5, 0.10, 1.0, 0.1, 0.20, 2.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100.0, 0.25),
                List.copyOf(m.values()));
    }

    /*
     * Each margin at the low end and the high end of its range is accepted, and a hundredth outside
     * either end refused (the name in the message is the one --margin takes).
     */
    @ParameterizedTest(name = "{0} from {1} to {2}")
    @CsvSource({
        "drive-current, 1, 100",
        "gate-headroom, 0, 0.9",
        "uvlo-headroom, 0, 20",
        "logic-noise, 0, 5",
        "offset, 0, 10",
        "isolation, 1, 100",
        "driver-power, 0.01, 1",
        "dv-dt, 0.01, 1",
        "cmti, 1, 100",
        "uvlo-plateau, 0, 1",
        "boot-cap-bias, 0.05, 1",
        "protection-bus, 0, 10000",
        "dead-time, 0, 10",
    })
    void eachMarginTakesItsRangeEndsIncluded(String name, double lo, double hi) {
        assertEquals(lo, Margins.DEFAULT.with(name + "=" + lo).asMap().get(name));
        assertEquals(hi, Margins.DEFAULT.with(name + "=" + hi).asMap().get(name));
        double below = lo - 0.001;
        double above = hi + 0.001;
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Margins.DEFAULT.with(name + "=" + below));
        assertTrue(e.getMessage().startsWith("expected margin " + name + " from " + Eng.num(lo) + " to " + Eng.num(hi)),
                e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Margins.DEFAULT.with(name + "=" + above));
        assertThrows(IllegalArgumentException.class, () -> Margins.DEFAULT.with(name + "=NaN"),
                "NaN is no margin");
    }

    @Test
    void withChangesOnlyTheNamedMargin() {
        Margins m = Margins.DEFAULT.with(" Drive-Current = 2 ");
        assertEquals(2.0, m.driveCurrent());
        Map<String, Double> before = Margins.DEFAULT.asMap();
        Map<String, Double> after = m.asMap();
        before.remove("drive-current");
        after.remove("drive-current");
        assertEquals(before, after);
        // every component round-trips through its name
        Margins all = new Margins(2, 0.2, 2, 0.2, 0.3, 3, 0.6, 0.6, 3, 0.2, 0.6, 200, 0.3);
        Margins again = Margins.DEFAULT;
        for (Map.Entry<String, Double> e : all.asMap().entrySet()) {
            again = again.with(e.getKey() + "=" + e.getValue());
        }
        assertEquals(all, again);
        assertEquals(all.uvloHeadroom(), 2.0);
        assertEquals(all.logicNoise(), 0.2);
        assertEquals(all.offset(), 0.3);
        assertEquals(all.isolation(), 3.0);
        assertEquals(all.driverPower(), 0.6);
        assertEquals(all.dvdt(), 0.6);
        assertEquals(all.cmti(), 3.0);
        assertEquals(all.uvloPlateau(), 0.2);
        assertEquals(all.bootCapBias(), 0.6);
        assertEquals(all.protectionBus(), 200.0);
        assertEquals(all.deadTime(), 0.3);
        assertEquals(all.gateHeadroom(), 0.2);
    }

    @Test
    void badAssignmentsSayWhatWasExpected() {
        IllegalArgumentException noEq = assertThrows(IllegalArgumentException.class, () -> Margins.DEFAULT.with("cmti"));
        assertTrue(noEq.getMessage().startsWith("expected name=value"), noEq.getMessage());
        IllegalArgumentException notNumber = assertThrows(IllegalArgumentException.class,
                () -> Margins.DEFAULT.with("cmti=two"));
        assertEquals("expected a number after 'cmti=', got 'two'", notNumber.getMessage());
        IllegalArgumentException noName = assertThrows(IllegalArgumentException.class, () -> Margins.DEFAULT.with("=2"));
        assertTrue(noName.getMessage().startsWith("unknown margin ''"), noName.getMessage());
        IllegalArgumentException unknown = assertThrows(IllegalArgumentException.class,
                () -> Margins.DEFAULT.with("speed=2"));
        assertTrue(unknown.getMessage().startsWith("unknown margin 'speed' (expected one of drive-current, gate-headroom"),
                unknown.getMessage());
    }

    @ParameterizedTest
    @CsvSource({"drive-current, ×", "isolation, ×", "cmti, ×", "uvlo-headroom, V", "logic-noise, V", "protection-bus, V",
        "gate-headroom, ''", "dead-time, ''", "dv-dt, ''"})
    void unitsAreFactorsVoltsOrFractions(String name, String unit) {
        assertEquals(unit, Margins.unitOf(name));
    }
}
