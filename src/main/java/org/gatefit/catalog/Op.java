package org.gatefit.catalog;

/** Comparison operators of a condition on a column, with the symbols {@code find --where} reads and writes. */
public enum Op {
    LT("<"), LE("<="), GT(">"), GE(">="), EQ("="), NE("!=");

    private final String symbol;

    Op(String symbol) {
        this.symbol = symbol;
    }

    public String symbol() {
        return symbol;
    }

    /** The operator written as {@code s}. */
    public static Op of(String s) {
        for (Op o : values()) {
            if (o.symbol.equals(s)) {
                return o;
            }
        }
        throw new IllegalArgumentException("expected one of < <= > >= = !=, got " + s);
    }
}
