package org.annalist.analysis.breaks;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;
import org.annalist.analysis.TestResult;
import org.annalist.series.Frequency;

/**
 * The structural breaks of a series, each confirmed by its own test, with the evidence a statement
 * about it needs: where the new regime begins, how sure that date is, the levels before and after.
 * Meant for the seasonally adjusted series (in logs when the series is multiplicative) with one-off
 * outliers screened out, so that one wild period cannot pull a regime boundary.
 *
 * <p>The search:
 * <ol>
 * <li>Up to {@link #withPeltAbove(int) peltAbove} values: Bai–Perron [1, 2] for changes in level
 *     and for changes in level and slope, the model and number of breaks with the lower BIC. Serial
 *     correlation makes BIC propose too many breaks [2], so from BIC's number of breaks down, the
 *     first partition is kept in which every break moves the level by at least the
 *     {@link #withMinimumChangePct(double) minimum change} (by a step at the break, or by a change of
 *     slope over one minimum regime) and passes its own sup-F test [4] over
 *     the span of its two regimes; else none.</li>
 * <li>Longer series: PELT [5] for changes in level; then, while some break moves the level by less
 *     than the minimum change or fails its own sup-F test, the weakest of those (smallest change)
 *     is removed and the rest are checked again. A smooth yearly wave in long data otherwise reads
 *     as a staircase of level changes.</li>
 * <li>Each break kept gets its sup-F test with the full number of replications, a Bai (1997) [3]
 *     interval for its date (for a change of slope without a step of the minimum change, the likelihood-ratio set [6]), and the fitted levels of its two regimes at the break, in the series'
 *     units (back from logs when the values are logs).</li>
 * <li>Episodes: a large step (a break whose step moves the level by the
 *     {@link #withCollapsePct(double) episode threshold} or more, either way) followed by a
 *     movement back of at least the minimum change.</li>
 * </ol>
 *
 * <p>Configuration is immutable: each {@code with…} returns a new search. The defaults are those
 * of the brief: the findings pass the values of their catalogue of decision rules, which lists
 * them with their sources, and a test holds the two equal.
 *
 * <p>Edge behaviour: missing values ({@code NaN}) are left out of every fit. Daily and
 * business-daily values are not searched ({@link Method#NOT_SEARCHED_DAILY}): the yearly pattern,
 * which an adjustment for the weekday pattern leaves in, would read as breaks. A series shorter
 * than two minimum regimes is not searched ({@link Method#NOT_SEARCHED_SHORT}). Neither is an
 * error: the result says so.
 *
 * <p>References:
 * <ol>
 * <li>J. Bai and P. Perron (1998), "Estimating and Testing Linear Models with Multiple Structural
 *     Changes", <i>Econometrica</i> 66(1), 47–78. doi:10.2307/2998540</li>
 * <li>J. Bai and P. Perron (2003), "Computation and Analysis of Multiple Structural Change Models",
 *     <i>Journal of Applied Econometrics</i> 18(1), 1–22. doi:10.1002/jae.659</li>
 * <li>J. Bai (1997), "Estimation of a Change Point in Multiple Regression Models", <i>Review of
 *     Economics and Statistics</i> 79(4), 551–563. doi:10.1162/003465397557132 (DOI from memory)</li>
 * <li>D. W. K. Andrews (1993), "Tests for Parameter Instability and Structural Change with Unknown
 *     Change Point", <i>Econometrica</i> 61(4), 821–856. doi:10.2307/2951764 (DOI from memory)</li>
 * <li>R. Killick, P. Fearnhead and I. A. Eckley (2012), "Optimal Detection of Changepoints With a
 *     Linear Computational Cost", <i>Journal of the American Statistical Association</i> 107(500),
 *     1590–1598. doi:10.1080/01621459.2012.737745</li>
 * <li>D. Siegmund (1988), "Confidence Sets in Change-point Problems", <i>International Statistical
 *     Review</i> 56(1), 31–48. doi:10.2307/1403360 (DOI from memory): the date of a break between
 *     fitted lines is given the set of dates the likelihood-ratio test does not reject</li>
 * </ol>
 */
public final class BreakSearch {

    /** What the values passed to {@link #search} are. */
    public enum Scale {
        /** The series' own units. */
        UNITS,
        /** Natural logarithms of the series' values: levels are reported back in the series' units. */
        LOGS
    }

