package org.gatefit.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.Charset;

/**
 * Standard output as {@link Cli#run} hands it to the commands: a {@link PrintWriter}, which only
 * records that a write failed, over a writer that also keeps why (the first failure). Written
 * straight to the stream (not through {@code System.out}, a {@code PrintStream} that would drop
 * the error before anything could see it).
 */
final class StdoutWriter extends PrintWriter {
    private final Recorder recorder;

    private StdoutWriter(Recorder recorder) {
        super(recorder, true);
        this.recorder = recorder;
    }

    /** Over {@code out}, in the platform's charset (as {@code new PrintWriter(System.out)} writes). */
    static StdoutWriter of(OutputStream out) {
        return new StdoutWriter(new Recorder(new OutputStreamWriter(out, Charset.defaultCharset())));
    }

    /** The first write that failed, or null. */
    IOException failure() {
        return recorder.failure;
    }

    private static final class Recorder extends Writer {
        private final Writer out;
        private IOException failure;

        Recorder(Writer out) {
            this.out = out;
        }

        @Override
        public void write(char[] cbuf, int off, int len) throws IOException {
            try {
                out.write(cbuf, off, len);
            } catch (IOException e) {
                throw record(e);
            }
        }

        @Override
        public void write(String str, int off, int len) throws IOException {
            try {
                out.write(str, off, len);
            } catch (IOException e) {
                throw record(e);
            }
        }

        @Override
        public void flush() throws IOException {
            try {
                out.flush();
            } catch (IOException e) {
                throw record(e);
            }
        }

        @Override
        public void close() throws IOException {
            try {
                out.close();
            } catch (IOException e) {
                throw record(e);
            }
        }

        private IOException record(IOException e) {
            if (failure == null) {
                failure = e;
            }
            return e;
        }
    }
}
