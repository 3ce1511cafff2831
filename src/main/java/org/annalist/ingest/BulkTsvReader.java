package org.annalist.ingest;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.ingest.CsvRows.Row;
import org.annalist.series.Period;

/**
 * Reads the tab-separated bulk layout of statistics portals: a first column that joins the
 * dimension codes with commas under a header naming them before a backslash and the time
 * dimension ({@code freq,unit,geo\TIME_PERIOD}), periods across the header ({@code 2024-01 } or
 * {@code 2024M01}, often with trailing spaces), and in each cell the value followed by its flags
 * ({@code 123 p}, {@code : c}; a colon alone is a missing value). The layout is common practice of
 * bulk downloads (no SDMX specification: Eurostat's own format, described in its help pages "Which are the
 * available formats" and, for the SDMX 2.1/3.0 APIs, "Details on the format": a header whose first cell is
 * the dimension codes joined by commas, a backslash and TIME_PERIOD; one tab-delimited series a line; checked).
 */
final class BulkTsvReader {

    private static final Pattern HEADER = Pattern.compile("([^\\\\]*)\\\\\\s*([A-Za-z_]+)\\s*");
    /** A cell: a number or a colon (missing), then letters of flags, with or without a space between. */
    private static final Pattern CELL = Pattern.compile("(:|[+-]?(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)?\\s*([A-Za-z]*)");

    private final String baseName;
    private final ProblemLog log;
    private KeyedSeries collected;
    private int dimensionCount;
    private Period[] periods;
    private final Map<String, Integer> unknownFlags = new LinkedHashMap<>();
    private int rows;

    BulkTsvReader(String baseName, ProblemLog log) {
        this.baseName = baseName;
        this.log = log;
    }

    void row(Row row) {
        if (collected == null) {
            header(row);
            return;
        }
        if (row.cells().stream().allMatch(String::isEmpty)) {
            return;
        }
        String[] codes = row.cell(0).split(",", -1);
        if (codes.length != dimensionCount) {
            log.error(row.line(), 1, "'" + row.cell(0) + "' has " + codes.length + " codes but the header names "
                    + dimensionCount + " dimensions; expected one code for each, joined by commas");
            return;
        }
        for (int i = 0; i < codes.length; i++) {
            codes[i] = codes[i].strip();
        }
        if (row.cells().size() > periods.length + 1) {
            log.error(row.line(), periods.length + 2, "this row has " + row.cells().size() + " fields but the header has "
                    + (periods.length + 1) + "; expected one value for each period of the header");
            return;
        }
        rows++;
        for (int p = 0; p < periods.length; p++) {
            if (periods[p] == null) {
                continue;   // its header cell was reported
            }
            String cell = row.cell(p + 1).strip();
            Matcher m = CELL.matcher(cell);
            if (!m.matches() || (m.group(1) == null && !m.group(2).isEmpty())) {
                log.error(row.line(), p + 2, "'" + cell + "' is not a value; expected a number with a decimal point, "
                        + "or ':' for a missing value, each followed by flag letters if any (123 p, : c)");
                continue;
            }
            double value = m.group(1) == null || m.group(1).equals(":") ? Double.NaN : Double.parseDouble(m.group(1));
            if (!(Math.abs(value) <= NumberCells.MAX_MAGNITUDE) && !Double.isNaN(value)) {
                log.error(row.line(), p + 2, "'" + cell + "' is beyond ±1e100; expected a smaller value");
                continue;
            }
            SdmxFlags.Read flags = SdmxFlags.letters(m.group(2));
            if (!flags.unknown().isEmpty()) {
                unknownFlags.putIfAbsent(flags.unknown(), row.line());
            }
            if (cell.isEmpty()) {
                continue;   // a row shorter than the header: no value for the periods at its end
            }
            collected.add(codes, periods[p], value, flags.flags(), row.line(), p + 2);
        }
    }

    KeyedSeries.Assembled end() {
        if (collected == null) {
            throw log.fatal(0, 0, "the file is empty; expected a header such as freq,unit,geo\\TIME_PERIOD and rows");
        }
        unknownFlags.forEach((letters, line) -> log.warn(line, 0, "flag '" + letters + "' is not one this tool knows ("
                + org.annalist.series.ValueFlag.knownCodes() + "); those values were read without it"));
        if (rows == 0 && !log.hasErrors()) {
            throw log.fatal(0, 0, "the file has a header but no rows; expected a row of values for each series");
        }
        return collected.assemble();
    }

    int rowsRead() {
        return rows;
    }

    private void header(Row header) {
        Matcher m = HEADER.matcher(header.cell(0));
        if (!m.matches()) {
            throw log.fatal(header.line(), 1, "'" + header.cell(0) + "' does not name the dimensions; expected a first "
                    + "header cell such as freq,unit,geo\\TIME_PERIOD");
        }
        List<KeyedSeries.Dimension> dimensions = new ArrayList<>();
        for (String id : m.group(1).split(",", -1)) {
            dimensions.add(new KeyedSeries.Dimension(id.strip(), ""));
        }
        dimensionCount = dimensions.size();
        periods = new Period[header.cells().size() - 1];
        Map<Period, Integer> seen = new LinkedHashMap<>();
        for (int p = 0; p < periods.length; p++) {
            SdmxPeriods.Reading read = SdmxPeriods.read(header.cell(p + 1));
            Optional<Period> period = read.period();
            if (period.isEmpty()) {
                log.error(header.line(), p + 2, read.problem());
                continue;
            }
            Integer before = seen.putIfAbsent(period.get(), p + 2);
            if (before != null) {
                log.error(header.line(), p + 2, "period " + period.get() + " heads two columns (" + before + " and "
                        + (p + 2) + "); expected each period once");
                continue;
            }
            periods[p] = period.get();
        }
        if (periods.length == 0) {
            throw log.fatal(header.line(), 0, "the header has no periods after its first cell; expected periods across the header");
        }
        collected = new KeyedSeries(baseName, "", dimensions, 0, log);
        for (int p = 0; p < periods.length; p++) {
            collected.shape(header.cell(p + 1));
        }
    }
}
