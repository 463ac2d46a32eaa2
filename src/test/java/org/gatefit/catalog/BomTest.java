package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@link Bom}: designator lists and ranges as EDA tools write them (a range {@code Q3-Q6} names
 * every number from 3 to 6 inclusive; common practice of schematic tools, no source), header
 * synonyms, do-not-place rows and the quantity cross-check.
 */
class BomTest {
    @TempDir
    Path tmp;

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "Q1, Q3-Q6      | Q1 Q3 Q4 Q5 Q6",
        "R1-R6, R16     | R1 R2 R3 R4 R5 R6 R16",
        "U01-U03        | U01 U02 U03",
        "U08-U10        | U08 U09 U10",
        "Q3 - Q5        | Q3 Q4 Q5",
        "Q3 – Q5        | Q3 Q4 Q5",
        "Q3-5           | Q3 Q4 Q5",
        "q1;q2          | Q1 Q2",
        "R9, R14-R15, R17 | R9 R14 R15 R17",
        "U7-U7          | U7",
    })
    void expandsListsAndRanges(String cell, String expected) throws Exception {
        assertEquals(List.of(expected.split(" ")), Bom.expand(cell));
    }

    @Test
    void aBackwardsRangeIsAClearError() {
        BadValueException e = assertThrows(BadValueException.class, () -> Bom.expand("Q6-Q3"));
        assertTrue(e.getMessage().contains("Q6-Q3") && e.getMessage().contains("backwards"), e.getMessage());
    }

    @Test
    void aRangeMixingPrefixesIsAClearError() {
        BadValueException e = assertThrows(BadValueException.class, () -> Bom.expand("Q3-R6"));
        assertTrue(e.getMessage().contains("Q3-R6") && e.getMessage().contains("mixes prefixes"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource({"R1-R999999", "R1-R99999999999999999999999"})
    void aHugeRangeIsAClearError(String cell) {
        BadValueException e = assertThrows(BadValueException.class, () -> Bom.expand(cell));
        assertTrue(e.getMessage().contains(cell) && e.getMessage().contains("at most " + Bom.RANGE_LIMIT),
                e.getMessage());
    }

    @Test
    void somethingThatIsNoDesignatorIsAClearError() {
        BadValueException e = assertThrows(BadValueException.class, () -> Bom.expand("Q1, 4.7k"));
        assertTrue(e.getMessage().contains("'4.7k'"), e.getMessage());
    }

    private Path write(String name, String text) throws Exception {
        Path p = tmp.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "Reference,MPN,Qty",
        "REFDES,mpn,QTY",
        "refdes,Manufacturer Part Number,Quantity",
        "Designator,Part Number,qty",
    })
    void headerSynonymsMatchCaseInsensitively(String header) throws Exception {
        // columns in the header's order: designator, part number, quantity
        Bom b = Bom.read(write("bom.csv", header + "\n\"Q1, Q3-Q4\",TST-SW1,3\nU1,TST-DRV1,1\n"), "bom.csv");
        assertEquals(4, b.size());
        assertEquals("TST-SW1", b.get("q3").orElseThrow().partNumber());
        assertEquals("TST-DRV1", b.get("U1").orElseThrow().partNumber());
        assertFalse(b.get("Q2").isPresent(), "Q2 is not in 'Q1, Q3-Q4'");
        assertTrue(b.notes().isEmpty(), "quantities match: " + b.notes());
    }

    @Test
    void aQuantityDisagreeingWithTheDesignatorsIsANoteNamingTheLine() throws Exception {
        Bom b = Bom.read(write("bom.csv", "Designator,Qty,MPN\nU1,1,TST-DRV1\nQ1-Q4,3,TST-SW1\n"), "bom.csv");
        assertEquals(List.of("bom.csv line 3: quantity 3 but 4 designators (Q1-Q4)"), b.notes());
    }

    @Test
    void aDoNotPlaceRowIsKeptAndMarked() throws Exception {
        Bom b = Bom.read(write("bom.csv", "Designator,MPN,DNP\nQ1,TST-SW1,no\nQ2,TST-SW1,yes\n"), "bom.csv");
        assertFalse(b.get("Q1").orElseThrow().doNotPlace());
        assertTrue(b.get("Q2").orElseThrow().doNotPlace());
    }

    @Test
    void aBomWithoutADesignatorOrPartColumnListsTheColumnsFound() throws Exception {
        CatalogDataException e = assertThrows(CatalogDataException.class,
                () -> Bom.read(write("a.csv", "Part,MPN,Qty\nU1,TST-DRV1,1\n"), "a.csv"));
        assertTrue(e.getMessage().contains("designator") && e.getMessage().contains("Part, MPN, Qty"), e.getMessage());
        e = assertThrows(CatalogDataException.class,
                () -> Bom.read(write("b.csv", "RefDes,Value\nU1,TST-DRV1\n"), "b.csv"));
        assertTrue(e.getMessage().contains("part-number") && e.getMessage().contains("RefDes, Value"), e.getMessage());
    }

    @Test
    void aBadRangeInABomCellIsReportedWithLineAndColumn() throws Exception {
        CatalogDataException e = assertThrows(CatalogDataException.class,
                () -> Bom.read(write("c.csv", "Designator,MPN\nU1,TST-DRV1\nQ6-Q3,TST-SW1\n"), "c.csv"));
        assertTrue(e.getMessage().contains("c.csv line 3") && e.getMessage().contains("column Designator")
                && e.getMessage().contains("backwards"), e.getMessage());
    }
}
