package org.gatefit.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.MalformedInputException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.EdgeCasesMode;
import net.jqwik.api.Example;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * {@link CsvLexer} reads what Commons CSV 1.14 (the parser import used before, still a dependency)
 * reads with the settings import used: the same records, cells and start lines (as the import
 * counted them: one after the line the previous record ended on), and the same failure on the same
 * record with the same message. Texts are random soups of the characters that matter to CSV, and
 * random well-formed files; readers hand out one to a few characters per call (every refill and
 * look-ahead at a buffer edge) or fail part-way as a decoder fails on a bad byte.
 */
class CsvLexerTest {

    /** Records with their start lines, then the failure (message) and the start line of the record it hit. */
    record Outcome(List<List<String>> records, List<Long> starts, String failure, long failureLine) {
    }

    /** The reference: Commons CSV driven as {@code SheetReader} drove it (start = previous end + 1). */
    static Outcome commons(Reader in, char delimiter) throws IOException {
        CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(delimiter).setQuote('"')
                .setIgnoreEmptyLines(false).setIgnoreSurroundingSpaces(false).get();
        List<List<String>> records = new ArrayList<>();
        List<Long> starts = new ArrayList<>();
        try (CSVParser parser = format.parse(in)) {
            Iterator<CSVRecord> it = parser.iterator();
            long prevEnd = 0;
            while (true) {
                long start = prevEnd + 1;
                CSVRecord rec;
                try {
                    if (!it.hasNext()) {
                        break;
                    }
                    rec = it.next();
                } catch (UncheckedIOException e) {
                    return new Outcome(records, starts, failure(CommonsCsvRecords.failure(e.getCause(), start)), start);
                }
                prevEnd = parser.getCurrentLineNumber();
                records.add(rec.toList());
                starts.add(start);
            }
        }
        return new Outcome(records, starts, null, 0);
    }

    /**
     * What {@code SheetReader} tells from a failure: the kind of syntax problem and its line, or
     * whether the text is not UTF-8, and the message. (The cell position is the lexer's alone:
     * Commons CSV does not tell it; {@link #syntaxProblemsNameTheirCell} checks it.)
     */
    private static String failure(Throwable e) {
        if (e instanceof CsvSyntaxException s) {
            return s.syntax() + " in the record starting on line " + s.line();
        }
        return (e instanceof java.nio.charset.CharacterCodingException ? "not UTF-8: " : "") + e.getMessage();
    }

    static Outcome ours(Reader in, char delimiter) {
        return read(new CsvLexer(in), delimiter);
    }

    /** Through a {@link CsvRecords}: the lexer, or the reference adapter over Commons CSV. */
    static Outcome read(CsvRecords lexer, char delimiter) {
        lexer.delimiter(delimiter);
        List<List<String>> records = new ArrayList<>();
        List<Long> starts = new ArrayList<>();
        while (true) {
            try {
                if (!lexer.next()) {
                    break;
                }
            } catch (IOException e) {
                return new Outcome(records, starts, failure(e), lexer.startLine());
            }
            records.add(lexer.toList());
            starts.add(lexer.startLine());
        }
        return new Outcome(records, starts, null, 0);
    }

    /** Hands out at most {@code chunk} characters per read, then fails at {@code failAt} (if not negative). */
    static final class Trickle extends Reader {
        private final String text;
        private final int chunk;
        private final int failAt;
        private int at;

        Trickle(String text, int chunk, int failAt) {
            this.text = text;
            this.chunk = chunk;
            this.failAt = failAt;
        }

        @Override
        public int read(char[] cbuf, int off, int len) throws IOException {
            int stop = failAt >= 0 ? Math.min(failAt, text.length()) : text.length();
            if (at >= stop) {
                if (failAt >= 0 && at >= failAt) {
                    throw new MalformedInputException(1);
                }
                return -1;
            }
            int n = Math.min(Math.min(len, chunk), stop - at);
            text.getChars(at, at + n, cbuf, off);
            at += n;
            return n;
        }

        @Override
        public void close() {
        }
    }

