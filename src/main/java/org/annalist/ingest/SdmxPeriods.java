package org.annalist.ingest;

import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.series.Period;

/**
 * Reads the time periods that statistics portals write: the SDMX reporting-period syntax of
 * SDMX-CSV and JSON-stat ({@code 2024}, {@code 2024-A1}, {@code 2024-Q1}, {@code 2024-03},
 * {@code 2024-M03}, {@code 2024-W05}, {@code 2024-03-15}, {@code 2024-D075}, {@code 2024-S1}; SDMX 2.1
 * Standards, Section 6 "Technical Notes", §4.2 on time periods (the document and its §4.2.7 "Distinct
 * Range" checked in a quotation of it; the number of the reporting-period subsection, 4.2.4, and SDMX 3.0's
 * Section 6 from memory); the half-year {@code 2001-S1} under FREQ {@code S}, and {@code 2001-H1} as the
 * form ESCB exchanges agreed on, checked in the Fusion Registry knowledge base, "Time Period Format
 * Validation" and "Time Format Alternate Half Year") and the
 * compact forms of bulk downloads ({@code 2024M03}, {@code 2024Q1}, {@code 2024W05}, {@code 2024S1},
 * {@code 2024M03D15}; common practice, no source).
 *
 * <p>Half-years ({@code 2024-S1}, January–June; {@code 2024-S2}) read as half-yearly periods. Third parts
 * of a year ({@code T}) are SDMX periods with no calendar here: they are refused with a reason, as are
 * periods that are no SDMX period at all.
 */
final class SdmxPeriods {

    /** A period as read, or why it is none. */
    record Reading(Optional<Period> period, String problem) {
        static Reading of(Period period) {
            return new Reading(Optional.of(period), "");
        }

        static Reading refused(String problem) {
            return new Reading(Optional.empty(), problem);
        }
    }

    private static final Pattern YEAR = Pattern.compile("(\\d{4})(?:-?A1?)?");
    private static final Pattern PART = Pattern.compile("(\\d{4})-?([QSHTMWD])(\\d{1,3})");
    private static final Pattern MONTH = Pattern.compile("(\\d{4})-(\\d{2})");
    private static final Pattern DAY = Pattern.compile("(\\d{4})-(\\d{2})-(\\d{2})(?:T00:00(?::00)?(?:Z)?)?");
    private static final Pattern COMPACT_DAY = Pattern.compile("(\\d{4})M(\\d{2})D(\\d{2})");

    /** What the accepted forms look like, for messages. */
    static final String EXPECTED = "an SDMX period such as 2024, 2024-S1, 2024-Q1, 2024-03, 2024-M03, 2024-W05 or 2024-03-15"
            + " (or 2024M03, 2024Q1 as bulk downloads write them)";

    private SdmxPeriods() {
    }

    /** The shape a period is written in, for the facts of the file: {@code YYYY-nn}, {@code YYYY-Qn}, {@code YYYYMnn}. */
    static String shape(String cell) {
        String text = cell.strip();
        StringBuilder shape = new StringBuilder(text.length() + 2);
        int digits = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c >= '0' && c <= '9') {
                if (digits++ < 4) {
                    if (digits == 4) {
                        shape.append("YYYY");
                    }
                } else {
                    shape.append('n');
                }
            } else {
                if (digits > 0 && digits < 4) {
                    shape.append("n".repeat(digits));
                    digits = 4;
                }
                shape.append(c);
            }
        }
        return shape.toString();
    }

    static Reading read(String cell) {
        String text = cell.strip();
        try {
            Matcher m = YEAR.matcher(text);
            if (m.matches()) {
                return Reading.of(Period.year(Integer.parseInt(m.group(1))));
            }
            m = MONTH.matcher(text);
            if (m.matches()) {
                return Reading.of(Period.month(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))));
            }
            m = DAY.matcher(text);
            if (m.matches()) {
                return Reading.of(Period.day(LocalDate.of(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)),
                        Integer.parseInt(m.group(3)))));
            }
            m = COMPACT_DAY.matcher(text);
            if (m.matches()) {
                return Reading.of(Period.day(LocalDate.of(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)),
                        Integer.parseInt(m.group(3)))));
            }
            m = PART.matcher(text);
            if (m.matches()) {
                return part(text, Integer.parseInt(m.group(1)), m.group(2).charAt(0), Integer.parseInt(m.group(3)));
            }
        } catch (IllegalArgumentException | DateTimeException outOfRange) {
            return Reading.refused("'" + text + "' is not a period of the calendar (" + outOfRange.getMessage() + ")");
        }
        return Reading.refused("'" + text + "' is not a period; expected " + EXPECTED);
    }

    private static Reading part(String text, int year, char kind, int number) {
        return switch (kind) {
            case 'Q' -> Reading.of(Period.quarter(year, number));
            case 'M' -> Reading.of(Period.month(year, number));
            case 'W' -> Reading.of(Period.isoWeek(year, number));
            case 'D' -> {
                LocalDate first = LocalDate.of(year, 1, 1);
                if (number < 1 || number > first.lengthOfYear()) {
                    yield Reading.refused("'" + text + "' names day " + number + " of a year of " + first.lengthOfYear() + " days");
                }
                yield Reading.of(Period.day(first.plusDays(number - 1L)));
            }
            case 'S', 'H' -> Reading.of(Period.half(year, number));
            default -> Reading.refused("'" + text + "' is a third of a year, a period this tool has no calendar for;"
                    + " expected annual, half-yearly, quarterly, monthly, weekly or daily periods");
        };
    }
}
