package org.annalist.analysis.calendar;

import java.util.Random;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Invented monthly guest nights with a planted Easter effect, for the tests of the calendar's
 * findings: a level growing 2 % a year, a seasonal pattern, log-normal noise drawn from a seeded
 * generator, and each month multiplied by 1 + {@code easter} × the share of the
 * {@link CalendarRegressors#DEFAULT_EASTER_WINDOW} days before Easter it holds
 * ({@link CalendarRegressors#easterShare}), so that a month holding all of them is {@code easter}
 * higher. Values rounded to whole nights.
 *
 * @param level  the level in the first month, before season and noise
 * @param season seasonal factors, January to December
 * @param noise  the standard deviation of the noise on logs
 */
public record PlantedEaster(double level, double[] season, double noise) {

    public PlantedEaster {
        season = season.clone();
    }

    /** The series {@code guest_nights} (unit nights) from {@code start} to {@code end}. */
    public Series nights(Period start, Period end, long seed, double easter) {
        Random random = new Random(seed);
        int n = (int) start.until(end) + 1;
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            Period p = start.plus(t);
            x[t] = Math.round(level * Math.pow(1.02, t / 12.0) * season[p.seasonalPosition() - 1]
                    * Math.exp(noise * random.nextGaussian())
                    * (1 + easter * CalendarRegressors.easterShare(p, CalendarRegressors.DEFAULT_EASTER_WINDOW)));
        }
        return Series.builder("guest_nights", Frequency.MONTHLY).unit("nights").append(start, x).snapshot();
    }
}
