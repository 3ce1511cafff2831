package org.annalist.narrative;

import java.util.List;
import org.annalist.series.Frequency;

/**
 * Everything the brief template shows, already formatted: numbers as text in the brief's
 * language, booleans for the template's choices. The template words the findings' main
 * statements; the views carry the short phrases that the narrative's Java words (key figures,
 * ranks, notes, calendar sentences, caveats), so that every word still comes from the narrative.
 */
public record BriefView(Document document, Header header, Lead lead, ThisPeriod thisPeriod, List<KeyFigure> keyFigures,
                        Charts charts,
                        TrendView trend, SeasonView season, CycleView cycle, List<OutlierRow> outliers,
                        List<BreakRow> breaks, List<EpisodeView> episodes, IrregularView irregular,
                        List<Row> recent, OutlookView outlook, List<Fact> facts, List<String> notes, List<MethodRow> methods,
                        List<Fact> thresholds, Provenance provenance) {

    public BriefView {
        keyFigures = List.copyOf(keyFigures);
        outliers = List.copyOf(outliers);
        breaks = List.copyOf(breaks);
        episodes = List.copyOf(episodes);
        recent = List.copyOf(recent);
        facts = List.copyOf(facts);
        notes = List.copyOf(notes);
        methods = List.copyOf(methods);
        thresholds = List.copyOf(thresholds);
    }

    /** @param paper CSS page size, {@code A4} or {@code letter} */
    public record Document(String language, String paper, String author, String keywords) {
    }

    /**
     * @param unitPerPeriod the unit with its period, e.g. {@code nights a month}; empty without a unit
     * @param logo          the logo's URI; empty without one
     * @param measure       the sentence saying how the series is treated ("Each value is a rate, so …")
     * @param percentChanges changes are given in % (else in points or units: the tables' % column is left out)
     */
    public record Header(String title, String organisation, String seriesName, String unit, String periodCovered,
                         String latestPeriod, String generatedAt, Calendar calendar, String unitPerPeriod,
                         String logo, String measure, boolean percentChanges) {
    }

    /** The series' frequency, for the template's words; all false: daily or business-daily. */
    public record Calendar(boolean annual, boolean quarterly, boolean monthly, boolean weekly, boolean halfYearly) {

        static Calendar of(Frequency frequency) {
            return new Calendar(frequency == Frequency.ANNUAL, frequency == Frequency.QUARTERLY,
                    frequency == Frequency.MONTHLY, frequency == Frequency.WEEKLY, frequency == Frequency.HALF_YEARLY);
        }
    }

    /**
     * The latest period against a year earlier; {@code comparable} false when that cannot be said.
     *
     * @param atPeriod  {@code In October 2026} / {@code On Saturday 31 October 2026}
     * @param up        higher than a year earlier ({@code up} and {@code down} both false: about the same)
     * @param changePercent the size of the change without its sign, in % or in the series' units (the claim's)
     * @param provisionalSince where more than the latest value is provisional or estimated, the first
     *                      of them ("September 2026"); else empty
     * @param step          the sentence on a recent structural step when it is the headline, else empty
     * @param trendSentence the trend since the latest break (else over the whole period), with its qualifications
     * @param trendFirst    the trend is the headline and leads the paragraph
     * @param calendarNote  after the change when it is calendar-adjusted: the change as counted; else empty
     * @param difference    the change is a difference (points or units), worded "higher", not "more"
     */
    public record Lead(boolean comparable, String atPeriod, String period, String value, String yearEarlier,
                       String changePercent, boolean up, boolean down, boolean provisional, String provisionalSince,
                       String step,
                       String trendSentence, boolean trendFirst, String calendarNote,
                       boolean difference, String calendarLead) {
    }

    /**
     * The latest period's figures beyond the year-on-year change; empty strings where they cannot be said.
     *
     * @param level       the measure is a level or rate (averaged over spans, changes in its own units)
     * @param rankWord    e.g. {@code the highest October of 16} or {@code the 3rd highest October of 16}
     * @param adjustedChange the level's change on the period before, seasonally adjusted …
     * @param adjustedForCalendar … and adjusted for the calendar effects found as well
     * @param calendar    sentences on the calendar of the period (Easter, weekend nights, leap day)
     */
    public record ThisPeriod(boolean available, boolean level, String ytdFrom, String ytdTo, String ytdChange,
                             String ytdTotal, String rollingChange, String rollingTotal, String rankWord,
                             boolean recordHigh, boolean recordLow, String adjustedChange, boolean adjustedForCalendar,
                             List<String> calendar, boolean flagged) {

        public ThisPeriod {
            calendar = List.copyOf(calendar);
        }
    }

    /** One of the first page's four figures. */
    public record KeyFigure(String label, String value, String note) {
    }

    /** A chart's place and the facts its text alternative states. */
    public record ChartView(String id, boolean drawn) {
    }

    /**
     * @param firstLevel trend-cycle level in the first full year, formatted
     * @param lastLevel  in the last full year
     * @param rose       whether it is higher at the end
     * @param drops      years of steps down of 10 % or more (by the fitted lines at the break)
     * @param leadBeforeChange that the trend-cycle starts to move before a sudden change the chart
     *                   holds, a sentence; empty without one ({@link ChartWords#leadBeforeSuddenChange})
     * @param gapsInLines why the lines break at missing values, a sentence; empty without any
     *                   ({@link ChartWords#gapsInLines})
     * @param overviewMarks what each mark of the overview chart means, its caption after the series'
     *                   name and span ({@link ChartWords#overviewMarks})
     */
    public record Charts(ChartView overview, ChartView profile, ChartView years, ChartView irregular, String firstYear,
                         String lastYear, String firstLevel, String lastLevel, boolean rose, List<String> drops,
                         String smoothingMethod, int smoothingWindow, String leadBeforeChange,
                         String gapsInLines, String overviewMarks) {

        public Charts {
            drops = List.copyOf(drops);
        }
    }

    /**
     * @param rising     the trend is increasing ({@code rising} and {@code falling} both false: no clear trend)
     * @param slopeSize  the slope without its sign, for "by about 2,120 a year"
     * @param sinceBreak the trend within the latest regime, or null
     * @param percentPerYear the slope as % of the average level; empty where changes are not in % (a rate, a temperature)
     * @param slopeUnit  what the slope is counted in, with a leading space: the unit, {@code  percentage points}, {@code  °F}
     * @param slopeTime  what the slope is counted over, after its unit: {@code a year}, or {@code a year in each month's total}
     *                   for a flow's monthly values ({@link MeasureWords#slopeTime})
     * @param yearTotal  the slope as the year's total's change, {@code about 25,400 nights a year in the year's
     *                   total}; empty where the slope is not one period's total ({@link MeasureWords#yearTotal})
     */
    public record TrendView(boolean assessed, boolean rising, boolean falling, String test, String statistic, String pValue,
                            String slopePerYear, String slopeSize, String lower, String upper, String percentPerYear, String basis,
                            String reason, SinceBreak sinceBreak, String seasonalKendall, String slopeUnit, String slopeTime,
                            String yearTotal) {
    }

    /**
     * @param since          the first period of the latest regime, in words
     * @param percentPerYear the regime's rate in % with what it is of ({@code +1.8 % a year}, or {@code +1.7 % a year of the latest year's average level}); empty where changes are not in %
     * @param yearTotal      the regime's slope as the year's total's change ({@link TrendView#yearTotal})
     */
    public record SinceBreak(String since, boolean rising, boolean falling, String slopePerYear, String lower, String upper,
                             String pValue, String percentPerYear, String yearTotal) {
    }

    /**
     * The seasonal pattern; at most one of {@code present}, {@code negligible}, {@code tooShort}
     * and {@code notApplicable} holds (none: the seasons do not differ beyond chance).
     *
     * @param strengthWord {@code strong}, {@code moderate} or {@code weak}
     * @param indexUnit {@code %} for multiplicative, the series unit for additive
     * @param formFromMeasure additive because of the measure (a rate, an interval scale), not because of the swing
     */
    public record SeasonView(boolean present, boolean negligible, boolean tooShort, boolean notApplicable, String period, String strength, String strengthWord, String test,
                             String statistic, String pValue, String peak, String peakIndex, String trough,
                             String troughIndex, String swing, String indexUnit, boolean multiplicative,
                             boolean changed, String formReason, String years, boolean formFromMeasure) {
    }

    public record CycleView(boolean present, String length, boolean regular, List<String> peaks, String spectralPeriod,
                            String pValue, String reason) {

        public CycleView {
            peaks = List.copyOf(peaks);
        }
    }

    /**
     * @param calendar        what the expected value allows for of the calendar, a sentence; empty when nothing worth naming
     * @param calendarAllowed the expected values include significant calendar effects
     * @param withinBreak     the first period of the structural change whose 95 % interval holds this
     *                        period, as written; empty when none does
     */
    public record OutlierRow(String period, String observed, String expected, String deviation, String score,
                             boolean above, String calendar, boolean calendarAllowed, String withinBreak) {
    }

    /**
     * A structural change as fitted: both levels are the two regimes' fitted lines at the break.
     *
     * @param onePeriod     the 95 % interval is the break's period alone ({@code from} is then that period)
     * @param change        size of the step without sign ({@code 23.1 %}, or in units with the unit when
     *                      the values are not all positive); {@code rise} gives its direction
     * @param step          the break is reported as a step in level
     * @param slope         the break is reported as a change of slope, worded in {@code slopeChange}
     * @param slopeChange   the change of slope from the regime before to the one after ({@link RegimeRates#change}):
     *                      {@code from +1.3 % to +1.8 % a year}, or a short regime by its levels and length
     * @param bendWithGap   a change of slope whose two fitted lines still lie a reported step apart
     *                      ({@link SectionViews#bendWithGap}): the words name the gap ({@code change}) too
     * @param drifted       the regime before this break is the previous break's and its line moved from
     *                      {@code previousAfter} to {@code before}
     * @param joined        the two lines join at the break (a bend): one level at the break, which runs on
     * @param latestRate    the rate after the break is the trend section's rate since this break (Sen's slope
     *                      over the latest regime), the one rate the brief gives that regime
     * @param overall       on the last of two or more breaks: the ratio of fitted levels from just before the
     *                      first break ({@code firstBefore}, {@code firstPeriod}) to the end of this one's
     *                      regime ({@code end} in {@code endPeriod}, the latest period: where the level
     *                      stands now, not where it stood at the break), without sign ({@code overallRise}
     *                      its direction); else empty
     */
    public record BreakRow(String period, String from, String to, boolean onePeriod, String before, String after,
                           String change, boolean rise, String statistic, String pValue, boolean provisional,
                           boolean step, boolean slope, String slopeChange, boolean drifted,
                           String previousAfter, String overall, boolean overallRise, String firstBefore,
                           String firstPeriod, String end, String endPeriod, boolean bendWithGap, boolean joined,
                           boolean latestRate) {
    }

    /**
     * A large step and a movement back, in neutral words.
     *
     * @param fell       the step went down and the return up (else up, then down)
     * @param size       size of the step without sign (% or units)
     * @param atOnce     the furthest level was reached at the step ({@code extreme} equals {@code start})
     * @param share      how far back it moved, in words ({@code about a quarter of the way})
     * @param sharePct   the same as a percentage of the step
     * @param latest     the return is measured at the series' latest period
     * @param closedBy   the break that ends the regime the return is measured on, whose level just
     *                   before it {@code returned} is; empty when that regime runs to the latest period
     * @param stepBack   a step the other way soon after the return, in words ({@link BreakViews}); empty when none
     * @param oldPath    the level the old line would have reached by {@code asOf}, against the level
     *                   reached, in words ({@link BreakViews}); empty when the old line was about flat
     */
    public record EpisodeView(String start, boolean fell, String size, boolean atOnce, String extreme,
                              String before, String extremeLevel, String returned, String asOf, boolean latest,
                              String closedBy, String share, String sharePct, String stepBack, String oldPath) {
    }

    /**
     * @param label {@code small}, {@code moderate} or {@code large}; null when not measured
     * @param large the irregular part is large, so single periods are to be read with care
     */
    /** @param leftOut the periods left out around breaks, said after "leaving out"; empty when none */
    public record IrregularView(String label, String share, boolean large, String leftOut) {
    }

    public record Fact(String label, String value) {
    }

    /**
     * The outlook page; {@code present} false when no outlook was made.
     *
     * @param method        the chosen method in words
     * @param hasYear       the horizon covers the whole next calendar year
     * @param total         that year as a total (a flow) rather than an average (a level)
     * @param typicalError  the back-test's median absolute percentage error, e.g. {@code 4.4 %}; empty without a back-test
     * @param backtestSpan  the periods the back-test's origins covered
     */
    /**
     * @param compact     the table is long (more than a year of rows): set it in the compact style
     * @param comparison  the clause setting next year against the current year's estimate, e.g.
     *                    {@code , +1.5 % on the estimate for 2026 (…)}; empty without one
     * @param currentYear the sentence on the current year as observed plus forecast; empty without one
     * @param backtestRange the periods the back-test forecast, e.g. {@code January 2024 to December 2025}
     * @param widened     the intervals were widened to the back-test's errors
     * @param narrowed    the intervals were narrowed to the back-test's errors (the 80 % ones at some
     *                    steps, the 95 % ones by the same factor unless the largest errors asked for more)
     * @param noBacktest  why the forecasts could not be tested, as a sentence; empty with a back-test
     * @param typicalYearError the back-test's typical error of a year's total ({@code 1.9 %}); empty without
     * @param yearSteadier the year's typical error is smaller than a single period's (errors partly cancelled)
     * @param againstTrend why next year's change differs from the trend the first page states
     *                     ({@link OutlookCautions#againstTrend}); empty when it does not differ materially
     * @param againstTrendShort the same with one reason, for the multi-series brief
     */
    public record OutlookView(boolean present, String method, String chosenBecause, String fittedFrom, String horizon,
                              String firstPeriod, String lastPeriod, List<ForecastRow> rows, boolean compact,
                              boolean hasYear, boolean total, String nextYear, String yearMean, String yearLow,
                              String yearHigh, String comparison, String currentYear, String typicalError,
                              String typicalYearError, boolean yearSteadier, String backtestSpan, String backtestRange, boolean widened, boolean narrowed, String noBacktest,
                              List<ScoreRow> backtest, List<String> caveats, String againstTrend,
                              String againstTrendShort) {

        static final OutlookView ABSENT = new OutlookView(false, "", "", "", "", "", "", List.of(), false, false, false,
                "", "", "", "", "", "", "", "", false, "", "", false, false, "", List.of(), List.of(), "", "");

        public OutlookView {
            rows = List.copyOf(rows);
            backtest = List.copyOf(backtest);
            caveats = List.copyOf(caveats);
        }
    }

    /** A row of the forecast table: the mean and its 80 and 95 % intervals as "low to high". */
    public record ForecastRow(String period, String mean, String range80, String range95) {
    }

    /** A back-test row; {@code chosen} for the winner. */
    public record ScoreRow(String method, String mase, String smape, boolean chosen) {
    }

    /** A row of the table of latest periods. */
    /**
     * A row of the latest periods' table.
     *
     * @param dashed        a dash stands for a missing value or change in the value, year-earlier or change column
     * @param percentDashed a dash stands for a change in % that cannot be computed
     */
    public record Row(String period, String value, String yearEarlier, String change, String changePercent,
                      String note, boolean dashed, boolean percentDashed) {
    }

    /** A method of the appendix: what, its source, and the settings actually used. */
    public record MethodRow(String name, String citation, String settings) {
    }

    /**
     * @param cut that the data were cut short of the file's end on request, and how many later values were
     *            left out, a sentence; empty when the series runs to the file's end
     */
    public record Provenance(String file, String sha256, String rowsRead, String reading, String software,
                             String generatedAt, String cut) {
    }
}
