package org.gatefit.catalog;

import java.util.Locale;

/** What a row describes: a switch or a driver of the catalog, or a stage of a design. */
public enum Kind {
    SWITCH("switch"),
    DRIVER("driver"),
    STAGE("stage");

    private final String id;

    Kind(String id) {
        this.id = id;
    }

    /** Lower-case id used in files, options and JSON: {@code switch}, {@code driver}, {@code stage}. */
    public String id() {
        return id;
    }

    /** Whether rows of this kind are catalog parts (switches and drivers). */
    public boolean isPart() {
        return this != STAGE;
    }

    /** Parses an id from outside (option or file), case-insensitively. */
    public static Kind fromId(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (Kind k : values()) {
            if (k.id.equals(t) || (k.id + "es").equals(t) || (k.id + "s").equals(t)) {
                return k;
            }
        }
        throw new IllegalArgumentException("expected switch, driver or stage, got '" + text + "'");
    }

    @Override
    public String toString() {
        return id;
    }
}
