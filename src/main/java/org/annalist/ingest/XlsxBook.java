package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
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
        new XlsxSheet(xml(sheet.part()), sink, merges, new XlsxSheet.Formats(shared, dateStyle, percentStyle, date1904))
                .run();
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
    static StringBuilder richText(XMLStreamReader xml, String element) throws XMLStreamException {
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

    /** Reads past the element just started, with everything inside it (shared by both workbook kinds). */
    static void skip(XMLStreamReader xml) throws XMLStreamException {
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
