package org.gatefit.cli;

import static org.gatefit.cli.CheckFixture.check;
import static org.gatefit.cli.CheckFixture.figure;
import static org.gatefit.cli.CheckFixture.json;
import static org.gatefit.cli.CheckFixture.stage;
import static org.gatefit.cli.CheckFixture.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check} across the stages on one driver package: its dissipation adds up, and the
 * {@code design} rule. Invented parts (inputs only); every check value is derived below.
 *
 * <p>TST-SW1 (Q_g 50 nC at 12 V, R_g,int 1 Ω) on a channel of TST-DUAL (R_source 2 Ω, R_sink 1 Ω,
 * P_max 0.2 W) at 12 V / 0 V, 500 kHz, R_g 2.2 / 1.0 Ω: P_G = 50 nC · 12 V · 500 kHz = 0.3 W; the
 * driver's share (REFERENCES.md §2: each edge half, split by resistance) = 0.15 W · 2/5.2 + 0.15 W ·
 * 1/3 = 0.1077 W per channel. One channel: 0.1077 W ≤ 0.7 · 0.2 W = 0.14 W (driver-power margin,
 * common practice) → pass; two channels of one package: 0.2154 W > 0.2 W → fail.
 */
class PackageCheckCliTest {
    static final String SWITCHES = """
            part_number,maker,package,lifecycle,stock,technology,v_block_v,r_on_mohm,r_on_vgs_v,v_th_min_v,v_th_max_v,v_gs_max_v,v_gs_min_v,v_gate_on_v,v_gate_off_v,q_g_nc,q_g_vgs_v,q_gs_nc,q_gd_nc,v_plateau_v,c_iss_pf,c_rss_pf,r_g_int_ohm
            TST-SW1,Testmaker,TST-PAK8,active,1000,si-mosfet,100,5,10,2.0,4.0,20,-20,10,0,50,12,15,10,5,3000,20,1
            """;
    static final String DRIVERS = """
            part_number,maker,package,lifecycle,stock,topology,channels,input_polarity,i_source_a,i_sink_a,r_source_ohm,r_sink_ohm,v_supply_min_v,v_supply_max_v,uvlo_on_v,uvlo_off_v,v_ih_v,v_il_v,v_in_max_v,v_offset_max_v,bootstrap_diode,i_qbs_ua,v_neg_min_v,t_prop_ns,t_match_ns,miller_clamp,p_max_w
            TST-DUAL,Testmaker,TST-SOIC8,active,1000,low-side,2,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,,no,,0,20,2,no,0.2
            TST-ISO0,Testmaker,TST-SOIC8,active,1000,isolated,,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,,no,,0,20,,no,1.0
            TST-HB,Testmaker,TST-QFN10,active,1000,half-bridge,2,non-inverting,4,6,2,1,8,20,7.0,6.5,2.0,0.8,20,200,yes,50,0,20,5,no,1.0
            """;
    static final String BOM = """
            Designator,Quantity,Manufacturer Part Number,DNP
            U1-U2,2,TST-DUAL,no
            U3,1,TST-ISO0,no
            U4,1,TST-HB,no
            Q1-Q6,6,TST-SW1,no
            """;
    static final String HEADER = "stage,driver,switch,side,bus_v,f_sw_khz,edge_ns,v_drive_v,v_drive_neg_v,logic,"
            + "v_oh_v,v_ol_v,pwm_sense,r_g_ohm,r_g_off_ohm,duty_max,parallel,loop_nh\n";

    @TempDir
    Path tmp;
    Path catalog;
    Path bom;

