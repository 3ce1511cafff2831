package org.annalist.findings;

import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Locale;
import java.util.Set;
import org.annalist.analysis.calendar.CalendarEffects;
import org.annalist.series.Series;

/**
 * Which days of the week matter to a series, read from the words of its name and unit (snake_case,
 * CamelCase and digits split into words; our rule):
 * <ul>
 * <li>{@link #NIGHTS}: a word for overnight stays (night, nights, overnight, overnights: guest
 *     nights, bed nights, room nights): Friday and Saturday nights are counted and always noted
 *     when they differ from a year earlier;</li>
 * <li>{@link #DAY_VISITS}: a word for day visits (visitor, visits, admissions, footfall,
 *     attendance, entries, tickets …) and none for nights: Saturdays and Sundays are counted and
 *     always noted;</li>
 * <li>{@link #OTHER} (road deaths, sales, temperatures …): Saturdays and Sundays are estimated as
 *     the weekday effect, and a count is noted only when that effect is significant.</li>
 * </ul>
 */
public enum WeekdayKind {
    NIGHTS, DAY_VISITS, OTHER;

    private static final Set<String> NIGHT_WORDS = Set.of("night", "nights", "overnight", "overnights");
    private static final Set<String> VISIT_WORDS = Set.of("visitor", "visitors", "visit", "visits", "admission",
            "admissions", "footfall", "attendance", "attendances", "entries", "entrances", "ticket", "tickets");

    /** The findings JSON's code: {@code nights}, {@code day_visits}, {@code other}. */
    @JsonValue
    public String code() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The days the weekday regressor counts. */
    CalendarEffects.Weekdays weekdays() {
        return this == NIGHTS ? CalendarEffects.Weekdays.FRIDAY_SATURDAY_NIGHTS : CalendarEffects.Weekdays.WEEKEND_DAYS;
    }

    public static WeekdayKind of(Series series) {
        Set<String> words = words(series.name() + " " + series.unit());
        if (words.stream().anyMatch(NIGHT_WORDS::contains)) {
            return NIGHTS;
        }
        return words.stream().anyMatch(VISIT_WORDS::contains) ? DAY_VISITS : OTHER;
    }

    /** Lower-case words: CamelCase and letter–digit boundaries split, anything but letters a separator. */
    static Set<String> words(String text) {
        String spaced = text.replaceAll("(\\p{Ll})(\\p{Lu})", "$1 $2")
                .replaceAll("(\\p{Lu})(\\p{Lu}\\p{Ll})", "$1 $2")
                .replaceAll("[^\\p{L}]+", " ");
        return java.util.Arrays.stream(spaced.toLowerCase(Locale.ROOT).trim().split(" +"))
                .filter(w -> !w.isEmpty()).collect(java.util.stream.Collectors.toUnmodifiableSet());
    }
}
