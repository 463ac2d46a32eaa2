package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import java.time.Clock;
import java.time.OffsetDateTime;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.gatefit.catalog.Sha256;

/**
 * What a report was made from, so that a report forwarded to someone else can be traced and
 * re-run: when it was made (ISO 8601 with the offset from UTC, to the second), by which gatefit
 * (the jar's version), from which catalog (its folder and {@linkplain org.gatefit.index.Catalog#contentSha256
 * content hash}) and from which input files (each one's name as given and its SHA-256). The one
 * place the header is worded; every report format renders it from here: a block of lines in text
 * written to a file, one line in text on standard output, a list in Markdown, a {@code <header>}
 * in HTML, a {@code report} object in JSON. CSV carries none (it stays a plain table for
 * spreadsheets; see {@link CsvStyle}).
 *
 * @param command       the gatefit command that made it ({@code explain}, {@code check}, …)
 * @param time          when
 * @param gatefit       gatefit's version as {@code --version} prints it
 * @param catalog       the catalog folder
 * @param catalogSha256 the catalog's content hash, null when it holds nothing
 * @param inputs        the input files, in the order the command names them
 */
public record ReportHeader(String command, OffsetDateTime time, String gatefit, String catalog, String catalogSha256,
                           List<Input> inputs) {
    /** ISO 8601 extended format to the second with a numeric offset ({@code 2030-01-02T04:04:05+01:00}). */
    public static final DateTimeFormatter TIME = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ssxxx", Locale.ROOT);

    /** How many hex digits of the catalog's hash the one-line header shows. */
    static final int SHORT_HASH = 12;

    /** What an input file is to the command. */
    public enum Role {
        STAGES("stages", "Stage sheet"),
        BOM("bom", "BOM"),
        MAP_FILE("map_file", "Mapping file");

        private final String id;
        private final String label;

        Role(String id, String label) {
            this.id = id;
            this.label = label;
        }

        /** The JSON name. */
        public String id() {
            return id;
        }

        /** The name people read. */
        public String label() {
            return label;
        }
    }

    /**
     * One input file.
     *
     * @param file   the file as the user gave it
     * @param sha256 the SHA-256 of its bytes, 64 lower-case hex digits
     */
    public record Input(Role role, String file, String sha256) {
        public Input {
            Objects.requireNonNull(role, "role");
            Objects.requireNonNull(file, "file");
            if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
                throw new IllegalArgumentException("expected a SHA-256 as 64 lower-case hex digits, got " + sha256);
            }
        }

        /** {@code path} hashed now; {@code shown} is the name as the user typed it. */
        public static Input of(Role role, Path path, String shown) throws IOException {
            return new Input(role, shown, Sha256.of(path));
        }
    }

    public ReportHeader {
        Objects.requireNonNull(command, "command");
        Objects.requireNonNull(time, "time");
        Objects.requireNonNull(gatefit, "gatefit");
        Objects.requireNonNull(catalog, "catalog");
        if (catalogSha256 != null && !catalogSha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("expected the catalog's SHA-256 as 64 lower-case hex digits, got "
                    + catalogSha256);
        }
        inputs = List.copyOf(inputs);
    }

    /** A header made now by {@code clock} (in the clock's zone). */
    public static ReportHeader of(String command, Clock clock, String gatefit, Path catalog, String catalogSha256,
                                  List<Input> inputs) {
        return new ReportHeader(command, OffsetDateTime.now(clock), gatefit, catalog.toString(), catalogSha256, inputs);
    }

    /** The time as the header writes it. */
    public String timeText() {
        return TIME.format(time);
    }

    /**
     * One line of the header: a label, what it names, and a hash of it (null for none; the catalog's
     * is null when it is empty).
     */
    private record Line(String label, String text, String hashLabel, String hash) {
    }

    private List<Line> lines() {
        List<Line> out = new ArrayList<>();
        out.add(new Line("Report", command + ", " + timeText() + ", gatefit " + gatefit, null, null));
        out.add(new Line("Catalog", catalogSha256 == null ? catalog + " (empty)" : catalog, "content SHA-256",
                catalogSha256));
        for (Input i : inputs) {
            out.add(new Line(i.role().label(), i.file(), "SHA-256", i.sha256()));
        }
        return out;
    }

    /** The one line text on standard output begins with: the catalog's hash shortened, no inputs. */
    String line() {
        return command + ", " + timeText() + ", gatefit " + gatefit + "; catalog " + catalog + (catalogSha256 == null
                ? " (empty)" : " " + catalogSha256.substring(0, SHORT_HASH) + "…");
    }

    /**
     * Text: every line, labels aligned, each hash whole on a line of its own under what it names
     * (so the block fits 100 columns), then a blank line; or only {@link #line()} (wrapped at 100
     * columns) when {@code brief}.
     */
    void text(Writer out, boolean brief) throws IOException {
        if (brief) {
            out.write(Wrap.wrap(line(), 100, 2) + "\n");
            return;
        }
        List<Line> lines = lines();
        int w = lines.stream().mapToInt(l -> l.label().length()).max().orElse(0) + 3;
        for (Line l : lines) {
            out.write(l.label() + ":" + " ".repeat(w - l.label().length() - 1) + l.text() + "\n");
            if (l.hash() != null) {
                out.write(" ".repeat(w) + l.hashLabel() + " " + l.hash() + "\n");
            }
        }
        out.write("\n");
    }

    /** Markdown: a list, hashes as code, then a blank line. */
    void markdown(Writer out) throws IOException {
        for (Line l : lines()) {
            out.write("- **" + l.label() + ":** " + Markdown.escape(l.text()) + (l.hash() == null ? ""
                    : ", " + l.hashLabel() + " `" + l.hash() + "`") + "\n");
        }
        out.write("\n");
    }

    /** HTML: a {@code <header>} with a definition list; long paths and hashes wrap inside the page. */
    String html() {
        StringBuilder sb = new StringBuilder("<header class=\"report-head\" id=\"report-head\">\n<dl class=\"ctx\">\n");
        sb.append("<dt>Report</dt><dd>").append(Html.esc(command)).append(", <time datetime=\"").append(timeText())
                .append("\">").append(timeText()).append("</time>, gatefit ").append(Html.esc(gatefit)).append("</dd>\n");
        for (Line l : lines().subList(1, lines().size())) {
            sb.append("<dt>").append(Html.esc(l.label())).append("</dt><dd>").append(Html.esc(l.text()));
            if (l.hash() != null) {
                sb.append(", ").append(l.hashLabel()).append(" <code class=\"hash\">").append(l.hash()).append("</code>");
            }
            sb.append("</dd>\n");
        }
        return sb.append("</dl>\n</header>\n").toString();
    }

    /** JSON: the {@code report} field of the object being written. */
    void json(JsonGenerator g) throws IOException {
        g.writeObjectFieldStart("report");
        g.writeStringField("command", command);
        g.writeStringField("generated", timeText());
        g.writeStringField("gatefit", gatefit);
        g.writeObjectFieldStart("catalog");
        g.writeStringField("path", catalog);
        g.writeStringField("content_sha256", catalogSha256);
        g.writeEndObject();
        g.writeArrayFieldStart("inputs");
        for (Input i : inputs) {
            g.writeStartObject();
            g.writeStringField("role", i.role().id());
            g.writeStringField("file", i.file());
            g.writeStringField("sha256", i.sha256());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    /**
     * The same facts as JUnit XML {@code <property>} elements, names as in the JSON {@code report}
     * object ({@code report.generated}, {@code report.catalog.content_sha256}, {@code report.input.stages.sha256} …),
     * for a CI server that shows a test suite's properties. {@code escape} escapes an attribute value.
     */
    public String junitProperties(java.util.function.UnaryOperator<String> escape, String indent) {
        StringBuilder sb = new StringBuilder(indent).append("<properties>\n");
        java.util.function.BiConsumer<String, String> p = (name, value) -> sb.append(indent).append("  <property name=\"")
                .append(escape.apply(name)).append("\" value=\"").append(escape.apply(value == null ? "" : value))
                .append("\"/>\n");
        p.accept("report.command", command);
        p.accept("report.generated", timeText());
        p.accept("report.gatefit", gatefit);
        p.accept("report.catalog.path", catalog);
        p.accept("report.catalog.content_sha256", catalogSha256);
        for (Input in : inputs) {
            p.accept("report.input." + in.role().id() + ".file", in.file());
            p.accept("report.input." + in.role().id() + ".sha256", in.sha256());
        }
        return sb.append(indent).append("</properties>\n").toString();
    }
}
