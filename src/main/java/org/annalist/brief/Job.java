package org.annalist.brief;

import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;
import org.annalist.ingest.ReadOptions;

/**
 * One piece of work for the pipeline, described the same way whoever asks for it — {@code analyze},
 * {@code brief}, {@code demo}, or an entry of a brief spec: the file and how to read it, which
 * series, the analysis choices, and what to make of the findings. {@link BriefPipeline} runs it
 * through the same steps every time (read → select → analyse → outputs), so that an option means
 * the same thing on the command line and in a spec.
 *
 * @param input    the data file and how to read it
 * @param series   which series, prepared how: per-day figures, latest period, unit overrides
 * @param analysis the choices the analysis takes from the user rather than from the data
 * @param brief    the PDF to write and what goes beside it; empty when only the findings are
 *                 wanted ({@code analyze})
 */
public record Job(Input input, SeriesChoice series, AnalysisChoices analysis, Optional<BriefOutput> brief) {

    /**
     * The data file and the reading options for what the data alone cannot say.
     *
     * @param file        as the user named it: messages and the brief's appendix print it so
     * @param readOptions day/month order, decimal mark, aggregation
     */
    public record Input(Path file, ReadOptions readOptions) {
        public Input {
            Objects.requireNonNull(file, "file");
            Objects.requireNonNull(readOptions, "readOptions");
        }

        // equals and hashCode written out as the record would make them (the same comparison, the same
        // hash): a record's own are linked through method handles on their first call, some 10-25 ms of
        // a cold brief's start-up each (README, "Start-up and memory")
        @Override
        public boolean equals(Object other) {
            return other instanceof Input that && file.equals(that.file) && readOptions.equals(that.readOptions);
        }

        @Override
        public int hashCode() {
            return 31 * file.hashCode() + readOptions.hashCode();
        }
    }

    public Job {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(series, "series");
        Objects.requireNonNull(analysis, "analysis");
        Objects.requireNonNull(brief, "brief");
    }

    /** The PDF part of the job, for the steps that write one. */
    BriefOutput requireBrief() {
        return brief.orElseThrow(() -> new IllegalStateException("this job asks for findings only, not a brief"));
    }
}
