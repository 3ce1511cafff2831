package org.annalist.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.annalist.LicencesTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.AutoComplete;

/**
 * What the build puts in the distribution from the commands (the completion script, the demo's data
 * folder), and the licence texts it copies from {@code src/dist/licences/} into {@code licences/}.
 */
class DistributionPartsTest {

    @TempDir
    Path temp;

    @Test
    void completionScriptOffersEveryCommandAndItsOptions() {
        // the build generates completion/annalist.bash the same way (picocli.AutoComplete on the commands)
        String script = AutoComplete.bash("annalist", Main.commandLine());
        for (String command : new String[] {"check", "analyze", "brief", "batch", "demo"}) {
            assertThat(script).contains(command);
        }
        assertThat(script).contains("--horizon", "--generated-at", "--jobs", "ZSH_VERSION");
    }

    @Test
    void demoReadsTheDataOfTheWorkingFolderFirst() throws Exception {
        Path here = Files.createDirectories(temp.resolve("work/demo-data"));
        Path home = Files.createDirectories(temp.resolve("installed/demo-data")).getParent();
        assertThat(DemoCommand.defaultData(here, Optional.of(home.toString()))).isEqualTo(here);
    }

    @Test
    void demoReadsTheInstalledDataWhenTheWorkingFolderHasNone() throws Exception {
        Path here = temp.resolve("work/demo-data");
        Path home = Files.createDirectories(temp.resolve("installed/demo-data")).getParent();
        assertThat(DemoCommand.defaultData(here, Optional.of(home.toString()))).isEqualTo(home.resolve("demo-data"));
    }

    @Test
    void demoKeepsTheWorkingFolderInItsMessageWhenNeitherHasData() {
        Path here = temp.resolve("work/demo-data");
        assertThat(DemoCommand.defaultData(here, Optional.of(temp.resolve("installed").toString()))).isEqualTo(here);
        assertThat(DemoCommand.defaultData(here, Optional.empty())).isEqualTo(here);
    }

    /** The folder the build copies into the distribution's {@code licences/} (pom.xml, the antrun "distribution" step). */
    static final Path LICENCES = Path.of("src/dist/licences");

    /** One text per licence family, shared by every library of that family (the GPL 3 because the LGPL 3 builds on it). */
    private static final Map<LicencesTest.Family, List<String>> FAMILY_TEXTS = Map.of(
            LicencesTest.Family.APACHE_2, List.of("Apache-2.0.txt"),
            LicencesTest.Family.LGPL, List.of("LGPL-2.1.txt", "LGPL-3.txt", "GPL-3.txt"),
            LicencesTest.Family.EPL, List.of("EPL-2.0.txt"),
            LicencesTest.Family.MPL, List.of("MPL-2.0.txt"));

    /** A line of LIBRARIES.txt that names a library's own text: {@code group:artifact   FILE}. */
    private static final Pattern OWN_TEXT = Pattern.compile("^([\\w.-]+:[\\w.-]+)\\s+(\\S+)$");

    @Test
    void everyBundledLibraryHasItsLicenceTextShipped() throws Exception {
        // THIRD-PARTY is written by the build before the tests (see LicencesTest)
        List<LicencesTest.Library> bundled = LicencesTest.libraries(Files.readAllLines(LicencesTest.THIRD_PARTY));
        assertThat(bundled).isNotEmpty();
        Map<String, String> ownTexts = new java.util.HashMap<>();
        for (String line : Files.readAllLines(LICENCES.resolve("LIBRARIES.txt"))) {
            Matcher m = OWN_TEXT.matcher(line.strip());
            if (m.matches()) {
                ownTexts.put(m.group(1), m.group(2));
            }
        }
        for (LicencesTest.Library library : bundled) {
            String artifact = library.coordinates().replaceFirst(":[^:]+$", "");
            List<LicencesTest.Family> families = library.licences().stream().map(LicencesTest.Family::of)
                    .flatMap(Optional::stream).toList();
            boolean notice = families.contains(LicencesTest.Family.BSD) || families.contains(LicencesTest.Family.MIT);
            if (notice) {
                // BSD and MIT texts carry the library's own copyright line: a text of its own
                assertThat(ownTexts).as("LIBRARIES.txt names the licence text of " + library).containsKey(artifact);
            }
            for (LicencesTest.Family family : families) {
                for (String text : FAMILY_TEXTS.getOrDefault(family, List.of())) {
                    assertThat(LICENCES.resolve(text)).as(family + " text for " + library).isRegularFile();
                }
            }
        }
        for (String text : ownTexts.values()) {
            assertThat(LICENCES.resolve(text)).as("named in LIBRARIES.txt").isRegularFile();
        }
    }

    @Test
    void theLgplTextsAreTheLicencesThemselves() throws Exception {
        // the texts as the libraries ship them (openhtmltopdf's META-INF), not a summary or a link
        assertThat(Files.readString(LICENCES.resolve("LGPL-2.1.txt")))
                .contains("GNU LESSER GENERAL PUBLIC LICENSE", "Version 2.1, February 1999", "END OF TERMS AND CONDITIONS");
        assertThat(Files.readString(LICENCES.resolve("LGPL-3.txt"))).contains("Version 3, 29 June 2007");
        assertThat(Files.readString(LICENCES.resolve("GPL-3.txt"))).contains("GNU GENERAL PUBLIC LICENSE", "Version 3, 29 June 2007");
        assertThat(Files.readString(LICENCES.resolve("Apache-2.0.txt"))).contains("Apache License", "Version 2.0, January 2004");
    }
}
