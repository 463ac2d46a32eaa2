package org.gatefit.catalog;

import java.util.List;

/** Physical dimension of a catalog column; decides which unit symbols a cell may carry. */
public enum Dimension {
    VOLTAGE("V", "volts", "voltage"),
    CURRENT("A", "amperes", "current"),
    CHARGE("C", "coulombs", "charge"),
    TIME("s", "seconds", "time"),
    RESISTANCE("Ω", "ohms", "resistance"),
    CAPACITANCE("F", "farads", "capacitance"),
    INDUCTANCE("H", "henries", "inductance"),
    POWER("W", "watts", "power"),
    FREQUENCY("Hz", "hertz", "frequency"),
    /** A dimensionless fraction (0 to 1); a cell may say {@code 95%}. */
    RATIO("1", "fraction", "ratio");

    private final String symbol;
    private final String plural;
    private final String quantity;

    Dimension(String symbol, String plural, String quantity) {
        this.symbol = symbol;
        this.plural = plural;
        this.quantity = quantity;
    }

    /** SI symbol of the base unit, e.g. {@code V}; {@code 1} for a ratio. */
    public String symbol() {
        return symbol;
    }

    /** Plural name of the base unit, e.g. {@code volts}. */
    public String plural() {
        return plural;
    }

    /** Name of the quantity, e.g. {@code voltage}. */
    public String quantity() {
        return quantity;
    }

    /** Spellings of the base unit accepted in cells, matched exactly unless noted in {@link Units}. */
    List<String> spellings() {
        return switch (this) {
            case VOLTAGE -> List.of("V", "v");
            case CURRENT -> List.of("A", "a");
            case CHARGE -> List.of("C");
            case TIME -> List.of("s", "sec");
            case RESISTANCE -> List.of("\u03A9", "\u2126", "ohm", "ohms", "Ohm", "Ohms", "OHM");
            case CAPACITANCE -> List.of("F");
            case INDUCTANCE -> List.of("H");
            case POWER -> List.of("W", "w");
            case FREQUENCY -> List.of("Hz", "hz", "HZ");
            case RATIO -> List.of();
        };
    }
}
