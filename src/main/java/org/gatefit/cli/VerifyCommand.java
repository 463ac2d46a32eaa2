package org.gatefit.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.gatefit.index.Catalog;
import picocli.CommandLine.Command;

@Command(name = "verify", mixinStandardHelpOptions = true,
        header = "Check every checksum of the catalog's files and say what to do if one is damaged.",
        description = {"Reads every file of the catalog's last import and checks its checksum, then runs Lucene's"
                + " index checker over every segment. Changes nothing. Exit 0: the catalog is sound; exit 4: it is"
                + " damaged (the message names the files and what to do), missing, or an import is running."})
final class VerifyCommand extends CatalogCommand implements Callable<Integer> {

    VerifyCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        Path dir = catalogDir();
        Catalog.Verification v = Catalog.verify(dir);
        ctx.out.printf("catalog: %s%n", dir);
        ctx.out.printf("sound: %d files (%,d bytes), every checksum matches; %d segments checked by Lucene's index"
                + " checker; %d parts%n", v.files(), v.bytes(), v.segments(), v.parts());
        ctx.out.flush();
        return ExitCode.OK;
    }
}
