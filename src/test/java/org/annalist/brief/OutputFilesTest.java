package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import org.annalist.ingest.DataProblemException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Outputs never replace an input, fail with the system's reason, fit the file system and leave no litter. */
class OutputFilesTest {

    @TempDir
    Path folder;

    @Test
    void anOutputThatIsTheDataFileIsRefusedAndTheDataKept() throws IOException {
        Path data = Files.writeString(folder.resolve("good.csv"), "period,v\n2024-01,1\n");
        assertThatThrownBy(() -> OutputFiles.write(data, new byte[] {1}, List.of(data)))
                .isInstanceOf(DataProblemException.class).hasMessageContaining("is an input of this run");
        Path link = Files.createSymbolicLink(folder.resolve("brief.pdf"), data);
        assertThatThrownBy(() -> OutputFiles.write(link, new byte[] {1}, List.of(data)))
                .isInstanceOf(DataProblemException.class).hasMessageContaining("is an input of this run");
        assertThat(Files.readString(data)).isEqualTo("period,v\n2024-01,1\n");
    }

    @Test
    void anOutputThatIsAFolderIsAProblemNotAnInternalError() throws IOException {
        Path target = Files.createDirectories(folder.resolve("brief.pdf"));
        assertThatThrownBy(() -> OutputFiles.write(target, new byte[] {1}, List.of()))
                .isInstanceOf(DataProblemException.class).hasMessageContaining("is a folder");
    }

    @Test
    void aWriteThatFailsCarriesTheSystemsReason() {
        Path tooLong = folder.resolve("a".repeat(300) + ".pdf");
        assertThatThrownBy(() -> OutputFiles.write(tooLong, new byte[] {1}, List.of()))
                .isInstanceOf(DataProblemException.class).hasMessageContaining("cannot be written (File name too long)");
    }

    @Test
    void longNamesAreShortenedToFitAndStayApart() {
        String a = "brief-" + "é".repeat(200) + "-a.pdf";
        String b = "brief-" + "é".repeat(200) + "-b.pdf";
        String fittedA = OutputFiles.fitted(a);
        assertThat(fittedA.getBytes(StandardCharsets.UTF_8).length).isLessThanOrEqualTo(255);
        assertThat(fittedA).endsWith(".pdf").isNotEqualTo(OutputFiles.fitted(b));
        assertThat(OutputFiles.fitted("short.pdf")).isEqualTo("short.pdf");
    }

    @Test
    void staleTemporaryFilesOfAKilledRunAreRemovedOnTheNextWrite() throws IOException {
        Path stale = Files.writeString(folder.resolve(".brief.pdf.k3j9x2.tmp"), "half");
        Files.setLastModifiedTime(stale, FileTime.from(Instant.now().minusSeconds(3600)));
        Path fresh = Files.writeString(folder.resolve(".other.pdf.a1b2c3.tmp"), "being written now");
        Path notOurs = Files.writeString(folder.resolve(".notes.txt.tmp"), "the user's");
        Files.setLastModifiedTime(notOurs, FileTime.from(Instant.now().minusSeconds(3600)));
        OutputFiles.write(folder.resolve("brief.pdf"), new byte[] {1, 2}, List.of());
        assertThat(stale).doesNotExist();
        assertThat(fresh).exists();
        assertThat(notOurs).exists();
        assertThat(Files.readAllBytes(folder.resolve("brief.pdf"))).containsExactly(1, 2);
    }
}
