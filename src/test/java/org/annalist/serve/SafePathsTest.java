package org.annalist.serve;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A name from the browser is a file inside its folder, or nothing. */
class SafePathsTest {

    @TempDir
    Path temp;

    @Test
    void aPlainNameInsideTheFolderIsFoundAndEveryEscapeIsNot() throws IOException {
        Path folder = Files.createDirectories(temp.resolve("served/specs"));
        Files.writeString(folder.resolve("monthly.yaml"), "briefs: []\n");
        Path outside = Files.writeString(temp.resolve("secret.yaml"), "briefs: []\n");
        Files.createSymbolicLink(folder.resolve("link.yaml"), outside);
        Path served = temp.resolve("served");
        assertThat(SafePaths.file(served, "specs/monthly.yaml")).contains(folder.resolve("monthly.yaml").toRealPath());
        for (String name : List.of("", "/etc/passwd", outside.toString(), "../secret.yaml", "specs/../../secret.yaml",
                "specs/./monthly.yaml", "specs\\monthly.yaml", "C:secret.yaml", "specs/link.yaml", "specs",
                ".hidden", "specs/monthly.yaml\u0000", "a/b/c/d/e.yaml", "specs/missing.yaml")) {
            assertThat(SafePaths.file(served, name)).as(name).isEmpty();
        }
    }

    @Test
    void anUploadsNameIsItsLastSegmentTamed() {
        assertThat(SafePaths.uploadName("C:\\Users\\me\\nights 2026.csv")).isEqualTo("nights 2026.csv");
        assertThat(SafePaths.uploadName("../../etc/passwd")).isEqualTo("passwd");
        assertThat(SafePaths.uploadName("..")).isEqualTo("upload.csv");
        assertThat(SafePaths.uploadName("a\u0000b;c.csv")).isEqualTo("a_b_c.csv");
        assertThat(SafePaths.uploadName(null)).isEqualTo("upload.csv");
    }
}
