package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.Size;
import org.gatefit.synth.SyntheticCatalog;

/**
 * The CSV seam ({@link FastPath#CSV}) side by side: every input is read by the sheet reader twice,
 * over the hand-written {@link CsvLexer} and over Commons CSV (the shipped reference), and both reads
 * must give the same summary, the same accepted rows and the same rejected rows with the same
 * problems. The one difference allowed: a CSV syntax problem from the lexer also names its cell,
 * which Commons CSV does not tell. Inputs: the bundled examples, a synthetic catalog, awkward files
 * and random edits of a small catalog of invented parts.
 */
class SheetReaderReferenceTest {

    /** One read: the summary, the rows accepted and the rejected rows (line, cells, problems). */
    record Read(SheetReader.Summary summary, List<Row> rows, List<List<Object>> rejects) {
    }

    static Read read(byte[] bytes, Kind kind, boolean reference) throws IOException {
        List<Row> rows = new ArrayList<>();
        List<List<Object>> rejects = new ArrayList<>();
        SheetReader.Summary s = SheetReader.read(new ByteArrayInputStream(bytes), "in.csv", kind, new SheetReader.Sink() {
            @Override
            public void accept(Row row) {
                rows.add(row);
            }

            @Override
            public void reject(List<String> header, long line, List<String> cells, List<Problem> problems) {
                rejects.add(List.of(header, line, List.copyOf(cells), problems));
            }
        }, reference);
        return new Read(s, rows, rejects);
    }

    static void same(byte[] bytes, Kind kind) throws IOException {
        Read fast = read(bytes, kind, false);
        Read ref = read(bytes, kind, true);
        String what = new String(bytes, 0, Math.min(bytes.length, 300), StandardCharsets.UTF_8);
        assertEquals(ref.rows(), fast.rows(), what);
        assertEquals(ref.rejects(), fast.rejects(), what);
        SheetReader.Summary f = fast.summary();
        SheetReader.Summary r = ref.summary();
        assertEquals(new SheetReader.Summary(r.file(), r.kind(), r.sha256(), r.rows(), r.rejected(), r.header(),
                r.unknownColumns(), r.delimiter(), List.of(), r.problemCount(), r.fatal(), r.headings(), r.missing(),
                r.notes()),
                new SheetReader.Summary(f.file(), f.kind(), f.sha256(), f.rows(), f.rejected(), f.header(),
                        f.unknownColumns(), f.delimiter(), List.of(), f.problemCount(), f.fatal(), f.headings(),
                        f.missing(), f.notes()), what);
        assertEquals(r.problems().size(), f.problems().size(), what);
        for (int i = 0; i < r.problems().size(); i++) {
            Problem a = f.problems().get(i);
            Problem b = r.problems().get(i);
            if (!a.equals(b)) { // only a syntax problem's cell, which the reference cannot tell
                assertTrue(b.column() == null && b.columnNumber() == 0 && a.columnNumber() > 0
                        && a.file().equals(b.file()) && a.line() == b.line() && a.message().startsWith(b.message()),
                        "fast " + a + "\nreference " + b + "\nin " + what);
            }
        }
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    @Example
    void theBundledExamplesReadAlike() throws IOException {
        for (String f : List.of("switches.csv", "drivers.csv", "stages.csv", "bom.csv")) {
            byte[] bytes = Files.readAllBytes(Path.of("examples", f));
            same(bytes, null);
            Read fast = read(bytes, null, false);
            if (!f.equals("bom.csv")) {
                assertTrue(fast.summary().clean() && fast.rows().size() > 5, f + ": " + fast.summary());
            }
        }
    }

    @Example
    void aSyntheticCatalogReadsAlike() throws IOException {
        StringWriter sw = new StringWriter();
        SyntheticCatalog.writeSwitches(sw, 3000);
        same(utf8(sw.toString()), null);
        StringWriter dw = new StringWriter();
        SyntheticCatalog.writeDrivers(dw, 3000);
        same(utf8(dw.toString()), null);
        Read fast = read(utf8(dw.toString()), null, false);
        assertEquals(3000, fast.rows().size(), fast.summary().problems().toString());
    }

    static final String HEADER = "part_number,maker,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc,description";

    @Example
    void awkwardFilesReadAlike() throws IOException {
        String ok = "TST-1,Testmaker,si-mosfet,100,20,-20,50,plain\n";
        List<String> texts = List.of(
                "\uFEFF" + HEADER + "\n" + ok,
                (HEADER + "\n" + ok + "TST-2,Testmaker,si-mosfet,100,20,-20,51,\"two\nlines\"\n").replace("\n", "\r\n"),
                (HEADER + "\n" + ok).replace(',', ';').replace("plain", "\"a;b\""),
                (HEADER + "\n" + ok).replace(',', '\t'),
                HEADER + "\n\n  \n" + ok + "\n\n",
                HEADER + "\n" + ok + "TST-2,Testmaker,si-mosfet,100,20,-20,13O,x\nTST-1,Testmaker,si-mosfet,1,2,3,4,dup\n",
                HEADER + "\n" + ok + "TST-2,Testmaker,si-mosfet,100,20,-20,50,\"never closed\n" + ok,
                HEADER + "\n" + ok + "TST-2,Testmaker,si-mosfet,100,20,-20,50,\"quoted\"tail\n",
                HEADER + "\n" + ok + "TST-2,Testmaker,si-mosfet,100,20,-20,50,\"quoted\"   \n",
                HEADER + ",\"open header\n" + ok,
                "part_number,\"mak\"er\n",
                HEADER + "\n" + "TST-1,Testmaker\n" + ok.replace("TST-1", "TST-3"),
                HEADER + "\n",
                "",
                "\n\n",
                HEADER + ",extra,\n" + ok.strip() + ",x,\n" + ok.strip().replace("TST-1", "TST-2") + ",,stray\n",
                HEADER + "\r" + ok.replace("\n", "\r") + "TST-2,Testmaker,si-mosfet,100,20,-20,\"5\"\"0\",x\r");
        for (String t : texts) {
            same(utf8(t), null);
            same(utf8(t), Kind.SWITCH);
        }
        byte[] notUtf8 = utf8(HEADER + "\n" + ok + "TST-2,Testmaker,si-mosfet,100,20,-20,50,caf\u0000\n");
        notUtf8[notUtf8.length - 2] = (byte) 0xC3;
        same(notUtf8, null);
        byte[] utf16 = ("\uFEFF" + HEADER).getBytes(StandardCharsets.UTF_16LE);
        same(utf16, null);
    }

    @Provide
    Arbitrary<String> soup() {
        return Arbitraries.strings().withChars(',', ';', '\t', '"', '"', '\n', '\r', ' ', 'x', '5', '\u00e9')
                .ofMinLength(1).ofMaxLength(12);
    }

    @Property(tries = 400, edgeCases = EdgeCasesMode.MIXIN)
    void editedCatalogsReadAlike(@ForAll("soup") String insert, @ForAll @IntRange(max = 10_000) int at,
                                 @ForAll @IntRange(max = 3) int cut) throws IOException {
        String valid = ImportPropertiesTest.VALID;
        int i = at % (valid.length() + 1);
        String text = valid.substring(0, i) + insert + valid.substring(Math.min(valid.length(), i + cut));
        same(utf8(text), null);
    }

    @Property(tries = 200, edgeCases = EdgeCasesMode.MIXIN)
    void randomBytesReadAlike(@ForAll @Size(max = 300) byte[] bytes) throws IOException {
        same(bytes, null);
        same(bytes, Kind.DRIVER);
    }
}
