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
import org.annalist.render.AtomicFiles;
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

    /** What the folder holds, names only. */
    private List<String> listing() throws IOException {
        try (var files = Files.list(folder)) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aDiskThatFillsUpGivesItsReasonLeavesTheOldOutputWholeAndNoTemporaryFile() throws IOException {
        Path target = Files.writeString(folder.resolve("brief.pdf"), "the brief of last month");
        // the disk fills up half way through: the system's ENOSPC, as the JDK reports it
        AtomicFiles.Sink full = (out, bytes) -> {
            out.write(bytes, 0, bytes.length / 2);
            throw new IOException("No space left on device");
        };
        assertThatThrownBy(() -> OutputFiles.write(target, new byte[4096], List.of(), full))
                .isInstanceOf(DataProblemException.class)
                .hasMessageContaining("brief.pdf").hasMessageContaining("cannot be written (No space left on device)");
        assertThat(Files.readString(target)).isEqualTo("the brief of last month");
        assertThat(listing()).containsExactly("brief.pdf");
    }

    @Test
    void anOutputInsideARegularFileNamesTheFileThatIsNoFolder() throws IOException {
        Path file = Files.writeString(folder.resolve("notes.txt"), "the user's");
        for (Path target : List.of(file.resolve("brief.pdf"), file.resolve("sub/brief.pdf"))) {
            assertThatThrownBy(() -> OutputFiles.write(target, new byte[] {1}, List.of()))
                    .isInstanceOf(DataProblemException.class)
                    .hasMessageContaining("cannot be written (" + file + " is a file, not a folder)");
        }
        assertThat(Files.readString(file)).isEqualTo("the user's");
        assertThat(listing()).containsExactly("notes.txt");
    }

    @Test
    void anOutputThatIsANamedPipeIsRefusedAndLeftInPlace() throws IOException, InterruptedException {
        Path pipe = folder.resolve("brief.pdf");
        Process mkfifo = new ProcessBuilder("mkfifo", pipe.toString()).start();
        org.junit.jupiter.api.Assumptions.assumeTrue(mkfifo.waitFor() == 0, "mkfifo is available");
        assertThatThrownBy(() -> OutputFiles.write(pipe, new byte[] {1}, List.of()))
                .isInstanceOf(DataProblemException.class).hasMessageContaining("is not a regular file");
        assertThat(Files.isRegularFile(pipe)).isFalse();
        assertThat(Files.exists(pipe)).isTrue();
        assertThat(listing()).containsExactly("brief.pdf");
    }

    @Test
    void aNameThatFitsIsWrittenEvenWhereItsTemporaryNameWouldNot() throws IOException {
        // 255 bytes, the most ext4 allows: the temporary name beside it is shortened, not the output's
        Path target = folder.resolve("a".repeat(251) + ".pdf");
        OutputFiles.write(target, new byte[] {7}, List.of());
        assertThat(Files.readAllBytes(target)).containsExactly(7);
        assertThat(listing()).containsExactly(target.getFileName().toString());
    }

    @Test
    void aShortenedTemporaryFileOfAKilledRunIsStillRecognisedAndRemoved() throws IOException {
        String name = "a".repeat(251) + ".pdf";
        Path stale = Files.writeString(folder.resolve(AtomicFiles.temporaryName(name, "k3j9x2")), "half");
        Files.setLastModifiedTime(stale, FileTime.from(Instant.now().minusSeconds(3600)));
        OutputFiles.write(folder.resolve(name), new byte[] {1}, List.of());
        assertThat(stale).doesNotExist();
    }

}