    private static void same(String text, char delimiter, int chunk) throws IOException {
        Outcome expected = commons(new StringReader(text), delimiter);
        assertEquals(expected, ours(new StringReader(text), delimiter), () -> show(text));
        assertEquals(expected, ours(new Trickle(text, chunk, -1), delimiter), () -> "chunk " + chunk + ": " + show(text));
        assertEquals(expected, read(new CommonsCsvRecords(new Trickle(text, chunk, -1)), delimiter),
                () -> "the reference adapter, chunk " + chunk + ": " + show(text));
    }

    private static String show(String text) {
        return "'" + text.replace("\r", "\\r").replace("\n", "\\n").replace("\t", "\\t") + "'";
    }

    @Provide
    Arbitrary<String> soup() {
        // Delimiters, quotes, line ends, spaces (including ones Character.isWhitespace takes and one it does not).
        return Arbitraries.strings().withChars(',', ';', '\t', '"', '"', '\n', '\r', ' ', 'a', 'b', '\u00e9', '\u2003',
                '\u00a0', '\u001f', '\u000b', '\f').ofMinLength(0).ofMaxLength(60);
    }

    @Provide
    Arbitrary<Character> delimiters() {
        return Arbitraries.of(',', ';', '\t');
    }

    @Property(tries = 3000, edgeCases = EdgeCasesMode.MIXIN)
    void randomTextReadsAsCommonsCsvReadsIt(@ForAll("soup") String text, @ForAll("delimiters") char delimiter,
                                            @ForAll @IntRange(min = 1, max = 4) int chunk) throws IOException {
        same(text, delimiter, chunk);
    }

    @Provide
    Arbitrary<String> files() {
        Arbitrary<String> plain = Arbitraries.strings().withChars('a', 'b', '1', '.', ' ', '"', '\u00e9')
                .ofMinLength(0).ofMaxLength(8).filter(s -> !s.startsWith("\""));
        Arbitrary<String> quoted = Arbitraries.strings().withChars('a', ',', ';', '\t', '\n', '\r', ' ', '"')
                .ofMinLength(0).ofMaxLength(8).map(s -> "\"" + s.replace("\"", "\"\"") + "\"");
        Arbitrary<String> cell = Arbitraries.oneOf(plain, plain, quoted);
        Arbitrary<String> eol = Arbitraries.of("\n", "\r\n", "\r");
        Arbitrary<String> line = Combinators.combine(cell.list().ofMinSize(1).ofMaxSize(5), eol)
                .as((cells, e) -> String.join(",", cells) + e);
        return Combinators.combine(line.list().ofMinSize(0).ofMaxSize(8), Arbitraries.of(true, false))
                .as((lines, lastEol) -> {
                    String t = String.join("", lines);
                    return lastEol || t.isEmpty() ? t : t.substring(0, t.length() - (t.endsWith("\r\n") ? 2 : 1));
                });
    }

    @Property(tries = 2000, edgeCases = EdgeCasesMode.MIXIN)
    void wellFormedFilesReadAsCommonsCsvReadsThem(@ForAll("files") String text,
                                                  @ForAll @IntRange(min = 1, max = 3) int chunk) throws IOException {
        same(text, ',', chunk);
    }

    @Property(tries = 1500, edgeCases = EdgeCasesMode.MIXIN)
    void aReaderFailingPartWayFailsOnTheSameRecord(@ForAll("files") String text, @ForAll @IntRange(max = 200) int failAt,
                                                   @ForAll @IntRange(min = 1, max = 3) int chunk) throws IOException {
        int at = text.isEmpty() ? 0 : failAt % (text.length() + 1);
        Outcome expected = commons(new Trickle(text, 1 << 20, at), ',');
        assertEquals(expected, ours(new Trickle(text, chunk, at), ','), () -> "fail at " + at + ": " + show(text));
        assertEquals(expected, ours(new Trickle(text, 1 << 20, at), ','), () -> "fail at " + at + ": " + show(text));
        assertEquals(expected, read(new CommonsCsvRecords(new Trickle(text, chunk, at)), ','),
                () -> "the reference adapter, fail at " + at + ": " + show(text));
    }

