package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.GateNetwork;
import org.gatefit.match.PairResult;
import org.gatefit.match.Rule;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;
import org.gatefit.match.Verdict;

/** Renders {@code shortlist} and {@code explain} results. */
public final class MatchReports {
    private static final int WIDTH = 100;

    private MatchReports() {
    }

    // ------------------------------------------------------------------ shortlist

    /** The ranked drivers for a switch, rendered as {@code how} asks. */
    public static void shortlist(Shortlist.Result r, Rendering how, Writer out) throws IOException {
        switch (how.format()) {
            case JSON -> shortlistJson(r, how, out);
            case CSV -> shortlistCsv(r, how.csv(out));
            case TEXT -> shortlistText(r, how, out, false, how.colour());
            case MARKDOWN -> shortlistText(r, how, out, true, false);
            case HTML -> MatchHtml.shortlist(r, how.header(), out);
        }
    }

    static String switchLine(SwitchPart s) {
        return s.partNumber() + " (" + s.technology() + ", " + Eng.of(s.vBlock(), "V") + ", Q_g " + Eng.of(s.qG(), "C")
                + (Double.isNaN(s.qGVgs()) ? "" : " at " + Eng.of(s.qGVgs(), "V")) + ", V_GS " + Eng.of(s.vGsMin(), "V")
                + " to " + Eng.of(s.vGsMax(), "V") + ")";
    }

    private static void shortlistText(Shortlist.Result r, Rendering how, Writer out, boolean md, boolean colour)
            throws IOException {
        how.head(out, md);
        String head = "Drivers for " + switchLine(r.switchPart()) + ": " + r.evaluated() + " evaluated, " + r.passing()
                + " pass, " + r.warning() + " warn, " + r.failing() + " fail"
                + (r.skipped() > 0 ? "; " + r.skipped() + " more skipped by the prefilter (each certain to fail)" : "");
        out.write(md ? "## " + Markdown.escape(head) + "\n\n" : Wrap.wrap(head, WIDTH, 2) + "\n");
        for (String[] l : shortlistContext(r)) {
            out.write(md ? "- **" + l[0] + ":** " + Markdown.escape(l[1]) + "\n" : Wrap.wrap(l[0] + ": " + l[1], WIDTH, 4) + "\n");
        }
        context(out, md, r.point(), r.margins(), r.prefilter());
        out.write("\n");
        if (r.candidates().isEmpty()) {
            out.write((md ? "_" : "") + "No driver in the catalog works with this switch at this operating point"
                    + (r.failing() > 0 ? "; run with --all to see why each fails" : "") + (md ? "._\n" : ".\n"));
        } else {
            TextTable t = new TextTable(List.of("#", "driver", "verdict", "score", "I_pl/I_req", "NM min", "P_driver", "price",
                    "deciding"), true, false, false, true, true, true, true, true, false);
            if (colour) {
                t.paint(2, Ansi::paintByWord);
            }
            int i = 1;
            for (PairResult p : r.candidates()) {
                t.add(List.of(Integer.toString(i++), p.driver(), p.verdict().id(), Eng.num(p.score()), driveRatio(p),
                        noiseMin(p), fig(p, "driver-power", "W"), Double.isNaN(p.priceTieBreak()) ? ""
                                : Eng.num(p.priceTieBreak()), deciding(p)));
            }
            out.write(md ? t.markdown() : t.render(WIDTH));
            // A note every listed pair shares (e.g. the switch is out of stock) is said once.
            java.util.Map<String, Integer> seen = new java.util.HashMap<>();
            for (PairResult p : r.candidates()) {
                for (Check c : p.checks()) {
                    if (c.verdict() != Verdict.PASS) {
                        seen.merge(c.rule().id() + " " + c.verdict().id() + ": " + c.message(), 1, Integer::sum);
                    }
                }
            }
            List<String> why = new ArrayList<>();
            int n = r.candidates().size();
            if (n > 1) {
                seen.forEach((k, v) -> {
                    if (v == n) {
                        why.add("all " + k);
                    }
                });
                java.util.Collections.sort(why);
            }
            i = 1;
            for (PairResult p : r.candidates()) {
                for (Check c : p.checks()) {
                    String k = c.rule().id() + " " + c.verdict().id() + ": " + c.message();
                    if (c.verdict() != Verdict.PASS && (n == 1 || seen.get(k) < n)) {
                        why.add(i + " " + p.driver() + " " + k);
                    }
                }
                i++;
            }
            if (!why.isEmpty()) {
                out.write(md ? "\n**What to look at**\n\n" : "\nWhat to look at:\n");
                for (String w : why) {
                    out.write(md ? "- " + Markdown.escape(w) + "\n" : "  " + Wrap.wrap(w, WIDTH - 2, 6) + "\n");
                }
            }
            if (r.failing() > 0 && r.candidates().stream().noneMatch(p -> p.verdict() == Verdict.FAIL)) {
                out.write((md ? "\n" : "\n") + r.failing() + " failing drivers not shown; --all lists them with their reasons.\n");
            }
        }
        out.write("\n" + (md ? "> " + Caution.TEXT : Wrap.wrap(Caution.TEXT, WIDTH, 0)) + "\n");
    }

