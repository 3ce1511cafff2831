package org.annalist.ingest;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.file.Path;
import java.util.List;
import org.annalist.series.Holiday;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Input files must be ordinary files under a size limit: a folder, a device or a pipe never reaches the reader. */
class InputBoundsTest {

    @TempDir
    Path folder;

    private static String refusal(Path file, ReadOptions options) {
        DataProblemException e = catchThrowableOfType(DataProblemException.class,
                () -> new SeriesFileReader(options).read(file));
        assertThat(e).as("refused: " + file).isNotNull();
        assertThat(e.problems()).hasSize(1);
        return e.problems().get(0).toString();
    }

    @Test
    void aFolderIsRefusedAsAFolder() {
        assertThat(refusal(folder, ReadOptions.defaults())).isEqualTo(folder + ": is a folder; expected a CSV file");
    }

    @Test
    void aDeviceThatNeverEndsIsRefusedBeforeReading() {
        Path zero = Path.of("/dev/zero");
        if (!java.nio.file.Files.exists(zero)) {
            return;   // not a Unix system
        }
        assertThat(refusal(zero, ReadOptions.defaults())).startsWith("/dev/zero: is not an ordinary file");
    }

    @Test
    void aNamedPipeIsRefusedWithoutWaitingForAWriter() throws Exception {
        Path fifo = folder.resolve("pipe.csv");
        Process mkfifo;
        try {
            mkfifo = new ProcessBuilder("mkfifo", fifo.toString()).start();
        } catch (IOException noMkfifo) {
            return;   // not a Unix system
        }
        assertThat(mkfifo.waitFor()).isZero();
        assertThat(refusal(fifo, ReadOptions.defaults())).startsWith(fifo + ": is not an ordinary file");
    }

    @Test
    void aFileOverTheLimitIsRefusedWithTheLimitAndTheWayToRaiseIt() throws IOException {
        Path big = folder.resolve("big.csv");
        StringBuilder text = new StringBuilder("day,v\n");
        java.time.LocalDate day = java.time.LocalDate.of(1900, 1, 1);
        for (int r = 0; r < 150_000; r++) {
            text.append(day.plusDays(r)).append(",1\n");   // 13 bytes a row: about 1.9 MB
        }
        java.nio.file.Files.writeString(big, text);
        assertThat(refusal(big, ReadOptions.defaults().withMaxInputBytes(1024 * 1024)))
                .contains("is larger than the limit of 1 MB").contains("--max-input-mb");
        assertThat(new SeriesFileReader(ReadOptions.defaults().withMaxInputBytes(3 * 1024 * 1024)).read(big)
                .rowsRead()).isEqualTo(150_000);
    }

    @Test
    void aHolidayFileInLatin1IsReadAsADataFileIs() throws IOException {
        Path latin = folder.resolve("holidays.csv");
        java.nio.file.Files.write(latin, "date,name\n2024-05-09,Fête du lac\n".getBytes(Charset.forName("windows-1252")));
        List<Holiday> holidays = HolidayFile.read(latin);
        assertThat(holidays).extracting(Holiday::name).containsExactly("Fête du lac");
    }

    @Test
    void aHolidayFileThatIsAFolderIsRefusedAsOne() {
        DataProblemException e = catchThrowableOfType(DataProblemException.class, () -> HolidayFile.read(folder));
        assertThat(e.problems().get(0).message()).isEqualTo("is a folder; expected a holiday file of date,name lines");
    }
}