    /** How the breaks were searched, or why they were not. */
    public enum Method {
        /** Bai–Perron, then the backward confirmation. */
        BAI_PERRON,
        /** PELT (the series is longer than {@code peltAbove}), then the confirmation loop. */
        PELT,
        /** Daily or business-daily values: their yearly pattern would read as breaks. */
        NOT_SEARCHED_DAILY,
        /** Fewer values than two minimum regimes. */
        NOT_SEARCHED_SHORT
    }

    /**
     * One confirmed break. Both regimes' fitted lines are read at the break instant, between the
     * old regime's last period and the new regime's first, so that the levels before and after are
     * one date's two values and a regime between two breaks gives both of its levels from one line.
     *
     * @param start         index of the first period of the new regime
     * @param earliest      index of the earliest first period the 95 % interval allows [3]; 1 when
     *                      the break lies as close to the series' start as the minimum regime allows
     * @param latest        index of the latest first period the interval allows; the series' last
     *                      index when the break lies as close to the end as the minimum regime allows
     * @param levelBefore   the old regime's fitted line at the break, in the series' units
     * @param levelAfter    the new regime's fitted line at the break, in the series' units
     * @param changePct     the gap between the two lines at the break: {@code levelAfter} against
     *                      {@code levelBefore}, in %
     * @param test          the sup-F test over the span of the two regimes ({@link SupF#REPLICATIONS}
     *                      replications); empty only when that span admits no test, which a break
     *                      with a finite change never meets
     * @param provisional   the new regime runs to the series' end and is too short to date the
     *                      break: its 95 % interval reaches the latest period
     * @param slopeBefore   the old line's slope at the break, series' units per period (0 for a
     *                      level model)
     * @param slopeAfter    the new line's slope at the break, series' units per period
     * @param divergencePct how far the change of slope carries the new line from the old one's
     *                      extension over the minimum regime, in % of the level before
     * @param shape         the step / slope / both fits of the two regimes ({@link BreakShape});
     *                      empty for a level model, whose regimes have no slope
     * @param end           index of the new regime's last period
     * @param endLevel      the new regime's fitted line at its last period, in the series' units
     * @param stepOrBend    the test of the step against a continuous bend at the same date
     *                      ({@link StepOrBend}); empty for a level model. When the step is not
     *                      supported, the break is that bend: the lines of its two regimes are joined
     *                      there ({@link JoinedLines}), the levels before and after are one value,
     *                      and {@code changePct} is 0
     */
    public record Break(int start, int earliest, int latest, double levelBefore, double levelAfter, double changePct,
                        Optional<TestResult> test, boolean provisional, double slopeBefore, double slopeAfter,
                        double divergencePct, Optional<BreakShape> shape, int end, double endLevel,
                        Optional<StepOrBend> stepOrBend) {

        public Break {
            Objects.requireNonNull(test, "test");
            Objects.requireNonNull(shape, "shape");
            Objects.requireNonNull(stepOrBend, "stepOrBend");
        }

        /** Whether the break is a bend without a step: its step was not supported ({@link StepOrBend}). */
        public boolean bentWithoutStep() {
            return stepOrBend.isPresent() && levelBefore == levelAfter;
        }

    }

    /**
     * A regime's fitted line {@code periods} periods after its first period, in the series' units:
     * the line starts at the break instant, half a period before that first period, at {@code level}
     * and climbs by {@code slope} a period, both on the scale searched (logs when {@code log}, then
     * taken back with {@code exp}). Read at a regime's last period it gives {@link Break#endLevel}.
     */
    public static double lineAt(double level, double slope, long periods, boolean log) {
        double working = level + slope * (periods + 0.5);
        return log ? Math.exp(working) : working;
    }

    /**
     * A large step followed by a movement back the other way: the series fell and rose again (or
     * rose and fell back), read as one event.
     *
     * @param start         index of the first period after the large step
     * @param rise          whether the step went up (and the return down)
     * @param before        the fitted level just before the step, in the series' units
     * @param extreme       index of the period where the stepped regime's fitted line is furthest
     *                      from {@code before} (its low after a fall, its high after a rise)
     * @param extremeLevel  that fitted level, in the series' units
     * @param returnStart   index of the first period of the regime that moved back; empty when the
     *                      stepped regime's own line moved back
     * @param asOf          index of the period at which the return is measured: the end of the
     *                      regime that moved back
     * @param returnedLevel the fitted level that regime closes at: at the break after {@code asOf}
     *                      when one ends the regime (that break's level before), else at {@code asOf}
     * @param returnedShare how much of the step had been undone by {@code asOf} (1 = all, capped at
     *                      {@value BreakSearch#MAX_REGAINED_SHARE})
     */
    public record Episode(int start, boolean rise, double before, int extreme, double extremeLevel,
                          OptionalInt returnStart, int asOf, double returnedLevel, double returnedShare) {

        public Episode {
            Objects.requireNonNull(returnStart, "returnStart");
        }
    }

