package org.gatefit.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.FileSystemException;
import java.nio.file.Path;
import java.nio.file.NoSuchFileException;
import java.time.Clock;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.failure.Failure;
import org.gatefit.report.Format;
import picocli.CommandLine;

/** Builds the command line; {@code main} and the tests both use {@link #create}. */
public final class Cli {
    private Cli() {
    }

    /** A ready command line writing results to {@code out} and messages to {@code err}, neither a terminal. */
    public static CommandLine create(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock) {
        return create(out, err, env, clock, false);
    }

    /**
     * A ready command line; {@code terminal} says the streams are a terminal, which allows verdict
     * colour (unless {@code NO_COLOR} is set or results go to a file) and progress bars.
     */
    public static CommandLine create(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock,
                                     boolean terminal) {
        return create(out, err, env, clock, terminal, null);
    }

    /** As above, with relative paths resolved against {@code workDir} (the demo runs in a temporary folder). */
    static CommandLine create(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock, boolean terminal,
                              Path workDir) {
        return create(out, err, env, clock, terminal, workDir, null);
    }

    /** The subcommands, by name, in the order help lists them. */
    private static final List<String> COMMANDS = List.of("import", "validate", "info", "find", "show", "export",
            "shortlist", "explain", "check", "replace", "verify", "serve", "demo", "completion", "part-numbers");

    private static Object command(String name, Context ctx) {
        return switch (name) {
            case "import" -> new ImportCommand(ctx);
            case "validate" -> new ValidateCommand(ctx);
            case "info" -> new InfoCommand(ctx);
            case "find" -> new FindCommand(ctx);
            case "show" -> new ShowCommand(ctx);
            case "export" -> new ExportCommand(ctx);
            case "shortlist" -> new ShortlistCommand(ctx);
            case "explain" -> new ExplainCommand(ctx);
            case "check" -> new CheckCommand(ctx);
            case "replace" -> new ReplaceCommand(ctx);
            case "verify" -> new VerifyCommand(ctx);
            case "serve" -> new ServeCommand(ctx);
            case "demo" -> new DemoCommand(ctx);
            case "completion" -> new CompletionCommand(ctx);
            case "part-numbers" -> new PartNumbersCommand(ctx);
            default -> throw new IllegalArgumentException("no command " + name);
        };
    }

    /**
     * The subcommands a run with {@code args} can reach: those named anywhere in the arguments
     * (building a subcommand's model from its annotations is most of picocli's start-up, some
     * 15 ms each), or every one when none is named (top-level help, a misspelt command, which
     * picocli then answers with the list) or for {@code completion} (it describes them all).
     */
    static Set<String> reachable(String... args) {
        Set<String> named = new LinkedHashSet<>();
        for (String a : args) {
            if (COMMANDS.contains(a)) {
                named.add(a);
            }
        }
        return named.isEmpty() || named.contains("completion") || named.contains("demo") ? Set.copyOf(COMMANDS) : named;
    }

    /** @param only the subcommands to build (null: all) */
    static CommandLine create(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock, boolean terminal,
                              Path workDir, Set<String> only) {
        return create(new Context(out, err, env, clock, terminal, workDir), only);
    }

