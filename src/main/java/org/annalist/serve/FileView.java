package org.annalist.serve;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.annalist.brief.SeriesCheck;
import org.annalist.findings.SeriesFacts;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.ReadResult;
import org.annalist.narrative.Formats;
import org.annalist.series.Series;

/**
 * What {@code check} reports about a file, as the page shows it: the reading (from the same
 * {@link ReadResult}), each series' block (from the same {@link SeriesCheck}) with a small chart,
 * and every warning with its line or cell. The page's template words it.
 */
public record FileView(String id, String name, int rows, String layout, boolean workbook, String sheetName, int sheetNumber,
                String sheetFormat, String charset, String delimiter, String periodFormat, String dateOrder,
                String decimalMark, String aggregatedTo, String aggregatedBy, String dataset, List<SeriesRow> series,
                List<Problem> warnings) {

    /** Missing or flagged periods listed in full up to this many; beyond, the first ten and a count. */
    private static final int LISTED = 12;

    /**
     * One series as {@code check} reports it.
     *
     * @param index its position in the file: the page's address for it
     * @param more  how many periods the abbreviated list leaves out
     */
    public record SeriesRow(int index, String name, String unit, String key, String frequency, String start, String end,
                     int observations, int missing, List<String> missingPeriods, int moreMissing,
                     List<Flagged> flagged, Sparkline chart) {
    }

    /** The periods carrying one flag of the data's codebook. */
    public record Flagged(String flag, List<String> periods, int more) {
    }

    /**
     * A problem the reader found, where it is: the file's name (not the server's folder), line and
     * column (0 when not known), the sheet of a workbook.
     */
    public record Problem(String file, int line, int column, String cell, String sheet, String message) {
        static Problem of(DataProblem p) {
            return new Problem(Path.of(p.file()).getFileName().toString(), p.line(), p.column(),
                    p.column() > 0 ? DataProblem.columnLetters(p.column()) + p.line() : "",
                    p.sheet() == null ? "" : p.sheet(), p.message());
        }
    }

    static FileView of(OpenFile file) {
        ReadResult read = file.read().read();
        List<SeriesRow> rows = new ArrayList<>();
        List<SeriesCheck> checks = SeriesCheck.of(read);
        for (int i = 0; i < checks.size(); i++) {
            SeriesCheck check = checks.get(i);
            SeriesFacts s = check.series();
            List<Flagged> flagged = new ArrayList<>();
            for (Map.Entry<String, List<String>> e : check.flagged().entrySet()) {
                flagged.add(new Flagged(e.getKey(), abbreviated(e.getValue()), more(e.getValue())));
            }
            Series series = read.series().get(i);
            rows.add(new SeriesRow(i, s.name(), s.unit() == null ? "" : s.unit(), check.key(), s.frequency(), s.start(),
                    s.end(), s.observations(), s.missing(), abbreviated(check.missingPeriods()),
                    more(check.missingPeriods()), flagged, Sparkline.of(series,
                    Formats.forValues(series.values(), Locale.ENGLISH))));
        }
        return new FileView(file.id(), file.name(), read.rowsRead(), read.layout(), read.sheet().isPresent(),
                read.sheet().map(ReadResult.Sheet::name).orElse(""), read.sheet().map(ReadResult.Sheet::number).orElse(0),
                read.sheet().map(ReadResult.Sheet::format).orElse(""), read.charset(),
                read.delimiter() == '\0' ? "" : read.delimiterName(), read.periodFormat(),
                read.dateOrder().map(o -> o.name().toLowerCase(Locale.ROOT).replace('_', '-')).orElse(""),
                read.decimalMark().map(m -> m.name().toLowerCase(Locale.ROOT)).orElse(""),
                read.aggregation().map(a -> a.target().toString()).orElse(""),
                read.aggregation().map(a -> a.method().label()).orElse(""), read.keys().description(), rows,
                read.warnings().stream().map(Problem::of).toList());
    }

    private static List<String> abbreviated(List<String> periods) {
        return periods.size() <= LISTED ? periods : periods.subList(0, 10);
    }

    private static int more(List<String> periods) {
        return periods.size() <= LISTED ? 0 : periods.size() - 10;
    }
}
