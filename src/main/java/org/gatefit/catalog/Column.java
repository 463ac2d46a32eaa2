package org.gatefit.catalog;

import java.util.List;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * One column of a catalog or stage sheet, as defined by the JSON Schema files in
 * {@code catalog-schema/}.
 *
 * @param name         column name as it appears in CSV headers and JSON keys
 * @param type         how cells are read
 * @param unit         unit of a NUMBER column (null when the number has no unit, e.g. price)
 * @param required     whether every row must fill it
 * @param choices      allowed words of a CHOICE column, else empty
 * @param pattern      pattern a TEXT cell must match, or null
 * @param minimum      lower bound or null
 * @param minExclusive whether the lower bound itself is excluded
 * @param maximum      upper bound or null
 * @param defaultValue value used when the cell is empty, as cell text, or null
 * @param defaultFrom  name of another column whose value is used when this one is empty, or null
 * @param description  one line for documentation and help
 * @param example      an example value for messages, or null
 * @param wordsOnly    a long free text searched by its words only: not compared with --where or sorted
 * @param headings     other headings that name this column in people's sheets ({@code x-headings})
 * @param choiceWords  other ways people write each choice ({@code x-choice-words}): word → choice
 * @param replacement  how {@code replace} compares a substitute's value with the original's
 *                     ({@code x-replacement}), or null when it does not compare this column
 */
public record Column(String name, ColumnType type, Unit unit, boolean required, List<String> choices,
                     Pattern pattern, Double minimum, boolean minExclusive, Double maximum,
                     String defaultValue, String defaultFrom, String description, String example,
                     boolean wordsOnly, List<String> headings, java.util.Map<String, String> choiceWords,
                     Substitute replacement) {

    /** How a substitute's value may differ from the original's ({@code x-replacement}'s {@code compare}). */
    public enum Compare {
        /** Must be equal. */
        SAME,
        /** Higher is better (a rating). */
        HIGHER,
        /** Lower is better. */
        LOWER,
        /** Having it ({@code true}) is better. */
        YES,
        /** Within ± {@code window} of the original, as a fraction of it; else re-verify. */
        WINDOW_RELATIVE,
        /** Within ± {@code window} of the original, in the column's unit; else re-verify. */
        WINDOW_ABSOLUTE;

        /** The word in the schema file: {@code same}, {@code higher}, …, {@code window-absolute}. */
        public String id() {
            return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
        }

        static Compare of(String id) {
            for (Compare c : values()) {
                if (c.id().equals(id)) {
                    return c;
                }
            }
            throw new IllegalStateException("expected x-replacement compare one of same, higher, lower, yes,"
                    + " window-relative, window-absolute, got " + id);
        }
    }

    /**
     * How {@code replace} compares this column ({@code x-replacement} in the schema file).
     *
     * @param label     the parameter's name for people
     * @param compare   how a difference reads
     * @param essential whether a worse value means the part is not offered (a numeric rating short by
     *                  at most the replacement tolerance is offered with a re-verify note)
     * @param window    half-width of a window (a fraction, or the column's unit); 0 otherwise
     */
    public record Substitute(String label, Compare compare, boolean essential, double window) {
        public Substitute {
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(compare, "compare");
            boolean windowed = compare == Compare.WINDOW_RELATIVE || compare == Compare.WINDOW_ABSOLUTE;
            if (windowed != window > 0) {
                throw new IllegalStateException("expected a window > 0 exactly for window comparisons, got " + compare
                        + " with " + window);
            }
        }
    }

    public Column {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(type, "type");
        choices = List.copyOf(choices);
        headings = List.copyOf(headings);
        choiceWords = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(choiceWords));
        if (type == ColumnType.CHOICE && choices.isEmpty()) {
            throw new IllegalArgumentException("expected choices for column " + name + ", got none");
        }
        if (!name.matches("[a-z][a-z0-9_]*")) {
            throw new IllegalArgumentException("expected a lower-case column name, got '" + name + "'");
        }
    }

    /** Whether values are numbers (NUMBER or INTEGER). */
    public boolean isNumeric() {
        return type == ColumnType.NUMBER || type == ColumnType.INTEGER;
    }

    /** Unit symbol for tables and help, e.g. {@code nC}; empty when none. */
    public String unitSymbol() {
        return unit == null ? "" : unit.symbol();
    }

    /** What a cell must hold, for messages and docs. */
    public String expectation() {
        return switch (type) {
            case TEXT -> pattern == null ? "text" : "text matching " + pattern.pattern();
            case CHOICE -> "one of " + String.join(", ", choices);
            case INTEGER -> "a whole number" + (example == null ? "" : ", e.g. " + example);
            case NUMBER -> unit == null ? "a number" + (example == null ? "" : ", e.g. " + example)
                    : Units.expectation(unit, example == null ? null : Double.valueOf(example));
        };
    }
}
