package org.annalist.brief;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.annalist.series.Holiday;
import org.annalist.findings.Form;
import org.annalist.findings.Measure;
import org.annalist.findings.Analyst;
import org.annalist.ingest.SeriesKeys;

/**
 * What the user decides for the analysis instead of leaving it to the data. Empty means "decide
 * from the data" throughout.
 *
 * @param form             additive or multiplicative, forced
 * @param measure          flow or level for every series (the command line's {@code --measure})
 * @param measureBySeries  flow or level by series name or key (a spec's {@code measure}); wins over {@code measure}
 * @param holidays         a file of the user's moving holidays, estimated beside Easter
 * @param horizon          periods of outlook, 0 for none; empty for the default
 * @param perDay           analyse monthly or quarterly flows per average-length period
 */
public record AnalysisChoices(Optional<Form> form, Optional<Measure> measure,
                              Map<String, Measure> measureBySeries, Optional<Path> holidays,
                              Optional<Integer> horizon, boolean perDay) {

    public AnalysisChoices {
        Objects.requireNonNull(form, "form");
        Objects.requireNonNull(measure, "measure");
        measureBySeries = Map.copyOf(measureBySeries);
        Objects.requireNonNull(holidays, "holidays");
        Objects.requireNonNull(horizon, "horizon");
        // the front ends word their own message first (--horizon, or the spec's line and column)
        horizon.filter(h -> h < 0 || h > Analyst.MAX_HORIZON).ifPresent(h -> {
            throw new IllegalArgumentException("horizon " + h + " is not from 0 to " + Analyst.MAX_HORIZON);
        });
    }

    /** Everything decided from the data. */
    public static AnalysisChoices fromTheData() {
        return new AnalysisChoices(Optional.empty(), Optional.empty(), Map.of(), Optional.empty(), Optional.empty(),
                false);
    }

    /**
     * The measure kind declared for the series named {@code seriesName}, if any: by its name, else by its
     * key in a portal's file ({@code M.NR.DOM}, or the codes that vary, {@code DOM}), as {@code --series} takes either.
     */
    Optional<Measure> measureOf(String seriesName, SeriesKeys keys) {
        return keys.lookUp(measureBySeries, seriesName).or(() -> measure);
    }

    /** The analysis of one series with these choices and the holidays read from {@link #holidays}. */
    Analyst analystFor(String seriesName, SeriesKeys keys, List<Holiday> holidayDays) {
        return new Analyst(form, measureOf(seriesName, keys), holidayDays, horizon);
    }
}
