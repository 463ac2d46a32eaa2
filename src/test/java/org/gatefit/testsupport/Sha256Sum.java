package org.gatefit.testsupport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/** {@code sha256sum} (GNU coreutils), the reference tool for SHA-256 of files. */
public final class Sha256Sum {
    private Sha256Sum() {
    }

    /** What {@code sha256sum FILE} prints as the hash, or null when the tool is not on this machine. */
    public static String of(Path file) throws IOException, InterruptedException {
        Process p;
        try {
            p = new ProcessBuilder("sha256sum", file.toString()).redirectErrorStream(true).start();
        } catch (IOException notThere) {
            return null;
        }
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "sha256sum finished");
        assertEquals(0, p.exitValue(), out);
        return out.substring(0, out.indexOf(' '));
    }
}
