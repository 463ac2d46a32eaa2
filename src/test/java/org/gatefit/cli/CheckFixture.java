package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * A small invented catalog (maker Testmaker, parts TST-…) for the {@code check} tests, and
 * helpers to read {@code check --format json}. The parts are test inputs only; every check value
 * in the tests is derived by hand from the cells below.
 *
 * <p>Baseline pair TST-DRV1 + TST-SW1 at the baseline stage (12 V / 0 V, 20 kHz, 100 ns edge,
 * R_g 2.2 Ω, R_g,off 1.0 Ω, V_OH 3.1 V / V_OL 0.2 V, active-high, 48 V bus, duty 0.9, 5 nH):
 * <ul>
 *   <li>R_on,total = 2 + 2.2 + 1 = 5.2 Ω, R_off,total = 1 + 1 + 1 = 3 Ω.
 *   <li>I_req = Q_g / t = 50 nC / 100 ns = 0.5 A (REFERENCES.md §1); peak source = min(4 A,
 *       12 V / 5.2 Ω = 2.31 A), peak sink = min(6 A, 12 / 3 = 4 A): ratio 4.6 ≥ 1.5 margin
 *       (common practice, no source).
 *   <li>12 V on: within the 8–20 V driver supply, ≤ 0.9·20 = 18 V (10 % headroom, common
 *       practice), ≥ the 10 V R_DS(on) is specified at, above V_th,max 4 V (REFERENCES.md §5).
 *   <li>0 V off ≥ V_GS,min −20 V; UVLO rising 7 V + 1 V headroom ≤ 12 V; UVLO falling 6.5 V ≥
 *       the 5 V plateau (REFERENCES.md §5).
 *   <li>NM_H = 3.1 − 2.0 = 1.1 V, NM_L = 0.8 − 0.2 = 0.6 V, both ≥ 0.1 V (REFERENCES.md §6).
 *   <li>P_G = Q_g·ΔV·f = 50 nC · 12 V · 20 kHz = 12 mW (REFERENCES.md §2); the driver's share
 *       6 mW·2/5.2 + 6 mW·1/3 = 4.3 mW ≪ 0.7 · 0.5 W.
 *   <li>dv/dt = bus / t_plateau,on = 48 V / (10 nC · 5.2 Ω / (12 − 5) V = 7.43 ns) = 6.46 V/ns;
 *       bound C_gd·dv/dt·R_off = 20 pF · 6.46 V/ns · 3 Ω = 0.39 V ≤ 0.7 · V_th,min 2 V = 1.4 V
 *       (REFERENCES.md §7; 0.7 common practice, no source).
 * </ul>
 */
final class CheckFixture {
    static final ObjectMapper JSON = new ObjectMapper();

    static final String SWITCHES = """
            part_number,maker,package,lifecycle,stock,technology,v_block_v,r_on_mohm,r_on_vgs_v,v_th_min_v,v_th_max_v,v_gs_max_v,v_gs_min_v,v_gate_on_v,v_gate_off_v,q_g_nc,q_g_vgs_v,q_gs_nc,q_gd_nc,v_plateau_v,c_iss_pf,c_rss_pf,r_g_int_ohm
            TST-SW1,Testmaker,TST-PAK8,active,1000,si-mosfet,100,5,10,2.0,4.0,20,-20,10,0,50,12,15,10,5,3000,20,1
            TST-SW3,Testmaker,TST-PAK8,active,1000,gan-hemt,100,10,6,1.2,2.5,7,-10,6,0,6,6,1,1.5,3,600,2,0.5
            TST-SW5,Testmaker,TST-PAK8,active,1000,si-mosfet,100,5,10,2.0,4.0,20,-20,10,0,50,12,15,10,5,3000,300,1
            TST-SW6,Testmaker,TST-PAK8,obsolete,1000,si-mosfet,100,5,10,2.0,4.0,20,-20,10,0,50,12,15,10,5,3000,20,1
            """;

