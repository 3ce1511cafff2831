package org.annalist.analysis.calendar;

import java.util.ArrayList;
import java.util.List;
import org.annalist.series.Holiday;
import org.annalist.series.Period;

/**
 * The calendar regressors of every position of a monthly or quarterly series, each centred on its
 * mean for that calendar month (or quarter) over the data's years, so that none of them takes over
 * the seasonal pattern (our rule): the Easter share (Bell and Hillmer 1983, see
 * {@link CalendarRegressors}), the count of the weekdays {@link CalendarEffects.Weekdays} names, and
 * the share of each of the user's moving holidays. A regressor that does not vary within the calendar months carries nothing and is
 * dropped (our rule). They depend on the calendar alone, so one set serves every fit over the
 * same span. Package-internal: the arrays are shared, not copied.
 *
 * @param all   the centred regressors, one row per position, one column per name
 * @param names the effects' names, in the order of the columns
 */
record CentredRegressors(double[][] all, List<String> names) {

    /**
     * @param easter with false the Easter regressor is left out (the caller decided the data cannot tell it)
     * @throws IllegalArgumentException for a frequency other than monthly or quarterly
     */
    static CentredRegressors of(Period start, int n, int easterWindow, boolean easter, List<Holiday> holidays,
                                CalendarEffects.Weekdays weekdays) {
        if (!CalendarEffects.applies(start.frequency())) {
            throw new IllegalArgumentException("calendar effects are estimated for monthly or quarterly data, not "
                    + start.frequency());
        }
        int period = start.frequency().seasonalPeriod();
        int columns = 2 + holidays.size();
        double[][] raw = new double[n][columns];
        for (int t = 0; t < n; t++) {
            Period p = start.plus(t);
            raw[t][0] = CalendarRegressors.easterShare(p, easterWindow);
            raw[t][1] = weekdays.count(p);
            for (int h = 0; h < holidays.size(); h++) {
                raw[t][2 + h] = holidays.get(h).share(p);
            }
        }
        String[] all = new String[columns];
        all[0] = CalendarEffects.EASTER;
        all[1] = weekdays.effectName();
        for (int h = 0; h < holidays.size(); h++) {
            all[2 + h] = holidays.get(h).name();
        }
        List<Integer> keep = new ArrayList<>();
        double[][] centred = new double[n][columns];
        for (int c = 0; c < columns; c++) {
            double[] sum = new double[period];
            int[] count = new int[period];
            for (int t = 0; t < n; t++) {
                sum[t % period] += raw[t][c];
                count[t % period]++;
            }
            double ss = 0;
            // each regressor less its mean for the calendar month (or quarter) over the data's years
            for (int t = 0; t < n; t++) {
                centred[t][c] = raw[t][c] - sum[t % period] / count[t % period];
                ss += centred[t][c] * centred[t][c];
            }
            // a regressor that does not vary within the calendar months carries nothing (our rule)
            if (ss > 1e-12 && (c != 0 || easter)) {
                keep.add(c);
            }
        }
        List<String> names = new ArrayList<>();
        double[][] x = new double[n][keep.size()];
        for (int j = 0; j < keep.size(); j++) {
            names.add(all[keep.get(j)]);
            for (int t = 0; t < n; t++) {
                x[t][j] = centred[t][keep.get(j)];
            }
        }
        return new CentredRegressors(x, names);
    }
}
