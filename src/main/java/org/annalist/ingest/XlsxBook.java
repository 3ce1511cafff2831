package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import javax.xml.stream.XMLStreamConstants;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * An Office Open XML workbook ({@code .xlsx}, {@code .xlsm}; ECMA-376 Part 1, SpreadsheetML), read with
 * the JDK's StAX parser: the workbook part for the sheets and the date system, the styles for which
 * cells show dates or percentages, the shared strings, then one sheet's cells row by row.
 */
final class XlsxBook extends Workbook {

    static final String WORKBOOK = "xl/workbook.xml";
    private static final String RELATIONSHIPS = "xl/_rels/workbook.xml.rels";

    private final String format;
    private List<SheetRef> sheets;
    private boolean date1904;
    private String[] shared;
    private boolean[] dateStyle;
    private boolean[] percentStyle;

    XlsxBook(ZipParts parts, String format) {
        super(parts);
        this.format = format;
    }

    @Override
    String format() {
        return format;
    }

    /** The 0-based column of letters {@code A}…{@code XFD} (ECMA-376 Part 1 §18.3.1.4, the r attribute). */
    static int columnIndex(String letters) {
        int column = 0;
        for (int i = 0; i < letters.length(); i++) {
            column = column * 26 + (letters.charAt(i) - 'A' + 1);
        }
        return column - 1;
    }

    @Override
    List<SheetRef> sheets() throws IOException, XMLStreamException {
        if (sheets != null) {
            return sheets;
        }
        Map<String, String[]> targets = relationships();
        List<SheetRef> found = new ArrayList<>();
        XMLStreamReader xml = xml(WORKBOOK);
        while (xml.hasNext()) {
            if (xml.next() != XMLStreamConstants.START_ELEMENT) {
                continue;
            }
            switch (xml.getLocalName()) {
                // §18.2.28 workbookPr: date1904 chooses the 1904 date system
                case "workbookPr" -> date1904 = isTrue(attribute(xml, "date1904"));
                case "sheet" -> {   // §18.2.19 sheet: name, state (visible, hidden, veryHidden), r:id
                    String id = relationshipId(xml);
                    String[] target = targets.get(id);
                    if (target == null) {
                        throw new IOException("sheet '" + attribute(xml, "name") + "' has no part");
                    }
                    String state = attribute(xml, "state");
                    found.add(new SheetRef(Optional.ofNullable(attribute(xml, "name")).orElse(""), found.size() + 1,
                            state != null && !state.equals("visible"), !target[1].endsWith("/worksheet"), target[0]));
                }
                default -> {
                    // other workbook properties do not bear on the cells
                }
            }
        }
        sheets = List.copyOf(found);
        return sheets;
    }

    /** The r:id of a sheet element: the attribute {@code id} in a relationships namespace (transitional or strict). */
    private static String relationshipId(XMLStreamReader xml) {
        for (int i = 0; i < xml.getAttributeCount(); i++) {
            String namespace = xml.getAttributeNamespace(i);
            if (xml.getAttributeLocalName(i).equals("id") && namespace != null && namespace.contains("relationships")) {
                return xml.getAttributeValue(i);
            }
        }
        return "";
    }

    /** Relationship id → {part name, relationship type} (ECMA-376 Part 2 §9.3, Relationships). */
    private Map<String, String[]> relationships() throws IOException, XMLStreamException {
        Map<String, String[]> targets = new HashMap<>();
        XMLStreamReader xml = xml(RELATIONSHIPS);
        while (xml.hasNext()) {
            if (xml.next() == XMLStreamConstants.START_ELEMENT && xml.getLocalName().equals("Relationship")) {
                String target = Optional.ofNullable(attribute(xml, "Target")).orElse("");
                String part = target.startsWith("/") ? target.substring(1) : "xl/" + target;
                targets.put(attribute(xml, "Id"), new String[] {normalise(part), Optional.ofNullable(attribute(xml, "Type"))
                        .orElse("")});
            }
        }
        return targets;
    }

    private static String normalise(String part) {
        List<String> names = new ArrayList<>();
        for (String name : part.split("/")) {
            if (name.equals("..")) {
                if (!names.isEmpty()) {
                    names.remove(names.size() - 1);
                }
            } else if (!name.isEmpty() && !name.equals(".")) {
                names.add(name);
            }
        }
        return String.join("/", names);
    }

    @Override
    void read(SheetRef sheet, SheetSink sink, boolean merged) throws IOException, XMLStreamException {
        sheets();
        loadStrings();
        loadStyles();
        MergedCells merges = new MergedCells();
        if (merged) {
            try (InputStream part = parts().open(sheet.part()).orElseThrow(() -> new IOException("the sheet's part is missing"))) {
                merges = MergedCells.ofXlsx(part);
            }
        }
        new SheetParser(xml(sheet.part()), sink, merges).run();
    }

    /** One sheet part's cells (§18.3.1.80 sheetData, §18.3.1.73 row, §18.3.1.4 c). */
    private final class SheetParser {
        private final XMLStreamReader xml;
        private final SheetSink sink;
        private final MergedCells merges;
        private String[] cells = new String[16];
        private int width;
        private int rowNumber;
        private boolean rowHidden;
        private int column;

