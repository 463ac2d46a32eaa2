package org.gatefit.catalog;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Splits CSV text into records exactly as Commons CSV 1.14's parser does with
 * {@code CSVFormat.DEFAULT} and the settings {@link SheetReader} used with it (one-character
 * delimiter, double quote, no escape, no comments, empty lines kept, surrounding spaces kept), but
 * on one buffer, without per-character calls: it was most of the parse time of an import.
 * {@code CsvLexerTest} holds it equal to Commons CSV (cells, start lines, the kind of syntax problem).
 *
 * <ul>
 *   <li>A record ends at LF, CR or CRLF, or at the end of the input; the end of the input right after
 *       a line end (or at the start) is no record. An empty line is a record of one empty cell.</li>
 *   <li>A double quote opens a quoted cell only as a cell's first character; inside, {@code ""} is one
 *       quote and line ends are kept as written. After the closing quote, whitespace
 *       ({@link Character#isWhitespace}) is skipped up to the delimiter or line end; anything else
 *       is an error, as is the end of the input inside quotes: a {@link CsvSyntaxException} with the
 *       record's start line and the cell's position.</li>
 *   <li>Lines are counted as Commons CSV counts them: each CR, and each LF not right after a CR, so a
 *       record's start line is the physical line an editor shows.</li>
 *   <li>Characters are taken from the reader only when needed (a CR looks at the next one, as does a
 *       quote inside a quoted cell), so a reader that fails part-way (not UTF-8) fails on the same
 *       record as it did under Commons CSV.</li>
 * </ul>
 */
final class CsvLexer implements CsvRecords {
    private final Reader in;
    private char delimiter = ',';
    private char[] buf = new char[1 << 17]; // larger than CsvRecords.SNIFF_LIMIT: detection never compacts
    private int pos;
    private int end;
    /** Start of the characters that must survive a refill: the current record. */
    private int mark;
    /** How far the last {@link #fill} moved the characters to the front. */
    private int moved;
    private boolean eof;
    private boolean done;
    /** Line ends consumed so far. */
    private long lines;
    /** The current record's cells: text made on demand from {@code buf[from[i]..to[i])}, or set (unquoted ""). */
    private String[] cells = new String[32];
    private int[] from = new int[32];
    private int[] to = new int[32];
    private int size;
    private long start;
    private final StringBuilder quotedText = new StringBuilder();

    CsvLexer(Reader in) {
        this.in = in;
    }

    /** {@link CsvRecords#sniff} over the buffer (which only grows here: mark and pos are 0). */
    @Override
    public char sniffDelimiter() throws IOException {
        return sniffDelimiter(0);
    }

    @Override
    public char sniffDelimiter(long headerLine) throws IOException {
        return CsvRecords.sniff(i -> {
            while (i >= end) {
                try {
                    if (!fill()) {
                        return -1;
                    }
                } catch (java.nio.charset.CharacterCodingException e) {
                    return -1; // the text before it decides; reading the records meets it again, on its line
                }
            }
            return buf[i];
        }, headerLine);
    }

    @Override
    public void delimiter(char d) {
        this.delimiter = d;
    }

    /** Number of cells of the current record. */
    @Override
    public int size() {
        return size;
    }

    /** Cell {@code i} of the current record. */
    @Override
    public String get(int i) {
        if (i >= size) {
            throw new IndexOutOfBoundsException("cell " + i + " of " + size);
        }
        String c = cells[i];
        if (c == null) {
            c = from[i] == to[i] ? "" : new String(buf, from[i], to[i] - from[i]);
            cells[i] = c;
        }
        return c;
    }

    /**
     * The characters of the current record, valid until the next {@link #next}: cell {@code i} is
     * {@code chars()[from(i)..to(i))} unless {@link #from} is negative (a quoted cell with {@code ""}
     * in it: read it by {@link #get}).
     */
    @Override
    public char[] chars() {
        return buf;
    }

    @Override
    public int from(int i) {
        return from[i];
    }

    @Override
    public int to(int i) {
        return to[i];
    }

    /** The cells of the current record, as a new list the caller may keep. */
    @Override
    public List<String> toList() {
        List<String> l = new ArrayList<>(size);
        for (int i = 0; i < size; i++) {
            l.add(get(i));
        }
        return l;
    }

    /** Physical line the current record starts on. */
    @Override
    public long startLine() {
        return start;
    }

    /** Whether every cell of the current record is blank ({@link String#isBlank}). */
    @Override
    public boolean blank() {
        for (int i = 0; i < size; i++) {
            if (!blank(i)) {
                return false;
            }
        }
        return true;
    }

    private boolean blank(int i) {
        if (from[i] < 0) {
            return cells[i].isBlank();
        }
        for (int j = from[i], n = to[i]; j < n; j++) {
            char ch = buf[j];
            if (ch >= 128) {
                return get(i).isBlank(); // whitespace beyond ASCII: as String does it, by code point
            }
            if (!Character.isWhitespace(ch)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Reads the next record.
     *
     * @return false at the end of the input
     * @throws IOException from the reader, or a {@link CsvSyntaxException} for bad quoting
     */
    @Override
    public boolean next() throws IOException {
        if (done) {
            return false;
        }
        Arrays.fill(cells, 0, size, null);
        size = 0;
        start = lines + 1;
        mark = pos;
        if (pos == end && !fill()) {
            done = true;
            return false;
        }
        while (true) { // at the start of a cell
            if (pos == end && !fill()) { // end of input right after a delimiter: one more empty cell
                add(pos, pos);
                done = true;
                return true;
            }
            if (buf[pos] == '"') {
                if (quoted()) {
                    return true;
                }
                continue;
            }
            int first = pos;
            int p = pos;
            char d = delimiter;
            while (true) {
                if (p == end) {
                    pos = p;
                    boolean more = fill();
                    first -= moved;
                    if (!more) {
                        add(first, pos);
                        done = true;
                        return true;
                    }
                    p = pos;
                    continue;
                }
                char ch = buf[p];
                if (ch == d) {
                    add(first, p);
                    pos = p + 1;
                    break;
                }
                if (ch == '\n') {
                    add(first, p);
                    lines++;
                    pos = p + 1;
                    return true;
                }
                if (ch == '\r') {
                    add(first, p);
                    lines++;
                    pos = p + 1;
                    skipLf();
                    return true;
                }
                p++;
            }
        }
    }

    /** A quoted cell from the opening quote at {@link #pos}; returns whether the record ended with it. */
    private boolean quoted() throws IOException {
        pos++;
        int seg = pos; // start of the text not yet copied to quotedText
        boolean escaped = false;
        boolean cr = false;
        int p = pos;
        while (true) {
            if (p == end) {
                pos = p;
                boolean more = fill();
                seg -= moved;
                if (!more) {
                    throw new CsvSyntaxException(CsvSyntaxException.Syntax.UNCLOSED_QUOTE, start, size + 1, null);
                }
                p = pos;
                continue;
            }
            char ch = buf[p];
            if (ch == '"') {
                if (p + 1 == end) {
                    pos = p;
                    fill(); // a look at the next character; at the end of input this quote closes
                    seg -= moved;
                    p = pos;
                }
                if (p + 1 < end && buf[p + 1] == '"') {
                    if (!escaped) {
                        quotedText.setLength(0);
                        escaped = true;
                    }
                    quotedText.append(buf, seg, p + 1 - seg);
                    p += 2;
                    seg = p;
                    cr = false;
                    continue;
                }
                if (escaped) {
                    add(quotedText.append(buf, seg, p - seg).toString());
                } else {
                    add(seg, p);
                }
                pos = p + 1;
                return afterQuote();
            }
            if (ch == '\r') {
                lines++;
                cr = true;
            } else {
                if (ch == '\n' && !cr) {
                    lines++;
                }
                cr = false;
            }
            p++;
        }
    }

    /** After a closing quote (its cell already added): whitespace, then the delimiter, a line end or the end of input. */
    private boolean afterQuote() throws IOException {
        while (true) {
            if (pos == end && !fill()) {
                done = true;
                return true;
            }
            char ch = buf[pos++];
            if (ch == delimiter) {
                return false;
            }
            if (ch == '\n') {
                lines++;
                return true;
            }
            if (ch == '\r') {
                lines++;
                skipLf();
                return true;
            }
            if (!Character.isWhitespace(ch)) {
                throw new CsvSyntaxException(CsvSyntaxException.Syntax.TEXT_AFTER_QUOTE, start, size, null);
            }
        }
    }

    /** After a CR: takes an LF right behind it as part of the line end. */
    private void skipLf() throws IOException {
        if (pos == end && !fill()) {
            return;
        }
        if (buf[pos] == '\n') {
            pos++;
        }
    }

    private void grow() {
        int n = size * 2;
        cells = Arrays.copyOf(cells, n);
        from = Arrays.copyOf(from, n);
        to = Arrays.copyOf(to, n);
    }

    /** Adds a cell read as {@code buf[first..last)}. */
    private void add(int first, int last) {
        if (size == cells.length) {
            grow();
        }
        from[size] = first;
        to[size] = last;
        size++;
    }

    /** Adds a cell whose text had to be put together ({@code ""} inside quotes). */
    private void add(String cell) {
        if (size == cells.length) {
            grow();
        }
        cells[size] = cell;
        from[size] = -1;
        to[size] = -1;
        size++;
    }

    /**
     * Reads more characters behind {@link #end}, first moving the current record
     * ({@code buf[mark..end)}) to the front, and growing the buffer when that is all of it. Adjusts
     * {@link #pos}, {@link #mark} and the cells read so far.
     *
     * How far they moved is left in {@link #moved}, for the caller's own indices.
     *
     * @return false at the end of the input
     */
    private boolean fill() throws IOException {
        moved = 0;
        if (eof) {
            return false;
        }
        int shift = mark;
        moved = shift;
        if (shift > 0) {
            System.arraycopy(buf, shift, buf, 0, end - shift);
            end -= shift;
            pos -= shift;
            mark = 0;
            for (int i = 0; i < size; i++) {
                if (from[i] >= 0) {
                    from[i] -= shift;
                    to[i] -= shift;
                }
            }
        }
        if (end == buf.length) {
            buf = Arrays.copyOf(buf, buf.length * 2);
        }
        int n;
        do {
            n = in.read(buf, end, buf.length - end);
        } while (n == 0);
        if (n < 0) {
            eof = true;
            return false;
        }
        end += n;
        return true;
    }
}
