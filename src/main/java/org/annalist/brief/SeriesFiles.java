package org.annalist.brief;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.Function;
import org.annalist.series.Holiday;
import org.annalist.ingest.DataProblemException;
import org.annalist.ingest.HolidayFile;
import org.annalist.ingest.ReadResult;
import org.annalist.ingest.SeriesFileReader;

/**
 * The files a run reads, each read once: a data file per reading options, with the ratio series
 * derived from it once, and each holiday file. A batch of many briefs over one file reads and
 * derives it once; a file that cannot be read is tried again by the next job that asks, and fails
 * the same way. Safe to share between threads.
 */
public final class SeriesFiles {

    /**
     * A data file as read, and the ratios its series offer (average length of stay, occupancy).
     *
     * @param read    the series and the facts about the file
     * @param derived the ratio series, in {@link DerivedSeries#of} order
     */
    public record ReadFile(ReadResult read, List<DerivedSeries.Derived> derived) {
        public ReadFile {
            derived = List.copyOf(derived);
        }
    }

    private final Map<Job.Input, ReadFile> data = new HashMap<>();
    private final Map<Path, List<Holiday>> holidays = new HashMap<>();
    private final Function<Path, String> names;
    private final boolean digests;

    /** Files named in messages and briefs as the user gave their paths. */
    public SeriesFiles() {
        this(Path::toString);
    }

    /**
     * Files named as the user gave their paths and read without their SHA-256 (which only a brief's
     * provenance states), for analyses that write no brief ({@code analyze}).
     */
    public static SeriesFiles withoutDigests() {
        return new SeriesFiles(Path::toString, false);
    }

    /**
     * Files named in messages and briefs by {@code names}: the workbench keeps an upload in a folder
     * of its own under the name the user's file has, and names it by that name alone, as the command
     * line names a file of that name in the current folder.
     */
    public SeriesFiles(Function<Path, String> names) {
        this(names, true);
    }

    private SeriesFiles(Function<Path, String> names, boolean digests) {
        this.names = Objects.requireNonNull(names, "names");
        this.digests = digests;
    }

    /** How messages and briefs name {@code file}. */
    public String shownAs(Path file) {
        return names.apply(file);
    }

    /**
     * The file as read with its options. The path is kept as given (not made absolute), since
     * messages and the brief's appendix name the file as the user wrote it ({@link #shownAs}).
     *
     * @throws DataProblemException when the file cannot be used
     */
    public synchronized ReadFile read(Job.Input input) {
        return data.computeIfAbsent(input, in -> {
            SeriesFileReader reader = new SeriesFileReader(in.readOptions());
            ReadResult read = (digests ? reader : reader.withoutDigest()).read(in.file(), shownAs(in.file()));
            return new ReadFile(read, DerivedSeries.of(read.series()));
        });
    }

    /**
     * The holidays of a holiday file ({@code date,name} lines).
     *
     * @throws DataProblemException when the file cannot be used
     */
    public synchronized List<Holiday> holidays(Path file) {
        return holidays.computeIfAbsent(file, f -> HolidayFile.read(f, shownAs(f)));
    }
}