    /** @param only the subcommands to build (null: all) */
    static CommandLine create(Context ctx, Set<String> only) {
        PrintWriter out = ctx.out;
        PrintWriter err = ctx.err;
        GatefitCommand top = new GatefitCommand();
        CommandLine cl = new CommandLine(top);
        for (String name : COMMANDS) {
            if (only == null || only.contains(name)) {
                cl.addSubcommand(name, command(name, ctx));
            }
        }
        offerOnlyFormatsMade(cl);
        completeOperatingPointChoices(cl);
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setUsageHelpWidth(100);
        cl.setExecutionStrategy(parsed -> {
            rejectHtml(parsed);
            checkFiles(parsed, ctx);
            try {
                return new CommandLine.RunLast().execute(parsed);
            } catch (Error e) { // picocli hands only exceptions to the handler below
                CommandLine.ParseResult last = parsed;
                while (last.hasSubcommand()) {
                    last = last.subcommand();
                }
                return handle(e, last.commandSpec().commandLine(), top.verbose);
            }
        });
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> handle(ex, cmd, top.verbose));
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("gatefit: " + ex.getMessage());
            suggest(ex, c);
            c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help' for the options.");
            c.getErr().flush();
            return ExitCode.USAGE;
        });
        return cl;
    }

    /**
     * The nearest commands or options to a misspelt one ({@code shortlst}, {@code --swich}), as
     * picocli suggests them; also when another error (a required option missing because it was
     * misspelt) was reported first.
     */
    private static void suggest(CommandLine.ParameterException ex, CommandLine c) {
        CommandLine.UnmatchedArgumentException unmatched = ex instanceof CommandLine.UnmatchedArgumentException u ? u
                : null;
        if (unmatched == null && c.getParseResult() != null && !c.getParseResult().unmatched().isEmpty()) {
            unmatched = new CommandLine.UnmatchedArgumentException(c, c.getParseResult().unmatched());
        }
        if (unmatched != null && !unmatched.getSuggestions().isEmpty()) {
            if (unmatched != ex) {
                c.getErr().println("gatefit: not understood: " + String.join(" ", unmatched.getUnmatched()));
            }
            unmatched.printSuggestions(c.getErr());
        } else if (unmatched != null) {
            // picocli suggests by its own similarity, which misses a swapped pair of letters (--bsu):
            // the nearest option by edit distance, as the nearest part numbers are found.
            List<String> options = new java.util.ArrayList<>();
            for (CommandLine.Model.OptionSpec o : c.getCommandSpec().options()) {
                for (String n : o.names()) {
                    if (n.startsWith("--")) {
                        options.add(n.substring(2));
                    }
                }
            }
            java.util.Set<String> near = new java.util.LinkedHashSet<>();
            for (String arg : unmatched.getUnmatched()) {
                if (arg.startsWith("--") && arg.length() > 3) {
                    String n = Answers.nearest(arg.substring(2).replaceFirst("=.*", ""), options);
                    if (n != null) {
                        near.add("--" + n);
                    }
                }
            }
            if (!near.isEmpty()) {
                c.getErr().println("Did you mean: " + String.join(" or ", near) + "?");
            }
        }
    }

    /** Runs with the real streams and environment. */
    public static int run(String... args) {
        PrintWriter out = StdoutWriter.of(new java.io.FileOutputStream(java.io.FileDescriptor.out));
        PrintWriter err = new PrintWriter(System.err, true);
        // System.console() is non-null only when standard input and output are a terminal.
        // The local zone: report headers give the local time with its offset; imports record instants.
        return run(out, err, System.getenv(), Clock.systemDefaultZone(), System.console() != null, args);
    }

    /**
     * Runs as {@code main} does with the given streams; a write to {@code out} that failed (disk
     * full, closed pipe) makes it exit 4 with one message, whatever the command.
     */
    static int run(PrintWriter out, PrintWriter err, Map<String, String> env, Clock clock, boolean terminal,
                   String... args) {
        int code = create(out, err, env, clock, terminal, null, reachable(args)).execute(args);
        out.flush();
        if (out.checkError()) {
            IOException why = out instanceof StdoutWriter s ? s.failure() : null;
            String command = java.util.Arrays.stream(args).filter(COMMANDS::contains).findFirst().map(c -> " " + c)
                    .orElse("");
            err.println("gatefit" + command + ": cannot write to standard output: "
                    + (why == null ? "a write failed" : WriteFailedException.reason(why)) + " (the output is incomplete)");
            code = ExitCode.ENVIRONMENT;
        }
        err.flush();
        return code;
    }

    /** {@link FileArgs#check}, its refusals handled as a command's exceptions (exit 2 or 3). */
    private static void checkFiles(CommandLine.ParseResult parsed, Context ctx) {
        try {
            FileArgs.check(parsed, ctx);
        } catch (UsageException | CatalogDataException e) {
            CommandLine.ParseResult last = parsed;
            while (last.hasSubcommand()) {
                last = last.subcommand();
            }
            throw new CommandLine.ExecutionException(last.commandSpec().commandLine(), e.getMessage(), e);
        }
    }

    /**
     * The operating-point options with a fixed set of values ({@code --side}, {@code --logic},
     * {@code --pwm}, {@code --bridge}) complete to their stage-sheet column's choices, in every command
     * that has them.
     */
    private static void completeOperatingPointChoices(CommandLine cl) {
        java.util.Map<String, List<String>> choices = new java.util.LinkedHashMap<>();
        for (String[] c : OperatingPointOptions.COLUMNS) {
            choices.put(c[0], OperatingPointOptions.completionCandidates(c[0]));
        }
        // Other options with a fixed set of values, each from the one place that defines them.
        choices.put("--topology", org.gatefit.catalog.Schema.of(org.gatefit.catalog.Kind.DRIVER).column("topology")
                .map(org.gatefit.catalog.Column::choices).orElse(List.of()));
        choices.put("--kind", java.util.Arrays.stream(org.gatefit.catalog.Kind.values())
                .map(org.gatefit.catalog.Kind::id).toList());
        choices.put("--csv-style", java.util.Arrays.stream(org.gatefit.report.CsvStyle.values())
                .map(v -> v.name().toLowerCase(java.util.Locale.ROOT)).toList());
        for (CommandLine sub : cl.getSubcommands().values()) {
            CommandLine.Model.CommandSpec spec = sub.getCommandSpec();
            for (java.util.Map.Entry<String, List<String>> e : choices.entrySet()) {
                CommandLine.Model.OptionSpec o = spec.findOption(e.getKey());
                if (o == null || e.getValue().isEmpty() || o.completionCandidates() != null) {
                    continue;
                }
                spec.remove(o);
                spec.addOption(CommandLine.Model.OptionSpec.builder(o).completionCandidates(e.getValue()).build());
            }
        }
    }

    /**
     * A command offers (in its help and in completion) only the formats it makes — HTML only where
     * it has an HTML report, SPICE only for {@code explain}: its {@code --format} option is rebuilt
     * with those candidates, bound to the same field.
     */
    private static void offerOnlyFormatsMade(CommandLine cl) {
        for (CommandLine sub : cl.getSubcommands().values()) {
            CommandLine.Model.CommandSpec spec = sub.getCommandSpec();
            CommandLine.Model.OptionSpec format = spec.findOption("--format");
            if (format == null) {
                continue;
            }
            List<String> made = java.util.Arrays.stream(Format.values()).filter(f -> f.madeBy(spec.name()))
                    .map(f -> f.name().toLowerCase(java.util.Locale.ROOT)).toList();
            spec.remove(format);
            spec.addOption(CommandLine.Model.OptionSpec.builder(format).completionCandidates(made)
                    .description("Output format: " + String.join(", ", made) + " (default: ${DEFAULT-VALUE}).").build());
        }
    }

    /** {@code --format html} or {@code spice} on a command that does not make it is a usage error (exit 2), before any work. */
    private static void rejectHtml(CommandLine.ParseResult parsed) {
        CommandLine.ParseResult last = parsed;
        while (last.hasSubcommand()) {
            last = last.subcommand();
        }
        CommandLine.Model.OptionSpec format = last.commandSpec().findOption("--format");
        if (format != null && last.hasMatchedOption("--format") && format.getValue() instanceof Format f
                && !f.madeBy(last.commandSpec().name())) {
            throw new CommandLine.ParameterException(last.commandSpec().commandLine(), "--format " + f + " is not available"
                    + " for " + last.commandSpec().name() + "; " + (f == Format.HTML ? "HTML reports are" : "SPICE netlists"
                    + " are") + " made by " + String.join(", ", f.commands()));
        }
    }

    /**
     * Prints a failure and gives its exit code: a {@link Failure} as its kind says; a file that does
     * not exist is bad input (3); any other I/O problem is the environment's (4); anything else is a
     * bug in gatefit ({@link ExitCode#INTERNAL}), with a request for a report. Stack traces only
     * under {@code --verbose}.
     */
    static int handle(Throwable thrown, CommandLine cmd, boolean verbose) {
        PrintWriter err = cmd.getErr();
        String name = cmd.getCommandName();
        Throwable ex = thrown instanceof UncheckedIOException u && u.getCause() != null ? u.getCause() : thrown;
        int code;
        if (ex instanceof Failure f) {
            err.println(f.report(name));
            code = f.exitCode();
        } else if (ex instanceof NoSuchFileException e) {
            err.println("gatefit " + name + ": no such file: " + e.getFile());
            code = ExitCode.BAD_DATA;
        } else if (ex instanceof IOException e) {
            err.println("gatefit " + name + ": " + ioProblem(e));
            code = ExitCode.ENVIRONMENT;
        } else {
            err.println("gatefit " + name + ": internal error: " + ex);
            err.println("This is a bug in gatefit: please report it with the command line and the --verbose output"
                    + (verbose ? " below." : " (run the same command again with --verbose for it)."));
            code = ExitCode.INTERNAL;
        }
        if (verbose) {
            thrown.printStackTrace(err);
        }
        err.flush();
        return code;
    }

    /** An I/O problem in words: which file and why, when the JDK says so. */
    static String ioProblem(IOException e) {
        if (e instanceof FileSystemException fs && fs.getFile() != null) {
            String reason = fs.getReason() != null ? fs.getReason() : words(fs.getClass().getSimpleName());
            return "cannot read or write " + fs.getFile() + (fs.getOtherFile() == null ? "" : " or " + fs.getOtherFile())
                    + ": " + reason + " (expected a path gatefit may read and write; check it and its permissions)";
        }
        return "input/output error: " + (e.getMessage() == null ? words(e.getClass().getSimpleName()) : e.getMessage())
                + " (check the disk, its free space and the paths given)";
    }

    /** {@code AccessDeniedException} → {@code access denied}. */
    private static String words(String className) {
        String s = className.endsWith("Exception") ? className.substring(0, className.length() - "Exception".length())
                : className;
        return s.replaceAll("(?<=[a-z])(?=[A-Z])", " ").toLowerCase(java.util.Locale.ROOT);
    }
}
