package org.gatefit.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.io.PushbackInputStream;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads a CSV catalog or stage sheet row by row, checks every cell against the schema, and hands
 * good rows to a {@link Sink}. Memory does not grow with the file: rows stream through; only the
 * ids seen so far are kept, to find duplicates.
 *
 * <p>Accepts UTF-8 with or without a byte-order mark; comma, semicolon or tab separated (detected
 * from the header line); LF or CRLF line ends; header names matched case-insensitively and
 * trimmed. Every problem is located by physical line (as an editor numbers it) and column.
 */
public final class SheetReader {
    /** Problems kept per file; the rest are counted. */
    public static final int PROBLEM_CAP = 200;
    /** Distinct cells remembered per pattern-checked column. */
    private static final int MEMO_CAP = 256;

    /** Receives rows as they are read. */
    public interface Sink {
        /** A row that passed every check. */
        void accept(Row row) throws IOException;

        /** A row with problems, with its cells as read, for a rejects file. */
        default void reject(List<String> header, long line, List<String> cells, List<Problem> problems)
                throws IOException {
        }
    }

    /**
     * What reading a file found.
     *
     * @param file           file name as shown in messages
     * @param kind           kind of rows (null when it could not be told)
     * @param sha256         hex SHA-256 of the file's bytes
     * @param rows           rows accepted
     * @param rejected       rows with problems
     * @param header         header cells as written
     * @param unknownColumns header names the schema does not define (kept as extra attributes)
     * @param delimiter      the separator detected
     * @param problems       problems found, capped at {@link #PROBLEM_CAP}
     * @param problemCount   all problems found
     * @param fatal          whether reading stopped early (bad header, not UTF-8, unclosed quote)
     */
    public record Summary(String file, Kind kind, String sha256, long rows, long rejected, List<String> header,
                          List<String> unknownColumns, char delimiter, List<Problem> problems, long problemCount,
                          boolean fatal) {
        public Summary {
            header = List.copyOf(header);
            unknownColumns = List.copyOf(unknownColumns);
            problems = List.copyOf(problems);
        }

        /** Whether the file had no problem at all. */
        public boolean clean() {
            return problemCount == 0;
        }
    }

    private final String file;
    private final Kind forced;
    /** Whether records come from Commons CSV (the reference) rather than {@link CsvLexer} ({@link FastPath#CSV}). */
    private final boolean reference;
    private final List<Problem> problems = new ArrayList<>();
    private long problemCount;

    private SheetReader(String file, Kind forced, boolean reference) {
        this.file = file;
        this.forced = forced;
        this.reference = reference;
    }

    /**
     * Reads {@code path}.
     *
     * @param displayName name used in messages (usually the path as the user typed it)
     * @param forced      kind to read as, or null to tell it from the columns
     */
    public static Summary read(Path path, String displayName, Kind forced, Sink sink) throws IOException {
        MessageDigest sha;
        try {
            sha = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 missing from the JVM", e);
        }
        try (InputStream raw = Files.newInputStream(path);
             DigestInputStream in = new DigestInputStream(raw, sha)) {
            SheetReader r = new SheetReader(displayName, forced, FastPath.CSV.reference());
            Summary s = r.read(in, sink);
            in.transferTo(OutputStreamSink.INSTANCE);
            return new Summary(s.file(), s.kind(), HexFormat.of().formatHex(sha.digest()), s.rows(), s.rejected(),
                    s.header(), s.unknownColumns(), s.delimiter(), s.problems(), s.problemCount(), s.fatal());
        }
    }

    /** Reads from a stream (SHA-256 left empty). */
    public static Summary read(InputStream in, String displayName, Kind forced, Sink sink) throws IOException {
        return read(in, displayName, forced, sink, FastPath.CSV.reference());
    }

    /** Reads from a stream with the CSV reader chosen: Commons CSV ({@code reference}) or {@link CsvLexer}. */
    static Summary read(InputStream in, String displayName, Kind forced, Sink sink, boolean reference) throws IOException {
        return new SheetReader(displayName, forced, reference).read(in, sink);
    }

    private Summary read(InputStream in, Sink sink) throws IOException {
        CsvRecords lexer = lexer(in);
        if (lexer == null) {
            return new Summary(file, null, "", 0, 0, List.of(), List.of(), ',', problems, problemCount, true);
        }
        return readRecords(lexer, delimiter, sink);
    }

