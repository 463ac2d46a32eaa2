package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigDecimal;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * The fast paths for plain cells (digits, an optional sign and point, no unit) read exactly what
 * the general paths read: a plain decimal is the double {@link Double#parseDouble} gives (IEEE 754
 * round-to-nearest of the decimal value, as the JDK documents it), in a column with and without
 * unit; a plain count is what {@link BigDecimal#longValueExact} gives.
 */
class PlainNumberPropertiesTest {
    private static final Unit NANOCOULOMBS = Unit.parse("nC");

    @Provide
    Arbitrary<String> plainDecimals() {
        Arbitrary<String> sign = Arbitraries.of("", "-", "+");
        Arbitrary<String> whole = Arbitraries.strings().withChars("0123456789").ofMinLength(0).ofMaxLength(12);
        Arbitrary<String> point = Arbitraries.of("", ".");
        Arbitrary<String> fraction = Arbitraries.strings().withChars("0123456789").ofMinLength(0).ofMaxLength(12);
        return Combinators.combine(sign, whole, point, fraction).as((s, w, p, f) -> s + w + p + (p.isEmpty() ? "" : f))
                .filter(t -> t.chars().anyMatch(Character::isDigit) && t.length() <= 18);
    }

    @Property(tries = 2000, edgeCases = EdgeCasesMode.MIXIN)
    void aPlainDecimalReadsAsParseDoubleReadsIt(@ForAll("plainDecimals") String text) throws BadValueException {
        double expected = Double.parseDouble(text);
        assertEquals(expected == 0 ? 0.0 : expected, Units.parse(text, NANOCOULOMBS, false), 0.0, text);
        assertEquals(Double.doubleToRawLongBits(expected), Double.doubleToRawLongBits(Units.plainDecimalValue(text)), text);
    }

    @Example
    void decimalsWhoseBinaryNeighboursAreCloseReadAsParseDoubleReadsThem() throws BadValueException {
        // Texts near a tie between two doubles, and the longest fast-path and first slow-path lengths.
        for (String t : new String[] {"0.1", "0.3", "2.675", "1.0000000000000002", "9007199254740993", "123456789012345",
                "1234567890123456", "0.000000000000001", "999999999999999.9", "-0", "+.5", "7."}) {
            assertEquals(Double.doubleToRawLongBits(Double.parseDouble(t)),
                    Double.doubleToRawLongBits(Units.plainDecimalValue(t)), t);
        }
    }

    @Provide
    Arbitrary<String> plainCounts() {
        Arbitrary<String> sign = Arbitraries.of("", "-", "+");
        Arbitrary<String> digits = Arbitraries.strings().withChars("0123456789").ofMinLength(1).ofMaxLength(20);
        return Combinators.combine(sign, digits).as((s, d) -> s + d);
    }

    @Property(tries = 1000, edgeCases = EdgeCasesMode.MIXIN)
    void aPlainCountReadsAsBigDecimalReadsIt(@ForAll("plainCounts") String text) {
        Long expected;
        try {
            expected = new BigDecimal(text).longValueExact();
        } catch (ArithmeticException e) {
            expected = null;
        }
        Long got;
        try {
            got = Units.parseInteger(text);
        } catch (BadValueException e) {
            got = null;
        }
        assertEquals(expected, got, text);
    }
}