    /**
     * What the search found and how it searched.
     *
     * @param method        how the breaks were searched, or why not
     * @param model         the regression model of the regimes: the one with the lower BIC for
     *                      Bai–Perron, {@link BaiPerron.Model#LEVEL} for PELT; empty when not searched
     * @param minimumRegime the fewest periods a regime could have: for Bai–Perron the chosen model's
     *                      (at least 2 for a level, 3 for a line); when not searched, the one in force
     * @param breaks        confirmed breaks, oldest first
     * @param episodes      large steps followed by a movement back, oldest first
     */
    public record Result(Method method, Optional<BaiPerron.Model> model, int minimumRegime, List<Break> breaks,
                         List<Episode> episodes) {

        public Result {
            Objects.requireNonNull(method, "method");
            Objects.requireNonNull(model, "model");
            breaks = List.copyOf(breaks);
            episodes = List.copyOf(episodes);
        }

        /** Index of the first period of the latest regime: the last break's start, 0 without breaks. */
        public int latestRegimeStart() {
            return breaks.isEmpty() ? 0 : breaks.get(breaks.size() - 1).start();
        }
    }

    /** Significance level of every sup-F decision (common practice). */
    public static final double DEFAULT_ALPHA = 0.05;
    /**
     * A break must move the level by at least 3 % (our rule): smaller steps are within what calendar
     * effects and survey noise move a monthly tourism series, and a segmented line would otherwise
     * "break" every smooth curve.
     */
    public static final double DEFAULT_MINIMUM_CHANGE_PCT = 3;
    /** Bai–Perron costs O(n²) per break; above this many values PELT (linear) searches (our rule). */
    public static final int DEFAULT_PELT_ABOVE = 1500;
    /** An episode begins with a step of 10 % or more either way; given as −10 (our rule). */
    public static final double DEFAULT_COLLAPSE_PCT = -10;
    /**
     * Minimum regime of annual data, in years (our rule; the usual 15 % trimming would forbid
     * breaks in the last 15 % of the data, where a reader most needs to know of one).
     */
    public static final int DEFAULT_ANNUAL_MINIMUM_REGIME = 8;
    /** The share moved back is capped at 1.5: beyond, the return says no more about the step (our rule). */
    public static final double MAX_REGAINED_SHARE = 1.5;

    private static final int BY_FREQUENCY = 0;

    private final double alpha;
    private final double minimumChangePct;
    private final int peltAbove;
    private final double collapsePct;
    private final int minimumRegime;   // BY_FREQUENCY: from the frequency
    private final int annualMinimumRegime;

    private BreakSearch(double alpha, double minimumChangePct, int peltAbove, double collapsePct, int minimumRegime,
                        int annualMinimumRegime) {
        this.alpha = alpha;
        this.minimumChangePct = minimumChangePct;
        this.peltAbove = peltAbove;
        this.collapsePct = collapsePct;
        this.minimumRegime = minimumRegime;
        this.annualMinimumRegime = annualMinimumRegime;
    }

    /** The search with every default; the minimum regime follows the frequency. */
    public static BreakSearch withDefaults() {
        return new BreakSearch(DEFAULT_ALPHA, DEFAULT_MINIMUM_CHANGE_PCT, DEFAULT_PELT_ABOVE, DEFAULT_COLLAPSE_PCT,
                BY_FREQUENCY, DEFAULT_ANNUAL_MINIMUM_REGIME);
    }

