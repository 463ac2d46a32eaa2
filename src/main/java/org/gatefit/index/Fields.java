package org.gatefit.index;

import java.util.Locale;

/**
 * Names of the Lucene fields of the catalog index, and why each has the type it has.
 *
 * <p>Schema columns keep their own names as field names; each value is written once for reading
 * (doc values) and once for filtering (points or terms), and a row is read back from its doc values
 * plus one stored record ({@link #SOURCE}), not from a stored field per column:
 * <ul>
 *   <li>NUMBER columns: a point as {@code DoublePoint} indexes it (range filters of {@code find
 *       --where} and the shortlist prefilter) and a numeric doc value as {@code DoubleDocValuesField}
 *       writes it, {@code Double.doubleToRawLongBits} (sorting, ranking, scans and reading the row),
 *       both in one field instance ({@code Documents.PointAndNumeric}, as Lucene's {@code LongField}).</li>
 *   <li>INTEGER columns (stock, channels): the same with the point of {@code LongPoint} and the
 *       value of {@code NumericDocValuesField}.</li>
 *   <li>TEXT and CHOICE columns: a lower-cased exact term as {@code StringField} indexes it (exact
 *       filters such as {@code technology = sic-mosfet}) and a {@code SortedDocValuesField} with the
 *       text as written (sorting, ranking by lifecycle or pinout, scans and reading the row); one
 *       field instance carries both when the text is already lower case (every choice). The part
 *       number has the doc value only: its exact filter ({@code PartNumberQuery}) reads the
 *       {@link #ID} terms and the doc value, so no unique keyword term per part is written.</li>
 *   <li>Words-only TEXT columns (description): no term or doc value of their own; their words go to
 *       {@link #ALL} and their text to {@link #SOURCE}.</li>
 * </ul>
 */
public final class Fields {
    /** Keyword: kind plus normalised part number; the upsert key. */
    public static final String ID = "_id";
    /** Keyword: {@code switch}, {@code driver} or {@code import} (history record, where it is also stored). */
    public static final String KIND = "_kind";
    /**
     * Analyzed text of the TEXT columns (part number, maker, package, pinout, input polarity,
     * description), for {@code find WORDS}: terms and frequencies, no positions (only term and
     * prefix queries read it).
     */
    public static final String ALL = "_all";
    /**
     * Stored, one binary value per part: kind, source file and line, every value of the row and
     * the extra columns in their order (layout in {@code Documents}), so a part is read back with
     * one stored-record load; scans read the same values from doc values.
     */
    public static final String SOURCE = "_src";
    /** Stored: file of an import record. */
    public static final String SOURCE_FILE = "_file";
    /** Import history record fields (stored). */
    public static final String IMPORT_SHA = "_sha256";
    public static final String IMPORT_ROWS = "_rows";
    public static final String IMPORT_TIME = "_time";
    public static final String IMPORT_MODE = "_mode";
    public static final String IMPORT_KIND = "_ikind";
    /** Kind value of import history records. */
    public static final String IMPORT = "import";
    /** Commit user-data key holding {@link #FORMAT}. */
    public static final String FORMAT_KEY = "gatefit.index.format";
    /**
     * Layout of the index this version writes and reads; a catalog of another layout is refused
     * with an instruction to import again (there is no conversion).
     */
    public static final String FORMAT = "3";

    private Fields() {
    }

    /** Upsert key of a part. */
    public static String id(String kind, String partNumber) {
        return kind + ":" + partNumber.strip().toUpperCase(Locale.ROOT);
    }
}
