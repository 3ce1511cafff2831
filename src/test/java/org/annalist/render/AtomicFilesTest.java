package org.annalist.render;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {

    @TempDir
    Path folder;

    @Test
    void replacesTheFileWholeAndLeavesNoTemporaryFile() throws IOException {
        Path target = Files.writeString(folder.resolve("brief.pdf"), "old");
        AtomicFiles.write(target, "new".getBytes());
        assertThat(Files.readString(target)).isEqualTo("new");
        try (var files = Files.list(folder)) {
            assertThat(files).containsExactly(target);
        }
    }

    @Test
    void aNewFileGetsThePermissionsOfAnOrdinaryNewFileNotOwnerOnly() throws IOException {
        Assumptions.assumeTrue(folder.getFileSystem().supportedFileAttributeViews().contains("posix"));
        Path ordinary = Files.createFile(folder.resolve("ordinary.txt"));   // as the user's umask makes it
        Path target = folder.resolve("brief.pdf");
        AtomicFiles.write(target, new byte[] {1});
        assertThat(Files.getPosixFilePermissions(target)).isEqualTo(Files.getPosixFilePermissions(ordinary));
    }

    @Test
    void aReplacedFileKeepsItsPermissions() throws IOException {
        Assumptions.assumeTrue(folder.getFileSystem().supportedFileAttributeViews().contains("posix"));
        Path target = Files.writeString(folder.resolve("brief.pdf"), "old");
        Set<PosixFilePermission> groupReadable = PosixFilePermissions.fromString("rw-r-----");
        Files.setPosixFilePermissions(target, groupReadable);
        AtomicFiles.write(target, "new".getBytes());
        assertThat(Files.getPosixFilePermissions(target)).isEqualTo(groupReadable);
    }

    @Test
    void createsMissingFolders() throws IOException {
        Path target = folder.resolve("out/2026-10/brief.pdf");
        AtomicFiles.write(target, new byte[] {1, 2, 3});
        assertThat(Files.readAllBytes(target)).containsExactly(1, 2, 3);
    }

    @Test
    void aTargetThatIsAFolderIsLeftAsItWas() throws IOException {
        Path occupied = Files.createDirectory(folder.resolve("brief.pdf"));
        Files.writeString(occupied.resolve("keep.txt"), "kept");
        assertThatThrownBy(() -> AtomicFiles.write(occupied, "x".getBytes())).isInstanceOf(IOException.class);
        assertThat(Files.readString(occupied.resolve("keep.txt"))).isEqualTo("kept");
        try (var files = Files.list(folder)) {
            assertThat(files).containsExactly(occupied);
        }
    }

    @Test
    void aTemporaryNameFitsTheFileSystemAndKeepsTheExtension() {
        // the longest random part: an unsigned long in base 36 has 13 digits
        String random = Long.toUnsignedString(-1L, 36);
        for (String name : new String[] {"brief.pdf", "a".repeat(251) + ".pdf", "é".repeat(125) + ".findings.json"}) {
            String temporary = AtomicFiles.temporaryName(name, random);
            assertThat(temporary.getBytes(java.nio.charset.StandardCharsets.UTF_8).length).as(name).isLessThanOrEqualTo(255);
            assertThat(temporary).startsWith(".").endsWith((name.endsWith(".json") ? ".json." : ".pdf.") + random + ".tmp");
        }
        assertThat(AtomicFiles.temporaryName("brief.pdf", "x1")).isEqualTo(".brief.pdf.x1.tmp");
    }

}
