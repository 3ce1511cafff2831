package org.annalist.ingest;

import java.io.IOException;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.Arrays;
import java.util.Optional;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * The cells of one xlsx sheet part (ECMA-376 Part 1 §18.3.1.80 sheetData, §18.3.1.73 row, §18.3.1.4 c),
 * parsed row by row into the text a CSV export would hold and given to a {@link SheetSink}.
 */
final class XlsxSheet {
    private final XMLStreamReader xml;
    private final SheetSink sink;
    private final MergedCells merges;
    private final String[] shared;
    private final boolean[] dateStyle;
    private final boolean[] percentStyle;
    private final boolean date1904;
    private String[] cells = new String[16];
    private int width;
    private int rowNumber;
    private boolean rowHidden;
    private int column;

    /**
     * What the workbook's other parts say about the cells.
     *
     * @param shared       the shared strings
     * @param dateStyle    by cell format: shows a date
     * @param percentStyle by cell format: shows a percentage
     * @param date1904     the 1904 date system (else the 1900 one)
     */
    record Formats(String[] shared, boolean[] dateStyle, boolean[] percentStyle, boolean date1904) {

        Formats {
            shared = shared.clone();
            dateStyle = dateStyle.clone();
            percentStyle = percentStyle.clone();
        }

        @Override
        public String[] shared() {
            return shared.clone();
        }

        @Override
        public boolean[] dateStyle() {
            return dateStyle.clone();
        }

        @Override
        public boolean[] percentStyle() {
            return percentStyle.clone();
        }
    }

    XlsxSheet(XMLStreamReader xml, SheetSink sink, MergedCells merges, Formats formats) {
        this.xml = xml;
        this.sink = sink;
        this.merges = merges;
        this.shared = formats.shared();
        this.dateStyle = formats.dateStyle();
        this.percentStyle = formats.percentStyle();
        this.date1904 = formats.date1904();
    }

    void run() throws XMLStreamException, IOException {
        while (xml.hasNext()) {
            int event = xml.next();
            if (event == XMLStreamConstants.START_ELEMENT) {
                switch (xml.getLocalName()) {
                    case "col" -> hiddenColumns();
                    case "row" -> startRow();
                    case "c" -> cell();
                    default -> {
                        // sheet properties, views and formats do not bear on the values
                    }
                }
            } else if (event == XMLStreamConstants.END_ELEMENT) {
                String name = xml.getLocalName();
                if (name.equals("row") && !endRow()) {
                    return;
                }
                if (name.equals("sheetData")) {
                    return;   // what follows (merged ranges, print settings) was read before, or is not needed
                }
            }
        }
    }

    /** §18.3.1.13 col: min and max (1-based) with hidden. */
    private void hiddenColumns() throws IOException {
        if (Workbook.isTrue(Workbook.attribute(xml, "hidden"))) {
            int min = XlsxBook.number(Workbook.attribute(xml, "min"), 1);
            int max = Math.min(XlsxBook.number(Workbook.attribute(xml, "max"), min), Workbook.MAX_COLUMNS);
            for (int c = min; c <= max; c++) {
                sink.hiddenColumn(c);
            }
        }
    }

    private void startRow() throws IOException {
        String r = Workbook.attribute(xml, "r");
        int number = r == null ? rowNumber + 1 : XlsxBook.number(r, 0);
        if (number <= rowNumber || number > Workbook.MAX_ROWS) {
            throw new IOException("row " + r + " is out of order");
        }
        rowNumber = number;
        rowHidden = Workbook.isTrue(Workbook.attribute(xml, "hidden"));
        width = 0;
        column = -1;
    }

    private boolean endRow() {
        if (width == 0 && merges.isEmpty()) {
            return true;
        }
        String[] row = Arrays.copyOf(cells, width);
        Arrays.fill(cells, 0, width, null);
        row = merges.isEmpty() ? row : merges.fill(rowNumber, row);
        for (String cell : row) {
            if (cell != null && !cell.isEmpty()) {
                return sink.row(rowNumber, row, rowHidden);
            }
        }
        return true;
    }

