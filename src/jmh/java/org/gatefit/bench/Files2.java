package org.gatefit.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Clock;
import java.util.Map;
import org.gatefit.cli.Cli;

/** Helpers the benchmarks share. */
final class Files2 {
    private Files2() {
    }

    static void delete(Path root) throws IOException {
        if (!Files.exists(root)) {
            return;
        }
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path f, BasicFileAttributes a) throws IOException {
                Files.delete(f);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                Files.delete(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }

    /** Runs gatefit in process as {@code main} does, output discarded; fails on a usage or data error. */
    static int gatefit(String... args) {
        StringWriter err = new StringWriter();
        int code = Cli.create(new PrintWriter(Writer.nullWriter()), new PrintWriter(err, true), Map.of(),
                Clock.systemUTC()).execute(args);
        if (code > 1) {
            throw new IllegalStateException("gatefit exited " + code + ": " + err);
        }
        return code;
    }
}
