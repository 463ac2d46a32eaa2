package org.gatefit.match;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.gatefit.catalog.Row;
import org.gatefit.match.Check.Comparison;
import org.gatefit.match.StageCheck.StageResult;

/**
 * {@code check} across the stages that share one driver package (one BOM designator): the package
 * dissipation, every stage on it added up ({@code driver-power}, replacing each stage's own channel
 * figure), and the {@code design} rule — no more stages than the part has channels, no high and
 * low stage on a single-channel part that is not a half-bridge driver, and the two stages of a
 * half-bridge at the same bus and frequency. A stage whose driver cell is a part number rather
 * than a designator stands for its own package (without a BOM several stages may name the same part
 * without sharing a package), so it gets neither.
 */
final class PackageCheck {
    /** Relative difference above which two stages of one half-bridge disagree on bus or frequency (rounding aside). */
    static final double SAME_POINT = 0.01;

    private PackageCheck() {
    }

    static List<StageResult> apply(List<StageResult> results, Function<String, Optional<Row>> drivers,
                                   Function<String, Optional<Row>> switches, Margins m) {
        Map<String, List<Integer>> byPackage = new LinkedHashMap<>();
        for (int i = 0; i < results.size(); i++) {
            StageResult r = results.get(i);
            if (r.point() != null && !r.driverRef().equalsIgnoreCase(r.driver())) {
                byPackage.computeIfAbsent(r.driverRef().toUpperCase(Locale.ROOT), k -> new ArrayList<>()).add(i);
            }
        }
        List<StageResult> out = new ArrayList<>(results);
        for (List<Integer> group : byPackage.values()) {
            List<StageResult> stages = new ArrayList<>();
            for (int i : group) {
                stages.add(results.get(i));
            }
            DriverPart d = DriverPart.of(drivers.apply(stages.get(0).driver()).orElseThrow());
            Check design = design(stages, d);
            Check power = stages.size() > 1 ? power(stages, d, m) : null;
            for (int i : group) {
                StageResult r = results.get(i);
                List<Check> checks = new ArrayList<>();
                for (Check c : r.checks()) {
                    checks.add(power != null && c.rule() == Rule.DRIVER_POWER ? power : c);
                }
                checks.add(design);
                SwitchPart s = SwitchPart.of(switches.apply(r.switchPart()).orElseThrow());
                out.set(i, rescored(r, checks, d, s));
            }
        }
        return out;
    }

    /** The stage with these checks: verdict and score as {@code Rules.evaluate} forms them. */
    static StageResult rescored(StageResult r, List<Check> checks, DriverPart d, SwitchPart s) {
        Verdict v = Verdict.PASS;
        double sum = 0;
        int w = 0;
        for (Check c : checks) {
            v = v.and(c.verdict());
            sum += c.rule().weight() * c.score();
            w += c.rule().weight();
        }
        v = v.forPair();
        double score = Score.combine(sum, w, d.lifecycle().availability(d.stock()),
                s.lifecycle().availability(s.stock()), r.point() == null ? 1 : Score.supplyCost(r.point(), d), v);
        return new StageResult(r.stage(), r.line(), r.driverRef(), r.driver(), r.switchRef(), r.switchPart(), v, score,
                checks, r.figures(), r.point(), r.notes());
    }

    private static double figure(StageResult r, String name) {
        return r.figure(name).map(Figure::value).orElse(Double.NaN);
    }

