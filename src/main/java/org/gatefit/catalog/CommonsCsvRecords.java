package org.gatefit.catalog;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.util.Iterator;
import org.apache.commons.csv.CSVException;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The reference reader of {@link CsvRecords}: Commons CSV's parser with the settings the sheet
 * reader uses. It is the one place that turns Commons CSV's failures into typed values
 * ({@link #failure}). A record starts on the line after the one the previous record ended on.
 */
final class CommonsCsvRecords implements CsvRecords {
    private final BufferedReader in;
    private char delimiter = ',';
    private CSVParser parser;
    private Iterator<CSVRecord> records;
    private CSVRecord record;
    private long previousEnd;
    private long start;

    CommonsCsvRecords(Reader in) {
        this.in = new BufferedReader(in);
    }

    @Override
    public char sniffDelimiter() throws IOException {
        return sniffDelimiter(0);
    }

    @Override
    public char sniffDelimiter(long headerLine) throws IOException {
        in.mark(SNIFF_LIMIT + 2);
        try {
            char[] ahead = new char[SNIFF_LIMIT + 1];
            int n = 0;
            try {
                while (n < ahead.length) {
                    int got = in.read(ahead, n, ahead.length - n);
                    if (got < 0) {
                        break;
                    }
                    n += got;
                }
            } catch (java.nio.charset.CharacterCodingException e) {
                // the text before it decides; reading the records meets it again, on its line
            }
            int length = n;
            return CsvRecords.sniff(i -> i < length ? ahead[i] : -1, headerLine);
        } finally {
            in.reset();
        }
    }

    @Override
    public void delimiter(char d) {
        this.delimiter = d;
    }

    @Override
    public boolean next() throws IOException {
        if (parser == null) {
            CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setQuote('"')
                    .setIgnoreEmptyLines(false).setIgnoreSurroundingSpaces(false).get();
            parser = format.parse(in);
            records = parser.iterator();
        }
        record = null;
        start = previousEnd + 1;
        try {
            if (!records.hasNext()) {
                return false;
            }
            record = records.next();
        } catch (UncheckedIOException e) {
            throw failure(e.getCause(), start);
        }
        previousEnd = parser.getCurrentLineNumber();
        return true;
    }

    /**
     * Commons CSV's failure as gatefit's: its syntax errors are {@link CSVException}s told apart only
     * by their messages (Commons CSV 1.14), so this is where those messages are read, and nowhere
     * else; anything else (a decoding error, the reader's own) passes as it is.
     */
    static IOException failure(IOException e, long line) {
        if (e instanceof CSVException) {
            String m = String.valueOf(e.getMessage());
            if (m.contains("EOF reached before encapsulated token finished")) {
                return new CsvSyntaxException(CsvSyntaxException.Syntax.UNCLOSED_QUOTE, line, 0, e);
            }
            if (m.contains("Invalid character between encapsulated token and delimiter")) {
                return new CsvSyntaxException(CsvSyntaxException.Syntax.TEXT_AFTER_QUOTE, line, 0, e);
            }
        }
        return e;
    }

    @Override
    public int size() {
        return record.size();
    }

    @Override
    public String get(int i) {
        return record.get(i);
    }

    @Override
    public long startLine() {
        return start;
    }
}
