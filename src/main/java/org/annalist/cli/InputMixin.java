package org.annalist.cli;

import java.nio.file.Path;
import java.util.Optional;
import org.annalist.brief.Job;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.DateOrder;
import org.annalist.ingest.DecimalMark;
import org.annalist.ingest.InputFiles;
import org.annalist.ingest.ReadOptions;
import org.annalist.series.Frequency;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** The data file and the options for reading it, shared by every command that reads one. */
final class InputMixin {

    /** A Java array holds at most 2 GB, and so does the reader. */
    static final long MAX_LIMIT_MEGABYTES = 2047;

    @Parameters(paramLabel = "FILE", description = "A CSV file (comma, semicolon or tab separated), or an .xlsx, .xlsm or .ods workbook.")
    Path file;

    @Option(names = "--sheet", paramLabel = "NAME|NUMBER",
            description = "The sheet of a workbook to read, by name or number (1 is the first). Default: the one sheet that holds a time series.")
    Optional<String> sheet = Optional.empty();

    @Option(names = "--date-order", paramLabel = "ORDER", converter = Converters.Order.class,
            description = "How to read dates like 03/04/2024: auto (infer from the data), day-first, month-first. Default: auto.")
    DateOrder dateOrder = DateOrder.AUTO;

    @Option(names = "--decimal-mark", paramLabel = "MARK", converter = Converters.Mark.class,
            description = "Decimal mark of the numbers: auto, point or comma. Default: auto.")
    Optional<DecimalMark> decimalMark = Optional.empty();

    @Option(names = "--aggregate", paramLabel = "CALENDAR", converter = Converters.Aggregate.class,
            description = "Aggregate to week, month, quarter or year before analysis (daily data, or months to quarters).")
    Optional<Frequency> aggregate = Optional.empty();

    @Option(names = "--aggregate-by", paramLabel = "HOW",
            description = "How --aggregate combines values: sum (flows such as nights) or mean (rates, prices). Default: sum.")
    Aggregation.Method aggregateBy = Aggregation.Method.SUM;

    @Option(names = "--max-input-mb", paramLabel = "MB",
            description = "Refuse data files larger than this many megabytes. Default: 512.")
    Long maxInputMegabytes;

    /** The file and its reading options, as the pipeline takes them. */
    Job.Input input() {
        return new Job.Input(file, readOptions());
    }

    ReadOptions readOptions() {
        ReadOptions options = ReadOptions.defaults().withDateOrder(dateOrder);
        if (decimalMark.isPresent()) {
            options = options.withDecimalMark(decimalMark.get());
        }
        if (sheet.isPresent()) {
            options = options.withSheet(sheet.get());
        }
        if (aggregate.isPresent()) {
            options = options.withAggregation(new Aggregation(aggregate.get(), aggregateBy));
        }
        if (maxInputMegabytes != null) {
            if (maxInputMegabytes < 1 || maxInputMegabytes > MAX_LIMIT_MEGABYTES) {
                throw new UserInputException("--max-input-mb " + maxInputMegabytes + ": expected a whole number of "
                        + "megabytes from 1 to " + MAX_LIMIT_MEGABYTES);
            }
            options = options.withMaxInputBytes(InputFiles.megabytesToBytes(maxInputMegabytes));
        }
        return options;
    }
}