    /** The package's dissipation: every stage's channel added up, against the derated package limit. */
    static Check power(List<StageResult> stages, DriverPart d, Margins m) {
        double sum = 0;
        StringBuilder parts = new StringBuilder();
        for (StageResult r : stages) {
            double p = figure(r, "driver-power");
            sum += p;
            parts.append(parts.length() == 0 ? "" : " + ").append(r.stage()).append(' ').append(Eng.of(p, "W"));
        }
        String pkg = stages.get(0).driverRef() + " (" + d.partNumber() + ", " + stages.size() + " channels used): "
                + parts + " = " + Eng.of(sum, "W");
        double pMax = d.pMax();
        double allowed = pMax * m.driverPower();
        List<Comparison> cmp = List.of(new Comparison("package dissipation", sum, "≤", allowed, "W"));
        if (Double.isNaN(sum)) {
            return new Check(Rule.DRIVER_POWER, Verdict.UNKNOWN, "package " + pkg + ": a channel's dissipation is unknown"
                    + " (gate charge unknown), so the package's cannot be added up", List.of(), Score.UNKNOWN);
        }
        if (Double.isNaN(pMax)) {
            return new Check(Rule.DRIVER_POWER, Verdict.UNKNOWN, "package " + pkg + "; the package limit (p_max_w) is"
                    + " unknown — check it against the datasheet", List.of(), Score.UNKNOWN);
        }
        if (sum > pMax) {
            return new Check(Rule.DRIVER_POWER, Verdict.FAIL, "package " + pkg + " exceeds its " + Eng.of(pMax, "W")
                    + " limit — add external gate resistance to move loss out of the driver, lower the frequency, or"
                    + " spread the stages over more packages", cmp, 0);
        }
        if (sum > allowed) {
            return new Check(Rule.DRIVER_POWER, Verdict.WARN, "package " + pkg + " uses more than "
                    + Eng.pct(m.driverPower()) + " of its " + Eng.of(pMax, "W") + " limit — check the temperature rise"
                    + " at your ambient", cmp, Score.warn((pMax - sum) / (pMax - allowed)));
        }
        return new Check(Rule.DRIVER_POWER, Verdict.PASS, "package " + pkg + ", within " + Eng.pct(m.driverPower())
                + " of its " + Eng.of(pMax, "W") + " limit", cmp, Score.pass(allowed / Math.max(sum, 1e-12) - 1));
    }

    /** The {@code design} rule for the stages on one designator. */
    static Check design(List<StageResult> stages, DriverPart d) {
        String ref = stages.get(0).driverRef() + " (" + d.partNumber() + ")";
        StageResult high = null;
        StageResult low = null;
        StringBuilder names = new StringBuilder();
        for (StageResult r : stages) {
            names.append(names.length() == 0 ? "" : ", ").append(r.stage()).append(r.point().highSide() ? " high" : " low");
            if (r.point().highSide() && high == null) {
                high = r;
            } else if (!r.point().highSide() && low == null) {
                low = r;
            }
        }
        int ch = d.channels();
        if (ch > 0 && stages.size() > ch) {
            return new Check(Rule.DESIGN, Verdict.FAIL, ref + " has " + ch + (ch == 1 ? " channel" : " channels")
                    + " but drives " + stages.size() + " stages (" + names + ") — give each stage its own channel:"
                    + " another designator, or a part with more channels", List.of(new Comparison("stages on the package",
                    stages.size(), "≤", ch, "1")), 0);
        }
        if (high != null && low != null && d.topology() != Topology.HALF_BRIDGE && (ch == 1 || ch == 0)) {
            return new Check(Rule.DESIGN, Verdict.FAIL, ref + " is a single-channel " + d.topology() + " driver but drives"
                    + " a high and a low stage (" + names + ") — a half-bridge needs a half-bridge driver or one driver"
                    + " per switch", List.of(), 0);
        }
        if (high != null && low != null) {
            double busH = high.point().bus();
            double busL = low.point().bus();
            double fH = high.point().fSw();
            double fL = low.point().fSw();
            boolean busOff = !Double.isNaN(busH) && !Double.isNaN(busL) && differ(busH, busL)
                    || Double.isNaN(busH) != Double.isNaN(busL);
            if (busOff || differ(fH, fL)) {
                return new Check(Rule.DESIGN, Verdict.FAIL, ref + " drives the half-bridge " + high.stage() + " / "
                        + low.stage() + ", but the stage sheet gives them different operating points (bus "
                        + Eng.of(busH, "V") + " / " + Eng.of(busL, "V") + ", " + Eng.of(fH, "Hz") + " / " + Eng.of(fL, "Hz")
                        + ") — the two switches of a leg share one bus and one frequency: correct the sheet, the checks of"
                        + " one of them used the wrong point", List.of(new Comparison("bus, high vs low", busH, "=", busL,
                        "V"), new Comparison("frequency, high vs low", fH, "=", fL, "Hz")), 0);
            }
        }
        return new Check(Rule.DESIGN, Verdict.PASS, ref + " drives " + (stages.size() == 1 ? "one stage (" + names + ")"
                : stages.size() + " stages (" + names + ")") + (ch > 0 ? " on its " + ch + (ch == 1 ? " channel" : " channels")
                : "") + (high != null && low != null ? ", one leg at one bus and frequency" : ""), List.of(), 1);
    }

    private static boolean differ(double a, double b) {
        return Math.abs(a - b) > SAME_POINT * Math.max(Math.abs(a), Math.abs(b));
    }
}
