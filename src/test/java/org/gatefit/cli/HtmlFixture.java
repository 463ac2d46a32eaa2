package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A small invented catalog (maker Testmaker, parts TST-…) whose descriptions, makers and stage ids
 * carry hostile text, and the HTML reports rendered from it through {@link Cli#create}.
 */
final class HtmlFixture {
    /** Text that would run or break markup if it reached the page unescaped. */
    static final String SCRIPT = "<script>alert(1)</script>";
    static final String QUOTES = "\"&<>'";

    private static final String SWITCH_HEAD = "part_number,maker,package,pinout,lifecycle,stock,unit_price,description,"
            + "technology,channel,v_block_v,i_cont_a,r_on_mohm,r_on_vgs_v,v_ce_sat_v,v_th_min_v,v_th_max_v,v_gs_max_v,"
            + "v_gs_min_v,v_gate_on_v,v_gate_off_v,q_g_nc,q_g_vgs_v,q_gs_nc,q_gd_nc,v_plateau_v,c_iss_pf,c_rss_pf,r_g_int_ohm";
    private static final String DRIVER_HEAD = "part_number,maker,package,pinout,lifecycle,stock,unit_price,description,"
            + "topology,channels,input_polarity,i_source_a,i_sink_a,r_source_ohm,r_sink_ohm,v_supply_min_v,v_supply_max_v,"
            + "uvlo_on_v,uvlo_off_v,v_ih_v,v_il_v,v_in_max_v,v_offset_max_v,bootstrap_diode,i_qbs_ua,v_neg_min_v,"
            + "t_prop_ns,t_match_ns,miller_clamp,isolation_vrms,p_max_w";
    private static final String STAGE_HEAD = "stage,driver,switch,side,bus_v,f_sw_khz,edge_ns,v_drive_v,v_drive_neg_v,"
            + "logic,v_oh_v,v_ol_v,pwm_sense,r_g_ohm,r_g_off_ohm,duty_max,parallel,loop_nh";

    /** CSV cell quoting. */
    static String q(String s) {
        return "\"" + s.replace("\"", "\"\"") + "\"";
    }

    /**
     * The operating point of the explain and shortlist reports: a GaN low side in a bridge, 10 Ω on and
     * 0.5 Ω off so the twin's edge cannot lift the off gate (dv-dt).
     */
    static final String[] POINT = {"--freq", "200", "--bus", "375", "--edge", "10", "--drive", "6", "--rg", "10",
        "--rg-off", "0.5", "--loop", "3", "--v-oh", "4.6", "--v-ol", "0.2"};

    final Path dir;
    final Path catalog;
    final Path stages;
    /** Report name (explain, shortlist, check, replace, compare: explain with three drivers) to its HTML file. */
    final Map<String, Path> reports = new LinkedHashMap<>();

    HtmlFixture(Path dir) throws IOException {
        this.dir = Files.createDirectories(dir);
        this.catalog = dir.resolve("catalog");
        Path switches = dir.resolve("switches.csv");
        Files.writeString(switches, String.join("\n", SWITCH_HEAD,
                "TST-G650A," + q(QUOTES) + ",PQFN-5x6,TST-DFN56,active,24000,1.95," + q("650 V GaN " + SCRIPT)
                        + ",gan-hemt,n,650,11,150,6,,1.1,2.5,7,-10,6,0,2.2,6,0.7,0.6,3.0,125,0.6,1.6",
                "TST-G650B,Testmaker,PQFN-5x6,TST-DFN56,active,31000,1.2," + q("650 V GaN, smaller " + QUOTES)
                        + ",gan-hemt,n,650,6.5,300,6,,1.1,2.5,7,-10,6,0,1.2,6,0.4,0.35,3.0,68,0.35,2.4",
                "TST-G650C," + q("Testmaker " + SCRIPT) + ",PQFN-5x6,TST-DFN56,active,9000,2.4," + q(SCRIPT)
                        + ",gan-hemt,n,650,15,110,6,,1.1,2.5,7,-10,6,0,3.0,6,0.9,0.8,3.0,170,0.8,1.4") + "\n",
                StandardCharsets.UTF_8);
        Path drivers = dir.resolve("drivers.csv");
        Files.writeString(drivers, String.join("\n", DRIVER_HEAD,
                "TST-D06A," + q(QUOTES) + ",SOT-23-6,TST-SOT6,active,30000,0.7," + q(SCRIPT)
                        + ",low-side,1,non-inverting,4,8,1.0,0.45,4.5,6.5,4.0,3.6,2.0,0.8,6.5,,no,,0,9,,no,,0.5",
                "TST-D06B,Testmaker,SOT-23-6,TST-SOT6,active,12000,0.6," + q("inverting " + QUOTES)
                        + ",low-side,1,inverting,4,8,1.0,0.45,4.5,6.5,4.0,3.6,2.0,0.8,6.5,,no,,0,9,,no,,0.5",
                "TST-D06C,Testmaker,SOT-23-6,TST-SOT6,active,5000,0.5,weak driver"
                        + ",low-side,1,non-inverting,0.5,0.8,8,4,4.5,6.5,4.0,3.6,2.0,0.8,6.5,,no,,0,9,,no,,0.5") + "\n",
                StandardCharsets.UTF_8);
        stages = dir.resolve("stages.csv");
        Files.writeString(stages, String.join("\n", STAGE_HEAD,
                q(SCRIPT) + ",TST-D06A,TST-G650A,low,375,200,10,6,0,,4.6,0.2,active-high,10,0.5,0.6,1,3",
                q("S2 " + QUOTES) + ",TST-D06B,TST-G650A,low,375,200,10,6,0,,4.6,0.2,active-high,10,0.5,0.6,1,3",
                "S3,TST-D06C,TST-G650B,low,375,100,20,6,0,lvcmos-3v3,,,active-high,2.2,1.0,0.6,1,5") + "\n",
                StandardCharsets.UTF_8);
        CliRun imp = CliRun.on(catalog, "import", switches.toString(), drivers.toString());
        assertEquals(0, imp.exit(), imp.dump());
        render("explain", 0, "explain", "--driver", "TST-D06A", "--switch", "TST-G650A");
        render("shortlist", 0, "shortlist", "--switch", "TST-G650A", "--all");
        render("check", 1, "check", stages.toString());
        render("replace", 0, "replace", "TST-G650A", "--stages", stages.toString());
        render("compare", 1, "explain", "--driver", "TST-D06A", "--driver", "TST-D06B", "--driver", "TST-D06C",
                "--switch", "TST-G650A");
    }

    private void render(String name, int exit, String... args) throws IOException {
        Path file = dir.resolve(name + ".html");
        boolean point = name.equals("explain") || name.equals("shortlist") || name.equals("compare");
        String[] all = new String[args.length + 4 + (point ? POINT.length : 0)];
        int k = 0;
        for (String a : args) {
            all[k++] = a;
        }
        if (point) {
            for (String a : POINT) {
                all[k++] = a;
            }
        }
        all[k++] = "--format";
        all[k++] = "html";
        all[k++] = "--output";
        all[k] = file.toString();
        CliRun r = CliRun.on(catalog, all);
        assertEquals(exit, r.exit(), name + ": " + r.dump());
        reports.put(name, file);
    }

    String html(String name) throws IOException {
        return Files.readString(reports.get(name), StandardCharsets.UTF_8);
    }
}
