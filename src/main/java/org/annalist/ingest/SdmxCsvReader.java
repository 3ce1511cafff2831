package org.annalist.ingest;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.Set;
import java.util.regex.Pattern;
import org.annalist.ingest.CsvRows.Row;
import org.annalist.series.Period;
import org.annalist.series.ValueFlag;

/**
 * Reads SDMX-CSV, versions 1.0 (SDMX 2.1) and 2.0 (SDMX 3.0), row by row: one observation a row, its
 * series told by the dimension columns, its period by {@code TIME_PERIOD}, its value by
 * {@code OBS_VALUE}, its flags by the status columns ({@code OBS_STATUS}, {@code CONF_STATUS},
 * {@code OBS_FLAG}).
 *
 * <p>Which columns are dimensions the file alone cannot say (that is in the data structure
 * definition, which a download does not carry); the specifications give the order "structure,
 * dimensions, time, measure, attributes" (SDMX-CSV 1.0, "Columns"; SDMX-CSV 2.0, "Columns": web
 * services return the components in the order of the data structure, dimensions first). So the
 * columns before {@code OBS_VALUE} (before {@code TIME_PERIOD} when it comes later) are dimensions,
 * except the structure, action and key columns, the status columns and the technical ones that
 * portals add ({@code LAST UPDATE}, {@code UPDATED}, {@code UNIT_MULT}, …); the columns after it are
 * attributes.
 */
final class SdmxCsvReader {

    /** Columns that portals place among the dimensions but that tell no series apart (common practice, no source). */
    private static final Set<String> NOT_DIMENSIONS = Set.of("LAST UPDATE", "LAST_UPDATE", "UPDATED", "VALID_FROM",
            "VALID_TO", "UNIT_MULT", "DECIMALS", "OBS_COM", "COMMENT_OBS", "OBS_COMMENT", "OBS_PRE_BREAK", "TIME_FORMAT",
            "TITLE", "TITLE_COMPL", "EMBARGO_TIME", "SERIES_KEY", "OBS_KEY", "STRUCTURE_NAME", "ACTION");
    /** An identifier, as the header of a component column has (SDMX ids: letters, digits, {@code _}, {@code .}, {@code []}). */
    private static final Pattern IDENTIFIER = Pattern.compile("[A-Za-z][A-Za-z0-9_.@$\\-]*(\\[[^\\]]*\\])?( [A-Z]+)?");
    private static final Pattern NUMBER = Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    private final PublishedFormat format;
    private final char delimiter;
    private final String baseName;
    private final ProblemLog log;
    private KeyedSeries collected;
    private int width;
    private int time = -1;
    private int value = -1;
    private int action = -1;
    private int unitMult = -1;
    private final Map<Integer, Integer> multipliersApplied = new java.util.TreeMap<>();   // UNIT_MULT → first line
    private int[] dimensionColumns;
    private final Map<Integer, Integer> labelColumns = new LinkedHashMap<>();   // label column → its component column
    private final List<int[]> statusColumns = new ArrayList<>();                 // {column, kind ordinal}
    private final Map<String, Integer> unknownStatus = new LinkedHashMap<>();
    private int deleted;
    private int firstDeleted;
    private int partial;
    private int firstPartial;
    private int rows;
    private int shapesNoted;

    SdmxCsvReader(PublishedFormat format, char delimiter, String baseName, ProblemLog log) {
        this.format = format;
        this.delimiter = delimiter;
        this.baseName = baseName;
        this.log = log;
    }

