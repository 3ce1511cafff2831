package org.annalist.ingest;

import java.io.IOException;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * An OpenDocument spreadsheet ({@code .ods}; OASIS ODF 1.2 Part 1, chapter 9, Tables), read with the JDK's
 * StAX parser from the package's {@code content.xml}, where all sheets follow one another. Finding the
 * sheets reads the part once (keeping the first rows of each); reading one sheet reads it again and skips
 * the others.
 */
final class OdsBook extends Workbook {

    static final String MIMETYPE = "application/vnd.oasis.opendocument.spreadsheet";
    private static final String CONTENT = "content.xml";
    private static final String TABLE = "urn:oasis:names:tc:opendocument:xmlns:table:1.0";
    private static final String OFFICE = "urn:oasis:names:tc:opendocument:xmlns:office:1.0";
    private static final String TEXT = "urn:oasis:names:tc:opendocument:xmlns:text:1.0";
    private static final String STYLE = "urn:oasis:names:tc:opendocument:xmlns:style:1.0";

    /** The rows of each sheet kept while the sheets are found, for choosing among them. */
    static final int SAMPLE_ROWS = 64;

    private List<SheetRef> sheets;
    private final Map<SheetRef, List<String[]>> samples = new LinkedHashMap<>();

    OdsBook(ZipParts parts) {
        super(parts);
    }

    @Override
    String format() {
        return "ods";
    }

    @Override
    List<SheetRef> sheets() throws IOException, XMLStreamException {
        if (sheets == null) {
            List<SheetRef> found = new ArrayList<>();
            new Parser(null, found, null).run();
            sheets = List.copyOf(found);
        }
        return sheets;
    }

    @Override
    Map<SheetRef, List<String[]>> samples(int rows) throws IOException, XMLStreamException {
        sheets();
        Map<SheetRef, List<String[]>> first = new LinkedHashMap<>();
        samples.forEach((sheet, sample) -> first.put(sheet, sample.subList(0, Math.min(rows, sample.size()))));
        return first;
    }

    @Override
    void read(SheetRef sheet, SheetSink sink, boolean merged) throws IOException, XMLStreamException {
        new Parser(sheet, new ArrayList<>(), sink).run();
    }

    /** One pass through content.xml: every sheet's name and first rows, or the rows of one sheet. */
    private final class Parser {
        private final SheetRef wanted;
        private final List<SheetRef> found;
        private final SheetSink sink;
        private XMLStreamReader xml;
        private final Set<String> hiddenTableStyles = new HashSet<>();
        private String styleName;
        private SheetRef current;
        private SheetSink into;
        private MergedCells merges;
        private int rowNumber;
        private int columnNumber;

        Parser(SheetRef wanted, List<SheetRef> found, SheetSink sink) {
            this.wanted = wanted;
            this.found = found;
            this.sink = sink;
        }

        void run() throws IOException, XMLStreamException {
            xml = xml(CONTENT);
            int tables = 0;
            while (xml.hasNext()) {
                int event = xml.next();
                if (event != XMLStreamConstants.START_ELEMENT) {
                    continue;
                }
                String name = xml.getLocalName();
                String namespace = xml.getNamespaceURI();
                if (STYLE.equals(namespace) && name.equals("style")) {
                    styleName = xml.getAttributeValue(STYLE, "name");
                } else if (STYLE.equals(namespace) && name.equals("table-properties")
                        && "false".equals(xml.getAttributeValue(TABLE, "display"))) {
                    hiddenTableStyles.add(styleName);   // §17.15 style:table-properties, table:display
                } else if (TABLE.equals(namespace) && name.equals("table")) {   // §9.1.2 table:table
                    tables++;
                    SheetRef sheet = new SheetRef(String.valueOf(xml.getAttributeValue(TABLE, "name")), tables,
                            hiddenTableStyles.contains(xml.getAttributeValue(TABLE, "style-name")), false, "");
                    found.add(sheet);
                    if (wanted == null) {
                        List<String[]> sample = new ArrayList<>();
                        samples.put(sheet, sample);
                        table(sheet, SheetSink.rows((number, cells) -> {
                            sample.add(withRowNumber(number, cells));
                            return sample.size() < SAMPLE_ROWS;
                        }));
                    } else if (tables == wanted.number()) {
                        table(sheet, sink);
                        return;
                    } else {
                        XlsxBook.skip(xml);
                    }
                }
            }
        }

