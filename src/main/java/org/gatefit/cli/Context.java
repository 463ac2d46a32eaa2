package org.gatefit.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Locale;
import java.util.Map;

/**
 * What commands need from the world: the two output streams, the environment and a clock. Built
 * once by {@link Cli}; tests pass their own.
 */
final class Context {
    final PrintWriter out;
    final PrintWriter err;
    final Map<String, String> env;
    final Clock clock;
    /** Whether the streams are a terminal (a person watching), not a pipe or file: colour and progress bars. */
    final boolean terminal;
    /** Folder that relative paths are resolved against; null for the process's working directory. */
    final Path workDir;
    /**
     * The catalog view a long-running process answers from ({@code serve}): commands take a handle on
     * it instead of opening the folder; null for a command line, which opens the catalog itself.
     */
    final org.gatefit.index.Catalog view;

    Context(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock, boolean terminal, Path workDir) {
        this(out, err, env, clock, terminal, workDir, null);
    }

    Context(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock, boolean terminal, Path workDir,
            org.gatefit.index.Catalog view) {
        this.view = view;
        this.out = out;
        this.err = err;
        this.env = Map.copyOf(env);
        this.clock = clock;
        this.terminal = terminal;
        this.workDir = workDir;
    }

    /** A path as typed, resolved against {@link #workDir} when that is set and the path is relative. */
    Path path(Path p) {
        return p == null || workDir == null || p.isAbsolute() ? p : workDir.resolve(p);
    }

    /** Colour on standard output: a terminal, and {@code NO_COLOR} unset or empty (no-color.org). */
    boolean colour() {
        String no = env.get("NO_COLOR");
        return terminal && (no == null || no.isEmpty());
    }

    /** A progress bar on standard error, drawn only on a terminal. */
    Progress progress(String what, long total) {
        return new Progress(err, terminal, what, total);
    }

    /** The per-user data directory's catalog: XDG_DATA_HOME, ~/.local/share, or the platform's equivalent. */
    Path defaultCatalog() {
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        String home = env.getOrDefault("HOME", System.getProperty("user.home", "."));
        if (os.contains("win")) {
            String local = env.get("LOCALAPPDATA");
            return Path.of(local != null ? local : home, "gatefit", "catalog");
        }
        if (os.contains("mac")) {
            return Path.of(home, "Library", "Application Support", "gatefit", "catalog");
        }
        String xdg = env.get("XDG_DATA_HOME");
        return (xdg != null && !xdg.isBlank() ? Path.of(xdg) : Path.of(home, ".local", "share")).resolve("gatefit")
                .resolve("catalog");
    }
}
