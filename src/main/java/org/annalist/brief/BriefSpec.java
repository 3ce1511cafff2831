package org.annalist.brief;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A brief spec: the briefs an analyst makes every month, described once in YAML
 * ({@link SpecReader} validates it before any work) or taken from a folder of CSV files
 * ({@link FolderSpec}). Each entry is a {@link Job}, so a spec asks for what the command line can.
 * Our own keys (documented in the README):
 *
 * <pre>
 * briefs:
 *   - data: data/guest-nights.csv               # required
 *     series: [Total, Domestic]                 # default: the file's only series
 *     title: Guest nights in Quennelmark        # default: the series name
 *     organisation: Quennelmark Visitor Board   # default: none
 *     logo: logo.png                            # a PNG, JPEG or GIF printed in the masthead
 *     measure: {Total: flow}                    # flow or level per series; default: from unit and name
 *     unit: {Total: nights}                     # overrides the unit read from the file
 *     period: 2026-10                           # the latest period to report; default: the last in the data
 *     paper: a4                                 # a4 or letter
 *     language: en                              # the narrative's language; English for now
 *     templates: templates/                     # a folder of brief.ftlx / brief.css overrides
 *     output: out/{series}-{period}.pdf         # {series} and {period} are filled in
 *     generated_at: 2026-11-20T08:00:00Z        # pins the stated time, for identical output
 *     horizon: 14                               # periods of outlook; 0 for none
 *     side_outputs: [findings, components, charts]   # JSON, components CSV, SVG charts beside the PDF
 *     combined: true                            # one multi-series brief of all the series
 *     total: Total                              # the series the others add up to (checked)
 *     sort_by: change                           # order, name, latest, change or year_to_date
 *     form: multiplicative                      # auto, additive or multiplicative (--form)
 *     per_day: true                             # monthly/quarterly flows per average-length period (--per-day)
 *     holidays: holidays.csv                    # your moving holidays, date,name lines (--holidays)
 *     date_order: day-first                     # auto, day-first or month-first (--date-order)
 *     decimal_mark: comma                       # auto, point or comma (--decimal-mark)
 *     aggregate: month                          # week, month, quarter or year (--aggregate)
 *     aggregate_by: mean                        # sum or mean; needs aggregate (--aggregate-by)
 *     max_input_mb: 1024                        # refuse a bigger data file (--max-input-mb; default 512)
 * </pre>
 *
 * Paths resolve against the spec's folder and may not leave its folder tree unless written as
 * absolute paths. A brief naming several series makes one brief per series, unless it is combined.
 *
 * @param file   the spec file, for messages
 * @param briefs its entries, in order
 */
public record BriefSpec(Path file, List<Entry> briefs) {

    /** The languages the narrative is written in. */
    static final Set<String> LANGUAGES = Set.of("en");

    /**
     * One entry of {@code briefs}.
     *
     * @param line where it starts in the spec, for messages; 0 for an entry not written in one
     *             (a folder's)
     * @param job  what it asks for
     */
    public record Entry(int line, Job job) {
        public Entry {
            Objects.requireNonNull(job, "job");
            job.requireBrief();
        }
    }

    public BriefSpec {
        Objects.requireNonNull(file, "file");
        briefs = List.copyOf(briefs);
    }

    /** The same briefs written into {@code folder}, each under its output pattern's file name. */
    public BriefSpec withOutputFolder(Path folder) {
        return new BriefSpec(file, briefs.stream().map(e -> new Entry(e.line(), new Job(e.job().input(),
                e.job().series(), e.job().analysis(), e.job().brief().map(b -> b.into(folder))))).toList());
    }
}
