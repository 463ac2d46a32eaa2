package org.gatefit.index;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.apache.lucene.codecs.CodecUtil;
import org.apache.lucene.index.IndexFileNames;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.FilterDirectory;
import org.apache.lucene.store.IOContext;
import org.apache.lucene.store.IndexOutput;

/**
 * The catalog folder is gatefit's alone. A catalog is made only in a new or empty folder, and
 * {@link #MARKER} is written into it first; a folder holding other files and no marker is refused
 * before anything is touched. A catalog written by an older version (no marker, but an index
 * whose commit carries gatefit's {@link Fields#FORMAT_KEY}) is adopted: readers take it as it is,
 * the next import writes the marker.
 *
 * <p>Lucene deletes every file of its name patterns that no commit refers to ({@code _notes.txt}
 * matches them), and a file named {@code segments_…} it cannot parse stops it. So gatefit shows
 * Lucene only its own files ({@link Own}): for reading, names Lucene could have written; for
 * writing, of those only the files a commit refers to, the files this import creates, the files an
 * interrupted import created ({@link #JOURNAL}, appended before each file is made) and files that
 * begin with Lucene's file header. A file of the user's is never listed, so never deleted.
 */
final class CatalogFolder {
    /** Written when a catalog is made; its presence says the folder is gatefit's. */
    static final String MARKER = "gatefit-catalog.txt";
    /** Names of the files an import creates, appended as they are made; removed when the import is over. */
    static final String JOURNAL = "gatefit-import-files.txt";
    /** Held by an import from before it looks at the folder until its last clean-up. */
    static final String LOCK = "gatefit-import.lock";

    /** A commit point, or a commit being written. */
    private static final Pattern SEGMENTS = Pattern.compile("(pending_)?segments_[0-9a-z]+");
    private static final Pattern COMMIT = Pattern.compile("segments_[0-9a-z]+");

    /** What a folder holds, once {@link #inspect} has accepted it. */
    enum State {
        /** Missing or empty: an import makes a catalog there; readers find no data. */
        NONE,
        /** Marked as a catalog (it may hold no commit yet). */
        CATALOG,
        /** An unmarked catalog of an older gatefit: read as it is, marked by the next import. */
        UNMARKED
    }

    private CatalogFolder() {
    }

    /**
     * What {@code dir} holds, without changing anything.
     *
     * @throws CatalogFormatException  when it is a file, a folder of other files, or an index gatefit did not write
     * @throws CatalogStorageException when it holds an unmarked index whose commit cannot be read
     */
    static State inspect(Path dir) throws IOException {
        if (!Files.exists(dir)) {
            return State.NONE;
        }
        if (!Files.isDirectory(dir)) {
            throw new CatalogFormatException(dir + " is a file, not a catalog folder: give --catalog a folder"
                    + " (a new or empty one to start a catalog)");
        }
        List<String> names = list(dir);
        if (names.contains(MARKER)) {
            return State.CATALOG;
        }
        List<String> others = new ArrayList<>();
        boolean commit = false;
        for (String n : names) {
            if (!n.equals(IndexWriter.WRITE_LOCK_NAME) && !n.equals(LOCK)) { // left by an import that stopped
                others.add(n);
                commit |= COMMIT.matcher(n).matches();
            }
        }
        if (others.isEmpty()) {
            return State.NONE;
        }
        if (commit) {
            Map<String, String> data;
            try (Directory d = new Own(FSDirectory.open(dir), null)) {
                data = SegmentInfos.readLatestCommit(d).getUserData();
            } catch (IOException e) {
                throw CatalogStorageException.reading(dir, e);
            }
            if (data.containsKey(Fields.FORMAT_KEY)) {
                return State.UNMARKED;
            }
            Catalog.checkFormat(dir, data);
        }
        String some = String.join(", ", others.subList(0, Math.min(3, others.size())))
                + (others.size() > 3 ? ", …" : "");
        throw new CatalogFormatException(dir + " is not a gatefit catalog: it holds other files (" + some
                + ") and no " + MARKER + "; nothing was changed. Give --catalog a new or empty folder for a new"
                + " catalog, or the folder of an existing one");
    }

