package org.gatefit.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import picocli.AutoComplete;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;
import picocli.CommandLine.Spec;

@Command(name = "completion", mixinStandardHelpOptions = true,
        header = "Print a shell completion script for gatefit (bash, and zsh through bashcompinit).",
        description = {"Writes a completion script for every command and option to standard output. Load it in the"
            + " current shell with 'source <(gatefit completion)', or install it, e.g."
            + " 'gatefit completion > ~/.local/share/bash-completion/completions/gatefit'. The script calls a"
            + " command named gatefit: put a wrapper script of that name (java -jar .../gatefit.jar \"$@\") on"
            + " the PATH. Part numbers are completed from the catalog the command line names (--catalog DIR),"
            + " else $GATEFIT_CATALOG, else the per-user one, by asking gatefit on each Tab."})
final class CompletionCommand implements Callable<Integer> {
    /** The parameter label that marks an option or positional whose value is a catalog part number. */
    static final String PART_LABEL = "PART";

    @Spec
    CommandSpec spec;

    private final Context ctx;

    CompletionCommand(Context ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() {
        CommandLine root = spec.root().commandLine();
        ctx.out.print(withPartNumbers(AutoComplete.bash("gatefit", root), partValues(root)));
        ctx.out.flush();
        return ExitCode.OK;
    }

    /**
     * An option or positional whose value is a part number.
     *
     * @param command the subcommand
     * @param option  the option's names, or empty for the command's positional {@code PART}
     * @param kind    the kind of part, or null for either (narrowed by {@code --kind} on the line)
     */
    record PartValue(String command, List<String> option, Kind kind) {
        PartValue {
            option = List.copyOf(option);
        }
    }

    /**
     * Every value labelled {@value #PART_LABEL} in the subcommands: an option named after a kind
     * ({@code --switch}, {@code --driver}) takes a part of that kind; any other, and a positional,
     * either kind.
     */
    static List<PartValue> partValues(CommandLine root) {
        List<PartValue> out = new ArrayList<>();
        for (CommandLine sub : root.getSubcommands().values()) {
            CommandSpec s = sub.getCommandSpec();
            if (s.usageMessage().hidden()) {
                continue;
            }
            for (ArgSpec a : s.args()) {
                if (!PART_LABEL.equals(a.paramLabel())) {
                    continue;
                }
                if (a instanceof OptionSpec o) {
                    out.add(new PartValue(s.name(), List.of(o.names()), kindNamed(o.longestName())));
                } else if (a instanceof PositionalParamSpec p) {
                    if (p.index().min() != 0) {
                        throw new IllegalStateException("expected PART as the first positional of " + s.name());
                    }
                    out.add(new PartValue(s.name(), List.of(), null));
                }
            }
        }
        return out;
    }

    private static Kind kindNamed(String option) {
        String name = option.replaceFirst("^-+", "").toLowerCase(Locale.ROOT);
        for (Kind k : Kind.values()) {
            if (k.isPart() && k.id().equals(name)) {
                return k;
            }
        }
        return null;
    }

    /**
     * The bash functions that fill COMPREPLY with part numbers: the catalog is the line's
     * {@code --catalog DIR} (a leading ~ expanded), else gatefit's own default ($GATEFIT_CATALOG,
     * else the per-user one); the kind is the argument, else the line's {@code --kind}, else either.
     * Standard error is dropped: completion never writes into the command line.
     */
    static final String FUNCTIONS = """
            # gatefit: part numbers from the catalog, asked of 'gatefit part-numbers' on each Tab.
            # _gatefit_part_numbers [KIND]: COMPREPLY gets the part numbers starting with the current word.
            function _gatefit_part_numbers() {
              local curr_word=${COMP_WORDS[COMP_CWORD]}
              local kind=$1 args=() i w p q
              for (( i=1; i<COMP_CWORD; i++ )); do
                w=${COMP_WORDS[i+1]}
                if [ "$w" = "=" ]; then w=${COMP_WORDS[i+2]}; fi
                case ${COMP_WORDS[i]} in
                  --catalog) args=(--catalog "${w/#\\~/$HOME}") ;;
                  --catalog=*) w=${COMP_WORDS[i]#--catalog=}; args=(--catalog "${w/#\\~/$HOME}") ;;
                  --kind) if [ -z "$1" ]; then kind=$w; fi ;;
                esac
              done
              args+=(part-numbers)
              if [ -n "$kind" ]; then args+=(--kind "$kind"); fi
              COMPREPLY=()
              while IFS= read -r p; do
                printf -v q %q "$p"
                COMPREPLY+=("$q")
              done < <(gatefit "${args[@]}" -- "${curr_word}" 2>/dev/null)
              return 0
            }

            # _gatefit_positional_index COMMAND ARG_OPTS: which positional the current word is (0: the first),
            # skipping options and the values of ARG_OPTS (names as the picocli function quotes them).
            function _gatefit_positional_index() {
              local n=0 i w skip=0 seen=0
              for (( i=1; i<COMP_CWORD; i++ )); do
                w=${COMP_WORDS[i]}
                if [ $seen = 0 ]; then
                  if [ "$w" = "$1" ]; then seen=1; fi
                  continue
                fi
                if [ $skip = 1 ]; then skip=0; continue; fi
                if [ "$w" = "=" ]; then skip=1; continue; fi
                case " $2 " in
                  *" '$w' "*) skip=1; continue ;;
                esac
                case $w in
                  -*) ;;
                  *) n=$((n + 1)) ;;
                esac
              done
              echo "$n"
            }

            """;

    /**
     * picocli's script with {@code parts} completed by {@link #FUNCTIONS}: the case branch of an
     * option (which completes nothing) calls them, and a command whose first positional is a part
     * calls them for that word. Throws when picocli's script no longer has the expected shape, so a
     * picocli upgrade that changes it fails the completion tests instead of silently dropping parts.
     */
    static String withPartNumbers(String script, List<PartValue> parts) {
        String anchor = "# Define a completion specification";
        String s = replaceOnce(script, "\n" + anchor, "\n" + FUNCTIONS + anchor, "the compspec comment");
        for (PartValue p : parts) {
            String fn = "function _picocli_gatefit_" + p.command() + "() {\n";
            int start = s.indexOf(fn);
            int end = start < 0 ? -1 : s.indexOf("\n}\n", start);
            if (end < 0) {
                throw new IllegalStateException("picocli's script has no function for " + p.command());
            }
            String body = s.substring(start, end);
            String call = p.kind() == null ? "_gatefit_part_numbers" : "_gatefit_part_numbers " + p.kind().id();
            if (p.option().isEmpty()) {
                body = replaceOnce(body, "    local positionals=\"\"\n",
                        "    if [ \"$(_gatefit_positional_index " + p.command() + " \"${arg_opts}\")\" = 0 ]; then\n"
                        + "      " + call + "\n"
                        + "      return $?\n"
                        + "    fi\n"
                        + "    local positionals=\"\"\n", p.command() + "'s positionals");
            } else {
                String label = "    " + String.join("|", p.option().stream().map(n -> "'" + n + "'").toList()) + ")\n";
                body = replaceOnce(body, label + "      return\n",
                        label + "      " + call + "\n      return $?\n",
                        p.command() + " " + p.option());
            }
            s = s.substring(0, start) + body + s.substring(end);
        }
        return s;
    }

    private static String replaceOnce(String text, String find, String with, String what) {
        int at = text.indexOf(find);
        if (at < 0 || text.indexOf(find, at + 1) >= 0) {
            throw new IllegalStateException("expected one place for " + what + " in picocli's completion script");
        }
        return text.substring(0, at) + with + text.substring(at + find.length());
    }
}