    @Example
    void syntaxProblemsNameTheirCell() {
        // RFC 4180 section 2, rules 5-7: a quoted field ends at a lone closing quote, then the separator follows.
        CsvSyntaxException after = syntax("h1,h2,h3\nx,\"y\"z,w\n");
        assertEquals(List.of(CsvSyntaxException.Syntax.TEXT_AFTER_QUOTE, 2L, 2),
                List.of(after.syntax(), after.line(), after.column()));
        CsvSyntaxException open = syntax("h1,h2,h3\nx,y,\"open\nmore\n");
        assertEquals(List.of(CsvSyntaxException.Syntax.UNCLOSED_QUOTE, 2L, 3),
                List.of(open.syntax(), open.line(), open.column()));
    }

    private static CsvSyntaxException syntax(String text) {
        CsvLexer l = new CsvLexer(new StringReader(text));
        return org.junit.jupiter.api.Assertions.assertThrows(CsvSyntaxException.class, () -> {
            while (l.next()) {
                l.toList();
            }
        });
    }

    @Example
    void rfc4180RecordsQuotesAndLineEnds() throws IOException {
        // RFC 4180 section 2: CRLF ends a record, a quoted field may hold the separator, line breaks and "" for a quote.
        String text = "a,b\r\n\"x, y\",\"say \"\"hi\"\"\"\r\n\"two\r\nlines\",c\r\n";
        Outcome o = ours(new StringReader(text), ',');
        assertEquals(List.of(List.of("a", "b"), List.of("x, y", "say \"hi\""), List.of("two\r\nlines", "c")), o.records());
        assertEquals(List.of(1L, 2L, 3L), o.starts(), "physical start lines");
        same(text, ',', 1);
    }

    @Example
    void cellsLongerThanTheBufferReadWhole() throws IOException {
        // Common practice, no source: a cell may be longer than any buffer (here 300,000 characters).
        String big = "x".repeat(300_000);
        String text = "h1,h2\n" + big + ",\"" + big + "\n" + big + "\"\nlast,row";
        Outcome o = ours(new StringReader(text), ',');
        assertEquals(List.of(List.of("h1", "h2"), List.of(big, big + "\n" + big), List.of("last", "row")), o.records());
        assertEquals(List.of(1L, 2L, 4L), o.starts());
        same(text, ',', 7777);
    }

    @Example
    void theDelimiterIsTheOneThatSplitsTheHeaderLineMost() throws IOException {
        // Common practice, no source: spreadsheets in many locales write semicolons or tabs.
        assertEquals(';', new CsvLexer(new StringReader("\n\na;b;c,d\nx,y,z,w,v")).sniffDelimiter());
        assertEquals(';', new CommonsCsvRecords(new StringReader("\n\na;b;c,d\nx,y,z,w,v")).sniffDelimiter());
        assertEquals('\t', new CommonsCsvRecords(new StringReader("a\tb\tc,d")).sniffDelimiter());
        CsvRecords r = new CommonsCsvRecords(new StringReader("a;b\n1;2\n"));
        r.delimiter(r.sniffDelimiter());
        assertEquals(true, r.next(), "the reference's detection reads nothing away");
        assertEquals(List.of("a", "b"), r.toList());
        assertEquals('\t', new CsvLexer(new StringReader("a\tb\tc,d")).sniffDelimiter());
        assertEquals(',', new CsvLexer(new StringReader("\"a;b;c\",d")).sniffDelimiter(), "quotes respected");
        assertEquals(',', new CsvLexer(new StringReader("a;b,c\td")).sniffDelimiter(), "a tie keeps the comma");
        CsvLexer l = new CsvLexer(new StringReader("a;b\n1;2\n"));
        l.delimiter(l.sniffDelimiter());
        assertEquals(true, l.next(), "detection reads nothing away");
        assertEquals(List.of("a", "b"), l.toList());
    }
}
