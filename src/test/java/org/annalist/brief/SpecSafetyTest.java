package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.annalist.ingest.InputFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A spec reads and writes where its paths really lead, and only what it can finish. */
class SpecSafetyTest {

    @TempDir
    Path root;

    private Path spec(String yaml) throws IOException {
        Path folder = Files.createDirectories(root.resolve("specs"));
        Files.writeString(folder.resolve("nights.csv"), "period,Total\n2024-01,1\n");
        Path spec = folder.resolve("briefs.yaml");
        Files.writeString(spec, yaml);
        return spec;
    }

    @Test
    void aSymbolicLinkInsideTheFolderDoesNotLeadAnOutputOutOfIt() throws IOException {
        Path spec = spec("briefs:\n  - data: nights.csv\n    output: away/{series}.pdf\n");
        Path outside = Files.createDirectories(root.resolve("outside"));
        Files.createSymbolicLink(spec.getParent().resolve("away"), outside);
        assertThatThrownBy(() -> SpecReader.read(spec)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("briefs.yaml:3:13: output 'away/{series}.pdf' leads out of the spec's folder "
                        + "through a symbolic link");
    }

    @Test
    void aSymbolicLinkToAFileOutsideCannotBeReadAsData() throws IOException {
        Path spec = spec("briefs:\n  - data: secret.csv\n");
        Path secret = Files.writeString(root.resolve("secret.csv"), "period,Total\n2024-01,1\n");
        Files.createSymbolicLink(spec.getParent().resolve("secret.csv"), secret);
        assertThatThrownBy(() -> SpecReader.read(spec)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("data 'secret.csv' leads out of the spec's folder");
    }

    @Test
    void aSpecNamedWithADotSegmentReadsItsRelativePaths() throws IOException {
        Path spec = spec("briefs:\n  - data: nights.csv\n    output: out/{series}.pdf\n");
        Path dotted = spec.getParent().resolve(".").resolve("briefs.yaml");
        assertThat(SpecReader.read(dotted).briefs()).hasSize(1);
        assertThat(SpecReader.read(spec.getParent().resolve("sub/../briefs.yaml").normalize()).briefs()).hasSize(1);
    }

    @Test
    void aNulInAPathIsAProblemAtItsLine() throws IOException {
        Path spec = spec("briefs:\n  - data: \"nights\\0.csv\"\n");
        assertThatThrownBy(() -> SpecReader.read(spec)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("briefs.yaml:2:11: data 'nights\\0.csv' is not a path");
    }

    @Test
    void anAliasIsRefusedNotReadAsTheAnchorsName() throws IOException {
        Path spec = spec("briefs:\n  - data: nights.csv\n    organisation: &who Quennelmark Tourism\n    title: *who\n");
        assertThatThrownBy(() -> SpecReader.read(spec)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("briefs.yaml:4:12: '*who' is a YAML alias");
    }

    @Test
    void aSpecOfMoreBriefsThanTheLimitIsRefusedAtTheFirstOneOver() throws IOException {
        StringBuilder yaml = new StringBuilder("briefs:\n");
        for (int i = 0; i <= SpecReader.MAX_BRIEFS; i++) {
            yaml.append("  - data: nights.csv\n");
        }
        Path spec = spec(yaml.toString());
        assertThatThrownBy(() -> SpecReader.read(spec)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("briefs.yaml:" + (SpecReader.MAX_BRIEFS + 2) + ":5: the spec lists "
                        + (SpecReader.MAX_BRIEFS + 1) + " briefs; expected at most " + SpecReader.MAX_BRIEFS);
    }

    @Test
    void theInputLimitHasASpecKey() throws IOException {
        Job job = SpecReader.read(spec("briefs:\n  - data: nights.csv\n    max_input_mb: 2\n")).briefs().get(0).job();
        assertThat(job.input().readOptions().maxInputBytes()).isEqualTo(2L * 1024 * 1024);
        assertThat(SpecReader.read(spec("briefs:\n  - data: nights.csv\n")).briefs().get(0).job().input().readOptions()
                .maxInputBytes()).isEqualTo(InputFiles.DEFAULT_MAX_BYTES);
        assertThatThrownBy(() -> SpecReader.read(spec("briefs:\n  - data: nights.csv\n    max_input_mb: lots\n")))
                .hasMessageContaining("max_input_mb 'lots'; expected a whole number of megabytes");
    }

    @Test
    void aSpecThatIsNotAnOrdinaryFileIsRefused() throws IOException {
        Path folder = Files.createDirectories(root.resolve("spec.yaml"));
        assertThatThrownBy(() -> SpecReader.read(folder)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("is a folder; expected a brief spec in YAML");
    }

    @Test
    void aSpecInLatin1IsRefusedWithItsEncodingNamed() throws IOException {
        Path spec = spec("briefs:\n  - data: nights.csv\n");
        Files.write(spec, "briefs:\n  - data: nights.csv\n    title: F\u00eate\n".getBytes("windows-1252"));
        assertThatThrownBy(() -> SpecReader.read(spec)).isInstanceOf(SpecProblem.class)
                .hasMessageContaining("is not UTF-8 text");
    }
}
