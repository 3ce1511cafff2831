package org.annalist.series;

import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.temporal.ChronoField;
import java.time.temporal.IsoFields;
import java.util.Locale;
import java.util.Objects;

/**
 * A point on a series' calendar: a year, half-year, quarter, month, ISO week, day or business day.
 *
 * <p>Each period is a frequency plus a running index, so that arithmetic is plain integer
 * arithmetic: the index is the year (annual), {@code 2·year + half − 1}, {@code 4·year + quarter − 1}, {@code 12·year + month − 1},
 * the number of whole weeks from the Monday 1969-12-29 (weekly), the ISO epoch day (daily), or the
 * number of weekdays from that same Monday (business-daily). Periods of different frequencies are
 * never compared.
 *
 * <p>Labels follow the findings JSON contract: {@code 1898}, {@code 2024-S1} (a half-year, as SDMX writes it), {@code 1960-Q1}, {@code 1949-01},
 * {@code 2024-W05} (ISO 8601 week-based year), {@code 2024-03-01}.
 */
public record Period(Frequency frequency, long index) implements Comparable<Period> {

    /** Epoch day of Monday 1969-12-29, the Monday on or before 1970-01-01 (a Thursday). */
    private static final long FIRST_MONDAY_EPOCH_DAY = -3;
    private static final String[] MONTH_ABBREVIATIONS =
            {"Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"};
    private static final String[] WEEKDAY_ABBREVIATIONS = {"Mon", "Tue", "Wed", "Thu", "Fri", "Sat", "Sun"};

    public Period {
        Objects.requireNonNull(frequency, "frequency");
    }

    public static Period year(int year) {
        return new Period(Frequency.ANNUAL, year);
    }

    /** Half {@code half} (1: January–June, 2: July–December) of {@code year}. */
    public static Period half(int year, int half) {
        if (half < 1 || half > 2) {
            throw new IllegalArgumentException("half must be 1 or 2, was " + half);
        }
        return new Period(Frequency.HALF_YEARLY, 2L * year + half - 1);
    }

    public static Period quarter(int year, int quarter) {
        if (quarter < 1 || quarter > 4) {
            throw new IllegalArgumentException("quarter must be 1 to 4, was " + quarter);
        }
        return new Period(Frequency.QUARTERLY, 4L * year + quarter - 1);
    }

    public static Period month(int year, int month) {
        if (month < 1 || month > 12) {
            throw new IllegalArgumentException("month must be 1 to 12, was " + month);
        }
        return new Period(Frequency.MONTHLY, 12L * year + month - 1);
    }

    /** ISO 8601 week {@code week} of week-based year {@code weekYear}; week 53 only in years that have it. */
    public static Period isoWeek(int weekYear, int week) {
        LocalDate anyDayOfYear = LocalDate.of(weekYear, 6, 1);
        long weeksInYear = anyDayOfYear.range(IsoFields.WEEK_OF_WEEK_BASED_YEAR).getMaximum();
        if (week < 1 || week > weeksInYear) {
            throw new IllegalArgumentException(
                    "week-based year " + weekYear + " has weeks 1 to " + weeksInYear + ", not " + week);
        }
        LocalDate monday = anyDayOfYear.with(IsoFields.WEEK_OF_WEEK_BASED_YEAR, week).with(DayOfWeek.MONDAY);
        return containing(Frequency.WEEKLY, monday);
    }

    public static Period day(LocalDate date) {
        return containing(Frequency.DAILY, date);
    }

    /**
     * The period of {@code frequency} that contains {@code date}.
     *
     * @throws IllegalArgumentException for a Saturday or Sunday in a business-daily calendar
     */
    public static Period containing(Frequency frequency, LocalDate date) {
        long epochDay = date.toEpochDay();
        return switch (frequency) {
            case ANNUAL -> year(date.getYear());
            case HALF_YEARLY -> half(date.getYear(), (date.getMonthValue() + 5) / 6);
            case QUARTERLY -> quarter(date.getYear(), (date.getMonthValue() + 2) / 3);
            case MONTHLY -> month(date.getYear(), date.getMonthValue());
            case WEEKLY -> new Period(frequency, Math.floorDiv(epochDay - FIRST_MONDAY_EPOCH_DAY, 7));
            case DAILY -> new Period(frequency, epochDay);
            case BUSINESS_DAILY -> {
                long sinceMonday = epochDay - FIRST_MONDAY_EPOCH_DAY;
                long weekday = Math.floorMod(sinceMonday, 7);
                if (weekday >= 5) {
                    throw new IllegalArgumentException(date + " is a " + date.getDayOfWeek()
                            + ", which a business-daily calendar does not have");
                }
                yield new Period(frequency, Math.floorDiv(sinceMonday, 7) * 5 + weekday);
            }
        };
    }

    /** The period {@code steps} periods later (earlier when negative). */
    public Period plus(long steps) {
        return new Period(frequency, Math.addExact(index, steps));
    }

    /** Number of periods from this one to {@code later} (negative when {@code later} is earlier). */
    public long until(Period later) {
        requireSameFrequency(later);
        return later.index - index;
    }

