package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import org.gatefit.match.Check.Comparison;
import org.gatefit.physics.Bootstrap;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.DvDt;
import org.gatefit.physics.ESeries;
import org.gatefit.physics.GateCharge;
import org.gatefit.physics.GateLoop;
import org.gatefit.physics.GatePower;
import org.gatefit.physics.SwitchingTimes;

/**
 * Runs every rule of DESIGN.md on one driver–switch pair at one operating point. The figures come
 * from {@code org.gatefit.physics}; this class decides pass, warn, fail or unknown against the
 * {@link Margins} and words one sentence per check that says what would fix it.
 *
 * <p>Conventions: {@code r_g_ohm} is the resistor of each switch when several are in parallel
 * (their gates then share the driver's output resistance); an unknown internal gate resistance is
 * taken as 0 Ω, which makes currents upper bounds (the assumption is printed).
 */
public final class PairEvaluator {
    /** Gate-loop damping ratio the recommended resistor aims at (common practice, no source: about 0.7, under 5 % overshoot). */
    public static final double DAMPING_TARGET = 0.7;

    private PairEvaluator() {
    }

    /** All checks and figures of a pair. */
    public static PairResult evaluate(DriverPart d, SwitchPart s, OperatingPoint op, Margins m) {
        return evaluate(d, prepare(s, op, m));
    }

    /** All checks and figures of a pair, with the switch side computed once by {@link #prepare}. */
    public static PairResult evaluate(DriverPart d, Prepared p) {
        return evaluate(d, p, true);
    }

    /**
     * Verdict and score only: the same rules as {@link #evaluate}, but the checks carry no sentence
     * or comparisons and the result no figures. Ranking uses it for every candidate and
     * evaluates the ones it shows in full; verdict and score are identical.
     */
    public static PairResult rank(DriverPart d, SwitchPart s, OperatingPoint op, Margins m) {
        return evaluate(d, prepare(s, op, m), false);
    }

    /** The figures of the switch at the operating point that every driver shares, computed once per question. */
    public static Prepared prepare(SwitchPart s, OperatingPoint op, Margins m) {
        return new Prepared(s, op, m);
    }

    /**
     * Verdicts and scores for one question, driver after driver, with one calculation reused (a
     * ranker keeps one per thread, so ranking allocates next to nothing per driver). Not thread-safe.
     */
    public static final class Ranking {
        private final Prepared p;
        private final Calc c;
        private final boolean scoreFailing;
        private Verdict verdict;
        private double score;

        /** A ranking that scores every driver, failing ones included. */
        public Ranking(Prepared p) {
            this(p, true);
        }

        /**
         * @param scoreFailing whether a failing driver gets its score; when false, the rules after
         *                     the first that fails are not run (the verdict is fail whatever they
         *                     say) and {@link #score()} is NaN for it, for a shortlist that lists
         *                     no failing driver but counts them
         */
        public Ranking(Prepared p, boolean scoreFailing) {
            this.p = p;
            this.c = new Calc(p, false);
            this.scoreFailing = scoreFailing;
        }

        /**
         * Ranks one driver; {@link #verdict()} and {@link #score()} then hold its outcome (the score
         * NaN for a failing driver when failing drivers are not scored).
         */
        public void rank(DriverPart d) {
            if (!p.s.nChannel()) {
                PairResult r = pChannel(d, p.s, p.op, p.m);
                verdict = r.verdict();
                score = r.score();
                return;
            }
            c.load(d);
            Verdict v = Verdict.PASS;
            double sum = 0;
            int w = 0;
            for (Rule rule : PAIR_RULES) {
                Check ch = run(rule, c, p.m);
                Verdict rv = ch == QUICK ? c.lastVerdict : ch.verdict();
                double rs = ch == QUICK ? c.lastScore : ch.score();
                v = v.and(rv);
                if (v == Verdict.FAIL && !scoreFailing) {
                    verdict = Verdict.FAIL;
                    score = Double.NaN;
                    return;
                }
                sum += rule.weight() * rs;
                w += rule.weight();
            }
            verdict = v.forPair();
            score = Score.combine(sum, w, c.life.availability(), p.switchLife.availability(), verdict);
        }

        public Verdict verdict() {
            return verdict;
        }

        public double score() {
            return score;
        }
    }

    /** Marks a ranked rule whose outcome is in {@link Calc#lastVerdict} and {@link Calc#lastScore}. */
    private static final Check QUICK = new Check(Rule.CATALOG, Verdict.UNKNOWN, "", List.of(), 0);

    /** The rules a pair is checked against, in the order checks are listed ({@code catalog} belongs to stage checks). */
    private static final Rule[] PAIR_RULES = {Rule.DRIVE_CURRENT, Rule.GATE_VOLTAGE, Rule.NEGATIVE_BIAS, Rule.UVLO,
        Rule.LOGIC_LEVEL, Rule.POLARITY, Rule.HIGH_SIDE, Rule.BOOTSTRAP, Rule.DRIVER_POWER, Rule.DV_DT, Rule.LIFECYCLE};

    private static PairResult evaluate(DriverPart d, Prepared p, boolean detail) {
        if (!p.s.nChannel()) {
            return pChannel(d, p.s, p.op, p.m);
        }
        Calc c = new Calc(d, p, detail);
        List<Check> checks = new ArrayList<>(PAIR_RULES.length);
        for (Rule rule : PAIR_RULES) {
            Check ch = run(rule, c, p.m);
            checks.add(ch == QUICK ? new Check(rule, c.lastVerdict, "", List.of(), c.lastScore) : ch);
        }
        Verdict v = Verdict.PASS;
        for (Check ch : checks) {
            v = v.and(ch.verdict());
        }
        v = v.forPair();
        return new PairResult(d.partNumber(), p.s.partNumber(), v, Score.of(checks, d, p.s, v), checks,
                detail ? c.figures() : List.of(), p.op, p.m, Double.NaN);
    }

    /**
     * One rule on one pair. A physics function refusing its inputs means the check cannot be made:
     * unknown, with the reason.
     */
    private static Check run(Rule rule, Calc c, Margins m) {
        try {
            return switch (rule) {
                case DRIVE_CURRENT -> driveCurrent(c, m);
                case GATE_VOLTAGE -> gateVoltage(c, m);
                case NEGATIVE_BIAS -> negativeBias(c, m);
                case UVLO -> uvlo(c, m);
                case LOGIC_LEVEL -> logicLevel(c, m);
                case POLARITY -> polarity(c);
                case HIGH_SIDE -> highSide(c, m);
                case BOOTSTRAP -> bootstrap(c);
                case DRIVER_POWER -> driverPower(c, m);
                case DV_DT -> dvdt(c, m);
                case LIFECYCLE -> c.detail ? lifecycle(c.d, c.s) : quickLifecycle(c);
                case CATALOG -> throw new IllegalStateException("the catalog rule belongs to stage checks, not to a pair");
            };
        } catch (IllegalArgumentException e) {
            if (rule == Rule.LIFECYCLE) {
                throw e;
            }
            return new Check(rule, Verdict.UNKNOWN, "cannot estimate: " + e.getMessage(), List.of(), Score.UNKNOWN);
        }
    }

    /**
     * The rules model an n-type gate (on level positive against the source). A p-channel switch's
     * gate drive is the mirror image and is not modelled: every electrical check says so.
     */
    private static PairResult pChannel(DriverPart d, SwitchPart s, OperatingPoint op, Margins m) {
        List<Check> checks = new ArrayList<>();
        for (Rule r : Rule.values()) {
            if (r != Rule.LIFECYCLE && r != Rule.CATALOG) {
                checks.add(unknown(r, s.partNumber() + " is a p-channel switch; gatefit's rules model n-channel gate"
                        + " drive only — check this pair by hand against both datasheets"));
            }
        }
        checks.add(lifecycle(d, s));
        Verdict v = Verdict.PASS;
        for (Check ch : checks) {
            v = v.and(ch.verdict());
        }
        v = v.forPair();
        return new PairResult(d.partNumber(), s.partNumber(), v, Score.of(checks, d, s, v), checks, List.of(), op, m,
                Double.NaN);
    }

    // ---------------------------------------------------------------- drive-current

