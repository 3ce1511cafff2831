package org.annalist.ingest;

import java.util.List;
import java.util.Optional;
import org.annalist.series.Series;

/**
 * What was read from one file: its series, and the facts about the file that a brief's data
 * appendix states.
 *
 * @param file          the file as the user named it
 * @param sha256        hex SHA-256 of the file's bytes, or {@link #NOT_DIGESTED} when the reading was asked not to
 *                      compute it ({@link SeriesFileReader#withoutDigest}); {@link #sha256()} refuses that
 * @param rowsRead      data rows read (header, titles and notes not counted)
 * @param layout        {@code wide} (a column per series) or {@code long} (a column naming the series)
 * @param periodFormat  the period format(s) as written, e.g. {@code YYYY-MM}
 * @param dateOrder     how {@code a/b/yyyy} dates were read, when the file has them
 * @param decimalMark   the decimal mark used, when any number has a fraction or grouping
 * @param aggregation   the aggregation applied, if any
 * @param warnings      things worth knowing that did not stop the reading
 * @param sheet         the workbook and sheet read, when the file is a workbook (then {@code charset} and
 *                      {@code delimiter} say nothing about it)
 * @param keys          the series' keys and the data set's description, for the files of statistics
 *                      portals (SDMX-CSV, JSON-stat, the bulk tab layout); {@link SeriesKeys#none()} otherwise
 */
public record ReadResult(String file, String sha256, String charset, char delimiter, int rowsRead, String layout,
                         String periodFormat, Optional<DateOrder> dateOrder, Optional<DecimalMark> decimalMark,
                         Optional<Aggregation> aggregation, List<Series> series, List<DataProblem> warnings,
                         Optional<Sheet> sheet, SeriesKeys keys) {

    /**
     * The sheet a series was read from.
     *
     * @param format {@code xlsx}, {@code xlsm} or {@code ods}
     * @param name   the sheet's name
     * @param number its 1-based position in the workbook
     */
    public record Sheet(String format, String name, int number) {
    }

    /** The {@code sha256} of a file read without its digest. */
    public static final String NOT_DIGESTED = "";

    public ReadResult {
        java.util.Objects.requireNonNull(sha256, "sha256");
        series = List.copyOf(series);
        warnings = List.copyOf(warnings);
        java.util.Objects.requireNonNull(sheet, "sheet");
        java.util.Objects.requireNonNull(keys, "keys");
    }

    /** A file of plain columns, whose series have no keys. */
    public ReadResult(String file, String sha256, String charset, char delimiter, int rowsRead, String layout,
                      String periodFormat, Optional<DateOrder> dateOrder, Optional<DecimalMark> decimalMark,
                      Optional<Aggregation> aggregation, List<Series> series, List<DataProblem> warnings) {
        this(file, sha256, charset, delimiter, rowsRead, layout, periodFormat, dateOrder, decimalMark, aggregation, series,
                warnings, Optional.empty(), SeriesKeys.none());
    }

    /** A sheet of a workbook, whose series have no keys. */
    public ReadResult(String file, String sha256, String charset, char delimiter, int rowsRead, String layout,
                      String periodFormat, Optional<DateOrder> dateOrder, Optional<DecimalMark> decimalMark,
                      Optional<Aggregation> aggregation, List<Series> series, List<DataProblem> warnings,
                      Optional<Sheet> sheet) {
        this(file, sha256, charset, delimiter, rowsRead, layout, periodFormat, dateOrder, decimalMark, aggregation, series,
                warnings, sheet, SeriesKeys.none());
    }

    /** A file of a statistics portal, whose series have keys. */
    public ReadResult(String file, String sha256, String charset, char delimiter, int rowsRead, String layout,
                      String periodFormat, Optional<DateOrder> dateOrder, Optional<DecimalMark> decimalMark,
                      Optional<Aggregation> aggregation, List<Series> series, List<DataProblem> warnings,
                      SeriesKeys keys) {
        this(file, sha256, charset, delimiter, rowsRead, layout, periodFormat, dateOrder, decimalMark, aggregation, series,
                warnings, Optional.empty(), keys);
    }

    /**
     * Hex SHA-256 of the file's bytes, which a brief's provenance states.
     *
     * @throws IllegalStateException when the file was read without it ({@link SeriesFileReader#withoutDigest}):
     *                               a brief must not state a digest nobody computed
     */
    @Override
    public String sha256() {
        if (sha256.equals(NOT_DIGESTED)) {
            throw new IllegalStateException(file + " was read without its SHA-256");
        }
        return sha256;
    }

    /** True when the file's SHA-256 was computed as it was read. */
    public boolean digested() {
        return !sha256.equals(NOT_DIGESTED);
    }

    /** The delimiter in words: {@code comma}, {@code semicolon}, {@code tab} or {@code bar}. */
    public String delimiterName() {
        return switch (delimiter) {
            case '\t' -> "tab";
            case ';' -> "semicolon";
            case '|' -> "bar";
            case '\0' -> "none";
            default -> "comma";
        };
    }

    /**
     * The series named {@code name}, as {@link #find}.
     *
     * @throws DataProblemException naming the series the file does hold
     */
    public Series require(String name) {
        return find(name).orElseThrow(() -> new DataProblemException(new DataProblem(file, 0, 0,
                "no series named '" + name + "'; expected one of " + names())));
    }

    /** The series names, quoted and listed: {@code 'Total', 'Domestic'}, each with its key when it has one ({@code 'Austria' (M.NR.AT)}). */
    public String names() {
        return String.join(", ", series.stream().map(s -> "'" + s.name() + "'"
                + keys.of(s.name()).map(k -> " (" + k.key() + ")").orElse("")).toList());
    }

    /**
     * The series named {@code name} (exact, then case-insensitive), or, in a file of a statistics
     * portal, whose key is {@code name}: the whole key ({@code M.NR.AT}) or the codes of the
     * dimensions that vary ({@code AT}).
     */
    public Optional<Series> find(String name) {
        return series.stream().filter(s -> s.name().equals(name)).findFirst()
                .or(() -> series.stream().filter(s -> s.name().equalsIgnoreCase(name)).findFirst())
                .or(() -> keys.seriesWithKey(name).flatMap(n -> series.stream().filter(s -> s.name().equals(n)).findFirst()));
    }
}
