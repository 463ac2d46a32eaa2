package org.gatefit.report;

import java.awt.Color;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.PairResult;
import org.gatefit.match.Rule;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;
import org.gatefit.match.Verdict;
import org.gatefit.physics.GateLoop;
import org.gatefit.physics.GateWaveform;

/** HTML pages of {@code shortlist} and {@code explain}. */
final class MatchHtml {
    private static final int SAMPLES = 600;
    /** Rules whose margins the shortlist chart compares across candidates. */
    private static final List<Rule> DECIDING = List.of(Rule.DRIVE_CURRENT, Rule.GATE_VOLTAGE, Rule.LOGIC_LEVEL,
            Rule.DRIVER_POWER, Rule.DV_DT);

    private MatchHtml() {
    }

    static List<String[]> context(OperatingPoint p, org.gatefit.match.Margins m, List<String> prefilter) {
        List<String[]> lines = new ArrayList<>();
        lines.add(new String[] {"Operating point", MatchJson.pointLine(p)});
        for (String a : p.assumed()) {
            lines.add(new String[] {"Assumed", a});
        }
        lines.add(new String[] {"Margins", MatchJson.marginsLine(m)});
        if (prefilter != null && !prefilter.isEmpty()) {
            lines.add(new String[] {"Prefilter", String.join("; ", prefilter) + " (only drivers certain to fail are skipped)"});
        }
        return lines;
    }

    // ------------------------------------------------------------------ shortlist

    static void shortlist(Shortlist.Result r, ReportHeader header, Writer out) throws IOException {
        SwitchPart s = r.switchPart();
        Html.begin(out, "Drivers for " + s.partNumber(), header);
        out.write("<h1>Drivers for " + Html.part(s.partNumber()) + "</h1>\n");
        out.write("<p class=\"summary\">" + Html.withParts(MatchReports.switchLine(s), s.partNumber()) + (s.maker() == null ? ""
                : " by " + Html.esc(s.maker())) + ": " + r.evaluated() + " evaluated, " + Html.verdict(Verdict.PASS) + " "
                + r.passing() + ", " + Html.verdict(Verdict.WARN) + " " + r.warning() + ", " + Html.verdict(Verdict.FAIL)
                + " " + r.failing() + (r.skipped() > 0 ? "; " + r.skipped() + " more skipped by the prefilter (each certain"
                + " to fail)" : "") + "</p>\n");
        List<String[]> said = new java.util.ArrayList<>(MatchReports.shortlistContext(r));
        said.addAll(context(r.point(), r.margins(), r.prefilter()));
        out.write(Html.context(said));
        out.write("<h2>Ranking</h2>\n");
        if (r.candidates().isEmpty()) {
            out.write("<p>No driver in the catalog works with this switch at this operating point"
                    + (r.failing() > 0 ? "; run with --all to see why each fails" : "") + ".</p>\n");
            Html.end(out);
            return;
        }
        out.write("<table class=\"ranking\">\n<thead><tr><th>#</th><th>driver</th><th>verdict</th><th>score</th>"
                + "<th>I_pl/I_req</th><th>NM min</th><th>P_driver</th><th>price</th><th>deciding</th></tr></thead>\n<tbody>\n");
        int i = 1;
        for (PairResult p : r.candidates()) {
            out.write("<tr><td class=\"num\">" + i++ + "</td><td>" + Html.part(p.driver()) + "</td><td>"
                    + Html.verdict(p.verdict()) + "</td><td class=\"num\">" + Eng.num(p.score()) + "</td><td class=\"num\">"
                    + Html.esc(MatchReports.driveRatio(p)) + "</td><td class=\"num\">" + Html.esc(MatchReports.noiseMin(p))
                    + "</td><td class=\"num\">" + Html.esc(MatchReports.fig(p, "driver-power", "W")) + "</td><td class=\"num\">"
                    + (Double.isNaN(p.priceTieBreak()) ? "" : Eng.num(p.priceTieBreak())) + "</td><td>"
                    + Html.esc(MatchReports.deciding(p)) + "</td></tr>\n");
        }
        out.write("</tbody>\n</table>\n");
        List<PairResult> top = r.candidates().subList(0, Math.min(10, r.candidates().size()));
        out.write("<h2>Deciding margins of the top candidates</h2>\n");
        out.write(Html.figure(decidingChart("Margins against the limits, top " + top.size(), top),
                "Per candidate, each rule's tightest comparison as a fraction of its limit (0 = at the limit): the"
                        + " drive-current ratio, gate-voltage headroom, logic noise margin, driver-power share of the"
                        + " package limit and dv/dt immunity. Missing bars: the rule compared nothing (unknown data)."));
        out.write("<h2>What to look at</h2>\n<ul>\n");
        boolean any = false;
        i = 1;
        for (PairResult p : r.candidates()) {
            for (Check c : p.checks()) {
                if (c.verdict() != Verdict.PASS) {
                    any = true;
                    out.write("<li>" + i + " " + Html.part(p.driver()) + " " + Html.verdict(c.verdict()) + " "
                            + Html.esc(c.rule().id() + ": " + c.message()) + "</li>\n");
                }
            }
            i++;
        }
        if (!any) {
            out.write("<li>Every listed driver passes every rule.</li>\n");
        }
        out.write("</ul>\n");
        if (r.failing() > 0 && r.candidates().stream().noneMatch(p -> p.verdict() == Verdict.FAIL)) {
            out.write("<p class=\"note\">" + r.failing() + " failing drivers not shown; --all lists them with their"
                    + " reasons.</p>\n");
        }
        Html.end(out);
    }

