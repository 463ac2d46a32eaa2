package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 14, finding 7: the names of extra columns are outside text like the cells, so a CSV export
 * neutralises a header cell a spreadsheet would run as a formula (a leading = + - @, tab or CR:
 * OWASP, CSV injection) with a leading apostrophe, and import removes it again: export, import,
 * export gives the same file. Invented parts (maker Testmaker, TST-…).
 */
class FormulaHeaderTest {
    /** Extra column names that start a formula, and one that is plain. */
    static final List<String> HOSTILE = List.of("=HYPERLINK(\"http://example.invalid\",\"x\")", "@SUM(A1)", "+1+1",
            "-2+3", "'=quoted", "notes");

    @TempDir
    Path tmp;

    @Test
    void headerCellsAreNeutralisedLikeValueCellsAndImportRestoresThem() throws Exception {
        StringBuilder head = new StringBuilder(BadInputTest.HEADER);
        StringBuilder row = new StringBuilder(BadInputTest.row("TST-100", "40"));
        for (String h : HOSTILE) {
            head.append(',').append(FormulaHeaderTest.quote(h));
            row.append(",=1+1");
        }
        Path in = Files.writeString(tmp.resolve("in.csv"), head + "\n" + row + "\n", StandardCharsets.UTF_8);
        Path first = tmp.resolve("first");
        assertEquals(ExitCode.OK, CliRun.on(first, "import", in.toString()).exit());
        CliRun export = CliRun.on(first, "export", "--kind", "switch");
        assertEquals(ExitCode.OK, export.exit(), export.dump());

        List<CSVRecord> recs = CSVFormat.DEFAULT.parse(new StringReader(export.out())).getRecords();
        List<String> header = recs.get(0).toList();
        for (String h : header) {
            assertTrue("=+-@\t\r".indexOf(h.charAt(0)) < 0, "no header cell starts a formula: " + h);
        }
        List<String> extras = header.subList(header.size() - HOSTILE.size(), header.size());
        assertEquals(List.of("'=HYPERLINK(\"http://example.invalid\",\"x\")", "'@SUM(A1)", "'+1+1", "'-2+3",
                "'=quoted", "notes"), extras); // '=quoted was read as =quoted, as a value cell is
        assertEquals("'=1+1", recs.get(1).get(header.size() - 1), "value cells as before");

        // The export imports as the same catalog: the names come back without the apostrophe.
        Path again = Files.writeString(tmp.resolve("again.csv"), export.out(), StandardCharsets.UTF_8);
        Path second = tmp.resolve("second");
        assertEquals(ExitCode.OK, CliRun.on(second, "import", again.toString()).exit());
        assertEquals(export.out(), CliRun.on(second, "export", "--kind", "switch").out());
        String shown = CliRun.on(second, "show", "TST-100").out();
        assertTrue(shown.contains("=HYPERLINK(\"http://example.invalid\",\"x\")") && !shown.contains("'=HYPERLINK"), shown);
    }

    static String quote(String s) {
        return "\"" + s.replace("\"", "\"\"") + "\"";
    }
}