    /** First calendar day of the period. */
    public LocalDate startDate() {
        return switch (frequency) {
            case ANNUAL -> LocalDate.of(Math.toIntExact(index), 1, 1);
            case HALF_YEARLY -> LocalDate.of(Math.toIntExact(Math.floorDiv(index, 2)), 6 * (int) Math.floorMod(index, 2) + 1, 1);
            case QUARTERLY -> LocalDate.of(Math.toIntExact(Math.floorDiv(index, 4)), 3 * (int) Math.floorMod(index, 4) + 1, 1);
            case MONTHLY -> LocalDate.of(Math.toIntExact(Math.floorDiv(index, 12)), (int) Math.floorMod(index, 12) + 1, 1);
            case WEEKLY -> LocalDate.ofEpochDay(index * 7 + FIRST_MONDAY_EPOCH_DAY);
            case DAILY -> LocalDate.ofEpochDay(index);
            case BUSINESS_DAILY -> LocalDate.ofEpochDay(
                    Math.floorDiv(index, 5) * 7 + Math.floorMod(index, 5) + FIRST_MONDAY_EPOCH_DAY);
        };
    }

    /** Last calendar day of the period. */
    public LocalDate endDate() {
        return switch (frequency) {
            case DAILY, BUSINESS_DAILY -> startDate();
            default -> plus(1).startDate().minusDays(1);
        };
    }

    /** Number of calendar days the period spans (28 to 31 for a month, 1 for a day). */
    public int lengthInDays() {
        return (int) (endDate().toEpochDay() - startDate().toEpochDay() + 1);
    }

    /** The calendar year; for ISO weeks the week-based year, so 2021-01-01 lies in week 2020-W53. */
    public int year() {
        // the arithmetic of startDate without making the date: a bulk analysis asks millions of periods their year
        return switch (frequency) {
            case ANNUAL -> validYear(index);
            case HALF_YEARLY -> validYear(Math.floorDiv(index, 2));
            case QUARTERLY -> validYear(Math.floorDiv(index, 4));
            case MONTHLY -> validYear(Math.floorDiv(index, 12));
            case WEEKLY -> startDate().get(IsoFields.WEEK_BASED_YEAR);
            case DAILY, BUSINESS_DAILY -> startDate().getYear();
        };
    }

    /** The year as {@link LocalDate#of} takes it: an int, within the years a date can have (else it throws as that does). */
    private static int validYear(long year) {
        return ChronoField.YEAR.checkValidIntValue(Math.toIntExact(year));
    }

    /**
     * 1-based position within the seasonal cycle: month 1–12, half 1–2, quarter 1–4, ISO week 1–53, weekday
     * 1–7 (Monday first; 1–5 for business days), and 1 for annual data.
     */
    public int seasonalPosition() {
        return switch (frequency) {
            case ANNUAL -> 1;
            case HALF_YEARLY -> (int) Math.floorMod(index, 2) + 1;
            case QUARTERLY -> (int) Math.floorMod(index, 4) + 1;
            case MONTHLY -> (int) Math.floorMod(index, 12) + 1;
            case WEEKLY -> startDate().get(IsoFields.WEEK_OF_WEEK_BASED_YEAR);
            case DAILY -> startDate().getDayOfWeek().getValue();
            case BUSINESS_DAILY -> (int) Math.floorMod(index, 5) + 1;
        };
    }

    /** English label of the seasonal position: {@code Jul}, {@code H2} (a half; its label is SDMX's {@code 2024-S2}), {@code Q3}, {@code W05}, {@code Mon}. */
    public String seasonLabel() {
        int position = seasonalPosition();
        return switch (frequency) {
            case ANNUAL -> String.valueOf(year());
            case HALF_YEARLY -> "H" + position;
            case QUARTERLY -> "Q" + position;
            case MONTHLY -> MONTH_ABBREVIATIONS[position - 1];
            case WEEKLY -> String.format(Locale.ROOT, "W%02d", position);
            case DAILY, BUSINESS_DAILY -> WEEKDAY_ABBREVIATIONS[position - 1];
        };
    }

    /** The ISO label of the findings JSON, e.g. {@code 1949-01}. */
    public String label() {
        return switch (frequency) {
            case ANNUAL -> String.valueOf(index);
            case HALF_YEARLY -> year() + "-S" + seasonalPosition();
            case QUARTERLY -> year() + "-Q" + seasonalPosition();
            case MONTHLY -> String.format(Locale.ROOT, "%d-%02d", year(), seasonalPosition());
            case WEEKLY -> String.format(Locale.ROOT, "%d-W%02d", year(), seasonalPosition());
            case DAILY, BUSINESS_DAILY -> startDate().toString();
        };
    }

    @Override
    public int compareTo(Period other) {
        requireSameFrequency(other);
        return Long.compare(index, other.index);
    }

    @Override
    public String toString() {
        return label();
    }

    private void requireSameFrequency(Period other) {
        if (other.frequency != frequency) {
            throw new IllegalArgumentException(
                    "cannot compare a " + frequency + " period with a " + other.frequency + " period");
        }
    }

    // equals and hashCode written out as the record would make them (the same comparison, the same
    // hash): a record's own are linked through method handles on their first call, some 10-25 ms of
    // a cold brief's start-up each (README, "Start-up and memory")
    @Override
    public boolean equals(Object other) {
        return other instanceof Period that && frequency == that.frequency && index == that.index;
    }

    @Override
    public int hashCode() {
        return 31 * Objects.hashCode(frequency) + Long.hashCode(index);
    }
}
