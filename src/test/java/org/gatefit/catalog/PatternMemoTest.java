package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Import remembers the values of pattern-checked cells it has read (input polarity repeats a few
 * values over a catalog); every row must still read as {@link Cells#parse} reads its cell, and a
 * bad cell must be reported every time it appears, not only the first. The cells are inputs; the
 * check is {@link Cells#parse} of each one.
 */
class PatternMemoTest {

    @Test
    void rememberedCellsReadAsParseReadsThemAndBadOnesAreReportedEachTime() throws IOException {
        Column polarity = Schema.of(Kind.DRIVER).column("input_polarity").orElseThrow();
        String[] cells = {"non-inverting", "inverting", "Non-Inverting", " inverting ", "non-inverting;inverting",
            "non inverting", "inverting;;inverting", "'inverting", "INVERTING ; non-inverting", "", "x"};
        Random random = new Random(7);
        StringBuilder csv = new StringBuilder("part_number,topology,input_polarity,i_source_a,i_sink_a,"
                + "v_supply_min_v,v_supply_max_v\n");
        List<String> written = new ArrayList<>();
        for (int i = 0; i < 2000; i++) { // more rows than distinct cells, and more distinct cells than none
            String cell = i < 600 ? cells[random.nextInt(cells.length)] : "inverting;".repeat(i % 300) + "inverting";
            written.add(cell);
            csv.append("TST-").append(i).append(",low-side,\"").append(cell).append("\",1,1,10,20\n");
        }
        Map<Long, Row> rows = new HashMap<>();
        SheetReader.Summary s = SheetReader.read(new ByteArrayInputStream(csv.toString().getBytes(StandardCharsets.UTF_8)),
                "memo.csv", null, new SheetReader.Sink() {
                    @Override
                    public void accept(Row row) {
                        rows.put(row.line(), row);
                    }
                });
        long bad = 0;
        for (int i = 0; i < written.size(); i++) {
            long line = i + 2;
            Object expected;
            try {
                expected = Cells.parse(polarity, written.get(i), false);
            } catch (BadValueException e) {
                expected = null;
            }
            if (expected == null) {
                bad++;
                assertTrue(!rows.containsKey(line), "line " + line + " '" + written.get(i) + "' is rejected");
            } else {
                assertEquals(expected, rows.get(line).values().get("input_polarity"), "line " + line);
            }
        }
        assertTrue(bad > 50 && bad < 600, "both kinds of cells were read: " + bad + " bad");
        assertEquals(bad, s.problemCount(), "each bad cell is a problem, remembered or not");
        assertEquals(written.size() - bad, s.rows());
    }
}
