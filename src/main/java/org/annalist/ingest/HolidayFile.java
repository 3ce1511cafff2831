package org.annalist.ingest;

import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.annalist.series.Holiday;

/**
 * Reads a file of the user's moving holidays: a header, then one line per day, {@code date,name}
 * (ISO dates, comma or semicolon separated); a holiday of several days has several lines with the
 * same name. Problems are reported as {@code FILE:LINE[:COLUMN]} like data problems. The text is
 * decoded as a data file's is ({@link TextDecoding}), so a Latin-1 file from a spreadsheet reads too.
 */
public final class HolidayFile {

    private HolidayFile() {
    }

    public static List<Holiday> read(Path file) {
        return read(file, file.toString());
    }

    /** As {@link #read(Path)}, the file named {@code name} in messages (a file kept under the user's name elsewhere). */
    public static List<Holiday> read(Path file, String name) {
        ProblemLog log = new ProblemLog(name);
        byte[] bytes = InputFiles.read(file, InputFiles.DEFAULT_MAX_BYTES, "a holiday file of date,name lines");
        // Decoded as a data file is: a byte-order mark honoured, UTF-8, else Windows-1252 (a spreadsheet's Latin-1).
        List<String> lines = List.of(TextDecoding.text(bytes, log).split("\r\n|\n|\r", -1));
        Map<String, Set<LocalDate>> holidays = new LinkedHashMap<>();
        for (int i = 1; i < lines.size(); i++) {
            String line = lines.get(i).replace("\uFEFF", "").trim();
            if (line.isEmpty()) {
                continue;
            }
            String[] cells = line.split("[,;\\t]", 2);
            if (cells.length < 2 || cells[1].isBlank()) {
                log.error(i + 1, 0, "'" + line + "' has no name; expected date,name (2026-05-14,Lantern festival)");
                continue;
            }
            try {
                holidays.computeIfAbsent(cells[1].trim(), k -> new LinkedHashSet<>()).add(LocalDate.parse(cells[0].trim()));
            } catch (DateTimeException e) {
                log.error(i + 1, 1, "'" + cells[0].trim() + "' is not a date; expected YYYY-MM-DD");
            }
        }
        log.throwIfErrors();
        if (holidays.isEmpty()) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "no holidays; expected a header and date,name lines"));
        }
        List<Holiday> entries = new ArrayList<>();
        holidays.forEach((holiday, days) -> entries.add(new Holiday(holiday, days)));
        return entries;
    }
}
