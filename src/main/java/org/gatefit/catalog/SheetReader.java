package org.gatefit.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.io.PushbackInputStream;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
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
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;

/**
 * Reads a CSV catalog or stage sheet row by row, checks every cell against the schema, and hands
 * good rows to a {@link Sink}. Memory does not grow with the file: rows stream through; only the
 * ids seen so far are kept, to find duplicates.
 *
 * <p>Accepts UTF-8 with or without a byte-order mark, UTF-16 with one, any encoding given, and a
 * file that is not UTF-8 as Windows-1252 (with a note); {@code .xlsx} workbooks ({@link XlsxRecords});
 * comma, semicolon or tab separated (detected from the header line); LF or CRLF line ends; title
 * rows above the header and a units row under it; headings matched to columns by {@link Headings}
 * and the user's {@link Mapping}. Every problem is located by physical line (as an editor numbers
 * it, or a workbook's row) and column; every reading that is not the cell as written is noted.
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

        /** How the sheet's rows are written, told once before its first row arrives. */
        default void format(Format format) throws IOException {
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
     * @param headings       each heading and the column it was read as ("" for an extra attribute)
     * @param missing        each required column no heading names, with the nearest headings
     * @param notes          what was read another way than as written (headings, encoding, values), one line each
     */
    public record Summary(String file, Kind kind, String sha256, long rows, long rejected, List<String> header,
                          List<String> unknownColumns, char delimiter, List<Problem> problems, long problemCount,
                          boolean fatal, Map<String, String> headings, Map<String, List<String>> missing,
                          List<String> notes) {
        public Summary {
            headings = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(headings));
            missing = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(missing));
            notes = List.copyOf(notes);
            header = List.copyOf(header);
            unknownColumns = List.copyOf(unknownColumns);
            problems = List.copyOf(problems);
        }

        /** Whether the file had no problem at all. */
        public boolean clean() {
            return problemCount == 0;
        }
    }

    /**
     * How to read a sheet besides its own content.
     *
     * @param encoding  the text encoding, or null: a byte-order mark, else UTF-8, else (a file that
     *                  is not valid UTF-8) Windows-1252 with a note
     * @param headerRow the line (row of a workbook) the header is on, or 0 to find it: the first row
     *                  whose headings name the required columns, among the first {@link CsvRecords#SNIFF_LINES}
     * @param sheet     the sheet of a workbook to read, or null for its first sheet
     * @param mapping   the user's headings → columns
     * @param notes     hears each note (headings read, readings of values) when it is made, before anything is written
     */
    public record Options(Charset encoding, long headerRow, String sheet, Mapping mapping, Consumer<String> notes) {
        /** Nothing given. */
        public static final Options DEFAULT = new Options(null, 0, null, Mapping.NONE, n -> { });

        public Options {
            if (headerRow < 0) {
                throw new IllegalArgumentException("expected a header row ≥ 1, got " + headerRow);
            }
            mapping = mapping == null ? Mapping.NONE : mapping;
            notes = notes == null ? n -> { } : notes;
        }

        /**
         * How a BOM given beside a sheet read with these options is read: the encoding and the notes
         * apply; its headings, header row, sheet and mapping are its own.
         */
        public Options forBom() {
            return new Options(encoding, 0, null, null, notes);
        }
    }

    /**
     * How the rows of a sheet were written, for writing rejected rows back the same way.
     *
     * @param delimiter the separator
     * @param header    the header cells as written
     * @param units     the units row as written, or empty
     */
    public record Format(char delimiter, List<String> header, List<String> units) {
        public Format {
            header = List.copyOf(header);
            units = List.copyOf(units);
        }
    }

    /** The columns a rejects file adds after the sheet's own; ignored when it is imported again. */
    public static final String REJECTED_LINE = "rejected_line";
    public static final String REJECTED_BECAUSE = "rejected_because";

    private final String file;
    private final Kind forced;
    /** Whether records come from Commons CSV (the reference) rather than {@link CsvLexer} ({@link FastPath#CSV}). */
    private final boolean reference;
    private final Options options;
    private final List<Problem> problems = new ArrayList<>();
    private final List<String> notes = new ArrayList<>();
    private long problemCount;
    /** The text encoding the file is read in (null: UTF-8 unless a byte-order mark says otherwise). */
    private Charset charset;
    /** Whether {@link #charset} is Windows-1252 because the file was not UTF-8. */
    private boolean fallback;
    /** Whether lines are rows of a workbook's sheet. */
    private boolean sheetRows;

    private SheetReader(String file, Kind forced, boolean reference, Options options) {
        this.file = file;
        this.forced = forced;
        this.reference = reference;
        this.options = options;
        this.charset = options.encoding();
    }

    /**
     * Reads {@code path}.
     *
     * @param displayName name used in messages (usually the path as the user typed it)
     * @param forced      kind to read as, or null to tell it from the columns
     */
    public static Summary read(Path path, String displayName, Kind forced, Sink sink) throws IOException {
        return read(path, displayName, forced, sink, Options.DEFAULT);
    }

    /** Reads {@code path} with {@code options}: a workbook ({@code .xlsx}) or text. */
    public static Summary read(Path path, String displayName, Kind forced, Sink sink, Options options) throws IOException {
        MessageDigest sha = Sha256.digest();
        if (isWorkbook(path)) {
            try (InputStream in = new DigestInputStream(Files.newInputStream(path), sha)) {
                in.transferTo(OutputStreamSink.INSTANCE);
            }
            String hex = Sha256.hex(sha);
            XlsxRecords x;
            try {
                x = XlsxRecords.open(path, options.sheet());
            } catch (IOException e) {
                SheetReader r = new SheetReader(displayName, forced, false, options);
                return withSha(r.fatal(null, List.of(), ',', Problem.ofLine(displayName, 0, e.getMessage())), hex);
            }
            try (x) {
                SheetReader r = new SheetReader(displayName + " sheet " + x.sheet(), forced, false, options);
                r.sheetRows = true;
                if (options.sheet() == null && x.sheets().size() > 1) {
                    r.note("note: " + displayName + " has sheets " + String.join(", ", x.sheets()) + "; read the first, "
                            + x.sheet() + " (--sheet NAME reads another)");
                }
                return withSha(r.readRecords(x, ',', sink), hex);
            }
        }
        SheetReader r = new SheetReader(displayName, forced, FastPath.CSV.reference(), options);
        if (r.charset == null && !startsWithBom(path) && !validUtf8(path)) {
            r.charset = WINDOWS_1252;
            r.fallback = true;
        }
        try (InputStream raw = Files.newInputStream(path);
             DigestInputStream in = new DigestInputStream(raw, sha)) {
            Summary s = r.read(in, sink);
            in.transferTo(OutputStreamSink.INSTANCE);
            return withSha(s, Sha256.hex(sha));
        }
    }

    private static Summary withSha(Summary s, String sha) {
        return new Summary(s.file(), s.kind(), sha, s.rows(), s.rejected(), s.header(), s.unknownColumns(),
                s.delimiter(), s.problems(), s.problemCount(), s.fatal(), s.headings(), s.missing(), s.notes());
    }

    static final Charset WINDOWS_1252 = Charset.forName("windows-1252");

    /** Whether a file is an {@code .xlsx} workbook: its name, or a zip's first bytes. */
    static boolean isWorkbook(Path path) throws IOException {
        if (path.getFileName() != null && path.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".xlsx")) {
            return true;
        }
        try (InputStream in = Files.newInputStream(path)) {
            byte[] head = in.readNBytes(4); // a zip's first bytes; XlsxRecords (and POI) load only for a workbook
            return head.length == 4 && head[0] == 'P' && head[1] == 'K' && head[2] == 3 && head[3] == 4;
        }
    }

    private static boolean startsWithBom(Path path) throws IOException {
        try (InputStream in = Files.newInputStream(path)) {
            byte[] b = in.readNBytes(3);
            return b.length == 3 && (b[0] & 0xff) == 0xEF && (b[1] & 0xff) == 0xBB && (b[2] & 0xff) == 0xBF
                    || b.length >= 2 && ((b[0] & 0xff) == 0xFE && (b[1] & 0xff) == 0xFF
                    || (b[0] & 0xff) == 0xFF && (b[1] & 0xff) == 0xFE);
        }
    }

    /** Whether the whole file decodes as UTF-8 (a pass over its bytes before the reading, which cannot go back). */
    static boolean validUtf8(Path path) throws IOException {
        CharsetDecoder d = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer bytes = ByteBuffer.allocate(1 << 16);
        CharBuffer chars = CharBuffer.allocate(1 << 16);
        try (InputStream in = Files.newInputStream(path)) {
            while (true) {
                int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
                boolean eof = n < 0;
                if (!eof) {
                    bytes.position(bytes.position() + n);
                }
                bytes.flip();
                while (true) {
                    chars.clear();
                    CoderResult cr = d.decode(bytes, chars, eof);
                    if (cr.isError()) {
                        return false;
                    }
                    if (!cr.isOverflow()) {
                        break;
                    }
                }
                bytes.compact();
                if (eof) {
                    chars.clear();
                    return !d.flush(chars).isError();
                }
            }
        }
    }

    /** Reads from a stream (SHA-256 left empty). */
    public static Summary read(InputStream in, String displayName, Kind forced, Sink sink) throws IOException {
        return read(in, displayName, forced, sink, FastPath.CSV.reference());
    }

    /** Reads from a stream with the CSV reader chosen: Commons CSV ({@code reference}) or {@link CsvLexer}. */
    static Summary read(InputStream in, String displayName, Kind forced, Sink sink, boolean reference) throws IOException {
        return new SheetReader(displayName, forced, reference, Options.DEFAULT).read(in, sink);
    }

    /** Reads from a stream with options (the encoding must be given or be UTF-8: a stream is read once). */
    static Summary read(InputStream in, String displayName, Kind forced, Sink sink, boolean reference, Options options)
            throws IOException {
        return new SheetReader(displayName, forced, reference, options).read(in, sink);
    }

    private Summary read(InputStream in, Sink sink) throws IOException {
        CsvRecords lexer = lexer(in);
        if (lexer == null) {
            return new Summary(file, null, "", 0, 0, List.of(), List.of(), ',', problems, problemCount, true,
                    Map.of(), Map.of(), notes);
        }
        return readRecords(lexer, delimiter, sink);
    }

    /** Separator of the file {@link #lexer} opened. */
    private char delimiter = ',';

    /**
     * The front end of every text sheet: a byte-order mark (UTF-8, UTF-16) read and skipped, the
     * encoding given or found (strict: a byte it cannot decode is a problem on its line, never a
     * replacement character), the separator told from the header line. Returns the lexer, or null
     * after adding the problem that stops the reading.
     */
    private CsvRecords lexer(InputStream in) throws IOException {
        // Nothing here closes the stream: the caller owns it (and hashes the rest of it).
        PushbackInputStream pin = new PushbackInputStream(in, 3);
        byte[] bom = pin.readNBytes(3);
        int keep = bom.length;
        int from = 0;
        Charset cs = charset == null ? StandardCharsets.UTF_8 : charset;
        if (bom.length == 3 && (bom[0] & 0xff) == 0xEF && (bom[1] & 0xff) == 0xBB && (bom[2] & 0xff) == 0xBF) {
            keep = 0;
            cs = StandardCharsets.UTF_8;
        } else if (bom.length >= 2 && (bom[0] & 0xff) == 0xFE && (bom[1] & 0xff) == 0xFF) {
            cs = StandardCharsets.UTF_16BE;
            from = 2;
        } else if (bom.length >= 2 && (bom[0] & 0xff) == 0xFF && (bom[1] & 0xff) == 0xFE) {
            cs = StandardCharsets.UTF_16LE;
            from = 2;
        }
        if (bom.length == 0) {
            add(Problem.ofLine(file, 0,
                    "the file is empty (expected a header line naming the columns, then one row per part)"));
            return null;
        }
        if (from > 0) {
            keep = bom.length - from;
            fallback = false;
            note("note: " + file + ": read as " + cs.name() + " (byte-order mark)");
        }
        charset = cs;
        if (fallback) {
            note("note: " + file + ": not UTF-8 text; read as Windows-1252 (--encoding NAME reads another encoding)");
        }
        pin.unread(bom, from, keep);
        Reader text = new StrictReader(pin, cs);
        CsvRecords lexer = reference ? new CommonsCsvRecords(text) : new CsvLexer(text);
        try {
            delimiter = lexer.sniffDelimiter(options.headerRow());
        } catch (CharacterCodingException e) {
            add(notDecodable(1));
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
     * catalogs (encodings, workbooks), handing every non-blank record to {@code sink}; lines of
     * any length. A file that cannot be read as CSV (empty, not decodable, an unclosed quote) is
     * bad input naming the file and line.
     */
    static void records(Path path, String displayName, Records sink) throws IOException, CatalogDataException {
        records(path, displayName, Options.DEFAULT, sink);
    }

    /** {@link #records(Path, String, Records)} with options (encoding, sheet; notes go to the options). */
    static void records(Path path, String displayName, Options options, Records sink) throws IOException, CatalogDataException {
        if (isWorkbook(path)) {
            XlsxRecords x;
            try {
                x = XlsxRecords.open(path, options.sheet());
            } catch (IOException e) {
                throw new CatalogDataException(Problem.ofLine(displayName, 0, e.getMessage()));
            }
            try (x) {
                while (true) {
                    try {
                        if (!x.next()) {
                            return;
                        }
                    } catch (IOException e) {
                        throw new CatalogDataException(Problem.ofLine(displayName + " sheet " + x.sheet(), x.startLine(),
                                e.getMessage()));
                    }
                    if (!x.blank()) {
                        sink.record(x.startLine(), x.toList());
                    }
                }
            }
        }
        SheetReader r = new SheetReader(displayName, null, FastPath.CSV.reference(), options);
        if (r.charset == null && !startsWithBom(path) && !validUtf8(path)) {
            r.charset = WINDOWS_1252;
            r.fallback = true;
        }
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

    /** A record read ahead (while the header was looked for), kept as its cells. */
    private static final class Kept implements CsvRecords {
        final long line;
        final List<String> cells;

        Kept(long line, List<String> cells) {
            this.line = line;
            this.cells = cells;
        }

        @Override
        public char sniffDelimiter() {
            return ',';
        }

        @Override
        public char sniffDelimiter(long headerLine) {
            return ',';
        }

        @Override
        public void delimiter(char d) {
        }

        @Override
        public boolean next() {
            return false;
        }

        @Override
        public int size() {
            return cells.size();
        }

        @Override
        public String get(int i) {
            return cells.get(i);
        }

        @Override
        public long startLine() {
            return line;
        }
    }

    private Summary readRecords(CsvRecords lexer, char delimiter, Sink sink) throws IOException {
        // Header: the first non-blank record whose headings name the required columns (title rows
        // above it are skipped), or the one --header-row names; else the first non-blank record.
        List<Kept> ahead = new ArrayList<>();
        List<String> header = null;
        long headerLine = 0;
        try {
            while (lexer.next()) {
                if (lexer.blank()) {
                    continue;
                }
                long line = lexer.startLine();
                if (options.headerRow() > 0) {
                    if (line < options.headerRow()) {
                        ahead.add(new Kept(line, lexer.toList()));
                        continue;
                    }
                    if (line > options.headerRow()) {
                        return fatal(null, List.of(), delimiter, Problem.ofLine(file, options.headerRow(),
                                "--header-row " + options.headerRow() + ": that " + (sheetRows ? "row" : "line")
                                        + " is blank or inside a row (expected the header naming the columns)"));
                    }
                    header = lexer.toList();
                    headerLine = line;
                    break;
                }
                Kept k = new Kept(line, lexer.toList());
                ahead.add(k);
                if (headerKind(k.cells) != null) {
                    header = k.cells;
                    headerLine = line;
                    ahead.remove(ahead.size() - 1);
                    break;
                }
                if (ahead.size() >= CsvRecords.SNIFF_LINES) {
                    break;
                }
            }
        } catch (IOException e) {
            return fatal(null, List.of(), delimiter, readFailure(e, lexer.startLine(), null));
        }
        List<Kept> pending = new ArrayList<>();
        if (header == null && !ahead.isEmpty() && options.headerRow() == 0) {
            header = ahead.get(0).cells; // none names the columns: the first, whose problems are then listed
            headerLine = ahead.get(0).line;
            pending.addAll(ahead.subList(1, ahead.size()));
            ahead.clear();
        }
        if (header == null) {
            return fatal(null, List.of(), delimiter, Problem.ofLine(file, 0,
                    "the file has no header line (expected a header naming the columns, then one row per part)"));
        }
        if (!ahead.isEmpty()) {
            note("note: " + file + ": " + ahead.size() + (ahead.size() == 1 ? " row" : " rows") + " above the header"
                    + " skipped (" + (sheetRows ? "row " : "line ") + ahead.get(0).line + ": "
                    + Problem.quote(String.join(" ", ahead.get(0).cells).strip()) + "); the header is "
                    + (sheetRows ? "row " : "line ") + headerLine);
        }
        if (lexer instanceof XlsxRecords x) {
            x.minWidth(header.size());
        }
        Layout layout = layout(header, headerLine, delimiter);
        if (layout == null) {
            return new Summary(file, kindOrNull(header), "", 0, 0, header, List.of(), delimiter, problems,
                    problemCount, true, headingsOf(header, null), missingOf(header), notes);
        }
        Schema schema = Schema.of(layout.kind);
        boolean decimalComma = delimiter != ',';
        String keyColumn = layout.kind == Kind.STAGE ? "stage" : "part_number";
        Map<String, Long> seen = new HashMap<>();
        long rows = 0;
        long rejected = 0;
        boolean fatal = false;
        boolean first = true;
        List<String> unitsRow = List.of();
        int next = 0;
        while (true) {
            CsvRecords rec;
            if (next < pending.size()) {
                rec = pending.get(next++);
            } else {
                try {
                    if (!lexer.next()) {
                        break;
                    }
                } catch (IOException e) {
                    add(readFailure(e, lexer.startLine(), header));
                    fatal = true;
                    break;
                }
                rec = lexer;
            }
            long start = rec.startLine();
            if (rec.blank()) {
                continue;
            }
            if (first) {
                first = false;
                if (unitsRow(layout, rec)) {
                    unitsRow = rec.toList();
                    if (!applyUnits(layout, unitsRow, start)) {
                        fatal = true;
                        break;
                    }
                    continue;
                }
            }
            if (layout.format == null) {
                layout.format = new Format(delimiter, header, unitsRow);
                sink.format(layout.format);
            }
            List<Problem> rowProblems = new ArrayList<>(2);
            Row row = parseRow(schema, layout, rec, start, decimalComma, keyColumn, rowProblems);
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
                if (layout.format == null) {
                    layout.format = new Format(delimiter, header, unitsRow);
                    sink.format(layout.format);
                }
                sink.reject(header, start, rec.toList(), rowProblems);
                rejected++;
            }
        }
        readingNotes(layout, schema);
        if (!fatal && rows == 0 && rejected == 0) {
            add(Problem.ofLine(file, headerLine, "the file has a header but no rows (expected one row per "
                    + (layout.kind == Kind.STAGE ? "stage" : layout.kind.id()) + " after the header)"));
            fatal = true;
        }
        return new Summary(file, layout.kind, "", rows, rejected, header, layout.unknown, delimiter, problems,
                problemCount, fatal, headingsOf(header, layout.kind), missingOf(header), notes);
    }

    /** The kind a record names the required columns of (forced or told), or null when it is no header. */
    private Kind headerKind(List<String> cells) {
        if (forced != null) {
            return covers(Schema.of(forced), cells) ? forced : null;
        }
        Kind k = kindOrNull(cells);
        return k != null && covers(Schema.of(k), cells) ? k : null;
    }

    /** Whether the headings name every required column of the schema (one gate limit names both). */
    private boolean covers(Schema schema, List<String> cells) {
        java.util.Set<String> cols = new java.util.HashSet<>();
        for (String h : cells) {
            Headings.Read r = Headings.read(schema, h, options.mapping());
            if (r.column() != null) {
                cols.add(r.column());
            }
        }
        for (String req : schema.requiredNames()) {
            if (!cols.contains(req) && !cols.contains(partner(schema.kind(), req))) {
                return false;
            }
        }
        return true;
    }

    /** The column a cell of {@code column} may fill too (the other gate limit: {@code ±20}), or null. */
    private static String partner(Kind kind, String column) {
        if (kind != Kind.SWITCH) {
            return null;
        }
        return switch (column) {
            case "v_gs_max_v" -> "v_gs_min_v";
            case "v_gs_min_v" -> "v_gs_max_v";
            default -> null;
        };
    }

    /** Heading → column ("" for an extra attribute) as read for {@code kind} (null: told from the headings), for --suggest-map. */
    private Map<String, String> headingsOf(List<String> header, Kind kind) {
        Kind k = kind != null ? kind : forced != null ? forced : kindOrNull(header);
        Map<String, String> m = new LinkedHashMap<>();
        if (k == null) {
            return m;
        }
        Schema schema = Schema.of(k);
        for (String h : header) {
            if (!h.isBlank()) {
                Headings.Read r = Headings.read(schema, h, options.mapping());
                m.putIfAbsent(h.strip(), r.column() == null ? "" : r.column());
            }
        }
        return m;
    }

    /** Per required column no heading names, the nearest headings, for messages and --suggest-map. */
    private Map<String, List<String>> missingOf(List<String> header) {
        Kind k = forced != null ? forced : kindOrNull(header);
        Map<String, List<String>> m = new LinkedHashMap<>();
        if (k == null) {
            return m;
        }
        Schema schema = Schema.of(k);
        java.util.Set<String> named = new java.util.HashSet<>();
        List<String> free = new ArrayList<>();
        for (String h : header) {
            if (h.isBlank()) {
                continue;
            }
            Headings.Read r = Headings.read(schema, h, options.mapping());
            if (r.column() != null) {
                named.add(r.column());
            } else {
                free.add(h.strip());
            }
        }
        for (String req : schema.requiredNames()) {
            if (!named.contains(req) && !named.contains(partner(k, req))) {
                m.put(req, Headings.nearest(schema.column(req).orElseThrow(), free, 3));
            }
        }
        return m;
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
        /** Power of ten of a bare number in each schema column (the heading's or units row's unit). */
        int[] bareExponent;
        /** The heading (as written) of each schema column, or null. */
        String[] heading;
        /** {@link Cells#quickChoices} of each schema column, in schema order. */
        String[][] quickChoices;
        /**
         * Per schema column with a pattern: cells already read and their values (catalogs repeat a
         * few such values; the pattern match is costly). Cells.parse is a function of the cell text.
         */
        Map<String, Object>[] memo;
        /** Per schema column: cells read another way than as written (cell → reading), for one note each. */
        Map<String, String>[] readings;
        int width;
        /** Slots of the gate limits and technology/channel (switches), or -1. */
        int gateMax = -1;
        int gateMin = -1;
        int technology = -1;
        int channel = -1;
        String decimalCommaSeen;
        Format format;

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
        Map<String, Headings.Read> reads = new HashMap<>();
        java.util.Set<String> named = new java.util.HashSet<>(); // columns named exactly: they win over other headings
        for (String h : header) {
            schema.column(h.strip().toLowerCase(Locale.ROOT)).ifPresent(c -> named.add(c.name()));
        }
        List<String> readAs = new ArrayList<>();
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
            if (name.equals(REJECTED_LINE) || name.equals(REJECTED_BECAUSE)) {
                continue; // a rejects file's reasons: not part of the row
            }
            Headings.Read r = Headings.read(schema, header.get(i), options.mapping());
            if (r.column() != null && !r.mapped() && named.contains(r.column()) && !r.heading().equalsIgnoreCase(r.column())) {
                note("note: " + file + ": heading " + Problem.quote(r.heading()) + " is kept as an extra attribute: the"
                        + " column " + r.column() + " is named as it is");
                r = new Headings.Read(r.heading(), null, null, 0, false, List.of(), null);
            }
            if (r.problem() != null) {
                add(new Problem(file, line, r.column(), i + 1, header.get(i), "heading " + Problem.quote(r.heading())
                        + ": " + r.problem()));
                ok = false;
                continue;
            }
            if (r.column() != null) {
                Integer other = l.index.get(r.column());
                if (other != null) {
                    add(new Problem(file, line, r.column(), i + 1, header.get(i), "headings "
                            + Problem.quote(header.get(other).strip()) + " (column " + (other + 1) + ") and "
                            + Problem.quote(r.heading()) + " both name column " + r.column() + " (expected one; keep the"
                            + " other as an extra attribute with --map " + Problem.quote(r.heading() + "=") + ")"));
                    ok = false;
                    continue;
                }
                l.index.put(r.column(), i);
                reads.put(r.column(), r);
                if (!r.heading().equalsIgnoreCase(r.column()) || r.unitText() != null) {
                    Column c = schema.column(r.column()).orElseThrow();
                    readAs.add(Problem.quote(r.heading()) + " → " + r.column() + (r.mapped() ? " (mapped)" : "")
                            + unitWords(c, r));
                }
            } else {
                if (!r.ambiguous().isEmpty()) {
                    note("note: " + file + ": heading " + Problem.quote(r.heading()) + " could be "
                            + String.join(" or ", r.ambiguous()) + "; not guessed, kept as an extra attribute (say which"
                            + " with --map " + Problem.quote(r.heading() + "=" + r.ambiguous().get(0)) + ")");
                } else if (!r.mapped()) {
                    String near = Headings.misspeltColumn(schema, r.heading());
                    if (near != null) {
                        note("warning: " + file + ": column " + Problem.quote(r.heading()) + " is not a "
                                + l.kind.id() + " column and is not used (kept as an extra attribute); did you mean "
                                + near + "?");
                    }
                }
                String extra = Cells.restoreText(header.get(i).strip()); // as export neutralised it
                l.unknown.add(extra);
                l.extraIndex.put(i, extra);
            }
        }
        if (!readAs.isEmpty()) {
            note("note: " + file + ": headings read as columns:\n  " + String.join("\n  ", readAs));
        }
        List<String> missing = new ArrayList<>();
        for (String r : schema.requiredNames()) {
            if (!l.index.containsKey(r) && !l.index.containsKey(partner(l.kind, r))) {
                missing.add(r);
            }
        }
        if (!missing.isEmpty()) {
            StringBuilder near = new StringBuilder();
            Map<String, List<String>> nearest = missingOf(header);
            for (String m : missing) {
                List<String> n = nearest.getOrDefault(m, List.of());
                if (!n.isEmpty()) {
                    near.append(near.length() == 0 ? "; nearest headings: " : "; ").append(m).append(" ← ")
                            .append(String.join(", ", n.stream().map(Problem::quote).toList()));
                }
            }
            add(Problem.ofLine(file, line, "missing required column" + (missing.size() > 1 ? "s " : " ")
                    + String.join(", ", missing) + " for a " + l.kind.id() + " " + (l.kind == Kind.STAGE ? "sheet" : "catalog")
                    + " (expected columns: " + String.join(", ", schema.requiredNames()) + "; found: "
                    + Problem.names(header) + near + (near.length() > 0 ? "; name them with --map 'HEADING=column'" : "")
                    + ")"));
            ok = false;
        }
        if (!ok) {
            return null;
        }
        l.columnAt = new int[schema.columns().size()];
        l.bareExponent = new int[l.columnAt.length];
        l.heading = new String[l.columnAt.length];
        l.quickChoices = new String[l.columnAt.length][];
        @SuppressWarnings({"unchecked", "rawtypes"})
        Map<String, Object>[] memo = new Map[l.columnAt.length];
        l.memo = memo;
        @SuppressWarnings({"unchecked", "rawtypes"})
        Map<String, String>[] readings = new Map[l.columnAt.length];
        l.readings = readings;
        for (int i = 0; i < l.columnAt.length; i++) {
            Column c = schema.columns().get(i);
            Integer at = l.index.get(c.name());
            l.columnAt[i] = at == null ? -1 : at;
            Headings.Read r = reads.get(c.name());
            l.bareExponent[i] = r != null ? r.bareExponent() : c.unit() == null ? 0 : c.unit().exponent();
            l.heading[i] = at == null ? null : header.get(at).strip();
            l.quickChoices[i] = Cells.quickChoices(c);
            if (c.type() == ColumnType.TEXT && c.pattern() != null) {
                l.memo[i] = new HashMap<>();
            }
        }
        if (l.kind == Kind.SWITCH) {
            l.gateMax = schema.slot("v_gs_max_v");
            l.gateMin = schema.slot("v_gs_min_v");
            l.technology = schema.slot("technology");
            l.channel = schema.slot("channel");
        }
        return l;
    }

    /** " (bare numbers in Ω, converted to mΩ)" or " (V)" for the note of headings read. */
    private static String unitWords(Column c, Headings.Read r) {
        if (r.unitText() == null) {
            return "";
        }
        if (c.unit() == null) {
            return " (" + r.unitText() + ", kept as written)";
        }
        if (r.bareExponent() == c.unit().exponent() && c.unit().dimension() != Dimension.RATIO) {
            return " (" + r.unitText() + ")";
        }
        return " (bare numbers in " + r.unitText() + ", converted to " + (c.unit().dimension() == Dimension.RATIO
                ? "a fraction" : c.unitSymbol()) + ")";
    }

    /**
     * Whether the first row under the header is a row of units ({@code V}, {@code mΩ}, {@code (nC)}):
     * the key column empty, at least one cell a unit and every other cell empty, a unit, a currency
     * or a dash.
     */
    private boolean unitsRow(Layout l, CsvRecords rec) {
        Integer key = l.index.get(l.kind == Kind.STAGE ? "stage" : "part_number");
        if (key != null && key < rec.size() && !rec.get(key).isBlank()) {
            return false;
        }
        int units = 0;
        for (int i = 0; i < rec.size(); i++) {
            String u = unitText(rec.get(i));
            if (u.isEmpty() || u.equals("-")) {
                continue;
            }
            if (Units.headingDimension(u) != null || u.equals("%")) {
                units++;
            } else if (!Headings.isCurrency(u)) {
                return false;
            }
        }
        return units > 0;
    }

    /** A units cell without brackets around it. */
    private static String unitText(String cell) {
        String u = cell.strip();
        if (u.length() >= 2 && (u.charAt(0) == '(' && u.endsWith(")") || u.charAt(0) == '[' && u.endsWith("]"))) {
            u = u.substring(1, u.length() - 1).strip();
        }
        return u;
    }

    /** Takes the units row's unit for each numeric column; false after a problem (a unit of another dimension). */
    private boolean applyUnits(Layout l, List<String> units, long line) {
        Schema schema = Schema.of(l.kind);
        boolean ok = true;
        List<String> read = new ArrayList<>();
        for (int ci = 0; ci < l.columnAt.length; ci++) {
            int at = l.columnAt[ci];
            if (at < 0 || at >= units.size()) {
                continue;
            }
            String u = unitText(units.get(at));
            Column c = schema.columns().get(ci);
            if (u.isEmpty() || u.equals("-") || c.unit() == null) {
                continue;
            }
            Integer e = Units.headingExponent(u, c.unit().dimension());
            if (e == null) {
                add(new Problem(file, line, c.name(), at + 1, units.get(at), "the units row gives " + Problem.quote(u)
                        + " for " + c.name() + ", which is a " + c.unit().dimension().quantity() + " (expected a unit such as "
                        + c.unitSymbol() + ")"));
                ok = false;
                continue;
            }
            l.bareExponent[ci] = e;
            read.add(Problem.quote(l.heading[ci]) + " in " + u);
        }
        if (ok) {
            note("note: " + file + ": " + (sheetRows ? "row " : "line ") + line + " read as the headings' units"
                    + (read.isEmpty() ? "" : ": " + String.join(", ", read)));
        }
        return ok;
    }

    /** Readings of a row's cells that fill two columns at once; by schema slot, or null when none. */
    private String[] splits(Layout l, CsvRecords rec, List<Problem> out, long line) {
        if (l.kind != Kind.SWITCH) {
            return null;
        }
        String[] over = null;
        for (int slot : new int[] {l.gateMax, l.gateMin}) {
            int at = l.columnAt[slot];
            if (at < 0 || at >= rec.size() || !holds(rec, at, "±/")) {
                continue; // the common cell, read without a string made of it
            }
            String cell = rec.get(at);
            String[] both = Cells.gateLimits(cell);
            if (both == null) {
                continue;
            }
            over = over == null ? new String[l.columnAt.length] : over;
            over[slot] = slot == l.gateMax ? both[0] : both[1];
            int other = slot == l.gateMax ? l.gateMin : l.gateMax;
            int otherAt = l.columnAt[other];
            if (over[other] == null && (otherAt < 0 || otherAt >= rec.size() || rec.get(otherAt).isBlank())) {
                over[other] = slot == l.gateMax ? both[1] : both[0];
                reading(l, slot, cell, "v_gs_max_v " + both[0] + ", v_gs_min_v " + both[1]);
            }
        }
        int at = l.columnAt[l.technology];
        if (at >= 0 && at < rec.size() && holds(rec, at, " ,(/")) {
            String cell = rec.get(at);
            String[] tc = Cells.technologyWithChannel(cell);
            if (tc != null && Cells.tolerantChoice(Schema.of(l.kind).columns().get(l.technology), cell) == null) {
                over = over == null ? new String[l.columnAt.length] : over;
                over[l.technology] = tc[0];
                int chAt = l.columnAt[l.channel];
                if (chAt < 0 || chAt >= rec.size() || rec.get(chAt).isBlank()) {
                    over[l.channel] = tc[1];
                } else {
                    String given = Cells.tolerantChoice(Schema.of(l.kind).columns().get(l.channel), rec.get(chAt));
                    if (given != null && !given.equals(tc[1])) {
                        out.add(new Problem(file, line, "technology", at + 1, cell, Problem.quote(cell) + " names channel "
                                + tc[1] + " but the channel column says " + Problem.quote(rec.get(chAt).strip())
                                + " (expected the two to agree)"));
                    }
                }
                String tech;
                try {
                    Object v = Cells.parse(Schema.of(l.kind).columns().get(l.technology), tc[0], false);
                    tech = String.valueOf(v);
                } catch (BadValueException e) {
                    tech = null; // the technology's own problem is found when it is read
                }
                if (tech != null) {
                    reading(l, l.technology, cell, tech + " with channel " + tc[1]);
                }
            }
        }
        return over;
    }

    /** Whether cell {@code at} holds one of {@code chars} (a quick test before a cell is split). */
    private static boolean holds(CsvRecords rec, int at, String chars) {
        int from = rec.from(at);
        if (from < 0) {
            String cell = rec.get(at).strip();
            for (int i = 0; i < cell.length(); i++) {
                if (chars.indexOf(cell.charAt(i)) >= 0) {
                    return true;
                }
            }
            return false;
        }
        char[] c = rec.chars();
        int to = rec.to(at);
        while (to > from && Character.isWhitespace(c[to - 1])) {
            to--;
        }
        while (from < to && Character.isWhitespace(c[from])) {
            from++;
        }
        for (int i = from; i < to; i++) {
            if (chars.indexOf(c[i]) >= 0) {
                return true;
            }
        }
        return false;
    }

    /** Remembers how a cell was read (the first few per column), for the column's note. */
    private void reading(Layout l, int slot, String cell, String as) {
        Map<String, String> m = l.readings[slot];
        if (m == null) {
            m = l.readings[slot] = new LinkedHashMap<>();
        }
        if (m.size() < READINGS_SHOWN) {
            m.putIfAbsent(cell.strip(), as);
        } else if (!m.containsKey(cell.strip())) {
            m.put("…", "");
        }
    }

    /** Distinct readings a column's note shows. */
    private static final int READINGS_SHOWN = 8;

    /** The notes of the readings, one per column, and of the decimal commas. */
    private void readingNotes(Layout l, Schema schema) {
        if (l.decimalCommaSeen != null) {
            note("note: " + file + ": " + (delimiter == ';' ? "semicolon" : "tab") + "-separated, so a comma in a"
                    + " number is its decimal mark (" + Problem.quote(l.decimalCommaSeen) + " read as "
                    + l.decimalCommaSeen.strip().replace(',', '.') + ")");
        }
        for (int i = 0; i < l.readings.length; i++) {
            Map<String, String> m = l.readings[i];
            if (m == null) {
                continue;
            }
            List<String> parts = new ArrayList<>();
            m.forEach((cell, as) -> parts.add(cell.equals("…") && as.isEmpty() ? "…" : Problem.quote(cell) + " as " + as));
            String col = schema.columns().get(i).name();
            note("note: " + file + ": column " + Problem.quote(l.heading[i]) + (l.heading[i].equals(col) ? "" : " (" + col + ")")
                    + " read " + String.join(", ", parts));
        }
    }

    private Row parseRow(Schema schema, Layout l, CsvRecords rec, long line, boolean decimalComma, String keyColumn,
                         List<Problem> out) {
        if (rec.size() != l.width && !(sheetRows && blankFrom(rec, l.width))) {
            out.add(Problem.ofLine(file, line, "the row has " + rec.size() + " cells but the header has " + l.width
                    + " (expected one cell per column; a value holding the separator needs double quotes)"));
            return null;
        }
        String[] over = splits(l, rec, out, line);
        List<Column> columns = schema.columns();
        Object[] values = new Object[columns.size()]; // by schema position: the row's map without a node per value
        for (int ci = 0; ci < columns.size(); ci++) {
            Column c = columns.get(ci);
            int at = l.columnAt[ci];
            boolean own = c.unit() == null || l.bareExponent[ci] == c.unit().exponent();
            if (at >= 0 && rec.from(at) >= 0 && own && (over == null || over[ci] == null)) {
                // A plain number or exact choice straight from the characters, as Cells.parse reads it.
                Object quick = Cells.parseQuick(c, l.quickChoices[ci], rec.chars(), rec.from(at), rec.to(at), decimalComma);
                if (quick != null) {
                    if (decimalComma && l.decimalCommaSeen == null && c.isNumeric()) {
                        commaSeen(l, rec.chars(), rec.from(at), rec.to(at));
                    }
                    values[ci] = quick;
                    continue;
                }
            }
            String cell = over != null && over[ci] != null ? over[ci] : at < 0 ? "" : rec.get(at);
            Map<String, Object> memo = l.memo[ci];
            Object v = memo == null ? null : memo.get(cell);
            try {
                if (v == null) {
                    v = Cells.parse(c, cell, decimalComma, l.bareExponent[ci]);
                    if (memo != null && v != null && memo.size() < MEMO_CAP) {
                        memo.put(cell, v);
                    }
                }
            } catch (BadValueException e) {
                out.add(new Problem(file, line, c.name(), at + 1, cell, e.getMessage())); // an empty cell never fails
                continue;
            }
            if (v != null && c.type() == ColumnType.CHOICE && (over == null || over[ci] == null)
                    && !v.equals(cell.strip().toLowerCase(Locale.ROOT)) && !(c.choices().size() == 2
                    && c.choices().contains("yes"))) {
                reading(l, ci, cell, v.toString());
            }
            if (v != null && decimalComma && l.decimalCommaSeen == null && c.isNumeric() && cell.indexOf(',') >= 0) {
                l.decimalCommaSeen = cell.strip();
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
            String v = i < rec.size() ? rec.get(i).strip() : "";
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

    /** Whether every cell from {@code from} on is blank (a workbook's row may run past the header). */
    private static boolean blankFrom(CsvRecords rec, int from) {
        for (int i = from; i < rec.size(); i++) {
            if (!rec.get(i).isBlank()) {
                return false;
            }
        }
        return rec.size() >= from;
    }

    private static void commaSeen(Layout l, char[] chars, int from, int to) {
        for (int i = from; i < to; i++) {
            if (chars[i] == ',') {
                l.decimalCommaSeen = new String(chars, from, to - from).strip();
                return;
            }
        }
    }

    /** Adds a note and tells the options' listener at once. */
    private void note(String n) {
        notes.add(n);
        options.notes().accept(n);
    }

    /**
     * The kind a header names: {@code technology} for switches, {@code topology} for drivers,
     * {@code stage} for a stage sheet; else the one kind whose required columns its headings name.
     */
    private Kind kindOrNull(List<String> header) {
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
        if (tech || topo) {
            return null;
        }
        Kind found = null;
        for (Kind k : Kind.values()) {
            if (covers(Schema.of(k), header)) {
                if (found != null) {
                    return null;
                }
                found = k;
            }
        }
        return found;
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
                return notDecodable(line);
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

    private Problem notDecodable(long line) {
        if (fallback) {
            return Problem.ofLine(file, line, "the file is neither UTF-8 nor Windows-1252 text from here on (expected"
                    + " text; is it a binary file? --encoding NAME reads another encoding)");
        }
        if (charset == null || charset.equals(StandardCharsets.UTF_8)) {
            return Problem.ofLine(file, line, "the file is not UTF-8 text from here on (expected a UTF-8 CSV file;"
                    + " is it a binary file, or saved in another encoding?)");
        }
        return Problem.ofLine(file, line, "the file is not " + charset.name() + " text from here on (expected text in"
                + " that encoding; is it a binary file, or saved in another?)");
    }

    private Summary fatal(Kind kind, List<String> header, char delimiter, Problem p) {
        add(p);
        return new Summary(file, kind, "", 0, 0, header, List.of(), delimiter, problems, problemCount, true, Map.of(),
                Map.of(), notes);
    }

    private void add(Problem p) {
        if (sheetRows) {
            p = p.inSheetRows();
        }
        problemCount++;
        if (problems.size() < PROBLEM_CAP) {
            problems.add(p);
        }
    }

    /**
     * Decodes strictly like an {@code InputStreamReader} with {@link CodingErrorAction#REPORT},
     * but first hands out every character before a malformed byte and fails only on the read that
     * reaches it. ({@code InputStreamReader} fails the whole read, which drops up to a buffer of
     * good lines and makes the error look as if it were on the first line.)
     */
    private static final class StrictReader extends Reader {
        private final InputStream in;
        private final CharsetDecoder decoder;
        private final ByteBuffer bytes = ByteBuffer.allocate(8192).flip();
        private boolean eof;
        private boolean flushed;

        StrictReader(InputStream in, Charset charset) {
            this.in = in;
            this.decoder = charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT);
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
