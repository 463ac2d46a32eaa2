package org.gatefit.cli;

import java.nio.file.Path;
import picocli.CommandLine.Command;
import picocli.CommandLine.IVersionProvider;
import picocli.CommandLine.Option;
import picocli.CommandLine.ScopeType;

/** The top command: global options and the list of commands. */
@Command(name = "gatefit", mixinStandardHelpOptions = true, versionProvider = GatefitCommand.Version.class,
        header = "Check and rank gate drivers against power switches from your own parts catalog.",
        description = {"Imports your approved-parts catalogs (CSV) of switches and gate drivers into a local index, then checks and ranks driver-switch pairs on gate charge, drive current, gate voltage, UVLO, logic levels, high-side ability, driver power and more.",
            "",
            "The catalog directory is --catalog, else $GATEFIT_CATALOG, else a per-user data directory (run 'gatefit info' to see which).",
            "",
            "Exit codes: 0 done and nothing failed; 1 a checked pair failed; 2 usage error; 3 bad input data (file, column, value); 4 catalog locked or I/O error; 70 internal error (please report it)."},
        footer = {"", "Figures are estimates from datasheet values: verify on the bench and against each part's"
                + " datasheet. High voltage can kill; follow local codes and licensed practice."},
        synopsisSubcommandLabel = "COMMAND")
final class GatefitCommand implements java.util.concurrent.Callable<Integer> {

    @Option(names = "--catalog", paramLabel = "DIR", scope = ScopeType.INHERIT,
            description = "Catalog directory (default: $GATEFIT_CATALOG, else the per-user data directory).")
    Path catalog;

    @Option(names = "--verbose", scope = ScopeType.INHERIT, description = "Print stack traces of errors.")
    boolean verbose;

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    /** Without a command: the usage on standard error, and a usage exit code. */
    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCode.USAGE;
    }

    /** gatefit's version from the jar manifest (Maven's project version), or "(development build)" outside the jar. */
    static String version() {
        String v = GatefitCommand.class.getPackage().getImplementationVersion();
        return v == null ? "(development build)" : v;
    }

    /** Version from the jar manifest. */
    static final class Version implements IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"gatefit " + version(), "Java " + System.getProperty("java.version")};
        }
    }
}
