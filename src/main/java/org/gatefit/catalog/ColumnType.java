package org.gatefit.catalog;

/** How a column's cells are read and stored. */
public enum ColumnType {
    /** Free text (part number, maker, description). */
    TEXT,
    /** One of a closed set of words (technology, lifecycle, yes/no). */
    CHOICE,
    /** A quantity with a unit, held as a double in the column's unit. */
    NUMBER,
    /** A whole count (stock, channels). */
    INTEGER
}
