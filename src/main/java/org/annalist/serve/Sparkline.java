package org.annalist.serve;

import java.util.Locale;
import org.annalist.narrative.Formats;
import org.annalist.series.Series;

/**
 * A small line of a series for the data check, before any analysis: the values scaled into a box,
 * the line broken where a period is missing, the lowest and highest value beside it as numbers
 * (the line alone says nothing exact). The template draws it as inline SVG.
 *
 * @param path SVG path data in a {@value #WIDTH} × {@value #HEIGHT} box; empty without two values
 */
public record Sparkline(String path, String low, String high, String first, String last) {

    static final int WIDTH = 240;
    static final int HEIGHT = 48;

    static Sparkline of(Series series, Formats formats) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        int n = series.size();
        for (int i = 0; i < n; i++) {
            if (!series.isMissing(i)) {
                min = Math.min(min, series.value(i));
                max = Math.max(max, series.value(i));
            }
        }
        if (n < 2 || min > max) {
            return new Sparkline("", "", "", series.start().label(), series.end().label());
        }
        double span = max > min ? max - min : 1;
        StringBuilder path = new StringBuilder();
        boolean drawing = false;
        for (int i = 0; i < n; i++) {
            if (series.isMissing(i) || !Double.isFinite(series.value(i))) {
                drawing = false;
                continue;
            }
            double x = 1 + (WIDTH - 2) * (double) i / (n - 1);
            double y = 2 + (HEIGHT - 4) * (1 - (series.value(i) - min) / span);
            path.append(drawing ? 'L' : 'M').append(String.format(Locale.ROOT, "%.1f %.1f", x, y));
            drawing = true;
        }
        return new Sparkline(path.toString(), formats.value(min), formats.value(max), series.start().label(),
                series.end().label());
    }
}
