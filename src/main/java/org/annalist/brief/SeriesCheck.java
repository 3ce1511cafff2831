package org.annalist.brief;

import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.annalist.findings.SeriesFacts;
import org.annalist.ingest.DataProblem;
import org.annalist.ingest.ReadResult;
import org.annalist.series.Period;
import org.annalist.series.Series;
import org.annalist.series.ValueFlag;

/**
 * What {@code check} reports for one series: the findings' {@code series} block, plus the missing
 * periods, the flagged periods per flag, and the file's warnings.
 */
public record SeriesCheck(@JsonUnwrapped SeriesFacts series, List<String> missingPeriods,
                          Map<String, List<String>> flagged, List<String> warnings) {

    public static List<SeriesCheck> of(ReadResult read) {
        List<String> warnings = read.warnings().stream().map(DataProblem::toString).toList();
        List<SeriesCheck> checks = new ArrayList<>();
        for (Series s : read.series()) {
            Map<String, List<String>> flagged = new LinkedHashMap<>();
            for (ValueFlag flag : ValueFlag.values()) {
                List<String> periods = s.periodsFlagged(flag).stream().map(Period::label).toList();
                if (!periods.isEmpty()) {
                    flagged.put(flag.description(), periods);
                }
            }
            checks.add(new SeriesCheck(SeriesFacts.of(s), s.missingPeriods().stream().map(Period::label).toList(),
                    flagged, warnings));
        }
        return List.copyOf(checks);
    }
}
