package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * {@link Cells#parseQuick} (cells read straight from the CSV characters) gives what
 * {@link Cells#parse} gives for the same text, value and type, bit for bit, in every column of
 * every schema, with and without decimal comma; where it is not sure it gives null and the import
 * asks {@link Cells#parse}. The check values are {@link Cells#parse}'s own results.
 */
class QuickCellsTest {

    /** Reads {@code cell} quickly from inside a larger buffer (junk on both sides), as the lexer holds it. */
    private static Object quick(Column c, String cell, boolean comma) {
        String padded = "\"x,;" + cell + "\n\u00e9";
        return Cells.parseQuick(c, Cells.quickChoices(c), padded.toCharArray(), 4, 4 + cell.length(), comma);
    }

    private static Object general(Column c, String cell, boolean comma) {
        try {
            return Cells.parse(c, cell, comma);
        } catch (BadValueException e) {
            return e;
        }
    }

    private static List<Column> allColumns() {
        List<Column> all = new ArrayList<>();
        for (Kind k : Kind.values()) {
            all.addAll(Schema.of(k).columns());
        }
        return all;
    }

    /** Returns whether the quick path answered. */
    private static boolean agree(Column c, String cell, boolean comma) {
        Object q = quick(c, cell, comma);
        if (q == null) {
            return false;
        }
        Object g = general(c, cell, comma);
        assertEquals(g == null ? null : g.getClass(), q.getClass(), () -> c.name() + " <- '" + cell + "' comma " + comma);
        assertEquals(g, q, () -> c.name() + " <- '" + cell + "' comma " + comma); // Double.equals compares bits: -0 ≠ +0
        return true;
    }

    @Provide
    Arbitrary<String> cells() {
        Arbitrary<String> digits = Arbitraries.strings().withChars("0123456789").ofMinLength(1).ofMaxLength(17);
        Arbitrary<String> bits = Arbitraries.oneOf(digits, digits, Arbitraries.of(".", ",", "e", "E", "e-", "e+", "-", "+",
                " ", "\t", "\u2003", "\u00a0", "\u001f", "n", "u", "\u00b5", "k", "K", "M", "R", "m", "p", "V", "A", "nC",
                "%", "Ohm", "NaN", "Infinity", "yes", "no", "Y", "true", "active", "Active", "si-mosfet", "low-side", "0x"));
        return bits.list().ofMinSize(1).ofMaxSize(5).map(l -> String.join("", l));
    }

    @Property(tries = 1500, edgeCases = EdgeCasesMode.MIXIN)
    void theQuickPathReadsAsParseReads(@ForAll("cells") String cell) {
        for (Column c : allColumns()) {
            agree(c, cell, false);
            agree(c, cell, true);
        }
    }

    @Example
    void edgeCasesReadAsParseReadsThem() {
        // Exponents, SI prefixes, IEC 60062 codes (4k7 = 4.7 kΩ, R47 = 0.47 Ω, 4n7 = 4.7 nF), signs, zeros,
        // NaN and infinities, spaces (ASCII, em space U+2003, no-break space U+00A0), decimal commas, long digit runs.
        String[] cases = {"1e3", "1E-3", "2.5e+2", "4k7", "2R2", "R47", "1M0", "4n7", "130nC", "0.13 uC", "4.7\u00b5F",
            "95%", "NaN", "Infinity", "-Infinity", "+5", "-5", "-0", "-0.0", "+0", "0", "0.0", "00012", " 12 ", "\t12\t",
            "\u200312", "12\u00a0", " 1 2 ", "12,5", "-12,5", "1,234.5", "1.234,5", ",5", "+.5", "7.", ".", "-", "+", "",
            "   ", "123456789012345", "1234567890123456", "123456789012345678", "1234567890123456789", "0000000000000001",
            "999999999999999.9", "0.000000000000001", "0.1", "2.675", "9007199254740993", "1.5.2", "--1", "+-1", "yes",
            "no", "YES", "y", "1", "true", " no ", "active", "nrnd", "Active", "si-mosfet", "low-side", "1200", "-20",
            "25", "-10", "1e99999999999", "5 V", "12 A"};
        for (Column c : allColumns()) {
            for (String t : cases) {
                agree(c, t, false);
                agree(c, t, true);
            }
        }
    }

    @Example
    void plainNumbersAndExactChoicesAreTakenQuicklyAndTheRestIsLeftToParse() {
        Schema sw = Schema.of(Kind.SWITCH);
        Column volts = sw.column("v_block_v").orElseThrow();
        Column qg = sw.column("q_g_nc").orElseThrow();
        Column price = sw.column("unit_price").orElseThrow();
        Column stock = sw.column("stock").orElseThrow();
        Column tech = sw.column("technology").orElseThrow();
        Column part = sw.column("part_number").orElseThrow();
        // A test that only ever saw null would prove nothing: these must be taken quickly.
        for (String t : new String[] {"650", " 650 ", "1200.5", "+12"}) {
            assertNotNull(quick(volts, t, false), t);
            assertEquals(true, agree(volts, t, false), t);
        }
        assertEquals(true, agree(price, "2,93", true), "a decimal comma in a column without unit");
        assertEquals(true, agree(stock, "15226", false));
        assertEquals(true, agree(tech, "sic-mosfet", false));
        // Left to Cells.parse: units, IEC codes, exponents, out of range, comma in a unit column, text columns.
        for (String t : new String[] {"0.13 uC", "1e3", "-5", "4,7", "NaN", "\u200312"}) {
            assertNull(quick(qg, t, true), t);
        }
        assertNull(quick(tech, "SiC-MOSFET", false), "not written exactly: Cells.parse lower-cases it");
        assertNull(quick(part, "TST-001", false), "text is always left to Cells.parse");
    }
}
