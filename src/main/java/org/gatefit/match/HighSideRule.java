package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code high-side}: a high-side switch needs an output that floats on the switch node.
 * <ul>
 *   <li>A bootstrapped driver's floating offset rating must exceed the bus by the offset margin
 *       (switch-node overshoot; common practice, no source).</li>
 *   <li>An isolated driver is judged by its maximum working isolation voltage (V_IORM, peak: what
 *       the barrier withstands continuously, IEC 60747-17) against the bus plus the same overshoot
 *       allowance. Its one-minute withstand rating (Vrms) is a test level, not a working rating
 *       (REFERENCES.md §9): alone it passes only a bus at or below {@link #WITHSTAND_ONLY_BUS}
 *       (with the isolation margin); above it, it warns that the working voltage is unknown, and
 *       a withstand rating below the bus fails.</li>
 *   <li>Every floating output's common-mode transient immunity must exceed the estimated
 *       switch-node dv/dt by the CMTI margin (REFERENCES.md §9); an isolated driver whose CMTI is
 *       unknown is unknown when the dv/dt is known (a level shifter's dv/dt immunity is judged
 *       where the catalog gives it).</li>
 * </ul>
 * The switch-node overshoot at turn-off is estimated where the stage gives its power-loop inductance
 * and load current (L·I/t_fall, {@link org.gatefit.physics.SwitchNode}) and added to the bus; the
 * offset margin then stands for what the estimate leaves out, and alone for the overshoot otherwise.
 */
final class HighSideRule extends PairRule {
    enum Why implements Reason { LOW_SIDE, CANNOT_FLOAT, NO_ISOLATION, NO_BUS_ISOLATED, ISOLATION_BELOW_BUS, ISOLATION_THIN,
        ISOLATED_OK, NO_OFFSET, NO_BUS_OFFSET, OFFSET_BELOW_BUS, OFFSET_THIN, OFFSET_OK, WORKING_BELOW_BUS, WORKING_THIN,
        WORKING_OK, WORKING_UNKNOWN, CMTI_BELOW, CMTI_THIN, NO_CMTI;

        @Override
        public String asks() {
            return this == NO_BUS_OFFSET || this == NO_BUS_ISOLATED ? "bus" : null;
        }
    }

    /**
     * The highest bus a one-minute withstand rating alone may pass: 60 V DC, the touch-safe limit of
     * IEC 62368-1's ES1 and the SELV limit of IEC 60950-1 (from memory). Above it the working
     * voltage decides.
     */
    static final double WITHSTAND_ONLY_BUS = 60;

    /**
     * The peak the isolation or offset must carry: the bus plus the switch-node overshoot where it is
     * estimated ({@code power_loop_nh}, {@code i_load_a}: L·I/t_fall), with the offset margin on top
     * (the margin alone stands for the overshoot when it is not estimated).
     */
    private static double stress(PairFigures f) {
        double os = f.nodeOvershoot();
        return (f.op().bus() + (Double.isNaN(os) ? 0 : os)) * (1 + f.m().offset());
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        DriverPart d = f.d();
        double bus = f.op().bus();
        if (!f.op().highSide()) {
            out.pass(Why.LOW_SIDE, 1);
            return;
        }
        if (!d.topology().floats()) {
            out.fail(Why.CANNOT_FLOAT);
            return;
        }
        if (d.topology() == Topology.ISOLATED) {
            isolation(f, out);
        } else {
            double rating = d.vOffsetMax();
            double need = stress(f);
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
        cmti(f, out);
    }

    private static void isolation(PairFigures f, Outcome out) {
        DriverPart d = f.d();
        double bus = f.op().bus();
        double iorm = d.ratings().vIorm();
        double iso = d.isolationVrms();
        double want = bus * f.m().isolation();
        if (Double.isNaN(iso) && Double.isNaN(iorm)) {
            out.unknown(Why.NO_ISOLATION);
        } else if (Double.isNaN(bus)) {
            out.unknown(Why.NO_BUS_ISOLATED);
        } else if (!Double.isNaN(iorm)) {
            double need = stress(f);
            if (iorm < bus) {
                out.fail(Why.WORKING_BELOW_BUS);
            } else if (iorm < need) {
                out.warn(Why.WORKING_THIN, (iorm - bus) / (need - bus));
            } else {
                out.pass(Why.WORKING_OK, iorm / need - 1);
            }
        } else if (iso < bus) {
            out.fail(Why.ISOLATION_BELOW_BUS);
        } else if (bus > WITHSTAND_ONLY_BUS) {
            out.warn(Why.WORKING_UNKNOWN, 0.5);
        } else if (iso < want) {
            out.warn(Why.ISOLATION_THIN, (iso - bus) / (bus * (f.m().isolation() - 1)));
        } else {
            out.pass(Why.ISOLATED_OK, iso / want - 1);
        }
    }

    /**
     * The floating output's CMTI against the switch-node dv/dt: it replaces the voltage judgement
     * when it is worse (a failure always, a warning or unknown only over a pass).
     */
    private static void cmti(PairFigures f, Outcome out) {
        double slew = f.slewMax();
        if (out.verdict() == Verdict.FAIL || !(slew > 0)) {
            return;
        }
        double cmti = f.d().ratings().cmti();
        if (Double.isNaN(cmti)) {
            if (f.d().topology() == Topology.ISOLATED && out.verdict() == Verdict.PASS) {
                out.unknown(Why.NO_CMTI);
            }
        } else if (cmti < slew) {
            out.fail(Why.CMTI_BELOW);
        } else if (cmti < slew * f.m().cmti() && out.verdict() == Verdict.PASS) {
            out.warn(Why.CMTI_THIN, (cmti - slew) / (slew * (f.m().cmti() - 1)));
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        DriverPart d = f.d();
        double bus = f.op().bus();
        double iso = d.isolationVrms();
        double iorm = d.ratings().vIorm();
        double want = bus * f.m().isolation();
        double rating = d.vOffsetMax();
        double need = stress(f);
        double cmti = d.ratings().cmti();
        double slew = f.slewMax();
        List<Comparison> cmp = new ArrayList<>();
        if (d.topology() == Topology.ISOLATED) {
            if (!Double.isNaN(iorm)) {
                cmp.add(new Comparison("working isolation voltage (peak)", iorm, "≥", need, "V"));
            } else {
                cmp.add(new Comparison("isolation rating (rms, 1 min)", iso, "≥", want, "V"));
            }
        } else {
            cmp.add(new Comparison("floating offset rating", rating, "≥", need, "V"));
        }
        if (!Double.isNaN(cmti) && slew > 0) {
            cmp.add(new Comparison("CMTI", cmti * 1e-9, "≥", slew * f.m().cmti() * 1e-9, "V/ns"));
        }
        String dvdt = slew > 0 ? Eng.slew(slew) + (Double.isNaN(f.op().dvdt()) ? " (estimated, fastest edge and corner)" : "") : "";
        String cmtiOk = !Double.isNaN(cmti) && slew > 0 ? "; CMTI " + Eng.slew(cmti) + " against the " + dvdt
                + " switch node" : "";
        String overshoot = Double.isNaN(f.nodeOvershoot()) ? "the " + Eng.of(bus, "V") + " bus with "
                + Eng.pct(f.m().offset()) + " for overshoot" : "the " + Eng.of(bus, "V") + " bus plus "
                + Eng.of(f.nodeOvershoot(), "V") + " turn-off overshoot (L·I/t_fall) with " + Eng.pct(f.m().offset())
                + " margin";
        return switch ((Why) why) {
            case LOW_SIDE -> new Worded("low side: the source sits at ground, no floating output needed");
            case CANNOT_FLOAT -> new Worded("a " + d.topology() + " driver cannot float on the switch node of a high-side"
                    + " switch — pick a high-side, half-bridge or isolated driver");
            case NO_ISOLATION -> new Worded("isolated driver with unknown isolation ratings (v_iorm_v, isolation_vrms) —"
                    + " check its working voltage against the " + (Double.isNaN(bus) ? "bus" : Eng.of(bus, "V") + " bus"));
            case NO_BUS_ISOLATED -> new Worded("bus voltage not given — give --bus or bus_v to check the isolation ("
                    + (Double.isNaN(iorm) ? Eng.of(iso, "V") + " rms withstand" : Eng.of(iorm, "V") + " peak working") + ")");
            case ISOLATION_BELOW_BUS -> new Worded("isolation withstand " + Eng.of(iso, "V") + " rms is below the "
                    + Eng.of(bus, "V") + " bus — pick a driver whose working isolation voltage (V_IORM) is ≥ "
                    + Eng.of(need, "V") + " peak", cmp);
            case ISOLATION_THIN -> new Worded("isolation " + Eng.of(iso, "V") + " rms is less than "
                    + Eng.num(f.m().isolation()) + "× the " + Eng.of(bus, "V") + " bus — check the working-voltage rating"
                    + " (V_IORM) and creepage for your standard" + cmtiOk, cmp);
            case ISOLATED_OK -> new Worded("isolated output, " + Eng.of(iso, "V") + " rms withstand against a "
                    + Eng.of(bus, "V") + " bus (at or below " + Eng.of(WITHSTAND_ONLY_BUS, "V") + ")" + cmtiOk, cmp);
            case WORKING_UNKNOWN -> new Worded("only the one-minute withstand rating (" + Eng.of(iso, "V")
                    + " rms) is known, a test level rather than a working rating: the working isolation voltage"
                    + " (v_iorm_v, V_IORM peak) is unknown for the " + Eng.of(bus, "V") + " bus — look it up; it must be ≥ "
                    + Eng.of(need, "V") + " peak" + cmtiOk, cmp);
            case WORKING_BELOW_BUS -> new Worded("working isolation voltage " + Eng.of(iorm, "V") + " peak is below the "
                    + Eng.of(bus, "V") + " bus — pick a driver with V_IORM ≥ " + Eng.of(need, "V") + " peak", cmp);
            case WORKING_THIN -> new Worded("working isolation voltage " + Eng.of(iorm, "V") + " peak does not cover "
                    + overshoot + " (" + Eng.of(need, "V") + ") — pick a driver with V_IORM ≥ " + Eng.of(need, "V")
                    + " or measure the switch-node overshoot", cmp);
            case WORKING_OK -> new Worded("working isolation voltage " + Eng.of(iorm, "V") + " peak covers " + overshoot
                    + cmtiOk + "; confirm creepage and clearance for your standard", cmp);
            case NO_OFFSET -> new Worded("this driver's floating offset rating (v_offset_max_v) is unknown");
            case NO_BUS_OFFSET -> new Worded("bus voltage not given — give --bus or bus_v to check the "
                    + Eng.of(rating, "V") + " offset rating");
            case OFFSET_BELOW_BUS -> new Worded("offset rating " + Eng.of(rating, "V") + " is below the " + Eng.of(bus, "V")
                    + " bus — pick a driver rated ≥ " + Eng.of(need, "V"), cmp);
            case OFFSET_THIN -> new Worded(Double.isNaN(f.nodeOvershoot()) ? "offset rating " + Eng.of(rating, "V")
                    + " leaves less than " + Eng.pct(f.m().offset()) + " above the " + Eng.of(bus, "V") + " bus for"
                    + " switch-node overshoot — pick a driver rated ≥ " + Eng.of(need, "V") + " or measure the overshoot"
                    : "offset rating " + Eng.of(rating, "V") + " is short of " + overshoot + " (" + Eng.of(need, "V")
                    + ") — pick a driver rated ≥ " + Eng.of(need, "V") + ", or shorten the power loop", cmp);
            case OFFSET_OK -> new Worded("offset rating " + Eng.of(rating, "V") + " covers the "
                    + Eng.of(bus, "V") + " bus with " + Eng.pct(rating / bus - 1) + " to spare"
                    + (Double.isNaN(f.nodeOvershoot()) ? "" : " (" + overshoot + ": " + Eng.of(need, "V") + ")") + cmtiOk,
                    cmp);
            case CMTI_BELOW -> new Worded("the switch node slews at " + dvdt + ", faster than this driver's CMTI "
                    + Eng.slew(cmti) + ", so the floating output may glitch (false turn-on, shoot-through) — pick a"
                    + " driver with CMTI ≥ " + Eng.slew(slew * f.m().cmti()) + " or slow the edge (larger R_g)", cmp);
            case CMTI_THIN -> new Worded("CMTI " + Eng.slew(cmti) + " is less than " + Eng.num(f.m().cmti())
                    + "× the " + dvdt + " switch-node slew (the estimate is an average; the peak is steeper) — pick a"
                    + " driver with CMTI ≥ " + Eng.slew(slew * f.m().cmti()) + " or measure the slew", cmp);
            case NO_CMTI -> new Worded("isolation is adequate, but this isolated driver's CMTI (cmti_kv_us) is unknown"
                    + " against the " + dvdt + " switch node — look it up; it must be ≥ " + Eng.slew(slew * f.m().cmti()),
                    cmp);
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
            // An isolated driver whose working voltage is known and below the bus fails, whatever its withstand rating.
            b.skip(Rule.HIGH_SIDE, Prefilter.Condition.is("topology", Op.EQ, Topology.ISOLATED.id()),
                    Prefilter.Condition.of("v_iorm_v", Op.LT, bus));
        }
    }
}
