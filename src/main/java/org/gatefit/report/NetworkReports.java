package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.List;
import org.gatefit.match.Eng;
import org.gatefit.match.GateNetwork;

/**
 * The gate-drive network ({@link GateNetwork}) as a section of the explain report: text, Markdown,
 * HTML table and the JSON {@code network} list, each inside a report that ends with the caution
 * ({@link Caution}), which covers these parts too.
 */
public final class NetworkReports {
    /** The section's title. */
    static final String TITLE = "Gate-drive network";
    /** What the values are per, under the title. */
    static final String SCOPE = "Per driver output; resistors, pull-down and clamps at each switch's gate.";

    private NetworkReports() {
    }

    /** The value with its unit as a person reads it (a diode's value is its reverse rating). */
    static String value(GateNetwork.Part p) {
        return Eng.of(p.value(), p.unit());
    }

    /** The section in plain text, {@code width} columns. */
    static String text(GateNetwork n, int width) {
        StringBuilder sb = new StringBuilder(TITLE + "\n  " + SCOPE + "\n");
        for (GateNetwork.Part p : n.parts()) {
            String head = "  " + p.role() + ": " + value(p);
            sb.append(head).append("\n    ").append(Wrap.wrap("rating: " + p.rating(), width, 6, 4)).append("\n    ")
                    .append(Wrap.wrap("why: " + p.why(), width, 6, 4)).append("\n");
        }
        for (String note : n.notes()) {
            sb.append("  ").append(Wrap.wrap("left out — " + note, width, 4, 2)).append("\n");
        }
        return sb.append("\n").toString();
    }

    /** The section in Markdown (a table, then the notes). */
    static String markdown(GateNetwork n) {
        TextTable t = new TextTable(List.of("part", "value", "rating", "why"));
        for (GateNetwork.Part p : n.parts()) {
            t.add(List.of(p.role(), value(p), p.rating(), p.why()));
        }
        StringBuilder sb = new StringBuilder("\n### " + TITLE + "\n\n" + SCOPE + "\n\n" + t.markdown());
        for (String note : n.notes()) {
            sb.append("\n- left out — ").append(Markdown.escape(note));
        }
        return sb.append(n.notes().isEmpty() ? "" : "\n").toString();
    }

    /** The section in HTML: a table, the notes (the page's own caution closes it). */
    static String html(GateNetwork n) {
        StringBuilder sb = new StringBuilder("<h2>" + TITLE + "</h2>\n<p>" + Html.esc(SCOPE) + "</p>\n<table class=\"network\">\n"
                + "<thead><tr><th>part</th><th>value</th><th>rating</th><th>why</th></tr></thead>\n<tbody>\n");
        for (GateNetwork.Part p : n.parts()) {
            sb.append("<tr><td>").append(Html.esc(p.role())).append("</td><td class=\"num\">").append(Html.esc(value(p)))
                    .append("</td><td>").append(Html.esc(p.rating())).append("</td><td>").append(Html.esc(p.why()))
                    .append("</td></tr>\n");
        }
        sb.append("</tbody>\n</table>\n");
        if (!n.notes().isEmpty()) {
            sb.append("<ul class=\"network-notes\">\n");
            for (String note : n.notes()) {
                sb.append("<li>left out — ").append(Html.esc(note)).append("</li>\n");
            }
            sb.append("</ul>\n");
        }
        return sb.toString();
    }

    /** {@code network}: [{role, value, unit, value_text (as the other formats show it), rating, why}] and {@code network_left_out}: [notes]. */
    static void json(JsonGenerator g, GateNetwork n) throws IOException {
        g.writeArrayFieldStart("network");
        for (GateNetwork.Part p : n.parts()) {
            g.writeStartObject();
            g.writeStringField("role", p.role());
            MatchJson.number(g, "value", p.value());
            g.writeStringField("unit", p.unit());
            g.writeStringField("value_text", value(p));
            g.writeStringField("rating", p.rating());
            g.writeStringField("why", p.why());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("network_left_out");
        for (String note : n.notes()) {
            g.writeString(note);
        }
        g.writeEndArray();
    }

    /** A stage's network for the BOM fragment: the stage, its switch cell as written, its sheet line. */
    public record StageNetwork(String stage, String switchRef, long line, GateNetwork network) {
    }

    /**
     * The networks of a check's stages as a BOM fragment gatefit's own BOM reader reads back
     * ({@code Designator}, {@code Quantity}, {@code Manufacturer Part Number}, {@code Description},
     * {@code DNP}): one line per part. Designators are derived from the stage's switch designator —
     * R, C or D (resistor, capacitor, diode or clamp), the switch's, then A, B, C… ({@code RQ8A} is the
     * first resistor at Q8) — or, when the switch cell is not a designator, from the stage's sheet line
     * ({@code RL12A}), so they fit the reader's designator form and never clash. The part number is left
     * for the engineer to choose ({@code choose: …} with the value); the description carries the stage,
     * role, value and rating. Parts a driver output shares (its supply capacitors) are listed per stage.
     */
    public static void bom(List<StageNetwork> stages, java.io.Writer out) throws IOException {
        Csv csv = Csv.start(out, CsvStyle.COMMA);
        csv.row("Designator", "Quantity", "Manufacturer Part Number", "Description", "DNP");
        for (StageNetwork s : stages) {
            String base = s.switchRef() != null && s.switchRef().strip().matches("[A-Za-z]+\\d+") ? s.switchRef().strip()
                    .toUpperCase(java.util.Locale.ROOT) : "L" + s.line();
            java.util.Map<Character, Integer> count = new java.util.HashMap<>();
            for (GateNetwork.Part p : s.network().parts()) {
                char letter = p.unit().equals("F") ? 'C' : p.unit().equals("Ω") ? 'R' : 'D';
                int k = count.merge(letter, 1, Integer::sum);
                if (k > 26) {
                    throw new IllegalStateException("more than 26 parts of one kind in a network: " + s.stage());
                }
                csv.row(String.valueOf(letter) + base + (char) ('A' + k - 1), 1, "choose: " + value(p), s.stage() + " "
                        + p.role() + " " + value(p) + "; " + p.rating(), "no");
            }
        }
        csv.flush();
    }
}