    static Check driveCurrent(Calc c, Margins m) {
        if (Double.isNaN(c.qTotal)) {
            return !c.detail ? c.quick(Rule.DRIVE_CURRENT, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.DRIVE_CURRENT, () -> "gate charge unknown");
        }
        double need = c.iReq * m.driveCurrent();
        double srcRatio = c.iPkSrc / c.iReq;
        double snkRatio = c.iPkSnk / c.iReq;
        boolean sourceWorse = srcRatio <= snkRatio;
        double have = sourceWorse ? c.iPkSrc : c.iPkSnk;
        double rated = sourceWorse ? c.d.iSource() : c.d.iSink();
        double rLoop = sourceWorse ? c.rOnTot : c.rOffTot;
        double ratio = Math.min(srcRatio, snkRatio);
        List<Comparison> cmp = !c.detail ? List.of() : List.of(
                new Comparison("peak source current (turn-on)", c.iPkSrc, "≥", need, "A"),
                new Comparison("peak sink current (turn-off)", c.iPkSnk, "≥", need, "A"));
        String edge = c.detail ? (Eng.of(c.op.edge(), "s")) : "";
        String what = c.detail ? ("needs " + Eng.of(need, "A") + " for a " + edge + " edge with " + Eng.num(m.driveCurrent())
                + "× margin (" + Eng.of(c.qTotal, "C") + " at " + Eng.of(c.op.swing(), "V") + ")") : "";
        String gives = c.detail ? ("this driver " + (sourceWorse ? "sources " : "sinks ") + Eng.of(have, "A") + " through "
                + Eng.of(rLoop, "Ω") + (have >= rated ? " (its rated peak)" : "")) : "";
        if (ratio >= m.driveCurrent()) {
            return !c.detail ? c.quick(Rule.DRIVE_CURRENT, Verdict.PASS, Score.pass((ratio - m.driveCurrent()) / m.driveCurrent()))
                    : check(c, Rule.DRIVE_CURRENT, Verdict.PASS, () -> what + "; " + gives, cmp,
                    Score.pass((ratio - m.driveCurrent()) / m.driveCurrent()));
        }
        String fix = c.detail ? (fixCurrent(c, need, sourceWorse)) : "";
        if (ratio >= 1) {
            return !c.detail ? c.quick(Rule.DRIVE_CURRENT, Verdict.WARN, Score.warn((ratio - 1) / (m.driveCurrent() - 1)))
                    : check(c, Rule.DRIVE_CURRENT, Verdict.WARN, () -> what + "; " + gives + ", less margin than asked — "
                    + fix, cmp, Score.warn((ratio - 1) / (m.driveCurrent() - 1)));
        }
        return !c.detail ? c.quick(Rule.DRIVE_CURRENT, Verdict.FAIL, 0)
                : check(c, Rule.DRIVE_CURRENT, Verdict.FAIL, () -> what + "; " + gives + " — " + fix, cmp, 0);
    }

    private static String fixCurrent(Calc c, double need, boolean source) {
        int n = c.op.parallel();
        double rDrv = source ? c.rSrc : c.rSnk;
        double rated = source ? c.d.iSource() : c.d.iSink();
        double rgNow = source ? c.op.rG() : c.op.rGOff();
        double rgMax = n * (c.op.swing() / need - rDrv - c.rInt / n);
        double edgeOk = c.qTotal * (need / c.iReq) / Math.min(source ? c.iPkSrc : c.iPkSnk, Double.MAX_VALUE);
        String pick = "pick a driver rated ≥ " + Eng.of(Math.ceil(need * 10) / 10, "A");
        String relax = "relax the edge to " + Eng.of(edgeOk, "s");
        if (rated >= need && rgMax > 0 && rgMax < rgNow) {
            return "lower " + (source ? "R_g" : "R_g,off") + " to " + Eng.of(ESeries.E24.roundDown(rgMax), "Ω")
                    + " or " + pick;
        }
        return pick + " or " + relax;
    }

    // ---------------------------------------------------------------- gate-voltage

