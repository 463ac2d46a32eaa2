package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.Size;

/**
 * Invariant: whatever bytes come in, {@link SheetReader#read} either reads the file cleanly or
 * returns problems that name the file and a line inside it; it never throws. Inputs are random
 * bytes and random edits (delete, insert, replace characters; swap lines) of a small valid
 * catalog of invented parts.
 */
class ImportPropertiesTest {
    private static final String NAME = "fuzz.csv";
    static final String VALID = """
            part_number,maker,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc,r_g_int_ohm,description,lifecycle
            TST-001,Testmaker,si-mosfet,100,20,-20,50,1R5,"plain, quoted",active
            TST-002,Testmaker,sic-mosfet,1.2kV,22 V,-8,0.13 uC,4k7,"two
            lines",nrnd
            TST-003,Testmaker,gan-hemt,650,7,-10,6 nC,,=1+2,
            """;

    @Example
    void theSeedCatalogIsValid() throws IOException {
        List<Row> rows = new ArrayList<>();
        SheetReader.Summary s = read(VALID.getBytes(StandardCharsets.UTF_8), null, rows);
        assertTrue(s.clean(), s.problems().toString());
        assertEquals(3, rows.size());
        assertEquals(List.of(2L, 3L, 5L), rows.stream().map(Row::line).toList(), "physical start lines");
    }

    @Property(tries = 300, edgeCases = EdgeCasesMode.MIXIN)
    void randomBytesGiveACleanReadOrLocatedProblems(@ForAll @Size(max = 400) byte[] bytes) throws IOException {
        check(bytes);
    }

    @Property(tries = 300, edgeCases = EdgeCasesMode.MIXIN)
    void randomBytesAfterAValidHeaderGiveACleanReadOrLocatedProblems(@ForAll @Size(max = 300) byte[] bytes)
            throws IOException {
        byte[] header = VALID.substring(0, VALID.indexOf('\n') + 1).getBytes(StandardCharsets.UTF_8);
        byte[] all = Arrays.copyOf(header, header.length + bytes.length);
        System.arraycopy(bytes, 0, all, header.length, bytes.length);
        check(all);
    }

    @Property(tries = 300, edgeCases = EdgeCasesMode.MIXIN)
    void editedCatalogsGiveACleanReadOrLocatedProblems(@ForAll("edits") List<Edit> edits) throws IOException {
        String text = VALID;
        for (Edit e : edits) {
            text = e.apply(text);
        }
        check(text.getBytes(StandardCharsets.UTF_8));
    }

    /** Any number-like cell text gives a finite value or a {@link BadValueException}, in every column unit. */
    @Property(tries = 300, edgeCases = EdgeCasesMode.MIXIN)
    void numberLikeCellsGiveAFiniteValueOrABadValue(@ForAll("numberLike") String cell) {
        for (Kind kind : new Kind[] {Kind.SWITCH, Kind.DRIVER}) {
            for (Column c : Schema.of(kind).columns()) {
                for (boolean comma : new boolean[] {false, true}) {
                    try {
                        Object v = Cells.parse(c, cell, comma);
                        if (v instanceof Double d) {
                            assertTrue(Double.isFinite(d), c.name() + " <- '" + cell + "' gave " + d);
                        }
                    } catch (BadValueException e) {
                        assertTrue(e.getMessage().contains("expected"), e.getMessage());
                    }
                }
            }
        }
    }

    @Provide
    Arbitrary<String> numberLike() {
        Arbitrary<String> digits = Arbitraries.strings().withChars("0123456789").ofMinLength(1).ofMaxLength(14);
        Arbitrary<String> bits = Arbitraries.oneOf(digits, Arbitraries.of(".", ",", "e", "E", "e-", "e+", "-", "+", " ",
                "n", "u", "\u00B5", "k", "K", "M", "G", "T", "R", "m", "p", "V", "A", "C", "s", "Hz", "F", "W", "%",
                "Ohm", "\u03A9", "NaN", "Infinity"));
        return bits.list().ofMinSize(1).ofMaxSize(6).map(l -> String.join("", l));
    }

    /** One edit of the text; positions are taken modulo its length. */
    record Edit(int op, int a, int b, char c) {
        String apply(String t) {
            if (t.isEmpty()) {
                return String.valueOf(c);
            }
            int i = Math.floorMod(a, t.length());
            return switch (op) {
                case 0 -> t.substring(0, i) + t.substring(i + 1);
                case 1 -> t.substring(0, i) + c + t.substring(i);
                case 2 -> t.substring(0, i) + c + t.substring(i + 1);
                default -> swapLines(t, a, b);
            };
        }

        private static String swapLines(String t, int a, int b) {
            List<String> lines = new ArrayList<>(Arrays.asList(t.split("\n", -1)));
            int i = Math.floorMod(a, lines.size());
            int j = Math.floorMod(b, lines.size());
            String x = lines.get(i);
            lines.set(i, lines.get(j));
            lines.set(j, x);
            return String.join("\n", lines);
        }
    }

    @Provide
    Arbitrary<List<Edit>> edits() {
        Arbitrary<Character> chars = Arbitraries.oneOf(
                Arbitraries.of(',', ';', '\t', '"', '\n', '\r', ' ', '\'', '=', '-', '.', 'e', 'n', 'u', 'k', 'R',
                        '\u00B5', '\u03BC', '\uFFFD', '\u0000', '\uFEFF', '0', '9'),
                Arbitraries.chars());
        Arbitrary<Edit> edit = Combinators.combine(Arbitraries.integers().between(0, 3),
                Arbitraries.integers().between(0, 10_000), Arbitraries.integers().between(0, 10_000), chars)
                .as(Edit::new);
        return edit.list().ofMinSize(1).ofMaxSize(8);
    }

    private static SheetReader.Summary read(byte[] bytes, Kind kind, List<Row> rows) throws IOException {
        return SheetReader.read(new ByteArrayInputStream(bytes), NAME, kind, new SheetReader.Sink() {
            @Override
            public void accept(Row row) {
                rows.add(row);
            }
        });
    }

    /** Reads as told by the columns and as a forced switch catalog; both must hold the invariant. */
    private static void check(byte[] bytes) throws IOException {
        long lines = 1;
        for (byte x : bytes) {
            if (x == '\n' || x == '\r') {
                lines++;
            }
        }
        for (Kind kind : new Kind[] {null, Kind.SWITCH}) {
            List<Row> rows = new ArrayList<>();
            SheetReader.Summary s = read(bytes, kind, rows);
            assertEquals(NAME, s.file());
            assertEquals(s.rows(), rows.size());
            assertTrue(s.rows() + s.rejected() <= lines, "more rows than lines: " + s);
            for (Row r : rows) {
                assertEquals(NAME, r.file());
                assertTrue(r.line() >= 1 && r.line() <= lines, "row line " + r.line() + " of " + lines);
            }
            if (s.clean()) {
                assertTrue(s.problems().isEmpty());
                assertFalse(s.fatal());
                assertTrue(s.rows() > 0, "a clean read has rows");
                continue;
            }
            assertFalse(s.problems().isEmpty(), "problems counted must be listed: " + s);
            for (Problem p : s.problems()) {
                assertEquals(NAME, p.file());
                assertTrue(p.line() >= 0 && p.line() <= lines, "problem line " + p.line() + " of " + lines + ": " + p);
                if (p.column() != null) {
                    assertTrue(p.line() >= 1, "a cell problem has a line: " + p);
                }
                assertFalse(p.message().isBlank());
                assertTrue(p.toString().startsWith(NAME), p.toString());
            }
        }
    }
}
