package org.annalist.brief;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.annalist.chart.Figure;
import org.annalist.findings.FigurePlan;
import org.annalist.findings.Decomposition;
import org.annalist.findings.Findings;
import org.annalist.render.SvgCharts;
import org.annalist.series.Series;

/**
 * Files written beside a brief on request, named after it: {@code NAME.findings.json} (the
 * findings schema), {@code NAME.components.csv} (period, observed, trend-cycle, seasonal,
 * irregular, seasonally adjusted; empty cells where not decomposed) and {@code NAME-CHART.svg}; for a
 * combined brief its small multiples ({@code NAME-multiples.svg}) and per series the data files and
 * the overview chart: {@code NAME-SERIES.findings.json}, …, {@code NAME-SERIES-overview.svg}.
 */
public final class SideOutputs {

    /** What can be written beside a brief, by the names a spec's {@code side_outputs} gives them. */
    public enum Kind { FINDINGS, COMPONENTS, CHARTS }

    private static final int CHART_HEIGHT = 265;

    private SideOutputs() {
    }

    static void write(BriefWriter.Brief brief, Series series, Set<Kind> kinds) {
        String stem = brief.file().getFileName().toString().replaceFirst("(?i)\\.pdf$", "");
        Path folder = brief.file().toAbsolutePath().getParent();
        writeData(folder, stem, brief.findings(), series, kinds);
        writeCharts(folder, stem, brief.figures(), kinds);
    }

    /** For a combined brief: its small multiples, and per series the data files and the overview chart. */
    static void write(BriefWriter.CombinedBrief brief, List<Series> series, Set<Kind> kinds) {
        String stem = brief.file().getFileName().toString().replaceFirst("(?i)\\.pdf$", "");
        Path folder = brief.file().toAbsolutePath().getParent();
        writeCharts(folder, stem, List.of(brief.multiples()), kinds);
        for (int i = 0; i < series.size(); i++) {
            String seriesStem = stem + "-" + OutputName.fileSafe(series.get(i).name());
            writeData(folder, seriesStem, brief.findings().get(i), series.get(i), kinds);
            writeCharts(folder, seriesStem, List.of(new Figure(FigurePlan.Chart.OVERVIEW, brief.overviews().get(i).chart())),
                    kinds);
        }
    }

    private static void writeData(Path folder, String stem, Findings findings, Series series,
                                  Set<Kind> kinds) {
        if (kinds.contains(Kind.FINDINGS)) {
            OutputFiles.write(folder.resolve(stem + ".findings.json"),
                    Reports.json(findings).getBytes(StandardCharsets.UTF_8), List.of());
        }
        if (kinds.contains(Kind.COMPONENTS)) {
            OutputFiles.write(folder.resolve(stem + ".components.csv"),
                    components(series, findings.decomposition()).getBytes(StandardCharsets.UTF_8), List.of());
        }
    }

    private static void writeCharts(Path folder, String stem, List<Figure> figures, Set<Kind> kinds) {
        if (kinds.contains(Kind.CHARTS)) {
            for (Figure figure : figures) {
                OutputFiles.write(folder.resolve(stem + "-" + figure.id() + ".svg"),
                        SvgCharts.svg(figure, CHART_HEIGHT), List.of());
            }
        }
    }

    static String components(Series series, Optional<Decomposition> decomposition) {
        double[] trendCycle = decomposition.map(Decomposition::trendCycle).orElse(null);
        double[] seasonal = decomposition.map(Decomposition::seasonal).orElse(null);
        double[] irregular = decomposition.map(Decomposition::irregular).orElse(null);
        double[] adjusted = decomposition.map(Decomposition::adjusted).orElse(null);
        StringBuilder csv = new StringBuilder("period,observed,trend_cycle,seasonal,irregular,seasonally_adjusted\n");
        for (int i = 0; i < series.size(); i++) {
            csv.append(series.period(i)).append(',').append(cell(series.value(i)))
                    .append(',').append(cell(trendCycle, i)).append(',').append(cell(seasonal, i))
                    .append(',').append(cell(irregular, i)).append(',').append(cell(adjusted, i)).append('\n');
        }
        return csv.toString();
    }

    private static String cell(double[] values, int i) {
        return values == null ? "" : cell(values[i]);
    }

    private static String cell(double v) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.6g", v);
    }
}
