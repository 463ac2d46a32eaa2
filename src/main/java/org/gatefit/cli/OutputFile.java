package org.gatefit.cli;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.ThreadLocalRandom;

/**
 * A file a command writes (--output, --junit). It is written beside the target under a temporary
 * name and moved over the target when closed, so a write that fails (a full disk) leaves a
 * previous file of that name as it was and no partial file behind. A target that exists and is
 * not a regular file (a device such as {@code /dev/stdout}, a named pipe) is written directly.
 * Every failure is a {@link WriteFailedException} naming the file as the user typed it.
 */
final class OutputFile extends Writer {
    private final Writer out;
    private final Path target;
    /** The temporary file, or null when writing the target directly. */
    private final Path tmp;
    private final String shown;
    private boolean failed;
    private boolean finished;
    private boolean closed;

    private OutputFile(Writer out, Path target, Path tmp, String shown) {
        this.out = out;
        this.target = target;
        this.tmp = tmp;
        this.shown = shown;
    }

    /**
     * Opens {@code target} (its folders created).
     *
     * @param shown the file as the user typed it, for messages
     */
    static OutputFile open(Path target, String shown) throws WriteFailedException {
        try {
            Path abs = target.toAbsolutePath();
            if (Files.exists(abs)) {
                abs = abs.toRealPath(); // write where a symbolic link points, not over the link
                if (!Files.isRegularFile(abs)) {
                    return new OutputFile(Files.newBufferedWriter(abs, StandardCharsets.UTF_8), abs, null, shown);
                }
            }
            Path parent = abs.getParent();
            Files.createDirectories(parent);
            while (true) {
                Path tmp = parent.resolve("." + abs.getFileName() + "." + Long.toHexString(ThreadLocalRandom.current()
                        .nextLong() >>> 1) + ".tmp");
                try {
                    // Not Files.createTempFile: its file is private to the user; a report gets the usual permissions.
                    Writer w = Files.newBufferedWriter(tmp, StandardCharsets.UTF_8, StandardOpenOption.CREATE_NEW,
                            StandardOpenOption.WRITE);
                    return new OutputFile(w, abs, tmp, shown);
                } catch (FileAlreadyExistsException e) {
                    // another name
                }
            }
        } catch (IOException e) {
            throw new WriteFailedException(shown, e);
        }
    }

    @Override
    public void write(char[] cbuf, int off, int len) throws IOException {
        try {
            out.write(cbuf, off, len);
        } catch (IOException e) {
            throw failure(e);
        }
    }

    @Override
    public void write(String str, int off, int len) throws IOException {
        try {
            out.write(str, off, len);
        } catch (IOException e) {
            throw failure(e);
        }
    }

    @Override
    public void write(int c) throws IOException {
        try {
            out.write(c);
        } catch (IOException e) {
            throw failure(e);
        }
    }

    @Override
    public void flush() throws IOException {
        try {
            out.flush();
        } catch (IOException e) {
            throw failure(e);
        }
    }

    /**
     * Marks {@code w} written completely: only then does closing it move the file over the target. A
     * command calls it as the last statement of its write, so an exception on the way (a refusal, a
     * bug) leaves an earlier file of that name as it was. No effect on standard output.
     */
    static void finish(Writer w) {
        if (w instanceof OutputFile f) {
            f.finished = true;
        }
    }

    /**
     * Finishes the file: the temporary file takes the target's place when the command marked it
     * written ({@link #finish}) and no write failed; otherwise it is removed.
     */
    @Override
    public void close() throws IOException {
        if (closed) {
            return;
        }
        closed = true;
        try {
            out.close();
            if (!failed && finished && tmp != null) {
                try {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
                }
            }
        } catch (IOException e) {
            throw failure(e);
        } finally {
            if (tmp != null) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    private WriteFailedException failure(IOException e) {
        failed = true;
        return e instanceof WriteFailedException w ? w : new WriteFailedException(shown, e);
    }
}
