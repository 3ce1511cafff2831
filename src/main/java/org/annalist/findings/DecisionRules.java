package org.annalist.findings;

import org.annalist.analysis.anomaly.RemainderOutliers;

/**
 * Every threshold at which the analysis turns a number into a statement, in one place, each with
 * where it comes from. A brief's methods appendix quotes them.
 */
public final class DecisionRules {

    private DecisionRules() {
    }

    /** Significance level of every test behind a claim (common practice). */
    public static final double ALPHA = 0.05;

    // ---- trend ------------------------------------------------------------------------------

    /**
     * Fewer values than this support no trend statement (our rule; Gilbert 1987 asks for more than
     * 10 for the normal approximation of the Mann–Kendall statistic).
     */
    public static final int MIN_VALUES_FOR_TREND = 10;

    /**
     * The trend within the latest regime is stated when the regime holds at least this many
     * seasonal cycles (and {@link #MIN_VALUES_FOR_TREND} values) (our rule).
     */
    public static final int MIN_REGIME_CYCLES_FOR_TREND = 2;

    /**
     * A regime's fitted slope is given as a rate a year only when the regime lasts at least this many
     * years; a shorter one is told by its fitted levels at its two ends and its length (our rule: a
     * rate a year read off a shorter span, such as a 21-month recovery, states a pace the series
     * never kept for a year and reads as growth; the same two years that {@link
     * #MIN_REGIME_CYCLES_FOR_TREND} asks before the trend of a monthly series' latest regime is stated).
     */
    public static final int MIN_REGIME_YEARS_FOR_RATE = 2;

    // ---- measure kinds ------------------------------------------------------------------------

    /**
     * A series whose name says rate, share or occupancy and that has no unit is taken for a rate
     * only when no value exceeds this: a share of a whole in per cent cannot exceed 100 (by
     * definition); a larger "rate" is one per 1,000 or per 100,000, averaged as a level.
     */
    public static final double RATE_MAX_VALUE = 100;

    // ---- additive or multiplicative ----------------------------------------------------------

    /**
     * Work in logs when the seasonal swing grows at least half as fast as the level: the elasticity
     * b of {@code log(swing) = a + b·log(level)} over complete years is ≥ 0.5 (b = 0 is additive,
     * b = 1 multiplicative, Hyndman &amp; Athanasopoulos 2021, §3.2; the midpoint is our rule).
     */
    public static final double MULTIPLICATIVE_ELASTICITY = 0.5;
    /** ... and the yearly level varies enough for the elasticity to mean something: max/min ≥ 1.2 (our rule). */
    public static final double MIN_LEVEL_RATIO_FOR_FORM = 1.2;

    // ---- seasonal pattern -------------------------------------------------------------------

    /**
     * No seasonal claim from fewer than three full years: "series under three years long cannot be
     * seasonally adjusted accurately" (the ESS guidelines on seasonal adjustment as the UN Statistics
     * Division's compilation guide, ch. 29, "Specific issues", states them).
     */
    public static final int MIN_YEARS_FOR_SEASON = 3;
    /**
     * A seasonal pattern is claimed only when its strength F_S (Wang, Smith &amp; Hyndman 2006) is at
     * least 0.3: below, the remainder varies more than twice as much as the pattern (our rule; F_S
     * has no published significance threshold).
     */
    public static final double MIN_SEASONAL_STRENGTH = 0.3;
    /** ... and its swing (peak minus trough) is at least 1 % of the level (our rule: below, it is negligible). */
    public static final double MIN_SEASONAL_SWING_PCT = 1.0;
    /** Strength bands for the words: ≥ 0.6 strong (the gate of Hyndman 2021), ≥ 0.3 moderate, else weak. */
    public static final double STRONG_SEASONAL_STRENGTH = 0.6;
    /**
     * The pattern "changed" when a position's index moved by more than a quarter of the overall
     * swing between the first and the last three years, or the peak moved (our rule).
     */
    public static final double PATTERN_CHANGE_SHARE_OF_SWING = 0.25;

    /**
     * The peak "moved" only when the early peak's season is now below the new peak by more than a
     * tenth of the swing (our rule: two seasons closer than that print alike or nearly so, and which
     * of them is a hair higher flips with a year's noise).
     */
    public static final double PEAK_MOVE_SHARE_OF_SWING = 0.10;

    // ---- cycles -----------------------------------------------------------------------------

    /** A cycle is longer than two years (FPP3 §2.3: cycles last "at least 2 years"). */
    public static final double MIN_CYCLE_YEARS = 2.0;
    /** At least two complete cycles in the data (our rule of thumb; no published source). */
    public static final double MIN_CYCLES_IN_DATA = 2.0;
    /** Annual values needed to look for a cycle at all (our rule). */
    public static final int MIN_YEARS_FOR_CYCLE = 12;
    /**
     * Peaks are regular when the gaps between them vary little: coefficient of variation ≤ 0.25
     * (our rule, set so that gaps of 5, 4, 5 years are regular and 4, 10, 2 are not).
     */
    public static final double MAX_REGULAR_GAP_CV = 0.25;

