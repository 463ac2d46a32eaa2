package org.gatefit.index;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FilterDirectory;
import org.apache.lucene.store.IOContext;
import org.apache.lucene.store.IndexOutput;

/**
 * The child JVM of {@link ImportKillTest}: runs one import ({@code --replace}) and, at the chosen
 * moment, prints {@code AT moment} and stops for good, to be killed there. Arguments: catalog
 * folder, moment ({@link #MOMENTS}), CSV files. Prints {@code FINISHED} if the import ends first.
 */
final class ImportChild {
    /** Moments of an import, in order; the last three come after the new commit point is on disk. */
    static final List<String> MOMENTS = List.of(
            "row",       // rows being parsed and indexed (row 400 taken)
            "segment",   // the tenth index file being created, earlier ones partly written
            "pending",   // the commit file about to be created (every segment written)
            "sync",      // the new files being made durable (fsync), commit file written under its pending name
            "rename",    // the commit file about to get its final name: the commit point
            "renamed",   // renamed: the new commit is the catalog, the old one's files not yet deleted
            "delete",    // the old commit's files being deleted
            "done");     // the import returned (clean-up done)
    /** The moments at which the catalog must still be the old one. */
    static final List<String> BEFORE_COMMIT = MOMENTS.subList(0, 5);
    static final Clock CLOCK = Clock.fixed(Instant.parse("2030-01-02T03:04:05Z"), ZoneOffset.UTC);
    static final int THREADS = 2;
    static final int CHUNK_ROWS = 300;

    private ImportChild() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args[0]);
        String moment = args[1];
        if (!MOMENTS.contains(moment)) {
            throw new IllegalArgumentException("expected a moment of " + MOMENTS + ", got " + moment);
        }
        List<Path> files = new ArrayList<>();
        for (int i = 2; i < args.length; i++) {
            files.add(Path.of(args[i]));
        }
        importInto(dir, files, moment);
        if (moment.equals("done")) {
            stop(moment);
        }
        System.out.println("FINISHED");
        System.out.flush();
    }

    /** The import the test runs, here and (with moment null) to completion in the test's own JVM. */
    static Importer.Result importInto(Path dir, List<Path> files, String moment) throws Exception {
        Importer importer = new Importer(dir, CLOCK, THREADS, CHUNK_ROWS);
        if (moment != null) {
            importer.withDirectory(d -> new Stopping(d, moment));
        }
        return importer.run(files, files.stream().map(Path::toString).toList(), new Importer.Options(null, true, null),
                n -> {
                    if (n == 400 && "row".equals(moment)) {
                        stop(moment);
                    }
                });
    }

    /** Says where it is and waits to be killed. */
    static void stop(String moment) {
        System.out.println("AT " + moment);
        System.out.flush();
        while (true) {
            try {
                Thread.sleep(60_000);
            } catch (InterruptedException e) {
                // keep waiting: only a kill ends this process
            }
        }
    }

    /** Stops at the chosen moment's file operation. */
    private static final class Stopping extends FilterDirectory {
        private final String moment;
        private final AtomicInteger created = new AtomicInteger();
        private final AtomicBoolean renamed = new AtomicBoolean();

        Stopping(Directory in, String moment) {
            super(in);
            this.moment = moment;
        }

        @Override
        public IndexOutput createOutput(String name, IOContext context) throws IOException {
            if (moment.equals("segment") && name.startsWith("_") && created.incrementAndGet() == 10) {
                stop(moment);
            }
            if (moment.equals("pending") && name.startsWith("pending_segments_")) {
                stop(moment);
            }
            return in.createOutput(name, context);
        }

        @Override
        public void sync(Collection<String> names) throws IOException {
            if (moment.equals("sync")) {
                stop(moment);
            }
            in.sync(names);
        }

        @Override
        public void rename(String source, String dest) throws IOException {
            if (moment.equals("rename")) {
                stop(moment);
            }
            in.rename(source, dest);
            renamed.set(true);
            if (moment.equals("renamed")) {
                stop(moment);
            }
        }

        @Override
        public void deleteFile(String name) throws IOException {
            if (moment.equals("delete") && renamed.get()) {
                stop(moment);
            }
            in.deleteFile(name);
        }
    }
}
