package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Bad catalog files through the command line: exit 3, every problem located by file, physical
 * line (as an editor numbers lines) and column, and the catalog imported before left as it was.
 * The files are invented (maker "Testmaker", parts "TST-…"); their figures are input only.
 */
class BadInputTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    static final String HEADER = "part_number,maker,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc,description";

    static String row(String part, String qg) {
        return part + ",Testmaker,si-mosfet,100,20,-20," + qg + ",test part";
    }

    @TempDir
    Path tmp;
    Path catalog;
    String before;

    @BeforeEach
    void importAGoodCatalog() throws Exception {
        catalog = tmp.resolve("catalog");
        Path good = tmp.resolve("good.csv");
        Files.writeString(good, HEADER + "\n" + row("TST-100", "40") + "\n" + row("TST-101", "41") + "\n");
        CliRun r = CliRun.on(catalog, "import", good.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        before = export();
    }

    private String export() {
        CliRun e = CliRun.on(catalog, "export", "--kind", "switch");
        assertEquals(ExitCode.OK, e.exit(), e.dump());
        return e.out();
    }

    private Path write(String name, byte[] content) throws Exception {
        Path p = tmp.resolve(name);
        Files.write(p, content);
        return p;
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] concat(byte[]... parts) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (byte[] p : parts) {
            out.writeBytes(p);
        }
        return out.toByteArray();
    }

    /**
     * columns: case, file content, where ("line N" or "line N, column C", or null for the whole
     * file), a fragment of the message.
     */
    static Stream<Arguments> badFiles() {
        String h = HEADER + "\n";
        return Stream.of(
                Arguments.of("missing required column", utf8(HEADER.replace(",q_g_nc", "") + "\n"
                        + "TST-001,Testmaker,si-mosfet,100,20,-20,test\n"), "line 1", "missing required column q_g_nc"),
                Arguments.of("non-number", utf8(h + row("TST-001", "13O") + "\n"), "line 2, column q_g_nc",
                        "'13O'"),
                Arguments.of("wrong unit", utf8(h + row("TST-001", "12 A") + "\n"), "line 2, column q_g_nc",
                        "current"),
                Arguments.of("wrong unit in a volts column", utf8(h
                        + "TST-001,Testmaker,si-mosfet,12 A,20,-20,50,x\n"), "line 2, column v_block_v", "current"),
                Arguments.of("negative where forbidden", utf8(h + row("TST-001", "-5") + "\n"),
                        "line 2, column q_g_nc", "out of range"),
                Arguments.of("positive where the schema's maximum is 0", utf8(h
                        + "TST-001,Testmaker,si-mosfet,100,20,5,50,x\n"), "line 2, column v_gs_min_v", "at most 0"),
                Arguments.of("NaN", utf8(h + row("TST-001", "NaN") + "\n"), "line 2, column q_g_nc",
                        "not a number"),
                Arguments.of("exponent beyond any range", utf8(h + row("TST-001", "1e99999999999") + "\n"),
                        "line 2, column q_g_nc", "out of range"),
                Arguments.of("Infinity", utf8(h + row("TST-001", "Infinity") + "\n"), "line 2, column q_g_nc",
                        "not a number"),
                Arguments.of("required value empty", utf8(h + row("TST-001", "") + "\n"), "line 2, column q_g_nc",
                        "required"),
                Arguments.of("not one of the choices", utf8(h + "TST-001,Testmaker,vacuum-tube,100,20,-20,50,x\n"),
                        "line 2, column technology", "vacuum-tube"),
                Arguments.of("duplicate part number, case-insensitive", utf8(h + row("TST-001", "50") + "\n"
                        + row("tst-001", "60") + "\n"), "line 3, column part_number", "also on line 2"),
                Arguments.of("duplicate header", utf8(HEADER + ",Q_G_NC\n" + row("TST-001", "50") + ",51\n"),
                        "line 1, column q_g_nc", "duplicate column"),
                Arguments.of("too few cells", utf8(h + row("TST-001", "50") + "\nTST-002,Testmaker\n"), "line 3",
                        "2 cells"),
                Arguments.of("unbalanced quote", utf8(h + row("TST-001", "50") + "\n"
                        + "TST-002,Testmaker,si-mosfet,100,20,-20,50,\"never closed\n"
                        + row("TST-003", "50") + "\n"), "line 3, column description (8)", "never closed"),
                Arguments.of("text after a closing quote", utf8(h + row("TST-001", "50") + "\n"
                        + "TST-002,Testmaker,si-mosfet,100,20,-20,50,\"quoted\"tail\n"), "line 3, column description (8)",
                        "text follows a closing double quote"),
                Arguments.of("empty file", new byte[0], null, "empty"),
                Arguments.of("only blank lines", utf8("\n\n  \n"), null, "no header"),
                Arguments.of("header only", utf8(h), "line 1", "no rows"),
                Arguments.of("binary garbage", new byte[] {(byte) 0x89, 'P', 'N', 'G', 0x0d, 0x0a, 0x1a, 0x0a, 0, 0,
                    0, 0x0d, 'I', 'H', 'D', 'R', 0, 0, 1, 0, (byte) 0xff, (byte) 0xfe, 0x07}, "line 1", "UTF-8"),
                Arguments.of("control characters in the header", utf8("part\u0000number,\u0001\u0002\n1,2\n"),
                        "line 1", "control characters"),
                // 0x81 and 0x9D: invalid in UTF-8 and undefined in Windows-1252, the fallback (a file that is
                // only not UTF-8, such as 0xC3 0x28, is read as Windows-1252 with a note: SpreadsheetExportCliTest)
                Arguments.of("neither UTF-8 nor Windows-1252 on line 3", concat(utf8(h + row("TST-001", "50") + "\n"
                        + "TST-002,Testmaker,si-mosfet,100,20,-20,50,caf"), new byte[] {(byte) 0x81, 0x28},
                        utf8("\n" + row("TST-003", "50") + "\n")), "line 3", "UTF-8"),
                Arguments.of("neither UTF-8 nor Windows-1252 on line 3002, past the readers' buffers", concat(utf8(h
                        + manyRows(3000) + "TST-X,Testmaker,si-mosfet,100,20,-20,50,caf"), new byte[] {(byte) 0x9D},
                        utf8("\n" + row("TST-Y", "50") + "\n")), "line 3002", "UTF-8"),
                Arguments.of("UTF-16 file", "\uFEFF".concat(h).getBytes(StandardCharsets.UTF_16LE), "line 1",
                        "UTF-16"),
                Arguments.of("after a quoted multi-line cell and blank lines", utf8(h
                        + "TST-001,Testmaker,si-mosfet,100,20,-20,50,\"first line\nsecond line\nthird line\"\n"
                        + "\n\n" + row("TST-002", "13O") + "\n"), "line 7, column q_g_nc", "'13O'"),
                Arguments.of("CRLF, quoted multi-line cell and blank lines", utf8((h
                        + "TST-001,Testmaker,si-mosfet,100,20,-20,50,\"first line\nsecond line\"\n"
                        + "\n" + row("TST-002", "50") + "\n" + row("TST-003", "13O") + "\n").replace("\n", "\r\n")),
                        "line 6, column q_g_nc", "'13O'"),
                Arguments.of("semicolon-separated", utf8((h + row("TST-001", "50") + "\n" + row("TST-002", "13O")
                        + "\n").replace(',', ';')), "line 3, column q_g_nc", "'13O'"));
    }

    private static String manyRows(int n) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < n; i++) {
            sb.append(row("TST-" + i, "50")).append('\n');
        }
        return sb.toString();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badFiles")
    void badFilesExitThreeNameFileLineAndColumnAndLeaveTheCatalogIntact(String what, byte[] content, String where,
                                                                      String fragment) throws Exception {
        Path bad = write("bad-" + what.replaceAll("[^a-z0-9]+", "-") + ".csv", content);
        CliRun r = CliRun.on(catalog, "import", bad.toString());
        assertAll(
                () -> assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump()),
                () -> assertTrue(r.err().contains(bad.toString() + (where == null ? ":" : " " + where)),
                        "expected '" + bad + " " + where + "' in: " + r.dump()),
                () -> assertTrue(r.err().contains(fragment), "expected '" + fragment + "' in: " + r.dump()),
                () -> assertTrue(r.err().contains("expected"), "says what was expected: " + r.dump()),
                () -> assertFalse(r.err().contains("\tat "), "no stack trace: " + r.dump()),
                () -> assertEquals("", r.out(), "nothing on standard output: " + r.dump()));
        assertEquals(before, export(), "the catalog imported before is intact");
        CliRun v = CliRun.on(catalog, "validate", bad.toString());
        assertEquals(ExitCode.BAD_DATA, v.exit(), "validate agrees: " + v.dump());
    }

    @Test
    void aStageSheetIsRefusedByImportButAcceptedByValidate() throws Exception {
        Path stages = write("stages.csv", utf8("stage,driver,switch,f_sw_khz,v_drive_v\nS1,TST-D,TST-001,100,12\n"));
        CliRun r = CliRun.on(catalog, "import", stages.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains(stages + " line 1") && r.err().contains("stage sheet"), r.dump());
        assertEquals(before, export());
        assertEquals(ExitCode.OK, CliRun.on(catalog, "validate", stages.toString()).exit());
    }

    @Test
    void everyProblemOfAFileIsReportedAtOnce() throws Exception {
        Path bad = write("three.csv", utf8(HEADER + "\n" + row("TST-001", "13O") + "\n" + row("TST-002", "50") + "\n"
                + row("TST-003", "NaN") + "\n" + "TST-004,Testmaker,si-mosfet,12 A,20,-20,50,x\n"));
        CliRun r = CliRun.on(catalog, "import", bad.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertAll(
                () -> assertTrue(r.err().contains(bad + " line 2, column q_g_nc"), r.dump()),
                () -> assertTrue(r.err().contains(bad + " line 4, column q_g_nc"), r.dump()),
                () -> assertTrue(r.err().contains(bad + " line 5, column v_block_v"), r.dump()),
                () -> assertFalse(r.err().contains("line 3"), "the good row is not reported: " + r.dump()));
        assertEquals(before, export());
    }

    @Test
    void problemsOfSeveralFilesAreReportedTogetherAndNoneIsImported() throws Exception {
        Path good = write("fine.csv", utf8(HEADER + "\n" + row("TST-200", "50") + "\n"));
        Path bad = write("broken.csv", utf8(HEADER + "\n" + row("TST-201", "13O") + "\n"));
        Path bad2 = write("broken2.csv", utf8(HEADER + "\n" + row("TST-202", "-1") + "\n"));
        CliRun r = CliRun.on(catalog, "import", good.toString(), bad.toString(), bad2.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains(bad + " line 2, column q_g_nc"), r.dump());
        assertTrue(r.err().contains(bad2 + " line 2, column q_g_nc"), r.dump());
        assertEquals(before, export(), "the good file's row is not imported either (one commit)");
    }

    @Test
    void skipInvalidImportsTheGoodRowsAndWritesTheRejectedOnesWithReasons() throws Exception {
        Path mixed = write("mixed.csv", utf8(HEADER + "\n" + row("TST-001", "50") + "\n" + row("TST-002", "13O")
                + "\n" + row("TST-003", "51") + "\n" + row("TST-004", "-2") + "\n"));
        Path rejects = tmp.resolve("out/REJECTS.csv");
        Files.createDirectories(rejects.getParent());
        CliRun r = CliRun.on(catalog, "import", "--skip-invalid", rejects.toString(), mixed.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode parts = JSON.readTree(CliRun.on(catalog, "find", "--format", "json").out()).get("parts");
        List<String> got = new java.util.ArrayList<>();
        parts.forEach(p -> got.add(p.get("part_number").asText()));
        assertEquals(List.of("TST-001", "TST-003", "TST-100", "TST-101"), got.stream().sorted().toList());

        List<CSVRecord> rej = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(rejects))).getRecords();
        assertEquals(2, rej.size(), Files.readString(rejects));
        assertEquals("TST-002", rej.get(0).get("part_number"));
        assertEquals("13O", rej.get(0).get("q_g_nc"), "the rejected cells as they were");
        assertEquals("3", rej.get(0).get("rejected_line"));
        assertTrue(rej.get(0).get("rejected_because").contains("q_g_nc"), rej.get(0).toString());
        assertEquals("TST-004", rej.get(1).get("part_number"));
        assertEquals("5", rej.get(1).get("rejected_line"));
        assertTrue(rej.get(1).get("rejected_because").contains("out of range"), rej.get(1).toString());
        assertTrue(r.err().contains("2 rejected rows"), r.dump());
    }

    /** columns: case, file content; each holds TST-001 with q_g_nc 4.7 and v_block_v 100. */
    static Stream<Arguments> acceptedDialects() {
        String h = "part_number,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc";
        String r = "TST-001,si-mosfet,100,20,-20,4.7";
        return Stream.of(
                Arguments.of("comma", utf8(h + "\n" + r + "\n")),
                Arguments.of("semicolon with decimal comma", utf8((h + "\n" + r + "\n").replace(',', ';')
                        .replace("4.7", "4,7"))),
                Arguments.of("tab with decimal comma", utf8((h + "\n" + r + "\n").replace(',', '\t')
                        .replace("4.7", "4,7"))),
                Arguments.of("UTF-8 byte-order mark", concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
                        utf8(h + "\n" + r + "\n"))),
                Arguments.of("CRLF line ends", utf8(h + "\r\n" + r + "\r\n")),
                Arguments.of("no final line end", utf8(h + "\n" + r)),
                Arguments.of("BOM, semicolons and CRLF", concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
                        utf8((h + "\r\n" + r + "\r\n").replace(',', ';').replace("4.7", "4,7")))),
                Arguments.of("mixed-case and padded headers", utf8(" Part_Number , TECHNOLOGY,V_Block_V ,v_gs_max_v,"
                        + "V_GS_MIN_V,  q_g_nc\n" + r + "\n")),
                Arguments.of("units in cells", utf8(h + "\nTST-001,si-mosfet,0.1kV,20 V,-20V,4700 pC\n")),
                Arguments.of("blank lines around rows", utf8("\n" + h + "\n\n" + r + "\n\n")));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("acceptedDialects")
    void commonSpreadsheetDialectsImportFine(String what, byte[] content) throws Exception {
        Path f = write("dialect.csv", content);
        CliRun r = CliRun.on(catalog, "import", f.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode part = JSON.readTree(CliRun.on(catalog, "show", "TST-001", "--format", "json").out());
        // 4,7 with a decimal comma and 4700 pC are both 4.7 nC (SI prefixes p = 10^-12, n = 10^-9; from memory)
        assertEquals(4.7, part.get("q_g_nc").asDouble(), 0.0, part.toString());
        assertEquals(100.0, part.get("v_block_v").asDouble(), 0.0, part.toString());
        assertEquals(-20.0, part.get("v_gs_min_v").asDouble(), 0.0, part.toString());
    }

    @Test
    void unknownColumnsAreKeptVisibleInShowAndExportAndReportedOnce() throws Exception {
        Path f = write("extra.csv", utf8("part_number,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc,Shelf_Bin,"
                + "buyer note\nTST-001,si-mosfet,100,20,-20,50,B-12,\"ask first, then order\"\n"
                + "TST-002,si-mosfet,100,20,-20,50,B-13,\n"));
        CliRun r = CliRun.on(catalog, "import", f.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertEquals(1, count(r.err(), "Shelf_Bin"), "reported once: " + r.dump());
        assertEquals(1, count(r.err(), "buyer note"), "reported once: " + r.dump());
        CliRun show = CliRun.on(catalog, "show", "TST-001");
        assertTrue(show.out().contains("Shelf_Bin") && show.out().contains("B-12"), show.dump());
        assertTrue(show.out().contains("ask first, then order"), show.dump());
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(export())).getRecords();
        CSVRecord tst1 = rows.stream().filter(x -> x.get("part_number").equals("TST-001")).findFirst().orElseThrow();
        assertEquals("B-12", tst1.get("Shelf_Bin"));
        assertEquals("ask first, then order", tst1.get("buyer note"));
    }

    private static int count(String haystack, String needle) {
        int n = 0;
        for (int i = haystack.indexOf(needle); i >= 0; i = haystack.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }
}
