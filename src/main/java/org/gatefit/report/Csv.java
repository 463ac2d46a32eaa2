package org.gatefit.report;

import java.io.IOException;
import java.io.StringWriter;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.gatefit.catalog.Cells;

/** One CSV line with RFC 4180 quoting; text that a spreadsheet would run as a formula is neutralised. */
final class Csv {
    private static final CSVFormat FORMAT = CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get();

    private Csv() {
    }

    static String line(String... cells) throws IOException {
        StringWriter w = new StringWriter();
        try (CSVPrinter p = new CSVPrinter(w, FORMAT)) {
            Object[] safe = new Object[cells.length];
            for (int i = 0; i < cells.length; i++) {
                safe[i] = cells[i] == null ? "" : Cells.neutraliseText(cells[i]);
            }
            p.printRecord(safe);
        }
        return w.toString();
    }
}