    static final String DRIVERS = """
            part_number,maker,package,lifecycle,stock,topology,channels,input_polarity,i_source_a,i_sink_a,r_source_ohm,r_sink_ohm,v_supply_min_v,v_supply_max_v,uvlo_on_v,uvlo_off_v,v_ih_v,v_il_v,v_in_max_v,v_offset_max_v,bootstrap_diode,i_qbs_ua,v_neg_min_v,t_prop_ns,t_match_ns,miller_clamp,p_max_w
            TST-DRV1,Testmaker,TST-SOT6,active,1000,low-side,1,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,,no,,0,20,,no,0.5
            TST-DRV2,Testmaker,TST-QFN10,active,1000,half-bridge,2,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,200,yes,100,0,20,5,no,0.5
            TST-DRV4,Testmaker,TST-SOT6,active,1000,low-side,1,non-inverting,4,6,2,1,4.5,20,4.5,4.2,2.0,0.8,20,,no,,0,20,,no,0.5
            TST-DRV5,Testmaker,TST-QFN10,active,1000,half-bridge,2,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,40,yes,100,0,20,5,no,0.5
            TST-DRV6,Testmaker,TST-SOT6,active,1000,low-side,1,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,,no,,0,20,,no,0.1
            """;

    static final String STAGE_HEADER = "stage,driver,switch,side,bus_v,f_sw_khz,edge_ns,v_drive_v,v_drive_neg_v,logic,"
            + "v_oh_v,v_ol_v,pwm_sense,r_g_ohm,r_g_off_ohm,duty_max,parallel,loop_nh,bridge\n";

    private CheckFixture() {
    }

    /**
     * A baseline stage row with the given stage id, driver and switch cells: a single-switch stage
     * (bridge = no), so no twin turns on against it (the dv-dt rule's bridge rows are in RulesTest).
     */
    static String baseline(String stage, String driver, String sw) {
        return stage + "," + driver + "," + sw + ",low,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n";
    }

    /** Imports the test catalog into {@code tmp/catalog} and returns the catalog directory. */
    static Path importCatalog(Path tmp) throws IOException {
        Path catalog = tmp.resolve("catalog");
        Path sw = write(tmp.resolve("tst-switches.csv"), SWITCHES);
        Path drv = write(tmp.resolve("tst-drivers.csv"), DRIVERS);
        CliRun r = CliRun.on(catalog, "import", sw.toString(), drv.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        return catalog;
    }

    static Path write(Path p, String text) throws IOException {
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    static JsonNode json(CliRun r) throws IOException {
        return JSON.readTree(r.out());
    }

    /** Stage id → the rule ids that fail on it, in sheet order. */
    static Map<String, Set<String>> failing(JsonNode report) {
        Map<String, Set<String>> out = new LinkedHashMap<>();
        for (JsonNode s : report.get("results")) {
            Set<String> f = new TreeSet<>();
            for (JsonNode c : s.get("checks")) {
                if (c.get("verdict").asText().equals("fail")) {
                    f.add(c.get("rule").asText());
                }
            }
            out.put(s.get("stage").asText(), f);
        }
        return out;
    }

    /** The result object of one stage. */
    static JsonNode stage(JsonNode report, String id) {
        for (JsonNode s : report.get("results")) {
            if (s.get("stage").asText().equals(id)) {
                return s;
            }
        }
        throw new AssertionError("no stage " + id + " in " + report);
    }

    /** A figure's value, SI. */
    static double figure(JsonNode stage, String name) {
        for (JsonNode f : stage.get("figures")) {
            if (f.get("name").asText().equals(name)) {
                return f.get("value").asDouble();
            }
        }
        throw new AssertionError("no figure " + name + " in " + stage);
    }

    /** The check of one rule. */
    static JsonNode check(JsonNode stage, String rule) {
        for (JsonNode c : stage.get("checks")) {
            if (c.get("rule").asText().equals(rule)) {
                return c;
            }
        }
        throw new AssertionError("no check " + rule + " in " + stage);
    }
}
