package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code protection}: an IGBT or SiC stage on a bus above the protection-bus margin (default 100 V;
 * common practice, no source) is expected to have its driver detect desaturation (or over-current)
 * and to catch a short circuit within the switch's withstand time (REFERENCES.md §9: withstand times
 * of a few µs at a stated gate voltage; desaturation detection with soft turn-off is the usual
 * protection). A driver without detection warns; a detection time not shorter than the withstand
 * time warns; missing columns ({@code desat}, {@code t_desat_ns}, {@code t_sc_us}) say unknown.
 * Limits: the withstand time is the datasheet's at its own gate voltage and bus (a higher gate drive
 * shortens it: see {@code gate-voltage}), and the detection time excludes the blanking a designer sets.
 */
final class ProtectionRule extends PairRule {
    enum Why implements Reason { NOT_EXPECTED, LOW_BUS, NO_BUS, NO_DATA, NONE, NO_TIMES, TOO_SLOW, PROTECTED;

        @Override
        public String asks() {
            return this == NO_BUS ? "bus" : null;
        }
    }

    private static boolean expected(SwitchPart s) {
        return s.technology() == Technology.IGBT || s.technology() == Technology.SIC_MOSFET;
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        SwitchPart s = f.s();
        DriverRatings r = f.d().ratings();
        double bus = f.op().bus();
        if (!expected(s)) {
            out.pass(Why.NOT_EXPECTED, 1);
        } else if (Double.isNaN(bus)) {
            out.unknown(Why.NO_BUS);
        } else if (bus <= f.m().protectionBus()) {
            out.pass(Why.LOW_BUS, 1);
        } else if (r.desat() == null) {
            out.unknown(Why.NO_DATA);
        } else if (!r.desat()) {
            out.warn(Why.NONE, 0.3);
        } else if (Double.isNaN(r.tDesat()) || Double.isNaN(s.ratings().tSc())) {
            out.unknown(Why.NO_TIMES);
        } else if (r.tDesat() >= s.ratings().tSc()) {
            out.warn(Why.TOO_SLOW, 0.3);
        } else {
            out.pass(Why.PROTECTED, 1 - r.tDesat() / s.ratings().tSc());
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        SwitchPart s = f.s();
        DriverRatings r = f.d().ratings();
        double bus = f.op().bus();
        List<Comparison> cmp = new ArrayList<>();
        if (!Double.isNaN(r.tDesat()) && !Double.isNaN(s.ratings().tSc())) {
            cmp.add(new Comparison("detection time", r.tDesat(), "<", s.ratings().tSc(), "s"));
        }
        String stage = article(s.technology()) + " on " + Eng.of(bus, "V");
        String soft = Boolean.TRUE.equals(r.softOff()) ? ", with soft turn-off" : Boolean.FALSE.equals(r.softOff())
                ? ", without soft turn-off (a hard turn-off of a short-circuit current overshoots the collector)" : "";
        return switch ((Why) why) {
            case NOT_EXPECTED -> new Worded(article(s.technology()) + " is not expected to rely on desaturation detection here"
                    + " (protect it by current sensing if the design needs it)");
            case LOW_BUS -> new Worded(stage + ", at or below the " + Eng.of(f.m().protectionBus(), "V")
                    + " above which short-circuit detection is expected", cmp);
            case NO_BUS -> new Worded("bus voltage unknown, so whether this " + s.technology()
                    + " stage needs short-circuit detection cannot be judged (give --bus or bus_v)");
            case NO_DATA -> new Worded(stage + " should be protected against short circuits, but the catalog does not say"
                    + " whether this driver detects desaturation (desat) — look it up");
            case NONE -> new Worded(stage + " should be protected against short circuits, but this driver has no"
                    + " desaturation or over-current detection — pick one that has, or protect the stage otherwise", cmp);
            case NO_TIMES -> new Worded("this driver detects desaturation" + soft + ", but its detection time (t_desat_ns)"
                    + " or the switch's short-circuit withstand time (t_sc_us) is unknown — compare them in the"
                    + " datasheets", cmp);
            case TOO_SLOW -> new Worded("this driver detects desaturation after " + Eng.of(r.tDesat(), "s") + soft
                    + ", not before the switch's " + Eng.of(s.ratings().tSc(), "s") + " short-circuit withstand time —"
                    + " pick a faster detection or a switch rated for longer", cmp);
            case PROTECTED -> new Worded("this driver detects desaturation within " + Eng.of(r.tDesat(), "s") + soft
                    + ", inside the switch's " + Eng.of(s.ratings().tSc(), "s") + " withstand time", cmp);
        };
    }

    /** The technology with its indefinite article: "an igbt", "a sic-mosfet". */
    private static String article(Technology t) {
        String id = t.toString();
        return ("aeiou".indexOf(id.charAt(0)) >= 0 ? "an " : "a ") + id;
    }
}