    /** The folder's entries, sorted. */
    private static List<String> list(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /** Writes the marker (durably) unless it is there; {@code dir} must exist. */
    static void mark(Path dir) throws IOException {
        Path m = dir.resolve(MARKER);
        byte[] text = ("This folder is a gatefit catalog.\n"
                + "gatefit owns every file in it: do not add, change or remove files here.\n"
                + "To start again, import your CSV files into a new folder, or delete this whole folder.\n")
                .getBytes(StandardCharsets.UTF_8);
        try (FileChannel ch = FileChannel.open(m, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE)) {
            ByteBuffer b = ByteBuffer.wrap(text);
            while (b.hasRemaining()) {
                ch.write(b);
            }
            ch.force(true);
        } catch (FileAlreadyExistsException e) {
            // marked already
        }
    }

    /** Whether Lucene could have written a file of this name (anything else is never shown to it). */
    static boolean luceneName(String name) {
        return name.equals(IndexWriter.WRITE_LOCK_NAME) || SEGMENTS.matcher(name).matches()
                || IndexFileNames.CODEC_FILE_PATTERN.matcher(name).matches();
    }

    /**
     * The catalog folder as Lucene may see it. For reading ({@code journalDir} null): only names
     * Lucene could have written. For an import: of those, only files that are provably Lucene's
     * (see {@link CatalogFolder}); a deletion of any other file is refused.
     */
    static final class Own extends FilterDirectory {
        private final Path journalDir;
        /** Files named in the journal of an earlier, interrupted import. */
        private final Set<String> journaled = new HashSet<>();
        /** Files this import created (commit files included). */
        private final Set<String> created = ConcurrentHashMap.newKeySet();
        /** Every name shown to Lucene: the only names it may delete. */
        private final Set<String> shown = ConcurrentHashMap.newKeySet();
        private FileChannel journal;

        Own(Directory in, Path journalDir) throws IOException {
            super(in);
            this.journalDir = journalDir;
            if (journalDir != null) {
                journaled.addAll(readJournal(journalDir.resolve(JOURNAL)));
            }
        }

        /** Complete lines of the journal (a line cut short by a crash names no file). */
        private static List<String> readJournal(Path p) throws IOException {
            String text;
            try {
                text = Files.readString(p, StandardCharsets.UTF_8);
            } catch (NoSuchFileException e) {
                return List.of();
            } catch (java.nio.charset.CharacterCodingException e) {
                return List.of(); // not ours to read: shows nothing more
            }
            int end = text.lastIndexOf('\n');
            List<String> out = new ArrayList<>();
            for (String line : text.substring(0, end + 1).split("\n")) {
                if (!line.isEmpty()) {
                    out.add(line);
                }
            }
            return out;
        }

        @Override
        public String[] listAll() throws IOException {
            String[] all = in.listAll();
            List<String> out = new ArrayList<>(all.length);
            Set<String> referenced = journalDir == null ? Set.of() : referenced(all);
            for (String name : all) {
                if (!luceneName(name)) {
                    continue;
                }
                if (journalDir == null || name.equals(IndexWriter.WRITE_LOCK_NAME) || referenced.contains(name)
                        || created.contains(name) || journaled.contains(name) || lucenesHeader(name)) {
                    out.add(name);
                }
            }
            shown.addAll(out);
            return out.toArray(String[]::new);
        }

        /** Every file that a commit in the folder refers to (the commit files included). */
        Set<String> referenced(String[] all) throws IOException {
            Set<String> out = new HashSet<>();
            for (String name : all) {
                if (COMMIT.matcher(name).matches()) {
                    out.addAll(SegmentInfos.readCommit(in, name).files(true));
                }
            }
            return out;
        }

        /** Whether the file begins with Lucene's header (every file Lucene writes does, after its first bytes). */
        private boolean lucenesHeader(String name) {
            try (InputStream s = Files.newInputStream(journalDir.resolve(name))) {
                byte[] b = s.readNBytes(4);
                return b.length == 4 && ((b[0] & 0xff) << 24 | (b[1] & 0xff) << 16 | (b[2] & 0xff) << 8
                        | (b[3] & 0xff)) == CodecUtil.CODEC_MAGIC;
            } catch (IOException e) {
                return false;
            }
        }

        @Override
        public IndexOutput createOutput(String name, IOContext context) throws IOException {
            remember(name);
            return in.createOutput(name, context);
        }

        @Override
        public IndexOutput createTempOutput(String prefix, String suffix, IOContext context) throws IOException {
            IndexOutput out = in.createTempOutput(prefix, suffix, context);
            remember(out.getName());
            return out;
        }

        @Override
        public void rename(String source, String dest) throws IOException {
            remember(dest);
            in.rename(source, dest);
        }

        @Override
        public void deleteFile(String name) throws IOException {
            if (journalDir == null || !(shown.contains(name) || created.contains(name))) {
                throw new IOException("gatefit does not delete " + name + ": it is not a file of the catalog's index");
            }
            in.deleteFile(name);
        }

        /** Notes a file this import makes, in the journal before the file exists. */
        private void remember(String name) throws IOException {
            if (journalDir == null) {
                throw new IOException("the catalog is open for reading only");
            }
            if (created.add(name)) {
                shown.add(name);
                if (!journaled.contains(name)) {
                    synchronized (this) {
                        if (journal == null) {
                            journal = FileChannel.open(journalDir.resolve(JOURNAL), StandardOpenOption.CREATE,
                                    StandardOpenOption.WRITE, StandardOpenOption.APPEND);
                        }
                        ByteBuffer b = ByteBuffer.wrap((name + "\n").getBytes(StandardCharsets.UTF_8));
                        while (b.hasRemaining()) {
                            journal.write(b);
                        }
                    }
                }
            }
        }

        /** The last commit file this import began to write ({@code pending_segments_N}), or null. */
        String pendingCommit() {
            String last = null;
            long gen = -1;
            for (String n : created) {
                if (n.startsWith(IndexFileNames.PENDING_SEGMENTS)) {
                    long g = Long.parseLong(n.substring(IndexFileNames.PENDING_SEGMENTS.length() + 1),
                            Character.MAX_RADIX);
                    if (g > gen) {
                        gen = g;
                        last = n;
                    }
                }
            }
            return last;
        }

        /**
         * After the import's writer is closed (committed or rolled back), under the import lock:
         * deletes the files this import or an interrupted one created that no commit refers to
         * (Lucene does, but not after a failure it counts as fatal, such as a full disk), then the
         * journal. The journal stays when a file could not be deleted or the commits not read, so
         * the next import tries again.
         */
        void cleanUp() throws IOException {
            closeJournal();
            String[] all = in.listAll();
            Set<String> referenced = referenced(all);
            Collection<String> ours = new HashSet<>(created);
            ours.addAll(journaled);
            IOException failed = null;
            for (String name : all) {
                if (ours.contains(name) && luceneName(name) && !name.equals(IndexWriter.WRITE_LOCK_NAME)
                        && !referenced.contains(name)) {
                    try {
                        in.deleteFile(name);
                    } catch (NoSuchFileException e) {
                        // gone already
                    } catch (IOException e) {
                        failed = e;
                    }
                }
            }
            if (failed != null) {
                throw failed;
            }
            Files.deleteIfExists(journalDir.resolve(JOURNAL));
        }

        private synchronized void closeJournal() throws IOException {
            if (journal != null) {
                journal.close();
                journal = null;
            }
        }

        @Override
        public void close() throws IOException {
            try {
                closeJournal();
            } finally {
                in.close();
            }
        }
    }
}