    /** What a shortlist says once above its table: the switch's own status and the filters asked. */
    static List<String[]> shortlistContext(Shortlist.Result r) {
        List<String[]> lines = new ArrayList<>();
        if (r.switchStatus() != null) {
            lines.add(new String[] {"Switch status", r.switchStatus()});
        }
        if (!r.asked().isEmpty()) {
            lines.add(new String[] {"Asked", String.join(", ", r.asked()) + " (" + r.filteredOut()
                    + " drivers left out, any lacking the value among them)"});
        }
        for (String n : r.notGiven()) {
            lines.add(new String[] {"Not given", n});
        }
        return lines;
    }

    private static void context(Writer out, boolean md, org.gatefit.match.OperatingPoint p,
                                org.gatefit.match.Margins m, List<String> prefilter) throws IOException {
        List<String[]> lines = MatchHtml.context(p, m, prefilter);
        for (String[] l : lines) {
            if (md) {
                out.write("- **" + l[0] + ":** " + Markdown.escape(l[1]) + "\n");
            } else {
                out.write(Wrap.wrap(l[0] + ": " + l[1], WIDTH, 4) + "\n");
            }
        }
    }

    static String driveRatio(PairResult p) {
        double ratio = driveRatioValue(p);
        return Double.isNaN(ratio) ? "" : Eng.num(ratio) + "×";
    }

    /**
     * The drive-current rule's ratio, I_pl/I_req: the weaker plateau current over the current the
     * drain edge needs (NaN when unknown).
     */
    static double driveRatioValue(PairResult p) {
        double req = p.figure("gate-current-plateau-required").map(Figure::value).orElse(Double.NaN);
        double on = p.figure("gate-current-plateau-on").map(Figure::value).orElse(Double.NaN);
        double off = p.figure("gate-current-plateau-off").map(Figure::value).orElse(Double.NaN);
        return Math.min(on, off) / req;
    }

    static String noiseMin(PairResult p) {
        double h = p.figure("noise-margin-high").map(Figure::value).orElse(Double.NaN);
        double l = p.figure("noise-margin-low").map(Figure::value).orElse(Double.NaN);
        double m = Math.min(h, l);
        return Double.isNaN(m) ? "" : Eng.of(m, "V");
    }

    static String fig(PairResult p, String name, String unit) {
        return p.figure(name).map(f -> Eng.of(f.value(), unit)).orElse("");
    }

    /**
     * The rule that decides the verdict: the worst check; among failures the most fundamental
     * ({@link org.gatefit.match.Rule#fundamental}: a high side the driver cannot float on before a
     * drive current too small), among warnings the lowest sub-score. A check waiting only for a value
     * not given ({@link Check#notGiven}, said once above a shortlist) decides only when nothing else
     * keeps the pair from passing.
     */
    static Check decidingCheck(PairResult p) {
        Check worst = null;
        for (Check c : p.checks()) {
            if (worst != null && (c.notGiven() != null) != (worst.notGiven() != null)) {
                if (worst.notGiven() != null && c.verdict() != Verdict.PASS) {
                    worst = c; // a question of the part's own before an open one
                }
                continue;
            }
            if (worst == null || c.verdict().ordinal() > worst.verdict().ordinal()
                    || (c.verdict() == worst.verdict() && c.verdict() == Verdict.FAIL
                        && c.rule().fundamental() < worst.rule().fundamental())
                    || (c.verdict() == worst.verdict() && c.verdict() != Verdict.FAIL && c.score() < worst.score())) {
                worst = c;
            }
        }
        return worst;
    }

