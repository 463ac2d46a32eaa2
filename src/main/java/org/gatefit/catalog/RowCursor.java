package org.gatefit.catalog;

import java.util.List;

/**
 * One row of a kind, read column by column, by position in the kind's {@link Schema#columns()}
 * (resolve names once with {@link Schema#position}). A catalog scan hands out one cursor that
 * moves from row to row and reads only the columns asked for, so engines that evaluate every
 * candidate build no map per row; {@link #of(Row)} reads a {@link Row} the same way, so one
 * constructor serves both.
 */
public interface RowCursor {
    /** What the row describes. */
    Kind kind();

    /** Number in the column's unit (counts as a double), or NaN when unknown. */
    double number(int column);

    /** Text or choice value, or null when unknown. */
    String text(int column);

    /** Number converted to SI (V, A, C, s, Ω, F, H, W, Hz), or NaN when unknown; the same conversion as {@link Row#si}. */
    default double si(int column) {
        double v = number(column);
        if (Double.isNaN(v)) {
            return v;
        }
        Unit u = Schema.of(kind()).columns().get(column).unit();
        return u == null ? v : u.toSi(v);
    }

    /**
     * What {@code make} builds from this row; a catalog that keeps its decoded columns also keeps
     * this object per part (one per type {@code key}), so a later scan gets it without rebuilding.
     * {@code make} must depend on the row only, and what it returns must not change.
     */
    default <T> T memo(Class<T> key, java.util.function.Function<RowCursor, ? extends T> make) {
        return make.apply(this);
    }

    /** A cursor over one row. */
    static RowCursor of(Row row) {
        List<Column> cols = Schema.of(row.kind()).columns();
        return new RowCursor() {
            @Override
            public Kind kind() {
                return row.kind();
            }

            @Override
            public double number(int column) {
                return row.number(cols.get(column).name());
            }

            @Override
            public String text(int column) {
                return row.text(cols.get(column).name());
            }
        };
    }
}
