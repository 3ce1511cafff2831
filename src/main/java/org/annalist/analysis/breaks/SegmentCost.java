package org.annalist.analysis.breaks;

/**
 * Residual sums of squares of any segment in O(1) from cumulative sums: for a constant level
 * (y ~ 1) or a straight line (y ~ 1 + t), fitted by least squares to the observed values of the
 * segment (missing values are skipped). Values and time are centred first, so the sums do not
 * lose precision to cancellation.
 */
final class SegmentCost {

    private final BaiPerron.Model model;
    private final double[] count;
    private final double[] sumT;
    private final double[] sumTT;
    private final double[] sumY;
    private final double[] sumTY;
    private final double[] sumYY;

    SegmentCost(double[] y, BaiPerron.Model model) {
        this.model = model;
        int n = y.length;
        count = new double[n + 1];
        sumT = new double[n + 1];
        sumTT = new double[n + 1];
        sumY = new double[n + 1];
        sumTY = new double[n + 1];
        sumYY = new double[n + 1];
        load(y);
    }

    /**
     * Replaces the values by {@code y} (same length), reusing the arrays: the Monte Carlo tests
     * load thousands of series.
     */
    void load(double[] y) {
        int n = y.length;
        double mean = 0;
        int observed = 0;
        for (double v : y) {
            if (!Double.isNaN(v)) {
                mean += v;
                observed++;
            }
        }
        mean /= Math.max(1, observed);
        double tCentre = (n - 1) / 2.0;
        for (int i = 0; i < n; i++) {
            boolean present = !Double.isNaN(y[i]);
            double t = i - tCentre;
            double v = present ? y[i] - mean : 0;
            double w = present ? 1 : 0;
            count[i + 1] = count[i] + w;
            sumT[i + 1] = sumT[i] + w * t;
            sumTT[i + 1] = sumTT[i] + w * t * t;
            sumY[i + 1] = sumY[i] + v;
            sumTY[i + 1] = sumTY[i] + t * v;
            sumYY[i + 1] = sumYY[i] + v * v;
        }
    }

    /** Observed values in {@code from..to} (inclusive, 0-based). */
    double observed(int from, int to) {
        return count[to + 1] - count[from];
    }

    /** Residual sum of squares of the fit over {@code from..to} (inclusive, 0-based). */
    double rss(int from, int to) {
        double n = count[to + 1] - count[from];
        if (n < 1) {
            return 0;
        }
        double sy = sumY[to + 1] - sumY[from];
        double syy = sumYY[to + 1] - sumYY[from];
        double level = syy - sy * sy / n;
        if (model == BaiPerron.Model.LEVEL || n < 2) {
            return Math.max(0, level);
        }
        double st = sumT[to + 1] - sumT[from];
        double stt = sumTT[to + 1] - sumTT[from];
        double sty = sumTY[to + 1] - sumTY[from];
        double ctt = stt - st * st / n;
        double cty = sty - st * sy / n;
        return ctt <= 0 ? Math.max(0, level) : Math.max(0, level - cty * cty / ctt);
    }

    /**
     * {@link #rss} of every segment that ends at {@code to} and starts in
     * {@code firstStart..lastStart}, into {@code into[start]}. Dynamic programming needs a whole
     * row of segment costs for each end; one call per row rather than one per segment saves the
     * call that the quick compiler (C1) does not inline. The arithmetic is that of {@link #rss},
     * operation for operation, so every value is the same bit for bit; a test holds the two equal.
     */
    void rssEndingAt(int to, int firstStart, int lastStart, double[] into) {
        rssEndingAt(to, firstStart, lastStart, into, into);
    }

    /**
     * As {@link #rssEndingAt(int, int, int, double[])}, and also each segment's cost about its
     * mean, the level model's {@link #rss}, into {@code levelInto[start]} ({@code into} itself when
     * only one row is wanted). The line's cost starts from the mean's, so one pass gives both
     * models' rows for what the line's alone costs.
     */
    void rssEndingAt(int to, int firstStart, int lastStart, double[] into, double[] levelInto) {
        boolean levelOnly = model == BaiPerron.Model.LEVEL;
        double countTo = count[to + 1];
        double sumYTo = sumY[to + 1];
        double sumYYTo = sumYY[to + 1];
        double sumTTo = sumT[to + 1];
        double sumTTTo = sumTT[to + 1];
        double sumTYTo = sumTY[to + 1];
        for (int from = firstStart; from <= lastStart; from++) {
            double n = countTo - count[from];
            if (n < 1) {
                levelInto[from] = 0;
                into[from] = 0;
                continue;
            }
            double sy = sumYTo - sumY[from];
            double syy = sumYYTo - sumYY[from];
            double level = syy - sy * sy / n;
            double aboutMean = atLeastZero(level);
            levelInto[from] = aboutMean;   // first: into may be the same row, and then the line's cost wins
            if (levelOnly || n < 2) {
                into[from] = aboutMean;
                continue;
            }
            double st = sumTTo - sumT[from];
            double stt = sumTTTo - sumTT[from];
            double sty = sumTYTo - sumTY[from];
            double ctt = stt - st * st / n;
            double cty = sty - st * sy / n;
            into[from] = ctt <= 0 ? aboutMean : atLeastZero(level - cty * cty / ctt);
        }
    }

    /**
     * {@code Math.max(0, x)} for every x, NaN and −0 included (both give what {@code Math.max}
     * gives: NaN, and +0), small enough for C1 to inline, which {@code Math.max(double, double)}
     * is not.
     */
    private static double atLeastZero(double x) {
        return 0 >= x ? 0 : x;
    }

    /** Least-squares coefficients over the segment: {intercept at t = position, slope per period}. */
    double[] fitAt(int from, int to, int position, double[] y) {
        double n = count[to + 1] - count[from];
        double mean = 0;
        double tMean = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                mean += y[i] / n;
                tMean += i / n;
            }
        }
        if (model == BaiPerron.Model.LEVEL || n < 2) {
            return new double[] {mean, 0};
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = from; i <= to; i++) {
            if (!Double.isNaN(y[i])) {
                sxy += (i - tMean) * (y[i] - mean);
                sxx += (i - tMean) * (i - tMean);
            }
        }
        double slope = sxx == 0 ? 0 : sxy / sxx;
        return new double[] {mean + slope * (position - tMean), slope};
    }

    int parameters() {
        return model.coefficients();
    }
}
