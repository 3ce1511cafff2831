package org.annalist.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.annalist.analysis.calendar.Holiday;
import org.annalist.ingest.HolidayFile;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.analysis.calendar.PeriodLength;
import org.annalist.findings.Analyst;
import org.annalist.series.Series;
import picocli.CommandLine.Option;

/** The choices a user can make for the analysis instead of leaving them to the data. */
final class AnalysisOptions {

    enum FormChoice { auto, additive, multiplicative }

    enum MeasureChoice { auto, flow, level }

    @Option(names = "--form", paramLabel = "FORM",
            description = "auto (decide from the data), additive or multiplicative. Default: auto.")
    FormChoice form = FormChoice.auto;

    @Option(names = "--measure", paramLabel = "KIND",
            description = "flow (summed over time: nights, arrivals) or level (averaged: occupancy, prices). "
                    + "Default: auto (level for a unit in % or a name saying rate, occupancy, average, price ...).")
    MeasureChoice measure = MeasureChoice.auto;

    @Option(names = "--holidays", paramLabel = "FILE",
            description = "A file of your own moving holidays (a header, then date,name lines; a holiday of several "
                    + "days has several lines), estimated beside Easter as calendar effects.")
    Path holidays;

    @Option(names = "--per-day", description = "Analyse a monthly or quarterly flow per average-length period "
            + "(total / days x 30.4375 for months), so that months of unequal length compare fairly.")
    boolean perDay;

    @Option(names = "--horizon", paramLabel = "N",
            description = "Periods to forecast in the outlook; 0 leaves the outlook out. "
                    + "Default: the rest of the last observed year plus 12 periods.")
    Integer horizon;

    /** The series as the analysis should see it. */
    Series prepare(Series series) {
        if (!perDay) {
            return series;
        }
        try {
            return PeriodLength.perAveragePeriod(series);
        } catch (IllegalArgumentException e) {
            throw new UserInputException("--per-day: " + e.getMessage());
        }
    }

    Analyst analyst() {
        if (horizon != null && (horizon < 0 || horizon > Analyst.MAX_HORIZON)) {
            throw new UserInputException("--horizon: expected a number of periods from 0 to " + Analyst.MAX_HORIZON
                    + ", got " + horizon);
        }
        return new Analyst(switch (form) {
            case auto -> Optional.empty();
            case additive -> Optional.of(Form.ADDITIVE);
            case multiplicative -> Optional.of(Form.MULTIPLICATIVE);
        }, switch (measure) {
            case auto -> Optional.empty();
            case flow -> Optional.of(Measure.FLOW);
            case level -> Optional.of(Measure.LEVEL);
        }, holidays == null ? List.of() : HolidayFile.read(holidays).stream()
                .map(h -> new Holiday(h.name(), h.days())).toList(), Optional.ofNullable(horizon));
    }
}