    /** Separator of the file {@link #lexer} opened. */
    private char delimiter = ',';

    /**
     * The front end of every sheet: a UTF-8 byte-order mark skipped, UTF-16 refused, strict UTF-8,
     * the separator told from the header line. Returns the lexer, or null after adding the
     * problem that stops the reading.
     */
    private CsvRecords lexer(InputStream in) throws IOException {
        // Nothing here closes the stream: the caller owns it (and hashes the rest of it).
        PushbackInputStream pin = new PushbackInputStream(in, 3);
        byte[] bom = pin.readNBytes(3);
        int keep = bom.length;
        if (bom.length == 3 && (bom[0] & 0xff) == 0xEF && (bom[1] & 0xff) == 0xBB && (bom[2] & 0xff) == 0xBF) {
            keep = 0;
        } else if (bom.length >= 2 && (((bom[0] & 0xff) == 0xFE && (bom[1] & 0xff) == 0xFF)
                || ((bom[0] & 0xff) == 0xFF && (bom[1] & 0xff) == 0xFE))) {
            add(Problem.ofLine(file, 1, "the file is UTF-16 text (expected UTF-8; save it as \"CSV UTF-8\")"));
            return null;
        }
        if (bom.length == 0) {
            add(Problem.ofLine(file, 0,
                    "the file is empty (expected a header line naming the columns, then one row per part)"));
            return null;
        }
        pin.unread(bom, 0, keep);
        Reader text = new StrictUtf8Reader(pin);
        CsvRecords lexer = reference ? new CommonsCsvRecords(text) : new CsvLexer(text);
        try {
            delimiter = lexer.sniffDelimiter();
        } catch (CharacterCodingException e) {
            add(notUtf8(1));
            return null;
        }
        lexer.delimiter(delimiter);
        return lexer;
    }

    /** Receives the records of a sheet read by {@link #records}. */
    interface Records {
        /**
         * One record that is not blank.
         *
         * @param line  physical line it starts on
         * @param cells its cells as written
         */
        void record(long line, List<String> cells) throws CatalogDataException;
    }

    /**
     * Reads a sheet that has no schema (a BOM) through the same front end and CSV rules as
     * catalogs, handing every non-blank record to {@code sink}; lines of any length. A file that
     * cannot be read as CSV (empty, UTF-16, not UTF-8, an unclosed quote) is bad input naming the
     * file and line.
     */
    static void records(Path path, String displayName, Records sink) throws IOException, CatalogDataException {
        SheetReader r = new SheetReader(displayName, null, FastPath.CSV.reference());
        try (InputStream in = Files.newInputStream(path)) {
            CsvRecords lexer = r.lexer(in);
            if (lexer == null) {
                throw new CatalogDataException(r.problems, r.problemCount);
            }
            while (true) {
                try {
                    if (!lexer.next()) {
                        return;
                    }
                } catch (IOException e) {
                    throw new CatalogDataException(r.readFailure(e, lexer.startLine(), null));
                }
                if (!lexer.blank()) {
                    sink.record(lexer.startLine(), lexer.toList());
                }
            }
        }
    }