    /** The next row of the file; the first is the header. */
    void row(Row row) {
        if (collected == null) {
            header(row);
            return;
        }
        if (row.cells().stream().allMatch(String::isEmpty)) {
            return;
        }
        if (row.cells().size() != width) {
            log.error(row.line(), 0, "this row has " + row.cells().size() + " fields but the header has " + width
                    + "; expected every row as wide as the header (SDMX-CSV follows RFC 4180; quote a cell that holds '"
                    + delimiter + "')");
            return;
        }
        if (action >= 0 && PublishedFormat.codeOf(row.cell(action)).equalsIgnoreCase("D")) {
            firstDeleted = deleted++ == 0 ? row.line() : firstDeleted;
            return;
        }
        String timeCell = PublishedFormat.codeOf(row.cell(time));
        String valueCell = row.cell(value).strip();
        if (timeCell.isEmpty()) {
            if (!valueCell.isEmpty()) {
                log.error(row.line(), time + 1, "an observation without a TIME_PERIOD; expected " + SdmxPeriods.EXPECTED);
            } else {
                firstPartial = partial++ == 0 ? row.line() : firstPartial;   // attributes of a partial key
            }
            return;
        }
        rows++;
        SdmxPeriods.Reading period = SdmxPeriods.read(timeCell);
        if (shapesNoted < 4) {
            shapesNoted++;
            collected.shape(timeCell);
        }
        if (period.period().isEmpty()) {
            log.error(row.line(), time + 1, period.problem());
            return;
        }
        Set<ValueFlag> flags = Set.of();
        boolean statusMissing = false;
        for (int[] status : statusColumns) {
            SdmxFlags.Read read = SdmxFlags.read(row.cell(status[0]), SdmxFlags.Kind.values()[status[1]]);
            if (!read.unknown().isEmpty()) {
                unknownStatus.putIfAbsent(read.unknown(), row.line());
            }
            statusMissing |= read.missing();
            if (!read.flags().isEmpty()) {
                flags = flags.isEmpty() ? read.flags() : union(flags, read.flags());
            }
        }
        Optional<Double> number = number(valueCell);
        if (number.isEmpty()) {
            log.error(row.line(), value + 1, "'" + valueCell + "' is not a number; expected OBS_VALUE as a number such as "
                    + "1234.5" + (delimiter == ',' ? "" : " or 1234,5") + ", or empty or NaN for a missing value");
            return;
        }
        String[] codes = new String[dimensionColumns.length];
        for (int d = 0; d < codes.length; d++) {
            String cell = row.cell(dimensionColumns[d]);
            codes[d] = PublishedFormat.codeOf(cell);
            Optional<String> label = labelColumnOf(dimensionColumns[d]).map(row::cell).filter(s -> !s.isBlank())
                    .or(() -> PublishedFormat.labelOf(cell));
            if (label.isPresent()) {
                collected.label(d, codes[d], label.get());
            }
        }
        double v = statusMissing ? Double.NaN : number.get();
        if (unitMult >= 0 && !Double.isNaN(v)) {
            OptionalInt exponent = UnitMultiplier.exponent(row.cell(unitMult));
            if (exponent.isEmpty()) {
                log.error(row.line(), unitMult + 1, "UNIT_MULT '" + row.cell(unitMult).strip() + "' is not a power of ten; "
                        + "expected a whole number from " + UnitMultiplier.LOWEST + " to " + UnitMultiplier.HIGHEST
                        + " (3 for thousands, 6 for millions), or empty");
                return;
            }
            if (exponent.getAsInt() != 0) {
                v = UnitMultiplier.apply(v, exponent.getAsInt());
                multipliersApplied.putIfAbsent(exponent.getAsInt(), row.line());
            }
        }
        collected.add(codes, period.period().get(), v, flags, row.line(), time + 1);
    }

    /** The file has ended. */
    KeyedSeries.Assembled end() {
        if (collected == null) {
            throw log.fatal(0, 0, "the file is empty; expected an SDMX-CSV header and rows");
        }
        if (deleted > 0) {
            log.warn(firstDeleted, 0, deleted + " rows with ACTION D (delete) were left out: they withdraw values, they hold none");
        }
        if (partial > 0) {
            log.warn(firstPartial, 0, partial + " rows without a period or value (attributes of a partial key) were left out");
        }
        multipliersApplied.forEach((exponent, line) -> log.warn(line, 0, UnitMultiplier.note(exponent)));
        unknownStatus.forEach((code, line) -> log.warn(line, 0, "status '" + code + "' is not one this tool knows"
                + " (first on this line); its values were read without a flag"));
        if (rows == 0 && !log.hasErrors()) {
            throw log.fatal(0, 0, "the file has a header but no observations; expected rows with a TIME_PERIOD and an OBS_VALUE");
        }
        return collected.assemble();
    }

    /** Rows read that hold an observation. */
    int rowsRead() {
        return rows;
    }

