package org.annalist.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.xml.stream.XMLInputFactory;
import javax.xml.stream.XMLStreamException;
import javax.xml.stream.XMLStreamReader;

/**
 * A workbook read part by part with the JDK's streaming XML reader (StAX): its sheets, and the rows of
 * one sheet given to a {@link SheetSink} as they are parsed, so that memory follows the values kept,
 * not the size of the sheet.
 */
abstract class Workbook implements AutoCloseable {

    /** The cells of one row at most: the 16,384 columns (A to XFD) of both formats' programs. */
    static final int MAX_COLUMNS = 16_384;
    /** The rows of one sheet at most (1,048,576, as in both formats' programs). */
    static final int MAX_ROWS = 1 << 20;

    /**
     * A sheet of the workbook.
     *
     * @param name   its name
     * @param number its 1-based position among the sheets
     * @param hidden hidden in the workbook
     * @param chart  a chart sheet, which holds no cells
     * @param part   where its cells are (the zip part of an xlsx sheet; empty for ods)
     */
    record SheetRef(String name, int number, boolean hidden, boolean chart, String part) {
    }

    private final ZipParts parts;

    Workbook(ZipParts parts) {
        this.parts = parts;
    }

    ZipParts parts() {
        return parts;
    }

    /** {@code xlsx}, {@code xlsm} or {@code ods}. */
    abstract String format();

    /** The sheets, in the workbook's order. */
    abstract List<SheetRef> sheets() throws IOException, XMLStreamException;

    /**
     * Reads one sheet's rows into {@code sink}, top to bottom.
     *
     * @param merged whether to fill merged ranges with their label (costs a look through the sheet first in xlsx)
     */
    abstract void read(SheetRef sheet, SheetSink sink, boolean merged) throws IOException, XMLStreamException;

    /** The first {@code rows} rows of each worksheet that is not a chart sheet. */
    Map<SheetRef, List<String[]>> samples(int rows) throws IOException, XMLStreamException {
        Map<SheetRef, List<String[]>> samples = new LinkedHashMap<>();
        for (SheetRef sheet : sheets()) {
            if (sheet.chart()) {
                continue;
            }
            List<String[]> first = new ArrayList<>();
            read(sheet, SheetSink.rows((number, cells) -> {
                first.add(withRowNumber(number, cells));
                return first.size() < rows;
            }), false);
            samples.put(sheet, first);
        }
        return samples;
    }

    /** A sampled row: its number, then its cells. */
    static String[] withRowNumber(int number, String[] cells) {
        String[] row = new String[cells.length + 1];
        row[0] = Integer.toString(number);
        System.arraycopy(cells, 0, row, 1, cells.length);
        return row;
    }

    @Override
    public void close() throws IOException {
        parts.close();
    }

    /** The part as XML, or a damaged-workbook problem when it is missing. */
    XMLStreamReader xml(String part) throws IOException, XMLStreamException {
        InputStream in = parts.open(part).orElseThrow(() -> new IOException("the part " + part + " is missing"));
        return xml(in);
    }

    /**
     * The JDK's own StAX reader with document types and external entities off: a workbook's XML needs
     * neither, and an entity could read a local file or expand without end.
     */
    static XMLStreamReader xml(InputStream in) throws XMLStreamException {
        XMLInputFactory factory = XMLInputFactory.newDefaultFactory();
        factory.setProperty(XMLInputFactory.SUPPORT_DTD, false);
        factory.setProperty(XMLInputFactory.IS_SUPPORTING_EXTERNAL_ENTITIES, false);
        return factory.createXMLStreamReader(in);
    }

    /** An attribute by local name (any namespace), or null. */
    static String attribute(XMLStreamReader xml, String localName) {
        for (int i = 0; i < xml.getAttributeCount(); i++) {
            if (xml.getAttributeLocalName(i).equals(localName)) {
                return xml.getAttributeValue(i);
            }
        }
        return null;
    }

    /** An attribute by namespace and local name, or null. */
    static String attribute(XMLStreamReader xml, String namespace, String localName) {
        return xml.getAttributeValue(namespace, localName);
    }

    static boolean isTrue(String xsdBoolean) {
        return "1".equals(xsdBoolean) || "true".equals(xsdBoolean);
    }
}