    private Summary readRecords(CsvRecords lexer, char delimiter, Sink sink) throws IOException {
        // Header: the first non-blank record.
        List<String> header = null;
        long headerLine = 0;
        try {
            while (lexer.next()) {
                if (!lexer.blank()) {
                    header = lexer.toList();
                    headerLine = lexer.startLine();
                    break;
                }
            }
        } catch (IOException e) {
            return fatal(null, List.of(), delimiter, readFailure(e, lexer.startLine(), null));
        }
        if (header == null) {
            return fatal(null, List.of(), delimiter, Problem.ofLine(file, 0,
                    "the file has no header line (expected a header naming the columns, then one row per part)"));
        }
        Layout layout = layout(header, headerLine, delimiter);
        if (layout == null) {
            return new Summary(file, kindOrNull(header), "", 0, 0, header, List.of(), delimiter, problems,
                    problemCount, true);
        }
        Schema schema = Schema.of(layout.kind);
        boolean decimalComma = delimiter != ',';
        String keyColumn = layout.kind == Kind.STAGE ? "stage" : "part_number";
        Map<String, Long> seen = new HashMap<>();
        long rows = 0;
        long rejected = 0;
        boolean fatal = false;
        while (true) {
            try {
                if (!lexer.next()) {
                    break;
                }
            } catch (IOException e) {
                add(readFailure(e, lexer.startLine(), header));
                fatal = true;
                break;
            }
            long start = lexer.startLine();
            if (lexer.blank()) {
                continue;
            }
            List<Problem> rowProblems = new ArrayList<>(2);
            Row row = parseRow(schema, layout, lexer, start, decimalComma, keyColumn, rowProblems);
            if (row != null) {
                String id = Row.normaliseKey(row.key());
                Long before = seen.putIfAbsent(id, start);
                if (before != null) {
                    rowProblems.add(new Problem(file, start, keyColumn, layout.position(keyColumn), row.key(),
                            "duplicate " + keyColumn.replace('_', ' ') + " " + Problem.quote(row.key()) + ", also on line " + before
                                    + " (expected each " + (layout.kind == Kind.STAGE ? "stage" : "part") + " once per file)"));
                }
            }
            if (rowProblems.isEmpty()) {
                sink.accept(row);
                rows++;
            } else {
                rowProblems.forEach(this::add);
                sink.reject(header, start, lexer.toList(), rowProblems);
                rejected++;
            }
        }
        if (!fatal && rows == 0 && rejected == 0) {
            add(Problem.ofLine(file, headerLine, "the file has a header but no rows (expected one row per "
                    + (layout.kind == Kind.STAGE ? "stage" : layout.kind.id()) + " after the header)"));
            fatal = true;
        }
        return new Summary(file, layout.kind, "", rows, rejected, header, layout.unknown, delimiter, problems,
                problemCount, fatal);
    }

    /** Where each schema column sits in the header, and which columns are extra. */
    private static final class Layout {
        Kind kind;
        final Map<String, Integer> index = new LinkedHashMap<>();
        final List<String> unknown = new ArrayList<>();
        final Map<Integer, String> extraIndex = new LinkedHashMap<>();
        final List<Integer> unnamed = new ArrayList<>();
        /** Header position of each schema column, in schema order; -1 when the file lacks it. */
        int[] columnAt;
        /** {@link Cells#quickChoices} of each schema column, in schema order. */
        String[][] quickChoices;
        /**
         * Per schema column with a pattern: cells already read and their values (catalogs repeat a
         * few such values; the pattern match is costly). Cells.parse is a function of the cell text.
         */
        Map<String, Object>[] memo;
        int width;

        int position(String column) {
            Integer i = index.get(column);
            return i == null ? 0 : i + 1;
        }
    }

    private Layout layout(List<String> header, long line, char delimiter) {
        Layout l = new Layout();
        l.width = header.size();
        for (String h : header) {
            for (int i = 0; i < h.length(); i++) {
                char ch = h.charAt(i);
                if (ch < 0x20 && ch != '\t' || ch == '\uFFFD') {
                    add(Problem.ofLine(file, line, "the header holds control characters (expected a text CSV file"
                            + " whose first line names the columns; is this a binary file?)"));
                    return null;
                }
            }
        }
        l.kind = forced != null ? forced : kindOrNull(header);
        if (l.kind == null) {
            add(Problem.ofLine(file, line, "cannot tell what the file holds (expected a 'technology' column for"
                    + " switches, 'topology' for drivers or 'stage' for a stage sheet, or give --kind); found columns: "
                    + Problem.names(header)));
            return null;
        }
        Schema schema = Schema.of(l.kind);
        Map<String, Integer> firstSeen = new HashMap<>();
        boolean ok = true;
        for (int i = 0; i < header.size(); i++) {
            String name = header.get(i).strip().toLowerCase(Locale.ROOT);
            if (name.isEmpty()) {
                l.unnamed.add(i);
                continue;
            }
            Integer dup = firstSeen.putIfAbsent(name, i);
            if (dup != null) {
                add(new Problem(file, line, name, i + 1, header.get(i), "duplicate column " + Problem.quote(name)
                        + ", also column " + (dup + 1) + " (expected each column once)"));
                ok = false;
                continue;
            }
            if (schema.column(name).isPresent()) {
                l.index.put(name, i);
            } else {
                String extra = Cells.restoreText(header.get(i).strip()); // as export neutralised it
                l.unknown.add(extra);
                l.extraIndex.put(i, extra);
            }
        }
        List<String> missing = new ArrayList<>();
        for (String r : schema.requiredNames()) {
            if (!l.index.containsKey(r)) {
                missing.add(r);
            }
        }
        if (!missing.isEmpty()) {
            add(Problem.ofLine(file, line, "missing required column" + (missing.size() > 1 ? "s " : " ")
                    + String.join(", ", missing) + " for a " + l.kind.id() + " " + (l.kind == Kind.STAGE ? "sheet" : "catalog")
                    + " (expected columns: " + String.join(", ", schema.requiredNames()) + "; found: "
                    + Problem.names(header) + ")"));
            ok = false;
        }
        if (!ok) {
            return null;
        }
        l.columnAt = new int[schema.columns().size()];
        l.quickChoices = new String[l.columnAt.length][];
        @SuppressWarnings("unchecked")
        Map<String, Object>[] memo = new Map[l.columnAt.length];
        l.memo = memo;
        for (int i = 0; i < l.columnAt.length; i++) {
            Column c = schema.columns().get(i);
            Integer at = l.index.get(c.name());
            l.columnAt[i] = at == null ? -1 : at;
            l.quickChoices[i] = Cells.quickChoices(c);
            if (c.type() == ColumnType.TEXT && c.pattern() != null) {
                l.memo[i] = new HashMap<>();
            }
        }
        return l;
    }

