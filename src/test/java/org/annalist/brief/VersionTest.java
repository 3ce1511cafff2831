package org.annalist.brief;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The appendix prints the version the build wrote into the manifest, never Maven's SNAPSHOT qualifier. */
// Invented version strings; the expected output is the rule stated in DEVELOPERS.md (a -SNAPSHOT is a development build).
class VersionTest {

    @Test
    void aReleaseIsPrintedAsBuiltAndADevelopmentVersionWithoutItsQualifier() {
        assertThat(Version.of("0.2.0")).isEqualTo("0.2.0");
        assertThat(Version.of("0.3.0-SNAPSHOT")).isEqualTo("0.3.0 (development build)");
        assertThat(Version.of(null)).isEqualTo("development build");
        assertThat(Version.current()).doesNotContain("SNAPSHOT");
    }
}
