package org.annalist.findings;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import org.annalist.series.Frequency;
import org.annalist.series.Series;

/**
 * The charts a brief shows for these findings, decided once: the charts are drawn from the plan and
 * the narrative places (and describes) them by it, so that no sentence points to a chart that is
 * not there.
 */
public record FigurePlan(Set<Chart> charts) {

    /** The brief's charts; {@link #id()} is how the templates place them. */
    public enum Chart {
        /** The series with its trend-cycle, breaks and outliers: always drawn. */
        OVERVIEW,
        /** The seasonal profile: when a seasonal pattern is claimed. */
        PROFILE,
        /** The years overlaid, month by month: monthly or quarterly data with a seasonal pattern and two years. */
        YEARS,
        /** The irregular component over time: when the series was decomposed. */
        IRREGULAR,
        /** The fan chart of the outlook: when there is one. */
        OUTLOOK,
        /** The small multiples of a multi-series brief. */
        MULTIPLES;

        /** The id a template's {@code data-chart} names it by: {@code overview}, {@code profile}, …. */
        public String id() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    public FigurePlan {
        charts = Set.copyOf(charts);
    }

    public static FigurePlan of(Series series, Findings findings) {
        Set<Chart> charts = EnumSet.of(Chart.OVERVIEW);
        boolean seasonal = findings.seasonality().present();
        boolean subAnnual = series.frequency() == Frequency.MONTHLY || series.frequency() == Frequency.QUARTERLY;
        if (seasonal) {
            charts.add(Chart.PROFILE);
        }
        if (subAnnual && seasonal && series.size() >= 2 * series.frequency().seasonalPeriod()) {
            charts.add(Chart.YEARS);
        }
        if (findings.decomposition().isPresent()) {
            charts.add(Chart.IRREGULAR);
        }
        if (findings.outlook() != null) {
            charts.add(Chart.OUTLOOK);
        }
        return new FigurePlan(charts);
    }

    public boolean shows(Chart chart) {
        return charts.contains(chart);
    }
}