    static Check gateVoltage(Calc c, Margins m) {
        SwitchPart s = c.s;
        OperatingPoint op = c.op;
        double on = op.vDrive();
        double swing = op.swing();
        if (Double.isNaN(s.vGsMax())) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.GATE_VOLTAGE, () -> "the switch's V_GS,max (v_gs_max_v) is unknown, so the " + Eng.of(on, "V")
                    + " on level cannot be checked against it — look up the absolute gate limit in the datasheet");
        }
        List<Comparison> cmp = c.comparisons();
        if (c.detail) {
            cmp.add(new Comparison("driver supply (on − off level)", swing, "≥", c.d.vSupplyMin(), "V"));
            cmp.add(new Comparison("driver supply (on − off level)", swing, "≤", c.d.vSupplyMax(), "V"));
        }
        double limit = s.vGsMax() * (1 - m.gateHeadroom());
        if (c.detail) {
            cmp.add(new Comparison("on level", on, "≤", limit, "V"));
        }
        double full = fullEnhancement(s);
        if (!Double.isNaN(full)) {
            if (c.detail) {
                cmp.add(new Comparison("on level (full enhancement)", on, "≥", full, "V"));
            }
        }
        if (!Double.isNaN(s.vThMax())) {
            if (c.detail) {
                cmp.add(new Comparison("on level (above threshold)", on, "≥", s.vThMax(), "V"));
            }
        }
        if (swing > c.d.vSupplyMax()) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.FAIL, 0)
                    : fail(c, Rule.GATE_VOLTAGE, () -> "the " + Eng.of(swing, "V") + " supply (on " + Eng.of(on, "V") + ", off "
                    + Eng.of(op.vDriveNeg(), "V") + ") exceeds this driver's " + Eng.of(c.d.vSupplyMax(), "V")
                    + " maximum — lower the drive levels or pick a driver rated ≥ " + Eng.of(swing, "V"), cmp);
        }
        if (swing < c.d.vSupplyMin()) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.FAIL, 0)
                    : fail(c, Rule.GATE_VOLTAGE, () -> "the " + Eng.of(swing, "V") + " supply is below this driver's "
                    + Eng.of(c.d.vSupplyMin(), "V") + " minimum — raise the supply or pick a driver that runs from "
                    + Eng.of(swing, "V"), cmp);
        }
        if (on > s.vGsMax()) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.FAIL, 0)
                    : fail(c, Rule.GATE_VOLTAGE, () -> "on level " + Eng.of(on, "V") + " exceeds the switch's V_GS,max of "
                    + Eng.of(s.vGsMax(), "V") + " and will damage the gate — drive at " + Eng.of(limit, "V")
                    + " or less" + (Double.isNaN(s.vGateOn()) ? "" : " (recommended " + Eng.of(s.vGateOn(), "V") + ")"), cmp);
        }
        if (!Double.isNaN(s.vThMax()) && on <= s.vThMax()) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.FAIL, 0)
                    : fail(c, Rule.GATE_VOLTAGE, () -> "on level " + Eng.of(on, "V") + " does not exceed V_th,max "
                    + Eng.of(s.vThMax(), "V") + ", so the switch may not turn on — drive at "
                    + Eng.of(Double.isNaN(full) ? s.vThMax() * 2 : full, "V") + " or more", cmp);
        }
        if (on > limit) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.WARN, Score.warn((s.vGsMax() - on) / (s.vGsMax() - limit)))
                    : check(c, Rule.GATE_VOLTAGE, Verdict.WARN, () -> "on level " + Eng.of(on, "V") + " is within "
                    + Eng.pct(m.gateHeadroom()) + " of V_GS,max " + Eng.of(s.vGsMax(), "V")
                    + ", leaving little room for overshoot — drive at " + Eng.of(limit, "V") + " or less, or damp the gate loop",
                    cmp, Score.warn((s.vGsMax() - on) / (s.vGsMax() - limit)));
        }
        if (Double.isNaN(full)) {
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.UNKNOWN, Score.UNKNOWN)
                    : check(c, Rule.GATE_VOLTAGE, Verdict.UNKNOWN, () -> "on level " + Eng.of(on, "V") + " is within the limits,"
                    + " but the level R_on is specified at (r_on_vgs_v) is unknown — check full enhancement in the datasheet",
                    cmp, Score.UNKNOWN);
        }
        if (on < full) {
            double frac = Double.isNaN(s.vThMax()) ? 0.5 : (on - s.vThMax()) / (full - s.vThMax());
            return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.WARN, Score.warn(Math.max(0, Math.min(1, frac))))
                    : check(c, Rule.GATE_VOLTAGE, Verdict.WARN, () -> "on level " + Eng.of(on, "V") + " is below the "
                    + Eng.of(full, "V") + " that " + (s.technology() == Technology.IGBT ? "V_CE(sat)" : "R_DS(on)")
                    + " is specified at, so conduction loss will be higher than the datasheet figure — drive at "
                    + Eng.of(full, "V") + " or more", cmp, Score.warn(Math.max(0, Math.min(1, frac))));
        }
        double room = Math.min((limit - on) / limit, (on - full) / Math.max(full, 1));
        return !c.detail ? c.quick(Rule.GATE_VOLTAGE, Verdict.PASS, Score.pass(room * 5))
                : check(c, Rule.GATE_VOLTAGE, Verdict.PASS, () -> "on level " + Eng.of(on, "V") + " fully enhances the switch (≥ "
                + Eng.of(full, "V") + ") and stays below " + Eng.of(limit, "V") + " (V_GS,max " + Eng.of(s.vGsMax(), "V")
                + " less " + Eng.pct(m.gateHeadroom()) + "); the driver runs from " + Eng.of(c.d.vSupplyMin(), "V")
                + " to " + Eng.of(c.d.vSupplyMax(), "V"), cmp, Score.pass(room * 5));
    }

    /** The on level for full enhancement: where R_DS(on) / V_CE(sat) is specified, else the recommended level. */
    static double fullEnhancement(SwitchPart s) {
        if (!Double.isNaN(s.rOnVgs()) && s.rOnVgs() > 0) {
            return s.rOnVgs();
        }
        return s.vGateOn();
    }

    // ---------------------------------------------------------------- negative-bias

    static Check negativeBias(Calc c, Margins m) {
        SwitchPart s = c.s;
        DriverPart d = c.d;
        double off = c.op.vDriveNeg();
        if (Double.isNaN(s.vGsMin())) {
            return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.NEGATIVE_BIAS, () -> "the switch's V_GS,min (v_gs_min_v) is unknown, so the " + Eng.of(off, "V")
                    + " off level cannot be checked against it — look up the negative gate limit in the datasheet");
        }
        List<Comparison> cmp = c.comparisons();
        double limit = s.vGsMin() * (1 - m.gateHeadroom());
        if (c.detail) {
            cmp.add(new Comparison("off level", off, "≥", limit, "V"));
        }
        if (off < 0) {
            if (c.detail) {
                cmp.add(new Comparison("off level (driver's negative rail)", off, "≥",
                        Double.isNaN(d.vNegMin()) ? 0 : d.vNegMin(), "V"));
            }
        }
        if (!Double.isNaN(s.vGateOff())) {
            if (c.detail) {
                cmp.add(new Comparison("off level (switch's recommendation)", off, "≤", s.vGateOff(), "V"));
            }
        }
        if (off < s.vGsMin()) {
            return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, Verdict.FAIL, 0)
                    : fail(c, Rule.NEGATIVE_BIAS, () -> "off level " + Eng.of(off, "V") + " is below the switch's V_GS,min "
                    + Eng.of(s.vGsMin(), "V") + " and will damage the gate — use " + Eng.of(limit, "V") + " or less negative", cmp);
        }
        if (off < 0 && (Double.isNaN(d.vNegMin()) || d.vNegMin() == 0)) {
            return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, Verdict.FAIL, 0)
                    : fail(c, Rule.NEGATIVE_BIAS, () -> "the stage asks for " + Eng.of(off, "V") + " off, but this driver has no"
                    + " negative output rail — pick a driver with a negative rail (v_neg_min_v ≤ " + Eng.of(off, "V")
                    + ") or turn off at 0 V with a Miller clamp", cmp);
        }
        if (off < 0 && off < d.vNegMin()) {
            return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, Verdict.FAIL, 0)
                    : fail(c, Rule.NEGATIVE_BIAS, () -> "off level " + Eng.of(off, "V") + " is below the " + Eng.of(d.vNegMin(), "V")
                    + " this driver's negative rail supports — use " + Eng.of(d.vNegMin(), "V") + " or pick a driver rated for "
                    + Eng.of(off, "V"), cmp);
        }
        if (off < limit) {
            return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, Verdict.WARN, Score.warn(0.5))
                    : check(c, Rule.NEGATIVE_BIAS, Verdict.WARN, () -> "off level " + Eng.of(off, "V") + " is within "
                    + Eng.pct(m.gateHeadroom()) + " of V_GS,min " + Eng.of(s.vGsMin(), "V") + " — undershoot may exceed it;"
                    + " use " + Eng.of(limit, "V") + " or less negative", cmp, Score.warn(0.5));
        }
        if (!Double.isNaN(s.vGateOff()) && s.vGateOff() < 0 && off > s.vGateOff()) {
            boolean clamp = Boolean.TRUE.equals(d.millerClamp());
            String msg = c.detail ? ("the switch recommends " + Eng.of(s.vGateOff(), "V") + " off but the stage gives "
                    + Eng.of(off, "V") + (clamp ? "; this driver's Miller clamp holds the gate low, so verify turn-off on the bench"
                    : " — add a negative rail or use a driver with a Miller clamp, or dv/dt and noise may turn it on")) : "";
            return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, clamp ? Verdict.PASS : Verdict.WARN, clamp ? Score.pass(0) : Score.warn(0.5))
                    : check(c, Rule.NEGATIVE_BIAS, clamp ? Verdict.PASS : Verdict.WARN, () -> msg, cmp,
                    clamp ? Score.pass(0) : Score.warn(0.5));
        }
        return !c.detail ? c.quick(Rule.NEGATIVE_BIAS, Verdict.PASS, Score.pass(1))
                : check(c, Rule.NEGATIVE_BIAS, Verdict.PASS, () -> "off level " + Eng.of(off, "V") + " is within the switch's limit "
                + Eng.of(s.vGsMin(), "V") + (off < 0 ? " and the driver's negative rail " + Eng.of(d.vNegMin(), "V") : "")
                + (Double.isNaN(s.vGateOff()) ? "" : " and meets its recommended " + Eng.of(s.vGateOff(), "V")), cmp,
                Score.pass(1));
    }

    // ---------------------------------------------------------------- uvlo

    static Check uvlo(Calc c, Margins m) {
        DriverPart d = c.d;
        SwitchPart s = c.s;
        double supply = c.op.swing();
        if (Double.isNaN(d.uvloOn())) {
            return !c.detail ? c.quick(Rule.UVLO, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.UVLO, () -> "this driver's UVLO thresholds are unknown (uvlo_on_v) — check that it starts at "
                    + Eng.of(supply, "V") + " and what its outputs do when the supply sags");
        }
        List<Comparison> cmp = c.comparisons();
        if (c.detail) {
            cmp.add(new Comparison("supply above UVLO rising", supply, "≥", d.uvloOn() + m.uvloHeadroom(), "V"));
        }
        if (supply < d.uvloOn()) {
            return !c.detail ? c.quick(Rule.UVLO, Verdict.FAIL, 0)
                    : fail(c, Rule.UVLO, () -> "the " + Eng.of(supply, "V") + " supply never reaches this driver's UVLO rising threshold "
                    + Eng.of(d.uvloOn(), "V") + ", so it stays locked out — raise the supply above " + Eng.of(d.uvloOn()
                    + m.uvloHeadroom(), "V") + " or pick a driver with a lower UVLO", cmp);
        }
        double full = fullEnhancement(s);
        double offUvlo = Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
        double gateAtUvlo = offUvlo + c.op.vDriveNeg();
        double need = Double.isNaN(s.vPlateau()) ? s.vThMax() : Math.max(s.vPlateau(), nz(s.vThMax()));
        if (!Double.isNaN(need)) {
            if (c.detail) {
                cmp.add(new Comparison("on level just before lock-out", gateAtUvlo, "≥", need, "V"));
            }
        }
        if (!Double.isNaN(full)) {
            if (c.detail) {
                cmp.add(new Comparison("on level just before lock-out (full enhancement)", gateAtUvlo, "≥", full, "V"));
            }
        }
        if (!Double.isNaN(need) && gateAtUvlo < need) {
            return !c.detail ? c.quick(Rule.UVLO, Verdict.FAIL, 0)
                    : fail(c, Rule.UVLO, () -> "the driver keeps switching down to " + Eng.of(offUvlo, "V") + " (UVLO falling), where the"
                    + " gate gets only " + Eng.of(gateAtUvlo, "V") + ", below the " + Eng.of(need, "V")
                    + " plateau/threshold, so a sagging supply leaves the switch half-on — pick a driver with UVLO falling ≥ "
                    + Eng.of(need - c.op.vDriveNeg(), "V") + (c.op.vDriveNeg() < 0 ? " (the plateau plus the "
                    + Eng.of(-c.op.vDriveNeg(), "V") + " negative rail)" : ""), cmp);
        }
        if (supply < d.uvloOn() + m.uvloHeadroom()) {
            return !c.detail ? c.quick(Rule.UVLO, Verdict.WARN, Score.warn((supply - d.uvloOn()) / m.uvloHeadroom()))
                    : check(c, Rule.UVLO, Verdict.WARN, () -> "the " + Eng.of(supply, "V") + " supply is within "
                    + Eng.of(m.uvloHeadroom(), "V") + " of UVLO rising " + Eng.of(d.uvloOn(), "V")
                    + ", so supply tolerance or droop may lock the driver out — raise the supply or pick a lower UVLO", cmp,
                    Score.warn((supply - d.uvloOn()) / m.uvloHeadroom()));
        }
        if (Double.isNaN(need) && Double.isNaN(full)) {
            return !c.detail ? c.quick(Rule.UVLO, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.UVLO, () -> "the driver starts at " + Eng.of(d.uvloOn(), "V") + ", but the switch's threshold"
                    + " and plateau are unknown, so the gate level at lock-out cannot be judged");
        }
        String below = c.detail ? (!Double.isNaN(full) && gateAtUvlo < full
                ? "; between " + Eng.of(gateAtUvlo, "V") + " and full enhancement " + Eng.of(full, "V")
                        + " a sagging supply only raises conduction loss" : "") : "";
        return !c.detail ? c.quick(Rule.UVLO, Verdict.PASS, Score.pass((supply - d.uvloOn() - m.uvloHeadroom()) / Math.max(1, supply)))
                : check(c, Rule.UVLO, Verdict.PASS, () -> "the driver starts at " + Eng.of(d.uvloOn(), "V") + " (supply "
                + Eng.of(supply, "V") + ") and locks out at " + Eng.of(offUvlo, "V") + ", before the gate falls below the "
                + Eng.of(Double.isNaN(need) ? full : need, "V") + (Double.isNaN(need) ? " full-enhancement level" : " plateau")
                + below, cmp,
                Score.pass((supply - d.uvloOn() - m.uvloHeadroom()) / Math.max(1, supply)));
    }

    // ---------------------------------------------------------------- logic-level

    static Check logicLevel(Calc c, Margins m) {
        DriverPart d = c.d;
        OperatingPoint op = c.op;
        String from = !c.detail ? "" : op.logic() == null ? "the controller" : "the " + op.logic().id() + " controller";
        if (Double.isNaN(d.vIh()) || Double.isNaN(d.vIl())) {
            return !c.detail ? c.quick(Rule.LOGIC_LEVEL, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.LOGIC_LEVEL, () -> "this driver's input thresholds (v_ih_v, v_il_v) are unknown — check that "
                    + from + " (V_OH " + Eng.of(op.vOh(), "V") + ", V_OL " + Eng.of(op.vOl(), "V") + ") drives it");
        }
        List<Comparison> cmp = c.comparisons();
        if (c.detail) {
            cmp.add(new Comparison("noise margin high (V_OH − V_IH)", c.nmHigh, "≥", m.logicNoise(), "V"));
            cmp.add(new Comparison("noise margin low (V_IL − V_OL)", c.nmLow, "≥", m.logicNoise(), "V"));
        }
        if (!Double.isNaN(d.vInMax())) {
            if (c.detail) {
                cmp.add(new Comparison("controller output high", op.vOhMax(), "≤", d.vInMax(), "V"));
            }
        }
        if (!Double.isNaN(d.vInMax()) && op.vOhMax() > d.vInMax()) {
            return !c.detail ? c.quick(Rule.LOGIC_LEVEL, Verdict.FAIL, 0)
                    : fail(c, Rule.LOGIC_LEVEL, () -> from + " drives up to " + Eng.of(op.vOhMax(), "V") + ", above this driver's "
                    + Eng.of(d.vInMax(), "V") + " input maximum — add a level shifter or pick a driver with a higher input rating", cmp);
        }
        if (c.nmHigh < 0) {
            return !c.detail ? c.quick(Rule.LOGIC_LEVEL, Verdict.FAIL, 0)
                    : fail(c, Rule.LOGIC_LEVEL, () -> from + " gives V_OH " + Eng.of(op.vOh(), "V") + " but this driver needs V_IH "
                    + Eng.of(d.vIh(), "V") + " (margin " + Eng.of(c.nmHigh, "V") + "), so a high may not register — pick a driver"
                    + " with V_IH ≤ " + Eng.of(op.vOh() - m.logicNoise(), "V") + " or add a level shifter", cmp);
        }
        if (c.nmLow < 0) {
            return !c.detail ? c.quick(Rule.LOGIC_LEVEL, Verdict.FAIL, 0)
                    : fail(c, Rule.LOGIC_LEVEL, () -> from + " gives V_OL " + Eng.of(op.vOl(), "V") + " but this driver needs V_IL "
                    + Eng.of(d.vIl(), "V") + " (margin " + Eng.of(c.nmLow, "V") + "), so a low may not register — pick a driver"
                    + " with V_IL ≥ " + Eng.of(op.vOl() + m.logicNoise(), "V"), cmp);
        }
        double worst = Math.min(c.nmHigh, c.nmLow);
        String margins = c.detail ? ("noise margins " + Eng.of(c.nmHigh, "V") + " high, " + Eng.of(c.nmLow, "V") + " low") : "";
        if (worst < m.logicNoise()) {
            return !c.detail ? c.quick(Rule.LOGIC_LEVEL, Verdict.WARN, Score.warn(worst / m.logicNoise()))
                    : check(c, Rule.LOGIC_LEVEL, Verdict.WARN, () -> from + " into V_IH " + Eng.of(d.vIh(), "V") + " / V_IL "
                    + Eng.of(d.vIl(), "V") + ": " + margins + ", under the " + Eng.of(m.logicNoise(), "V")
                    + " asked for — keep the input trace short or pick a driver with lower thresholds", cmp,
                    Score.warn(worst / m.logicNoise()));
        }
        return !c.detail ? c.quick(Rule.LOGIC_LEVEL, Verdict.PASS, Score.pass(worst / 0.8))
                : check(c, Rule.LOGIC_LEVEL, Verdict.PASS, () -> from + " into V_IH " + Eng.of(d.vIh(), "V") + " / V_IL "
                + Eng.of(d.vIl(), "V") + ": " + margins, cmp, Score.pass(worst / 0.8));
    }

    // ---------------------------------------------------------------- polarity

    static Check polarity(Calc c) {
        DriverPart d = c.d;
        boolean wantInverting = !c.op.activeHigh();
        String sense = c.op.activeHigh() ? "active-high" : "active-low";
        if (d.offers(false) && d.offers(true)) {
            int ch = d.inverting().indexOf(wantInverting) + 1;
            return !c.detail ? c.quick(Rule.POLARITY, Verdict.PASS, Score.pass(1))
                    : check(c, Rule.POLARITY, Verdict.PASS, () -> "this driver has inverting and non-inverting inputs; use channel "
                    + ch + " (" + (wantInverting ? "inverting" : "non-inverting") + ") for the " + sense + " PWM",
                    List.of(), Score.pass(1));
        }
        boolean inverting = d.offers(true);
        if (inverting == wantInverting) {
            if (inverting) {
                return !c.detail ? c.quick(Rule.POLARITY, Verdict.WARN, Score.warn(0.5))
                        : check(c, Rule.POLARITY, Verdict.WARN, () -> "inverting input matches the active-low PWM, but the switch turns"
                        + " on whenever the controller pin is low or unpowered (reset, boot) — add a pull-up and an enable,"
                        + " or use a non-inverting driver with active-high PWM", List.of(), Score.warn(0.5));
            }
            return !c.detail ? c.quick(Rule.POLARITY, Verdict.PASS, Score.pass(1))
                    : check(c, Rule.POLARITY, Verdict.PASS, () -> "non-inverting input matches the active-high PWM", List.of(),
                    Score.pass(1));
        }
        if (inverting) {
            return !c.detail ? c.quick(Rule.POLARITY, Verdict.FAIL, 0)
                    : check(c, Rule.POLARITY, Verdict.FAIL, () -> "this driver's input is inverting but the PWM is active-high, so the"
                    + " switch is on while the controller holds its pin low (also in reset) — use the non-inverting variant or"
                    + " invert the PWM in the controller", List.of(), 0);
        }
        return !c.detail ? c.quick(Rule.POLARITY, Verdict.FAIL, 0)
                : check(c, Rule.POLARITY, Verdict.FAIL, () -> "this driver's input is non-inverting but the PWM is active-low, so the"
                + " switch is on when it should be off — use an inverting driver or make the PWM active-high", List.of(), 0);
    }

    // ---------------------------------------------------------------- high-side

    static Check highSide(Calc c, Margins m) {
        DriverPart d = c.d;
        double bus = c.op.bus();
        if (!c.op.highSide()) {
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.PASS, Score.pass(1))
                    : check(c, Rule.HIGH_SIDE, Verdict.PASS, () -> "low side: the source sits at ground, no floating output needed",
                    List.of(), Score.pass(1));
        }
        if (!d.topology().floats()) {
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.FAIL, 0)
                    : fail(c, Rule.HIGH_SIDE, () -> "a " + d.topology() + " driver cannot float on the switch node of a high-side switch"
                    + " — pick a high-side, half-bridge or isolated driver", List.of());
        }
        if (d.topology() == Topology.ISOLATED) {
            if (Double.isNaN(d.isolationVrms())) {
                return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.UNKNOWN, Score.UNKNOWN)
                        : unknown(c, Rule.HIGH_SIDE, () -> "isolated driver with unknown isolation rating — check it against the "
                        + (Double.isNaN(bus) ? "bus" : Eng.of(bus, "V") + " bus"));
            }
            if (Double.isNaN(bus)) {
                return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.UNKNOWN, Score.UNKNOWN)
                        : unknown(c, Rule.HIGH_SIDE, () -> "bus voltage not given — give --bus or bus_v to check the "
                        + Eng.of(d.isolationVrms(), "V") + " rms isolation");
            }
            List<Comparison> cmp = !c.detail ? List.of() : List.of(new Comparison("isolation rating (rms)", d.isolationVrms(), "≥",
                    bus * m.isolation(), "V"));
            if (d.isolationVrms() < bus) {
                return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.FAIL, 0)
                        : fail(c, Rule.HIGH_SIDE, () -> "isolation " + Eng.of(d.isolationVrms(), "V") + " rms is below the "
                        + Eng.of(bus, "V") + " bus — pick a driver rated ≥ " + Eng.of(bus * m.isolation(), "V"), cmp);
            }
            if (d.isolationVrms() < bus * m.isolation()) {
                return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.WARN, Score.warn((d.isolationVrms() - bus) / (bus * (m.isolation() - 1))))
                        : check(c, Rule.HIGH_SIDE, Verdict.WARN, () -> "isolation " + Eng.of(d.isolationVrms(), "V") + " rms is less than "
                        + Eng.num(m.isolation()) + "× the " + Eng.of(bus, "V") + " bus — check the working-voltage rating"
                        + " (VIORM) and creepage for your standard", cmp,
                        Score.warn((d.isolationVrms() - bus) / (bus * (m.isolation() - 1))));
            }
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.PASS, Score.pass((d.isolationVrms() / (bus * m.isolation()) - 1)))
                    : check(c, Rule.HIGH_SIDE, Verdict.PASS, () -> "isolated output, " + Eng.of(d.isolationVrms(), "V")
                    + " rms against a " + Eng.of(bus, "V") + " bus; confirm the working-voltage rating for your standard", cmp,
                    Score.pass((d.isolationVrms() / (bus * m.isolation()) - 1)));
        }
        if (Double.isNaN(d.vOffsetMax())) {
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.HIGH_SIDE, () -> "this driver's floating offset rating (v_offset_max_v) is unknown");
        }
        if (Double.isNaN(bus)) {
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.HIGH_SIDE, () -> "bus voltage not given — give --bus or bus_v to check the "
                    + Eng.of(d.vOffsetMax(), "V") + " offset rating");
        }
        double need = bus * (1 + m.offset());
        List<Comparison> cmp = !c.detail ? List.of() : List.of(new Comparison("floating offset rating", d.vOffsetMax(), "≥", need, "V"));
        if (d.vOffsetMax() < bus) {
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.FAIL, 0)
                    : fail(c, Rule.HIGH_SIDE, () -> "offset rating " + Eng.of(d.vOffsetMax(), "V") + " is below the " + Eng.of(bus, "V")
                    + " bus — pick a driver rated ≥ " + Eng.of(need, "V"), cmp);
        }
        if (d.vOffsetMax() < need) {
            return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.WARN, Score.warn((d.vOffsetMax() - bus) / (need - bus)))
                    : check(c, Rule.HIGH_SIDE, Verdict.WARN, () -> "offset rating " + Eng.of(d.vOffsetMax(), "V") + " leaves less than "
                    + Eng.pct(m.offset()) + " above the " + Eng.of(bus, "V") + " bus for switch-node overshoot — pick a driver"
                    + " rated ≥ " + Eng.of(need, "V") + " or measure the overshoot", cmp,
                    Score.warn((d.vOffsetMax() - bus) / (need - bus)));
        }
        return !c.detail ? c.quick(Rule.HIGH_SIDE, Verdict.PASS, Score.pass(d.vOffsetMax() / need - 1))
                : check(c, Rule.HIGH_SIDE, Verdict.PASS, () -> "offset rating " + Eng.of(d.vOffsetMax(), "V") + " covers the "
                + Eng.of(bus, "V") + " bus with " + Eng.pct(d.vOffsetMax() / bus - 1) + " to spare", cmp,
                Score.pass(d.vOffsetMax() / need - 1));
    }

    // ---------------------------------------------------------------- bootstrap

    static Check bootstrap(Calc c) {
        DriverPart d = c.d;
        OperatingPoint op = c.op;
        if (!op.highSide()) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.PASS, Score.pass(1))
                    : check(c, Rule.BOOTSTRAP, Verdict.PASS, () -> "low side: no bootstrap supply needed", List.of(), Score.pass(1));
        }
        if (!d.topology().floats()) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.FAIL, 0)
                    : fail(c, Rule.BOOTSTRAP, () -> "a low-side driver has no floating supply to bootstrap — pick a high-side,"
                    + " half-bridge or isolated driver", List.of());
        }
        if (!d.topology().bootstrapped()) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.PASS, Score.pass(1))
                    : check(c, Rule.BOOTSTRAP, Verdict.PASS, () -> "isolated output: it needs its own isolated supply of "
                    + Eng.of(op.swing(), "V") + " (no bootstrap, no duty limit)", List.of(), Score.pass(1));
        }
        if (Double.isNaN(c.bootDroop)) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.BOOTSTRAP, () -> "cannot size the bootstrap capacitor: gate charge or UVLO unknown");
        }
        List<Comparison> cmp = c.comparisons();
        if (c.detail) {
            cmp.add(new Comparison("allowed droop (V_drive − V_F − UVLO,off)", c.bootDroop, "≥", 0, "V"));
        }
        if (c.bootDroop <= 0) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.FAIL, 0)
                    : fail(c, Rule.BOOTSTRAP, () -> "the bootstrap supply " + Eng.of(op.vDrive() - op.diodeDrop(), "V") + " (V_drive − V_F)"
                    + " is already at or below the high side's " + Eng.of(c.bootFloor, "V") + " limit, so no capacitor helps"
                    + " — raise V_drive or pick a driver with a lower UVLO", cmp);
        }
        String sizing = c.detail ? ("C_boot ≥ " + Eng.of(c.bootCMin, "F") + " for " + Eng.of(c.bootCharge, "C") + " per cycle at "
                + Eng.of(c.bootDroop, "V") + " droop; use " + Eng.of(c.bootCRec, "F")
                + (op.bootAssumed() ? " (V_F " + Eng.of(op.diodeDrop(), "V") + ", R_boot " + Eng.of(op.rBoot(), "Ω")
                + " assumed)" : "")) : "";
        String diode = c.detail ? (Boolean.FALSE.equals(d.bootstrapDiode()) ? ", with an external fast diode rated ≥ "
                + Eng.of(Double.isNaN(op.bus()) ? Double.NaN : op.bus() * 1.2, "V") : "") : "";
        if (c.detail) {
            cmp.add(new Comparison("duty cycle", op.dutyMax(), "≤", c.bootDutyMax, "1"));
        }
        if (!Double.isNaN(op.dutyMax()) && op.dutyMax() >= 1) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.FAIL, 0)
                    : fail(c, Rule.BOOTSTRAP, () -> "100 % duty is impossible with a bootstrap supply (it recharges only while the low"
                    + " side is on) — cap the duty at " + Eng.pct(c.bootDutyMax) + " or use an isolated supply", cmp);
        }
        if (!Double.isNaN(op.dutyMax()) && op.dutyMax() > c.bootDutyMax) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.FAIL, 0)
                    : fail(c, Rule.BOOTSTRAP, () -> "duty " + Eng.pct(op.dutyMax()) + " leaves too little low-side time to recharge "
                    + Eng.of(c.bootCRec, "F") + " through " + Eng.of(op.rBoot(), "Ω") + " (allowed " + Eng.pct(c.bootDutyMax)
                    + ") — lower the duty, the frequency or the bootstrap resistance", cmp);
        }
        if (Double.isNaN(op.dutyMax())) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.UNKNOWN, Score.UNKNOWN)
                    : check(c, Rule.BOOTSTRAP, Verdict.UNKNOWN, () -> sizing + diode + "; duty not given — the bootstrap allows at most "
                    + Eng.pct(c.bootDutyMax) + " (give --duty-max or duty_max)", cmp, Score.UNKNOWN);
        }
        if (c.bootBelowFull) {
            double full = fullEnhancement(c.s);
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.WARN, Score.warn(0.5))
                    : check(c, Rule.BOOTSTRAP, Verdict.WARN, () -> "the bootstrap gives the high side at most "
                    + Eng.of(op.vDrive() - op.diodeDrop(), "V") + " (V_drive − V_F), below the " + Eng.of(full, "V")
                    + " full-enhancement level, so its conduction loss is higher than the low side's; " + sizing
                    + " against UVLO,off " + Eng.of(c.bootFloor, "V") + diode + " — raise V_drive to ≥ "
                    + Eng.of(full + op.diodeDrop(), "V") + " or use an isolated supply", cmp, Score.warn(0.5));
        }
        if (Boolean.FALSE.equals(d.bootstrapDiode()) && Double.isNaN(op.bus())) {
            return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.WARN, Score.warn(0.5))
                    : check(c, Rule.BOOTSTRAP, Verdict.WARN, () -> sizing + ", with an external fast diode rated above the bus"
                    + " (bus not given)", cmp, Score.warn(0.5));
        }
        return !c.detail ? c.quick(Rule.BOOTSTRAP, Verdict.PASS, Score.pass((c.bootDutyMax - op.dutyMax()) * 5))
                : check(c, Rule.BOOTSTRAP, Verdict.PASS, () -> sizing + diode + "; duty " + Eng.pct(op.dutyMax()) + " ≤ "
                + Eng.pct(c.bootDutyMax) + " allowed", cmp, Score.pass((c.bootDutyMax - op.dutyMax()) * 5));
    }

    // ---------------------------------------------------------------- driver-power

    static Check driverPower(Calc c, Margins m) {
        DriverPart d = c.d;
        if (Double.isNaN(c.pDriver)) {
            return !c.detail ? c.quick(Rule.DRIVER_POWER, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.DRIVER_POWER, () -> "gate charge unknown, so driver dissipation cannot be estimated");
        }
        String est = c.detail ? (Eng.of(c.pDriver, "W") + " in the driver (of " + Eng.of(c.pGate, "W") + " gate-drive power at "
                + Eng.of(c.op.fSw(), "Hz") + (c.rSrcEstimated || c.rSnkEstimated ? ", output resistance estimated as V/I_peak" : "")
                + ")") : "";
        if (Double.isNaN(d.pMax())) {
            return !c.detail ? c.quick(Rule.DRIVER_POWER, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.DRIVER_POWER, () -> est + "; the package limit (p_max_w) is unknown — check it against the datasheet");
        }
        double allowed = d.pMax() * m.driverPower();
        List<Comparison> cmp = !c.detail ? List.of() : List.of(new Comparison("driver dissipation", c.pDriver, "≤", allowed, "W"));
        if (c.pDriver > d.pMax()) {
            return !c.detail ? c.quick(Rule.DRIVER_POWER, Verdict.FAIL, 0)
                    : fail(c, Rule.DRIVER_POWER, () -> est + " exceeds its " + Eng.of(d.pMax(), "W") + " package limit — add external gate"
                    + " resistance to move loss out of the driver, lower the frequency, or add a buffer stage", cmp);
        }
        if (c.pDriver > allowed) {
            return !c.detail ? c.quick(Rule.DRIVER_POWER, Verdict.WARN, Score.warn((d.pMax() - c.pDriver) / (d.pMax() - allowed)))
                    : check(c, Rule.DRIVER_POWER, Verdict.WARN, () -> est + " uses more than " + Eng.pct(m.driverPower()) + " of its "
                    + Eng.of(d.pMax(), "W") + " limit — check the temperature rise at your ambient", cmp,
                    Score.warn((d.pMax() - c.pDriver) / (d.pMax() - allowed)));
        }
        return !c.detail ? c.quick(Rule.DRIVER_POWER, Verdict.PASS, Score.pass(allowed / Math.max(c.pDriver, 1e-12) - 1))
                : check(c, Rule.DRIVER_POWER, Verdict.PASS, () -> est + ", within " + Eng.pct(m.driverPower()) + " of its "
                + Eng.of(d.pMax(), "W") + " limit", cmp, Score.pass(allowed / Math.max(c.pDriver, 1e-12) - 1));
    }

    // ---------------------------------------------------------------- dv-dt

    static Check dvdt(Calc c, Margins m) {
        SwitchPart s = c.s;
        if (Double.isNaN(s.cRss()) || Double.isNaN(s.vThMin())) {
            return !c.detail ? c.quick(Rule.DV_DT, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.DV_DT, () -> "C_rss or V_th,min of the switch unknown, so Miller-induced turn-on cannot be judged");
        }
        if (Double.isNaN(c.slew)) {
            return !c.detail ? c.quick(Rule.DV_DT, Verdict.UNKNOWN, Score.UNKNOWN)
                    : unknown(c, Rule.DV_DT, () -> "switch-node dv/dt unknown (give --bus, or --dvdt, and the switch's Q_gd and plateau)");
        }
        double limit = s.vThMin() * m.dvdt();
        double seen = c.vInduced + c.op.vDriveNeg();
        List<Comparison> cmp = !c.detail ? List.of() : List.of(new Comparison("induced gate voltage + off level", seen, "≤", limit, "V"));
        boolean clamp = Boolean.TRUE.equals(c.d.millerClamp());
        String what = c.detail ? ("at " + Eng.of(c.slew * 1e-9, "V") + "/ns the Miller current lifts the off gate to " + Eng.of(seen, "V")
                + " (through " + Eng.of(c.rOffPath, "Ω") + ") against V_th,min " + Eng.of(s.vThMin(), "V")) : "";
        if (seen >= s.vThMin()) {
            if (clamp) {
                return !c.detail ? c.quick(Rule.DV_DT, Verdict.WARN, Score.warn(0.3))
                        : check(c, Rule.DV_DT, Verdict.WARN, () -> what + "; this driver's Miller clamp should hold it — verify on the bench",
                        cmp, Score.warn(0.3));
            }
            return !c.detail ? c.quick(Rule.DV_DT, Verdict.FAIL, 0)
                    : fail(c, Rule.DV_DT, () -> what + ", so it may turn on falsely — lower R_g,off, add a negative off level or use a driver"
                    + " with a Miller clamp (allowed " + Eng.of(c.dvdtAllowed * 1e-9, "V") + "/ns as is)", cmp);
        }
        if (seen > limit) {
            return !c.detail ? c.quick(Rule.DV_DT, Verdict.WARN, Score.warn((s.vThMin() - seen) / (s.vThMin() - limit)))
                    : check(c, Rule.DV_DT, Verdict.WARN, () -> what + ", less than " + Eng.pct(1 - m.dvdt()) + " below it — lower R_g,off"
                    + " or add negative bias" + (clamp ? " (the Miller clamp helps)" : ""), cmp,
                    Score.warn((s.vThMin() - seen) / (s.vThMin() - limit)));
        }
        return !c.detail ? c.quick(Rule.DV_DT, Verdict.PASS, Score.pass((limit - seen) / limit))
                : check(c, Rule.DV_DT, Verdict.PASS, () -> what + ", well below it", cmp, Score.pass((limit - seen) / limit));
    }

    // ---------------------------------------------------------------- lifecycle

    /** Lifecycle and stock of both parts, worded (ranking uses {@link #quickLifecycle}). */
    static Check lifecycle(DriverPart d, SwitchPart s) {
        Verdict v = lifecycleVerdict(d.lifecycle(), d.stock()).and(lifecycleVerdict(s.lifecycle(), s.stock()));
        List<String> notes = new ArrayList<>();
        for (String[] p : new String[][] {{d.partNumber(), d.lifecycle(), Long.toString(d.stock())},
            {s.partNumber(), s.lifecycle(), Long.toString(s.stock())}}) {
            String what = switch (p[1]) {
                case "active" -> null;
                case "nrnd" -> p[0] + " is not recommended for new designs";
                case "ltb" -> p[0] + " is at last-time buy";
                case "preview" -> p[0] + " is not yet in production";
                case "obsolete" -> p[0] + " is obsolete";
                default -> p[0] + " has no lifecycle status";
            };
            if (what != null) {
                notes.add(what);
            }
            if (p[2].equals("0")) {
                notes.add(p[0] + " is out of stock");
            }
        }
        if (notes.isEmpty()) {
            return new Check(Rule.LIFECYCLE, Verdict.PASS, "both parts are active" + (d.stock() > 0 && s.stock() > 0
                    ? " and in stock" : ""), List.of(), 1);
        }
        String fix = v == Verdict.FAIL ? " — find a replacement ('gatefit replace')"
                : " — check availability or plan a second source";
        return new Check(Rule.LIFECYCLE, v, String.join("; ", notes) + fix, List.of(), lifecycleScore(true, v));
    }

    /** The lifecycle rule while ranking: verdict and sub-score only. */
    private static Check quickLifecycle(Calc c) {
        Life d = c.life;
        Life s = c.p.switchLife;
        Verdict v = d.verdict().and(s.verdict());
        return c.quick(Rule.LIFECYCLE, v, lifecycleScore(d.noted() || s.noted(), v));
    }

    /** Sub-score of the lifecycle rule: 1 with nothing to note on either part, else by the verdict. */
    private static double lifecycleScore(boolean noted, Verdict v) {
        return !noted ? 1 : v == Verdict.FAIL ? 0 : v == Verdict.WARN ? 0.5 : 0.4;
    }

    /**
     * One part's lifecycle and stock as the lifecycle rule ({@link #lifecycleVerdict}) and the score
     * ({@link Score#availability}) read them: worked out once per switch and once per distinct
     * lifecycle text while ranking, rather than matching the text three times per driver.
     *
     * @param noted anything for the lifecycle check to note (not active, or out of stock)
     */
    record Life(String lifecycle, boolean outOfStock, Verdict verdict, double availability, boolean noted) {
        static Life of(String lifecycle, long stock) {
            return new Life(lifecycle, stock == 0, lifecycleVerdict(lifecycle, stock), Score.availability(lifecycle, stock),
                    !lifecycle.equals("active") || stock == 0);
        }

        /** Whether this holds for a part with this lifecycle text (the same object, as a catalog's columns share) and stock. */
        boolean isFor(String lifecycle, long stock) {
            return this.lifecycle == lifecycle && outOfStock == (stock == 0);
        }
    }

    /** Verdict of one part's lifecycle and stock (the same table as the sentences of {@link #lifecycle}). */
    private static Verdict lifecycleVerdict(String lifecycle, long stock) {
        Verdict pv = switch (lifecycle) {
            case "active" -> Verdict.PASS;
            case "nrnd", "ltb", "preview" -> Verdict.WARN;
            case "obsolete" -> Verdict.FAIL;
            default -> Verdict.UNKNOWN;
        };
        return stock == 0 ? pv.and(Verdict.WARN) : pv;
    }

    // ---------------------------------------------------------------- helpers

    private static Check unknown(Rule r, String msg) {
        return new Check(r, Verdict.UNKNOWN, msg, List.of(), Score.UNKNOWN);
    }

    /**
     * A check whose sentence and comparisons are built only when the pair is shown: ranking a
     * large catalog evaluates every verdict and score but words only the pairs it lists.
     */
    private static Check check(Calc c, Rule r, Verdict v, Supplier<String> msg, List<Comparison> cmp, double score) {
        return new Check(r, v, c.detail ? msg.get() : "", c.detail ? cmp : List.of(), score);
    }

    private static Check fail(Calc c, Rule r, Supplier<String> msg, List<Comparison> cmp) {
        return !c.detail ? c.quick(r, Verdict.FAIL, 0)
                : check(c, r, Verdict.FAIL, msg, cmp, 0);
    }

    private static Check unknown(Calc c, Rule r, Supplier<String> msg) {
        return !c.detail ? c.quick(r, Verdict.UNKNOWN, Score.UNKNOWN)
                : check(c, r, Verdict.UNKNOWN, msg, List.of(), Score.UNKNOWN);
    }

    private static double nz(double v) {
        return Double.isNaN(v) ? 0 : v;
    }

    /**
     * The switch-side figures of a question — gate charge over the actual swing, the current the
     * edge needs — which every driver shares: {@link #prepare} computes them once per shortlist.
     */
    public static final class Prepared {
        final SwitchPart s;
        final OperatingPoint op;
        final Margins m;
        final int n;
        final double rInt;
        final double qSwing;
        final boolean qEstimated;
        final double qTotal;
        final double iReq;
        /** Whether the switch has a Miller plateau between the off and on levels (turn-on and turn-off times). */
        final boolean plateau;

        private Prepared(SwitchPart s, OperatingPoint op, Margins m) {
            this.s = java.util.Objects.requireNonNull(s, "switch");
            this.op = java.util.Objects.requireNonNull(op, "operating point");
            this.m = java.util.Objects.requireNonNull(m, "margins");
            this.n = op.parallel();
            this.rInt = s.rGIntOrZero();
            double qs;
            boolean est;
            try {
                // q_g_vgs_v is the swing Q_g is specified over. When it equals the switch's recommended
                // bipolar swing (e.g. −5 V to +18 V for SiC), the datasheet curve starts at the negative
                // level: extrapolate from the recommended on level and take the negative part's charge,
                // C_iss·|V_off,spec|, back out (REFERENCES.md §1 gate-charge curve; an estimate).
                double vSpec = s.qGVgs();
                double specNegCharge = 0;
                if (!Double.isNaN(s.vGateOff()) && s.vGateOff() < 0 && !Double.isNaN(s.vGateOn())
                        && Math.abs(s.qGVgs() - (s.vGateOn() - s.vGateOff())) < 0.5) {
                    vSpec = s.vGateOn();
                    double cEq = !Double.isNaN(s.cIss()) ? s.cIss()
                            : !Double.isNaN(s.qGs()) && !Double.isNaN(s.vPlateau()) ? s.qGs() / s.vPlateau() : 0;
                    specNegCharge = cEq * -s.vGateOff();
                }
                Optional<GateCharge.Estimate> q = GateCharge.atSwing(s.qG() - specNegCharge, s.qGs(), s.qGd(), vSpec,
                        s.vPlateau(), s.cIss(), op.vDrive(), op.vDriveNeg());
                if (q.isPresent()) {
                    qs = q.get().coulombs();
                    est = q.get().estimated() || specNegCharge > 0;
                } else {
                    qs = s.qG();
                    est = true;
                }
            } catch (IllegalArgumentException e) {
                qs = s.qG();
                est = true;
            }
            this.qSwing = qs;
            this.qEstimated = est;
            this.qTotal = n * qs;
            this.iReq = Double.isNaN(qTotal) ? Double.NaN : DriveCurrent.required(qTotal, op.edge());
            this.plateau = !Double.isNaN(s.qGd()) && !Double.isNaN(s.vPlateau()) && s.qGd() > 0
                    && op.vDrive() > s.vPlateau() && s.vPlateau() > op.vDriveNeg();
            this.switchLife = Life.of(s.lifecycle(), s.stock());
        }

        /** The switch's lifecycle and stock as the lifecycle rule and the score read them, once per question. */
        final Life switchLife;

        /** The switch asked about. */
        public SwitchPart switchPart() {
            return s;
        }

        /** The operating point after defaults. */
        public OperatingPoint point() {
            return op;
        }

        /** The margins applied. */
        public Margins margins() {
            return m;
        }

        /** Total gate charge over the swing (all switches in parallel), C; NaN when Q_g is unknown. */
        public double gateCharge() {
            return qTotal;
        }

        /** Gate current the target edge needs (before the drive-current margin), A; NaN when Q_g is unknown. */
        public double currentRequired() {
            return iReq;
        }
    }

    /** The pair's figures, computed once and shared by the rules. */
    static final class Calc {
        /** Whether checks get their sentences and comparisons (false while ranking). */
        final boolean detail;

        /** Verdict and sub-score of the last rule run while ranking (see {@link #quick(Rule, Verdict, double)}). */
        Verdict lastVerdict;
        double lastScore;

        /**
         * While ranking, a rule's outcome without a check object (nothing allocated per rule): the
         * verdict and sub-score are kept here and the shared {@link #QUICK} marker returned.
         */
        Check quick(Rule r, Verdict v, double score) {
            if (!(score >= 0 && score <= 1)) {
                throw new IllegalArgumentException("expected a score in [0,1] for " + r.id() + ", got " + score);
            }
            lastVerdict = v;
            lastScore = score;
            return QUICK;
        }

        /** A list for a check's comparisons (filled only when {@link #detail}); while ranking, an empty one. */
        List<Comparison> comparisons() {
            return detail ? new ArrayList<>() : List.of();
        }
        DriverPart d;
        final Prepared p;
        final SwitchPart s;
        final OperatingPoint op;
        final int n;
        final double rInt;
        double qSwing = Double.NaN;
        boolean qEstimated;
        double qTotal = Double.NaN;
        double rSrc;
        double rSnk;
        boolean rSrcEstimated;
        boolean rSnkEstimated;
        double rOnTot;
        double rOffTot;
        double iReq = Double.NaN;
        double iPkSrc;
        double iPkSnk;
        double delayOn = Double.NaN;
        double delayOff = Double.NaN;
        double plateauOn = Double.NaN;
        double plateauOff = Double.NaN;
        double pGate = Double.NaN;
        double pDriver = Double.NaN;
        double pExternal = Double.NaN;
        double pInternal = Double.NaN;
        double rCrit = Double.NaN;
        double zeta = Double.NaN;
        double rgMin = Double.NaN;
        double rgMax = Double.NaN;
        double rgRecommended = Double.NaN;
        double bootCharge = Double.NaN;
        double bootDroop = Double.NaN;
        double bootFloor = Double.NaN;
        boolean bootBelowFull;
        double bootCMin = Double.NaN;
        double bootCRec = Double.NaN;
        double bootDutyMax = Double.NaN;
        double bootInrush = Double.NaN;
        double nmHigh = Double.NaN;
        double nmLow = Double.NaN;
        double slew = Double.NaN;
        double rOffPath;
        double vInduced = Double.NaN;
        double dvdtAllowed = Double.NaN;

        /**
         * Drivers' lifecycles and stock states seen so far (see {@link Life#isFor}): a catalog has a
         * handful of lifecycle texts, shared by its drivers, so nearly every driver finds its own here.
         */
        private final Life[] lastLives = new Life[16];
        private int lastLivesNext;
        /** The driver's lifecycle and stock as the lifecycle rule and the score read them. */
        Life life;

        private Life driverLife() {
            String lc = d.lifecycle();
            long stock = d.stock();
            for (Life l : lastLives) {
                if (l == null) {
                    break;
                }
                if (l.isFor(lc, stock)) {
                    return l;
                }
            }
            Life l = Life.of(lc, stock);
            lastLives[lastLivesNext] = l;
            lastLivesNext = (lastLivesNext + 1) % lastLives.length;
            return l;
        }

        /** Every per-driver figure back to its starting value (NaN: not computed), before the next driver. */
        private void reset() {
            qSwing = Double.NaN;
            qEstimated = false;
            qTotal = Double.NaN;
            rSrc = 0;
            rSnk = 0;
            rSrcEstimated = false;
            rSnkEstimated = false;
            rOnTot = 0;
            rOffTot = 0;
            iReq = Double.NaN;
            iPkSrc = 0;
            iPkSnk = 0;
            delayOn = Double.NaN;
            delayOff = Double.NaN;
            plateauOn = Double.NaN;
            plateauOff = Double.NaN;
            pGate = Double.NaN;
            pDriver = Double.NaN;
            pExternal = Double.NaN;
            pInternal = Double.NaN;
            rCrit = Double.NaN;
            zeta = Double.NaN;
            rgMin = Double.NaN;
            rgMax = Double.NaN;
            rgRecommended = Double.NaN;
            bootCharge = Double.NaN;
            bootDroop = Double.NaN;
            bootFloor = Double.NaN;
            bootBelowFull = false;
            bootCMin = Double.NaN;
            bootCRec = Double.NaN;
            bootDutyMax = Double.NaN;
            bootInrush = Double.NaN;
            nmHigh = Double.NaN;
            nmLow = Double.NaN;
            slew = Double.NaN;
            rOffPath = 0;
            vInduced = Double.NaN;
            dvdtAllowed = Double.NaN;
        }

        Calc(DriverPart d, Prepared p, boolean detail) {
            this(p, detail);
            load(d);
        }

        /** A calculation for one question, to {@link #load} driver after driver (ranking reuses one per thread). */
        Calc(Prepared p, boolean detail) {
            this.detail = detail;
            this.p = p;
            this.s = p.s;
            this.op = p.op;
            this.n = p.n;
            this.rInt = p.rInt;
        }

        /** Computes every figure of the pair with driver {@code d}. */
        Calc load(DriverPart d) {
            reset();
            this.d = d;
            life = driverLife();
            OperatingPoint op = p.op;
            double swing = op.swing();
            qSwing = p.qSwing;
            qEstimated = p.qEstimated;
            qTotal = p.qTotal;
            rSrc = DriveCurrent.outputOhms(d.rSource(), swing, d.iSource());
            rSnk = DriveCurrent.outputOhms(d.rSink(), swing, d.iSink());
            rSrcEstimated = Double.isNaN(d.rSource());
            rSnkEstimated = Double.isNaN(d.rSink());
            rOnTot = rSrc + (op.rG() + rInt) / n;
            rOffTot = rSnk + (op.rGOff() + rInt) / n;
            // Q_g is a required column, but a part built elsewhere may lack it: every figure that
            // needs it stays unknown (NaN) and the rules that use them say unknown.
            boolean qKnown = !Double.isNaN(qTotal);
            iReq = p.iReq;
            iPkSrc = rOnTot > 0 ? Math.min(d.iSource(), swing / rOnTot) : d.iSource();
            iPkSnk = rOffTot > 0 ? Math.min(d.iSink(), swing / rOffTot) : d.iSink();
            if (p.plateau && rOnTot > 0 && rOffTot > 0) {
                plateauOn = SwitchingTimes.plateauOn(n * s.qGd(), rOnTot, op.vDrive(), s.vPlateau());
                plateauOff = SwitchingTimes.plateauOff(n * s.qGd(), rOffTot, s.vPlateau(), op.vDriveNeg());
                // Delay times are figures only (no rule reads them): skipped while ranking.
                if (detail && !Double.isNaN(s.cIss())) {
                    delayOn = SwitchingTimes.delayOn(rOnTot, n * s.cIss(), op.vDrive(), s.vPlateau(), op.vDriveNeg());
                    delayOff = SwitchingTimes.delayOff(rOffTot, n * s.cIss(), op.vDrive(), s.vPlateau(), op.vDriveNeg());
                }
            }
            if (qKnown && rOnTot > 0 && rOffTot > 0) {
                double hs = op.highSide() && d.topology().bootstrapped() && !Double.isNaN(d.iQbs())
                        ? GatePower.highSideQuiescent(op.vDrive(), d.iQbs()) : 0;
                if (detail) {
                    pGate = GatePower.total(qTotal, swing, op.fSw());
                    GatePower.Split split = GatePower.split(qTotal, swing, op.fSw(), rSrc, rSnk, op.rG() / n,
                            op.rGOff() / n, rInt / n);
                    pDriver = split.driver() + hs;
                    pExternal = split.external();
                    pInternal = split.internal();
                } else {
                    // Only the driver's share is ruled on (driver-power); the others are figures.
                    pDriver = GatePower.driverShare(qTotal, swing, op.fSw(), rSrc, rSnk, op.rG() / n, op.rGOff() / n,
                            rInt / n) + hs;
                }
            }
            // The gate-loop figures and the recommended resistor are shown, never ruled on: skipped while ranking.
            if (detail && !Double.isNaN(s.cIss()) && s.cIss() > 0) {
                double cg = n * s.cIss();
                rCrit = GateLoop.criticalResistance(op.loop(), cg);
                zeta = GateLoop.dampingRatio(rOnTot, op.loop(), cg);
                // Per-switch external resistor range: damping target at the low end, the drive-current edge at the high end.
                double fixed = rSrc + rInt / n;
                rgMin = Math.max(0, n * (DAMPING_TARGET * rCrit - fixed));
                rgMax = n * (swing * op.edge() / (Margins.DEFAULT.driveCurrent() * qTotal) - fixed);
                if (rgMax >= rgMin && rgMax > 0) {
                    // Aim at half the edge-limited maximum (margin on the edge, damping to spare; common
                    // practice, no source), but never below the damping minimum.
                    double aim = Math.max(rgMin, rgMax / 2);
                    double pick = ESeries.E24.roundNearest(aim);
                    if (pick < rgMin) {
                        pick = ESeries.E24.roundUp(rgMin);
                    }
                    if (pick > rgMax) {
                        pick = ESeries.E24.roundDown(rgMax);
                    }
                    rgRecommended = pick >= rgMin && pick <= rgMax ? pick : Double.NaN;
                }
            }
            if (op.highSide() && d.topology().bootstrapped()) {
                double uv = Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
                double full = fullEnhancement(s);
                bootFloor = Math.max(Double.isNaN(uv) ? 0 : uv, Double.isNaN(full) ? 0 : full);
                if (!Double.isNaN(uv) && !Double.isNaN(full) && op.vDrive() - op.diodeDrop() <= full) {
                    // The bootstrap never reaches full enhancement, whatever the capacitor: size it to the
                    // UVLO as REFERENCES §4 does (ΔV ≤ V_DD − V_F − V_UVLO,off) and let the rule warn.
                    bootFloor = uv;
                    bootBelowFull = true;
                }
                if (qKnown && (!Double.isNaN(uv) || !Double.isNaN(full))) {
                    double tOn = (Double.isNaN(op.dutyMax()) ? 1 : op.dutyMax()) / op.fSw();
                    bootCharge = Bootstrap.chargePerCycle(qTotal, Double.isNaN(d.iQbs()) ? 0 : d.iQbs(), tOn, 0, 0);
                    bootDroop = op.vDrive() - op.diodeDrop() - bootFloor;
                    if (bootDroop > 0) {
                        bootCMin = Bootstrap.minCapacitance(bootCharge, bootDroop);
                        bootCRec = Bootstrap.recommended(bootCMin);
                        bootDutyMax = Bootstrap.maxDuty(Bootstrap.refreshTime(op.rBoot(), bootCRec,
                                Bootstrap.REFRESH_TIME_CONSTANTS), op.fSw());
                        if (detail && op.rBoot() > 0) {
                            bootInrush = Bootstrap.inrush(op.vDrive(), op.diodeDrop(), op.rBoot());
                        }
                    }
                }
            }
            if (!Double.isNaN(d.vIh())) {
                nmHigh = op.vOh() - d.vIh();
            }
            if (!Double.isNaN(d.vIl())) {
                nmLow = d.vIl() - op.vOl();
            }
            rOffPath = rSnk * n + op.rGOff() + rInt;
            if (!Double.isNaN(op.dvdt())) {
                slew = op.dvdt();
            } else if (!Double.isNaN(op.bus()) && op.bus() > 0 && !Double.isNaN(plateauOn) && plateauOn > 0) {
                slew = op.bus() / plateauOn;
            }
            if (!Double.isNaN(slew) && !Double.isNaN(s.cRss()) && !Double.isNaN(s.cIss()) && slew > 0) {
                double step = Double.isNaN(op.bus()) ? slew * 1e-6 : op.bus();
                vInduced = rOffPath > 0 ? DvDt.induced(s.cRss(), slew, rOffPath, s.cIss(), step) : 0;
                if (detail && !Double.isNaN(s.vThMin()) && s.vThMin() > 0 && rOffPath > 0 && step > 0) {
                    dvdtAllowed = DvDt.allowedRcLimited(s.cRss(), rOffPath, s.cIss(), step, s.vThMin(), op.vDriveNeg());
                }
            } else if (!Double.isNaN(slew) && !Double.isNaN(s.cRss())) {
                vInduced = DvDt.inducedBound(s.cRss(), slew, rOffPath);
            }
            return this;
        }

        List<Figure> figures() {
            List<Figure> f = new ArrayList<>();
            add(f, "gate-charge-at-swing", qSwing, "C", "Q_g over the actual swing, per switch", qEstimated);
            add(f, "gate-current-required", iReq, "A", "Q_g / target edge", qEstimated);
            add(f, "gate-current-peak-source", iPkSrc, "A", "lower of rated peak and V / (R_source + R_g + R_g,int)", rSrcEstimated);
            add(f, "gate-current-peak-sink", iPkSnk, "A", "lower of rated peak and V / (R_sink + R_g,off + R_g,int)", rSnkEstimated);
            add(f, "driver-resistance-source", rSrc, "Ω", rSrcEstimated ? "estimated as V / I_source,peak" : "from the catalog", rSrcEstimated);
            add(f, "driver-resistance-sink", rSnk, "Ω", rSnkEstimated ? "estimated as V / I_sink,peak" : "from the catalog", rSnkEstimated);
            add(f, "delay-time-on", delayOn, "s", "R·C_iss·ln(V_drive / (V_drive − V_pl))", false);
            add(f, "plateau-time-on", plateauOn, "s", "Q_gd·R_on,total / (V_drive − V_plateau)", false);
            add(f, "delay-time-off", delayOff, "s", "R·C_iss·ln((V_drive − V_off) / (V_pl − V_off))", false);
            add(f, "plateau-time-off", plateauOff, "s", "Q_gd·R_off,total / (V_plateau − V_drive,neg)", false);
            add(f, "gate-drive-power", pGate, "W", "Q_g·ΔV·f", qEstimated);
            add(f, "driver-power", pDriver, "W", "share of gate power in the driver, plus high-side quiescent", qEstimated);
            add(f, "gate-resistor-power", pExternal, "W", "share of gate power in the external resistors", qEstimated);
            add(f, "gate-internal-power", pInternal, "W", "share of gate power in the internal gate resistance", qEstimated);
            add(f, "gate-resistance-critical", rCrit, "Ω", "2·√(L/C) of the gate loop", false);
            add(f, "gate-loop-damping", zeta, "1", "ζ = (R/2)·√(C/L) with the chosen resistor", false);
            add(f, "gate-resistor-min", rgMin, "Ω", "per switch, for damping ζ ≥ " + DAMPING_TARGET, false);
            add(f, "gate-resistor-max", rgMax, "Ω", "per switch, for the target edge with the drive-current margin", false);
            add(f, "gate-resistor-recommended", rgRecommended, "Ω", "IEC 60063 E24 value in the range", false);
            add(f, "bootstrap-charge", bootCharge, "C", "Q_g + I_qbs·t_on,max per cycle", qEstimated);
            add(f, "bootstrap-capacitance-min", bootCMin, "F", "Q / allowed droop", qEstimated);
            add(f, "bootstrap-capacitance-recommended", bootCRec, "F", Eng.num(Bootstrap.RECOMMENDED_FACTOR)
                    + "× the minimum, E12 (common practice)", qEstimated);
            add(f, "bootstrap-duty-max", bootDutyMax, "1", "1 − 3·R_boot·C_boot·f", false);
            add(f, "bootstrap-inrush", bootInrush, "A", "(V_drive − V_F) / R_boot at first charge", false);
            add(f, "noise-margin-high", nmHigh, "V", "V_OH − V_IH", false);
            add(f, "noise-margin-low", nmLow, "V", "V_IL − V_OL", false);
            add(f, "dv-dt", slew, "V/s", Double.isNaN(op.dvdt()) ? "bus / plateau-time-on" : "as given", Double.isNaN(op.dvdt()));
            add(f, "miller-induced-voltage", vInduced, "V", "C_gd·dv/dt·R_off·(1 − e^(−T/(R·C_iss)))", Double.isNaN(op.dvdt()));
            add(f, "dv-dt-allowed", dvdtAllowed, "V/s", "slew at which the induced voltage reaches V_th,min", false);
            return f;
        }

        /**
         * Adds a figure when it is a number: NaN (unknown) and ±∞ (unbounded, e.g. the allowed dv/dt
         * when even a step cannot lift the gate to V_th,min) are left out, so every figure's value
         * is a finite number (JSON has no infinity).
         */
        private static void add(List<Figure> f, String name, double v, String unit, String label, boolean est) {
            if (Double.isFinite(v)) {
                f.add(new Figure(name, v, unit, label, est));
            }
        }
    }
}