        /** The rows of the table just started, given to {@code rows} until it says stop; then on to its end. */
        private void table(SheetRef sheet, SheetSink rows) throws XMLStreamException, IOException {
            current = sheet;
            into = rows;
            merges = new MergedCells();
            rowNumber = 0;
            columnNumber = 0;
            boolean reading = true;
            int depth = 1;
            while (depth > 0 && xml.hasNext()) {
                int event = xml.next();
                if (event == XMLStreamConstants.END_ELEMENT) {
                    depth--;
                    continue;
                }
                if (event != XMLStreamConstants.START_ELEMENT) {
                    continue;
                }
                depth++;
                if (!reading || !TABLE.equals(xml.getNamespaceURI())) {
                    continue;
                }
                switch (xml.getLocalName()) {
                    case "table-column" -> column();
                    case "table-row" -> {
                        reading = row();
                        depth--;   // row() read its end
                    }
                    case "table" -> {   // a table inside a cell's frame: not the sheet's cells
                        XlsxBook.skip(xml);
                        depth--;
                    }
                    default -> {
                        // column and row groups, header rows: their rows are the sheet's rows
                    }
                }
            }
        }

        /** §9.1.6 table:table-column: number-columns-repeated, visibility (collapse or filter: hidden). */
        private void column() {
            int repeated = Math.max(1, XlsxBook.number(xml.getAttributeValue(TABLE, "number-columns-repeated"), 1));
            String visibility = xml.getAttributeValue(TABLE, "visibility");
            boolean hidden = visibility != null && !visibility.equals("visible");
            for (int i = 0; i < repeated && columnNumber < MAX_COLUMNS; i++) {
                columnNumber++;
                if (hidden) {
                    into.hiddenColumn(columnNumber);
                }
            }
        }

        /** §9.1.3 table:table-row: its cells, repeated number-rows-repeated times; false when the sink says stop. */
        private boolean row() throws XMLStreamException, IOException {
            int repeated = Math.max(1, XlsxBook.number(xml.getAttributeValue(TABLE, "number-rows-repeated"), 1));
            String visibility = xml.getAttributeValue(TABLE, "visibility");
            boolean hidden = visibility != null && !visibility.equals("visible");
            int first = rowNumber + 1;
            String[] cells = new String[16];
            int width = 0;
            int column = 0;
            while (xml.hasNext()) {
                int event = xml.next();
                if (event == XMLStreamConstants.END_ELEMENT) {
                    break;
                }
                if (event != XMLStreamConstants.START_ELEMENT) {
                    continue;
                }
                String name = xml.getLocalName();
                boolean covered = name.equals("covered-table-cell");   // §9.1.5, under a merged cell
                if (!TABLE.equals(xml.getNamespaceURI()) || !(covered || name.equals("table-cell"))) {
                    XlsxBook.skip(xml);
                    continue;
                }
                int cellsRepeated = Math.max(1, XlsxBook.number(xml.getAttributeValue(TABLE, "number-columns-repeated"), 1));
                int spannedColumns = XlsxBook.number(xml.getAttributeValue(TABLE, "number-columns-spanned"), 1);
                int spannedRows = XlsxBook.number(xml.getAttributeValue(TABLE, "number-rows-spanned"), 1);
                String text = cell(first, column + 1);
                if (spannedColumns > 1 || spannedRows > 1) {
                    merges.add(first, column, first + spannedRows - 1, column + spannedColumns - 1);
                }
                if (!text.isEmpty()) {
                    int end = Math.min(column + cellsRepeated, MAX_COLUMNS);
                    if (end > cells.length) {
                        cells = Arrays.copyOf(cells, Math.max(end, cells.length * 2));
                    }
                    Arrays.fill(cells, column, end, text);
                    width = Math.max(width, end);
                }
                column = (int) Math.min((long) column + cellsRepeated, MAX_COLUMNS);
            }
            String[] row = Arrays.copyOf(cells, width);
            if (width == 0 && first > merges.reach()) {
                rowNumber = (int) Math.min((long) first - 1 + repeated, MAX_ROWS);   // empty rows, however many
                return true;
            }
            for (int r = 0; r < repeated && rowNumber < MAX_ROWS; r++) {
                if (width == 0 && rowNumber + 1 > merges.reach()) {
                    rowNumber = (int) Math.min((long) first - 1 + repeated, MAX_ROWS);
                    break;
                }
                rowNumber++;
                String[] filled = merges.isEmpty() ? row : merges.fill(rowNumber, row.clone());
                boolean content = false;
                for (String cell : filled) {
                    content |= cell != null && !cell.isEmpty();
                }
                if (!content) {
                    continue;
                }
                if (!into.row(rowNumber, r + 1 < repeated ? filled.clone() : filled, hidden)) {
                    return false;
                }
            }
            return true;
        }

