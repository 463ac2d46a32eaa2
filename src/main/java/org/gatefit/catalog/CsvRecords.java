package org.gatefit.catalog;

import java.io.IOException;
import java.util.List;

/**
 * CSV text as records, one at a time, with {@code CSVFormat.DEFAULT}'s rules and the settings
 * {@link SheetReader} reads with (one-character delimiter, double quote, no escape, no comments,
 * empty lines kept, surrounding spaces kept). Two readers stand behind it: the hand-written
 * {@link CsvLexer} (the fast path) and Commons CSV ({@link CommonsCsvRecords}, the reference);
 * {@link FastPath#CSV} picks one.
 */
interface CsvRecords {
    /** Characters the delimiter detection looks at, at most. */
    int SNIFF_LIMIT = 1 << 16;

    /** Picks the delimiter (see {@link #sniff}), reading nothing away. */
    char sniffDelimiter() throws IOException;

    /** {@link #sniffDelimiter()} with the header on physical line {@code headerLine} (0: found as {@link #sniff} finds it). */
    char sniffDelimiter(long headerLine) throws IOException;

    void delimiter(char d);

    /**
     * Reads the next record.
     *
     * @return false at the end of the input
     * @throws CsvSyntaxException for malformed quoting
     * @throws IOException        from the reader (a {@link java.nio.charset.CharacterCodingException} for
     *                            text that is not UTF-8)
     */
    boolean next() throws IOException;

    /** Number of cells of the current record. */
    int size();

    /** Cell {@code i} of the current record. */
    String get(int i);

    /**
     * The characters of the current record, valid until the next {@link #next}: cell {@code i} is
     * {@code chars()[from(i)..to(i))} unless {@link #from} is negative (then read it by {@link #get}).
     * By default none: a reader whose cells are read only by {@link #get} keeps these defaults.
     */
    default char[] chars() {
        return null;
    }

    /** Where cell {@code i} starts in {@link #chars}, or -1 when it is read by {@link #get}. */
    default int from(int i) {
        return -1;
    }

    /** Where cell {@code i} ends in {@link #chars}, or -1 when it is read by {@link #get}. */
    default int to(int i) {
        return -1;
    }

    /** Physical line the current record starts on. */
    long startLine();

    /** The cells of the current record, as a new list the caller may keep. */
    default List<String> toList() {
        String[] cells = new String[size()];
        for (int i = 0; i < cells.length; i++) {
            cells[i] = get(i);
        }
        return java.util.Arrays.asList(cells);
    }

    /** Whether every cell of the current record is blank ({@link String#isBlank}). */
    default boolean blank() {
        for (int i = 0; i < size(); i++) {
            if (!get(i).isBlank()) {
                return false;
            }
        }
        return true;
    }

    /** Character {@code i} of the input from its start, or -1 past its end. */
    @FunctionalInterface
    interface CharAt {
        int at(int i) throws IOException;
    }

    /** Content lines the delimiter detection looks through for the header line (title rows above it). */
    int SNIFF_LINES = 10;

    /**
     * The separator that splits the header line into the most cells, quotes respected, looking at the
     * first {@link #SNIFF_LIMIT} characters at most: a semicolon or a tab when more of them than commas,
     * else a comma. A comma followed by a space ({@code Ciss, pF}) is a heading's own, not counted. The
     * header line is the first line with content that holds at least two separators of one kind
     * (title rows above it hold fewer), among the first {@link #SNIFF_LINES} lines with content; when
     * none does, the first line with content.
     */
    static char sniff(CharAt text) throws IOException {
        return sniff(text, 0);
    }

    /** {@link #sniff}, with the header on physical line {@code headerLine} when it is above 0. */
    static char sniff(CharAt text, long headerLine) throws IOException {
        int[] first = null;
        int[] counts = new int[3];
        boolean quoted = false;
        boolean content = false;
        long line = 1;
        int contentLines = 0;
        int i = 0;
        for (; i < SNIFF_LIMIT; i++) {
            int c = text.at(i);
            if (c < 0) {
                break;
            }
            char ch = (char) c;
            if (ch == '"') {
                quoted = !quoted;
                content = true;
            } else if (!quoted && (ch == '\n' || ch == '\r')) {
                if (ch == '\r' && text.at(i + 1) == '\n') {
                    i++;
                }
                if (headerLine > 0 ? line == headerLine : content) {
                    if (headerLine > 0 || Math.max(counts[0], Math.max(counts[1], counts[2])) >= 2) {
                        return choose(counts);
                    }
                    if (first == null) {
                        first = counts.clone();
                    }
                    if (++contentLines >= SNIFF_LINES) {
                        break;
                    }
                }
                line++;
                counts = new int[3];
                content = false;
            } else if (!quoted) {
                content = true;
                switch (ch) {
                    case ',' -> {
                        if (text.at(i + 1) != ' ') {
                            counts[0]++;
                        }
                    }
                    case ';' -> counts[1]++;
                    case '\t' -> counts[2]++;
                    default -> {
                    }
                }
            }
        }
        if (headerLine > 0 ? line == headerLine : content && (first == null
                || Math.max(counts[0], Math.max(counts[1], counts[2])) >= 2)) {
            return choose(counts);
        }
        return first == null ? ',' : choose(first);
    }

    private static char choose(int[] counts) {
        int comma = counts[0];
        int semi = counts[1];
        int tab = counts[2];
        if (semi > comma && semi >= tab) {
            return ';';
        }
        if (tab > comma && tab > semi) {
            return '\t';
        }
        return ',';
    }
}