    private static String decidingChart(String title, List<PairResult> top) {
        List<String> cats = new ArrayList<>();
        int i = 1;
        for (PairResult p : top) {
            cats.add(i++ + " " + p.driver());
        }
        List<String> series = new ArrayList<>();
        double[][] v = new double[DECIDING.size()][top.size()];
        for (int s = 0; s < DECIDING.size(); s++) {
            series.add(DECIDING.get(s).id());
            for (int c = 0; c < top.size(); c++) {
                Check ch = top.get(c).check(DECIDING.get(s)).orElse(null);
                Check.Comparison x = ch == null ? null : Html.tightest(ch);
                v[s][c] = x == null ? Double.NaN : Html.margin(x);
            }
        }
        return Charts.grouped(title, "margin against the limit (clipped to −1 … 3)", cats, series, v, -1, 3);
    }

    // ------------------------------------------------------------------ explain

    static void explain(PairResult p, GateDrive g, org.gatefit.match.GateNetwork network, ReportHeader header, Writer out)
            throws IOException {
        Html.begin(out, "Driver " + p.driver() + " with switch " + p.switchPart(), header);
        out.write("<h1>Driver " + Html.part(p.driver()) + " with switch " + Html.part(p.switchPart()) + "</h1>\n");
        out.write("<p class=\"summary\">Verdict " + Html.verdict(p.verdict()) + ", score " + Eng.num(p.score())
                + (g == null ? "" : " · " + Html.withParts(MatchReports.switchLine(g.switchPart()), g.switchPart().partNumber())
                + (g.switchPart().maker() == null ? "" : " by " + Html.esc(g.switchPart().maker()))) + "</p>\n");
        out.write(Html.context(context(p.point(), p.margins(), null)));
        out.write("<h2>Checks</h2>\n" + Html.checks(p.checks()));
        out.write("<h2>Margins</h2>\n" + Html.marginChart("Margin of each rule against its limit", p.checks()));
        if (g != null) {
            out.write("<h2>Gate waveforms</h2>\n" + waveforms(p, g));
            out.write("<h2>Gate-loop step response</h2>\n" + stepResponse(p, g));
        }
        out.write("<h2>Calculation</h2>\n" + Html.figures(p.figures()));
        out.write("<h2>Recommendations</h2>\n<ul>\n");
        for (String line : MatchReports.recommendations(p).lines().skip(1).toList()) {
            out.write("<li>" + Html.esc(line.strip()) + "</li>\n");
        }
        out.write("</ul>\n");
        if (network != null) {
            out.write(NetworkReports.html(network));
        }
        Html.end(out);
    }

    // ------------------------------------------------------------------ explain with several drivers