        /**
         * The text of the cell just started (§9.1.4 table:table-cell): by office:value-type (§19, float,
         * percentage, currency, date, time, boolean, string) from office:value, office:date-value or
         * office:boolean-value, else from its text:p paragraphs. A formula's cached result is its value;
         * an error (LibreOffice's calcext:value-type="error", or a text such as #N/A) is a missing value.
         */
        private String cell(int row, int column) throws XMLStreamException {
            String type = xml.getAttributeValue(OFFICE, "value-type");
            String value = xml.getAttributeValue(OFFICE, "value");
            String dateValue = xml.getAttributeValue(OFFICE, "date-value");
            String booleanValue = xml.getAttributeValue(OFFICE, "boolean-value");
            String stringValue = xml.getAttributeValue(OFFICE, "string-value");
            boolean formula = xml.getAttributeValue(TABLE, "formula") != null;
            boolean error = "error".equals(otherValueType());
            String text = paragraphs();
            if (error || SheetCells.isError(text.trim()) && (formula || type == null || type.equals("string"))) {
                into.cellNote(row, column, "holds the error " + (text.isBlank() ? "value" : text.trim())
                        + "; read as a missing value");
                return "";
            }
            try {
                if (type == null) {
                    if (formula) {
                        into.cellNote(row, column, "holds a formula without a stored result; read as a missing value");
                        return "";
                    }
                    return CsvRows.clean(text);
                }
                return switch (type) {
                    case "float", "currency" -> value == null ? CsvRows.clean(text) : SheetCells.number(Double.parseDouble(value));
                    case "percentage" -> value == null ? CsvRows.clean(text) : SheetCells.percent(Double.parseDouble(value));
                    case "date" -> dateValue == null ? CsvRows.clean(text) : dateValue.length() <= 10
                            ? LocalDate.parse(dateValue).toString() : SheetCells.date(LocalDateTime.parse(dateValue));
                    case "boolean" -> "true".equals(booleanValue) ? "TRUE" : "FALSE";
                    case "string" -> CsvRows.clean(stringValue != null ? stringValue : text);
                    default -> CsvRows.clean(text);   // time: as shown
                };
            } catch (NumberFormatException | java.time.format.DateTimeParseException e) {
                into.cellNote(row, column, "holds the " + type + " value '" + (value != null ? value : dateValue)
                        + "', which is not one; read as a missing value");
                return "";
            }
        }

        /** A value-type attribute outside the office namespace: LibreOffice's calcext:value-type, which says "error". */
        private String otherValueType() {
            for (int i = 0; i < xml.getAttributeCount(); i++) {
                if (xml.getAttributeLocalName(i).equals("value-type") && !OFFICE.equals(xml.getAttributeNamespace(i))) {
                    return xml.getAttributeValue(i);
                }
            }
            return null;
        }

        /** The text of the cell's text:p paragraphs (§5.1.3), joined by a space; text:s (§6.1.3) counts its spaces. */
        private String paragraphs() throws XMLStreamException {
            StringBuilder text = new StringBuilder();
            int depth = 1;
            int paragraphs = 0;
            while (depth > 0 && xml.hasNext()) {
                int event = xml.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    depth++;
                    String name = xml.getLocalName();
                    boolean inText = TEXT.equals(xml.getNamespaceURI());
                    if (inText && name.equals("p") && paragraphs++ > 0) {
                        text.append(' ');
                    } else if (inText && name.equals("s")) {
                        int spaces = Math.min(XlsxBook.number(xml.getAttributeValue(TEXT, "c"), 1), 1000);
                        text.append(" ".repeat(Math.max(spaces, 1)));
                    } else if (inText && (name.equals("tab") || name.equals("line-break"))) {
                        text.append(' ');
                    } else if (!inText) {
                        XlsxBook.skip(xml);   // annotations, frames: not the cell's text
                        depth--;
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT) {
                    depth--;
                } else if (event == XMLStreamConstants.CHARACTERS || event == XMLStreamConstants.CDATA) {
                    if (text.length() < CsvStream.LINE_LIMIT) {
                        text.append(xml.getText());
                    }
                }
            }
            return text.toString();
        }
    }
}