        SheetParser(XMLStreamReader xml, SheetSink sink, MergedCells merges) {
            this.xml = xml;
            this.sink = sink;
            this.merges = merges;
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
            if (isTrue(attribute(xml, "hidden"))) {
                int min = number(attribute(xml, "min"), 1);
                int max = Math.min(number(attribute(xml, "max"), min), MAX_COLUMNS);
                for (int c = min; c <= max; c++) {
                    sink.hiddenColumn(c);
                }
            }
        }

        private void startRow() throws IOException {
            String r = attribute(xml, "r");
            int number = r == null ? rowNumber + 1 : number(r, 0);
            if (number <= rowNumber || number > MAX_ROWS) {
                throw new IOException("row " + r + " is out of order");
            }
            rowNumber = number;
            rowHidden = isTrue(attribute(xml, "hidden"));
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
            String ref = attribute(xml, "r");
            column = ref == null ? column + 1 : columnOf(ref);
            if (column >= MAX_COLUMNS) {
                throw new IOException("cell " + ref + " is beyond the last column");
            }
            String type = attribute(xml, "t");
            int style = number(attribute(xml, "s"), 0);
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
                        case "is" -> inline = richText(xml, "is");    // §18.3.1.53 is: an inline string
                        default -> skip(xml);
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
            return columnIndex(ref.substring(0, letters));
        }

        private String text(String type, int style, String value, boolean formula, StringBuilder inline)
                throws IOException {
            int columnNumber = column + 1;
            String t = type == null ? "n" : type;
            switch (t) {
                case "s" -> {        // §18.4.9 sst: an index into the shared strings
                    int index = number(value, -1);
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

    /** The shared strings (§18.4.9 sst, §18.4.8 si): each the text of its t elements, phonetic runs left out. */
    private void loadStrings() throws IOException, XMLStreamException {
        if (shared != null) {
            return;
        }
        List<String> strings = new ArrayList<>();
        Optional<InputStream> part = parts().open("xl/sharedStrings.xml");
        if (part.isPresent()) {
            XMLStreamReader xml = xml(part.get());
            while (xml.hasNext()) {
                if (xml.next() == XMLStreamConstants.START_ELEMENT && xml.getLocalName().equals("si")) {
                    strings.add(richText(xml, "si").toString());
                }
            }
        }
        shared = strings.toArray(String[]::new);
    }

    /**
     * Which cell formats (§18.8.10 cellXfs, §18.8.45 xf) show a date or a percentage, by their number
     * format (§18.8.31 numFmts; built-in formats by id, §18.8.30).
     */
    private void loadStyles() throws IOException, XMLStreamException {
        if (dateStyle != null) {
            return;
        }
        Map<Integer, String> codes = new HashMap<>();
        List<Integer> formats = new ArrayList<>();
        Optional<InputStream> part = parts().open("xl/styles.xml");
        if (part.isPresent()) {
            XMLStreamReader xml = xml(part.get());
            boolean inCellXfs = false;
            while (xml.hasNext()) {
                int event = xml.next();
                if (event == XMLStreamConstants.START_ELEMENT) {
                    switch (xml.getLocalName()) {
                        case "numFmt" -> codes.put(number(attribute(xml, "numFmtId"), -1), attribute(xml, "formatCode"));
                        case "cellXfs" -> inCellXfs = true;
                        case "xf" -> {
                            if (inCellXfs) {
                                formats.add(number(attribute(xml, "numFmtId"), 0));
                            }
                        }
                        default -> {
                            // fonts, fills and borders do not bear on the values
                        }
                    }
                } else if (event == XMLStreamConstants.END_ELEMENT && xml.getLocalName().equals("cellXfs")) {
                    inCellXfs = false;
                }
            }
        }
        dateStyle = new boolean[formats.size()];
        percentStyle = new boolean[formats.size()];
        for (int i = 0; i < formats.size(); i++) {
            int id = formats.get(i);
            dateStyle[i] = SheetCells.isDateFormat(id, codes.get(id));
            percentStyle[i] = !dateStyle[i] && SheetCells.isPercentFormat(id, codes.get(id));
        }
    }

    /** The text of the t elements inside the element just started ({@code si} or {@code is}), rPh runs left out (§18.4.6). */
    private static StringBuilder richText(XMLStreamReader xml, String element) throws XMLStreamException {
        StringBuilder text = new StringBuilder();
        int phonetic = 0;
        while (xml.hasNext()) {
            int event = xml.next();
            if (event == XMLStreamConstants.START_ELEMENT) {
                String name = xml.getLocalName();
                if (name.equals("rPh")) {
                    phonetic++;
                } else if (name.equals("t") && phonetic == 0) {
                    text.append(xml.getElementText());
                }
            } else if (event == XMLStreamConstants.END_ELEMENT) {
                String name = xml.getLocalName();
                if (name.equals("rPh")) {
                    phonetic--;
                } else if (name.equals(element)) {
                    break;
                }
            }
        }
        return text;
    }

    private static void skip(XMLStreamReader xml) throws XMLStreamException {
        int depth = 1;
        while (depth > 0 && xml.hasNext()) {
            int event = xml.next();
            if (event == XMLStreamConstants.START_ELEMENT) {
                depth++;
            } else if (event == XMLStreamConstants.END_ELEMENT) {
                depth--;
            }
        }
    }

    /** A non-negative whole number from an attribute, or {@code otherwise} when absent. */
    static int number(String text, int otherwise) {
        if (text == null || text.isEmpty()) {
            return otherwise;
        }
        int value = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c < '0' || c > '9' || value > 100_000_000) {
                return otherwise;
            }
            value = value * 10 + (c - '0');
        }
        return value;
    }
}
