package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;

/**
 * How a command wants its result rendered.
 *
 * @param format the output format
 * @param colour ANSI colour on text verdicts
 * @param header the report header, or null for none
 * @param brief  text shows the header as one line (text on standard output: a terminal, where the
 *               full header would push the result up on every run); files and every other format
 *               carry it whole
 * @param csv    the CSV layout
 */
public record Rendering(Format format, boolean colour, ReportHeader header, boolean brief, CsvStyle csv) {
    public Rendering {
        java.util.Objects.requireNonNull(format, "format");
        java.util.Objects.requireNonNull(csv, "csv");
    }

    /** {@code format} without colour or header, CSV in the comma style. */
    public static Rendering of(Format format) {
        return new Rendering(format, false, null, false, CsvStyle.COMMA);
    }

    /** The header at the top of a text or Markdown report ({@code md}), when there is one. */
    void head(Writer out, boolean md) throws IOException {
        if (header == null) {
            return;
        }
        if (md) {
            header.markdown(out);
        } else {
            header.text(out, brief);
        }
    }

    /** The {@code report} field of a JSON report, when there is a header. */
    void head(JsonGenerator g) throws IOException {
        if (header != null) {
            header.json(g);
        }
    }

    /** CSV started on {@code out} in this rendering's style. */
    Csv csv(Writer out) throws IOException {
        return Csv.start(out, csv);
    }
}
