package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A brief that cannot be written is the user's mistake, exit 2, with the system's reason and the
 * path, and leaves no temporary file; none of these cases needs privileges (the tests run as root,
 * for whom a read-only folder is writable). A full disk is in {@code OutputFilesTest}, through the
 * writer's sink.
 */
class WriteFailuresTest {

    private static final String DATA = "src/test/resources/reference/Nile.csv";

    @TempDir
    Path folder;

    private Run brief(Path output) {
        return Run.of("brief", DATA, "-o", output.toString(), "--horizon", "0", "--generated-at", "2026-11-20T08:00:00Z");
    }

    /** Every file under the folder, hidden temporary files included. */
    private long files() throws IOException {
        try (Stream<Path> walk = Files.walk(folder)) {
            return walk.filter(Files::isRegularFile).count();
        }
    }

    @Test
    void anOutputWhoseFolderIsARegularFileNamesThatFile() throws IOException {
        Path file = Files.writeString(folder.resolve("notes.txt"), "the user's");
        Run run = brief(file.resolve("brief.pdf"));
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains(file.resolve("brief.pdf") + ": cannot be written (" + file + " is a file, not a folder)")
                .hasLineCount(1);
        assertThat(Files.readString(file)).isEqualTo("the user's");
        assertThat(files()).isEqualTo(1);
    }

    @Test
    void anOutputThatIsAFolderIsSaidToBeOne() throws IOException {
        Path target = Files.createDirectories(folder.resolve("brief.pdf"));
        Run run = brief(target);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains(target + ": is a folder");
        assertThat(files()).isZero();
    }

    @Test
    void aNameTooLongForTheFileSystemGivesTheSystemsReason() throws IOException {
        Path target = folder.resolve("b".repeat(300) + ".pdf");
        Run run = brief(target);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("cannot be written (File name too long)");
        assertThat(files()).isZero();
    }

    @Test
    void aNamedPipeAsOutputIsRefusedNotReplaced() throws IOException, InterruptedException {
        Path pipe = folder.resolve("brief.pdf");
        Assumptions.assumeTrue(new ProcessBuilder("mkfifo", pipe.toString()).start().waitFor() == 0, "mkfifo is available");
        Run run = brief(pipe);
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains(pipe + ": is not a regular file");
        assertThat(Files.isRegularFile(pipe)).isFalse();
        assertThat(files()).isZero();
    }

    @Test
    void aFolderWhereNoFileCanBeMadeSaysSoRatherThanNamingATemporaryFile() throws IOException {
        // /proc takes no new files, even from root; the system's error names only the temporary file
        Path proc = Path.of("/proc");
        Assumptions.assumeTrue(Files.isDirectory(proc.resolve("self")), "a Linux /proc");
        Run run = brief(proc.resolve("brief.pdf"));
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).isEqualTo(proc.resolve("brief.pdf") + ": cannot be written (no file can be created in that "
                + "folder)" + System.lineSeparator());
    }

    @Test
    void theLongestNameTheFileSystemTakesIsWritten() throws IOException {
        Path target = folder.resolve("c".repeat(251) + ".pdf");
        Run run = brief(target);
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(target).isRegularFile();
        assertThat(files()).isEqualTo(1);
    }
}
