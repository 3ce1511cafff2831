package org.annalist.ingest;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;

/**
 * Writes test workbooks as what they are, zips of XML, part by part as the specifications lay them out
 * (xlsx: ECMA-376 Part 1 SpreadsheetML in an Open Packaging Conventions package, Part 2; ods: OASIS ODF 1.2
 * Part 1 chapter 9 in a Part 3 package), so that each case (a serial date in either date system, a formula's
 * cached value, an error cell, a merged header, a hidden row) is written exactly as the spec says.
 *
 * <p>A cell is given as text with a prefix saying its kind: {@code 123.5} a number, {@code Nights} a
 * shared string (anything that is not a number), {@code i:Nights} an inline string, {@code t:123} a
 * number stored as text, {@code d:45352} a serial date shown as {@code mmm yyyy}, {@code D:2024-03-01} a
 * date (xlsx: ISO type d; ods: office:date-value), {@code f:SUM(B2:B3)=12} a formula with its cached
 * value, {@code F:SUM(B2:B3)} one without, {@code e:#N/A} an error, {@code p:0.125} a percentage,
 * {@code ""} an empty cell.
 */
public final class WorkbookFiles {

    /** A sheet: its name, first row number, rows of cells, and what is hidden or merged. */
    public static final class Sheet {
        final String name;
        final List<List<String>> rows = new ArrayList<>();
        int firstRow = 1;
        boolean hidden;
        final Set<Integer> hiddenRows = new TreeSet<>();
        final Set<Integer> hiddenColumns = new TreeSet<>();
        final List<String> merges = new ArrayList<>();

        public Sheet(String name) {
            this.name = name;
        }

        public Sheet row(String... cells) {
            rows.add(List.of(cells));
            return this;
        }

        public Sheet startingAt(int row) {
            firstRow = row;
            return this;
        }

        public Sheet hidden() {
            hidden = true;
            return this;
        }

        public Sheet hideRow(int row) {
            hiddenRows.add(row);
            return this;
        }

        /** @param column 1-based */
        public Sheet hideColumn(int column) {
            hiddenColumns.add(column);
            return this;
        }

        /** @param range such as {@code B1:D1} */
        public Sheet merge(String range) {
            merges.add(range);
            return this;
        }
    }

    private WorkbookFiles() {
    }

    /** The {@code period,value} rows of a reference dataset as a sheet with a header, periods as dates (ISO cells). */
    public static Sheet reference(String dataset, String sheetName) {
        return reference(dataset, sheetName, false);
    }

    /**
     * As {@link #reference(String, String)}; with {@code serial}, each period a serial date of the 1900
     * system shown as {@code mmm yyyy}, as spreadsheet programs store dates (xlsx only; days since
     * 1899-12-30 from 1 March 1900 on, ECMA-376 Part 1 §18.17.4.1).
     */
    public static Sheet reference(String dataset, String sheetName, boolean serial) {
        Sheet sheet = new Sheet(sheetName).row("period", "value");
        for (String[] row : Files.referenceRows(dataset)) {
            String period = row[0];
            if (period.length() == 4 || period.contains("Q")) {
                sheet.row(period.length() == 4 ? period : "t:" + period, row[1]);   // a year as a number, a quarter as text
                continue;
            }
            String date = period.length() == 7 ? period + "-01" : period;
            long days = java.time.temporal.ChronoUnit.DAYS.between(java.time.LocalDate.of(1899, 12, 30),
                    java.time.LocalDate.parse(date));
            sheet.row(serial ? "d:" + days : "D:" + date, row[1]);
        }
        return sheet;
    }

    // ---------------------------------------------------------------- xlsx

