package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 14, finding 10: a BOM is read through the same front end as catalogs (SheetReader's), so a
 * header line longer than 64 KiB reads like any other, and input that is truly bad is a
 * CatalogDataException (exit 3) naming the file and line, never an I/O error. Invented designators
 * and parts (TST-…).
 */
class BomFrontEndTest {
    /** An extra column whose name alone is longer than the 64 KiB a mark/reset reader looked ahead. */
    static final String LONG = "notes " + "x".repeat(70_000);

    @TempDir
    Path tmp;

    private Path write(String name, byte[] bytes) throws Exception {
        return Files.write(tmp.resolve(name), bytes);
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void aHeaderLineLongerThan64KiBReadsLikeAnyOther() throws Exception {
        Bom b = Bom.read(write("bom.csv", utf8("Designator," + LONG + ",MPN\nQ1-Q2,,TST-SW1\nU1,,TST-DRV1\n")), "bom.csv");
        assertEquals(3, b.size());
        assertEquals("TST-SW1", b.get("Q2").orElseThrow().partNumber());
        assertEquals(3, b.get("U1").orElseThrow().line());
    }

    @Test
    void aLongSemicolonSeparatedHeaderAfterAByteOrderMarkReadsToo() throws Exception {
        ByteArrayOutputStream f = new ByteArrayOutputStream();
        f.write(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF});
        f.writeBytes(utf8("Designator;\"" + LONG + "\";MPN\r\nQ1;;TST-SW1\r\n"));
        Bom b = Bom.read(write("bom.csv", f.toByteArray()), "bom.csv");
        assertEquals("TST-SW1", b.get("Q1").orElseThrow().partNumber());
    }

    @Test
    void aBadRowAfterALongHeaderIsBadInputNamingFileAndLine() throws Exception {
        CatalogDataException e = assertThrows(CatalogDataException.class, () -> Bom.read(write("bad.csv",
                utf8("Designator," + LONG + ",MPN\nQ1,,TST-SW1\nQ2,\"never closed,TST-SW1\n")), "bad.csv"));
        assertTrue(e.getMessage().startsWith("bad.csv line 3: a double quote opened in the row starting here is never"
                + " closed"), e.getMessage());
    }

    @Test
    void aHeaderWithoutTheColumnsListsWhatItFoundShortly() throws Exception {
        CatalogDataException e = assertThrows(CatalogDataException.class, () -> Bom.read(write("bad.csv",
                utf8("Designator," + LONG + "\nQ1,x\n")), "bad.csv"));
        assertTrue(e.getMessage().startsWith("bad.csv line 1: the BOM header lacks a part-number column"), e.getMessage());
        assertTrue(e.getMessage().length() < 400, () -> Problem.excerpt(e.getMessage()));
    }

    @Test
    void windows1252AndUtf16AreReadAndAFileNeitherUtf8NorWindows1252IsBadInputNamingFileAndLine() throws Exception {
        byte[] latin1 = "Designator,MPN\nQ1,TST-SW1\nQ2,TST-\u00e9\n".getBytes(StandardCharsets.ISO_8859_1);
        List<String> notes = new java.util.ArrayList<>();
        Bom b = Bom.read(write("l.csv", latin1), "l.csv", new SheetReader.Options(null, 0, null, null, notes::add));
        assertEquals("TST-\u00e9", b.get("Q2").orElseThrow().partNumber());
        assertEquals(List.of("note: l.csv: not UTF-8 text; read as Windows-1252 (--encoding NAME reads another encoding)"),
                notes);
        byte[] utf16 = "Designator,MPN\nQ1,TST-SW1\n".getBytes(StandardCharsets.UTF_16);
        assertEquals("TST-SW1", Bom.read(write("w.csv", utf16), "w.csv").get("Q1").orElseThrow().partNumber());
        // 0x81 is undefined in Windows-1252 (and a lone continuation byte in UTF-8): never decoded silently
        byte[] neither = "Designator,MPN\nQ1,TST-SW1\nQ2,TST-\u0001\n".getBytes(StandardCharsets.ISO_8859_1);
        neither[neither.length - 2] = (byte) 0x81;
        CatalogDataException e = assertThrows(CatalogDataException.class, () -> Bom.read(write("n.csv", neither), "n.csv"));
        assertTrue(e.getMessage().startsWith("n.csv line 3: the file is neither UTF-8 nor Windows-1252 text"), e.getMessage());
    }

    @Test
    void aBomWorkbookWithATitleRowAndItsOwnHeadingsIsRead() throws Exception {
        Path x = tmp.resolve("bom.xlsx");
        try (org.apache.poi.xssf.streaming.SXSSFWorkbook wb = new org.apache.poi.xssf.streaming.SXSSFWorkbook();
             java.io.OutputStream out = Files.newOutputStream(x)) {
            org.apache.poi.ss.usermodel.Sheet s = wb.createSheet("BOM");
            s.createRow(0).createCell(0).setCellValue("Board 7 BOM");
            String[][] rows = {{"Ref Des", "Qty", "Mfr. Part No."}, {"Q1, Q3-Q4", "3", "TST-SW1"}, {"U2", "1", "TST-DR1"}};
            for (int r = 0; r < rows.length; r++) {
                org.apache.poi.ss.usermodel.Row row = s.createRow(r + 2);
                for (int c = 0; c < rows[r].length; c++) {
                    if (r > 0 && c == 1) {
                        row.createCell(c).setCellValue(Double.parseDouble(rows[r][c]));
                    } else {
                        row.createCell(c).setCellValue(rows[r][c]);
                    }
                }
            }
            wb.write(out);
        }
        List<String> notes = new java.util.ArrayList<>();
        Bom b = Bom.read(x, "bom.xlsx", new SheetReader.Options(null, 0, null, null, notes::add));
        assertEquals("TST-SW1", b.get("Q4").orElseThrow().partNumber());
        assertEquals("TST-DR1", b.get("u2").orElseThrow().partNumber());
        assertEquals(List.of(), b.notes(), "quantity 3 for three designators");
        assertEquals(List.of("note: bom.xlsx: 1 row above the header skipped; the header is line 3"), notes);
    }
}
