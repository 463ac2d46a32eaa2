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
final class NetworkReports {
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

    /** {@code network}: [{role, value, unit, rating, why}] and {@code network_left_out}: [notes]. */
    static void json(JsonGenerator g, GateNetwork n) throws IOException {
        g.writeArrayFieldStart("network");
        for (GateNetwork.Part p : n.parts()) {
            g.writeStartObject();
            g.writeStringField("role", p.role());
            MatchJson.number(g, "value", p.value());
            g.writeStringField("unit", p.unit());
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
}
