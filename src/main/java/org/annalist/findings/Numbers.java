package org.annalist.findings;

/** NaN and infinities have no place in JSON: they become null (absent). */
final class Numbers {

    private Numbers() {
    }

    static Double orNull(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
