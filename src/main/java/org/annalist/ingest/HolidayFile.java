package org.annalist.ingest;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
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
 * same name. Problems are reported as {@code FILE:LINE[:COLUMN]} like data problems.
 */
public final class HolidayFile {

    private HolidayFile() {
    }

    public static List<Holiday> read(Path file) {
        String name = file.toString();
        ProblemLog log = new ProblemLog(name);
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "no such file; expected a holiday file of date,name lines"));
        } catch (IOException e) {
            throw new DataProblemException(new DataProblem(name, 0, 0, "cannot be read (" + e.getMessage() + ")"));
        }
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
