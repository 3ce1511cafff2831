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
import java.util.stream.Collectors;
import org.annalist.ingest.InputKinds;
import org.annalist.ingest.ReadOptions;
import org.annalist.narrative.Masthead;

/**
 * The spec of {@code batch FOLDER}: what a folder of data files asks for when no spec is written. Every
 * file the tool reads is taken, known by its content as a single input is (CSV and other tables, SDMX-CSV,
 * the bulk tab layout, JSON-stat, .xlsx/.xlsm/.ods workbooks); any other file is skipped with a note.
 */
public final class FolderSpec {

    private FolderSpec() {
    }

    /**
     * The briefs of a folder and the files skipped in it.
     *
     * @param spec    one entry per data file
     * @param skipped {@code NAME: why}, one per file left out (hidden files are left out without a note)
     */
    public record Listing(BriefSpec spec, List<String> skipped) {
        public Listing {
            skipped = List.copyOf(skipped);
        }
    }

    /** As {@link #list}, without the notes of what was skipped. */
    public static BriefSpec of(Path folder) {
        return list(folder).spec();
    }

    /**
     * One brief per series of every data file in the folder (by name, not in subfolders), read and
     * analysed with the defaults, written to {@code briefs/FILE-SERIES-PERIOD.pdf} inside it (FILE with
     * its extension when two files share a name: {@code visitors.csv} and {@code visitors.xlsx}).
     *
     * @throws SpecProblem when the folder cannot be listed or holds no data file
     */
    public static Listing list(Path folder) {
        Path root = folder.toAbsolutePath().normalize();
        List<BriefSpec.Entry> entries = new ArrayList<>();
        List<String> skipped = new ArrayList<>();
        try (var files = Files.list(root)) {
            List<Path> candidates = files.filter(p -> !p.getFileName().toString().startsWith(".")
                    && Files.isRegularFile(p)).sorted().toList();
            List<Path> data = new ArrayList<>();
            for (Path file : candidates) {
                Optional<String> why = InputKinds.whyNotRead(file, ReadOptions.defaults());
                if (why.isPresent()) {
                    skipped.add(file.getFileName() + ": " + why.get());
                } else {
                    data.add(file);
                }
            }
            Map<String, Long> stems = data.stream().collect(Collectors.groupingBy(FolderSpec::stem, Collectors.counting()));
            for (Path file : data) {
                String stem = stems.get(stem(file)) > 1 ? file.getFileName().toString() : stem(file);
                entries.add(new BriefSpec.Entry(0, everySeriesOf(file,
                        root.resolve("briefs").resolve(stem + "-{series}-{period}.pdf").toString())));
            }
        } catch (IOException e) {
            throw new SpecProblem(root, 1, 1, "cannot list the folder: " + e.getMessage());
        }
        if (entries.isEmpty()) {
            throw new SpecProblem(root, 1, 1, "no data files in this folder; expected one or more CSV, SDMX-CSV, "
                    + "JSON-stat files or .xlsx, .xlsm, .ods workbooks" + (skipped.isEmpty() ? ""
                    : " (skipped: " + String.join("; ", skipped) + ")"));
        }
        return new Listing(new BriefSpec(root.resolve("(folder)"), entries), skipped);
    }

    private static String stem(Path file) {
        String name = file.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
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
