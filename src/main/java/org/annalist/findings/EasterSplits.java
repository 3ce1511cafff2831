package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.analysis.calendar.CalendarRegressors;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/** Whether a series' years split the days before Easter both ways often enough to tell Easter's effect. */
final class EasterSplits {

    private EasterSplits() {
    }

    /**
     * In which of the data's years the days before Easter fell mostly in March and in which mostly in
     * April (the first and second quarter for quarterly data), counting the years whose two periods
     * both have a value, and whether that lets the data tell Easter's effect: at least
     * {@link DecisionRules#MIN_EASTER_YEARS_EACH_MONTH} years of each. The Easter regressor is the
     * split of those days between the two periods; centred per calendar month, it varies only as far
     * as the split differs between years, and with one year of the other split its estimate rests on
     * that year alone, whatever else happened in it (a p-value computed from it overstates the evidence).
     */
    static CalendarFinding.EasterEvidence of(Series series) {
        int window = CalendarRegressors.DEFAULT_EASTER_WINDOW;
        List<Integer> earlier = new ArrayList<>();
        List<Integer> later = new ArrayList<>();
        for (Period p : earlierPeriods(series, series.period(0))) {
            double share = CalendarRegressors.easterShare(p, window);
            if (share > 0.5) {
                earlier.add(p.year());
            } else if (share < 0.5) {
                later.add(p.year());
            }
        }
        int needed = DecisionRules.MIN_EASTER_YEARS_EACH_MONTH;
        return new CalendarFinding.EasterEvidence(earlier, later, needed,
                earlier.size() >= needed && later.size() >= needed, series.frequency() == Frequency.MONTHLY);
    }

    /**
     * The Marches (first quarters) from {@code from} on whose value and whose April's (second
     * quarter's) are both observed, oldest first: the years in which the series shows where the days
     * before Easter fell, the one set of years that both the evidence above and the outlook's
     * average share ({@link EasterAhead}) count.
     */
    static List<Period> earlierPeriods(Series series, Period from) {
        int march = series.frequency() == Frequency.MONTHLY ? 3 : 1;
        List<Period> periods = new ArrayList<>();
        for (int t = 0; t + 1 < series.size(); t++) {
            Period p = series.period(t);
            if (p.compareTo(from) >= 0 && p.seasonalPosition() == march
                    && !series.isMissing(t) && !series.isMissing(t + 1)) {
                periods.add(p);
            }
        }
        return periods;
    }
}