    static String deciding(PairResult p) {
        Check c = decidingCheck(p);
        return c == null || c.verdict() == Verdict.PASS ? "" : c.rule().id() + " " + c.verdict().id();
    }

    private static void shortlistJson(Shortlist.Result r, Rendering how, Writer out) throws IOException {
        try (JsonGenerator g = PartsReport.generator(out)) {
            g.writeStartObject();
            how.head(g);
            g.writeStringField("switch", r.switchPart().partNumber());
            g.writeNumberField("evaluated", r.evaluated());
            g.writeNumberField("passing", r.passing());
            g.writeNumberField("warning", r.warning());
            g.writeNumberField("failing", r.failing());
            g.writeNumberField("skipped", r.skipped());
            g.writeArrayFieldStart("asked");
            for (String a : r.asked()) {
                g.writeString(a);
            }
            g.writeEndArray();
            g.writeNumberField("filtered_out", r.filteredOut());
            if (r.switchStatus() != null) {
                g.writeStringField("switch_status", r.switchStatus());
            }
            g.writeArrayFieldStart("not_given");
            for (String n : r.notGiven()) {
                g.writeString(n);
            }
            g.writeEndArray();
            MatchJson.point(g, r.point());
            MatchJson.margins(g, r.margins());
            g.writeArrayFieldStart("prefilter");
            for (String p : r.prefilter()) {
                g.writeString(p);
            }
            g.writeEndArray();
            g.writeArrayFieldStart("candidates");
            int rank = 1;
            for (PairResult p : r.candidates()) {
                g.writeStartObject();
                g.writeNumberField("rank", rank++);
                g.writeStringField("driver", p.driver());
                g.writeStringField("verdict", p.verdict().id());
                g.writeNumberField("score", MatchJson.round(p.score()));
                MatchJson.number(g, "unit_price", p.priceTieBreak());
                MatchJson.checks(g, p);
                MatchJson.figures(g, p);
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeStringField("caution", Caution.TEXT);
            g.writeEndObject();
        }
        out.write('\n');
    }

    private static void shortlistCsv(Shortlist.Result r, Csv out) throws IOException {
        out.row("rank", "driver", "switch", "verdict", "score", "drive_current_ratio", "noise_margin_min_v",
                "driver_power_w", "unit_price", "deciding_rule", "deciding_verdict", "deciding_message");
        int rank = 1;
        for (PairResult p : r.candidates()) {
            Check c = decidingCheck(p);
            double nm = Math.min(p.figure("noise-margin-high").map(Figure::value).orElse(Double.NaN),
                    p.figure("noise-margin-low").map(Figure::value).orElse(Double.NaN));
            out.row(rank++, p.driver(), p.switchPart(), p.verdict().id(), MatchJson.round(p.score()),
                    driveRatioValue(p), nm, p.figure("driver-power").map(Figure::value).orElse(Double.NaN),
                    p.priceTieBreak(), c == null ? "" : c.rule().id(), c == null ? "" : c.verdict().id(),
                    c == null ? "" : c.message());
        }
        out.flush();
    }

    // ------------------------------------------------------------------ explain

    /**
     * The calculation sheet, rendered as {@code how} asks; {@code drive} (switch and loop
     * resistances) lets the HTML page plot the gate waveforms and the gate-loop step response, and
     * may be null.
     */
    public static void explain(PairResult p, GateDrive drive, Rendering how, Writer out) throws IOException {
        explain(p, drive, null, how, out);
    }

    /**
     * {@link #explain(PairResult, GateDrive, Rendering, Writer)} with the pair's gate-drive network
     * (a section after the recommendations; JSON {@code network}); {@code network} may be null.
     */
    public static void explain(PairResult p, GateDrive drive, GateNetwork network, Rendering how, Writer out)
            throws IOException {
        switch (how.format()) {
            case HTML -> MatchHtml.explain(p, drive, network, how.header(), out);
            case SPICE -> GateSpice.write(p, drive, network, out);
            case JSON -> {
                try (JsonGenerator g = PartsReport.generator(out)) {
                    g.writeStartObject();
                    how.head(g);
                    g.writeStringField("driver", p.driver());
                    g.writeStringField("switch", p.switchPart());
                    g.writeStringField("verdict", p.verdict().id());
                    g.writeNumberField("score", MatchJson.round(p.score()));
                    MatchJson.checks(g, p);
                    MatchJson.figures(g, p);
                    MatchJson.point(g, p.point());
                    MatchJson.margins(g, p.margins());
                    MatchJson.waveforms(g, p, drive);
                    if (network != null) {
                        NetworkReports.json(g, network);
                    }
                    g.writeStringField("caution", Caution.TEXT);
                    g.writeEndObject();
                }
                out.write('\n');
            }
            case CSV -> {
                Csv csv = how.csv(out);
                csv.row("section", "name", "verdict_or_value", "unit", "detail");
                for (Check c : p.checks()) {
                    csv.row("check", c.rule().id(), c.verdict().id(), "", c.message());
                }
                for (Figure f : p.figures()) {
                    csv.row("figure", f.name(), f.value(), f.unit(), f.label() + (f.estimated() ? " (estimate)" : ""));
                }
                if (network != null) {
                    for (GateNetwork.Part x : network.parts()) {
                        csv.row("network", x.role(), x.value(), x.unit(), x.rating() + "; " + x.why());
                    }
                }
                csv.flush();
            }
            case TEXT -> {
                how.head(out, false);
                explainText(p, network, out, how.colour());
            }
            case MARKDOWN -> {
                how.head(out, true);
                explainMarkdown(p, network, out);
            }
        }
    }

    private static void explainText(PairResult p, GateNetwork network, Writer out, boolean colour) throws IOException {
        String verdict = p.verdict().id().toUpperCase(java.util.Locale.ROOT);
        out.write("Driver " + p.driver() + " with switch " + p.switchPart() + ": "
                + (colour ? Ansi.paint(p.verdict(), verdict) : verdict) + " (score " + Eng.num(p.score()) + ")\n");
        context(out, false, p.point(), p.margins(), null);
        out.write("\nChecks\n");
        for (Check c : p.checks()) {
            String head = String.format("  %-8s %-14s", "[" + c.verdict().id() + "]", c.rule().id());
            String tag = "[" + c.verdict().id() + "]";
            out.write((colour ? head.replaceFirst(java.util.regex.Pattern.quote(tag),
                    java.util.regex.Matcher.quoteReplacement(Ansi.paint(c.verdict(), tag))) : head)
                    + Wrap.wrap(c.message(), WIDTH, head.length(), head.length()) + "\n");
        }
        out.write("\nFigures\n");
        TextTable t = new TextTable(List.of("figure", "value", "how"), false, true, false);
        for (Figure f : p.figures()) {
            t.add(List.of(f.name(), Eng.of(f.value(), f.unit().equals("1") ? "" : f.unit()),
                    f.label() + (f.estimated() ? " (estimate)" : "")));
        }
        out.write(t.render(Integer.MAX_VALUE));
        out.write("\n");
        for (String line : recommendations(p).lines().toList()) {
            out.write((line.startsWith("  ") ? "  " + Wrap.wrap(line.strip(), WIDTH, 4, 2) : line) + "\n");
        }
        if (network != null) {
            out.write("\n" + NetworkReports.text(network, WIDTH));
        }
        out.write(Wrap.wrap(Caution.TEXT, WIDTH, 0) + "\n");
    }

    private static void explainMarkdown(PairResult p, GateNetwork network, Writer out) throws IOException {
        out.write("## Driver " + Markdown.escape(p.driver()) + " with switch " + Markdown.escape(p.switchPart()) + ": **"
                + p.verdict().id() + "** (score " + Eng.num(p.score()) + ")\n\n");
        context(out, true, p.point(), p.margins(), null);
        TextTable c = new TextTable(List.of("rule", "verdict", "why"));
        for (Check x : p.checks()) {
            c.add(List.of(x.rule().id(), x.verdict().id(), x.message()));
        }
        out.write("\n### Checks\n\n" + c.markdown());
        TextTable t = new TextTable(List.of("figure", "value", "how"), false, true, false);
        for (Figure f : p.figures()) {
            t.add(List.of(f.name(), Eng.of(f.value(), f.unit().equals("1") ? "" : f.unit()),
                    f.label() + (f.estimated() ? " (estimate)" : "")));
        }
        out.write("\n### Figures\n\n" + t.markdown());
        out.write("\n### Recommendations\n\n" + Markdown.escape(recommendations(p)).replace("\n", "\n\n") + "\n");
        if (network != null) {
            out.write(NetworkReports.markdown(network));
        }
        out.write("\n> " + Caution.TEXT + "\n");
    }

    /** Gate resistor, bootstrap and timing advice from the figures. */
    static String recommendations(PairResult p) {
        StringBuilder sb = new StringBuilder("Recommendations\n");
        double min = p.figure("gate-resistor-min").map(Figure::value).orElse(Double.NaN);
        double max = p.figure("gate-resistor-max").map(Figure::value).orElse(Double.NaN);
        double rec = p.figure("gate-resistor-recommended").map(Figure::value).orElse(Double.NaN);
        String floor = p.figure("gate-resistor-min").map(f -> f.label().replaceFirst("^per switch, set by ", ""))
                .orElse("");
        if (!Double.isNaN(min) && !Double.isNaN(max)) {
            if (max < min || max <= 0) {
                sb.append("  Gate resistor: no external value meets both the floor (≥ ").append(Eng.of(min, "Ω"))
                        .append(", set by ").append(floor).append(") and the edge (≤ ").append(Eng.of(max, "Ω"))
                        .append(max <= 0 ? ": the driver is short of the plateau current even with 0 Ω" : "")
                        .append("); relax the edge, shorten the gate loop, or pick a stronger driver or one with a"
                                + " Miller clamp.\n");
            } else {
                sb.append("  Gate resistor: ").append(Eng.of(min, "Ω")).append(" to ").append(Eng.of(max, "Ω"))
                        .append(" per switch");
                if (!Double.isNaN(rec)) {
                    sb.append("; ").append(Eng.of(rec, "Ω")).append(" (IEC 60063 E24)");
                }
                sb.append(" — the floor set by ").append(floor).append(", the top by the drive-current margin on the"
                        + " turn-on plateau.\n");
            }
        } else if (!Double.isNaN(min)) {
            sb.append("  Gate resistor: ≥ ").append(Eng.of(min, "Ω")).append(" per switch (set by ").append(floor)
                    .append("); the top needs the switch's Q_gd and plateau voltage.\n");
        } else {
            sb.append("  Gate resistor: give the switch's C_iss to size it against ringing.\n");
        }
        p.figure("bootstrap-capacitance-recommended").ifPresent(f -> sb.append("  Bootstrap: ")
                .append(Eng.of(f.value(), "F")).append(" capacitor (minimum ")
                .append(Eng.of(p.figure("bootstrap-capacitance-min").map(Figure::value).orElse(Double.NaN), "F"))
                .append("), V_DD decoupling about ten times that, diode rated above the bus.\n"));
        double ton = p.figure("delay-time-on").map(Figure::value).orElse(Double.NaN)
                + p.figure("plateau-time-on").map(Figure::value).orElse(Double.NaN);
        double toff = p.figure("delay-time-off").map(Figure::value).orElse(Double.NaN)
                + p.figure("plateau-time-off").map(Figure::value).orElse(Double.NaN);
        if (!Double.isNaN(ton) && !Double.isNaN(toff)) {
            sb.append("  Switching: about ").append(Eng.of(ton, "s")).append(" to the end of the turn-on plateau, ")
                    .append(Eng.of(toff, "s")).append(" to the end of turn-off");
            if (toff > ton) {
                sb.append(" (turn-off is the slower edge; size dead time from it)");
            }
            sb.append(".\n");
        }
        p.check(Rule.DRIVER_POWER).ifPresent(c -> p.figure("driver-power").ifPresent(f -> sb.append("  Driver loss: ")
                .append(Eng.of(f.value(), "W")).append(" (").append(c.verdict().id()).append(").\n")));
        return sb.toString().stripTrailing();
    }
}
