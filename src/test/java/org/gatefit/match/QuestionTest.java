package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The switch side of a question: the gate charge over the actual swing, including a datasheet
 * whose Q_g is given over a bipolar swing (SiC, e.g. −5 V to +18 V). Check values are hand
 * calculations with the piecewise-linear gate-charge curve of REFERENCES.md §1 (Q_gs up to the
 * plateau, Q_gd across it, the slope (Q_g − Q_gs − Q_gd) / (V_spec − V_plateau) above it, and
 * C_iss·|V_off| below 0 V), and the definition of Q_g: the charge over the datasheet's own test
 * swing.
 *
 * <p>The switch (figures invented, round for hand calculation): Q_g 100 nC specified over −5 V to
 * +18 V (a 23 V swing), Q_gs 20 nC, Q_gd 30 nC, plateau 8 V, C_iss 2 nF.
 */
class QuestionTest {
    private static final double NC = 1e-9;

    private static Parts.Sw sic() {
        Parts.Sw s = Parts.sw();
        s.tech = Technology.SIC_MOSFET;
        s.qG = 100 * NC;
        s.qGVgs = 23;
        s.vGateOn = 18;
        s.vGateOff = -5;
        s.rOnVgs = 18;
        s.vGsMax = 22;
        s.vGsMin = -8;
        s.qGs = 20 * NC;
        s.qGd = 30 * NC;
        s.vPlateau = 8;
        s.cIss = 2e-9;
        return s;
    }

    private static Question ask(Parts.Sw sw, double on, double off, int parallel) {
        SwitchPart sp = sw.build();
        OperatingPoint.Spec o = Parts.op();
        o.vDrive = on;
        o.vDriveNeg = off;
        o.parallel = parallel;
        return Question.of(sp, o.resolve(sp), Margins.DEFAULT);
    }

    @Test
    void atTheDatasheetsOwnBipolarSwingTheChargeIsTheDatasheetsQg() {
        // Definition of Q_g: the charge over the test swing (−5..+18 V) is the datasheet's 100 nC.
        Question q = ask(sic(), 18, -5, 1);
        assertEquals(100 * NC, q.qSwing, 1e-6 * NC);
        assertTrue(q.qEstimated, "the split at 0 V is an estimate");
    }

    @Test
    void aUnipolarDriveOfABipolarDatasheetLeavesOutTheNegativePart() {
        // 100 nC − C_iss·5 V = 100 − 10 = 90 nC over 0..+18 V.
        assertEquals(90 * NC, ask(sic(), 18, 0, 1).qSwing, 1e-6 * NC);
    }

    @Test
    void aLowerOnLevelFollowsTheSlopeAboveThePlateau() {
        // Slope above the plateau (90 − 20 − 30) nC / (18 − 8) V = 4 nC/V; at +15 V: 90 − 3·4 = 78 nC,
        // plus the negative part 10 nC at −5 V: 88 nC.
        assertEquals(88 * NC, ask(sic(), 15, -5, 1).qSwing, 1e-6 * NC);
    }

    @Test
    void aSpecificationSwingThatIsNotTheRecommendedBipolarSwingIsTakenFromZero() {
        // Q_g given over 0..20 V (not 23 V): no negative part taken out. Slope (100 − 50) / (20 − 8) =
        // 4.1667 nC/V; at +18 V: 100 − 2·4.1667 = 91.667 nC.
        Parts.Sw s = sic();
        s.qGVgs = 20;
        assertEquals(91.6667 * NC, ask(s, 18, 0, 1).qSwing, 1e-3 * NC);
    }

    @Test
    void theBipolarReadingAppliesWithinHalfAVoltOfTheRecommendedSwing() {
        // 23.4 V is read as the recommended −5..+18 V swing (datasheets round); 23.6 V is not: then
        // V_spec = 23.6 V from 0 V, slope (100 − 50) / 15.6 = 3.2051 nC/V, at +18 V: 100 − 5.6·3.2051 = 82.051 nC.
        Parts.Sw near = sic();
        near.qGVgs = 23.4;
        assertEquals(90 * NC, ask(near, 18, 0, 1).qSwing, 1e-6 * NC);
        Parts.Sw far = sic();
        far.qGVgs = 23.6;
        assertEquals(82.0513 * NC, ask(far, 18, 0, 1).qSwing, 1e-3 * NC);
    }

    @Test
    void withoutCissTheNegativePartUsesQgsOverThePlateau() {
        // C_eq = Q_gs / V_pl = 20 nC / 8 V = 2.5 nF; the negative part 2.5 nF · 5 V = 12.5 nC, so
        // 0..+18 V holds 100 − 12.5 = 87.5 nC.
        Parts.Sw s = sic();
        s.cIss = Double.NaN;
        assertEquals(87.5 * NC, ask(s, 18, 0, 1).qSwing, 1e-6 * NC);
    }

    @Test
    void theExactSpecificationSwingIsNotAnEstimateAndParallelSwitchesAddUp() {
        // The baseline Si MOSFET: Q_g 50 nC over 0..10 V, asked at 0..10 V: exact.
        Question one = ask(Parts.sw(), 10, 0, 1);
        assertEquals(50 * NC, one.qSwing, 1e-9 * NC);
        assertFalse(one.qEstimated);
        // Three in parallel: Q_total = 3 · 50 nC; the edge current Q / t = 150 nC / 50 ns = 3 A.
        Question three = ask(Parts.sw(), 10, 0, 3);
        assertEquals(150 * NC, three.qTotal, 1e-9 * NC);
        assertEquals(3.0, three.iReq, 1e-9);
        assertEquals(150 * NC, three.gateCharge(), 1e-9 * NC);
        assertEquals(3.0, three.currentRequired(), 1e-9);
    }

    @Test
    void thePlateauIsCrossedOnlyWhenItLiesBetweenTheOffAndOnLevels() {
        assertTrue(ask(Parts.sw(), 10, 0, 1).plateau);
        assertFalse(ask(Parts.sw(), 5, 0, 1).plateau, "on level at the plateau (5 V): never crosses it");
        Parts.Sw noQgd = Parts.sw();
        noQgd.qGd = 0;
        assertFalse(ask(noQgd, 10, 0, 1).plateau, "Q_gd 0: no plateau");
    }

    @Test
    void anUnknownInternalGateResistanceCountsAsZero() {
        Parts.Sw s = Parts.sw();
        s.rGInt = Double.NaN;
        assertEquals(0.0, ask(s, 10, 0, 1).rInt, 0.0);
        assertEquals(1.0, ask(Parts.sw(), 10, 0, 1).rInt, 0.0);
    }
}
