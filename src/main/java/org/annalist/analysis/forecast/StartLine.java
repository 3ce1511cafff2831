package org.annalist.analysis.forecast;

/** The least-squares line through the first values of a series against t = 1, 2, …, used for start values. */
record StartLine(double intercept, double slope, double mean) {

    static StartLine through(double[] y, int count) {
        double tMean = (count + 1) / 2.0;
        double yMean = 0;
        for (int i = 0; i < count; i++) {
            yMean += y[i] / count;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < count; i++) {
            sxy += (i + 1 - tMean) * (y[i] - yMean);
            sxx += (i + 1 - tMean) * (i + 1 - tMean);
        }
        double slope = sxy / sxx;
        return new StartLine(yMean - slope * tMean, slope, yMean);
    }
}