    private Row parseRow(Schema schema, Layout l, CsvRecords rec, long line, boolean decimalComma, String keyColumn,
                         List<Problem> out) {
        if (rec.size() != l.width) {
            out.add(Problem.ofLine(file, line, "the row has " + rec.size() + " cells but the header has " + l.width
                    + " (expected one cell per column; a value holding the separator needs double quotes)"));
            return null;
        }
        List<Column> columns = schema.columns();
        Object[] values = new Object[columns.size()]; // by schema position: the row's map without a node per value
        for (int ci = 0; ci < columns.size(); ci++) {
            Column c = columns.get(ci);
            int at = l.columnAt[ci];
            if (at >= 0 && rec.from(at) >= 0) {
                // A plain number or exact choice straight from the characters, as Cells.parse reads it.
                Object quick = Cells.parseQuick(c, l.quickChoices[ci], rec.chars(), rec.from(at), rec.to(at), decimalComma);
                if (quick != null) {
                    values[ci] = quick;
                    continue;
                }
            }
            String cell = at < 0 ? "" : rec.get(at);
            Map<String, Object> memo = l.memo[ci];
            Object v = memo == null ? null : memo.get(cell);
            try {
                if (v == null) {
                    v = Cells.parse(c, cell, decimalComma);
                    if (memo != null && v != null && memo.size() < MEMO_CAP) {
                        memo.put(cell, v);
                    }
                }
            } catch (BadValueException e) {
                out.add(new Problem(file, line, c.name(), at + 1, cell, e.getMessage())); // an empty cell never fails
                continue;
            }
            if (v == null && c.defaultFrom() != null) {
                int from = schema.slot(c.defaultFrom());
                v = from < 0 ? null : values[from];
            }
            if (v == null && c.defaultValue() != null) {
                try {
                    v = Cells.parse(c, c.defaultValue(), false);
                } catch (BadValueException e) {
                    throw new IllegalStateException("schema default of " + c.name() + " is invalid", e);
                }
            }
            if (v == null) {
                if (c.required()) {
                    out.add(new Problem(file, line, c.name(), at < 0 ? 0 : at + 1, cell,
                            "required value is empty (expected " + c.expectation() + ")"));
                }
                continue;
            }
            values[ci] = v;
        }
        for (int i : l.unnamed) {
            if (!rec.get(i).isBlank()) {
                out.add(new Problem(file, line, null, i + 1, rec.get(i), "value " + Problem.quote(rec.get(i).strip())
                        + " in column " + (i + 1) + ", which has no header name (expected a header for every column"
                        + " that holds values)"));
            }
        }
        Map<String, String> extras = l.extraIndex.isEmpty() ? Map.of() : new LinkedHashMap<>();
        l.extraIndex.forEach((i, name) -> {
            String v = rec.get(i).strip();
            if (!v.isEmpty()) {
                extras.put(name, Cells.restoreText(v));
            }
        });
        if (!out.isEmpty()) {
            return null;
        }
        return new Row(schema.kind(), values[schema.slot(keyColumn)].toString(), file, line, Row.bySlot(schema, values),
                extras);
    }

