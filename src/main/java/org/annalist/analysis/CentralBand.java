package org.annalist.analysis;

/**
 * The values of a large array around its middle, copied out in one pass and kept for order
 * statistics asked for later: the median of Sen's pairwise slopes first, and once the Kendall
 * variance that the median's detrending feeds is known, the ranks of Gilbert's interval limits a
 * few percent either side of it. {@link BandSelection} bounds a band from a sample for ranks it
 * knows beforehand; this bounds a wider one from the same sample, in three segments: a core that
 * holds the middle ranks as BandSelection's band would, and a wing on each side reaching
 * {@code reach} of the array beyond it. The one pass over the array then serves the limits as
 * well as the median, which otherwise took a sample and a pass of their own.
 *
 * <p>Every value of the lower wing is below every value of the core, and every value of the core
 * below every value of the upper wing, so a rank is looked for only in the segment that holds it
 * ({@link OrderStatistics}' partition). A rank outside the band (beyond the reach, or a sample that
 * missed) is reported, and the caller selects from the whole array: the answer is exact either
 * way, only its time changes.
 *
 * <p>Among values that compare equal, which copy ends up at a rank depends on the search: for
 * +0.0 and −0.0 that is not the same bits as another search gives. A caller that must match
 * another search bit for bit uses this only on values without −0.0.
 */
public final class CentralBand {

    /** Values below the band: its first value has this rank. */
    private final int below;
    /** The band's values: the lower wing, the core and the upper wing, in that order, each as found. */
    private final double[] band;
    /** Where the core starts and the upper wing starts in {@link #band}, and where the band ends. */
    private final int coreFrom;
    private final int upperFrom;
    private final int size;

    private CentralBand(int below, double[] band, int coreFrom, int upperFrom, int size) {
        this.below = below;
        this.band = band;
        this.coreFrom = coreFrom;
        this.upperFrom = upperFrom;
        this.size = size;
    }

    /**
     * The segments of {@code a} (read, not reordered) around its middle ranks, with wings reaching
     * {@code reach} (a fraction of the array's length) beyond the core on each side; null when the
     * array is too short for a sample to help or holds NaN.
     */
    public static CentralBand around(double[] a, double reach) {
        int n = a.length;
        if (n < OrderStatistics.SAMPLED_FROM) {
            return null;
        }
        int sampled = BandSelection.sampleSize(n);
        double[] sample = BandSelection.sample(a, sampled);
        if (sample == null) {
            return null;   // NaN, which has no rank
        }
        // the core's bounds as BandSelection takes them for the two middle ranks, the wings' beyond them
        double margin = BandSelection.MARGIN_SDS * Math.sqrt(sampled) / 2;
        int coreLowAt = (int) Math.floor((double) ((n - 1) / 2) * sampled / n - margin);
        int coreHighAt = (int) Math.ceil((double) (n / 2 + 1) * sampled / n + margin);
        int wingLowAt = (int) Math.floor(coreLowAt - reach * sampled);
        int wingHighAt = (int) Math.ceil(coreHighAt + reach * sampled);
        int[] places = new int[4];
        int bounded = 0;
        for (int at : new int[] {wingLowAt, coreLowAt, coreHighAt, wingHighAt}) {
            if (at >= 0 && at < sampled && (bounded == 0 || at > places[bounded - 1])) {
                places[bounded++] = at;
            }
        }
        if (bounded > 0) {
            OrderStatistics.selectAll(sample, 0, sampled - 1, places, 0, bounded - 1);
        }
        double coreLow = coreLowAt < 0 ? Double.NEGATIVE_INFINITY : sample[coreLowAt];
        double coreHigh = coreHighAt >= sampled ? Double.POSITIVE_INFINITY : sample[coreHighAt];
        BandSelection.Band wide = BandSelection.Band.of(a, wingLowAt < 0 ? Double.NEGATIVE_INFINITY : sample[wingLowAt],
                wingHighAt >= sampled ? Double.POSITIVE_INFINITY : sample[wingHighAt],
                (long) (Math.min(wingHighAt, sampled - 1) - Math.max(wingLowAt, 0) + 1) * n / sampled);
        if (wide == null) {
            return null;   // NaN, which no comparison counts
        }
        // one pass over the band per wing boundary, without a branch on the data (OrderStatistics' partition)
        double[] band = wide.values();
        int size = wide.size();
        int coreFrom = OrderStatistics.moveToFront(band, 0, size - 1, coreLow, false);
        int upperFrom = OrderStatistics.moveToFront(band, coreFrom, size - 1, coreHigh, true);
        return new CentralBand(wide.below(), band, coreFrom, upperFrom, size);
    }

    /**
     * Fills {@code values} with the values at 0-based {@code ranks} (ascending) as if the array
     * were sorted, and returns true; false, with {@code values} unspecified, when a rank lies
     * outside the band.
     */
    public boolean select(int[] ranks, double[] values) {
        if (ranks[0] < below || ranks[ranks.length - 1] >= below + size) {
            return false;
        }
        // the values below the band are smaller than all of it, and each segment's values smaller
        // than the next one's: a rank is looked for only in the segment that holds it
        int[] inBand = new int[ranks.length];
        for (int i = 0; i < ranks.length; i++) {
            inBand[i] = ranks[i] - below;
        }
        selectWithin(0, coreFrom, inBand);
        selectWithin(coreFrom, upperFrom, inBand);
        selectWithin(upperFrom, size, inBand);
        for (int i = 0; i < ranks.length; i++) {
            values[i] = band[inBand[i]];
        }
        return true;
    }

    /** Selects the wanted places (ascending) that lie in band[from, to). */
    private void selectWithin(int from, int to, int[] places) {
        int first = 0;
        while (first < places.length && places[first] < from) {
            first++;
        }
        int last = first;
        while (last < places.length && places[last] < to) {
            last++;
        }
        if (last > first) {
            OrderStatistics.selectAll(band, from, to - 1, places, first, last - 1);
        }
    }
}
