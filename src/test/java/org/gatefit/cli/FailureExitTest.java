package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Problem;
import org.gatefit.index.CatalogBusyException;
import org.gatefit.index.CatalogFormatException;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * What the command line does with each kind of failure a command throws: its exit code, its
 * message, and the stack trace only under {@code --verbose}. Each case runs through the real
 * command line ({@link Cli#create}) with one extra command that throws the failure.
 *
 * <p>Check values: 2, 3 and 4 are gatefit's exit-code contract (README, "Exit codes"; DESIGN.md);
 * 70 is EX_SOFTWARE, "internal software error", in BSD's sysexits.h.
 */
class FailureExitTest {

    /** A command that throws what it is given. */
    @Command(name = "throw")
    static final class Thrower implements Callable<Integer> {
        private final Throwable toThrow;

        Thrower(Throwable toThrow) {
            this.toThrow = toThrow;
        }

        @Override
        public Integer call() throws Exception {
            if (toThrow instanceof Exception e) {
                throw e;
            }
            throw (Error) toThrow;
        }
    }

    private static CliRun run(Throwable t, boolean verbose) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter o = new PrintWriter(out, true);
        PrintWriter e = new PrintWriter(err, true);
        CommandLine cl = Cli.create(o, e, Map.of(), CliRun.CLOCK, false, null, java.util.Set.of("info"));
        cl.addSubcommand("throw", new Thrower(t));
        cl.getSubcommands().get("throw").setErr(e).setOut(o);
        int code = verbose ? cl.execute("--verbose", "throw") : cl.execute("throw");
        return new CliRun(code, out.toString(), err.toString());
    }

    private static void exits(int code, Throwable t, String message) {
        CliRun r = run(t, false);
        assertEquals(code, r.exit(), r.dump());
        assertTrue(r.err().contains(message), r.dump());
        assertFalse(r.err().contains("\tat "), "no stack trace without --verbose: " + r.dump());
        CliRun v = run(t, true);
        assertEquals(code, v.exit(), v.dump());
        assertTrue(v.err().contains(message), v.dump());
        assertTrue(v.err().contains("\tat "), "stack trace with --verbose: " + v.dump());
    }

    @Test
    void usageProblemsExitTwo() {
        exits(2, new UsageException("--top: expected at least 1, got 0"), "gatefit throw: --top: expected at least 1, got 0");
        exits(2, new BadValueException("expected a number, got 'x'"), "gatefit throw: expected a number, got 'x'");
    }

    @Test
    void badInputExitsThreeWithTheProblemsAsTheyAre() {
        CatalogDataException e = new CatalogDataException(List.of(new Problem("s.csv", 3, "q_g_nc", 7, "x",
                "'x' is not a number")), 1);
        CliRun r = run(e, false);
        assertEquals(3, r.exit(), r.dump());
        assertEquals("s.csv line 3, column q_g_nc (7): 'x' is not a number", r.err().strip(), r.dump());
        exits(3, e, "s.csv line 3");
    }

    @Test
    void catalogProblemsExitFour() {
        exits(4, new CatalogBusyException("the catalog is locked by another import", new IOException("lock")),
                "gatefit throw: the catalog is locked by another import");
        exits(4, new CatalogFormatException("written by another version"), "gatefit throw: written by another version");
    }

    @Test
    void otherInputOutputProblemsExitFourInWords() {
        exits(4, new AccessDeniedException("/data/cat"), "gatefit throw: cannot read or write /data/cat: access denied");
        exits(4, new UncheckedIOException(new AccessDeniedException("/data/cat")), "cannot read or write /data/cat: access denied");
        exits(4, new IOException("No space left on device"), "gatefit throw: input/output error: No space left on device");
    }

    @Test
    void aMissingFileIsBadInput() {
        exits(3, new java.nio.file.NoSuchFileException("parts.csv"), "gatefit throw: no such file: parts.csv");
    }

    @Test
    void anInternalErrorExitsSeventyAndAsksForAReport() {
        String report = "please report it with the command line and the --verbose output";
        exits(70, new IllegalStateException("boom"), "internal error: java.lang.IllegalStateException: boom");
        exits(70, new IllegalStateException("boom"), report);
        exits(70, new ArrayIndexOutOfBoundsException(3), report);
        exits(70, new AssertionError("never"), "internal error: java.lang.AssertionError: never");
        exits(70, new StackOverflowError(), report);
    }
}
