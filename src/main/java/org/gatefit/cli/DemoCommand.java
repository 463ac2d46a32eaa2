package org.gatefit.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;

@Command(name = "demo", mixinStandardHelpOptions = true,
        header = "Walk through gatefit on the bundled example catalog (needs no imported catalog).",
        description = {"Copies the example catalogs that ship inside the jar to a temporary folder, imports them into a temporary catalog, and runs the commands an engineer would, printing each command line and its output. Your own catalog is not touched. The example makers and parts are invented."})
final class DemoCommand implements Callable<Integer> {
    static final String EXAMPLES = "/org/gatefit/examples/";
    static final List<String> FILES = List.of("switches.csv", "drivers.csv", "stages.csv", "bom.csv");

    private final Context ctx;

    DemoCommand(Context ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() throws Exception {
        Path tmp = Files.createTempDirectory("gatefit-demo");
        try {
            Path ex = Files.createDirectories(tmp.resolve("examples"));
            for (String f : FILES) {
                try (InputStream in = DemoCommand.class.getResourceAsStream(EXAMPLES + f)) {
                    if (in == null) {
                        throw new IllegalStateException("example file " + f + " is missing from the jar");
                    }
                    Files.copy(in, ex.resolve(f));
                }
            }
            Path catalog = tmp.resolve("catalog");
            String sw = "examples/switches.csv";
            String dr = "examples/drivers.csv";
            String st = "examples/stages.csv";
            String bom = "examples/bom.csv";
            ctx.out.println("gatefit demo: an invented scenario (invented company, makers and parts).");
            ctx.out.println("Working in a temporary folder " + tmp + " (removed afterwards): the example files are in"
                    + " examples/, the catalog in catalog/.");
            ctx.out.println();
            int worst = 0;
            worst = Math.max(worst, step("1. Import the switch and driver catalogs (one commit; every row checked)",
                    catalog, "import", sw, dr));
            worst = Math.max(worst, step("2. What the catalog holds and where it came from", catalog, "info"));
            worst = Math.max(worst, step("3. Find SiC MOSFETs rated 1200 V or more, lowest gate charge first", catalog,
                    "find", "--kind", "switch", "--where", "technology = sic-mosfet", "--where", "v_block_v >= 1.2kV",
                    "--sort", "q_g_nc"));
            worst = Math.max(worst, step("4. Find isolated drivers that sink at least 4 A", catalog,
                    "find", "--kind", "driver", "--where", "topology = isolated", "--where", "i_sink_a >= 4A",
                    "--sort", "i_sink_a:desc"));
            String first = firstPart(ex.resolve("switches.csv"));
            if (first != null) {
                worst = Math.max(worst, step("5. Every column of one switch, with units", catalog, "show", first));
            }
            worst = Math.max(worst, step("6. Validate the design's stage sheet (writes nothing)", catalog, "validate", st));
            worst = Math.max(worst, step("7. Shortlist drivers for the 1200 V SiC switch of the traction inverter's high side",
                    catalog, "shortlist", "--switch", "OBP-12M016K4", "--side", "high", "--bus", "800", "--freq", "10",
                    "--edge", "120", "--drive", "18", "--drive-neg", "-4", "--rg", "2", "--rg-off", "1", "--loop", "10",
                    "--logic", "lvcmos-3v3", "--top", "5"));
            worst = Math.max(worst, step("8. The full calculation sheet of the first choice, ending with its gate-drive"
                    + " network", catalog, "explain",
                    "--driver", "ISY-5710S", "--switch", "OBP-12M016K4", "--side", "high", "--bus", "800", "--freq", "10",
                    "--edge", "120", "--drive", "18", "--drive-neg", "-4", "--rg", "2", "--rg-off", "1", "--loop", "10",
                    "--logic", "lvcmos-3v3"));
            worst = Math.max(worst, step("9. Check the whole design: every stage, resolved through the BOM"
                    + " (it has instructive mistakes, so this step reports failures)", catalog, "check", st, "--bom",
                    bom));
            worst = Math.max(worst, step("10. CVL-1025TL, the motor controller's MOSFET, is out of stock: rank substitutes,"
                    + " re-checked in every stage it sits in", catalog, "replace", "CVL-1025TL", "--stages", st, "--bom",
                    bom, "--top", "4"));
            ctx.out.println("That was the demo: the failures in step 9 are the scenario's deliberate mistakes,"
                    + " described in examples/README.md.");
            return worst <= ExitCode.FAILED ? ExitCode.OK : worst;
        } finally {
            deleteTree(tmp);
        }
    }

    /** Runs one command line as a user would type it from the temporary folder (relative paths resolve there). */
    private int step(String title, Path catalog, String... args) {
        ctx.out.println("== " + title);
        List<String> shown = new ArrayList<>();
        for (String a : args) {
            shown.add(a.contains(" ") ? "'" + a + "'" : a);
        }
        ctx.out.println("$ gatefit " + String.join(" ", shown));
        ctx.out.flush();
        List<String> full = new ArrayList<>(List.of("--catalog", catalog.getFileName().toString()));
        full.addAll(List.of(args));
        CommandLine cl = Cli.create(ctx.out, ctx.err, ctx.env, ctx.clock, ctx.terminal, catalog.getParent());
        int code = cl.execute(full.toArray(String[]::new));
        ctx.out.println();
        ctx.out.flush();
        return code;
    }

    private static String firstPart(Path csv) throws IOException {
        List<String> lines = Files.readAllLines(csv);
        if (lines.size() < 2) {
            return null;
        }
        String row = lines.get(1);
        int comma = row.indexOf(',');
        return comma < 0 ? row : row.substring(0, comma);
    }

    private static void deleteTree(Path root) {
        try {
            Files.walkFileTree(root, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) throws IOException {
                    Files.delete(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException exc) throws IOException {
                    Files.delete(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove the demo's temporary folder " + root, e);
        }
    }
}
