package org.gatefit.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/**
 * A one-line progress bar on standard error, redrawn in place with a carriage return, for a person
 * at a terminal; off (draws nothing) for pipes and files, or when the total is 0. Closing it clears
 * the line.
 */
final class Progress implements AutoCloseable {
    /** Imports shorter than this many data lines finish before a bar helps. */
    static final long LONG_IMPORT = 2000;
    /** Checks with fewer stages finish before a bar helps. */
    static final long LONG_CHECK = 50;
    private static final int BAR = 30;

    private final PrintWriter err;
    private final boolean on;
    private final String what;
    private final long total;
    private int shown = -1;
    private boolean drawn;

    Progress(PrintWriter err, boolean terminal, String what, long total) {
        this.err = err;
        this.on = terminal && total > 0;
        this.what = what;
        this.total = total;
    }

    /** {@code done} of the total so far; redraws when the whole percentage changes. */
    void update(long done) {
        if (!on) {
            return;
        }
        int pct = (int) Math.min(100, done * 100 / total);
        if (pct == shown) {
            return;
        }
        shown = pct;
        int fill = pct * BAR / 100;
        err.print("\r[" + "#".repeat(fill) + ".".repeat(BAR - fill) + "] " + pct + " % " + Math.min(done, total) + " / "
                + total + " " + what);
        err.flush();
        drawn = true;
    }

    @Override
    public void close() {
        if (drawn) {
            err.print("\r" + " ".repeat(BAR + 40 + what.length()) + "\r");
            err.flush();
        }
    }

    /** Lines after the header of the files: the rows an import will write, near enough for a bar. */
    static long dataLines(List<Path> files) throws IOException {
        long n = 0;
        byte[] buf = new byte[1 << 16];
        for (Path f : files) {
            if (!Files.isRegularFile(f)) {
                continue;
            }
            long lines = 0;
            try (InputStream in = Files.newInputStream(f)) {
                for (int k = in.read(buf); k >= 0; k = in.read(buf)) {
                    for (int i = 0; i < k; i++) {
                        if (buf[i] == '\n') {
                            lines++;
                        }
                    }
                }
            }
            n += Math.max(0, lines - 1);
        }
        return n;
    }
}
