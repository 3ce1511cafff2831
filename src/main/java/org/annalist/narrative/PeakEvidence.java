package org.annalist.narrative;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.annalist.findings.SeasonalityFinding;
import org.annalist.series.Frequency;
import org.annalist.series.Period;
import org.annalist.series.Series;

/**
 * Whether the data support naming one season as the peak: the profile's highest season must have
 * been above the runner-up (the profile's second highest) in most years, that is in more than half
 * of the years in which both were observed (our rule). Two seasons close in the average profile
 * trade places from year to year; a single "peaks in August" would then claim more than the years
 * show, so both are named.
 *
 * @param peak      the profile's highest season
 * @param runnerUp  the profile's second highest season
 * @param peakWins  years in which the peak was above the runner-up
 * @param compared  years in which both were observed
 */
record PeakEvidence(SeasonalityFinding.ProfilePoint peak, SeasonalityFinding.ProfilePoint runnerUp, int peakWins,
                    int compared) {

    /** @return empty when the profile has fewer than two seasons */
    static Optional<PeakEvidence> of(Series series, List<SeasonalityFinding.ProfilePoint> profile) {
        // seasons that fall once in a calendar year; a weekday or a week of the year is not compared by year
        Frequency frequency = series.frequency();
        // (two halves of a year have no runner-up to name beside the peak)
        boolean yearly = frequency == Frequency.MONTHLY || frequency == Frequency.QUARTERLY;
        if (profile.size() < 2 || !yearly) {
            return Optional.empty();
        }
        List<SeasonalityFinding.ProfilePoint> ranked = profile.stream()
                .sorted((a, b) -> Double.compare(b.index(), a.index())).toList();
        SeasonalityFinding.ProfilePoint peak = ranked.get(0);
        SeasonalityFinding.ProfilePoint second = ranked.get(1);
        // one value of each season a calendar year: the peak's and the runner-up's of the same year
        Map<Integer, Double> peakByYear = new HashMap<>();
        Map<Integer, Double> secondByYear = new HashMap<>();
        for (int i = 0; i < series.size(); i++) {
            if (series.isMissing(i)) {
                continue;
            }
            Period p = series.period(i);
            if (p.seasonalPosition() == peak.position()) {
                peakByYear.put(p.year(), series.value(i));
            } else if (p.seasonalPosition() == second.position()) {
                secondByYear.put(p.year(), series.value(i));
            }
        }
        int wins = 0;
        int compared = 0;
        for (var e : peakByYear.entrySet()) {
            Double r = secondByYear.get(e.getKey());
            if (r != null) {
                compared++;
                wins += e.getValue() > r ? 1 : 0;
            }
        }
        return Optional.of(new PeakEvidence(peak, second, wins, compared));
    }

    /** Whether the peak beat the runner-up in more than half of the years both were observed. */
    boolean singlePeak() {
        return 2 * peakWins > compared;
    }
}