    /** Two to four drivers with one switch: checks and figures side by side, the gate waveforms overlaid. */
    static void compare(List<PairResult> pairs, List<GateDrive> drives, ReportHeader header, Writer out)
            throws IOException {
        String title = CompareReports.title(pairs);
        Html.begin(out, title, header);
        out.write("<h1>" + Html.esc(title) + "</h1>\n");
        out.write(Html.context(context(pairs.get(0).point(), pairs.get(0).margins(), null)));
        StringBuilder head = new StringBuilder("<thead><tr><th></th>");
        for (PairResult p : pairs) {
            head.append("<th>").append(Html.part(p.driver())).append("</th>");
        }
        head.append("</tr></thead>\n");
        out.write("<h2>Checks</h2>\n<table class=\"compare\">\n" + head + "<tbody>\n<tr><td>verdict</td>");
        for (PairResult p : pairs) {
            out.write("<td>" + Html.verdict(p.verdict()) + " " + Eng.num(p.score()) + "</td>");
        }
        out.write("</tr>\n");
        for (Rule r : CompareReports.rules(pairs)) {
            out.write("<tr><td>" + Html.esc(r.id()) + "</td>");
            for (PairResult p : pairs) {
                String cell = p.checks().stream().filter(c -> c.rule() == r).findFirst()
                        .map(c -> Html.verdict(c.verdict()) + "<br><span class=\"muted\">" + Html.esc(c.message())
                                + "</span>").orElse("");
                out.write("<td>" + cell + "</td>");
            }
            out.write("</tr>\n");
        }
        out.write("</tbody>\n</table>\n");
        out.write("<h2>Gate waveforms</h2>\n" + overlaid(pairs, drives));
        out.write("<h2>Calculation</h2>\n<table class=\"compare figures\">\n" + head + "<tbody>\n");
        for (String f : CompareReports.figures(pairs)) {
            out.write("<tr><td>" + Html.esc(f) + "</td>");
            for (PairResult p : pairs) {
                out.write("<td class=\"num\">" + Html.esc(CompareReports.value(p, f)) + "</td>");
            }
            out.write("</tr>\n");
        }
        out.write("</tbody>\n</table>\n");
        Html.end(out);
    }

    /** V_GS of turn-on and of turn-off, one line per driver in one chart each. */
    private static String overlaid(List<PairResult> pairs, List<GateDrive> drives) {
        StringBuilder sb = new StringBuilder();
        SwitchPart s = drives.get(0).switchPart();
        OperatingPoint op = pairs.get(0).point();
        GateWaveform.GateCurve c = curve(s, op.parallel());
        if (c == null || !(op.vDrive() > s.vPlateau())) {
            return "<p class=\"note\">No waveform: it needs the switch's Q_gd and V_plateau with C_iss or Q_gs, and an"
                    + " on level above the plateau.</p>\n";
        }
        for (boolean rising : new boolean[] {true, false}) {
            List<GateWaveform.Waveform> ws = new ArrayList<>();
            List<String> names = new ArrayList<>();
            double longest = 0;
            for (int k = 0; k < pairs.size(); k++) {
                GateDrive g = drives.get(k);
                double r = rising ? g.rOn() : g.rOff();
                if (!(r > 0)) {
                    continue;
                }
                GateWaveform.Edge e = rising ? GateWaveform.turnOn(c, op.vDrive(), op.vDriveNeg(), r)
                        : GateWaveform.turnOff(c, op.vDrive(), op.vDriveNeg(), r);
                GateWaveform.Waveform w = e.sample(SAMPLES);
                ws.add(w);
                names.add(pairs.get(k).driver() + " (" + Eng.of(r, "Ω") + ")");
                longest = Math.max(longest, w.time()[w.time().length - 1]);
            }
            if (ws.isEmpty()) {
                sb.append("<p class=\"note\">No ").append(rising ? "turn-on" : "turn-off")
                        .append(" waveform: no driver's output resistance is known.</p>\n");
                continue;
            }
            Scale ts = Scale.time(longest);
            List<Charts.Line> lines = new ArrayList<>();
            for (int k = 0; k < ws.size(); k++) {
                lines.add(new Charts.Line(names.get(k), ts.apply(ws.get(k).time()), ws.get(k).gateVoltage(), false));
            }
            List<Charts.Level> levels = new ArrayList<>();
            levels.add(new Charts.Level("plateau " + Eng.of(s.vPlateau(), "V"), s.vPlateau(), new Color(0xB35900)));
            if (!Double.isNaN(s.vThMin())) {
                levels.add(new Charts.Level("V_th,min " + Eng.of(s.vThMin(), "V"), s.vThMin(), new Color(0xC62828)));
            }
            String what = rising ? "Turn-on" : "Turn-off";
            sb.append(Html.figure(Charts.lines(what + ": V_GS with each driver", "time (" + ts.unit() + ")", "V_GS (V)",
                    lines, levels), what + " (estimate), one line per driver through its total loop resistance (in"
                    + " brackets); dashed lines the plateau and threshold levels. Loop inductance is ignored."));
        }
        return sb.toString();
    }