    /** @param level significance level of each break's sup-F decision, in (0, 1) */
    public BreakSearch withAlpha(double level) {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("the significance level must lie in (0, 1), was " + level);
        }
        return new BreakSearch(level, minimumChangePct, peltAbove, collapsePct, minimumRegime, annualMinimumRegime);
    }

    /** @param pct the smallest change of level (in %, either way) a break may make, ≥ 0 */
    public BreakSearch withMinimumChangePct(double pct) {
        if (!(pct >= 0 && pct < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("the minimum change must be a finite % ≥ 0, was " + pct);
        }
        return new BreakSearch(alpha, pct, peltAbove, collapsePct, minimumRegime, annualMinimumRegime);
    }

    /** @param length the number of values above which PELT replaces Bai–Perron, ≥ 0 */
    public BreakSearch withPeltAbove(int length) {
        if (length < 0) {
            throw new IllegalArgumentException("the length above which PELT searches must be ≥ 0, was " + length);
        }
        return new BreakSearch(alpha, minimumChangePct, length, collapsePct, minimumRegime, annualMinimumRegime);
    }

    /** @param pct the change of level (in %, ≤ 0) at or below which a break is a collapse */
    public BreakSearch withCollapsePct(double pct) {
        if (!(pct <= 0 && pct > Double.NEGATIVE_INFINITY)) {
            throw new IllegalArgumentException("the collapse threshold must be a finite % ≤ 0, was " + pct);
        }
        return new BreakSearch(alpha, minimumChangePct, peltAbove, pct, minimumRegime, annualMinimumRegime);
    }

    /** @param periods the fewest periods every regime must have, whatever the frequency; ≥ 2 */
    public BreakSearch withMinimumRegime(int periods) {
        if (periods < 2) {
            throw new IllegalArgumentException("a regime needs at least 2 periods, was " + periods);
        }
        return new BreakSearch(alpha, minimumChangePct, peltAbove, collapsePct, periods, annualMinimumRegime);
    }

    /**
     * The minimum regime follows the frequency (the default): one seasonal period (at least 3) for
     * sub-annual data, {@code years} for annual data.
     *
     * @param years ≥ 2
     */
    public BreakSearch withAnnualMinimumRegime(int years) {
        if (years < 2) {
            throw new IllegalArgumentException("a regime needs at least 2 years, was " + years);
        }
        return new BreakSearch(alpha, minimumChangePct, peltAbove, collapsePct, BY_FREQUENCY, years);
    }

    /** The minimum regime this search uses for data of the given frequency. */
    public int minimumRegime(Frequency frequency) {
        Objects.requireNonNull(frequency, "frequency");
        if (minimumRegime != BY_FREQUENCY) {
            return minimumRegime;
        }
        return frequency == Frequency.ANNUAL ? annualMinimumRegime : Math.max(3, frequency.seasonalPeriod());
    }

    /**
     * @param values    the series to search (not changed), {@code NaN} where missing
     * @param frequency how often the values are observed (sets the minimum regime, and daily data
     *                  are not searched)
     * @param scale     whether the values are the series' units or their logs
     */
    public Result search(double[] values, Frequency frequency, Scale scale) {
        Objects.requireNonNull(values, "values");
        Objects.requireNonNull(scale, "scale");
        int n = values.length;
        int h = minimumRegime(frequency);
        if (frequency == Frequency.DAILY || frequency == Frequency.BUSINESS_DAILY) {
            return new Result(Method.NOT_SEARCHED_DAILY, Optional.empty(), h, List.of(), List.of());
        }
        if (n < 2 * h) {
            return new Result(Method.NOT_SEARCHED_SHORT, Optional.empty(), h, List.of(), List.of());
        }
        boolean log = scale == Scale.LOGS;
        double[] y = values;
        Method method;
        BaiPerron.Model model;
        int used;
        int[] starts;
        if (n > peltAbove) {
            method = Method.PELT;
            model = BaiPerron.Model.LEVEL;
            used = h;
            starts = new Confirmation(y, model, h, log, minimumChangePct, alpha).pruned(Pelt.fit(y, h).starts());
        } else {
            BaiPerron.BothModels fits = BaiPerron.fitBothModels(y, Math.max(h, 2), Math.max(h, 3));
            BaiPerron.Result level = fits.level();
            BaiPerron.Result slope = fits.levelAndSlope();
            BaiPerron.Result best = slope.chosen().bic() < level.chosen().bic() ? slope : level;
            method = Method.BAI_PERRON;
            model = best.model();
            used = best.minimumRegime();
            starts = new Confirmation(y, model, h, log, minimumChangePct, alpha).backward(best);
        }
        Regimes regimes = new Regimes(y, model, h, log, alpha);
        List<Break> breaks = regimes.describeAll(starts, minimumChangePct);
        return new Result(method, Optional.of(model), used, breaks,
                regimes.episodes(breaks, collapsePct, minimumChangePct));
    }
}
