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
                        -0.4, 1.0999999999999996, 0.6000000000000001, 2.5e-3),
                ties());
    }

    /** Halfway between two printed values at each number of digits, and the doubles either side. */
    private static Arbitrary<Double> ties() {
        return Arbitraries.integers().between(0, 3).flatMap(digits -> {
            // the range printed with that many digits (whole numbers up to 10^8, past the quick path's 10^7)
            long from = digits == 3 ? 10 : 100;
            long to = digits == 0 ? 100_000_000 : 999;
            return Arbitraries.longs().between(from, to)
                    .flatMap(k -> Arbitraries.of(-1, 0, 1).map(side -> {
                        double tie = Double.parseDouble((k + ".5") + "E-" + digits);
                        return side < 0 ? Math.nextDown(tie) : side > 0 ? Math.nextUp(tie) : tie;
                    }));
        }).flatMap(x -> Arbitraries.of(x, -x));
    }

    @Property(tries = 3000)
    void numMatchesTheFormatterAtTies(@ForAll("tiesOnly") double v) {
        assertEquals(reference(v), Eng.num(v), () -> "for " + v);
    }

    @Provide
    Arbitrary<Double> tiesOnly() {
        return ties();
    }

    @Property(tries = 2000)
    void aValueWithAPrefixMatchesTheFormatter(@ForAll("numbers") double v) {
        // Eng.of scales into [1, 1000) and moves one prefix up where the digits round to 1000.
        net.jqwik.api.Assume.that(Math.abs(v) >= 1e-12 && Math.abs(v) < 1e9);
        String s = Eng.of(v, "V");
        String[] parts = s.split(" ");
        double shown = Double.parseDouble(parts[0]);
        String prefix = parts[1].substring(0, parts[1].length() - 1);
        int e3 = java.util.List.of("f", "p", "n", "µ", "m", "", "k", "M", "G").indexOf(prefix) - 5;
        assertEquals(reference(v / Math.pow(10, 3 * e3)), parts[0], () -> "for " + v + ": " + s);
        org.junit.jupiter.api.Assertions.assertTrue(Math.abs(shown) < 1000, () -> "for " + v + ": " + s);
    }

    @Property(tries = 5000)
    void numMatchesTheFormatterItReplaced(@ForAll("numbers") double v) {
        assertEquals(reference(v), Eng.num(v), () -> "for " + v);
    }
}