    /** Time axis scale: the unit and its factor for the longest time shown. */
    private record Scale(String unit, double factor) {
        static Scale time(double seconds) {
            return seconds < 2e-6 ? new Scale("ns", 1e9) : seconds < 2e-3 ? new Scale("µs", 1e6) : new Scale("ms", 1e3);
        }

        static Scale current(double amps) {
            return amps < 1 ? new Scale("mA", 1e3) : new Scale("A", 1);
        }

        double[] apply(double[] v) {
            double[] o = new double[v.length];
            for (int i = 0; i < v.length; i++) {
                o[i] = v[i] * factor;
            }
            return o;
        }
    }

    /** The gate curve of the parallel switches, or null when the catalog lacks the figures. */
    private static GateWaveform.GateCurve curve(SwitchPart s, int n) {
        if (Double.isNaN(s.qGd()) || Double.isNaN(s.vPlateau()) || s.vPlateau() <= 0) {
            return null;
        }
        try {
            if (!Double.isNaN(s.cIss()) && s.cIss() > 0) {
                return GateWaveform.GateCurve.ofInputCapacitance(n * s.cIss(), s.vPlateau(), n * s.qGd());
            }
            if (!Double.isNaN(s.qGs()) && !Double.isNaN(s.qGVgs())) {
                return GateWaveform.GateCurve.fromGateCharge(n * s.qG(), n * s.qGs(), n * s.qGd(), s.qGVgs(), s.vPlateau());
            }
        } catch (IllegalArgumentException e) {
            return null;
        }
        return null;
    }

    /**
     * The pair's turn-on and turn-off edges, or an empty list when the catalog lacks what they need
     * (the HTML sheet's charts and the explain JSON's {@code waveforms} both come from here).
     */
    static List<GateWaveform.Edge> edges(PairResult p, GateDrive g) {
        SwitchPart s = g.switchPart();
        OperatingPoint op = p.point();
        GateWaveform.GateCurve c = curve(s, op.parallel());
        if (c == null || !(op.vDrive() > s.vPlateau()) || !(g.rOn() > 0) || !(g.rOff() > 0)) {
            return List.of();
        }
        return List.of(GateWaveform.turnOn(c, op.vDrive(), op.vDriveNeg(), g.rOn()),
                GateWaveform.turnOff(c, op.vDrive(), op.vDriveNeg(), g.rOff()));
    }

    private static String waveforms(PairResult p, GateDrive g) {
        SwitchPart s = g.switchPart();
        OperatingPoint op = p.point();
        List<GateWaveform.Edge> edges = edges(p, g);
        if (edges.isEmpty()) {
            return "<p class=\"note\">No waveform: it needs the switch's Q_gd and V_plateau with C_iss or Q_gs, driver"
                    + " output resistances, and an on level above the plateau.</p>\n";
        }
        StringBuilder sb = new StringBuilder();
        for (GateWaveform.Edge e : edges) {
            GateWaveform.Waveform w = e.sample(SAMPLES);
            double[] t = w.time();
            Scale ts = Scale.time(t[t.length - 1]);
            double peak = 0;
            for (double i : w.gateCurrent()) {
                peak = Math.max(peak, Math.abs(i));
            }
            Scale is = Scale.current(peak);
            List<Charts.Level> levels = new ArrayList<>();
            levels.add(new Charts.Level("plateau " + Eng.of(s.vPlateau(), "V"), s.vPlateau(), new Color(0xB35900)));
            if (!Double.isNaN(s.vThMin())) {
                levels.add(new Charts.Level("V_th,min " + Eng.of(s.vThMin(), "V"), s.vThMin(), new Color(0xC62828)));
            }
            if (!Double.isNaN(s.vThMax()) && s.vThMax() != s.vThMin()) {
                levels.add(new Charts.Level("V_th,max " + Eng.of(s.vThMax(), "V"), s.vThMax(), new Color(0x8E44AD)));
            }
            String what = e.rising() ? "Turn-on" : "Turn-off";
            String title = what + ": V_GS and I_G through " + Eng.of(e.rising() ? g.rOn() : g.rOff(), "Ω");
            sb.append(Html.figure(Charts.edge(title, ts.unit(), ts.apply(t), w.gateVoltage(), is.unit(),
                    is.apply(w.gateCurrent()), e.plateauStart() * ts.factor(), e.plateauEnd() * ts.factor(), levels),
                    what + " (estimate): the gate charges from " + Eng.of(e.rising() ? op.vDriveNeg() : op.vDrive(), "V")
                            + " toward " + Eng.of(e.rising() ? op.vDrive() : op.vDriveNeg(), "V") + " through the total loop"
                            + " resistance; the shaded band is the Miller plateau (" + Eng.of(e.plateauStart(), "s") + " to "
                            + Eng.of(e.plateauEnd(), "s") + "), dashed lines the plateau and threshold levels. Loop"
                            + " inductance is ignored here; the step response below shows it."));
        }
        return sb.toString();
    }

