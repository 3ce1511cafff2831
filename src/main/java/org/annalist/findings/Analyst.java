package org.annalist.findings;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.annalist.analysis.DecisionRules;
import org.annalist.analysis.anomaly.RemainderOutliers;
import org.annalist.analysis.calendar.Holiday;
import org.annalist.analysis.decompose.CentredMovingAverage;
import org.annalist.analysis.decompose.Irregular;
import org.annalist.analysis.decompose.ModelForm;
import org.annalist.analysis.decompose.Stl;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.analysis.indicators.YearOnYear;
import org.annalist.analysis.season.SeasonalPattern;
import org.annalist.series.Frequency;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * Runs the analysis on a series and turns the results into findings. The order is the order of
 * dependence: additive or multiplicative → STL decomposition (on logs when multiplicative) →
 * seasonal pattern → outlier candidates on the remainder → structural breaks on the seasonally
 * adjusted values with those screened out → outliers a break does not explain → trend on the
 * seasonally adjusted values (and within the latest regime) → cycle on yearly means → irregular
 * share → smoothing → outlook (on the latest regime when it is long enough).
 */
public final class Analyst {

    /** For monthly data, a year of months and the month a year before the first: the brief's table. */
    private static final int RECENT_PERIODS = 13;

    private final Optional<ModelForm.Form> forcedForm;
    private final Optional<LatestIndicators.Measure> measure;
    private final List<Holiday> holidays;
    private final Optional<Integer> horizon;

    /** The longest outlook asked for: four years of daily periods, beyond which no interval means anything. */
    public static final int MAX_HORIZON = 1461;

    public Analyst() {
        this(Optional.empty(), Optional.empty(), List.of(), Optional.empty());
    }

    /**
     * @param forcedForm additive or multiplicative as the user set it, instead of deciding from the data
     * @param measure    flow or level as the user declared it, instead of reading it from unit and name
     * @param holidays   the user's moving holidays, estimated beside Easter
     * @param horizon    periods to forecast (0 for no outlook); empty for the rest of the last
     *                   observed year plus {@value OutlookAnalysis#DEFAULT_EXTRA_PERIODS}
     */
    public Analyst(Optional<ModelForm.Form> forcedForm, Optional<LatestIndicators.Measure> measure,
                   List<Holiday> holidays, Optional<Integer> horizon) {
        this.forcedForm = forcedForm;
        this.measure = measure;
        this.holidays = List.copyOf(holidays);
        this.horizon = horizon;
    }

    /** The same analysis without the outlook, the costliest part (for bulk analysis and benchmarks). */
    public Analyst withoutOutlook() {
        return new Analyst(forcedForm, measure, holidays, Optional.of(0));
    }

    public Findings analyse(Series series) {
        return analyse(series, null);
    }

    /** A derived ratio series, whose spans take the ratio of its parts' sums. */
    public Findings analyse(DerivedSeries.Derived derived) {
        return analyse(derived.series(), derived.parts());
    }

