package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.OutputStream;
import java.io.StringReader;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Parts lists as engineers keep them, imported as they are: a spreadsheet program's European CSV
 * export (title row, semicolons, decimal commas, Windows-1252, CRLF, units in the headings, ±20),
 * the same list as an .xlsx workbook with two sheets, a UTF-16 file, a mapping suggested by
 * {@code validate --suggest-map} and used for the next import, bad mappings (exit 2), a BOM with
 * its own headings, a misspelt stage-sheet column, and rejects fixed and imported again. The
 * makers and parts are invented (Quillmark, Ravenfield; QM-…, RF-…); the expected values are the
 * cells' own numbers converted by the SI prefixes (1 Ω = 1000 mΩ), no other source.
 */
class SpreadsheetExportCliTest {
    static final Charset CP1252 = Charset.forName("windows-1252");

    /** The approved-parts list as a European office's spreadsheet program saves it ("CSV (semicolon)"). */
    static final String EXPORT = String.join("\r\n",
            "Approved power switches – rev. C;;;;;;;;;;;",
            "Mfr;Part Number;Type;Vds (V);Rds(on) mOhm;Qg (nC);Qgd, nC;Ciss, pF;Vgs max;Status;Price €;Our ref",
            "Quillmark;QM-1004N;Si MOSFET;100;4,2;68;14,5;4 200;±20;Active;1,85;A-17",
            "Quillmark;QM-1009P;Si MOSFET P-ch;100;9,8;95;21;5100;±20;NRND;2,10;A-18",
            "Ravenfield;RF-12S040;SiC;1200;40;62;18;1890;+22/-8;Active;9,40;B-02",
            "Ravenfield;RF-65G050;GaN HEMT;650;50;5,8;1,6;520;+7/-10;EOL;3,05;B-07",
            "") ;

    @TempDir
    Path tmp;

    private Path write(String name, byte[] bytes) throws Exception {
        Path p = tmp.resolve(name);
        Files.write(p, bytes);
        return p;
    }

    /** The switches the catalog holds, by part number, as export writes them. */
    private Map<String, CSVRecord> exported(Path catalog) throws Exception {
        CliRun e = CliRun.on(catalog, "export", "--kind", "switch");
        assertEquals(ExitCode.OK, e.exit(), e.dump());
        Map<String, CSVRecord> m = new HashMap<>();
        for (CSVRecord r : CSVFormat.DEFAULT.builder().setHeader().get().parse(new StringReader(e.out()))) {
            m.put(r.get("part_number"), r);
        }
        return m;
    }

