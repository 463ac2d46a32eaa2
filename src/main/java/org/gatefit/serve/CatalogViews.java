package org.gatefit.serve;

import java.io.IOException;
import java.nio.file.Path;
import org.gatefit.index.Catalog;

/**
 * The server's view of its catalog folder: one opened catalog (its columns kept decoded) handed to
 * every request as a handle of its own, so each answer reads one point-in-time commit. When another
 * process's import has committed, the next request opens the new commit; requests still running
 * keep the old view until they close their handle.
 */
final class CatalogViews implements AutoCloseable {
    private final Path dir;
    private Catalog current; // guarded by this

    CatalogViews(Path dir) {
        this.dir = dir;
    }

    /**
     * A handle on the catalog's last commit, which the caller closes; null when there is no usable
     * catalog (none imported yet, or it cannot be opened): the command then opens the folder itself
     * and says why, as on the command line.
     */
    synchronized Catalog acquire() {
        try {
            if (current == null || !current.isCurrent()) {
                Catalog next = Catalog.openIfPresent(dir).keepColumns(true);
                if (current != null) {
                    current.close();
                }
                current = next;
            }
            return current.isEmpty() ? null : current.handle();
        } catch (IOException e) {
            if (current != null) {
                try {
                    current.close();
                } catch (IOException ignored) {
                    // the view is dropped either way; the command reports the folder's state
                }
                current = null;
            }
            return null;
        }
    }

    @Override
    public synchronized void close() throws IOException {
        if (current != null) {
            current.close();
            current = null;
        }
    }
}