    private Findings analyse(Series series, LatestIndicators.Parts parts) {
        List<String> notes = new ArrayList<>();
        double[] x = series.values();
        int period = series.frequency().seasonalPeriod();
        ModelForm.Choice form = chooseForm(x, period);
        boolean log = form.multiplicative();
        double[] y = log ? logOf(x) : x;
        Stl.Result stl = decompose(y, period, notes);

        SeasonalPattern.Result season = null;
        if (period > 1) {
            season = stl == null ? SeasonalPattern.tooShort(period)
                    : SeasonalPattern.assess(y, series.start(), stl, log, meanOf(x));
            if (season.verdict() == SeasonalPattern.Verdict.TOO_SHORT) {
                notes.add("No seasonal statement: the series is shorter than " + DecisionRules.MIN_YEARS_FOR_SEASON
                        + " full years.");
            }
        }
        boolean seasonal = season != null && season.present();
        double[] workingAdjusted = seasonal ? stl.adjusted() : y;
        double[] adjusted = fromWorking(workingAdjusted, log);
        Decomposition decomposition = decomposition(stl, log);

        double[] expected = expectedWorking(y, stl, series.frequency());
        double[] remainder = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            remainder[t] = y[t] - expected[t];
        }
        double[] scored = relativeWhereCounts(remainder, expected, x, log);
        List<RemainderOutliers.Outlier> candidates = OutlierAnalysis.candidates(scored, period);
        notes.addAll(OutlierAnalysis.stretchNotes(series, scored, period));
        double[] screened = workingAdjusted.clone();
        for (RemainderOutliers.Outlier o : OutlierAnalysis.screened(scored)) {
            // the value the period would have had without its one-off deviation
            screened[o.index()] = seasonal ? stl.trend()[o.index()] : expected[o.index()];
        }
        BreakAnalysis.Result breaks = BreakAnalysis.of(series, screened, log, notes);
        List<OutlierFinding> outliers = OutlierAnalysis.of(series, candidates, expected, log, breaks.breaks());
        breaks.breaks().stream().filter(BreakFinding::provisional).forEach(b -> notes.add("The break in " + b.period()
                + " is provisional: the new regime is still short and the break may not hold."));

