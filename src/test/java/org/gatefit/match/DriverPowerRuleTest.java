package org.gatefit.match;

import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
import static org.gatefit.match.RuleCase.pass;
import static org.gatefit.match.RuleCase.says;
import static org.gatefit.match.RuleCase.saysNot;
import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@code driver-power} on REFERENCES §2's worked example: Q_g 44 nC, 10 V, 100 kHz → P_G = Q_g·ΔV·f =
 * 44.0 mW; each edge spends half, divided in proportion to R between driver, external and internal
 * resistance: R_src 2 Ω, R_sink 1 Ω, R_g 3 Ω, R_g,int 1.2 Ω → the driver's share 22·2/6.2 + 22·1/5.2 =
 * 11.33 mW (one channel, low side, no quiescent figures). Against the package limit P_max: fail above it,
 * warn above 70 % of it (driver-power margin, common practice, no source) with 0.35 + 0.3·(P_max − P)/
 * (P_max − 0.7·P_max), pass with 0.7 + 0.3·(0.7·P_max/P − 1) (Score).
 */
class DriverPowerRuleTest {

    /** REFERENCES §2: driver share 11.33 mW. */
    private static final double P = 22e-3 * 2 / 6.2 + 22e-3 * 1 / 5.2;

    private static final Consumer<Parts.Sw> SW = s -> {
        s.qG = 44e-9;
        s.rGInt = 1.2;
    };

    private static Check power(double pMax) {
        return check(Rule.DRIVER_POWER, SW, d -> {
            d.pMax = pMax;
            d.channels = 1;
        }, o -> o.rG = 3.0);
    }

    @Test
    void theDriversShareIsTheWorkedExample() {
        // P_max 1 W: 0.7 W/11.33 mW − 1 saturates
        Check c = power(1);
        verdict(c, Verdict.PASS, 1.0);
        compared(c, "driver dissipation", P, "≤", 0.7);
        says(c, "11.3 mW in the driver package (1 channel switching, each 44 mW gate-drive power at 100 kHz), within 70 %"
                + " of its 1 W limit");
        saysNot(c, "estimated");
    }

    @Test
    void aLimitAtTheDissipationWarnsAtTheFailEdge() {
        double p = power(1).compared().get(0).value();
        assertEquals(P, p, 1e-9);
        Check c = power(p);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "uses more than 70 % of its 11.3 mW limit — check the temperature rise at your ambient");
    }

    @Test
    void aLimitJustBelowTheDissipationFails() {
        Check c = power(0.0113);
        verdict(c, Verdict.FAIL, 0);
        says(c, "11.3 mW in the driver package", "exceeds its 11.3 mW package limit — add external gate resistance");
    }

    @Test
    void aDissipationExactlyAtTheMarginPassesBare() {
        // driver-power margin 0.5: P_max = 2·P puts the allowed 0.5·P_max exactly at P → excess 0
        Margins half = new Margins(1.5, 0.10, 1.0, 0.1, 0.20, 2.0, 0.5, 0.7, 2.0, 0.15, 0.5, 100, 0.25);
        double p = power(1).compared().get(0).value();
        Check c = check(Rule.DRIVER_POWER, half, SW, d -> {
            d.pMax = 2 * p;
            d.channels = 1;
        }, o -> o.rG = 3.0);
        verdict(c, Verdict.PASS, pass(0));
    }

    @Test
    void aLimitHalfWayWarnsHalfWay() {
        // P_max = P/0.85: (P/0.85 − P)/(P/0.85 − 0.7·P/0.85) = 0.15/0.3 = 0.5
        verdict(power(P / 0.85), Verdict.WARN, warn(0.5));
    }

    @Test
    void aPassScoresItsExcessOverTheMargin() {
        // P_max = P/0.56: 0.7·P_max = 1.25·P → excess 0.25
        verdict(power(P / 0.56), Verdict.PASS, pass(0.25));
    }

    @Test
    void anEstimatedOutputResistanceIsSaid() {
        Check src = check(Rule.DRIVER_POWER, SW, d -> d.rSource = Double.NaN, o -> o.rG = 3.0);
        says(src, ", output resistance estimated as V/I_peak)", "2 channels alike switching");
        Check snk = check(Rule.DRIVER_POWER, SW, d -> d.rSink = Double.NaN, o -> o.rG = 3.0);
        says(snk, ", output resistance estimated as V/I_peak)");
    }

    @Test
    void anUnknownLimitIsUnknown() {
        Check c = power(Double.NaN);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "11.3 mW in the driver package", "the package limit (p_max_w) is unknown");
    }
}
