package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 14, finding 5: a number cell is read in time linear in its length (longer than
 * {@link Units#MAX_NUMBER_CHARS} characters it is a bad cell, refused before it is parsed), and no
 * message quotes more than {@link Problem#QUOTED} characters of a cell. The cells are invented
 * inputs; the cap of 100 characters is common practice, no source (a double has 17 significant
 * digits).
 */
class LongCellTest {
    private static final String MILLION = "7".repeat(1_000_000);

    /** Every NUMBER and INTEGER column of every kind. */
    static Stream<Column> numberColumns() {
        List<Column> out = new ArrayList<>();
        for (Kind k : Kind.values()) {
            for (Column c : Schema.of(k).columns()) {
                if (c.type() == ColumnType.NUMBER || c.type() == ColumnType.INTEGER) {
                    out.add(c);
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("numberColumns")
    void aNumberOfMoreThanAHundredCharactersIsABadCellAndAHundredIsRead(Column c) {
        String hundred = "0".repeat(99) + "1"; // leading zeros: the value 1
        BadValueException e = assertThrows(BadValueException.class, () -> Cells.parse(c, hundred + "0", false));
        assertTrue(e.getMessage().contains("too long for a number") && e.getMessage().contains("at most 100 characters"),
                e.getMessage());
        try {
            Object v = Cells.parse(c, hundred, false);
            assertEquals(1.0, ((Number) v).doubleValue(), 0.0);
        } catch (BadValueException out) { // a column whose bounds exclude 1: a range message, not a length one
            assertFalse(out.getMessage().contains("too long"), out.getMessage());
        }
    }

    /** A column with a unit (Units.parse), one without (a plain number), and an integer column. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("threeWaysOfReadingANumber")
    void aMillionDigitCellIsRefusedWithAShortMessage(Column c) {
        BadValueException e = assertThrows(BadValueException.class, () -> Cells.parse(c, MILLION, false));
        String m = e.getMessage();
        assertTrue(m.startsWith("'" + "7".repeat(Problem.QUOTED) + "…' (1,000,000 characters) is too long"), m);
        assertTrue(m.length() < 250, m.length() + " characters: " + m);
    }

    static Stream<Column> threeWaysOfReadingANumber() {
        Schema s = Schema.of(Kind.SWITCH);
        return Stream.of(s.column("q_g_nc").orElseThrow(), s.column("unit_price").orElseThrow(),
                s.column("stock").orElseThrow());
    }

    @Test
    void commandLineQuantitiesHaveTheSameCap() {
        BadValueException e = assertThrows(BadValueException.class, () -> Units.parse(MILLION + "nC", Unit.parse("nC"), false));
        assertTrue(e.getMessage().contains("(1,000,002 characters) is too long"), e.getMessage());
        BadValueException i = assertThrows(BadValueException.class, () -> Units.parseInteger(MILLION));
        assertTrue(i.getMessage().length() < 250, i.getMessage());
    }

    @Test
    void aLongTextCellIsQuotedShortInEveryMessage() {
        Column choice = Schema.of(Kind.SWITCH).column("technology").orElseThrow();
        BadValueException e = assertThrows(BadValueException.class, () -> Cells.parse(choice, "x".repeat(50_000), false));
        assertTrue(e.getMessage().startsWith("'" + "x".repeat(80) + "…' (50,000 characters) is not one of"),
                e.getMessage());
    }

    @Test
    void aLongDesignatorOrRangeIsABadCellWithAShortMessage() {
        // Reading the digits of "R1-R999…9" as a number takes time growing with their square.
        BadValueException e = assertThrows(BadValueException.class, () -> Bom.expand("R1-R" + "9".repeat(1_000_000)));
        assertTrue(e.getMessage().contains("too long for a designator") && e.getMessage().length() < 250,
                () -> e.getMessage().length() + ": " + Problem.excerpt(e.getMessage()));
        // Spaces around a dash are joined in one pass; a cell of a million spaces is simply empty.
        assertEquals(List.of(), assertDoesNotThrowExpand(" ".repeat(1_000_000)));
        assertEquals(List.of("Q3", "Q4", "Q5", "Q6"), assertDoesNotThrowExpand("Q3  –  Q6"));
    }

    private static List<String> assertDoesNotThrowExpand(String cell) {
        try {
            return Bom.expand(cell);
        } catch (BadValueException e) {
            throw new AssertionError(e.getMessage(), e);
        }
    }

    @Test
    void aProblemKeepsAndQuotesAtMostEightyCharactersNeverHalfASurrogatePair() {
        Problem p = new Problem("f.csv", 2, "q_g_nc", 7, MILLION, "bad");
        assertEquals("7".repeat(80) + "… (1,000,000 characters)", p.text());
        // 'a' then emoji (two chars each): the 80th character is the first half of a pair, so 79 are kept.
        String emoji = "a" + "\uD83D\uDE00".repeat(50);
        String q = Problem.quote(emoji);
        assertEquals("'" + emoji.substring(0, 79) + "…' (101 characters)", q);
        assertEquals("'short'", Problem.quote("short"));
    }
}
