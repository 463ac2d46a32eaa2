package org.gatefit.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.commons.text.similarity.LevenshteinDistance;
import org.gatefit.index.Catalog;
import org.gatefit.serve.Questions;
import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * The server's questions answered by the command line itself: the parameters become the command's
 * arguments ({@code bus=48} → {@code --bus=48}, {@code all=true} → {@code --all}), the command runs
 * in-process as {@code main} runs it (same parsing, checks, engine and renderer) on a handle of the
 * server's catalog view, and its output is the answer. Posted files are written into a fresh
 * temporary folder, the command's working folder, under their own (sanitised) names, so messages
 * and reports name them as the user does.
 */
public final class Answers implements Questions {
    /** The commands the server may run. */
    public static final Set<String> COMMANDS = Set.of("find", "show", "shortlist", "explain", "check", "replace",
            "import");

    /** Options the API never takes: where the catalog is, what the process prints, files on the server. */
    private static final Set<String> REFUSED = Set.of("catalog", "verbose", "help", "version", "output", "o",
            "junit", "skip-invalid");

    /** The positional parameter of each command, by the name the API gives it. */
    private static final Map<String, String> POSITIONAL = Map.of("find", "words", "show", "part", "replace", "part",
            "check", "stages", "import", "files");

    private static final Pattern SAFE_NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]{0,99}");

    private final Path catalogDir;
    private final Clock clock;

    /** @param catalogDir the server's catalog folder (where a web import writes) */
    public Answers(Path catalogDir, Clock clock) {
        this.catalogDir = catalogDir;
        this.clock = clock;
    }

    @Override
    public Answer ask(Catalog view, String command, Map<String, List<String>> params, List<Upload> uploads) {
        if (!COMMANDS.contains(command)) {
            throw new IllegalArgumentException("no API command " + command);
        }
        Path work = null;
        try {
            work = Files.createTempDirectory("gatefit-serve-");
            return run(view, command, params, uploads, work);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            if (work != null) {
                delete(work);
            }
        }
    }

    private Answer run(Catalog view, String command, Map<String, List<String>> params, List<Upload> uploads, Path work)
            throws IOException {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter o = new PrintWriter(out, true);
        PrintWriter e = new PrintWriter(err, true);
        Context ctx = new Context(o, e, Map.of("GATEFIT_CATALOG", catalogDir.toString()), clock, false, work,
                "import".equals(command) ? null : view);
        CommandLine cl = Cli.create(ctx, Set.of(command));
        Throwable[] thrown = new Throwable[1];
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            thrown[0] = ex;
            return Cli.handle(ex, cmd, false);
        });
        CommandSpec spec = cl.getSubcommands().get(command).getCommandSpec();
        String format = one(params, "format", "json").toLowerCase(Locale.ROOT);
        boolean junit = format.equals("junit");
        List<String> args;
        try {
            if (junit && !command.equals("check")) {
                throw new UsageException("format junit: only check writes JUnit XML; expected json, text, csv,"
                        + " markdown or html");
            }
            args = arguments(spec, command, params, uploads, work);
        } catch (UsageException ex) {
            return new Answer(ExitCode.USAGE, false, "", "text/plain", List.of(), "gatefit " + command + ": "
                    + ex.getMessage());
        }
        List<String> all = new ArrayList<>();
        all.add(command);
        all.addAll(args);
        int code = cl.execute(all.toArray(String[]::new));
        o.flush();
        e.flush();
        List<String> warnings = new ArrayList<>();
        StringBuilder message = new StringBuilder();
        for (String line : err.toString().split("\\R")) {
            if (line.startsWith("warning: ")) {
                warnings.add(line.substring("warning: ".length()));
            } else if (!line.isBlank() && !line.startsWith("Try '")) {
                message.append(message.length() == 0 ? "" : "\n").append(line);
            }
        }
        boolean failed = code != ExitCode.OK && code != ExitCode.FAILED;
        boolean notFound = thrown[0] instanceof PartNotFoundException;
        String body = out.toString();
        String type = spec.findOption("--format") == null ? "text/plain; charset=utf-8" : mediaType(format);
        if (junit && !failed) {
            body = Files.readString(work.resolve(JUNIT_FILE), StandardCharsets.UTF_8);
        }
        return new Answer(code, notFound, failed ? "" : body, type, warnings, failed ? message.toString() : "");
    }

    private static final String JUNIT_FILE = "gatefit-check.junit.xml";

    private static String mediaType(String format) {
        return switch (format) {
            case "html" -> "text/html; charset=utf-8";
            case "csv" -> "text/csv; charset=utf-8";
            case "markdown" -> "text/markdown; charset=utf-8";
            case "text" -> "text/plain; charset=utf-8";
            case "junit" -> "application/xml; charset=utf-8";
            default -> "application/json; charset=utf-8";
        };
    }

    /** The command's arguments for the parameters and uploads, or a usage error naming what is wrong. */
    static List<String> arguments(CommandSpec spec, String command, Map<String, List<String>> params,
                                  List<Upload> uploads, Path work) throws UsageException, IOException {
        List<String> options = new ArrayList<>();
        if (!params.containsKey("format") && spec.findOption("--format") != null) {
            options.add("--format=json"); // the API's default; the command line's is text
        }
        List<String> positional = new ArrayList<>();
        String positionalName = POSITIONAL.get(command);
        for (Map.Entry<String, List<String>> p : new java.util.TreeMap<>(params).entrySet()) {
            String name = p.getKey();
            List<String> values = p.getValue();
            if (name.equals("format")) {
                if (spec.findOption("--format") == null) {
                    throw new UsageException("parameter 'format': " + command + " has one output only");
                }
                String f = one(params, "format", "json").toLowerCase(Locale.ROOT);
                if (!f.equals("junit")) {
                    options.add("--format=" + f);
                }
                continue;
            }
            if (name.equals(positionalName) && !isFile(spec)) {
                for (String v : values) {
                    if (command.equals("find")) {
                        positional.addAll(Stream.of(v.strip().split("\\s+")).filter(w -> !w.isEmpty()).toList());
                    } else {
                        positional.add(v);
                    }
                }
                continue;
            }
            OptionSpec opt = spec.findOption("--" + name);
            if (REFUSED.contains(name) || opt == null || name.length() < 2) {
                List<String> known = known(spec, command);
                String near = nearest(name, known);
                throw new UsageException("unknown parameter '" + name + "'" + (near == null ? "" : " (did you mean '"
                        + near + "'?)") + "; expected one of " + String.join(", ", known));
            }
            if (Path.class.equals(opt.type()) || opt.type() == List.class && opt.auxiliaryTypes()[0] == Path.class) {
                throw new UsageException("parameter '" + name + "' names a file: post it as the multipart field '"
                        + name + "' instead");
            }
            if (opt.arity().max() == 0) {
                String v = values.size() == 1 ? values.get(0).strip().toLowerCase(Locale.ROOT) : "?";
                if (v.equals("true") || v.isEmpty()) {
                    options.add("--" + name);
                } else if (!v.equals("false")) {
                    throw new UsageException("parameter '" + name + "': expected true or false, got '"
                            + String.join(",", values) + "'");
                }
                continue;
            }
            if (!opt.isMultiValue() && values.size() > 1) {
                throw new UsageException("parameter '" + name + "' given " + values.size() + " times; expected once");
            }
            for (String v : values) {
                options.add("--" + name + "=" + v);
            }
        }
        for (Upload u : uploads) {
            String file = fileName(u, work);
            Files.write(work.resolve(file), u.content());
            if (u.field().equals(positionalName)) {
                positional.add(file);
            } else {
                OptionSpec opt = spec.findOption("--" + u.field());
                if (opt == null || !Path.class.equals(opt.type()) || REFUSED.contains(u.field())) {
                    throw new UsageException("unexpected file field '" + u.field() + "'; expected "
                            + (positionalName == null ? "none" : positionalName) + " or a file option of " + command);
                }
                options.add("--" + u.field() + "=" + file);
            }
        }
        if (command.equals("check") && "junit".equalsIgnoreCase(one(params, "format", "json"))) {
            options.add("--junit=" + JUNIT_FILE);
            options.add("--format=json");
        }
        List<String> args = new ArrayList<>(options);
        if (!positional.isEmpty()) {
            args.add("--");
            args.addAll(positional);
        }
        return args;
    }

    /** Whether the command's positional parameter is a file (check, import): then it comes as an upload. */
    private static boolean isFile(CommandSpec spec) {
        for (PositionalParamSpec p : spec.positionalParameters()) {
            if (p.type() == Path.class || p.type() == List.class && p.auxiliaryTypes()[0] == Path.class) {
                return true;
            }
        }
        return false;
    }

    /** The parameter names the API takes for a command. */
    static List<String> known(CommandSpec spec, String command) {
        Set<String> names = new TreeSet<>();
        for (OptionSpec o : spec.options()) {
            String n = o.longestName().replaceFirst("^-+", "");
            if (!REFUSED.contains(n) && o.type() != Path.class) {
                names.add(n);
            }
        }
        if (POSITIONAL.containsKey(command) && !isFile(spec)) {
            names.add(POSITIONAL.get(command));
        }
        return List.copyOf(names);
    }

    /**
     * The accepted name nearest to a misspelt one by edit distance (Commons Text's Levenshtein, as
     * the "nearest" part numbers), case ignored, at most a third of its length apart (at least 2,
     * at most 3); the first in order on a tie; null when none is that near.
     */
    static String nearest(String name, List<String> known) {
        String key = name.toLowerCase(Locale.ROOT);
        int most = Math.min(3, Math.max(2, key.length() / 3));
        LevenshteinDistance distance = new LevenshteinDistance(most);
        String best = null;
        int bestD = Integer.MAX_VALUE;
        for (String k : known) {
            int d = distance.apply(key, k);
            if (d >= 0 && d < bestD) {
                best = k;
                bestD = d;
            }
        }
        return best;
    }

    /** A posted file's name as the reports will give it: its own name when plain, else the field's. */
    private static String fileName(Upload u, Path work) throws UsageException {
        String given = u.fileName() == null ? "" : u.fileName().substring(u.fileName().replace('\\', '/')
                .lastIndexOf('/') + 1);
        String name = SAFE_NAME.matcher(given).matches() ? given : u.field() + ".csv";
        if (Files.exists(work.resolve(name))) {
            name = u.field() + "-" + name;
        }
        if (Files.exists(work.resolve(name)) || name.equals(JUNIT_FILE)) {
            throw new UsageException("two posted files named '" + name + "'");
        }
        return name;
    }

    private static String one(Map<String, List<String>> params, String name, String otherwise) {
        List<String> v = params.get(name);
        return v == null || v.isEmpty() ? otherwise : v.get(0);
    }

    private static void delete(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException ignored) {
            // a temporary folder left behind is not the user's data
        }
    }
}
