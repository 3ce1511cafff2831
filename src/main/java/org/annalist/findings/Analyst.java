package org.annalist.findings;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.annalist.analysis.decompose.CentredMovingAverage;
import org.annalist.analysis.indicators.YearOnYear;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/** Runs the analysis methods on a series and turns their results into findings. */
public final class Analyst {

    /** For monthly data, a year of months and the month a year before the first: the brief's table. */
    private static final int RECENT_PERIODS = 13;

    public Findings analyse(Series series) {
        return new Findings(SeriesFacts.of(series), smoothing(series), recent(series));
    }

    /** Empty when the series is too short for one full window. */
    private static Smoothing smoothing(Series series) {
        int window = CentredMovingAverage.windowFor(series.frequency());
        int needed = window % 2 == 0 ? window + 1 : window;
        if (series.size() < needed) {
            return null;
        }
        CentredMovingAverage.Result result = CentredMovingAverage.of(series.values(), window);
        return new Smoothing(result.label(), result.window(), result.trendCycle());
    }

    private static List<RecentPeriod> recent(Series series) {
        List<RecentPeriod> recent = new ArrayList<>();
        for (int i = Math.max(0, series.size() - RECENT_PERIODS); i < series.size(); i++) {
            Optional<YearOnYear.Change> change = YearOnYear.at(series, i);
            int earlier = i - YearOnYear.lag(series.frequency());
            Set<String> flags = new LinkedHashSet<>();
            series.flags(i).stream().map(ValueFlag::description).forEach(flags::add);
            if (earlier >= 0) {
                series.flags(earlier).stream().map(f -> f.description() + " (year before)").forEach(flags::add);
            }
            recent.add(new RecentPeriod(series.period(i),
                    series.isMissing(i) ? null : series.value(i),
                    series.period(i).plus(-YearOnYear.lag(series.frequency())),
                    earlier < 0 || series.isMissing(earlier) ? null : series.value(earlier),
                    change.map(YearOnYear.Change::absolute).orElse(null),
                    change.map(YearOnYear.Change::percent).filter(p -> !p.isNaN()).orElse(null),
                    List.copyOf(flags)));
        }
        return recent;
    }
}
