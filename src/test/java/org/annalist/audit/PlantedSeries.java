package org.annalist.audit;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.annalist.analysis.calendar.Easter;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.SeriesBuilder;

/**
 * Invented series with a planted truth, for the statement audit: every number is drawn from a
 * seeded generator, so a failure names its seed and can be rerun alone. The scenarios are the
 * kinds of series a brief is written about and the kinds of change it must describe rightly.
 */
final class PlantedSeries {

    /** What was put into a series, the yardstick its brief is held to. */
    enum Scenario {
        /** A steady trend and a seasonal pattern, nothing else. */
        PLAIN,
        /** One lasting step in level, up or down. */
        LEVEL_STEP,
        /** A flat level that starts to climb or fall: a change in slope with no step. */
        SLOPE_CHANGE,
        /** A deep fall that lasts some months, then a partial return. */
        FALL_AND_RETURN,
        /** Overnight stays that follow Easter between March and April, with no one-off at all. */
        EASTER,
        /** A season with closed months (zeros). */
        CLOSED_MONTHS,
        /** Missing values scattered through the series. */
        GAPS,
        /** An occupancy rate in per cent. */
        RATE,
        /** A monthly mean temperature in degrees Celsius: an interval scale. */
        TEMPERATURE,
        /** Shorter than the analysis needs for most of its claims. */
        SHORT,
        /** Thirty years of months. */
        LONG,
        /** Quarterly and annual flows with a trend. */
        COARSE
    }

    /**
     * @param stepAt    the first period of the new level (a planted step), if any
     * @param stepPct   its size in per cent of the level before it
     * @param slopeAt   the first period of the new slope (a planted slope change), if any
     */
    record Planted(long seed, Scenario scenario, Series series, Optional<Period> stepAt, double stepPct,
                   Optional<Period> slopeAt) {
        @Override
        public String toString() {
            return scenario + " seed " + seed + " (" + series.name() + ", " + series.frequency() + ", " + series.start()
                    + " to " + series.end() + ")";
        }
    }

    private PlantedSeries() {
    }

    /** {@code count} series, the scenarios in turn, each from its own seed. */
    static List<Planted> generate(int count) {
        List<Planted> all = new ArrayList<>();
        Scenario[] scenarios = Scenario.values();
        for (int i = 0; i < count; i++) {
            all.add(of(scenarios[i % scenarios.length], 1000L + i));
        }
        return all;
    }

    static Planted of(Scenario scenario, long seed) {
        Random r = new Random(seed);
        return switch (scenario) {
            case PLAIN -> plain(seed, r);
            case LEVEL_STEP -> step(seed, r);
            case SLOPE_CHANGE -> slopeChange(seed, r);
            case FALL_AND_RETURN -> fallAndReturn(seed, r);
            case EASTER -> easter(seed, r);
            case CLOSED_MONTHS -> closedMonths(seed, r);
            case GAPS -> gaps(seed, r);
            case RATE -> rate(seed, r);
            case TEMPERATURE -> temperature(seed, r);
            case SHORT -> shortSeries(seed, r);
            case LONG -> longSeries(seed, r);
            case COARSE -> coarse(seed, r);
        };
    }

    /** A month's seasonal factor around 1: peak in July or August, low in winter. */
    private static double season(int month, double amplitude) {
        return 1 + amplitude * Math.cos(2 * Math.PI * (month - 7.5) / 12);
    }

    private static int startYear(Random r) {
        return 2008 + r.nextInt(6);
    }

    private static Planted plain(long seed, Random r) {
        int years = 8 + r.nextInt(8);
        double growth = (r.nextDouble() - 0.5) * 0.08;   // −4 % to +4 % a year
        double noise = 0.01 + 0.03 * r.nextDouble();
        double[] x = monthly(years * 12, t -> 50_000 * Math.pow(1 + growth, t / 12.0), 0.35, noise, r);
        return planted(seed, Scenario.PLAIN, "Guest nights", "nights", startYear(r), x);
    }

    private static Planted step(long seed, Random r) {
        int n = 12 * (10 + r.nextInt(5));
        int at = 36 + r.nextInt(n - 36 - 30);   // at least three years before and 30 months after
        double pct = (15 + 20 * r.nextDouble()) * (r.nextBoolean() ? 1 : -1);
        double[] x = monthly(n, t -> 80_000 * (t >= at ? 1 + pct / 100 : 1), 0.3, 0.02, r);
        int year = startYear(r);
        Planted p = planted(seed, Scenario.LEVEL_STEP, "Arrivals", "arrivals", year, x);
        return new Planted(seed, p.scenario(), p.series(), Optional.of(p.series().period(at)), pct, Optional.empty());
    }

