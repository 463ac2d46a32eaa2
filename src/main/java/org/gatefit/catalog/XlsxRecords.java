package org.gatefit.catalog;

import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;

/**
 * The rows of one sheet of an {@code .xlsx} workbook as {@link CsvRecords}, streamed: Apache POI
 * opens the package (a zip read in place) and the shared strings; the sheet's XML is read with StAX
 * one row at a time, so memory does not grow with the rows. A record's line is the sheet's row
 * number; cells are placed by their reference ({@code D14}), so skipped empty cells read as empty.
 * Numbers are given as their shortest decimal text ({@code 0.0028}), never as the cell's display
 * format (which may round); formulas by their cached values; booleans as TRUE/FALSE; error values
 * as written ({@code #DIV/0!}), which no numeric column accepts.
 */
final class XlsxRecords implements CsvRecords, AutoCloseable {
    private static final XMLInputFactory XML = XMLInputFactory.newFactory();

    static {
        // POI logs through Log4j's API; with no logging provider in the jar, Log4j would print a warning about
        // that on standard error. Its simple logger, switched off, keeps standard error for gatefit's messages.
        if (System.getProperty("log4j.provider") == null && System.getProperty("log4j2.loggerContextFactory") == null) {
            System.setProperty("log4j.provider", "org.apache.logging.log4j.simple.internal.SimpleProvider");
            System.setProperty("log4j2.simplelogLevel", "OFF");
        }
        XML.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        XML.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
    }

    private final OPCPackage pkg;
    private final ReadOnlySharedStringsTable strings;
    private final InputStream sheetXml;
    private final XMLStreamReader xml;
    private final String sheet;
    private final List<String> sheets;
    private String[] cells = new String[0];
    private int size;
    private int minWidth;
    private long row;

    private XlsxRecords(OPCPackage pkg, ReadOnlySharedStringsTable strings, InputStream sheetXml, String sheet,
                        List<String> sheets) throws IOException {
        this.pkg = pkg;
        this.strings = strings;
        this.sheetXml = sheetXml;
        this.sheet = sheet;
        this.sheets = List.copyOf(sheets);
        try {
            this.xml = XML.createXMLStreamReader(sheetXml);
        } catch (XMLStreamException e) {
            throw new IOException("cannot read sheet " + sheet + ": " + e.getMessage(), e);
        }
    }

    /** The sheet's name that is read. */
    String sheet() {
        return sheet;
    }

    /** Every sheet's name, in workbook order. */
    List<String> sheets() {
        return sheets;
    }

