package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.annalist.series.Holiday;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HolidayFileTest {

    @TempDir
    Path folder;

    @Test
    void daysAreGroupedByName() throws IOException {
        Path f = Files.writeString(folder.resolve("h.csv"),
                "date,name\n2025-06-27,Lantern festival\n2025-06-28,Lantern festival\n2025-10-03;Harvest fair\n");
        List<Holiday> holidays = HolidayFile.read(f);
        assertThat(holidays).extracting(Holiday::name).containsExactly("Lantern festival", "Harvest fair");
        assertThat(holidays.get(0).days()).containsExactlyInAnyOrder(LocalDate.of(2025, 6, 27), LocalDate.of(2025, 6, 28));
    }

    @Test
    void badLinesAreLocated() throws IOException {
        Path f = Files.writeString(folder.resolve("h.csv"), "date,name\n2025-02-30,X\nonly-a-date\n");
        DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> HolidayFile.read(f));
        assertThat(e.problems()).extracting(DataProblem::toString).containsExactly(
                f + ":2:1: '2025-02-30' is not a date; expected YYYY-MM-DD",
                f + ":3: 'only-a-date' has no name; expected date,name (2026-05-14,Lantern festival)");
    }
}