        TrendFinding trend = TrendAnalysis.of(series, adjusted, seasonal, x, breaks.regimeStart(), notes);
        LatestIndicators.Measure kind = parts != null ? LatestIndicators.Measure.RATIO
                : measure.orElse(MeasureKind.infer(series));
        LatestIndicators.Result latest = series.isMissing(series.size() - 1) ? null
                : LatestIndicators.at(series, series.size() - 1, kind, decomposition.adjusted(), parts);
        double[] calendarIrregular = null;
        if (stl != null) {
            calendarIrregular = stl.remainder().clone();
            for (RemainderOutliers.Outlier o : OutlierAnalysis.screened(scored)) {
                calendarIrregular[o.index()] = Double.NaN;   // one-offs would pull the calendar estimates
            }
        }
        CycleFinding cycle = CycleAnalysis.of(series, workingAdjusted);
        IrregularFinding irregular = irregular(y, remainder);
        OutlookFinding outlook = OutlookAnalysis.of(series, decomposition, breaks.regimeStart(), kind, horizon);
        return new Findings(SeriesFacts.of(series), log ? "log" : "none", trend,
                SeasonalityFindings.of(season, form), cycle, outliers, breaks.breaks(), irregular, smoothing(series),
                IndicatorsFindings.of(latest), CalendarAnalysis.of(series, calendarIrregular, log, latest, holidays), outlook,
                recent(series), notes, formChoice(form), decomposition, breaks.episodes(), breaks.method());
    }

    /**
     * The remainder as outliers are scored on: on logs it already is relative; for an additive
     * series of counts (no negative values, a positive expected level) it is taken relative to the
     * expected value, so that the busy season's larger swings are not read as outliers.
     */
    private static double[] relativeWhereCounts(double[] remainder, double[] expected, double[] x, boolean log) {
        if (log) {
            return remainder;
        }
        for (int t = 0; t < x.length; t++) {
            if ((!Double.isNaN(x[t]) && x[t] < 0) || (!Double.isNaN(expected[t]) && expected[t] <= 0)) {
                return remainder;
            }
        }
        double[] relative = new double[remainder.length];
        for (int t = 0; t < remainder.length; t++) {
            relative[t] = remainder[t] / expected[t];
        }
        return relative;
    }

    /**
     * What trend-cycle and season predict on the working scale: STL's trend plus seasonal, or for a
     * series without a decomposition its centred moving average (NaN where it has no window).
     */
    private static double[] expectedWorking(double[] y, Stl.Result stl, Frequency frequency) {
        double[] expected = new double[y.length];
        if (stl != null) {
            for (int t = 0; t < y.length; t++) {
                expected[t] = stl.trend()[t] + stl.seasonal()[t];
            }
            return expected;
        }
        int window = CentredMovingAverage.windowFor(frequency);
        if (y.length < window + 1) {
            java.util.Arrays.fill(expected, Double.NaN);
            return expected;
        }
        return CentredMovingAverage.of(y, window).trendCycle();
    }

    private ModelForm.Choice chooseForm(double[] x, int period) {
        if (forcedForm.isPresent()) {
            if (forcedForm.get() == ModelForm.Form.MULTIPLICATIVE) {
                for (double v : x) {
                    if (v <= 0) {
                        return ModelForm.choose(x, period);   // zeros or negatives force additive, said so
                    }
                }
            }
            return ModelForm.forced(forcedForm.get());
        }
        return ModelForm.choose(x, period);
    }

    /** Robust STL with a seasonal window of 13 when the series is long enough; null otherwise. */
    private static Stl.Result decompose(double[] y, int period, List<String> notes) {
        if (period < 2 || y.length <= 2 * period) {
            return null;
        }
        for (int j = 0; j < period; j++) {
            int observed = 0;
            for (int t = j; t < y.length; t += period) {
                observed += Double.isNaN(y[t]) ? 0 : 1;
            }
            if (observed < 2) {
                notes.add("No decomposition: some season positions have fewer than two observed values.");
                return null;
            }
        }
        return Stl.withPeriod(period).with(Stl.Robustness.ON).fit(y);
    }

    private static Decomposition decomposition(Stl.Result stl, boolean log) {
        if (stl == null) {
            return new Decomposition(null, null, null, null, null, log);
        }
        Stl.Parameters p = stl.parameters();
        String method = String.format(Locale.ROOT, "STL%s, seasonal window %d, trend window %d, robust (%d inner, %d outer)",
                log ? " on logarithms" : "", p.seasonalWindow(), p.trendWindow(), p.inner(), p.outer());
        return new Decomposition(method, fromWorking(stl.trend(), log), fromWorking(stl.seasonal(), log),
                fromWorking(stl.remainder(), log), fromWorking(stl.adjusted(), log), log);
    }

    private static IrregularFinding irregular(double[] y, double[] remainder) {
        try {
            Irregular.Result r = Irregular.of(y, remainder);
            return new IrregularFinding(r.share(), r.size().name().toLowerCase(Locale.ROOT));
        } catch (IllegalArgumentException tooFew) {
            return new IrregularFinding(null, null);
        }
    }

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

    private static Findings.FormChoice formChoice(ModelForm.Choice c) {
        String reason = switch (c.reason()) {
            case SWING_GROWS_WITH_LEVEL -> "the seasonal swing grows with the level";
            case SWING_INDEPENDENT_OF_LEVEL -> "the seasonal swing does not grow with the level";
            case LEVEL_TOO_STABLE -> "the level varies too little to tell; the simpler additive form is kept";
            case NOT_ALL_POSITIVE -> "the series has zero or negative values, which rule out logarithms";
            case TOO_SHORT -> "too few complete years to tell; the simpler additive form is kept";
            case NOT_SEASONAL -> "annual data have no seasonal swing to judge";
            case FORCED -> "set by the user";
        };
        return new Findings.FormChoice(c.multiplicative() ? "multiplicative" : "additive", reason,
                Numbers.orNull(c.elasticity()), Numbers.orNull(c.levelRatio()), c.cycles());
    }

    static double[] logOf(double[] x) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = Math.log(x[i]);
        }
        return y;
    }

    static double[] fromWorking(double[] y, boolean log) {
        if (!log) {
            return y.clone();
        }
        double[] x = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            x[i] = Math.exp(y[i]);
        }
        return x;
    }

    static double meanOf(double[] x) {
        double sum = 0;
        int n = 0;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                sum += v;
                n++;
            }
        }
        return sum / n;
    }
}