    /** A cycle is claimed only when at least this many peaks confirm the periodogram's period (our rule: two gaps). */
    public static final int MIN_CYCLE_PEAKS = 3;

    // ---- irregular fluctuation --------------------------------------------------------------

    /** Share of the variation around the long-run trend that is irregular: below 0.2 small (our rule). */
    public static final double SMALL_IRREGULAR_SHARE = 0.2;
    /** ... up to 0.5 moderate, above large (our rule). */
    public static final double LARGE_IRREGULAR_SHARE = 0.5;

    // ---- structural breaks ------------------------------------------------------------------

    /**
     * Minimum regime for annual data, in years (our rule; the literature's 15 % trimming would
     * forbid breaks in the last 15 % of the data, where a board most needs to know of one). For
     * sub-annual data the minimum regime is one seasonal period.
     */
    public static final int MIN_REGIME_YEARS_ANNUAL = 8;
    /**
     * Bai–Perron's dynamic programme costs O(n²) per break; above this many periods PELT (linear)
     * takes over (our rule: 1,500 days is about four years of daily data).
     */
    public static final int PELT_ABOVE = 1500;
    /**
     * A break must move the level by at least 3 % (our rule), by a step at the break or by how far
     * a change of slope carries the lines apart within one minimum regime (a year for sub-annual data): smaller steps are within what calendar
     * effects and survey noise move a monthly tourism series, and a segmented line would otherwise
     * "break" every smooth curve (co2's rise gives ten steps of 0.1–0.3 %).
     */
    public static final double MIN_BREAK_CHANGE_PCT = 3;
    /**
     * An episode begins with a step of at least this size either way (our rule; given as the
     * negative value the search takes), and needs a movement back of at least
     * {@link #MIN_BREAK_CHANGE_PCT} afterwards.
     */
    public static final double COLLAPSE_PCT = -10;
    /**
     * A break whose step and change of slope both reach {@link #MIN_BREAK_CHANGE_PCT} is described as
     * the simpler of "a step in level" (parallel lines) and "a change in slope" (one bent line),
     * whichever has the lower BIC over its two regimes, unless the two separate lines lower BIC by at
     * least this much more: then both. Kass and Raftery (1995), "Bayes Factors", JASA 90(430), 773–795,
     * §3.2: a BIC difference below 2 is "not worth more than a bare mention".
     */
    public static final double BREAK_KIND_BIC_MARGIN = 2;

    // ---- outliers ---------------------------------------------------------------------------

    /**
     * An outlier's robust z (modified z-score) is at least 5 (our rule; Iglewicz &amp; Hoaglin suggest
     * 3.5 for screening, but remainders are heavy-tailed and a brief must not cry wolf). In the
     * injection study (OutlierInjectionTest: ±30–60 % one-offs in AirPassengers, co2, nottem and
     * UKgas) 5 gave the best recall with no more than one false flag per ten years; 4 and 4.5 flagged
     * more and, through the stretch rule, found fewer.
     */
    public static final double OUTLIER_SCORE = 5.0;
    /** An outlier differs from what was expected by at least 0.1 % (our rule: below, it is rounding). */
    public static final double MIN_OUTLIER_DEVIATION_PCT = 0.1;
    /**
     * No outlier is reported this many periods before a break's first period, nor at it and the
     * next one, where a smoother lags behind a jump (our rule).
     */
    public static final int OUTLIER_QUIET_BEFORE_BREAK = 2;
    /** … and this many periods from a break's first period on (our rule). */
    public static final int OUTLIER_QUIET_FROM_BREAK = 2;
    /** Flagged periods in a same-signed run this long are a shift of level, not one-offs ({@link RemainderOutliers#SHIFT_RUN}). */
    public static final int OUTLIER_SHIFT_RUN = RemainderOutliers.SHIFT_RUN;
    /** This many flags within two seasonal cycles are an unusual stretch ({@link RemainderOutliers#STRETCH_FLAGS}). */
    public static final int OUTLIER_STRETCH_FLAGS = RemainderOutliers.STRETCH_FLAGS;

    // ---- calendar effects -------------------------------------------------------------------

    /**
     * Before the calendar effects are estimated, remainders whose residual from a robust (Huber)
     * fit has a modified z-score of at least 3.5 are set aside, so that a one-off cannot pull the
     * estimate: the cut Iglewicz &amp; Hoaglin (1993) recommend for labelling potential outliers.
     */
    public static final double CALENDAR_SCREEN_SCORE = 3.5;
    /**
     * Easter's effect is estimated only when, among the data's years, the days before Easter fell
     * mostly in March (the first quarter) in at least this many and mostly in April (the second) in
     * at least this many (our rule). The Easter regressor, centred per calendar month, varies only
     * with that split; with a single year of one split, its estimate is that year's difference from
     * the others, whatever else happened in it, and a p-value computed from it overstates the
     * evidence. Two of each is the least that lets one year be checked against another.
     */
    public static final int MIN_EASTER_YEARS_EACH_MONTH = 2;

