package org.annalist.findings;

/** Numbers as the findings hold them: absent where not finite, and rounded as a brief prints them. */
public final class Numbers {

    private Numbers() {
    }

    /**
     * {@code v} to three significant digits, as a brief prints an estimate ({@code 2,940}, {@code 1.34}):
     * a figure computed from a printed one uses this, so that a reader's own sum gives it.
     */
    public static double threeSignificant(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return v;
        }
        double step = Math.pow(10, Math.floor(Math.log10(Math.abs(v))) - 2);
        return Math.round(v / step) * step;
    }

    /** NaN and infinities have no place in JSON: they become null (absent). */
    static Double orNull(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
