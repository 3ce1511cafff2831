package org.annalist.cli;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.brief.AnalysisChoices;
import org.annalist.findings.Analyst;
import picocli.CommandLine.Option;

/** The choices a user can make for the analysis instead of leaving them to the data. */
final class AnalysisOptions {

    @Option(names = "--form", paramLabel = "FORM", converter = Converters.Form.class,
            description = "auto (decide from the data), additive or multiplicative. Default: auto.")
    Optional<Form> form = Optional.empty();

    @Option(names = "--measure", paramLabel = "KIND", converter = Converters.Measure.class,
            description = "auto, flow (summed over time: nights, arrivals, revenue; changes in %%), level (averaged: "
                    + "capacity, prices, an index; changes in %%), rate (averaged: occupancy, a share in %%; changes in "
                    + "percentage points) or interval (averaged, zero arbitrary: a temperature; changes in its units, "
                    + "no %% and no totals). Default: auto (from the unit and the words of the name).")
    Optional<Measure> measure = Optional.empty();

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

    /** The choices as the pipeline takes them; a horizon out of range is refused here, before any work. */
    AnalysisChoices choices() {
        if (horizon != null && (horizon < 0 || horizon > Analyst.MAX_HORIZON)) {
            throw new UserInputException("--horizon: expected a number of periods from 0 to " + Analyst.MAX_HORIZON
                    + ", got " + horizon);
        }
        return new AnalysisChoices(form, measure, Map.of(), Optional.ofNullable(holidays), Optional.ofNullable(horizon),
                perDay);
    }
}