    private static Planted slopeChange(long seed, Random r) {
        int n = 12 * (10 + r.nextInt(5));
        int at = 48 + r.nextInt(n - 48 - 36);
        double perMonth = (0.006 + 0.006 * r.nextDouble()) * (r.nextBoolean() ? 1 : -1);
        double[] x = monthly(n, t -> 60_000 * (1 + (t >= at ? perMonth * (t - at) : 0)), 0.3, 0.015, r);
        Planted p = planted(seed, Scenario.SLOPE_CHANGE, "Visitor nights", "nights", startYear(r), x);
        return new Planted(seed, p.scenario(), p.series(), Optional.empty(), 0, Optional.of(p.series().period(at)));
    }

    private static Planted fallAndReturn(long seed, Random r) {
        int n = 12 * (11 + r.nextInt(4));
        int at = 60 + r.nextInt(n - 60 - 40);
        int low = 6 + r.nextInt(12);
        double fall = 0.4 + 0.3 * r.nextDouble();
        double back = 0.5 + 0.5 * r.nextDouble();   // share of the fall that returns
        double[] x = monthly(n, t -> {
            double level = 100_000;
            if (t >= at && t < at + low) {
                return level * (1 - fall);
            }
            return t >= at + low ? level * (1 - fall * (1 - back)) : level;
        }, 0.3, 0.02, r);
        Planted p = planted(seed, Scenario.FALL_AND_RETURN, "Guest nights", "nights", startYear(r), x);
        return new Planted(seed, p.scenario(), p.series(), Optional.of(p.series().period(at)), -100 * fall,
                Optional.empty());
    }

    private static Planted easter(long seed, Random r) {
        int years = 9 + r.nextInt(6);
        int year0 = startYear(r);
        double effect = 0.08 + 0.06 * r.nextDouble();   // the Easter nights' share of a month's level
        double[] x = monthly(years * 12, t -> 70_000 * (1 + 0.02 * t / 12.0), 0.3, 0.01, r);
        for (int y = 0; y < years; y++) {
            // the holiday's nights spread evenly over the eight days before Easter Sunday (the usual
            // Easter regressor, Bell & Hillmer 1983; the window is from memory), so an early Easter
            // puts some or all of them in March
            LocalDate easter = Easter.sunday(year0 + y);   // its dates are checked in CalendarTest
            for (int d = 1; d <= 8; d++) {
                int month = easter.minusDays(d).getMonthValue();
                x[y * 12 + month - 1] *= 1 + effect / 8;
            }
        }
        return planted(seed, Scenario.EASTER, "Guest nights", "nights", year0, x);
    }

    private static Planted closedMonths(long seed, Random r) {
        int years = 6 + r.nextInt(6);
        double[] x = monthly(years * 12, t -> 4_000 * (1 + 0.03 * t / 12.0), 0.5, 0.05, r);
        for (int t = 0; t < x.length; t++) {
            int month = t % 12 + 1;
            if (month == 1 || month == 2 || month == 12) {
                x[t] = 0;
            }
        }
        return planted(seed, Scenario.CLOSED_MONTHS, "Campsite nights", "nights", startYear(r), x);
    }

    private static Planted gaps(long seed, Random r) {
        int years = 8 + r.nextInt(6);
        double[] x = monthly(years * 12, t -> 30_000 * (1 + 0.02 * t / 12.0), 0.3, 0.02, r);
        for (int t = 1; t < x.length - 1; t++) {
            if (r.nextDouble() < 0.03) {
                x[t] = Double.NaN;
            }
        }
        return planted(seed, Scenario.GAPS, "Arrivals", "arrivals", startYear(r), x);
    }

    private static Planted rate(long seed, Random r) {
        int years = 7 + r.nextInt(8);
        double base = 45 + 20 * r.nextDouble();
        double drift = (r.nextDouble() - 0.5) * 2;   // percentage points a year
        double[] x = new double[years * 12];
        for (int t = 0; t < x.length; t++) {
            double v = (base + drift * t / 12.0) * season(t % 12 + 1, 0.3) + 1.5 * r.nextGaussian();
            x[t] = Math.round(Math.min(98, Math.max(2, v)) * 10) / 10.0;
        }
        String[] names = {"Bed occupancy rate", "bed_occupancy_rate", "BedOccupancy", "Room occupancy"};
        return planted(seed, Scenario.RATE, names[(int) (seed % names.length)], "%", startYear(r), x);
    }

