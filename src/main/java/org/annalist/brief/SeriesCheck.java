package org.annalist.brief;

import com.fasterxml.jackson.annotation.JsonInclude;
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
 * periods, the flagged periods per flag, and the file's warnings; for a file of a statistics
 * portal also the series' key ({@code M.NR.AT}) and the data set's shared dimensions (both left out
 * of the JSON when empty); for a workbook the sheet read (left out for other files).
 */
public record SeriesCheck(@JsonUnwrapped SeriesFacts series, List<String> missingPeriods,
                          Map<String, List<String>> flagged, List<String> warnings,
                          @JsonInclude(JsonInclude.Include.NON_EMPTY) String key,
                          @JsonInclude(JsonInclude.Include.NON_EMPTY) String dataset,
                          @JsonInclude(JsonInclude.Include.NON_NULL) ReadResult.Sheet sheet) {

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
                    flagged, warnings, read.keys().of(s.name()).map(k -> k.key()).orElse(""), read.keys().description(),
                    read.sheet().orElse(null)));
        }
        return List.copyOf(checks);
    }
}
