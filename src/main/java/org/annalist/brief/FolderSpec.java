package org.annalist.brief;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.annalist.ingest.ReadOptions;
import org.annalist.narrative.Masthead;

/** The spec of {@code batch FOLDER}: what a folder of CSV files asks for when no spec is written. */
public final class FolderSpec {

    private FolderSpec() {
    }

    /**
     * One brief per series of every CSV file in the folder (by name, not in subfolders), read and
     * analysed with the defaults, written to {@code briefs/FILE-SERIES-PERIOD.pdf} inside it.
     *
     * @throws SpecProblem when the folder cannot be listed or holds no CSV file
     */
    public static BriefSpec of(Path folder) {
        Path root = folder.toAbsolutePath().normalize();
        List<BriefSpec.Entry> entries = new ArrayList<>();
        try (var files = Files.list(root)) {
            List<Path> csvs = files.filter(p -> p.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")
                    && Files.isRegularFile(p)).sorted().toList();
            for (Path csv : csvs) {
                String stem = csv.getFileName().toString().replaceFirst("(?i)\\.csv$", "");
                entries.add(new BriefSpec.Entry(0, everySeriesOf(csv,
                        root.resolve("briefs").resolve(stem + "-{series}-{period}.pdf").toString())));
            }
        } catch (IOException e) {
            throw new SpecProblem(root, 1, 1, "cannot list the folder: " + e.getMessage());
        }
        if (entries.isEmpty()) {
            throw new SpecProblem(root, 1, 1, "no CSV files in this folder; expected one or more *.csv");
        }
        return new BriefSpec(root.resolve("(folder)"), entries);
    }

    private static Job everySeriesOf(Path csv, String output) {
        BriefOutput.MastheadChoices masthead = new BriefOutput.MastheadChoices("", "", Optional.empty(),
                Masthead.Paper.A4, Locale.forLanguageTag("en"), Optional.empty(), Optional.empty());
        return new Job(new Job.Input(csv, ReadOptions.defaults()),
                new SeriesChoice(List.of(), SeriesChoice.WhenUnnamed.EVERY_SERIES, Optional.empty(), Map.of()),
                AnalysisChoices.fromTheData(),
                Optional.of(new BriefOutput(new OutputName.Pattern(output), masthead, Set.of(), Optional.empty())));
    }
}
