package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Cell and command-line quantities. Check values come from the SI prefix definitions
 * (BIPM, The International System of Units, 9th edition 2019, section 3 "Decimal multiples and
 * submultiples of SI units"; recalled from memory: p = 10⁻¹², n = 10⁻⁹, µ = 10⁻⁶, m = 10⁻³,
 * k = 10³, M = 10⁶) and from IEC 60062 for resistance codes (see
 * {@link #iecResistanceCodesReadAsTheirValueInOhms}). Every expected value is exact in decimal,
 * so the assertions use a tolerance of zero.
 */
class UnitsTest {

    private static Unit unit(String symbol) {
        return Unit.parse(symbol);
    }

    /** columns: cell, column unit, expected value in the column unit, source of the expected value */
    @ParameterizedTest(name = "''{0}'' in a {1} column is {2} ({3})")
    @CsvSource(delimiter = '|', textBlock = """
            130         | nC  | 130     | DESIGN.md: a bare number is in the column unit
            0.5         | V   | 0.5     | DESIGN.md: a bare number is in the column unit
            -20         | V   | -20     | DESIGN.md: a bare number is in the column unit
            1.5e3       | pF  | 1500    | scientific notation, plain arithmetic
            130nC       | nC  | 130     | SI prefix n = 10^-9 (SI Brochure 9th ed., from memory)
            130 nC      | nC  | 130     | SI prefix n = 10^-9 (SI Brochure 9th ed., from memory)
            0.13 uC     | nC  | 130     | SI prefix µ = 10^-6, n = 10^-9; u for µ is common practice, no source
            0.13uC      | nC  | 130     | SI prefix µ = 10^-6, n = 10^-9 (SI Brochure 9th ed., from memory)
            130 n       | nC  | 130     | prefix alone, DESIGN.md; n = 10^-9
            0.1uC       | nC  | 100     | SI prefix µ = 10^-6, n = 10^-9 (SI Brochure 9th ed., from memory)
            4.7uF       | nF  | 4700    | SI prefix µ = 10^-6, n = 10^-9 (SI Brochure 9th ed., from memory)
            4.7uF       | pF  | 4700000 | SI prefix µ = 10^-6, p = 10^-12 (SI Brochure 9th ed., from memory)
            100kHz      | kHz | 100     | SI prefix k = 10^3 (SI Brochure 9th ed., from memory)
            100kHz      | Hz  | 100000  | SI prefix k = 10^3 (SI Brochure 9th ed., from memory)
            1.2kV       | V   | 1200    | SI prefix k = 10^3 (SI Brochure 9th ed., from memory)
            50 ns       | ns  | 50      | SI prefix n = 10^-9 (SI Brochure 9th ed., from memory)
            0.05 us     | ns  | 50      | SI prefix µ = 10^-6, n = 10^-9 (SI Brochure 9th ed., from memory)
            250 mA      | A   | 0.25    | SI prefix m = 10^-3 (SI Brochure 9th ed., from memory)
            45 mOhm     | mΩ  | 45      | SI prefix m = 10^-3 (SI Brochure 9th ed., from memory)
            0.045 Ohm   | mΩ  | 45      | SI prefix m = 10^-3 (SI Brochure 9th ed., from memory)
            """)
    void siPrefixedAndBareCellsScaleToTheColumnUnit(String cell, String columnUnit, double expected, String source)
            throws BadValueException {
        assertEquals(expected, Units.parse(cell, unit(columnUnit), false), 0.0, source);
    }

    /** µ written three ways: micro sign U+00B5, Greek small mu U+03BC, and ASCII u (common practice, no source). */
    @ParameterizedTest(name = "micro prefix written as U+{0}")
    @ValueSource(strings = {"00B5", "03BC", "0075"})
    void everySpellingOfMicroIsTenToTheMinusSix(String codePoint) throws BadValueException {
        String micro = Character.toString(Integer.parseInt(codePoint, 16));
        // 4.7 µF = 4.7e-6 F = 4700 nF (SI prefixes µ = 10^-6, n = 10^-9; SI Brochure 9th ed., from memory)
        assertEquals(4700.0, Units.parse("4.7" + micro + "F", unit("nF"), false), 0.0);
        assertEquals(4.7, Units.parse("4.7 " + micro + "F", unit("µF"), false), 0.0);
    }

    @Test
    void decimalScalingIsExactNotBinaryFloatingPoint() throws BadValueException {
        // 0.13 µC = 130 nC exactly (SI prefixes, from memory).
        assertEquals(130.0, Units.parse("0.13 uC", unit("nC"), false), 0.0);
        // Cases where scaling in binary doubles is off by one ulp: 0.57 * 1e-6 / 1e-9 gives
        // 569.9999999999999 and 0.29 * 1e-6 / 1e-9 gives 289.99999999999994 (IEEE 754 binary64).
        assertEquals(570.0, Units.parse("0.57 uC", unit("nC"), false), 0.0);
        assertEquals(290.0, Units.parse("0.29uC", unit("nC"), false), 0.0);
        assertEquals(0.1, Units.parse("0.0001 uF", unit("nF"), false), 0.0);
        assertEquals(130.0, Units.parse("0.00000013 C", unit("nC"), false), 0.0);
        // 0.1 µC = 100 nC exactly
        assertEquals(100.0, Units.parse("0.1uC", unit("nC"), false), 0.0);
    }

    /**
     * IEC 60062 (letter and digit code for resistance values), rule recalled from memory: the
     * letter R/K/M/G/T stands for the decimal point and multiplies by 1/10³/10⁶/10⁹/10¹².
     * columns: code, column unit, expected value in the column unit
     */
    @ParameterizedTest(name = "IEC 60062 code {0} in a {1} column is {2}")
    @CsvSource(delimiter = '|', textBlock = """
            4k7   | Ω  | 4700
            4K7   | Ω  | 4700
            2R2   | Ω  | 2.2
            0R5   | Ω  | 0.5
            R47   | Ω  | 0.47
            1M0   | Ω  | 1000000
            10K   | Ω  | 10000
            100R  | Ω  | 100
            2G2   | Ω  | 2200000000
            1T0   | Ω  | 1000000000000
            2R2   | mΩ | 2200
            R47   | mΩ | 470
            """)
    void iecResistanceCodesReadAsTheirValueInOhms(String code, String columnUnit, double expected)
            throws BadValueException {
        assertEquals(expected, Units.parse(code, unit(columnUnit), false), 0.0,
                "IEC 60062 letter and digit code, from memory");
    }

    @Test
    void aUnitOfAnotherDimensionIsAnErrorNamingBothQuantities() {
        BadValueException e = assertThrows(BadValueException.class, () -> Units.parse("12 A", unit("V"), false));
        String m = e.getMessage().toLowerCase(Locale.ROOT);
        assertAll(() -> assertTrue(m.contains("current"), m),
                () -> assertTrue(m.contains("voltage"), m),
                () -> assertTrue(m.contains("12 a"), m),
                () -> assertTrue(m.contains("expected"), m));
        BadValueException f = assertThrows(BadValueException.class, () -> Units.parse("130nC", unit("ns"), false));
        String n = f.getMessage().toLowerCase(Locale.ROOT);
        assertAll(() -> assertTrue(n.contains("charge"), n), () -> assertTrue(n.contains("time"), n));
    }

    @ParameterizedTest(name = "''{0}'' is not a quantity")
    @ValueSource(strings = {"NaN", "nan", "Infinity", "-Infinity", "inf", "13O", "1.2.3", "abc", "12 volts!",
        "0x1F", "--5", "1e999", "1e99999999999", "1e2147483647 uC", "1e-2147483648"})
    void nonNumbersAreErrorsThatSayWhatWasExpected(String cell) {
        BadValueException e = assertThrows(BadValueException.class, () -> Units.parse(cell, unit("nC"), false));
        assertTrue(e.getMessage().contains("'" + cell + "'"), e.getMessage());
        assertTrue(e.getMessage().contains("expected nanocoulombs"), e.getMessage());
    }

    @ParameterizedTest(name = "''{0}'' in a unit-less number column is an error")
    @ValueSource(strings = {"NaN", "Infinity", "13O", "1,5"})
    void unitlessNumberColumnsRejectNonNumbersToo(String cell) {
        Column price = Schema.of(Kind.SWITCH).column("unit_price").orElseThrow();
        BadValueException e = assertThrows(BadValueException.class, () -> Cells.parse(price, cell, false));
        assertTrue(e.getMessage().contains("expected"), e.getMessage());
    }

    @Test
    void decimalCommaIsAcceptedOnlyWhenTheFileIsNotCommaSeparated() throws BadValueException {
        assertEquals(4.7, Units.parse("4,7", unit("V"), true), 0.0);
        assertEquals(130.0, Units.parse("0,13 uC", unit("nC"), true), 0.0);
        BadValueException e = assertThrows(BadValueException.class, () -> Units.parse("4,7", unit("V"), false));
        assertTrue(e.getMessage().contains("comma"), e.getMessage());
        assertTrue(e.getMessage().contains("expected volts"), e.getMessage());
    }

    @Test
    void anEmptyCellIsAnErrorForParseAndUnknownForCells() throws BadValueException {
        assertThrows(BadValueException.class, () -> Units.parse("  ", unit("V"), false));
        Column qg = Schema.of(Kind.SWITCH).column("q_g_nc").orElseThrow();
        assertEquals(null, Cells.parse(qg, "  ", false), "DESIGN.md: empty cell = unknown, never zero");
    }

    @Test
    void cellsApplyTheSchemaBoundsAfterUnitScaling() throws BadValueException {
        Column qg = Schema.of(Kind.SWITCH).column("q_g_nc").orElseThrow();
        // switch.schema.json: q_g_nc has exclusiveMinimum 0
        assertEquals(130.0, Cells.parse(qg, "0.13 uC", false));
        BadValueException zero = assertThrows(BadValueException.class, () -> Cells.parse(qg, "0 nC", false));
        assertTrue(zero.getMessage().contains("above 0"), zero.getMessage());
        BadValueException neg = assertThrows(BadValueException.class, () -> Cells.parse(qg, "-5", false));
        assertTrue(neg.getMessage().contains("expected"), neg.getMessage());
    }
}
