package org.annalist.findings;

import java.util.ArrayList;
import java.util.List;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Whether the parts of a multi-series brief add up to the total declared for them, period by
 * period. Published tables are rounded and revised at different times, so a gap up to
 * {@value #TOLERANCE_PCT} % of the total is accepted (common practice, no source); periods where a
 * part or the total is missing are not judged.
 *
 * @param periods the periods where the parts miss the total by more than the tolerance, oldest first
 * @param largestGapPct the largest such gap, in % of the total (0 when none)
 */
public record PartsCheck(String total, List<String> parts, List<Period> periods, double largestGapPct) {

    public static final double TOLERANCE_PCT = 0.5;

    public PartsCheck {
        parts = List.copyOf(parts);
        periods = List.copyOf(periods);
    }

    public boolean consistent() {
        return periods.isEmpty();
    }

    public static PartsCheck of(Series total, List<Series> parts) {
        List<Period> off = new ArrayList<>();
        double largest = 0;
        for (int i = 0; i < total.size(); i++) {
            Period p = total.period(i);
            if (total.isMissing(i)) {
                continue;
            }
            double sum = 0;
            boolean complete = true;
            for (Series part : parts) {
                int j = part.indexOf(p);
                if (j < 0 || part.isMissing(j)) {
                    complete = false;
                    break;
                }
                sum += part.value(j);
            }
            if (!complete || total.value(i) == 0) {
                continue;
            }
            double gapPct = 100 * Math.abs(sum - total.value(i)) / Math.abs(total.value(i));
            if (gapPct > TOLERANCE_PCT) {
                off.add(p);
                largest = Math.max(largest, gapPct);
            }
        }
        return new PartsCheck(total.name(), parts.stream().map(Series::name).toList(), off, largest);
    }
}