    private static Planted temperature(long seed, Random r) {
        int years = 10 + r.nextInt(10);
        double mean = 6 + 8 * r.nextDouble();
        double[] x = new double[years * 12];
        for (int t = 0; t < x.length; t++) {
            x[t] = Math.round((mean + 8 * Math.cos(2 * Math.PI * (t % 12 + 1 - 7.5) / 12) + 1.2 * r.nextGaussian()) * 10) / 10.0;
        }
        String[] names = {"Mean air temperature", "mean_temp_c", "AirTemperature"};
        return planted(seed, Scenario.TEMPERATURE, names[(int) (seed % names.length)], "°C", startYear(r), x);
    }

    private static Planted shortSeries(long seed, Random r) {
        int kind = (int) (seed % 3);
        if (kind == 0) {
            double[] x = monthly(14 + r.nextInt(14), t -> 20_000, 0.3, 0.03, r);
            return planted(seed, Scenario.SHORT, "Arrivals", "arrivals", 2022, x);
        }
        Frequency frequency = kind == 1 ? Frequency.ANNUAL : Frequency.QUARTERLY;
        int n = kind == 1 ? 5 + r.nextInt(4) : 10 + r.nextInt(4);
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            x[t] = Math.round(500_000 * (1 + 0.03 * t) * (1 + 0.03 * r.nextGaussian()));
        }
        Period start = frequency == Frequency.ANNUAL ? Period.year(2016) : Period.quarter(2022, 1);
        return new Planted(seed, Scenario.SHORT, build("Guest nights", "nights", frequency, start, x), Optional.empty(),
                0, Optional.empty());
    }

    private static Planted longSeries(long seed, Random r) {
        double growth = (r.nextDouble() - 0.3) * 0.05;
        double[] x = monthly(360, t -> 40_000 * Math.pow(1 + growth, t / 12.0), 0.4, 0.03, r);
        return planted(seed, Scenario.LONG, "Guest nights", "nights", 1994, x);
    }

    private static Planted coarse(long seed, Random r) {
        boolean quarterly = seed % 2 == 0;
        int n = quarterly ? 40 + r.nextInt(24) : 15 + r.nextInt(20);
        double growth = (r.nextDouble() - 0.4) * 0.06;
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            double perYear = quarterly ? t / 4.0 : t;
            double seasonal = quarterly ? 1 + 0.25 * Math.cos(2 * Math.PI * (t % 4 - 2) / 4) : 1;
            x[t] = Math.round(250_000 * Math.pow(1 + growth, perYear) * seasonal * (1 + 0.02 * r.nextGaussian()));
        }
        Period start = quarterly ? Period.quarter(2005, 1) : Period.year(1995);
        return new Planted(seed, Scenario.COARSE,
                build("Visitor nights", "nights", quarterly ? Frequency.QUARTERLY : Frequency.ANNUAL, start, x),
                Optional.empty(), 0, Optional.empty());
    }

    private interface Level {
        double at(int t);
    }

    /** A monthly series: level × seasonal factor × (1 + noise), rounded to whole units. */
    private static double[] monthly(int n, Level level, double amplitude, double noise, Random r) {
        double[] x = new double[n];
        for (int t = 0; t < n; t++) {
            x[t] = Math.round(level.at(t) * season(t % 12 + 1, amplitude) * (1 + noise * r.nextGaussian()));
        }
        return x;
    }

    private static Planted planted(long seed, Scenario scenario, String name, String unit, int startYear, double[] x) {
        return new Planted(seed, scenario, build(name, unit, Frequency.MONTHLY, Period.month(startYear, 1), x),
                Optional.empty(), 0, Optional.empty());
    }

    private static Series build(String name, String unit, Frequency frequency, Period start, double[] x) {
        SeriesBuilder builder = Series.builder(name, frequency).unit(unit);
        Period p = start;
        for (double v : x) {
            if (!Double.isNaN(v)) {
                builder.put(p, v);
            }
            p = p.plus(1);
        }
        return builder.snapshot();
    }
}
