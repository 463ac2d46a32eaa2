package org.gatefit.match;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Predicate;
import org.gatefit.catalog.Op;

/**
 * What a catalog may skip without evaluating, for one shortlist question: drivers that a rule is
 * certain to fail on values they have (never on a value they lack). Built from the rules'
 * declarations ({@link PairRule#certainFailures}); the catalog adapter turns it into its own query.
 *
 * @param require conditions every driver left must meet: the rules' only on required columns (always
 *                known); a user's filter ({@code stock > 0}) also leaves out drivers lacking the value
 * @param exclude groups of conditions: a driver meeting every condition of a group is skipped
 */
public record Prefilter(List<Condition> require, List<Exclusion> exclude) {
    public Prefilter {
        require = List.copyOf(require);
        exclude = List.copyOf(exclude);
    }

    /** No prefilter: every driver is evaluated (p-channel switches, {@code --all}, small catalogs). */
    public static final Prefilter NONE = new Prefilter(List.of(), List.of());

    /** Whether nothing is skipped. */
    public boolean isEmpty() {
        return require.isEmpty() && exclude.isEmpty();
    }

    /** One line per condition, as printed with the results. */
    public List<String> describe() {
        List<String> out = new ArrayList<>();
        for (Condition c : require) {
            out.add(c.toString());
        }
        for (Exclusion e : exclude) {
            List<String> parts = new ArrayList<>();
            for (Condition c : e.when()) {
                parts.add(c.toString());
            }
            for (String k : e.known()) {
                parts.add(k + " known");
            }
            if (e.text() != null) {
                parts.add(e.text().says());
            }
            out.add("skip " + String.join(" and ", parts) + " (" + e.rule().id() + " fails)");
        }
        return out;
    }

    /**
     * {@code column op value} on a driver's catalog value, in the column's own unit ({@code v_…_v}
     * in volts, {@code i_…_a} in amperes): a number (text null) or a choice (text).
     */
    public record Condition(String column, Op op, double number, String text) {
        public Condition {
            Objects.requireNonNull(column, "column");
            Objects.requireNonNull(op, "op");
            if (text == null && !Double.isFinite(number)) {
                throw new IllegalArgumentException("expected a finite limit for " + column + ", got " + number);
            }
        }

        /**
         * A numeric condition. The limit is written with at most four significant digits when it is
         * long, rounded the way that skips fewer drivers (down for {@code >=} and {@code <}, up for
         * {@code <=} and {@code >}): it can never skip a driver the rules pass.
         */
        public static Condition of(String column, Op op, double limit) {
            RoundingMode mode = switch (op) {
                case GE, LT -> RoundingMode.FLOOR;
                case LE, GT -> RoundingMode.CEILING;
                case EQ, NE -> throw new IllegalArgumentException("expected an inequality for a number, got " + op);
            };
            return new Condition(column, op, round(limit, mode), null);
        }

        /** A condition on a choice column ({@code topology = isolated}). */
        public static Condition is(String column, Op op, String choice) {
            if (op != Op.EQ && op != Op.NE) {
                throw new IllegalArgumentException("expected = or != for a choice, got " + op);
            }
            return new Condition(column, op, Double.NaN, Objects.requireNonNull(choice));
        }

        /** The value as {@code find --where} would write it (in exponent form when plain digits would be long). */
        public String value() {
            if (text != null) {
                return text;
            }
            String plain = BigDecimal.valueOf(number).stripTrailingZeros().toPlainString();
            return plain.length() <= 24 ? plain : Double.toString(number);
        }

        @Override
        public String toString() {
            return column + " " + op.symbol() + " " + value();
        }

        /** A short number as it is; a long one rounded to four significant digits in {@code mode}. */
        private static double round(double x, RoundingMode mode) {
            BigDecimal shortest = BigDecimal.valueOf(x).stripTrailingZeros();
            if (shortest.precision() <= 6) {
                return x;
            }
            return new BigDecimal(x).round(new MathContext(4, mode)).doubleValue();
        }
    }

    /**
     * Drivers meeting every condition of {@code when}, with values in the {@code known} columns and
     * passing {@code text} (null: no text test), fail {@code rule}.
     */
    public record Exclusion(Rule rule, List<Condition> when, List<String> known, TextTest text) {
        public Exclusion {
            Objects.requireNonNull(rule, "rule");
            when = List.copyOf(when);
            known = List.copyOf(known);
        }
    }

    /**
     * A test of a text column's value as written.
     *
     * @param says how it reads in the printed prefilter
     */
    public record TextTest(String column, String says, Predicate<String> test) {
    }

    /** Collects the rules' declarations. */
    static final class Builder {
        private final List<Condition> require = new ArrayList<>();
        private final List<Exclusion> exclude = new ArrayList<>();

        /** Every driver left must meet {@code c} (a required column: a rule fails every driver that does not). */
        Builder require(Condition c) {
            require.add(c);
            return this;
        }

        /** Skips drivers meeting every condition of {@code when}. */
        Builder skip(Rule rule, Condition... when) {
            exclude.add(new Exclusion(rule, List.of(when), List.of(), null));
            return this;
        }

        /** Skips drivers meeting {@code when} that have values in every {@code known} column. */
        Builder skipKnown(Rule rule, Condition when, String... known) {
            exclude.add(new Exclusion(rule, List.of(when), List.of(known), null));
            return this;
        }

        /** Skips drivers whose text passes {@code test}. */
        Builder skipText(Rule rule, TextTest test) {
            exclude.add(new Exclusion(rule, List.of(), List.of(), test));
            return this;
        }

        Prefilter build() {
            return new Prefilter(require, exclude);
        }
    }
}