    /**
     * An outlier's row names the calendar when the significant calendar effects moved its expected
     * value by at least 1 % (our rule: smaller effects are within a month's noise and would only
     * clutter the table).
     */
    public static final double CALENDAR_NAMED_PCT = 1.0;

    // ---- outlook --------------------------------------------------------------------------

    /**
     * A single forecasting method replaces the combination only when its mean absolute error in the
     * back-test is at least this many % lower, and lower in both halves of the back-test (our rule:
     * picking the lowest score of a short back-test is itself a source of error; on the M3
     * competition's series smaller margins lost accuracy against the combination alone).
     */
    public static final int OUTLOOK_METHOD_ADVANTAGE_PCT = 50;
    /**
     * … and only on a back-test of at least this many forecasts (our rule: on the M3 competition's
     * yearly series, eight one-step forecasts chose worse than the combination alone).
     */
    public static final int OUTLOOK_MIN_CHOICE_FORECASTS = 20;
    /**
     * The outlook's 80 % interval is narrowed to the back-test's errors, where it is wider than they
     * support, only with at least this many errors (our rule: their share inside the interval is then
     * known within about ±4 points, the binomial standard error; fewer errors only ever widen it). The
     * 95 % interval is narrowed by the same factor, unless the back-test's largest errors ask for more.
     */
    public static final int OUTLOOK_NARROWING_ERRORS = 100;
    /**
     * The outlook's intervals are widened to the back-test's errors, where narrower than they support,
     * from this many errors pooled over the horizons (our rule: the non-seasonal origins of the
     * shortest back-test).
     */
    public static final int OUTLOOK_WIDENING_ERRORS = 8;
    /**
     * Beyond the horizons the back-test scored, the outlook's 95 % interval grows at least as the
     * back-test's errors grew, extended as h to a power between these two: 1/2, a random walk's
     * errors (Hyndman &amp; Athanasopoulos 2021, §5.5, from memory), and 1, a mis-estimated slope's
     * (common practice, no source).
     */
    public static final double OUTLOOK_SLOWEST_FAR_GROWTH = 0.5;
    public static final double OUTLOOK_FASTEST_FAR_GROWTH = 1.0;
    /**
     * After a break, the latest regime alone replaces all values only when the back-test's error
     * fitted on it is at least this many % lower (our rule: the history holds the season, and a
     * break changes the level, which the methods re-anchor by themselves).
     */
    public static final int OUTLOOK_REGIME_ADVANTAGE_PCT = 25;

    // ---- claims on the first page -------------------------------------------------------------

    /**
     * A change of the latest period, the year to date or the rolling year below this, in %, is
     * "about the same" (our rule: it rounds to 0.0 % as the brief prints it).
     */
    public static final double FLAT_CHANGE_PCT = 0.05;
    /**
     * An observed change of at least this, in %, is material: it leads the first page when nothing
     * larger happened, and a trend going the other way over the same span is qualified by it, be it
     * the latest period's change on a year earlier, the year to date's or the rolling year's (our rule).
     */
    public static final double MATERIAL_CHANGE_PCT = 1.0;
    /**
     * When both the year to date and the rolling year went against a trend by at least this, in %,
     * the trend's direction is not stated on the first page (our rule: a fall of 5 % in a year is
     * larger than the yearly rise of most tourism series' trends).
     */
    public static final double CONTRADICTING_CHANGE_PCT = 5.0;
    /**
     * When the 95 % interval of the date of the break that opens the latest regime spans at least
     * this many years, the first page gives that regime's start as "about" its date, with the
     * interval (our rule: a start uncertain by a year or more is no month to lead with).
     */
    public static final double VAGUE_START_YEARS = 1.0;
    /** A break that began within this many years of the latest period is recent news (our rule). */
    public static final int RECENT_BREAK_YEARS = 3;
    /**
     * A recent break that moved the level by at least this, in %, leads the first page (our rule:
     * the size of a collapse, {@link #COLLAPSE_PCT}, either way).
     */
    public static final double HEADLINE_STEP_PCT = -COLLAPSE_PCT;

    /**
     * The outlook calls next year "about the same" as the current one only when the 80 % interval
     * of the change contains zero and lies within ± this many percent (our rule); otherwise it gives
     * the change with its interval, so that it never contradicts a trend stated elsewhere with a
     * bare verb.
     */
    public static final double OUTLOOK_SAME_PCT = 2.0;
    /**
     * The outlook page says why next year's change differs from the trend stated on the first page
     * when they go opposite ways, or when their paces (both in % a year, as printed to one decimal)
     * differ by this many percentage points or more (our rule: at 2 points, a total's +1.5 % next year
     * against a trend of +2.5 % a year went unexplained, and readers took it for a contradiction).
     */
    public static final double OUTLOOK_TREND_GAP_POINTS = 1.0;
    /**
     * From this gap (points, as printed) or for an outlook opposite to the trend, the outlook page
     * gives every reason its evidence shows; below it, one sentence with the first reason in what the
     * methods did (our rule: a gap of a point or so needs a reason, not a paragraph).
     */
    public static final double OUTLOOK_TREND_FULL_ACCOUNT_POINTS = 2.0;
}
