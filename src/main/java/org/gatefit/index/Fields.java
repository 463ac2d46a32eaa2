package org.gatefit.index;

import java.util.Locale;

/**
 * Names of the Lucene fields of the catalog index, and why each has the type it has.
 *
 * <p>Schema columns keep their own names as field names:
 * <ul>
 *   <li>NUMBER columns: {@code DoublePoint} (range filters of {@code find --where}),
 *       {@code DoubleDocValuesField} (sorting and ranking read columns straight from doc values,
 *       no stored-field loads on hot paths) and a {@code StoredField} (show and export).</li>
 *   <li>INTEGER columns (stock, channels): the same with {@code LongPoint} and
 *       {@code NumericDocValuesField}.</li>
 *   <li>TEXT and CHOICE columns: a lower-cased {@code StringField} (exact filters such as
 *       {@code technology = sic-mosfet}), {@code SortedDocValuesField} (sorting, and ranking by
 *       lifecycle or pinout) and a {@code StoredField} with the text as written.</li>
 * </ul>
 */
public final class Fields {
    /** Keyword: kind plus normalised part number; the upsert key. */
    public static final String ID = "_id";
    /** Keyword and doc values: {@code switch}, {@code driver} or {@code import} (history record). */
    public static final String KIND = "_kind";
    /** Analyzed text of part number, maker, package, pinout and description, for {@code find WORDS}. */
    public static final String ALL = "_all";
    /** Stored: source file and line of a part; file, hash, rows, time of an import record. */
    public static final String SOURCE_FILE = "_file";
    public static final String SOURCE_LINE = "_line";
    /** Stored: names of extra (non-schema) columns, one value each, paired with {@link #EXTRA_VALUE}. */
    public static final String EXTRA_NAME = "_xname";
    public static final String EXTRA_VALUE = "_xvalue";
    /** Import history record fields (stored). */
    public static final String IMPORT_SHA = "_sha256";
    public static final String IMPORT_ROWS = "_rows";
    public static final String IMPORT_TIME = "_time";
    public static final String IMPORT_MODE = "_mode";
    public static final String IMPORT_KIND = "_ikind";
    /** Kind value of import history records. */
    public static final String IMPORT = "import";

    private Fields() {
    }

    /** Upsert key of a part. */
    public static String id(String kind, String partNumber) {
        return kind + ":" + partNumber.strip().toUpperCase(Locale.ROOT);
    }
}