    private static Kind kindOrNull(List<String> header) {
        boolean tech = false;
        boolean topo = false;
        boolean stage = false;
        for (String h : header) {
            String n = h.strip().toLowerCase(Locale.ROOT);
            tech |= n.equals("technology");
            topo |= n.equals("topology");
            stage |= n.equals("stage");
        }
        if (stage && !tech && !topo) {
            return Kind.STAGE;
        }
        if (tech && !topo) {
            return Kind.SWITCH;
        }
        if (topo && !tech) {
            return Kind.DRIVER;
        }
        return null;
    }

    /**
     * What reading the records stopped at: text that is not UTF-8, malformed CSV (typed by the record
     * reader, worded here with the column's header name when the header is known), or the reader's
     * own I/O failure.
     */
    private Problem readFailure(IOException e, long line, List<String> header) {
        Throwable c = e;
        while (c != null) {
            if (c instanceof CharacterCodingException) {
                return notUtf8(line);
            }
            c = c.getCause();
        }
        if (e instanceof CsvSyntaxException s) {
            String message = switch (s.syntax()) {
                case UNCLOSED_QUOTE -> "a double quote opened in the row starting here is never closed"
                        + " (expected a closing \" before the end of the file)";
                case TEXT_AFTER_QUOTE -> "text follows a closing double quote in the row starting here"
                        + " (expected a separator after a quoted value; write a quote inside a value as \"\")";
            };
            int at = s.column();
            String name = header != null && at > 0 && at <= header.size() && !header.get(at - 1).isBlank()
                    ? header.get(at - 1).strip().toLowerCase(Locale.ROOT) : null;
            return new Problem(file, s.line(), name, at, null, name == null && at > 0
                    ? message + " (column " + at + ")" : message);
        }
        return Problem.ofLine(file, line, "cannot read the CSV: " + e.getMessage());
    }

    private Problem notUtf8(long line) {
        return Problem.ofLine(file, line, "the file is not UTF-8 text from here on (expected a UTF-8 CSV file;"
                + " is it a binary file, or saved in another encoding?)");
    }

    private Summary fatal(Kind kind, List<String> header, char delimiter, Problem p) {
        add(p);
        return new Summary(file, kind, "", 0, 0, header, List.of(), delimiter, problems, problemCount, true);
    }

    private void add(Problem p) {
        problemCount++;
        if (problems.size() < PROBLEM_CAP) {
            problems.add(p);
        }
    }

    /**
     * Decodes UTF-8 strictly like an {@code InputStreamReader} with {@link CodingErrorAction#REPORT},
     * but first hands out every character before a malformed byte and fails only on the read that
     * reaches it. ({@code InputStreamReader} fails the whole read, which drops up to a buffer of
     * good lines and makes the error look as if it were on the first line.)
     */
    private static final class StrictUtf8Reader extends Reader {
        private final InputStream in;
        private final CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        private final ByteBuffer bytes = ByteBuffer.allocate(8192).flip();
        private boolean eof;
        private boolean flushed;

        StrictUtf8Reader(InputStream in) {
            this.in = in;
        }

        @Override
        public int read(char[] cbuf, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            if (flushed) {
                return -1;
            }
            CharBuffer out = CharBuffer.wrap(cbuf, off, len);
            while (true) {
                CoderResult cr = decoder.decode(bytes, out, eof);
                int n = out.position() - off;
                if (cr.isError()) {
                    if (n > 0) {
                        return n;
                    }
                    cr.throwException();
                }
                if (cr.isOverflow() || n > 0) {
                    return n;
                }
                if (eof) {
                    decoder.flush(out);
                    flushed = true;
                    n = out.position() - off;
                    return n == 0 ? -1 : n;
                }
                bytes.compact();
                int got = in.read(bytes.array(), bytes.arrayOffset() + bytes.position(), bytes.remaining());
                if (got < 0) {
                    eof = true;
                } else {
                    bytes.position(bytes.position() + got);
                }
                bytes.flip();
            }
        }

        @Override
        public void close() throws IOException {
            in.close();
        }
    }

    /** Discards bytes (for hashing the rest of a file after a fatal problem). */
    private static final class OutputStreamSink extends java.io.OutputStream {
        static final OutputStreamSink INSTANCE = new OutputStreamSink();

        @Override
        public void write(int b) {
        }

        @Override
        public void write(byte[] b, int off, int len) {
        }
    }
}
