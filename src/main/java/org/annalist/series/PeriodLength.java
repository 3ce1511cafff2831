package org.annalist.series;

/**
 * Flows per average-length period: a month's total divided by its days and multiplied by
 * 30.4375 (= 365.25 / 12, the mean month of the Julian year; 91.3125 for quarters), so that a
 * 31-day month and a 28-day February compare on equal terms (common practice, no source).
 */
public final class PeriodLength {

    public static final double AVERAGE_MONTH_DAYS = 365.25 / 12;
    public static final double AVERAGE_QUARTER_DAYS = 365.25 / 4;

    private PeriodLength() {
    }

    /**
     * @param unit the unit of the figures per average period, e.g. {@code nights per average month}
     * @throws IllegalArgumentException for frequencies whose periods all have the same length
     */
    public static Series perAveragePeriod(Series s, String unit) {
        double average = switch (s.frequency()) {
            case MONTHLY -> AVERAGE_MONTH_DAYS;
            case QUARTERLY -> AVERAGE_QUARTER_DAYS;
            default -> throw new IllegalArgumentException("per-day figures are for monthly or quarterly data, whose "
                    + "periods differ in length; " + s.frequency() + " periods do not");
        };
        SeriesBuilder b = Series.builder(s.name(), s.frequency()).unit(unit);
        for (int i = 0; i < s.size(); i++) {
            Period p = s.period(i);
            b.put(p, s.isMissing(i) ? Double.NaN : s.value(i) / p.lengthInDays() * average, s.flags(i));
        }
        return b.snapshot();
    }
}
