package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * The switch-side figures of a {@link Question} at their limits: the Miller plateau only between the
 * off and on levels (REFERENCES §1 and §8: the drain edge is the plateau the gate crosses), the plateau
 * need n·Q_gd/t_edge, the off switch's average C_gd = Q_gd/V_bus computed once (REFERENCES §8), the
 * bipolar reading of a Q_g specification within 0.5 V of the recommended swing (datasheets round the
 * swing; common practice, no source), and the accessors a shortlist reads.
 */
class QuestionFiguresTest {

    private static Question ask(Consumer<Parts.Sw> s, Consumer<OperatingPoint.Spec> o) {
        Parts.Sw sw = Parts.sw();
        s.accept(sw);
        SwitchPart sp = sw.build();
        OperatingPoint.Spec op = Parts.op();
        o.accept(op);
        return Question.of(sp, op.resolve(sp), Margins.DEFAULT);
    }

    @Test
    void aPlateauBetweenTheLevelsNeedsItsChargeOverTheEdge() {
        // 15 nC / 50 ns = 0.3 A
        Question q = ask(s -> { }, o -> { });
        assertTrue(q.plateau);
        assertEquals(0.3, q.iReqPlateau, 1e-12);
    }

    @Test
    void aPlateauAtTheOnLevelIsNotCrossed() {
        Question q = ask(s -> s.vPlateau = 10, o -> { });
        assertFalse(q.plateau);
        assertTrue(Double.isNaN(q.iReqPlateau));
    }

    @Test
    void aPlateauAtTheOffLevelIsNotCrossed() {
        // a (degenerate) plateau at 0 V with a 0 V off level: the gate starts on it, nothing to cross
        Question q = ask(s -> {
            s.vPlateau = 0;
            s.vThMin = 0;
            s.vThMax = 0;
        }, o -> { });
        assertFalse(q.plateau);
        assertTrue(Double.isNaN(q.iReqPlateau));
    }

    @Test
    void theOffSwitchsAverageCgdIsComputedOnceWithABusAndQgd() {
        // C_gd,avg = Q_gd / V_bus = 15 nC / 48 V = 312.5 pF
        Question q = ask(s -> { }, o -> { });
        assertNotNull(q.offSwitch);
        assertEquals(15e-9 / 48, q.offSwitch.cgd(), 1e-18);
        assertNull(ask(s -> { }, o -> o.bus = null).offSwitch, "no bus, no Miller injection");
        assertNull(ask(s -> s.qGd = Double.NaN, o -> { }).offSwitch, "no Q_gd, no Miller injection");
    }

    @Test
    void aSpecificationSwingHalfAVoltFromTheRecommendedOneIsReadFromZero() {
        // recommended −5/+18 V = 23 V; 22.5 V is 0.5 V off (not within), 22.6 V within
        Parts.Sw sic = Parts.sw();
        sic.vGateOn = 18;
        sic.vGateOff = -5;
        sic.qGVgs = 22.5;
        assertEquals(22.5, Question.specVoltage(sic.build()), 0);
        sic.qGVgs = 22.6;
        assertEquals(18, Question.specVoltage(sic.build()), 0);
        // a 0 V recommended off level is no bipolar swing: Q_g over 10 V stays over 10 V, not the 10.4 V on level
        Parts.Sw si = Parts.sw();
        si.vGateOn = 10.4;
        si.vGateOff = 0;
        assertEquals(10, Question.specVoltage(si.build()), 0);
    }

    @Test
    void theAccessorsReturnWhatWasAsked() {
        Parts.Sw sw = Parts.sw();
        SwitchPart sp = sw.build();
        OperatingPoint op = Parts.op().resolve(sp);
        Question q = Question.of(sp, op, Margins.DEFAULT);
        assertSame(sp, q.switchPart());
        assertSame(op, q.point());
        assertSame(Margins.DEFAULT, q.margins());
        assertSame(sp, q.lifecycleSwitch(), "a pair's lifecycle judges the switch too");
        // Q_g 50 nC over the 0–10 V it is specified over; 50 nC / 50 ns = 1 A (REFERENCES §1)
        assertEquals(50e-9, q.gateCharge(), 1e-15);
        assertEquals(1.0, q.currentRequired(), 1e-9);
        Question shortlist = Question.ofShortlist(sp, op, Margins.DEFAULT);
        assertSame(sp, shortlist.switchPart());
        assertNull(shortlist.lifecycleSwitch(), "a shortlist says the switch's lifecycle once, apart");
    }
}
