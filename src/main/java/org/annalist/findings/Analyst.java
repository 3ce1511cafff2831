package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.annalist.analysis.anomaly.RemainderOutliers;
import org.annalist.analysis.calendar.CalendarEffects;
import org.annalist.analysis.calendar.Easter;
import org.annalist.series.Holiday;
import org.annalist.analysis.decompose.CentredMovingAverage;
import org.annalist.analysis.decompose.Irregular;
import org.annalist.analysis.decompose.ModelForm;
import org.annalist.analysis.decompose.Stl;
import org.annalist.analysis.decompose.WorkingScale;
import org.annalist.analysis.indicators.LatestIndicators;
import org.annalist.analysis.indicators.YearOnYear;
import org.annalist.series.Frequency;
import org.annalist.series.Series;

/**
 * Runs the analysis on a series and turns the results into findings. The order is the order of
 * dependence: additive or multiplicative → STL decomposition (on logs when multiplicative) →
 * seasonal pattern → calendar effects on the remainder (robust; the significant ones are taken out
 * of the remainder and the adjusted values) → outlier candidates on that remainder → structural
 * breaks on the seasonally and calendar adjusted values with those screened out → outliers a break
 * does not explain → trend on the
 * seasonally adjusted values (and within the latest regime) → cycle on yearly means → irregular
 * share → smoothing → outlook (on the latest regime when it is long enough).
 */
public final class Analyst {

    /** For monthly data, a year of months and the month a year before the first: the brief's table. */
    private static final int RECENT_PERIODS = 13;

    private final Optional<Form> forcedForm;
    private final Optional<Measure> measure;
    private final List<Holiday> holidays;
    private final Optional<Integer> horizon;

    /** The longest outlook asked for: four years of daily periods, beyond which no interval means anything. */
    public static final int MAX_HORIZON = 1461;

    public Analyst() {
        this(Optional.empty(), Optional.empty(), List.of(), Optional.empty());
    }

    /**
     * @param forcedForm additive or multiplicative as the user set it, instead of deciding from the data
     * @param measure    flow, level, rate or interval as the user declared it, instead of reading it from unit and name
     * @param holidays   the user's moving holidays, estimated beside Easter
     * @param horizon    periods to forecast (0 for no outlook); empty for the rest of the last
     *                   observed year plus {@value OutlookAnalysis#DEFAULT_EXTRA_PERIODS}
     */
    public Analyst(Optional<Form> forcedForm, Optional<Measure> measure,
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
        return analyseWith(series, null);
    }

    /** A ratio series derived from two others, whose spans take the ratio of its parts' sums. */
    public Findings analyse(Series ratio, RatioParts parts) {
        return analyseWith(ratio, parts.forIndicators());
    }