    public static byte[] xlsx(boolean date1904, Sheet... sheets) {
        Map<String, byte[]> parts = new LinkedHashMap<>();
        List<String> shared = new ArrayList<>();
        Map<String, Integer> sharedIndex = new LinkedHashMap<>();
        parts.put("[Content_Types].xml", utf8("<?xml version=\"1.0\" encoding=\"UTF-8\" standalone=\"yes\"?>"
                + "<Types xmlns=\"http://schemas.openxmlformats.org/package/2006/content-types\">"
                + "<Default Extension=\"rels\" ContentType=\"application/vnd.openxmlformats-package.relationships+xml\"/>"
                + "<Default Extension=\"xml\" ContentType=\"application/xml\"/>"
                + "<Override PartName=\"/xl/workbook.xml\" ContentType=\"application/vnd.openxmlformats-officedocument."
                + "spreadsheetml.sheet.main+xml\"/></Types>"));
        parts.put("_rels/.rels", utf8("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<Relationships xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\">"
                + "<Relationship Id=\"rId1\" Type=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships/"
                + "officeDocument\" Target=\"xl/workbook.xml\"/></Relationships>"));
        StringBuilder workbook = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<workbook xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\" "
                + "xmlns:r=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships\">");
        workbook.append(date1904 ? "<workbookPr date1904=\"1\"/>" : "<workbookPr/>").append("<sheets>");
        StringBuilder rels = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<Relationships xmlns=\"http://schemas.openxmlformats.org/package/2006/relationships\">");
        for (int i = 0; i < sheets.length; i++) {
            Sheet sheet = sheets[i];
            workbook.append("<sheet name=\"").append(escape(sheet.name)).append("\" sheetId=\"").append(i + 1)
                    .append(sheet.hidden ? "\" state=\"hidden" : "").append("\" r:id=\"rId").append(i + 1).append("\"/>");
            rels.append("<Relationship Id=\"rId").append(i + 1).append("\" Type=\"http://schemas.openxmlformats.org/"
                    + "officeDocument/2006/relationships/worksheet\" Target=\"worksheets/sheet").append(i + 1)
                    .append(".xml\"/>");
            parts.put("xl/worksheets/sheet" + (i + 1) + ".xml", utf8(xlsxSheet(sheet, shared, sharedIndex)));
        }
        workbook.append("</sheets></workbook>");
        rels.append("<Relationship Id=\"rIdS\" Type=\"http://schemas.openxmlformats.org/officeDocument/2006/relationships/"
                + "styles\" Target=\"styles.xml\"/><Relationship Id=\"rIdT\" Type=\"http://schemas.openxmlformats.org/"
                + "officeDocument/2006/relationships/sharedStrings\" Target=\"sharedStrings.xml\"/></Relationships>");
        parts.put("xl/workbook.xml", utf8(workbook.toString()));
        parts.put("xl/_rels/workbook.xml.rels", utf8(rels.toString()));
        // cellXfs: 0 General, 1 a custom date format (numFmt 164), 2 built-in 10 (0.00%), 3 built-in 14 (a date)
        parts.put("xl/styles.xml", utf8("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<styleSheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\">"
                + "<numFmts count=\"1\"><numFmt numFmtId=\"164\" formatCode=\"mmm\\ yyyy\"/></numFmts>"
                + "<cellStyleXfs count=\"1\"><xf numFmtId=\"0\"/></cellStyleXfs>"
                + "<cellXfs count=\"4\"><xf numFmtId=\"0\" xfId=\"0\"/><xf numFmtId=\"164\" xfId=\"0\" applyNumberFormat=\"1\"/>"
                + "<xf numFmtId=\"10\" xfId=\"0\" applyNumberFormat=\"1\"/><xf numFmtId=\"14\" xfId=\"0\"/></cellXfs>"
                + "</styleSheet>"));
        StringBuilder sst = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<sst xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\" count=\"" + shared.size()
                + "\" uniqueCount=\"" + shared.size() + "\">");
        for (String s : shared) {
            sst.append("<si><t xml:space=\"preserve\">").append(escape(s)).append("</t></si>");
        }
        parts.put("xl/sharedStrings.xml", utf8(sst.append("</sst>").toString()));
        return zip(parts, false);
    }

    private static String xlsxSheet(Sheet sheet, List<String> shared, Map<String, Integer> sharedIndex) {
        StringBuilder xml = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<worksheet xmlns=\"http://schemas.openxmlformats.org/spreadsheetml/2006/main\">");
        if (!sheet.hiddenColumns.isEmpty()) {
            xml.append("<cols>");
            sheet.hiddenColumns.forEach(c -> xml.append("<col min=\"").append(c).append("\" max=\"").append(c)
                    .append("\" hidden=\"1\"/>"));
            xml.append("</cols>");
        }
        xml.append("<sheetData>");
        for (int r = 0; r < sheet.rows.size(); r++) {
            int number = sheet.firstRow + r;
            xml.append("<row r=\"").append(number).append(sheet.hiddenRows.contains(number) ? "\" hidden=\"1" : "")
                    .append("\">");
            List<String> cells = sheet.rows.get(r);
            for (int c = 0; c < cells.size(); c++) {
                String cell = cells.get(c);
                if (cell.isEmpty()) {
                    continue;
                }
                String ref = DataProblem.columnLetters(c + 1) + number;
                xml.append(xlsxCell(ref, cell, shared, sharedIndex));
            }
            xml.append("</row>");
        }
        xml.append("</sheetData>");
        if (!sheet.merges.isEmpty()) {
            xml.append("<mergeCells count=\"").append(sheet.merges.size()).append("\">");
            sheet.merges.forEach(m -> xml.append("<mergeCell ref=\"").append(m).append("\"/>"));
            xml.append("</mergeCells>");
        }
        return xml.append("</worksheet>").toString();
    }

    private static String xlsxCell(String ref, String cell, List<String> shared, Map<String, Integer> sharedIndex) {
        String open = "<c r=\"" + ref + "\"";
        String kind = cell.length() > 1 && cell.charAt(1) == ':' ? cell.substring(0, 1) : "";
        String body = kind.isEmpty() ? cell : cell.substring(2);
        switch (kind) {
            case "i": return open + " t=\"inlineStr\"><is><t>" + escape(body) + "</t></is></c>";
            case "t": return open + " t=\"s\"><v>" + sharedString(body, shared, sharedIndex) + "</v></c>";
            case "d": return open + " s=\"1\"><v>" + body + "</v></c>";
            case "D": return open + " t=\"d\" s=\"3\"><v>" + body + "</v></c>";
            case "e": return open + " t=\"e\"><v>" + escape(body) + "</v></c>";
            case "p": return open + " s=\"2\"><v>" + body + "</v></c>";
            case "F": return open + "><f>" + escape(body) + "</f></c>";
            case "f": {
                int eq = body.lastIndexOf('=');
                return open + "><f>" + escape(body.substring(0, eq)) + "</f><v>" + body.substring(eq + 1) + "</v></c>";
            }
            default:
                if (isNumber(body)) {
                    return open + "><v>" + body + "</v></c>";
                }
                return open + " t=\"s\"><v>" + sharedString(body, shared, sharedIndex) + "</v></c>";
        }
    }

    private static int sharedString(String text, List<String> shared, Map<String, Integer> index) {
        return index.computeIfAbsent(text, t -> {
            shared.add(t);
            return shared.size() - 1;
        });
    }

    // ---------------------------------------------------------------- ods

    private static final String ODS_NAMESPACES = "xmlns:office=\"urn:oasis:names:tc:opendocument:xmlns:office:1.0\" "
            + "xmlns:table=\"urn:oasis:names:tc:opendocument:xmlns:table:1.0\" "
            + "xmlns:text=\"urn:oasis:names:tc:opendocument:xmlns:text:1.0\" "
            + "xmlns:style=\"urn:oasis:names:tc:opendocument:xmlns:style:1.0\" "
            + "xmlns:calcext=\"urn:org:documentfoundation:names:experimental:calc:xmlns:calcext:1.0\" "
            + "xmlns:of=\"urn:oasis:names:tc:opendocument:xmlns:of:1.2\"";

    public static byte[] ods(Sheet... sheets) {
        Map<String, byte[]> parts = new LinkedHashMap<>();
        parts.put("mimetype", utf8("application/vnd.oasis.opendocument.spreadsheet"));
        parts.put("META-INF/manifest.xml", utf8("<?xml version=\"1.0\" encoding=\"UTF-8\"?>"
                + "<manifest:manifest xmlns:manifest=\"urn:oasis:names:tc:opendocument:xmlns:manifest:1.0\" "
                + "manifest:version=\"1.2\"><manifest:file-entry manifest:full-path=\"/\" manifest:media-type="
                + "\"application/vnd.oasis.opendocument.spreadsheet\"/><manifest:file-entry manifest:full-path="
                + "\"content.xml\" manifest:media-type=\"text/xml\"/></manifest:manifest>"));
        StringBuilder content = new StringBuilder("<?xml version=\"1.0\" encoding=\"UTF-8\"?><office:document-content "
                + ODS_NAMESPACES + " office:version=\"1.2\"><office:automatic-styles>"
                + "<style:style style:name=\"taHidden\" style:family=\"table\"><style:table-properties "
                + "table:display=\"false\"/></style:style></office:automatic-styles><office:body><office:spreadsheet>");
        for (Sheet sheet : sheets) {
            content.append(odsTable(sheet));
        }
        parts.put("content.xml", utf8(content.append("</office:spreadsheet></office:body></office:document-content>")
                .toString()));
        return zip(parts, true);
    }

    private static String odsTable(Sheet sheet) {
        StringBuilder xml = new StringBuilder("<table:table table:name=\"" + escape(sheet.name) + "\""
                + (sheet.hidden ? " table:style-name=\"taHidden\"" : "") + ">");
        int width = sheet.rows.stream().mapToInt(List::size).max().orElse(1);
        for (int c = 1; c <= width; c++) {
            xml.append("<table:table-column").append(sheet.hiddenColumns.contains(c) ? " table:visibility=\"collapse\"" : "")
                    .append("/>");
        }
        if (sheet.firstRow > 1) {
            xml.append("<table:table-row table:number-rows-repeated=\"").append(sheet.firstRow - 1)
                    .append("\"><table:table-cell table:number-columns-repeated=\"").append(width)
                    .append("\"/></table:table-row>");
        }
        Map<String, int[]> spans = new LinkedHashMap<>();
        Set<String> covered = new TreeSet<>();
        for (String m : sheet.merges) {
            String[] ends = m.split(":");
            int[] a = ref(ends[0]);
            int[] b = ref(ends[1]);
            spans.put(ends[0], new int[] {b[0] - a[0] + 1, b[1] - a[1] + 1});
            for (int r = a[0]; r <= b[0]; r++) {
                for (int c = a[1]; c <= b[1]; c++) {
                    if (r != a[0] || c != a[1]) {
                        covered.add(DataProblem.columnLetters(c) + r);
                    }
                }
            }
        }
        for (int r = 0; r < sheet.rows.size(); r++) {
            int number = sheet.firstRow + r;
            xml.append("<table:table-row").append(sheet.hiddenRows.contains(number) ? " table:visibility=\"collapse\"" : "")
                    .append(">");
            List<String> cells = sheet.rows.get(r);
            for (int c = 0; c < cells.size(); c++) {
                String ref = DataProblem.columnLetters(c + 1) + number;
                if (covered.contains(ref)) {
                    xml.append("<table:covered-table-cell/>");
                    continue;
                }
                int[] span = spans.get(ref);
                String spanned = span == null ? "" : " table:number-rows-spanned=\"" + span[0]
                        + "\" table:number-columns-spanned=\"" + span[1] + "\"";
                xml.append(odsCell(cells.get(c), spanned));
            }
            xml.append("</table:table-row>");
        }
        // what a spreadsheet program writes below the last row: the rest of the sheet, empty
        xml.append("<table:table-row table:number-rows-repeated=\"1048000\"><table:table-cell "
                + "table:number-columns-repeated=\"1024\"/></table:table-row>");
        return xml.append("</table:table>").toString();
    }

    private static int[] ref(String ref) {
        int letters = 0;
        while (Character.isLetter(ref.charAt(letters))) {
            letters++;
        }
        return new int[] {Integer.parseInt(ref.substring(letters)), XlsxBook.columnIndex(ref.substring(0, letters)) + 1};
    }

    private static String odsCell(String cell, String spanned) {
        String kind = cell.length() > 1 && cell.charAt(1) == ':' ? cell.substring(0, 1) : "";
        String body = kind.isEmpty() ? cell : cell.substring(2);
        if (cell.isEmpty()) {
            return "<table:table-cell" + spanned + "/>";
        }
        String open = "<table:table-cell" + spanned;
        switch (kind) {
            case "D": return open + " office:value-type=\"date\" office:date-value=\"" + body + "\"><text:p>" + body
                    + "</text:p></table:table-cell>";
            case "e": return open + " table:formula=\"of:=NA()\" office:value-type=\"string\" office:string-value=\"\" "
                    + "calcext:value-type=\"error\"><text:p>" + escape(body) + "</text:p></table:table-cell>";
            case "p": return open + " office:value-type=\"percentage\" office:value=\"" + body + "\"><text:p>" + body
                    + "</text:p></table:table-cell>";
            case "F": return open + " table:formula=\"of:=" + escape(body) + "\"/>";
            case "f": {
                int eq = body.lastIndexOf('=');
                return open + " table:formula=\"of:=" + escape(body.substring(0, eq)) + "\" office:value-type=\"float\" "
                        + "office:value=\"" + body.substring(eq + 1) + "\"><text:p>" + body.substring(eq + 1)
                        + "</text:p></table:table-cell>";
            }
            case "t": case "i": return open + " office:value-type=\"string\"><text:p>" + escape(body)
                    + "</text:p></table:table-cell>";
            default:
                if (isNumber(body)) {
                    return open + " office:value-type=\"float\" office:value=\"" + body + "\"><text:p>" + body
                            + "</text:p></table:table-cell>";
                }
                return open + " office:value-type=\"string\"><text:p>" + escape(body) + "</text:p></table:table-cell>";
        }
    }

    // ---------------------------------------------------------------- zip

    /** A zip of the parts in order; {@code storedFirst}: the first part stored, not deflated (ODF 1.2 Part 3 §3.3). */
    static byte[] zip(Map<String, byte[]> parts, boolean storedFirst) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ZipOutputStream zip = new ZipOutputStream(bytes)) {
            boolean first = true;
            for (Map.Entry<String, byte[]> part : parts.entrySet()) {
                ZipEntry entry = new ZipEntry(part.getKey());
                if (first && storedFirst) {
                    CRC32 crc = new CRC32();
                    crc.update(part.getValue());
                    entry.setMethod(ZipEntry.STORED);
                    entry.setSize(part.getValue().length);
                    entry.setCompressedSize(part.getValue().length);
                    entry.setCrc(crc.getValue());
                }
                first = false;
                zip.putNextEntry(entry);
                zip.write(part.getValue());
                zip.closeEntry();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    private static boolean isNumber(String text) {
        return text.matches("-?\\d+(\\.\\d+)?([eE]-?\\d+)?");
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private static String escape(String text) {
        return text.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
