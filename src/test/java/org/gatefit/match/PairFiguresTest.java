package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A ranking thread computes driver after driver into one {@link PairFigures} scratch. Nothing of an
 * earlier pair may remain in it: after computing pair A and then pair B, every field must hold B's
 * own figures — checked reflectively over every field, so a field added later and not assigned in
 * {@code compute} fails here. The two pairs are chosen so that every field differs between them
 * (checked first: a field on which they agree could hide a stale value).
 */
class PairFiguresTest {

    private static Question question(double bus, double rG, double vDrive, double tj, boolean bridge, double loop) {
        Parts.Sw sw = Parts.sw();
        SwitchPart sp = sw.build();
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.bus = bus;
        o.rG = rG;
        o.vDrive = vDrive;
        o.dutyMax = 0.6;
        o.tj = tj;
        o.bridge = bridge;
        o.loop = loop;
        if (bridge && tj < 25) {
            o.powerLoop = 10e-9; // the second pair also estimates the switch-node overshoot
            o.iLoad = 20.0;
        }
        return Question.of(sp, o.resolve(sp), Margins.DEFAULT);
    }

    private static final Question QA = question(48, 2, 10, 125, true, 10e-9);
    private static final Question QB = question(80, 3.3, 12, 10, true, 300e-9); // a cold corner below 25 °C: every corner differs
    private static final DriverPart A = Parts.dr().build();
    private static final DriverPart B = other();

    private static DriverPart other() {
        Parts.Dr d = Parts.dr();
        d.rSource = Double.NaN;
        d.rSink = Double.NaN;
        d.iSource = 3;
        d.iSink = 5;
        d.vIh = 2.3;
        d.vIl = 1.0;
        d.uvloOn = 8;
        d.uvloOff = 7.5;
        d.iQbs = 1e-3;
        return d.build();
    }

    private static List<Field> fields() {
        List<Field> out = new ArrayList<>();
        for (Field f : PairFigures.class.getDeclaredFields()) {
            if (!Modifier.isStatic(f.getModifiers())) {
                f.setAccessible(true);
                out.add(f);
            }
        }
        return out;
    }

    private static boolean same(Object x, Object y) {
        return x instanceof Double a && y instanceof Double b ? Double.compare(a, b) == 0 : x == y || x.equals(y);
    }

    @Test
    void thePairsOfThisTestDifferInEveryField() throws Exception {
        PairFigures a = PairFigures.of(QA, A);
        PairFigures b = PairFigures.of(QB, B);
        List<Field> fields = fields();
        assertTrue(fields.size() >= 20, "expected the figures' fields, got " + fields.size());
        for (Field f : fields) {
            assertFalse(same(f.get(a), f.get(b)), f.getName() + " is the same for both pairs ("
                    + f.get(a) + "): change the pairs of this test so that it differs");
        }
    }

    @Test
    void aScratchComputedForOnePairThenAnotherHoldsOnlyTheSecondPairsFigures() throws Exception {
        PairFigures scratch = PairFigures.scratch();
        scratch.compute(QA, A);
        scratch.compute(QB, B);
        PairFigures fresh = PairFigures.of(QB, B);
        assertNotSame(fresh, scratch);
        for (Field f : fields()) {
            assertTrue(same(f.get(fresh), f.get(scratch)), f.getName() + ": expected " + f.get(fresh) + " (pair B), got "
                    + f.get(scratch) + " — compute() left a value of pair A");
        }
    }

    @Test
    void aRefusedPairLeavesTheScratchAsItWasAndRankingSaysUnknownNotTheEarlierPairsVerdict() {
        // A driver whose output resistance the model refuses (negative) makes compute throw before
        // assigning anything; the ranking then judges the pair without figures (electrical rules unknown).
        Parts.Dr bad = Parts.dr();
        bad.rSource = -1;
        DriverPart refused = bad.build();
        PairFigures scratch = PairFigures.scratch();
        scratch.compute(QA, A);
        double before = scratch.rOnTot();
        try {
            scratch.compute(QA, refused);
        } catch (IllegalArgumentException | ArithmeticException expected) {
            // refused, as it should be
        }
        assertEquals(before, scratch.rOnTot(), 0.0);
        assertEquals(A, scratch.d());

        Rules.Ranking r = new Rules.Ranking(QA);
        r.rank(A);
        r.rank(refused);
        assertEquals(Rules.evaluate(refused, QA).verdict(), r.verdict());
        assertEquals(Rules.evaluate(refused, QA).score(), r.score(), 1e-12);
    }
}
