package org.annalist.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.annalist.analysis.calendar.PlantedEaster;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.junit.jupiter.api.Test;

/**
 * Easter's effect is estimated only when the data's years split the days before Easter both ways
 * often enough ({@link DecisionRules#MIN_EASTER_YEARS_EACH_MONTH}): four years from 2023 hold a
 * single year with those days mostly in March, so an Easter "effect" found there would rest on that
 * one year (invented monthly series; Easter dates from {@link org.annalist.analysis.calendar.Easter},
 * Meeus' computus: 9 April 2023, 31 March 2024, 20 April 2025, 5 April 2026).
 */
class EasterEvidenceTest {

    /** Seasonal factors, January to December (invented). */
    private static final double[] SEASON = {0.80, 0.90, 0.85, 0.95, 1.00, 1.10, 1.45, 1.50, 1.05, 0.90, 0.70, 0.90};

    /** Guest nights: 2 % growth a year, the season above, 2 % noise (invented). */
    private static final PlantedEaster NIGHTS = new PlantedEaster(10_000, SEASON, 0.02);

    @Test
    void fourYearsWithOneMarchEasterCannotTellAnEasterEffectAndNoneIsEstimated() {
        // 2023: 1–8 April; 2024: 23–30 March; 2025: 12–19 April; 2026: 28 March–4 April, four days each
        for (long seed = 1; seed <= 5; seed++) {
            Series s = NIGHTS.nights(Period.month(2023, 1), Period.month(2026, 10), seed, 0);
            CalendarFinding.EasterEvidence e = EasterSplits.of(s);
            assertThat(e.mostlyEarlier()).containsExactly(2024);
            assertThat(e.mostlyLater()).containsExactly(2023, 2025);
            assertThat(e.tested()).isFalse();
            Findings f = new Analyst().withoutOutlook().analyse(s);
            // before the rule, an Easter effect was estimated here too, its p-value resting on March and April 2024 alone
            assertThat(f.calendar().effects()).as("seed %d", seed).noneMatch(x -> x.name().equals(CalendarFinding.EASTER));
            assertThat(f.calendar().easterEvidence()).isEqualTo(e);
        }
    }

    @Test
    void whenEasterMovedBetweenTheAprilsComparedTheNotesSayTheDataCannotYetTellItsEffect() {
        // April 2025 holds all 8 days before Easter, April 2024 none; 2022–2025 has one March year (2024)
        Series s = NIGHTS.nights(Period.month(2022, 1), Period.month(2025, 4), 3, 0.15);
        Findings f = new Analyst().withoutOutlook().analyse(s);
        assertThat(f.calendar().notes()).anySatisfy(n -> assertThat(n).isInstanceOf(CalendarNote.EasterUntold.class));
        assertThat(f.calendar().notes()).noneMatch(n -> n instanceof CalendarNote.EasterShift shift
                && shift.explainedPct().isPresent());
    }

    @Test
    void aPlantedEasterEffectOverManyYearsIsStillEstimatedAndKept() {
        // 2011–2025: Easter's days mostly in March in 2013, 2016 and 2024, and in April in most other years
        for (long seed = 1; seed <= 3; seed++) {
            Series s = NIGHTS.nights(Period.month(2011, 1), Period.month(2025, 10), seed, 0.15);
            CalendarFinding.EasterEvidence e = EasterSplits.of(s);
            assertThat(e.tested()).isTrue();
            assertThat(e.mostlyEarlier()).containsAll(List.of(2013, 2016, 2024));
            Findings f = new Analyst().withoutOutlook().analyse(s);
            assertThat(f.calendar().effects()).as("seed %d", seed)
                    .anyMatch(x -> x.name().equals(CalendarFinding.EASTER) && x.kept() && x.effectPct() > 0);
        }
    }

    @Test
    void quarterlyDataCountTheFirstAndSecondQuarters() {
        double[] x = new double[16];
        java.util.Arrays.fill(x, 100);
        Series s = Series.builder("arrivals", Frequency.QUARTERLY).append(Period.quarter(2021, 1), x).snapshot();
        // 2021: 4 April, days 27 March–3 April (5 in March); 2022: 17 April; 2023: 9 April; 2024: 31 March
        CalendarFinding.EasterEvidence e = EasterSplits.of(s);
        assertThat(e.mostlyEarlier()).containsExactly(2021, 2024);
        assertThat(e.mostlyLater()).containsExactly(2022, 2023);
        assertThat(e.tested()).isTrue();
        assertThat(e.months()).isFalse();
    }
}