    private void header(Row header) {
        List<String> cells = header.cells();
        width = cells.size();
        List<String> ids = new ArrayList<>();
        for (String cell : cells) {
            ids.add(PublishedFormat.columnId(cell));
        }
        for (int c = 0; c < ids.size(); c++) {
            String id = ids.get(c);
            if (id.equals("TIME_PERIOD")) {
                time = c;
            } else if (id.equals("OBS_VALUE")) {
                value = c;
            } else if (id.equals("ACTION")) {
                action = c;
            } else if (id.equals("UNIT_MULT")) {
                unitMult = c;
            }
        }
        if (time < 0 || value < 0) {
            throw log.fatal(header.line(), 0, "the header has no " + (time < 0 ? "TIME_PERIOD" : "OBS_VALUE")
                    + " column when split at '" + delimiter + "'; expected an SDMX-CSV header with both");
        }
        int limit = time < value ? value : time;
        // STRUCTURE_ID (2.0), DATAFLOW (1.0); some portals' "SDMX-like" CSV has neither (-1)
        int structure = format == PublishedFormat.SDMX_CSV_2 ? 1 : ids.get(0).equals("DATAFLOW") ? 0 : -1;
        if (ids.contains("STRUCTURE_NAME")) {
            // labels=name (SDMX-CSV 2.0, "Optional parameters"): after the structure, action and key columns,
            // each component's id column is directly followed by its name column
            int c = structure + 1;
            while (c < ids.size() && Set.of("STRUCTURE_NAME", "ACTION", "SERIES_KEY", "OBS_KEY").contains(ids.get(c))) {
                c++;
            }
            for (; c + 1 < ids.size(); c += 2) {
                labelColumns.put(c + 1, c);
            }
        } else {
            for (int c = structure + 1; c < ids.size(); c++) {
                boolean identifier = IDENTIFIER.matcher(PublishedFormat.codeOf(cells.get(c).strip())).matches();
                if (!identifier && !labelColumns.containsKey(c - 1)) {
                    labelColumns.put(c, c - 1);   // a name column without STRUCTURE_NAME: a header that is no identifier
                }
            }
        }
        List<Integer> dimensions = new ArrayList<>();
        List<KeyedSeries.Dimension> described = new ArrayList<>();
        if (structure >= 0) {
            dimensions.add(structure);
            described.add(new KeyedSeries.Dimension(ids.get(structure), ""));
        }
        for (int c = structure + 1; c < ids.size(); c++) {
            String id = ids.get(c);
            Optional<SdmxFlags.Kind> status = SdmxFlags.kindOf(id);
            if (labelColumns.containsKey(c)) {
                continue;
            }
            if (status.isPresent()) {
                statusColumns.add(new int[] {c, status.get().ordinal()});
            } else if (c < limit && c != time && c != value && !NOT_DIMENSIONS.contains(id) && !id.equals("STRUCTURE")) {
                dimensions.add(c);
                int column = c;
                String label = PublishedFormat.labelOf(cells.get(c).strip())
                        .or(() -> labelColumnOf(column).map(l -> cells.get(l).strip())).orElse("");
                described.add(new KeyedSeries.Dimension(id, label));
            }
        }
        List<String> components = new ArrayList<>();
        for (int c = 0; c < ids.size(); c++) {
            components.add(labelColumns.containsKey(c) ? "" : ids.get(c));   // names may repeat; ids may not
        }
        List<String> repeated = components.stream().filter(id -> !id.isEmpty())
                .filter(id -> components.indexOf(id) != components.lastIndexOf(id)).distinct().toList();
        if (!repeated.isEmpty()) {
            throw log.fatal(header.line(), 0, "the header names " + String.join(", ", repeated)
                    + " more than once; expected each component in one column");
        }
        dimensionColumns = dimensions.stream().mapToInt(Integer::intValue).toArray();
        collected = new KeyedSeries(baseName, "", described, structure >= 0 ? 1 : 0, log);
    }

    private Optional<Integer> labelColumnOf(int component) {
        for (Map.Entry<Integer, Integer> e : labelColumns.entrySet()) {
            if (e.getValue() == component) {
                return Optional.of(e.getKey());
            }
        }
        return Optional.empty();
    }

    /**
     * The value of an {@code OBS_VALUE} cell: empty or {@code NaN} is a missing value (SDMX-CSV 1.0,
     * "Data"; SDMX-ML writes a missing value as NaN); the decimal mark is the point, or the comma in a
     * file not separated by commas (SDMX-CSV 2.0, "Design principles": the separator and decimal
     * mark may follow the user's locale). Numbers carry no thousands grouping.
     */
    private Optional<Double> number(String cell) {
        if (cell.isEmpty() || cell.equalsIgnoreCase("NaN") || cell.equals("-") && action >= 0) {
            return Optional.of(Double.NaN);
        }
        String text = delimiter != ',' && cell.indexOf(',') >= 0 && cell.indexOf('.') < 0 ? cell.replace(',', '.') : cell;
        if (!NUMBER.matcher(text).matches()) {
            return Optional.empty();
        }
        double v = Double.parseDouble(text);
        if (!(Math.abs(v) <= NumberCells.MAX_MAGNITUDE) || (v != 0 && Math.abs(v) < NumberCells.MIN_MAGNITUDE)) {
            return Optional.empty();
        }
        return Optional.of(v);
    }

    private static Set<ValueFlag> union(Set<ValueFlag> a, Set<ValueFlag> b) {
        java.util.EnumSet<ValueFlag> all = java.util.EnumSet.copyOf(a);
        all.addAll(b);
        return Set.copyOf(all);
    }
}
