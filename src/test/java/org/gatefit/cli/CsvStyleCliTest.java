package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.text.NumberFormat;
import java.text.ParsePosition;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 19, CSV for spreadsheets in any locale: {@code --csv-style semicolon} on every command that
 * writes CSV gives semicolon separators, decimal commas and a UTF-8 byte-order mark, and holds the
 * same table as the default comma style. Read back as a German-locale spreadsheet would: Apache
 * Commons CSV with ';', numbers through {@link NumberFormat} for {@link Locale#GERMANY}.
 */
class CsvStyleCliTest {
    /** The UTF-8 encoding of U+FEFF (RFC 3629 section 6; the Unicode Standard, "byte order mark"). */
    private static final byte[] UTF8_BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};
    private static final List<String> POINT = List.of("--freq", "200", "--bus", "375", "--edge", "10", "--drive", "6",
            "--rg", "10", "--rg-off", "0.5", "--loop", "3", "--v-oh", "4.6", "--v-ol", "0.2");

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    /** Every command that writes CSV, with arguments that give it rows (export writes CSV by default). */
    private List<List<String>> commands() throws Exception {
        String stages = Project.file("examples/stages.csv").toString();
        String bom = Project.file("examples/bom.csv").toString();
        List<List<String>> out = new ArrayList<>();
        List<String> shortlist = new ArrayList<>(List.of("shortlist", "--switch", "QND-65G150D", "--all"));
        shortlist.addAll(POINT);
        out.add(shortlist);
        List<String> explain = new ArrayList<>(List.of("explain", "--driver", "QND-D06L", "--switch", "QND-65G150D"));
        explain.addAll(POINT);
        out.add(explain);
        List<String> compare = new ArrayList<>(List.of("explain", "--driver", "QND-D06L", "--driver", "VHM-4410N",
                "--switch", "QND-65G150D"));
        compare.addAll(POINT);
        out.add(compare);
        out.add(List.of("check", stages, "--bom", bom));
        out.add(List.of("replace", "CVL-1025TL", "--stages", stages, "--bom", bom));
        out.add(List.of("find", "--kind", "driver"));
        out.add(List.of("show", "QND-65G150D"));
        out.add(List.of("info"));
        Path bad = tmp.resolve("bad.csv");
        Files.writeString(bad, "part_number,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\n"
                + "TST-BAD1,si-mosfet,13O,20,-20,30\nTST-BAD2,si-mosfet,100,20,-20,3O\n", StandardCharsets.UTF_8);
        out.add(List.of("validate", bad.toString()));
        out.add(List.of("export", "--kind", "switch"));
        return out;
    }

    private byte[] write(List<String> command, String style) throws Exception {
        Path file = tmp.resolve(command.get(0) + "-" + style + ".csv");
        List<String> a = new ArrayList<>(command);
        if (!command.get(0).equals("export")) {
            a.addAll(List.of("--format", "csv"));
        }
        a.addAll(List.of("--csv-style", style, "--output", file.toString()));
        CliRun r = CliRun.on(catalog, a.toArray(String[]::new));
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED || command.get(0).equals("validate"), r.dump());
        return Files.readAllBytes(file);
    }

    private static List<CSVRecord> read(String text, char delimiter) throws Exception {
        return CSVFormat.DEFAULT.builder().setDelimiter(delimiter).get().parse(new StringReader(text)).getRecords();
    }

    /** {@code cell} read as a German spreadsheet reads a number, or null when it is not one (in full). */
    private static Number german(String cell) {
        ParsePosition at = new ParsePosition(0);
        Number n = NumberFormat.getInstance(Locale.GERMANY).parse(cell, at);
        return at.getIndex() == cell.length() && at.getErrorIndex() < 0 ? n : null;
    }

    private static Double plain(String cell) {
        try {
            return Double.valueOf(cell);
        } catch (NumberFormatException e) {
            return null;
        }
    }

    @Test
    void semicolonStyleIsTheSameTableWithDecimalCommasAndAByteOrderMark() throws Exception {
        for (List<String> command : commands()) {
            String what = String.join(" ", command);
            byte[] semi = write(command, "semicolon");
            byte[] comma = write(command, "comma");
            assertArrayEquals(UTF8_BOM, Arrays.copyOf(semi, 3), what + ": the UTF-8 byte-order mark first");
            assertTrue(comma.length > 0 && comma[0] != UTF8_BOM[0], what + ": the comma style has none");
            List<CSVRecord> s = read(new String(semi, 3, semi.length - 3, StandardCharsets.UTF_8), ';');
            List<CSVRecord> c = read(new String(comma, StandardCharsets.UTF_8), ',');
            assertTrue(c.size() >= 2, what + ": a header and rows");
            assertEquals(c.size(), s.size(), what + ": records");
            int numbers = 0;
            int fractions = 0;
            for (int i = 0; i < c.size(); i++) {
                assertEquals(c.get(i).size(), s.get(i).size(), what + " record " + i);
                for (int j = 0; j < c.get(i).size(); j++) {
                    String want = c.get(i).get(j);
                    String got = s.get(i).get(j);
                    Double v = plain(want);
                    if (v == null || want.isBlank()) {
                        assertEquals(want, got, what + " record " + i + " column " + j);
                        continue;
                    }
                    Number g = german(got);
                    assertTrue(g != null, what + ": '" + got + "' (comma style '" + want + "') is a number to a German"
                            + " spreadsheet");
                    assertEquals(v, g.doubleValue(), Math.abs(v) * 1e-12, what + ": " + got);
                    assertTrue(!got.contains("E") && !got.contains("e"), what + ": plain decimals, got " + got);
                    numbers++;
                    if (got.contains(",")) {
                        fractions++;
                    }
                }
            }
            if (List.of("shortlist", "explain", "replace", "show", "export").contains(command.get(0))) {
                assertTrue(fractions > 0, what + ": some numbers with a decimal comma (" + numbers + " numbers)");
            }
        }
    }

    @Test
    void aSemicolonExportImportsBackToTheSameCatalog() throws Exception {
        for (String kind : List.of("switch", "driver")) {
            Path semi = tmp.resolve(kind + "-semi.csv");
            assertEquals(ExitCode.OK, CliRun.on(catalog, "export", "--kind", kind, "--csv-style", "semicolon",
                    "--output", semi.toString()).exit());
            Path again = tmp.resolve("again-" + kind);
            CliRun imp = CliRun.on(again, "import", semi.toString());
            assertEquals(ExitCode.OK, imp.exit(), imp.dump());
            String before = CliRun.on(catalog, "export", "--kind", kind).out();
            String after = CliRun.on(again, "export", "--kind", kind).out();
            assertEquals(before, after, kind + ": the same parts back");
        }
    }

    @Test
    void theStyleIsForCsvOnlyAndItsDefaultIsPrinted() {
        CliRun r = CliRun.on(catalog, "find", "--kind", "driver", "--format", "json", "--csv-style", "semicolon");
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertTrue(r.err().contains("--csv-style semicolon applies to --format csv only, got --format json"), r.dump());
        for (String command : List.of("shortlist", "explain", "check", "replace", "find", "show", "info", "validate",
                "export")) {
            CliRun help = CliRun.on(catalog, command, "--help");
            String flat = help.out().replaceAll("\\s+", " ");
            assertTrue(flat.contains("--csv-style=STYLE") && flat.contains("(default: comma)"), command + ":\n"
                    + help.out());
        }
    }
}
