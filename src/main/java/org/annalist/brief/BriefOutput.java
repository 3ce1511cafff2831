package org.annalist.brief;

import java.nio.file.Path;
import java.time.Instant;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.annalist.narrative.Masthead;
import org.annalist.narrative.MultiBriefViews;
import org.annalist.series.Series;

/**
 * The PDF a job writes and what goes beside it.
 *
 * @param file        where the PDF goes: a path as given, or a pattern with {@code {series}} and {@code {period}}
 * @param masthead    how the brief presents itself
 * @param sideOutputs the files written beside the PDF on request
 * @param combined    one multi-series brief of all the job's series, instead of one brief each
 */
public record BriefOutput(OutputName file, MastheadChoices masthead, Set<SideOutputs.Kind> sideOutputs,
                          Optional<Combined> combined) {

    /**
     * How a brief presents itself.
     *
     * @param title        empty to title the brief with the series name
     * @param organisation empty when none is named
     * @param logo         a PNG, JPEG or GIF printed in the masthead, checked by {@link Logo} before
     * @param paper        A4 or US Letter
     * @param language     the narrative's language: the template {@code brief_LANG.ftlx} when it
     *                     exists (FreeMarker's localized lookup), else {@code brief.ftlx}, in English
     * @param templates    a folder of templates that override the bundled ones
     * @param generatedAt  the time the brief states as made; empty for {@link GenerationTime}'s
     *                     default, resolved as each brief is made
     */
    public record MastheadChoices(String title, String organisation, Optional<Path> logo, Masthead.Paper paper,
                                  Locale language, Optional<Path> templates, Optional<Instant> generatedAt) {
        public MastheadChoices {
            Objects.requireNonNull(title, "title");
            Objects.requireNonNull(organisation, "organisation");
            Objects.requireNonNull(logo, "logo");
            Objects.requireNonNull(paper, "paper");
            Objects.requireNonNull(language, "language");
            Objects.requireNonNull(templates, "templates");
            Objects.requireNonNull(generatedAt, "generatedAt");
        }
    }

    /**
     * The multi-series brief's own choices.
     *
     * @param total  the series the others add up to, checked period by period
     * @param sortBy the order of the comparison table
     */
    public record Combined(Optional<String> total, MultiBriefViews.SortBy sortBy) {
        public Combined {
            Objects.requireNonNull(total, "total");
            Objects.requireNonNull(sortBy, "sortBy");
        }
    }

    public BriefOutput {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(masthead, "masthead");
        sideOutputs = Set.copyOf(sideOutputs);
        Objects.requireNonNull(combined, "combined");
    }

    /** A single-series brief at {@code file} with nothing beside it. */
    public static BriefOutput pdf(Path file, MastheadChoices masthead) {
        return new BriefOutput(new OutputName.AsGiven(file), masthead, Set.of(), Optional.empty());
    }

    /** The same output written into {@code folder} under its own file name. */
    BriefOutput into(Path folder) {
        return new BriefOutput(file.into(folder), masthead, sideOutputs, combined);
    }

    /**
     * The title of the brief of {@code series}: a job that names several series for a brief each
     * tells them apart by adding the series' name to its title.
     */
    String titleFor(SeriesChoice choice, Series series) {
        String title = masthead.title();
        return title.isEmpty() || combined.isPresent() || choice.names().size() <= 1 ? title
                : title + ": " + series.name();
    }
}