    private static String stepResponse(PairResult p, GateDrive g) {
        SwitchPart s = g.switchPart();
        OperatingPoint op = p.point();
        double rec = p.figure("gate-resistor-recommended").map(Figure::value).orElse(Double.NaN);
        if (Double.isNaN(s.cIss()) || s.cIss() <= 0 || !(op.loop() > 0) || Double.isNaN(g.rOn())) {
            return "<p class=\"note\">No step response: it needs the switch's C_iss and the driver's output"
                    + " resistance.</p>\n";
        }
        double cap = op.parallel() * s.cIss();
        double l = op.loop();
        double rRec = Double.isNaN(rec) ? Double.NaN : g.rFixedOn() + rec / op.parallel();
        double rMax = Double.isNaN(rRec) ? g.rOn() : Math.max(g.rOn(), rRec);
        double f0 = GateLoop.resonance(l, cap);
        double duration = Math.max(3.5 / f0, 6 * rMax * cap);
        double step = op.vDrive() - op.vDriveNeg();
        Scale ts = Scale.time(duration);
        double[] t = new double[SAMPLES];
        double[] chosen = new double[SAMPLES];
        double[] recommended = new double[SAMPLES];
        for (int k = 0; k < SAMPLES; k++) {
            double tk = duration * k / (SAMPLES - 1);
            t[k] = tk * ts.factor();
            chosen[k] = op.vDriveNeg() + GateLoop.stepResponse(g.rOn(), l, cap, step, tk);
            recommended[k] = Double.isNaN(rRec) ? 0 : op.vDriveNeg() + GateLoop.stepResponse(rRec, l, cap, step, tk);
        }
        GateLoop.Ringing ringChosen = GateLoop.ringing(g.rOn(), l, cap, step);
        List<Charts.Line> lines = new ArrayList<>();
        lines.add(new Charts.Line("chosen R_g " + Eng.of(op.rG(), "Ω") + " (ζ " + Eng.num(ringChosen.dampingRatio())
                + ", overshoot " + Eng.pct(ringChosen.overshoot()) + ")", t, chosen, false));
        String caption;
        if (!Double.isNaN(rRec)) {
            GateLoop.Ringing ringRec = GateLoop.ringing(rRec, l, cap, step);
            lines.add(new Charts.Line("gate-resistor-recommended " + Eng.of(rec, "Ω") + " (ζ "
                    + Eng.num(ringRec.dampingRatio()) + ", overshoot " + Eng.pct(ringRec.overshoot()) + ")", t,
                    recommended, true));
            caption = "The gate loop as a series R-L-C (L " + Eng.of(l, "H") + ", C_iss " + Eng.of(cap, "F")
                    + ") stepped from the off to the on level: the chosen resistor against the recommended one"
                    + " (figure gate-resistor-recommended). ζ below about 0.7 rings; the overshoot adds to V_GS.";
        } else {
            caption = "The gate loop as a series R-L-C (L " + Eng.of(l, "H") + ", C_iss " + Eng.of(cap, "F")
                    + ") stepped from the off to the on level with the chosen resistor; no E24 value meets both the"
                    + " damping and the edge target, so there is no recommended curve.";
        }
        List<Charts.Level> levels = new ArrayList<>();
        levels.add(new Charts.Level("on level " + Eng.of(op.vDrive(), "V"), op.vDrive(), new Color(0x555555)));
        if (!Double.isNaN(s.vGsMax())) {
            levels.add(new Charts.Level("V_GS,max " + Eng.of(s.vGsMax(), "V"), s.vGsMax(), new Color(0xC62828)));
        }
        return Html.figure(Charts.lines("Gate-loop step response: ringing against damped", "time (" + ts.unit() + ")",
                "V_GS (V)", lines, levels), caption);
    }
}