    @BeforeEach
    void importCatalog() throws Exception {
        catalog = tmp.resolve("catalog");
        Path sw = write(tmp.resolve("s.csv"), SWITCHES);
        Path drv = write(tmp.resolve("d.csv"), DRIVERS);
        CliRun r = CliRun.on(catalog, "import", sw.toString(), drv.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        bom = write(tmp.resolve("bom.csv"), BOM);
    }

    private static String stageRow(String id, String driver, String sw, String side, double bus, double fKhz) {
        return id + "," + driver + "," + sw + "," + side + "," + bus + "," + fKhz
                + ",100,12,0,,3.1,0.2,active-high,2.2,1.0,0.5,1,5\n";
    }

    private JsonNode run(String sheet) throws Exception {
        Path p = write(tmp.resolve("stages.csv"), HEADER + sheet);
        return json(CliRun.on(catalog, "check", p.toString(), "--bom", bom.toString(), "--format", "json"));
    }

    @Test
    void twoChannelsOfOnePackagePassSeparatelyAndFailTogether() throws Exception {
        JsonNode apart = run(stageRow("A", "U1", "Q1", "low", 48, 500) + stageRow("B", "U2", "Q2", "low", 48, 500));
        for (String id : new String[] {"A", "B"}) {
            JsonNode s = stage(apart, id);
            assertEquals(0.1077, figure(s, "driver-power"), 5e-4, "one channel's share (REFERENCES §2)");
            assertEquals("pass", check(s, "driver-power").get("verdict").asText(), s.toString());
            assertEquals("pass", check(s, "design").get("verdict").asText(), s.toString());
        }
        JsonNode together = run(stageRow("A", "U1", "Q1", "low", 48, 500) + stageRow("B", "U1", "Q2", "low", 48, 500));
        for (String id : new String[] {"A", "B"}) {
            JsonNode s = stage(together, id);
            JsonNode c = check(s, "driver-power");
            assertEquals("fail", c.get("verdict").asText(), c.toString());
            assertTrue(c.get("message").asText().contains("215 mW"), c.toString());
            assertTrue(c.get("message").asText().contains("200 mW limit"), c.toString());
            assertEquals("fail", s.get("verdict").asText());
            assertEquals("pass", check(s, "design").get("verdict").asText(), "two stages on two channels");
        }
    }

    @Test
    void explainAddsUpTheChannelsUsedDefaultingToAll() throws Exception {
        String[] op = {"explain", "--driver", "TST-DUAL", "--switch", "TST-SW1", "--freq", "500", "--edge", "100",
            "--drive", "12", "--rg", "2.2", "--rg-off", "1", "--v-oh", "3.1", "--v-ol", "0.2", "--format", "json"};
        JsonNode all = json(CliRun.on(catalog, op));
        assertEquals(0.2154, figure(all, "driver-power"), 1e-3, "both channels by default");
        assertEquals("fail", check(all, "driver-power").get("verdict").asText());
        String[] one = java.util.Arrays.copyOf(op, op.length + 2);
        one[op.length] = "--channels-used";
        one[op.length + 1] = "1";
        JsonNode single = json(CliRun.on(catalog, one));
        assertEquals(0.1077, figure(single, "driver-power"), 5e-4);
        assertEquals("pass", check(single, "driver-power").get("verdict").asText());
    }

    @Test
    void moreStagesThanChannelsFailTheDesignRule() throws Exception {
        JsonNode r = run(stageRow("A", "U1", "Q1", "low", 48, 20) + stageRow("B", "U1", "Q2", "low", 48, 20)
                + stageRow("C", "U1", "Q3", "low", 48, 20));
        JsonNode c = check(stage(r, "C"), "design");
        assertEquals("fail", c.get("verdict").asText(), c.toString());
        assertTrue(c.get("message").asText().contains("2 channels but drives 3 stages"), c.toString());
    }

    @Test
    void aHighAndALowStageOnASingleChannelPartThatIsNotAHalfBridgeDriverFail() throws Exception {
        JsonNode r = run(stageRow("H", "U3", "Q1", "high", 48, 20) + stageRow("L", "U3", "Q2", "low", 48, 20));
        JsonNode c = check(stage(r, "L"), "design");
        assertEquals("fail", c.get("verdict").asText(), c.toString());
        assertTrue(c.get("message").asText().contains("single-channel isolated driver"), c.toString());
    }

    @Test
    void aHalfBridgeWithMismatchedOperatingPointsFailsAndAMatchedOnePasses() throws Exception {
        JsonNode bad = run(stageRow("H", "U4", "Q1", "high", 48, 20) + stageRow("L", "U4", "Q2", "low", 60, 20));
        JsonNode c = check(stage(bad, "H"), "design");
        assertEquals("fail", c.get("verdict").asText(), c.toString());
        assertTrue(c.get("message").asText().contains("48 V / 60 V"), c.toString());
        JsonNode freq = run(stageRow("H", "U4", "Q1", "high", 48, 20) + stageRow("L", "U4", "Q2", "low", 48, 25));
        assertEquals("fail", check(stage(freq, "L"), "design").get("verdict").asText());
        JsonNode good = run(stageRow("H", "U4", "Q1", "high", 48, 20) + stageRow("L", "U4", "Q2", "low", 48, 20));
        assertEquals("pass", check(stage(good, "H"), "design").get("verdict").asText());
    }
}
