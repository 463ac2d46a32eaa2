package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/** {@link Eng#num} prints what {@code String.format("%.nf")} with trailing zeros dropped prints (its former implementation). */
class EngProperties {
    private static String reference(double v) {
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        int digits = a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : 3;
        if (a < 0.01) {
            return String.format(Locale.ROOT, "%.3g", v);
        }
        String s = String.format(Locale.ROOT, "%." + digits + "f", v);
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s.equals("-0") ? "0" : s;
    }

    @Provide
    Arbitrary<Double> numbers() {
        return Arbitraries.oneOf(Arbitraries.doubles().between(-2000, 2000),
                Arbitraries.doubles().between(-2000, 2000).ofScale(3),
                Arbitraries.doubles().between(-1e9, 1e9),
                Arbitraries.of(0.0, -0.0, 0.01, 0.0105, 0.9995, 1.005, 9.995, 99.95, 999.5, 58.25, 93.75, 16.25,
                        -0.4, 1.0999999999999996, 0.6000000000000001, 2.5e-3));
    }

    @Property(tries = 5000)
    void numMatchesTheFormatterItReplaced(@ForAll("numbers") double v) {
        assertEquals(reference(v), Eng.num(v), () -> "for " + v);
    }
}
