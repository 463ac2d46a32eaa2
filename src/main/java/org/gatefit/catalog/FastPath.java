package org.gatefit.catalog;

import java.util.Locale;

/**
 * The hand-written fast paths, each behind a seam whose reference, a well-kept library, ships too:
 * the system property {@value #PROPERTY} selects the references instead ({@code true} or {@code all}
 * for every seam, or a comma-separated list of seam names: {@code csv}, {@code import}; the former
 * {@code json} seam's fast path was deleted and its name is ignored).
 * The fast paths are the default; tests run both on the same inputs and compare the results
 * (docs/PERFORMANCE.md, "Fast paths and their references", has what each one saves).
 */
public enum FastPath {
    /** Reading CSV: {@link CsvLexer}, reference Commons CSV's parser ({@link CommonsCsvRecords}). */
    CSV,
    /**
     * Writing an import: column segments added with {@code IndexWriter.addIndexes}, reference Lucene's
     * own {@code IndexWriter.updateDocument} per row. The index package also takes the reference by
     * itself on a Lucene version the segment path was not built against.
     */
    IMPORT;

    /** The system property that selects reference paths. */
    public static final String PROPERTY = "gatefit.reference";

    /** Whether {@link #PROPERTY} selects this seam's reference path (read on each call: cheap, and tests may set it). */
    public boolean reference() {
        return selects(System.getProperty(PROPERTY));
    }

    /** Whether a value of {@link #PROPERTY} selects this seam's reference; names not known are ignored. */
    boolean selects(String value) {
        if (value == null) {
            return false;
        }
        for (String s : value.split(",")) {
            String v = s.strip().toLowerCase(Locale.ROOT);
            if (v.equals("true") || v.equals("all") || v.equals(name().toLowerCase(Locale.ROOT))) {
                return true;
            }
        }
        return false;
    }
}