    @Test
    void aEuropeanExportWithATitleRowImportsAsItIs() throws Exception {
        // "4 200" uses a space as thousands separator: not a number, the one row that must be fixed
        Path f = write("approved.csv", EXPORT.replace("4 200", "4200").getBytes(CP1252));
        Path cat = tmp.resolve("cat");
        CliRun r = CliRun.on(cat, "import", f.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("approved.csv: 4 switch rows imported"), r.dump());
        String err = r.err();
        for (String note : List.of(
                "approved.csv: not UTF-8 text; read as Windows-1252",
                "approved.csv: 1 row above the header skipped (line 1: 'Approved power switches – rev. C'); the header is line 2",
                "approved.csv: headings read as columns:\n  'Mfr' → maker\n  'Part Number' → part_number\n"
                        + "  'Type' → technology\n  'Vds (V)' → v_block_v (V)\n  'Rds(on) mOhm' → r_on_mohm (mOhm)\n"
                        + "  'Qg (nC)' → q_g_nc\n  'Qgd, nC' → q_gd_nc (nC)\n  'Ciss, pF' → c_iss_pf (pF)\n"
                        + "  'Vgs max' → v_gs_max_v\n  'Status' → lifecycle\n  'Price €' → unit_price (€, kept as written)\n",
                "kept as extra attributes: Our ref",
                "semicolon-separated, so a comma in a number is its decimal mark ('1,85' read as 1.85)",
                "column 'Type' (technology) read 'Si MOSFET' as si-mosfet, 'Si MOSFET P-ch' as si-mosfet with channel p,"
                        + " 'SiC' as sic-mosfet, 'GaN HEMT' as gan-hemt",
                "column 'Vgs max' (v_gs_max_v) read '±20' as v_gs_max_v 20, v_gs_min_v -20, '+22/-8' as v_gs_max_v 22,"
                        + " v_gs_min_v -8, '+7/-10' as v_gs_max_v 7, v_gs_min_v -10",
                "column 'Status' (lifecycle) read 'EOL' as obsolete")) {
            assertTrue(err.contains(note), "expected note '" + note + "' in:\n" + r.dump());
        }
        Map<String, CSVRecord> parts = exported(cat);
        CSVRecord n = parts.get("QM-1004N");
        assertEquals("Quillmark", n.get("maker"));
        assertEquals("si-mosfet", n.get("technology"));
        assertEquals("n", n.get("channel"));
        assertEquals("4.2", n.get("r_on_mohm"));
        assertEquals("14.5", n.get("q_gd_nc"));
        assertEquals("20", n.get("v_gs_max_v"));
        assertEquals("-20", n.get("v_gs_min_v"));
        assertEquals("active", n.get("lifecycle"));
        assertEquals("1.85", n.get("unit_price"));
        assertEquals("A-17", n.get("Our ref"));
        CSVRecord p = parts.get("QM-1009P");
        assertEquals("p", p.get("channel"), "Si MOSFET P-ch fills the channel");
        assertEquals("nrnd", p.get("lifecycle"));
        CSVRecord sic = parts.get("RF-12S040");
        assertEquals("sic-mosfet", sic.get("technology"));
        assertEquals("22", sic.get("v_gs_max_v"));
        assertEquals("-8", sic.get("v_gs_min_v"));
        CSVRecord gan = parts.get("RF-65G050");
        assertEquals("obsolete", gan.get("lifecycle"));
        assertEquals("5.8", gan.get("q_g_nc"));
        assertEquals("-10", gan.get("v_gs_min_v"));
    }

    @Test
    void aBadCellOfTheExportIsNamedByLineAndColumnAndNothingIsWritten() throws Exception {
        Path f = write("approved.csv", EXPORT.getBytes(CP1252));
        Path cat = tmp.resolve("cat");
        CliRun r = CliRun.on(cat, "import", f.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("approved.csv line 3, column c_iss_pf (8): '4 200'"), r.dump());
        assertFalse(CliRun.on(cat, "export", "--kind", "switch").out().contains("QM-1004N"), "nothing written");
    }

    @Test
    void aUnitInTheHeadingIsTheUnitOfBareNumbersAndIsConverted() throws Exception {
        Path f = write("ohms.csv", ("part_number,technology,v_block_v,\"Rds(on) (Ω)\",Vgs max,q_g_nc,\"Ciss [nF]\"\n"
                + "QM-2001N,si-mosfet,40,0.0028,±20,30,2.2\n"
                + "QM-2002N,si-mosfet,40,3.1mΩ,±20,30,1800pF\n").getBytes(StandardCharsets.UTF_8));
        Path cat = tmp.resolve("cat");
        CliRun r = CliRun.on(cat, "import", f.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.err().contains("'Rds(on) (Ω)' → r_on_mohm (bare numbers in Ω, converted to mΩ)"), r.dump());
        Map<String, CSVRecord> parts = exported(cat);
        assertEquals("2.8", parts.get("QM-2001N").get("r_on_mohm"), "0.0028 Ω = 2.8 mΩ");
        assertEquals("2200", parts.get("QM-2001N").get("c_iss_pf"), "2.2 nF = 2200 pF");
        assertEquals("3.1", parts.get("QM-2002N").get("r_on_mohm"), "a cell with its own unit reads as always");
        assertEquals("1800", parts.get("QM-2002N").get("c_iss_pf"));
    }

