package org.gatefit.cli;

import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

@Command(name = "completion", mixinStandardHelpOptions = true,
        header = "Print a shell completion script for gatefit (bash, and zsh through bashcompinit).",
        description = {"Writes a completion script for every command and option to standard output. Load it in the"
            + " current shell with 'source <(gatefit completion)', or install it, e.g."
            + " 'gatefit completion > ~/.local/share/bash-completion/completions/gatefit'. The script calls a"
            + " command named gatefit: put a wrapper script of that name (java -jar .../gatefit.jar \"$@\") on"
            + " the PATH."})
final class CompletionCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    private final Context ctx;

    CompletionCommand(Context ctx) {
        this.ctx = ctx;
    }

    @Override
    public Integer call() {
        ctx.out.print(AutoComplete.bash("gatefit", spec.root().commandLine()));
        ctx.out.flush();
        return ExitCode.OK;
    }
}
