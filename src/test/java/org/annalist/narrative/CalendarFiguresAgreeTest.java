package org.annalist.narrative;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.nio.file.Path;
import java.time.DayOfWeek;
import java.time.LocalDate;
import java.time.YearMonth;
import java.util.Arrays;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.findings.Analyst;
import org.annalist.findings.CalendarNote;
import org.annalist.findings.Findings;
import org.annalist.findings.Transform;
import org.annalist.ingest.Aggregation;
import org.annalist.ingest.ReadOptions;
import org.annalist.ingest.SeriesFileReader;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * The first page's calendar sentence and the methods appendix's calendar row give one effect: the
 * one recomputes from the other. On the demo's glassworks museum (invented data, demo-data/README.md),
 * worked in units, October 2026 had one Saturday or Sunday more than October 2025; the page once said
 * the difference "added about 2.2 %" (the ratio of the two changes, a base of its own) while the
 * appendix said "+2.5 % per extra Saturday or Sunday" (the effect over the average month). On the demo's
 * guest nights, worked in logs, the later Easter of April 2025 is the case where both are in %.
 */
class CalendarFiguresAgreeTest {

    private static final Pattern PAGE = Pattern.compile("the difference in Saturdays and Sundays added about ([\\d,.]+) to");
    private static final Pattern APPENDIX = Pattern.compile(
            "Saturdays and Sundays \\+([\\d,.]+) per extra Saturday or Sunday, ([\\d.]+)\u00A0% of an average month");

    @Test
    void theWeekendEffectOnThePageIsTheAppendixsEffectPerDayTimesTheExtraDays() throws IOException {
        Series visitors = museum();
        Findings findings = new Analyst().analyse(visitors);
        assertThat(findings.transform()).as("the museum's season is worked in units").isNotEqualTo(Transform.LOG);
        CalendarNote adjusted = findings.calendar().notes().stream()
                .filter(n -> n instanceof CalendarNote.CalendarAdjusted).findFirst().orElseThrow();
        String page = CalendarSentences.of(adjusted);
        String appendix = AppendixViews.calendarRow(findings, Formats.forValues(visitors.values(), Locale.UK))
                .orElseThrow().settings();
        Matcher p = PAGE.matcher(page);
        Matcher a = APPENDIX.matcher(appendix);
        assertThat(p.find()).as(page).isTrue();
        assertThat(a.find()).as(appendix).isTrue();
        // derived in the test from the calendar: Saturdays and Sundays of the two Octobers
        int extra = weekendDays(YearMonth.of(2026, 10)) - weekendDays(YearMonth.of(2025, 10));
        assertThat(extra).isEqualTo(1);
        double perDay = number(a.group(1));
        assertThat(number(p.group(1))).as(page + " against " + appendix).isEqualTo(perDay * extra);
        // the appendix's % is the effect over the average month of the values analysed
        double average = Arrays.stream(visitors.values()).filter(v -> !Double.isNaN(v)).average().orElseThrow();
        assertThat(Double.parseDouble(a.group(2))).isCloseTo(100 * perDay / average, within(0.06));
        assertThat(page).doesNotContain("%\u00A0to").doesNotContain("% to");
    }

    @Test
    void theMuseumsChangeWithoutTheWeekendRecomputesFromThePrintedValueLessThePrintedVisitors() throws IOException {
        Series visitors = museum();
        Findings findings = new Analyst().analyse(visitors);
        String page = findings.calendar().notes().stream().filter(n -> n instanceof CalendarNote.CalendarAdjusted)
                .map(CalendarSentences::of).findFirst().orElseThrow();
        Matcher p = Pattern.compile("added about ([\\d,]+) to October 2026 \\([^)]*\\); allowing for it, October 2026 was"
                + " about \\+([\\d.]+)\u00A0% on a year earlier").matcher(page);
        assertThat(p.find()).as(page).isTrue();
        // the two Octobers as the data file sums them (derived in the test; the brief's table prints them whole)
        double now = visitors.value(visitors.indexOf(Period.month(2026, 10)));
        double before = visitors.value(visitors.indexOf(Period.month(2025, 10)));
        double recomputed = 100 * ((now - number(p.group(1))) / before - 1);
        // once +7.4 %, while (13,201 − 274) / 12,025 gives +7.50 %: each value adjusted to the average calendar
        assertThat(Double.parseDouble(p.group(2))).as(page).isCloseTo(recomputed, within(0.05 + 1e-9));
    }

    @Test
    void anEasterEffectOnLogsIsTheSamePercentOnThePageAndInTheAppendix() throws IOException {
        Series nights = new SeriesFileReader(ReadOptions.defaults()).read(Path.of("demo-data/quennelmark-guest-nights.csv"))
                .series().stream().filter(s -> s.name().startsWith("Total")).findFirst().orElseThrow()
                .upTo(Period.month(2025, 4));
        Findings findings = new Analyst().withoutOutlook().analyse(nights);
        assertThat(findings.transform()).isEqualTo(Transform.LOG);
        String page = findings.calendar().notes().stream().filter(n -> n instanceof CalendarNote.CalendarAdjusted)
                .map(CalendarSentences::of).findFirst().orElseThrow();
        String appendix = AppendixViews.calendarRow(findings, Formats.forValues(nights.values(), Locale.UK))
                .orElseThrow().settings();
        Matcher p = Pattern.compile("the later Easter added about ([\\d.]+)\u00A0% to April 2025").matcher(page);
        Matcher a = Pattern.compile("Easter \\+([\\d.]+)\u00A0% for a period holding all 8 days").matcher(appendix);
        assertThat(p.find()).as(page).isTrue();
        assertThat(a.find()).as(appendix).isTrue();
        // Easter 2025 on 20 April: all 8 days before it in April; Easter 2024 on 31 March: none (the
        // published Easter table): the share moved by one whole window, so (1 + effect)^1 − 1
        assertThat(p.group(1)).isEqualTo(a.group(1));
    }

    /** The demo's museum: its daily visitors summed to months, as the demo's brief reads them. */
    private static Series museum() throws IOException {
        return new SeriesFileReader(ReadOptions.defaults().withAggregation(
                new Aggregation(Frequency.MONTHLY, Aggregation.Method.SUM)))
                .read(Path.of("demo-data/glassworks-daily-visitors.csv")).series().get(0);
    }

    private static int weekendDays(YearMonth month) {
        int n = 0;
        for (LocalDate d = month.atDay(1); !d.isAfter(month.atEndOfMonth()); d = d.plusDays(1)) {
            n += d.getDayOfWeek() == DayOfWeek.SATURDAY || d.getDayOfWeek() == DayOfWeek.SUNDAY ? 1 : 0;
        }
        return n;
    }

    private static double number(String printed) {
        return Double.parseDouble(printed.replace(",", ""));
    }
}