    @Test
    void theSameListAsAWorkbookWithTwoSheetsImportsTheSame() throws Exception {
        Path csv = write("approved.csv", EXPORT.replace("4 200", "4200").getBytes(CP1252));
        Path xlsx = tmp.resolve("approved.xlsx");
        List<String> lines = EXPORT.replace("4 200", "4200").lines().toList();
        try (SXSSFWorkbook wb = new SXSSFWorkbook(); OutputStream out = Files.newOutputStream(xlsx)) {
            Sheet cover = wb.createSheet("Cover");
            cover.createRow(0).createCell(0).setCellValue("Approved parts, see sheet Switches");
            Sheet sheet = wb.createSheet("Switches");
            for (int i = 0; i < lines.size(); i++) {
                Row row = sheet.createRow(i);
                String[] cells = lines.get(i).split(";", -1);
                for (int c = 0; c < cells.length; c++) {
                    if (cells[c].isEmpty()) {
                        continue; // a workbook leaves empty cells out
                    }
                    Cell cell = row.createCell(c);
                    String v = cells[c].replace(',', '.');
                    if (i >= 2 && v.matches("-?\\d+(\\.\\d+)?")) {
                        if (c == 10) { // the price as a formula with its cached value
                            cell.setCellFormula(v + "*1");
                        }
                        cell.setCellValue(Double.parseDouble(v));
                    } else {
                        cell.setCellValue(cells[c]);
                    }
                }
            }
            wb.write(out);
        }
        Path fromCsv = tmp.resolve("from-csv");
        assertEquals(ExitCode.OK, CliRun.on(fromCsv, "import", csv.toString()).exit());
        Path fromXlsx = tmp.resolve("from-xlsx");
        CliRun r = CliRun.on(fromXlsx, "import", xlsx.toString(), "--sheet", "Switches");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("approved.xlsx sheet Switches: 4 switch rows imported"), r.dump());
        assertTrue(r.err().contains("1 row above the header skipped (row 1: "), r.dump());
        Map<String, CSVRecord> a = exported(fromCsv);
        Map<String, CSVRecord> b = exported(fromXlsx);
        assertEquals(a.keySet(), b.keySet());
        for (String pn : a.keySet()) {
            assertEquals(a.get(pn).toMap(), b.get(pn).toMap(), pn);
        }
        // Without --sheet the first sheet is read, and says which it read.
        CliRun first = CliRun.on(tmp.resolve("first"), "validate", xlsx.toString());
        assertEquals(ExitCode.BAD_DATA, first.exit(), first.dump());
        assertTrue(first.err().contains("approved.xlsx has sheets Cover, Switches; read the first, Cover"), first.dump());
        CliRun none = CliRun.on(tmp.resolve("none"), "validate", xlsx.toString(), "--sheet", "Drivers");
        assertEquals(ExitCode.BAD_DATA, none.exit(), none.dump());
        assertTrue(none.out().contains("no sheet 'Drivers' (expected one of Cover, Switches)"), none.dump());
    }

    @Test
    void aWorkbookProblemNamesSheetRowAndColumnLetter() throws Exception {
        Path xlsx = tmp.resolve("bad.xlsx");
        try (SXSSFWorkbook wb = new SXSSFWorkbook(); OutputStream out = Files.newOutputStream(xlsx)) {
            Sheet s = wb.createSheet("Parts");
            String[] head = {"part_number", "technology", "v_block_v", "v_gs_max_v", "v_gs_min_v", "q_g_nc"};
            Row h = s.createRow(0);
            for (int i = 0; i < head.length; i++) {
                h.createCell(i).setCellValue(head[i]);
            }
            Row r = s.createRow(3); // rows 2 and 3 left empty
            r.createCell(0).setCellValue("QM-3001N");
            r.createCell(1).setCellValue("si-mosfet");
            r.createCell(2).setCellValue(60);
            r.createCell(3).setCellValue(20);
            r.createCell(4).setCellValue(-20);
            r.createCell(5).setCellValue("13O");
            wb.write(out);
        }
        CliRun v = CliRun.on(tmp.resolve("cat"), "import", xlsx.toString());
        assertEquals(ExitCode.BAD_DATA, v.exit(), v.dump());
        assertTrue(v.err().contains("bad.xlsx sheet Parts row 4, column F (q_g_nc): '13O'"), v.dump());
    }

    @Test
    void aUtf16FileWithItsByteOrderMarkImports() throws Exception {
        String text = "\uFEFFpart_number\ttechnology\tV_DS\tVgs max\tQg (nC)\r\nQM-4001N\tSi MOSFET\t30\t±20\t12,5\r\n";
        Path f = write("utf16.txt", text.getBytes(StandardCharsets.UTF_16LE));
        Path cat = tmp.resolve("cat");
        CliRun r = CliRun.on(cat, "import", f.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.err().contains("read as UTF-16LE (byte-order mark)"), r.dump());
        CSVRecord p = exported(cat).get("QM-4001N");
        assertEquals("12.5", p.get("q_g_nc"));
        assertEquals("-20", p.get("v_gs_min_v"));
    }

    @Test
    void anEncodingGivenIsUsedAndAnUnknownOneIsAUsageError() throws Exception {
        // ISO-8859-15 has € at 0xA4, where Windows-1252 has ¤: only the encoding named reads it right
        String text = "part_number;technology;v_block_v;v_gs_max_v;v_gs_min_v;q_g_nc;Price €\nQM-5001N;si-mosfet;30;20;-20;10;1,5\n";
        Path f = write("latin9.csv", text.getBytes(Charset.forName("ISO-8859-15")));
        Path cat = tmp.resolve("cat");
        CliRun r = CliRun.on(cat, "import", f.toString(), "--encoding", "ISO-8859-15");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.err().contains("'Price €' → unit_price"), r.dump());
        CliRun bad = CliRun.on(cat, "import", f.toString(), "--encoding", "klingon-8");
        assertEquals(ExitCode.USAGE, bad.exit(), bad.dump());
        assertTrue(bad.err().contains("--encoding klingon-8: unknown encoding"), bad.dump());
    }

    @Test
    void aSuggestedMappingWrittenToAFileIsEditedAndUsedForTheNextImport() throws Exception {
        Path f = write("odd.csv", ("Item;Kind;Blocking;Gate chg;Vgs max;Spec sheet\n"
                + "QM-6001N;si-mosfet;80;41;±20;ds-6001.pdf\n").getBytes(StandardCharsets.UTF_8));
        Path cat = tmp.resolve("cat");
        CliRun first = CliRun.on(cat, "import", f.toString(), "--kind", "switch");
        assertEquals(ExitCode.BAD_DATA, first.exit(), first.dump());
        assertTrue(first.err().contains("missing required columns part_number, technology, v_block_v, q_g_nc"), first.dump());
        assertTrue(first.err().contains("nearest headings: "), first.dump());
        Path map = tmp.resolve("map.json");
        CliRun suggest = CliRun.on(cat, "validate", f.toString(), "--kind", "switch", "--suggest-map", "--output", map.toString());
        assertEquals(ExitCode.OK, suggest.exit(), suggest.dump());
        ObjectMapper json = new ObjectMapper();
        JsonNode m = json.readTree(map.toFile());
        assertEquals(1, m.get("gatefit-mapping").asInt());
        assertEquals("v_gs_max_v", m.get("headings").get("Vgs max").asText());
        assertEquals("", m.get("headings").get("Gate chg").asText());
        assertTrue(m.get("missing").has("q_g_nc"), m.toString());
        com.networknt.schema.JsonSchema schema;
        try (java.io.InputStream in = Files.newInputStream(Project.file("catalog-schema/mapping.schema.json"))) {
            schema = com.networknt.schema.JsonSchemaFactory.getInstance(
                    com.networknt.schema.SpecVersion.VersionFlag.V202012).getSchema(in);
        }
        assertEquals(java.util.Set.of(), schema.validate(m), "the suggested mapping is valid as mapping.schema.json says");
        ObjectNode wrong = m.deepCopy();
        ((ObjectNode) wrong.get("headings")).put("Item", "Part Number");
        assertFalse(schema.validate(wrong).isEmpty(), "the schema is not vacuous: a column name must be one");
        ObjectNode h = (ObjectNode) m.get("headings");
        h.put("Item", "part_number");
        h.put("Kind", "technology");
        h.put("Blocking", "v_block_v");
        h.put("Gate chg", "q_g_nc");
        json.writeValue(map.toFile(), m);
        CliRun second = CliRun.on(cat, "import", f.toString(), "--map-file", map.toString());
        assertEquals(ExitCode.OK, second.exit(), second.dump());
        assertTrue(second.err().contains("'Gate chg' → q_g_nc (mapped)"), second.dump());
        CSVRecord p = exported(cat).get("QM-6001N");
        assertEquals("41", p.get("q_g_nc"));
        assertEquals("ds-6001.pdf", p.get("Spec sheet"));
    }

    @Test
    void aBadMappingExitsTwoBeforeAnyFileIsRead() throws Exception {
        Path f = write("p.csv", "Item,technology\nx,si-mosfet\n".getBytes(StandardCharsets.UTF_8));
        Path cat = tmp.resolve("cat");
        CliRun unknown = CliRun.on(cat, "import", f.toString(), "--map", "Item=part_nmuber");
        assertEquals(ExitCode.USAGE, unknown.exit(), unknown.dump());
        assertTrue(unknown.err().contains("--map 'Item=part_nmuber': unknown column 'part_nmuber'"), unknown.dump());
        CliRun twice = CliRun.on(cat, "validate", f.toString(), "--map", "Item=part_number", "--map", "Code=part_number");
        assertEquals(ExitCode.USAGE, twice.exit(), twice.dump());
        assertTrue(twice.err().contains("headings 'Item' (--map 'Item=part_number') and 'Code' are both mapped to column"
                + " part_number"), twice.dump());
        Path bad = write("bad.json", "{\"headings\": {\"Item\": \"part_number\", \"Code\": \"part_number\"}}"
                .getBytes(StandardCharsets.UTF_8));
        CliRun file = CliRun.on(cat, "import", f.toString(), "--map-file", bad.toString());
        assertEquals(ExitCode.USAGE, file.exit(), file.dump());
        assertTrue(file.err().contains("are both mapped to column part_number"), file.dump());
        assertFalse(Files.exists(cat), "nothing written");
    }

    @Test
    void anAmbiguousHeadingIsNotGuessed() throws Exception {
        Path f = write("p.csv", ("part_number,technology,v_block_v,Vgs max,q_g_nc,Vgs(th) (V)\n"
                + "QM-7001N,si-mosfet,40,±20,30,2.5\n").getBytes(StandardCharsets.UTF_8));
        Path cat = tmp.resolve("cat");
        CliRun r = CliRun.on(cat, "import", f.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.err().contains("heading 'Vgs(th) (V)' could be v_th_min_v or v_th_max_v; not guessed"), r.dump());
        CSVRecord p = exported(cat).get("QM-7001N");
        assertEquals("", p.get("v_th_min_v"));
        assertEquals("", p.get("v_th_max_v"));
        assertEquals("2.5", p.get("Vgs(th) (V)"));
        CliRun mapped = CliRun.on(cat, "import", f.toString(), "--map", "Vgs(th)=v_th_max_v");
        assertEquals(ExitCode.OK, mapped.exit(), mapped.dump());
        assertEquals("2.5", exported(cat).get("QM-7001N").get("v_th_max_v"));
    }

    @Test
    void rejectsKeepTheSeparatorAndUnitsRowAndImportAgainOnceFixed() throws Exception {
        String sheet = "part_number;technology;Vds;Vgs max;Qg;Rds(on)\n"
                + ";;V;;nC;Ω\n"
                + "QM-8001N;Si MOSFET;60;±20;22,5;0,0031\n"
                + "QM-8002N;Si MOSFET;60;±20;2x;0,0045\n";
        Path f = write("units.csv", sheet.getBytes(StandardCharsets.UTF_8));
        Path cat = tmp.resolve("cat");
        Path rejects = tmp.resolve("rejects.csv");
        CliRun r = CliRun.on(cat, "import", f.toString(), "--skip-invalid", rejects.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.err().contains("line 2 read as the headings' units"), r.dump());
        assertEquals("3.1", exported(cat).get("QM-8001N").get("r_on_mohm"), "0,0031 Ω under a units row = 3.1 mΩ");
        String written = Files.readString(rejects);
        List<String> lines = written.lines().toList();
        assertEquals("part_number;technology;Vds;Vgs max;Qg;Rds(on);rejected_line;rejected_because", lines.get(0));
        assertEquals("\"\";;V;;nC;Ω;;", lines.get(1)); // Commons CSV quotes an empty first cell
        assertTrue(lines.get(2).startsWith("QM-8002N;Si MOSFET;60;±20;2x;0,0045;4;q_g_nc: '2x'"), written);
        Files.writeString(rejects, written.replace(";2x;", ";28,5;"));
        CliRun again = CliRun.on(cat, "import", rejects.toString());
        assertEquals(ExitCode.OK, again.exit(), again.dump());
        assertFalse(again.err().contains("rejected_because"), "the reasons are not kept as attributes: " + again.dump());
        CSVRecord p = exported(cat).get("QM-8002N");
        assertEquals("28.5", p.get("q_g_nc"));
        assertEquals("4.5", p.get("r_on_mohm"));
        assertFalse(p.toMap().containsKey("rejected_because"));
    }

    @Test
    void aBomWithItsOwnHeadingsAndATitleRowResolvesDesignators() throws Exception {
        Path cat = tmp.resolve("cat");
        CliRun.examples(cat);
        String stages = "stage,driver,switch,side,bus_v,f_sw_khz,edge_ns,v_drive_v\n"
                + "PFC,U5,Q8,low,400,65,40,12\n";
        Path st = write("stages.csv", stages.getBytes(StandardCharsets.UTF_8));
        String bom = "Inverter board BOM rev 4;;;\n"
                + "Ref Des;Mfr.;Mfr. Part No.;Qty\n"
                + "U5;Vahmet;VHM-4410N;1\n"
                + "Q8;Thornwell;THW-65R099F;1\n";
        Path b = write("bom.csv", bom.getBytes(CP1252));
        CliRun r = CliRun.on(cat, "check", st.toString(), "--bom", b.toString());
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
        assertTrue(r.out().contains("U5 VHM-4410N") && r.out().contains("Q8 THW-65R099F"), r.dump());
        assertTrue(r.err().contains("bom.csv: 1 row above the header skipped; the header is line 2"), r.dump());
    }

    @Test
    void aMisspeltStageColumnIsWarnedInCheckWithTheNearestColumn() throws Exception {
        Path cat = tmp.resolve("cat");
        CliRun.examples(cat);
        Path st = write("stages.csv", ("stage,driver,switch,side,bus_v,f_sw_khz,egde_ns,v_drive_v\n"
                + "PFC,VHM-4410N,THW-65R099F,low,400,65,40,12\n").getBytes(StandardCharsets.UTF_8));
        CliRun r = CliRun.on(cat, "check", st.toString());
        assertTrue(r.err().contains("warning: " + st + ": column 'egde_ns' is not a stage column and is not used"
                + " (kept as an extra attribute); did you mean edge_ns?"), r.dump());
        CliRun v = CliRun.on(cat, "validate", st.toString());
        assertTrue(v.err().contains("did you mean edge_ns?"), v.dump());
    }
}
