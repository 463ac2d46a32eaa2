package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@link Eng}: engineering notation with the SI prefixes (SI Brochure, 9th ed., 2019, §3 table 7;
 * IEC 60027-1): f 10⁻¹⁵, p 10⁻¹², n 10⁻⁹, µ 10⁻⁶, m 10⁻³, k 10³, M 10⁶, G 10⁹, the value scaled
 * into [1, 1000) and written with three significant digits (rounding half up, trailing zeros
 * dropped). Expected strings are hand-scaled: 94.9e-9 F = 94.9 × 10⁻⁹ F → "94.9 nF".
 */
class EngFormatTest {

    @ParameterizedTest(name = "{0} {1} → {2}")
    @CsvSource(delimiter = '|', value = {
        // each prefix of table 7 from f to G
        "2.2e-15 | F | 2.2 fF",
        "47e-12 | F | 47 pF",
        "94.9e-9 | F | 94.9 nF",
        "50e-6 | A | 50 µA",
        "11.3e-3 | W | 11.3 mW",
        "3.9 | A | 3.9 A",
        "4.7e3 | Ω | 4.7 kΩ",
        "18.02e6 | Hz | 18 MHz",
        "2.5e9 | Hz | 2.5 GHz",
        // three significant digits: 1.2345 → 1.23, 12.345 → 12.3, 123.45 → 123
        "1.2345e-9 | s | 1.23 ns",
        "12.345e-9 | s | 12.3 ns",
        "123.45e-9 | s | 123 ns",
        // negative values keep the sign and take the prefix of their magnitude
        "-3.9 | A | -3.9 A",
        "-0.25 | V | -250 mV",
        // exactly one unit of a prefix, and 1000 of one is one of the next
        "1e-9 | s | 1 ns",
        "1000 | V | 1 kV",
        // 999.5 rounds half up to 1000: one prefix up; 999.4 stays
        "999.5 | Hz | 1 kHz",
        "0.9995 | V | 1 V",
        "999.4 | Hz | 999 Hz",
        "-999.7 | V | -1 kV",
        // beyond the table: G and f are the largest and smallest prefixes used
        "5e12 | Hz | 5000 GHz",
        "999.7e9 | Hz | 1000 GHz",
        "5e-16 | F | 0.5 fF",
        // zero has no prefix
        "0 | V | 0 V",
    })
    void valuesTakeTheirSiPrefix(double v, String unit, String expected) {
        assertEquals(expected, Eng.of(v, unit));
    }

    @Test
    void specialUnitsAndValues() {
        assertEquals("unknown", Eng.of(Double.NaN, "V"));
        assertEquals("∞ A", Eng.of(Double.POSITIVE_INFINITY, "A"));
        assertEquals("−∞ V", Eng.of(Double.NEGATIVE_INFINITY, "V"));
        assertEquals("∞", Eng.of(Double.POSITIVE_INFINITY, "1"));
        assertEquals("−∞", Eng.of(Double.NEGATIVE_INFINITY, ""));
        // a plain number (unit 1 or none) takes no prefix
        assertEquals("4700", Eng.of(4700, "1"));
        assertEquals("0.047", Eng.of(0.047, ""));
        // dv/dt in the trade's unit as it is, never kV/ns
        assertEquals("2500 V/ns", Eng.of(2500, "V/ns"));
        // a fraction as a percentage: 0.934 = 93.4 % (REFERENCES.md §4's D_max check value)
        assertEquals("93.4 %", Eng.of(0.934, "%"));
        assertEquals("93.4 %", Eng.pct(0.934));
        // 1 V/ns = 1 V / 10⁻⁹ s = 10⁹ V/s; REFERENCES.md §7: 50 V/ns
        assertEquals("50 V/ns", Eng.slew(50e9));
        assertEquals("0.5 V/ns", Eng.slew(0.5e9));
    }

    @ParameterizedTest(name = "{0} → {1}")
    @CsvSource({
        "0, 0",
        "-0.0, 0",
        // three significant digits: two decimals from 1, one from 10, none from 100
        "3.14159, 3.14",
        "31.4159, 31.4",
        "314.159, 314",
        "-2.5, -2.5",
        // a fraction with leading zeros: 1.05 keeps its zero, 0.012 three decimals
        "1.05, 1.05",
        "1.006, 1.01",
        "1.004, 1",
        "0.5, 0.5",
        "0.0123, 0.012",
        "0.01, 0.01",
        // below 0.01: three significant digits in %g form
        "0.005, 0.00500",
        // from 10¹⁵: %g form, kept short
        "1e15, 1.00e+15",
        "9.99e14, 999000000000000",
        // half-way values round up (BigDecimal HALF_UP on the shortest decimal form)
        "2.675, 2.68",
        "0.0125, 0.013",
    })
    void numbersKeepThreeSignificantDigits(double v, String expected) {
        assertEquals(expected, Eng.num(v));
    }

    @Test
    void unboundedNumbers() {
        assertEquals("unknown", Eng.num(Double.NaN));
        assertEquals("∞", Eng.num(Double.POSITIVE_INFINITY));
        assertEquals("−∞", Eng.num(Double.NEGATIVE_INFINITY));
    }
}
