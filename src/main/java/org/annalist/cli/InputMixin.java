package org.annalist.cli;

import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.ReadResult;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Frequency;
import java.nio.file.Path;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The data file and the options for reading it, shared by every command that reads one. */
final class InputMixin {

    enum DateOrderChoice { auto, day_first, month_first }

    enum DecimalChoice { auto, point, comma }

    enum AggregateTarget { week, month, quarter, year }

    @Parameters(paramLabel = "FILE", description = "A CSV file (comma, semicolon or tab separated).")
    Path file;

    @Option(names = "--date-order", paramLabel = "ORDER", converter = DashEnum.DateOrderConverter.class,
            description = "How to read dates like 03/04/2024: auto (infer from the data), day-first, month-first. Default: auto.")
    DateOrderChoice dateOrder = DateOrderChoice.auto;

    @Option(names = "--decimal-mark", paramLabel = "MARK",
            description = "Decimal mark of the numbers: auto, point or comma. Default: auto.")
    DecimalChoice decimalMark = DecimalChoice.auto;

    @Option(names = "--aggregate", paramLabel = "CALENDAR",
            description = "Aggregate to week, month, quarter or year before analysis (daily data, or months to quarters).")
    AggregateTarget aggregate;

    @Option(names = "--aggregate-by", paramLabel = "HOW",
            description = "How --aggregate combines values: sum (flows such as nights) or mean (rates, prices). Default: sum.")
    Aggregation.Method aggregateBy = Aggregation.Method.SUM;

    /** Reads the file; data problems surface as {@link org.annalist.ingest.DataProblemException} (exit 2). */
    ReadResult read() {
        return new SeriesFileReader(toReadOptions()).read(file);
    }

    ReadOptions toReadOptions() {
        ReadOptions options = ReadOptions.defaults().withDateOrder(switch (dateOrder) {
            case auto -> DateOrder.AUTO;
            case day_first -> DateOrder.DAY_FIRST;
            case month_first -> DateOrder.MONTH_FIRST;
        });
        if (decimalMark != DecimalChoice.auto) {
            options = options.withDecimalMark(decimalMark == DecimalChoice.point ? DecimalMark.POINT : DecimalMark.COMMA);
        }
        if (aggregate != null) {
            Frequency target = switch (aggregate) {
                case week -> Frequency.WEEKLY;
                case month -> Frequency.MONTHLY;
                case quarter -> Frequency.QUARTERLY;
                case year -> Frequency.ANNUAL;
            };
            options = options.withAggregation(new Aggregation(target, aggregateBy));
        }
        return options;
    }
}