    private Findings analyseWith(Series series, LatestIndicators.Parts parts) {
        List<Caveat> notes = new ArrayList<>();
        double[] x = series.values();
        int period = series.frequency().seasonalPeriod();
        Measure measured = parts != null ? Measure.RATIO : measure.orElse(MeasureKind.infer(series));
        FormChoice form = chooseForm(x, period, measured);
        boolean log = form.multiplicative();
        double[] y = log ? WorkingScale.logs(x) : x;
        Optional<Stl.Result> stl = decompose(y, period, notes);

        SeasonalityFinding seasonality = SeasonalityFindings.of(series, y, stl, form, meanOf(x));
        if (seasonality.verdict() == SeasonVerdict.TOO_SHORT) {
            notes.add(new Caveat.TooShortForSeason());
        }
        boolean seasonal = seasonality.present();
        double[] workingAdjusted = seasonal ? stl.orElseThrow().adjusted() : y;
        double[] adjusted = WorkingScale.toUnits(workingAdjusted, log);
        Optional<Decomposition> decomposition = stl.map(fit -> decomposition(fit, log));

        double[] expected = WorkingScale.expected(y, stl, CentredMovingAverage.windowFor(series.frequency()));
        double[] remainder = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            remainder[t] = y[t] - expected[t];
        }
        // calendar first: Easter, holidays and weekdays estimated robustly on the remainder, and the
        // significant ones taken out before one-offs and breaks are looked for
        CalendarAnalysis.Fit calendar = measured == Measure.INTERVAL ? CalendarAnalysis.none(series, holidays)
                : CalendarAnalysis.fit(series, y, stl, remainder, holidays);
        if (measured != Measure.INTERVAL && CalendarEffects.applies(series.frequency())
                && CalendarAnalysis.beforeGregorian(series)) {
            notes.add(new Caveat.CalendarBeforeGregorian(Easter.FIRST_YEAR));
        }
        double[] expectedWithCalendar = new double[y.length];
        double[] calendarFree = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            expectedWithCalendar[t] = expected[t] + calendar.part(t);
            calendarFree[t] = y[t] - expectedWithCalendar[t];
        }
        double[] scored = RemainderOutliers.scaled(calendarFree, expectedWithCalendar, x, log);
        double spread = OutlierAnalysis.spreadRatio(scored, RemainderOutliers.scaled(remainder, expected, x, log));
        List<RemainderOutliers.Outlier> candidates = OutlierAnalysis.candidates(scored, period, spread);
        notes.addAll(OutlierAnalysis.stretchNotes(series, scored, period, spread));
        List<RemainderOutliers.Outlier> screenedOut = OutlierAnalysis.screened(scored, spread);
        double[] screened = workingAdjusted.clone();
        for (int t = 0; t < y.length; t++) {
            screened[t] -= calendar.part(t);
        }
        double[] withoutOneOff = seasonal ? stl.orElseThrow().trend() : expected;
        for (RemainderOutliers.Outlier o : screenedOut) {
            // the value the period would have had without its one-off deviation
            screened[o.index()] = withoutOneOff[o.index()];
        }
        BreakAnalysis.Result breaks = BreakAnalysis.of(series, screened, log, notes);
        List<OutlierFinding> outliers = OutlierAnalysis.of(series, candidates, expectedWithCalendar, log, breaks.breaks(),
                calendar);
        breaks.breaks().stream().filter(BreakFinding::provisional)
                .forEach(b -> notes.add(new Caveat.ProvisionalBreak(series.period(b.index()))));

        TrendFinding trend = TrendAnalysis.of(series, adjusted, seasonal, x, breaks.regimeStart(), measured, log,
                notes);
        LatestIndicators.Measure kind = measured.forIndicators();
        // the change on the period before is a change of level: the season and the calendar both taken out
        boolean calendarAtTheEnd = y.length > 1 && (calendar.part(y.length - 1) != 0 || calendar.part(y.length - 2) != 0);
        LatestIndicators.Result latest = series.isMissing(series.size() - 1) ? null
                : LatestIndicators.at(series, series.size() - 1, kind,
                (calendarAtTheEnd ? stl.map(fit -> seasonAndCalendarFree(y, period, calendar, log))
                        : decomposition.map(Decomposition::adjusted)).orElse(null), parts);
        CycleFinding cycle = CycleAnalysis.of(series, workingAdjusted);
        IrregularFinding irregular = irregular(y, remainder, breaks.breaks(), stl, series.frequency());
        CalendarFinding calendarFinding = CalendarAnalysis.of(series, calendar, log, latest, holidays, measured);
        OutlookFinding outlook = OutlookAnalysis.of(series, decomposition, breaks.regimeStart(), breaks.episodes(), measured,
                horizon, calendarFinding, log);
        // the latest regime has one rate, the trend's: its break's slope after and the episodes read at it
        BreakAnalysis.Rated rated = BreakAnalysis.withLatestRate(breaks, trend.latestRegime(), log,
                series.frequency().periodsPerYear());
        return new Findings(SeriesFacts.of(series, measured), log ? Transform.LOG : Transform.NONE, trend,
                seasonality, cycle, outliers, rated.breaks(), irregular, smoothing(series),
                IndicatorsFindings.of(latest, measured, series, calendarAtTheEnd),
                calendarFinding, outlook, recent(series, measured), notes, form, decomposition, rated.episodes(),
                breaks.method());
    }

    private FormChoice chooseForm(double[] x, int period, Measure measured) {
        if (measured == Measure.INTERVAL) {
            // a ratio of two values on a scale with an arbitrary zero means nothing, so logs do neither
            return FormChoice.additiveFor(FormChoice.Reason.INTERVAL_SCALE, ModelForm.measure(x, period));
        }
        if (measured == Measure.RATE) {
            // a rate's seasonal pattern and changes are stated in points; a pattern in % of a % would not be
            return FormChoice.additiveFor(FormChoice.Reason.RATE_IN_POINTS, ModelForm.measure(x, period));
        }
        if (forcedForm.isPresent()) {
            if (forcedForm.get() == Form.MULTIPLICATIVE) {
                for (double v : x) {
                    if (v <= 0) {
                        return FormChoice.of(ModelForm.measure(x, period));   // zeros or negatives force additive, said so
                    }
                }
            }
            return FormChoice.forced(forcedForm.get());
        }
        return FormChoice.of(ModelForm.measure(x, period));
    }

    /** Robust STL with a seasonal window of 13 when the series can be decomposed. */
    private static Optional<Stl.Result> decompose(double[] y, int period, List<Caveat> notes) {
        if (period < 2) {
            return Optional.empty();
        }
        Stl stl = decomposer(period);
        Optional<Stl.Obstacle> obstacle = stl.obstacle(y);
        if (obstacle.isPresent()) {
            if (obstacle.get() == Stl.Obstacle.SPARSE_POSITION) {
                notes.add(new Caveat.NotDecomposed());
            }
            return Optional.empty();
        }
        return Optional.of(stl.fit(y));
    }

    private static Stl decomposer(int period) {
        return Stl.withPeriod(period).with(Stl.Robustness.ON);
    }

    /**
     * The values with the season and the kept calendar effects taken out, in the series' units: the
     * calendar effects first, then the season by a second decomposition of what is left (calendar
     * effects come out before seasonal adjustment: common practice in official statistics, no
     * source). Subtracting them from the first decomposition's adjusted values would not do: its
     * local seasonal component has already taken in part of a moving holiday, unevenly from year to
     * year (an April Easter after a March one left half of it in a planted series).
     */
    private static double[] seasonAndCalendarFree(double[] y, int period, CalendarAnalysis.Fit calendar, boolean log) {
        double[] calendarFree = new double[y.length];
        for (int t = 0; t < y.length; t++) {
            calendarFree[t] = y[t] - calendar.part(t);
        }
        return WorkingScale.toUnits(decomposer(period).fit(calendarFree).adjusted(), log);
    }

    private static Decomposition decomposition(Stl.Result stl, boolean log) {
        Stl.Parameters p = stl.parameters();
        return new Decomposition(new Decomposition.Method(p.seasonalWindow(), p.trendWindow(), p.inner(), p.outer(), log),
                WorkingScale.toUnits(stl.trend(), log), WorkingScale.toUnits(stl.seasonal(), log),
                WorkingScale.toUnits(stl.remainder(), log), WorkingScale.toUnits(stl.adjusted(), log), log);
    }

    /** The irregular share, leaving out the periods where the trend is still following a break ({@link Irregular}). */
    private static IrregularFinding irregular(double[] y, double[] remainder, List<BreakFinding> breaks,
            Optional<Stl.Result> stl, Frequency frequency) {
        int movingAverage = CentredMovingAverage.windowFor(frequency);
        int span = stl.map(fit -> fit.parameters().trendWindow())
                .orElse(movingAverage % 2 == 0 ? movingAverage + 1 : movingAverage);
        int[] starts = breaks.stream().mapToInt(BreakFinding::index).toArray();
        return Irregular.of(y, remainder, starts, span)
                .map(r -> IrregularFinding.of(r.share(), r.leftOut(), r.reach()))
                .orElseGet(IrregularFinding::notMeasured);
    }

    private static Smoothing smoothing(Series series) {
        int window = CentredMovingAverage.windowFor(series.frequency());
        int needed = window % 2 == 0 ? window + 1 : window;
        if (series.size() < needed) {
            return null;
        }
        CentredMovingAverage.Result result = CentredMovingAverage.of(series.values(), window);
        return new Smoothing(new Smoothing.CentredAverage(result.window()), result.window(), result.trendCycle());
    }

    /** The table's rows; the % change only where the measure has one ({@link Measure#relativeChanges()}). */
    private static List<RecentPeriod> recent(Series series, Measure measured) {
        List<RecentPeriod> recent = new ArrayList<>();
        int lag = YearOnYear.lag(series.frequency());
        for (int i = Math.max(0, series.size() - RECENT_PERIODS); i < series.size(); i++) {
            Optional<YearOnYear.Change> change = YearOnYear.at(series, i);
            int earlier = i - lag;
            recent.add(new RecentPeriod(series.period(i),
                    series.isMissing(i) ? null : series.value(i),
                    series.period(i).plus(-lag),
                    earlier < 0 || series.isMissing(earlier) ? null : series.value(earlier),
                    change.map(YearOnYear.Change::absolute).orElse(null),
                    change.map(YearOnYear.Change::percent).filter(p -> !p.isNaN() && measured.relativeChanges())
                            .orElse(null),
                    series.flags(i), earlier < 0 ? Set.of() : series.flags(earlier)));
        }
        return recent;
    }

    /**
     * The mean of the last year's observed values (the last {@code periodsPerYear} periods): the
     * level a reader has in mind for the latest regime's rate, the base of that rate in % for a
     * series worked in units ({@link TrendFinding.LatestRegime#changePctPerYear()}) and of the
     * outlook's comparison with a trend. NaN when none of them is observed.
     */
    public static double latestYearMean(Series series) {
        int n = (int) Math.round(series.frequency().periodsPerYear());
        double[] values = series.values();
        return meanOf(java.util.Arrays.copyOfRange(values, Math.max(0, values.length - n), values.length));
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
