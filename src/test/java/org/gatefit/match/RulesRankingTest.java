package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@link Rules.Ranking} against {@link Rules#evaluate} (DESIGN.md: ranking and the full evaluation
 * call the same judgements, so they agree by construction): the verdict, the rank verdict that leaves
 * out open questions only, and a failing driver's score NaN only when failing drivers are not scored.
 */
class RulesRankingTest {

    private static Rules.Ranking rank(Parts.Dr d, OperatingPoint.Spec o, boolean scoreFailing) {
        SwitchPart sp = Parts.sw().build();
        Rules.Ranking r = new Rules.Ranking(Question.of(sp, o.resolve(sp), Margins.DEFAULT), scoreFailing);
        r.rank(d.build());
        return r;
    }

    private static PairResult eval(Parts.Dr d, OperatingPoint.Spec o) {
        return Parts.eval(Parts.sw(), d, o);
    }

    @Test
    void aPassingDriverIsScoredWhetherOrNotFailingOnesAre() {
        PairResult p = eval(Parts.dr(), Parts.op());
        assertEquals(Verdict.PASS, p.verdict());
        for (boolean scoreFailing : new boolean[] {true, false}) {
            Rules.Ranking r = rank(Parts.dr(), Parts.op(), scoreFailing);
            assertEquals(Verdict.PASS, r.verdict());
            assertEquals(Verdict.PASS, r.rankVerdict());
            assertEquals(p.score(), r.score(), 1e-12);
        }
    }

    @Test
    void aFailingDriverIsScoredOnlyWhenAsked() {
        Parts.Dr d = Parts.dr();
        d.vSupplyMax = 9; // the 10 V swing is above it: gate-voltage fails
        PairResult p = eval(d, Parts.op());
        assertEquals(Verdict.FAIL, p.verdict());
        Rules.Ranking scored = rank(d, Parts.op(), true);
        assertEquals(Verdict.FAIL, scored.verdict());
        assertEquals(p.score(), scored.score(), 1e-12);
        assertTrue(scored.score() <= Score.FAIL_CAP);
        Rules.Ranking skipped = rank(d, Parts.op(), false);
        assertEquals(Verdict.FAIL, skipped.verdict());
        assertEquals(Verdict.FAIL, skipped.rankVerdict());
        assertTrue(Double.isNaN(skipped.score()));
    }

    @Test
    void anOpenQuestionIsLeftOutOfTheRankVerdictButAWarningIsNot() {
        // high side without a bus: high-side waits for --bus (open); 19 V on is inside the 10 % headroom of
        // V_GS,max 20 V: gate-voltage warns on the parts' data
        Consumer<OperatingPoint.Spec> ask = o -> {
            o.highSide = true;
            o.bus = null;
            o.dutyMax = 0.5;
            o.vDrive = 19.0;
        };
        OperatingPoint.Spec o = Parts.op();
        ask.accept(o);
        Rules.Ranking r = rank(Parts.dr(), o, true);
        assertEquals(Verdict.WARN, r.verdict());
        assertEquals(Verdict.WARN, r.rankVerdict());
        OperatingPoint.Spec openOnly = Parts.op();
        ask.andThen(x -> x.vDrive = 12.0).accept(openOnly);
        Rules.Ranking open = rank(Parts.dr(), openOnly, true);
        assertEquals(Verdict.WARN, open.verdict(), "an unknown reads as a warning for the pair");
        assertEquals(Verdict.PASS, open.rankVerdict(), "but the driver ranks on its other checks");
        assertEquals(eval(Parts.dr(), openOnly).score(), open.score(), 1e-12);
    }
}
