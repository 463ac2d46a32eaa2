package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code high-side}: a high-side switch needs an output that floats on the switch node; a
 * bootstrapped driver's floating offset rating must exceed the bus by the offset margin (for
 * switch-node overshoot), an isolated driver's isolation rating must be the isolation margin times
 * the bus (margins: common practice, no source).
 */
final class HighSideRule implements PairRule {
    enum Why implements Reason { LOW_SIDE, CANNOT_FLOAT, NO_ISOLATION, NO_BUS_ISOLATED, ISOLATION_BELOW_BUS, ISOLATION_THIN,
        ISOLATED_OK, NO_OFFSET, NO_BUS_OFFSET, OFFSET_BELOW_BUS, OFFSET_THIN, OFFSET_OK }

    @Override
    public void judge(PairFigures f, Outcome out) {
        DriverPart d = f.d();
        double bus = f.op().bus();
        if (!f.op().highSide()) {
            out.pass(Why.LOW_SIDE, 1);
        } else if (!d.topology().floats()) {
            out.fail(Why.CANNOT_FLOAT);
        } else if (d.topology() == Topology.ISOLATED) {
            double iso = d.isolationVrms();
            double want = bus * f.m().isolation();
            if (Double.isNaN(iso)) {
                out.unknown(Why.NO_ISOLATION);
            } else if (Double.isNaN(bus)) {
                out.unknown(Why.NO_BUS_ISOLATED);
            } else if (iso < bus) {
                out.fail(Why.ISOLATION_BELOW_BUS);
            } else if (iso < want) {
                out.warn(Why.ISOLATION_THIN, (iso - bus) / (bus * (f.m().isolation() - 1)));
            } else {
                out.pass(Why.ISOLATED_OK, iso / want - 1);
            }
        } else {
            double rating = d.vOffsetMax();
            double need = bus * (1 + f.m().offset());
            if (Double.isNaN(rating)) {
                out.unknown(Why.NO_OFFSET);
            } else if (Double.isNaN(bus)) {
                out.unknown(Why.NO_BUS_OFFSET);
            } else if (rating < bus) {
                out.fail(Why.OFFSET_BELOW_BUS);
            } else if (rating < need) {
                out.warn(Why.OFFSET_THIN, (rating - bus) / (need - bus));
            } else {
                out.pass(Why.OFFSET_OK, rating / need - 1);
            }
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        DriverPart d = f.d();
        double bus = f.op().bus();
        double iso = d.isolationVrms();
        double want = bus * f.m().isolation();
        double rating = d.vOffsetMax();
        double need = bus * (1 + f.m().offset());
        List<Comparison> isoCmp = List.of(new Comparison("isolation rating (rms)", iso, "≥", want, "V"));
        List<Comparison> offCmp = List.of(new Comparison("floating offset rating", rating, "≥", need, "V"));
        return switch ((Why) why) {
            case LOW_SIDE -> new Worded("low side: the source sits at ground, no floating output needed");
            case CANNOT_FLOAT -> new Worded("a " + d.topology() + " driver cannot float on the switch node of a high-side"
                    + " switch — pick a high-side, half-bridge or isolated driver");
            case NO_ISOLATION -> new Worded("isolated driver with unknown isolation rating — check it against the "
                    + (Double.isNaN(bus) ? "bus" : Eng.of(bus, "V") + " bus"));
            case NO_BUS_ISOLATED -> new Worded("bus voltage not given — give --bus or bus_v to check the "
                    + Eng.of(iso, "V") + " rms isolation");
            case ISOLATION_BELOW_BUS -> new Worded("isolation " + Eng.of(iso, "V") + " rms is below the "
                    + Eng.of(bus, "V") + " bus — pick a driver rated ≥ " + Eng.of(want, "V"), isoCmp);
            case ISOLATION_THIN -> new Worded("isolation " + Eng.of(iso, "V") + " rms is less than "
                    + Eng.num(f.m().isolation()) + "× the " + Eng.of(bus, "V") + " bus — check the working-voltage rating"
                    + " (VIORM) and creepage for your standard", isoCmp);
            case ISOLATED_OK -> new Worded("isolated output, " + Eng.of(iso, "V") + " rms against a " + Eng.of(bus, "V")
                    + " bus; confirm the working-voltage rating for your standard", isoCmp);
            case NO_OFFSET -> new Worded("this driver's floating offset rating (v_offset_max_v) is unknown");
            case NO_BUS_OFFSET -> new Worded("bus voltage not given — give --bus or bus_v to check the "
                    + Eng.of(rating, "V") + " offset rating");
            case OFFSET_BELOW_BUS -> new Worded("offset rating " + Eng.of(rating, "V") + " is below the " + Eng.of(bus, "V")
                    + " bus — pick a driver rated ≥ " + Eng.of(need, "V"), offCmp);
            case OFFSET_THIN -> new Worded("offset rating " + Eng.of(rating, "V") + " leaves less than "
                    + Eng.pct(f.m().offset()) + " above the " + Eng.of(bus, "V") + " bus for switch-node overshoot — pick a"
                    + " driver rated ≥ " + Eng.of(need, "V") + " or measure the overshoot", offCmp);
            case OFFSET_OK -> new Worded("offset rating " + Eng.of(rating, "V") + " covers the "
                    + Eng.of(bus, "V") + " bus with " + Eng.pct(rating / bus - 1) + " to spare", offCmp);
        };
    }

    /** On the high side a low-side driver fails, and so does a floating one rated below the bus. */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        if (!q.op.highSide()) {
            return;
        }
        b.require(Prefilter.Condition.is("topology", Op.NE, Topology.LOW_SIDE.id()));
        if (!Double.isNaN(q.op.bus())) {
            double bus = q.op.bus();
            b.skip(Rule.HIGH_SIDE, Prefilter.Condition.is("topology", Op.EQ, Topology.HIGH_SIDE.id()),
                    Prefilter.Condition.of("v_offset_max_v", Op.LT, bus));
            b.skip(Rule.HIGH_SIDE, Prefilter.Condition.is("topology", Op.EQ, Topology.HALF_BRIDGE.id()),
                    Prefilter.Condition.of("v_offset_max_v", Op.LT, bus));
            b.skip(Rule.HIGH_SIDE, Prefilter.Condition.is("topology", Op.EQ, Topology.ISOLATED.id()),
                    Prefilter.Condition.of("isolation_vrms", Op.LT, bus));
        }
    }
}
