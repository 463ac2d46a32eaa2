package org.gatefit.testsupport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;

/**
 * The ngspice circuit simulator (Debian package {@code ngspice}) as the tests' reference: one rule
 * for when it is missing (a failure in CI unless {@code GATEFIT_SKIP_NGSPICE=1}, a skip with the
 * install command elsewhere), one batch run, one reader of {@code .meas} results.
 */
public final class Ngspice {
    /** Set to 1 to skip the ngspice tests in CI. */
    public static final String SKIP = "GATEFIT_SKIP_NGSPICE";

    private Ngspice() {
    }

    /** Fails in CI, or skips elsewhere, when ngspice is not on the PATH. */
    public static void require() {
        for (String p : System.getenv().getOrDefault("PATH", "/usr/bin").split(File.pathSeparator)) {
            if (Files.isExecutable(Path.of(p, "ngspice"))) {
                return;
            }
        }
        String hint = "ngspice not found: install it with `apt-get update && apt-get install -y ngspice`";
        if ("true".equalsIgnoreCase(System.getenv("CI")) && !"1".equals(System.getenv(SKIP))) {
            fail(hint + ", or set " + SKIP + "=1 to skip this test");
        }
        Assumptions.abort(hint + "; the ngspice check is skipped outside CI");
    }

    /**
     * Writes {@code netlist} to {@code dir/name.cir}, runs {@code ngspice -b} on it (within
     * {@code seconds}) and returns its output; the run must end with exit code 0 and print no error.
     */
    public static String run(Path dir, String name, String netlist, int seconds) throws IOException, InterruptedException {
        require();
        Path cir = dir.resolve(name + ".cir");
        Files.writeString(cir, netlist, StandardCharsets.UTF_8);
        Process p = new ProcessBuilder("ngspice", "-b", cir.toString()).redirectErrorStream(true).start();
        byte[] out = p.getInputStream().readAllBytes();
        assertTrue(p.waitFor(seconds, TimeUnit.SECONDS), "ngspice did not finish");
        String text = new String(out, StandardCharsets.UTF_8);
        assertEquals(0, p.exitValue(), text);
        assertTrue(!text.toLowerCase(Locale.ROOT).contains("error"), text);
        return text;
    }

    /** The value of a {@code .meas} result in ngspice's output. */
    public static double meas(String output, String name) {
        Matcher m = Pattern.compile("(?m)^\\s*" + name + "\\s*=\\s*([-+0-9.eE]+)").matcher(output);
        assertTrue(m.find(), "no ." + name + " in ngspice's output:\n" + output);
        return Double.parseDouble(m.group(1));
    }
}
