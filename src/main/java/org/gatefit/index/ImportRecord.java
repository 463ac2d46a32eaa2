package org.gatefit.index;

import java.time.Instant;
import java.util.Objects;

/**
 * One file of one import, as kept in the catalog's history.
 *
 * @param file   file name as given
 * @param sha256 hex SHA-256 of its bytes
 * @param kind   switch or driver
 * @param rows   rows written
 * @param time   when the import committed
 * @param mode   {@code upsert}, {@code replace} or {@code skip-invalid}
 */
public record ImportRecord(String file, String sha256, String kind, long rows, Instant time, String mode) {
    public ImportRecord {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(time, "time");
        if (rows < 0) {
            throw new IllegalArgumentException("expected rows ≥ 0, got " + rows);
        }
    }
}
