package org.gatefit.cli;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Margins;
import picocli.CommandLine.Option;

/** {@code --margin NAME=VALUE}, shared by every command that runs the rules. */
final class MarginOptions {
    @Option(names = "--margin", paramLabel = "NAME=VALUE",
            description = "Override a margin (repeatable): drive-current, gate-headroom, uvlo-headroom, logic-noise, offset,"
                    + " isolation, driver-power, dv-dt. Defaults are printed with every result.")
    List<String> margins = new ArrayList<>();

    /** The defaults with the overrides applied. */
    Margins margins() throws UsageException {
        Margins m = Margins.DEFAULT;
        for (String a : margins) {
            try {
                m = m.with(a);
            } catch (IllegalArgumentException e) {
                throw new UsageException("--margin: " + e.getMessage());
            }
        }
        return m;
    }
}