    /** One c element: r (its reference), t (its type, §18.18.11 ST_CellType), s (its style), then f, v or is. */
    private void cell() throws XMLStreamException, IOException {
        String ref = Workbook.attribute(xml, "r");
        column = ref == null ? column + 1 : columnOf(ref);
        if (column >= Workbook.MAX_COLUMNS) {
            throw new IOException("cell " + ref + " is beyond the last column");
        }
        String type = Workbook.attribute(xml, "t");
        int style = XlsxBook.number(Workbook.attribute(xml, "s"), 0);
        String value = null;
        boolean formula = false;
        StringBuilder inline = null;
        while (xml.hasNext()) {
            int event = xml.next();
            if (event == XMLStreamConstants.START_ELEMENT) {
                switch (xml.getLocalName()) {
                    case "v" -> value = xml.getElementText();   // §18.3.1.96 v: the value, or a formula's cached result
                    case "f" -> {                                 // §18.3.1.40 f: the formula, not evaluated here
                        formula = true;
                        xml.getElementText();
                    }
                    case "is" -> inline = XlsxBook.richText(xml, "is");    // §18.3.1.53 is: an inline string
                    default -> XlsxBook.skip(xml);
                }
            } else if (event == XMLStreamConstants.END_ELEMENT) {
                break;
            }
        }
        String text = text(type, style, value, formula, inline);
        if (text.isEmpty()) {
            return;
        }
        if (column >= cells.length) {
            cells = Arrays.copyOf(cells, Math.max(column + 1, cells.length * 2));
        }
        cells[column] = text;
        width = Math.max(width, column + 1);
    }

    private int columnOf(String ref) throws IOException {
        int letters = 0;
        while (letters < ref.length() && ref.charAt(letters) >= 'A' && ref.charAt(letters) <= 'Z') {
            letters++;
        }
        if (letters == 0 || letters > 3) {
            throw new IOException("cell reference '" + ref + "' is not a cell");
        }
        return XlsxBook.columnIndex(ref.substring(0, letters));
    }

    private String text(String type, int style, String value, boolean formula, StringBuilder inline)
            throws IOException {
        int columnNumber = column + 1;
        String t = type == null ? "n" : type;
        switch (t) {
            case "s" -> {        // §18.4.9 sst: an index into the shared strings
                int index = XlsxBook.number(value, -1);
                if (index < 0 || index >= shared.length) {
                    throw new IOException("cell refers to shared string " + value + ", which the workbook lacks");
                }
                return textCell(shared[index], columnNumber);
            }
            case "inlineStr" -> {
                return textCell(inline == null ? "" : inline.toString(), columnNumber);
            }
            case "str" -> {      // a formula's text result
                return textCell(value == null ? "" : value, columnNumber);
            }
            case "b" -> {
                return value == null ? "" : "1".equals(value.trim()) ? "TRUE" : "FALSE";
            }
            case "e" -> {
                sink.cellNote(rowNumber, columnNumber, "holds the error " + (value == null ? "value" : value.trim())
                        + "; read as a missing value");
                return "";
            }
            case "d" -> {        // an ISO 8601 date (§18.17.4)
                return value == null ? "" : isoDate(value.trim(), columnNumber);
            }
            default -> {
                return numberCell(value, formula, style, columnNumber);
            }
        }
    }

    private String numberCell(String value, boolean formula, int style, int columnNumber) {
        if (value == null || value.isBlank()) {
            if (formula) {
                sink.cellNote(rowNumber, columnNumber, "holds a formula without a stored result (the workbook was "
                        + "saved without calculating it); read as a missing value");
            }
            return "";
        }
        double number;
        try {
            number = Double.parseDouble(value.trim());
        } catch (NumberFormatException e) {
            sink.cellNote(rowNumber, columnNumber, "holds '" + value.trim() + "', which is not a number; read as "
                    + "a missing value");
            return "";
        }
        if (style >= 0 && style < dateStyle.length && dateStyle[style]) {
            Optional<LocalDateTime> date = SheetCells.serialDate(number, date1904);
            if (date.isEmpty()) {
                sink.cellNote(rowNumber, columnNumber, "shows a date, but its serial number " + value.trim()
                        + " is no day of the " + (date1904 ? "1904" : "1900") + " date system"
                        + (!date1904 && Math.floor(number) == 60 ? " (it is 29 February 1900, which the system counts "
                        + "but the calendar lacks)" : "") + "; read as a missing value");
                return "";
            }
            return SheetCells.date(date.get());
        }
        if (style >= 0 && style < percentStyle.length && percentStyle[style]) {
            return SheetCells.percent(number);
        }
        return SheetCells.number(number);
    }

    private String isoDate(String value, int columnNumber) {
        try {
            return value.length() <= 10 ? LocalDate.parse(value).toString() : SheetCells.date(LocalDateTime.parse(
                    value.endsWith("Z") ? value.substring(0, value.length() - 1) : value));
        } catch (java.time.format.DateTimeParseException e) {
            sink.cellNote(rowNumber, columnNumber, "holds the date '" + value + "', which is not an ISO 8601 date; "
                    + "read as a missing value");
            return "";
        }
    }

    private String textCell(String text, int columnNumber) {
        String clean = CsvRows.clean(text);
        if (SheetCells.isError(clean)) {
            sink.cellNote(rowNumber, columnNumber, "holds the error " + clean + "; read as a missing value");
            return "";
        }
        return clean;
    }
}
