package org.gatefit.report;

import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.gatefit.match.Check;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.PairResult;
import org.gatefit.physics.GateWaveform;

/** JSON pieces shared by the shortlist, explain and check reports (keys per DESIGN.md). */
final class MatchJson {
    private MatchJson() {
    }

    static void checks(JsonGenerator g, PairResult r) throws IOException {
        g.writeArrayFieldStart("checks");
        for (Check c : r.checks()) {
            check(g, c);
        }
        g.writeEndArray();
    }

    static void check(JsonGenerator g, Check c) throws IOException {
        g.writeStartObject();
        g.writeStringField("rule", c.rule().id());
        g.writeStringField("verdict", c.verdict().id());
        g.writeStringField("message", c.message());
        g.writeNumberField("score", round(c.score()));
        if (c.notGiven() != null) {
            g.writeStringField("not_given", c.notGiven());
        }
        g.writeArrayFieldStart("compared");
        for (Check.Comparison x : c.compared()) {
            g.writeStartObject();
            g.writeStringField("quantity", x.quantity());
            number(g, "value", x.value());
            g.writeStringField("relation", x.relation());
            number(g, "limit", x.limit());
            g.writeStringField("unit", x.unit());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    static void figures(JsonGenerator g, PairResult r) throws IOException {
        g.writeArrayFieldStart("figures");
        for (Figure f : r.figures()) {
            figure(g, f);
        }
        g.writeEndArray();
    }

    static void figure(JsonGenerator g, Figure f) throws IOException {
        g.writeStartObject();
        g.writeStringField("name", f.name());
        number(g, "value", f.value());
        g.writeStringField("unit", f.unit());
        g.writeStringField("label", f.label());
        g.writeBooleanField("estimated", f.estimated());
        g.writeEndObject();
    }

    static void point(JsonGenerator g, OperatingPoint p) throws IOException {
        g.writeObjectFieldStart("operating_point");
        g.writeStringField("side", p.highSide() ? "high" : "low");
        number(g, "bus_v", p.bus());
        number(g, "f_sw_hz", p.fSw());
        number(g, "edge_s", p.edge());
        number(g, "v_drive_v", p.vDrive());
        number(g, "v_drive_neg_v", p.vDriveNeg());
        if (p.logic() != null) {
            g.writeStringField("logic", p.logic().id());
        }
        number(g, "v_oh_v", p.vOh());
        number(g, "v_ol_v", p.vOl());
        g.writeStringField("pwm_sense", p.activeHigh() ? "active-high" : "active-low");
        number(g, "r_g_ohm", p.rG());
        number(g, "r_g_off_ohm", p.rGOff());
        number(g, "duty_max", p.dutyMax());
        g.writeNumberField("parallel", p.parallel());
        number(g, "loop_h", p.loop());
        number(g, "v_f_boot_v", p.diodeDrop());
        number(g, "r_boot_ohm", p.rBoot());
        number(g, "dv_dt_v_per_ns", p.dvdt() * 1e-9);
        g.writeBooleanField("bridge", p.bridge());
        number(g, "power_loop_h", p.powerLoop());
        number(g, "i_load_a", p.iLoad());
        number(g, "t_j_c", p.tj());
        if (p.twin() != null) {
            // The other switch's turn-on edge the dv-dt rule judged (explain --twin-edge NAME=COLD,HOT).
            g.writeObjectFieldStart("twin");
            g.writeStringField("name", p.twin().name());
            number(g, "dv_dt_25c_v_per_ns", p.twin().slewCold() * 1e-9);
            number(g, "dv_dt_tj_v_per_ns", p.twin().slewHot() * 1e-9);
            g.writeEndObject();
        }
        g.writeEndObject();
        g.writeArrayFieldStart("assumed");
        for (String a : p.assumed()) {
            g.writeString(a);
        }
        g.writeEndArray();
    }

    static void margins(JsonGenerator g, Margins m) throws IOException {
        g.writeObjectFieldStart("margins");
        for (Map.Entry<String, Double> e : m.asMap().entrySet()) {
            g.writeNumberField(e.getKey(), e.getValue());
        }
        g.writeEndObject();
    }

    /** Points a waveform is sampled at in the JSON (the HTML charts draw more). */
    static final int WAVEFORM_SAMPLES = 121;

    /**
     * {@code "waveforms": {"turn_on": {...}, "turn_off": {...}}}, each edge's gate voltage and
     * current sampled from the start of the edge ({@code time_s}, {@code v_gs_v}, {@code i_g_a}, with
     * {@code plateau_start_s} and {@code plateau_end_s}), as the HTML sheet plots them; null when
     * the catalog lacks what the model needs (or no gate drive is known).
     */
    static void waveforms(JsonGenerator g, PairResult p, GateDrive drive) throws IOException {
        List<GateWaveform.Edge> edges = drive == null ? List.of() : MatchHtml.edges(p, drive);
        if (edges.isEmpty()) {
            g.writeNullField("waveforms");
            return;
        }
        g.writeObjectFieldStart("waveforms");
        for (GateWaveform.Edge e : edges) {
            GateWaveform.Waveform w = e.sample(WAVEFORM_SAMPLES);
            g.writeObjectFieldStart(e.rising() ? "turn_on" : "turn_off");
            number(g, "plateau_start_s", e.plateauStart());
            number(g, "plateau_end_s", e.plateauEnd());
            array(g, "time_s", w.time());
            array(g, "v_gs_v", w.gateVoltage());
            array(g, "i_g_a", w.gateCurrent());
            g.writeEndObject();
        }
        g.writeEndObject();
    }

    private static void array(JsonGenerator g, String name, double[] v) throws IOException {
        g.writeArrayFieldStart(name);
        for (double x : v) {
            if (Double.isFinite(x)) {
                g.writeNumber(Double.parseDouble(String.format(java.util.Locale.ROOT, "%.5g", x)));
            } else {
                g.writeNull();
            }
        }
        g.writeEndArray();
    }

    /** NaN and infinities as null (JSON has no such numbers). */
    static void number(JsonGenerator g, String name, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumberField(name, v);
        } else {
            g.writeNullField(name);
        }
    }

    static double round(double v) {
        return Math.round(v * 1e4) / 1e4;
    }

    /** The operating point in one line for text reports. */
    static String pointLine(OperatingPoint p) {
        StringBuilder sb = new StringBuilder();
        sb.append(p.highSide() ? "high side" : "low side");
        sb.append(", bus ").append(Eng.of(p.bus(), "V"));
        sb.append(", ").append(Eng.of(p.fSw(), "Hz"));
        sb.append(", edge ").append(Eng.of(p.edge(), "s"));
        sb.append(", on ").append(Eng.of(p.vDrive(), "V")).append(" / off ").append(Eng.of(p.vDriveNeg(), "V"));
        sb.append(", controller ").append(p.logic() == null ? "" : p.logic().id() + " ")
                .append("(V_OH ").append(Eng.of(p.vOh(), "V")).append(", V_OL ").append(Eng.of(p.vOl(), "V")).append(')');
        sb.append(", PWM ").append(p.activeHigh() ? "active-high" : "active-low");
        sb.append(", R_g ").append(Eng.of(p.rG(), "Ω")).append(" / ").append(Eng.of(p.rGOff(), "Ω"));
        if (!Double.isNaN(p.dutyMax())) {
            sb.append(", duty ≤ ").append(Eng.pct(p.dutyMax()));
        }
        if (p.parallel() > 1) {
            sb.append(", ").append(p.parallel()).append(" in parallel");
        }
        sb.append(", loop ").append(Eng.of(p.loop(), "H"));
        if (!Double.isNaN(p.dvdt())) {
            sb.append(", dv/dt ").append(Eng.slew(p.dvdt()));
        }
        if (!Double.isNaN(p.powerLoop()) || !Double.isNaN(p.iLoad())) {
            sb.append(", power loop ").append(Eng.of(p.powerLoop(), "H")).append(" at ").append(Eng.of(p.iLoad(), "A"));
        }
        sb.append(p.bridge() ? ", in a bridge" : ", single switch");
        sb.append(", hot corner ").append(Eng.num(p.tj())).append(" °C");
        return sb.toString();
    }

    /** The margins in one line. */
    static String marginsLine(Margins m) {
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<String, Double> e : m.asMap().entrySet()) {
            if (sb.length() > 0) {
                sb.append(", ");
            }
            String u = Margins.unitOf(e.getKey());
            sb.append(e.getKey()).append(' ').append(Eng.num(e.getValue())).append(u.equals("V") ? " V" : u);
        }
        return sb.toString();
    }
}
