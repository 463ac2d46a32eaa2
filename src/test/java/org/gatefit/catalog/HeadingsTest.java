package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.nio.charset.Charset;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Headings, units in headings, and values as people write them. The unit conversions are the SI
 * prefixes (BIPM, The International System of Units, 9th edition, 2019, table 7): m = 10⁻³,
 * n = 10⁻⁹, p = 10⁻¹², µ = 10⁻⁶; a per cent is 10⁻². Everything else is gatefit's own reading
 * rules (common practice, no source), checked as documented in catalog-schema/README.md.
 */
class HeadingsTest {
    private static final Schema SWITCH = Schema.of(Kind.SWITCH);

    @ParameterizedTest(name = "{0} → {1} ({2})")
    @CsvSource(delimiter = '|', value = {
            "Qg (nC)|q_g_nc|-9",
            "Qg (pC)|q_g_nc|-12",
            "Rds(on) [mΩ]|r_on_mohm|-3",
            "Ciss, pF|c_iss_pf|-12",
            "Ciss, nF|c_iss_pf|-9",
            "Rds(on) mOhm|r_on_mohm|-3",
            "Rds(on) (Ω)|r_on_mohm|0",
            "RDS(ON) (ohm)|r_on_mohm|0",
            "Vds/V|v_block_v|0",
            "Qg in µC|q_g_nc|-6",
            "V_DS|v_block_v|0",
            "VDSS|v_block_v|0",
            "BVDSS|v_block_v|0",
            "VCES|v_block_v|0",
            "Qg total|q_g_nc|-9",
            "qg_total|q_g_nc|-9",
            "Q.g. Total|q_g_nc|-9",
            "Rg int|r_g_int_ohm|0",
            "Vce(sat)|v_ce_sat_v|0",
            "Mfr.|maker|0",
            "Part #|part_number|0",
            "MPN|part_number|0",
            "Q_G_NC|q_g_nc|-9"})
    void aHeadingNamesItsColumnAndTheUnitOfBareNumbers(String heading, String column, int exponent) {
        Headings.Read r = Headings.read(SWITCH, heading, null);
        assertEquals(column, r.column(), heading);
        assertEquals(exponent, r.bareExponent(), heading);
        assertNull(r.problem());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
            "driver|Isource (A)|i_source_a",
            "driver|Isink|i_sink_a",
            "driver|VDD min|v_supply_min_v",
            "driver|VCC max (V)|v_supply_max_v",
            "driver|UVLO on|uvlo_on_v",
            "driver|VIH|v_ih_v",
            "driver|tpd (ns)|t_prop_ns",
            "stage|fsw (kHz)|f_sw_khz",
            "stage|Duty max (%)|duty_max"})
    void driverAndStageHeadings(String kind, String heading, String column) {
        assertEquals(column, Headings.read(Schema.of(Kind.fromId(kind)), heading, null).column(), heading);
    }

    @Test
    void anAmbiguousHeadingIsNotGuessed() {
        Headings.Read r = Headings.read(SWITCH, "Vgs(th) (V)", null);
        assertNull(r.column());
        assertEquals(List.of("v_th_min_v", "v_th_max_v"), r.ambiguous());
        assertEquals(List.of("uvlo_on_v", "uvlo_off_v"), Headings.read(Schema.of(Kind.DRIVER), "UVLO", null).ambiguous());
        assertEquals(List.of("r_source_ohm", "r_sink_ohm"), Headings.read(Schema.of(Kind.DRIVER), "Rout", null).ambiguous());
    }

    @Test
    void aUnitOfAnotherDimensionIsAProblemAndTextThatIsNoUnitIsAnExtraColumn() {
        Headings.Read r = Headings.read(SWITCH, "Vds (A)", null);
        assertEquals("v_block_v", r.column());
        assertTrue(r.problem().contains("a current unit, but v_block_v is a voltage"), r.problem());
        assertNull(Headings.read(SWITCH, "Rds(on) typ", null).column());
    }

    @Test
    void aMappingComesFirstWithOrWithoutTheUnit() throws Exception {
        Mapping m = Mapping.of(null, null, List.of("Gate chg=q_g_nc", "Our ref="));
        Headings.Read r = Headings.read(SWITCH, "Gate chg (pC)", m);
        assertEquals("q_g_nc", r.column());
        assertEquals(-12, r.bareExponent());
        assertTrue(r.mapped());
        assertNull(Headings.read(SWITCH, "our ref", m).column());
    }

    @Test
    void bareNumbersInTheHeadingsUnitAreConvertedInDecimal() throws Exception {
        Column ron = SWITCH.column("r_on_mohm").orElseThrow();
        assertEquals(2.8, Cells.parse(ron, "0.0028", false, 0), "0.0028 Ω = 2.8 mΩ, exactly the double nearest 2.8");
        assertEquals(2.8, Cells.parse(ron, "0,0028", true, 0));
        assertEquals(3.1, Cells.parse(ron, "3.1 mΩ", false, 0), "a cell's own unit wins");
        Column ciss = SWITCH.column("c_iss_pf").orElseThrow();
        assertEquals(2200.0, Cells.parse(ciss, "2.2", false, -9), "2.2 nF = 2200 pF");
        Column duty = Schema.of(Kind.STAGE).column("duty_max").orElseThrow();
        assertEquals(0.95, Cells.parse(duty, "95", false, -2), "95 % = 0.95");
    }

    @ParameterizedTest(name = "{1}: {2} → {3}")
    @CsvSource(delimiter = '|', value = {
            "switch|technology|Si MOSFET|si-mosfet",
            "switch|technology|SiC|sic-mosfet",
            "switch|technology|GaN HEMT|gan-hemt",
            "switch|technology|Si-MOSFET|si-mosfet",
            "switch|channel|N-ch|n",
            "switch|channel|P-channel|p",
            "driver|topology|Low side|low-side",
            "driver|topology|Half bridge|half-bridge",
            "driver|topology|Isolated|isolated",
            "driver|lifecycle|Active|active",
            "driver|lifecycle|NRND|nrnd",
            "driver|lifecycle|EOL|obsolete",
            "driver|lifecycle|Last time buy|ltb",
            "driver|bootstrap_diode|Yes|yes",
            "driver|miller_clamp|No|no",
            "stage|side|High side|high"})
    void choicesAsPeopleWriteThem(String kind, String column, String cell, String value) throws Exception {
        assertEquals(value, Cells.parse(Schema.of(Kind.fromId(kind)).column(column).orElseThrow(), cell, false));
    }

    @Test
    void aPointThatMayBeAThousandsSeparatorInADecimalCommaFileIsNotGuessed() throws Exception {
        Column stock = SWITCH.column("stock").orElseThrow();
        Column ciss = SWITCH.column("c_iss_pf").orElseThrow();
        for (Column c : List.of(stock, ciss)) {
            BadValueException e = org.junit.jupiter.api.Assertions.assertThrows(BadValueException.class,
                    () -> Cells.parse(c, "1.200", true));
            assertTrue(e.getMessage().contains("is it a thousands separator?"), e.getMessage());
        }
        assertEquals(0.1, Cells.parse(ciss, "0.100", true), "a leading zero is no thousands group");
        assertEquals(4.7, Cells.parse(ciss, "4.7", true));
    }

    @Test
    void gateLimitsAndTechnologyWithChannel() {
        assertArrayEquals(new String[] {"20", "-20"}, Cells.gateLimits("±20"));
        assertArrayEquals(new String[] {"20V", "-20V"}, Cells.gateLimits("+/- 20V"));
        assertArrayEquals(new String[] {"22", "-8"}, Cells.gateLimits("+22/-8"));
        assertArrayEquals(new String[] {"22", "-8"}, Cells.gateLimits("-8/+22"));
        assertArrayEquals(new String[] {"7", "-10"}, Cells.gateLimits("7 / -10"));
        assertNull(Cells.gateLimits("20"));
        assertNull(Cells.gateLimits("-20"));
        assertArrayEquals(new String[] {"Si MOSFET", "p"}, Cells.technologyWithChannel("Si MOSFET P-ch"));
        assertArrayEquals(new String[] {"SiC", "n"}, Cells.technologyWithChannel("SiC, N-channel"));
        assertNull(Cells.technologyWithChannel("GaN HEMT"));
    }

    @Test
    void theDelimiterIsToldFromTheHeaderBelowATitleRow() throws Exception {
        String text = "Approved parts, rev C\nPart;Ciss, pF;Qg, nC;Vds\n1;2;3;4\n";
        assertEquals(';', new CsvLexer(new StringReader(text)).sniffDelimiter());
        assertEquals(';', new CommonsCsvRecords(new StringReader(text)).sniffDelimiter());
        assertEquals(',', new CsvLexer(new StringReader("a,b,c\n1;2;3;4;5\n")).sniffDelimiter());
        assertEquals(';', new CsvLexer(new StringReader("Title\nx;y\na,b\nz;w;v\n")).sniffDelimiter(4));
        assertEquals(',', new CommonsCsvRecords(new StringReader("Title\nx;y\na,b\nz;w;v\n")).sniffDelimiter(3));
    }

    /** The European export of SpreadsheetExportCliTest read by CsvLexer and by Commons CSV gives the same. */
    @Test
    void bothCsvReadersAgreeOnAEuropeanExport() throws Exception {
        byte[] bytes = String.join("\r\n",
                "Approved power switches – rev. C;;;;;;",
                "Mfr;Part Number;Type;Vds (V);Rds(on) (Ω);Qg (nC);Vgs max",
                ";;;;;;",
                "Quillmark;QM-1004N;Si MOSFET;100;0,0042;68;±20",
                "Quillmark;QM-1009P;Si MOSFET P-ch;100;0,0098;95;±20",
                "Ravenfield;RF-12S040;SiC;1200;0,040;62;+22/-8", "").getBytes(Charset.forName("UTF-8"));
        List<String> notesFast = new ArrayList<>();
        List<String> notesRef = new ArrayList<>();
        List<Row> fast = new ArrayList<>();
        List<Row> ref = new ArrayList<>();
        SheetReader.Summary f = SheetReader.read(new ByteArrayInputStream(bytes), "x.csv", null, fast::add, false,
                new SheetReader.Options(null, 0, null, null, notesFast::add));
        SheetReader.Summary r = SheetReader.read(new ByteArrayInputStream(bytes), "x.csv", null, ref::add, true,
                new SheetReader.Options(null, 0, null, null, notesRef::add));
        assertTrue(f.clean(), f.problems().toString());
        assertEquals(3, fast.size());
        assertEquals(ref, fast);
        assertEquals(notesRef, notesFast);
        assertEquals(r.headings(), f.headings());
        assertEquals(4.2, fast.get(0).number("r_on_mohm"), 1e-12);
        assertEquals("p", fast.get(1).text("channel"));
        assertEquals(-8.0, fast.get(2).number("v_gs_min_v"));
        assertNotNull(r);
    }
}