    /**
     * Opens {@code sheetName} (null: the first sheet) of a workbook.
     *
     * @throws NoSuchSheetException when the workbook has no such sheet
     * @throws IOException          when the file is no workbook
     */
    static XlsxRecords open(Path file, String sheetName) throws IOException {
        OPCPackage pkg;
        try {
            pkg = OPCPackage.open(file.toFile(), PackageAccess.READ);
        } catch (InvalidFormatException | RuntimeException e) {
            throw new IOException("not an .xlsx workbook (" + e.getMessage() + ")", e);
        }
        try {
            XSSFReader reader = new XSSFReader(pkg);
            ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg, false);
            XSSFReader.SheetIterator it = (XSSFReader.SheetIterator) reader.getSheetsData();
            List<String> names = new ArrayList<>();
            InputStream chosen = null;
            String chosenName = null;
            while (it.hasNext()) {
                InputStream in = it.next();
                String name = it.getSheetName();
                names.add(name);
                if (chosen == null && (sheetName == null || name.equalsIgnoreCase(sheetName.strip()))) {
                    chosen = in;
                    chosenName = name;
                } else {
                    in.close();
                }
            }
            if (chosen == null) {
                pkg.revert();
                throw new NoSuchSheetException(sheetName, names);
            }
            return new XlsxRecords(pkg, strings, chosen, chosenName, names);
        } catch (OpenXML4JException | org.xml.sax.SAXException | RuntimeException e) {
            pkg.revert();
            throw new IOException("not a readable .xlsx workbook (" + e.getMessage() + ")", e);
        }
    }

    /** The workbook has no sheet of the name asked for. */
    static final class NoSuchSheetException extends IOException {
        private static final long serialVersionUID = 1L;
        final List<String> sheets;

        NoSuchSheetException(String asked, List<String> sheets) {
            super("the workbook has no sheet " + Problem.quote(asked) + " (expected one of " + String.join(", ", sheets) + ")");
            this.sheets = List.copyOf(sheets);
        }
    }

    /** Rows shorter than this are padded with empty cells (the header's width: a workbook leaves empty cells out). */
    void minWidth(int w) {
        this.minWidth = w;
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
    public boolean next() throws IOException {
        try {
            while (xml.hasNext()) {
                int ev = xml.next();
                if (ev == XMLStreamConstants.START_ELEMENT && xml.getLocalName().equals("row")) {
                    String r = xml.getAttributeValue(null, "r");
                    row = r != null ? Long.parseLong(r) : row + 1;
                    readRow();
                    return true;
                }
            }
            return false;
        } catch (XMLStreamException | NumberFormatException e) {
            throw new IOException("cannot read sheet " + sheet + " after row " + row + ": " + e.getMessage(), e);
        }
    }

    private void readRow() throws XMLStreamException {
        size = 0;
        Arrays.fill(cells, null);
        int next = 0;
        while (xml.hasNext()) {
            int ev = xml.next();
            if (ev == XMLStreamConstants.END_ELEMENT && xml.getLocalName().equals("row")) {
                break;
            }
            if (ev == XMLStreamConstants.START_ELEMENT && xml.getLocalName().equals("c")) {
                String ref = xml.getAttributeValue(null, "r");
                int col = ref != null ? column(ref) : next;
                String type = xml.getAttributeValue(null, "t");
                String value = cell(type);
                put(col, value);
                next = col + 1;
            }
        }
        while (size < minWidth) {
            put(size, "");
        }
    }

    private void put(int col, String value) {
        if (col >= cells.length) {
            cells = Arrays.copyOf(cells, Math.max(col + 1, cells.length * 2));
        }
        cells[col] = value;
        size = Math.max(size, col + 1);
    }

    /** The text of the cell whose start tag was just read; leaves the reader at its end tag. */
    private String cell(String type) throws XMLStreamException {
        String v = null;
        StringBuilder inline = null;
        int depth = 1;
        while (depth > 0 && xml.hasNext()) {
            int ev = xml.next();
            if (ev == XMLStreamConstants.START_ELEMENT) {
                depth++;
                String n = xml.getLocalName();
                if (n.equals("v")) {
                    v = xml.getElementText();
                    depth--;
                } else if (n.equals("t")) {
                    if (inline == null) {
                        inline = new StringBuilder();
                    }
                    inline.append(xml.getElementText());
                    depth--;
                }
            } else if (ev == XMLStreamConstants.END_ELEMENT) {
                depth--;
            }
        }
        if (type == null || type.equals("n")) {
            return v == null ? "" : number(v);
        }
        return switch (type) {
            case "s" -> v == null ? "" : strings.getItemAt(Integer.parseInt(v.strip())).getString();
            case "inlineStr" -> inline == null ? "" : inline.toString();
            case "b" -> "1".equals(v) ? "TRUE" : "FALSE";
            default -> v == null ? "" : v; // str (a formula's text), e (an error value), d (an ISO date)
        };
    }

    /** The shortest decimal text of a number cell's value ({@code 2.8000000000000001E-3} → {@code 0.0028}). */
    static String number(String v) {
        try {
            double d = Double.parseDouble(v.strip());
            if (!Double.isFinite(d)) {
                return v;
            }
            String s = BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
            return s.equals("-0") ? "0" : s;
        } catch (NumberFormatException e) {
            return v;
        }
    }

    /** Zero-based column of a cell reference ({@code D14} → 3). */
    static int column(String ref) {
        int c = 0;
        for (int i = 0; i < ref.length(); i++) {
            char ch = ref.charAt(i);
            if (ch >= 'A' && ch <= 'Z') {
                c = c * 26 + (ch - 'A' + 1);
            } else {
                break;
            }
        }
        return c - 1;
    }

    /** Column letters of a one-based column number (4 → D, 27 → AA). */
    static String letters(int column) {
        StringBuilder sb = new StringBuilder();
        for (int c = column; c > 0; c = (c - 1) / 26) {
            sb.insert(0, (char) ('A' + (c - 1) % 26));
        }
        return sb.toString();
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public String get(int i) {
        String c = i < cells.length ? cells[i] : null;
        return c == null ? "" : c;
    }

    @Override
    public long startLine() {
        return row;
    }

    @Override
    public void close() throws IOException {
        try {
            xml.close();
        } catch (XMLStreamException e) {
            // the stream below is closed next
        }
        sheetXml.close();
        pkg.revert();
    }
}
