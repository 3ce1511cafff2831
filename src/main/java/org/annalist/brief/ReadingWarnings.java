package org.annalist.brief;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.annalist.findings.Findings;
import org.annalist.findings.Measure;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.ReadResult;
import org.annalist.series.Holiday;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * What a user should know about the input of an analysis that did not stop it: the reader's
 * warnings, values a count cannot have, holiday dates the data cannot use. Printed by {@code analyze}
 * and {@code brief} on standard error and listed in the brief's data appendix.
 */
public final class ReadingWarnings {

    /** Periods named in one warning before the rest are counted. */
    private static final int NAMED = 8;

    private ReadingWarnings() {
    }

    /** The reader's warnings about the file, as {@code FILE:LINE: message}. */
    public static List<String> ofFile(ReadResult read) {
        return read.warnings().stream().map(DataProblem::toString).toList();
    }

    /**
     * Warnings about the series as analysed: negative values of a count, and holiday dates outside
     * the span of the series.
     */
    public static List<String> ofSeries(Series series, Findings findings, Optional<Path> holidayFile,
                                        List<Holiday> holidays) {
        List<String> warnings = new ArrayList<>();
        negativeCount(series, findings.series().measure()).ifPresent(warnings::add);
        holidayFile.flatMap(file -> holidaysOutside(file, holidays, series)).ifPresent(warnings::add);
        return warnings;
    }

    /** A count (a flow: nights, arrivals) below zero is a typing or export mistake more often than a fact. */
    static Optional<String> negativeCount(Series series, Measure measure) {
        if (measure != Measure.FLOW) {
            return Optional.empty();
        }
        List<String> periods = new ArrayList<>();
        int count = 0;
        for (int i = 0; i < series.size(); i++) {
            if (series.value(i) < 0) {
                if (periods.size() < NAMED) {
                    periods.add(series.period(i).label());
                }
                count++;
            }
        }
        if (count == 0) {
            return Optional.empty();
        }
        return Optional.of("series '" + series.name() + "' is read as a count (a flow such as nights or arrivals) but has "
                + (count == 1 ? "a negative value in " : count + " negative values, in ") + listed(periods, count)
                + "; check the data, or declare the measure (--measure level) if values below zero are meant");
    }

    /** Holiday dates before the first or after the last period of the series cannot enter the estimate of their effect. */
    static Optional<String> holidaysOutside(Path file, List<Holiday> holidays, Series series) {
        LocalDate first = series.start().startDate();
        LocalDate last = series.end().endDate();
        List<String> outside = new ArrayList<>();
        int count = 0;
        for (Holiday holiday : holidays) {
            for (LocalDate day : holiday.days().stream().sorted().toList()) {
                if (day.isBefore(first) || day.isAfter(last)) {
                    if (outside.size() < NAMED) {
                        outside.add(day + " (" + holiday.name() + ")");
                    }
                    count++;
                }
            }
        }
        if (count == 0) {
            return Optional.empty();
        }
        return Optional.of(file + ": " + (count == 1 ? "a holiday date falls" : count + " holiday dates fall")
                + " outside the span of series '" + series.name() + "' (" + label(series.start()) + " to "
                + label(series.end()) + ") and do not enter the estimate of the holiday's effect: " + listed(outside, count));
    }

    private static String label(Period period) {
        return period.label();
    }

    private static String listed(List<String> named, int count) {
        String list = String.join(", ", named);
        return count > named.size() ? list + " and " + (count - named.size()) + " more" : list;
    }
}
