package org.gatefit.match;

/**
 * {@code polarity}: the driver's input sense against the PWM's (which level turns the switch on).
 * An inverting input on an active-low PWM works but turns the switch on whenever the controller pin
 * is low or unpowered, so it warns (common practice, no source).
 */
final class PolarityRule extends PairRule {
    enum Why implements Reason { BOTH_SENSES, INVERTING_MATCH, MATCH, INVERTING_ON_ACTIVE_HIGH, NON_INVERTING_ON_ACTIVE_LOW }

    @Override
    public void judge(PairFigures f, Outcome out) {
        DriverPart d = f.d();
        boolean wantInverting = !f.op().activeHigh();
        if (d.offers(false) && d.offers(true)) {
            out.pass(Why.BOTH_SENSES, 1);
            return;
        }
        boolean inverting = d.offers(true);
        if (inverting == wantInverting) {
            if (inverting) {
                out.warn(Why.INVERTING_MATCH, 0.5);
            } else {
                out.pass(Why.MATCH, 1);
            }
        } else if (inverting) {
            out.fail(Why.INVERTING_ON_ACTIVE_HIGH);
        } else {
            out.fail(Why.NON_INVERTING_ON_ACTIVE_LOW);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        boolean wantInverting = !f.op().activeHigh();
        return new Worded(switch ((Why) why) {
            case BOTH_SENSES -> "this driver has inverting and non-inverting inputs; use channel "
                    + (f.d().inverting().indexOf(wantInverting) + 1) + " (" + (wantInverting ? "inverting" : "non-inverting")
                    + ") for the " + (f.op().activeHigh() ? "active-high" : "active-low") + " PWM";
            case INVERTING_MATCH -> "inverting input matches the active-low PWM, but the switch turns"
                    + " on whenever the controller pin is low or unpowered (reset, boot) — add a pull-up and an enable,"
                    + " or use a non-inverting driver with active-high PWM";
            case MATCH -> "non-inverting input matches the active-high PWM";
            case INVERTING_ON_ACTIVE_HIGH -> "this driver's input is inverting but the PWM is active-high, so the"
                    + " switch is on while the controller holds its pin low (also in reset) — use the non-inverting variant or"
                    + " invert the PWM in the controller";
            case NON_INVERTING_ON_ACTIVE_LOW -> "this driver's input is non-inverting but the PWM is active-low, so the"
                    + " switch is on when it should be off — use an inverting driver or make the PWM active-high";
        });
    }

    /** A driver with no channel of the PWM's sense fails. */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        boolean wantInverting = !q.op.activeHigh();
        String sense = wantInverting ? "an inverting" : "a non-inverting";
        b.skipText(Rule.POLARITY, new Prefilter.TextTest("input_polarity",
                "input_polarity without " + sense + " channel", t -> !DriverPart.offers(t, wantInverting)));
    }
}
