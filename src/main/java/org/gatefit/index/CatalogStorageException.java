package org.gatefit.index;

import java.io.EOFException;
import java.io.FileNotFoundException;
import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.apache.lucene.index.CorruptIndexException;
import org.apache.lucene.index.IndexFormatTooNewException;
import org.apache.lucene.index.IndexFormatTooOldException;

/**
 * The catalog's files could not be used: damaged (a checksum, a structure check or a file the
 * index refers to is missing), or not writable (disk full, read-only folder, no permission). The
 * message names the folder and says what to do; exit 4, like other I/O.
 */
public final class CatalogStorageException extends org.gatefit.failure.EnvironmentProblem {
    private static final long serialVersionUID = 1L;

    /** What to do about a damaged catalog, in every message that reports one. */
    public static final String DAMAGE_ADVICE = "What to do: import your CSV files again into a new catalog folder"
            + " (gatefit --catalog NEW-FOLDER import FILE...), or delete the damaged folder and import them again;"
            + " a CSV written earlier by 'gatefit export' imports the same parts back. Damaged files often mean"
            + " a failing disk or an interrupted copy: check the disk too.";

    CatalogStorageException(String message, Throwable cause) {
        super(message, cause);
    }

    /** The catalog in {@code dir} is damaged; {@code what} names the file and what is wrong with it. */
    static CatalogStorageException damaged(Path dir, String what, Throwable cause) {
        return new CatalogStorageException("the catalog in " + dir + " is damaged (" + what + "). " + DAMAGE_ADVICE,
                cause);
    }

    /** {@code e} from reading the catalog in {@code dir}, worded as damage when it is, else itself. */
    static IOException reading(Path dir, IOException e) {
        if (e instanceof CatalogStorageException || e instanceof CatalogFormatException) {
            return e;
        }
        String what = damage(e);
        return what == null ? e : damaged(dir, what, e);
    }

    /**
     * What is wrong, when {@code e} (thrown by Lucene reading an index) means the index files are
     * damaged: a checksum or structure check failed, a file is cut short, one the index refers to is
     * missing, or the files are of a Lucene version this one does not read; null otherwise.
     */
    static String damage(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) { // a missing file first: Lucene wraps it in a corruption
            if (t instanceof NoSuchFileException || t instanceof FileNotFoundException) {
                String f = t instanceof NoSuchFileException n ? n.getFile() : t.getMessage();
                return "a file of the index is missing: " + f;
            }
        }
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof CorruptIndexException c) {
                return c.getOriginalMessage() + " in " + fileName(c.getResourceDescription());
            }
            if (t instanceof IndexFormatTooOldException || t instanceof IndexFormatTooNewException) {
                return "files of an index format this version does not read: " + t.getMessage();
            }
            if (t instanceof EOFException) {
                return "a file is cut short: " + t.getMessage();
            }
        }
        return null;
    }

    /** A failed write to the catalog in {@code dir} (disk full, read-only, no permission), worded with what to do. */
    static CatalogStorageException writeFailed(Path dir, IOException e) {
        String why = e instanceof FileSystemException f && f.getReason() != null ? f.getReason()
                : e instanceof java.nio.file.AccessDeniedException ? "permission denied"
                : e.getMessage() != null ? e.getMessage() : e.getClass().getSimpleName();
        return new CatalogStorageException("could not write the catalog in " + dir + " (" + why + ")."
                + " Nothing was changed: the catalog is as it was before this import. Free some space on that"
                + " disk, or make the folder writable, and import again (or give --catalog a folder elsewhere).", e);
    }

    /** A resource description like {@code MMapIndexInput(path="/x/_0.fdt")} as the file it names. */
    private static String fileName(String resource) {
        if (resource == null) {
            return "an index file";
        }
        int q = resource.indexOf("path=\"");
        if (q >= 0) {
            int end = resource.indexOf('"', q + 6);
            if (end > q) {
                return resource.substring(q + 6, end);
            }
        }
        return resource;
    }
}
