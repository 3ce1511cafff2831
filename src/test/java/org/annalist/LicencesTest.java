package org.annalist;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Annalist is Apache-2.0, and so must be what its jar can bundle: every library on the runtime
 * classpath carries a licence of an allowed family (Apache-2.0, MIT, BSD, EPL, LGPL, MPL). The list
 * is {@code META-INF/THIRD-PARTY}, which the build writes in {@code generate-resources} (before the
 * tests) from each library's own POM, parent POMs included (license-maven-plugin, configured in
 * {@code pom.xml}); a dependency whose POM names a GPL licence, or none we know, fails here.
 */
public class LicencesTest {

    /** What the build wrote and the jar bundles (process-resources copies it here before the tests). */
    public static final Path THIRD_PARTY = Path.of("target/classes/META-INF/THIRD-PARTY");

    /** One line of the file: {@code (LICENCE) (LICENCE) Name (group:artifact:version - url)}. */
    private static final Pattern LINE = Pattern.compile("^\\s*((?:\\([^()]*(?:\\([^()]*\\)[^()]*)*\\)\\s*)+)(.*) \\(([^:\\s]+:[^:\\s]+:[^\\s]+) - .*\\)$");
    private static final Pattern LICENCE = Pattern.compile("\\(((?:[^()]|\\([^()]*\\))*)\\)");

    /** The allowed families, by the names POMs give them (their SPDX ids, or their titles in words). */
    public enum Family {
        APACHE_2("apache-2\\.0|(the )?apache (software )?licen[cs]e,? (version )?2(\\.0)?|asl 2\\.0|apache 2(\\.0)?"),
        MIT("mit( licen[cs]e)?|the mit licen[cs]e"),
        BSD("(the )?(new |revised |simplified )?bsd( licen[cs]e)?|bsd-[23]-clause( licen[cs]e)?|bsd [23]-clause( licen[cs]e)?"
                + "|eclipse distribution licen[cs]e.*|edl[- ]?1\\.0"),
        EPL("epl[- ]?[12]\\.0|eclipse public licen[cs]e.*"),
        LGPL("lgpl-2\\.1(-only|-or-later)?|lgpl-3\\.0(-only|-or-later)?|.*\\blesser general public licen[cs]e.*"
                + "|.*\\blibrary general public licen[cs]e.*|.*\\(lgpl\\).*"),
        MPL("mpl-[12]\\.[01]|mozilla public licen[cs]e.*");

        private final Pattern names;

        Family(String names) {
            this.names = Pattern.compile(names);
        }

        /** The family a licence name belongs to; empty for any other licence (GPL, AGPL, CDDL, none we know). */
        public static Optional<Family> of(String licence) {
            String name = licence.trim().toLowerCase(Locale.ROOT);
            for (Family family : values()) {
                if (family.names.matcher(name).matches()) {
                    return Optional.of(family);
                }
            }
            return Optional.empty();
        }
    }

    /** A bundled library and the licences its POM offers (any one of them may be chosen). */
    public record Library(String coordinates, String name, List<String> licences) {

        boolean allowed() {
            return licences.stream().anyMatch(l -> Family.of(l).isPresent());
        }

        @Override
        public String toString() {
            return coordinates + " " + licences;
        }
    }

    public static List<Library> libraries(List<String> lines) {
        List<Library> libraries = new ArrayList<>();
        for (String line : lines) {
            Matcher m = LINE.matcher(line);
            if (!m.matches()) {
                continue;
            }
            List<String> licences = new ArrayList<>();
            Matcher l = LICENCE.matcher(m.group(1));
            while (l.find()) {
                licences.add(l.group(1));
            }
            libraries.add(new Library(m.group(3), m.group(2).trim(), licences));
        }
        return libraries;
    }

    private static List<Library> bundled() throws IOException {
        assertThat(THIRD_PARTY).as("written by the build in generate-resources: run the tests through Maven")
                .isRegularFile();
        return libraries(Files.readAllLines(THIRD_PARTY));
    }

    @Test
    void everyBundledLibraryHasAnAllowedLicence() throws IOException {
        List<Library> bundled = bundled();
        assertThat(bundled).as("libraries listed in " + THIRD_PARTY).isNotEmpty();
        assertThat(bundled).filteredOn(library -> !library.allowed())
                .as("bundled libraries whose licence is none of Apache-2.0, MIT, BSD, EPL, LGPL, MPL")
                .isEmpty();
    }

    @Test
    void theListHoldsEveryRuntimeDependencyAndNoTestOne() throws Exception {
        // a guard on the plugin's configuration: the file must list what the jar bundles, no more
        List<String> listed = bundled().stream().map(l -> l.coordinates().replaceFirst(":[^:]+$", "")).toList();
        var factory = DocumentBuilderFactory.newInstance();
        NodeList dependencies = factory.newDocumentBuilder().parse(Path.of("pom.xml").toFile())
                .getElementsByTagName("dependency");
        int runtime = 0;
        for (int i = 0; i < dependencies.getLength(); i++) {
            Element d = (Element) dependencies.item(i);
            if (!(d.getParentNode().getParentNode() instanceof Element project) || !project.getTagName().equals("project")) {
                continue;   // dependencyManagement: versions only
            }
            String coordinates = text(d, "groupId") + ":" + text(d, "artifactId");
            String scope = text(d, "scope");
            if (scope.equals("test") || scope.equals("provided")) {
                assertThat(listed).as("a test-only library is not bundled").doesNotContain(coordinates);
            } else {
                assertThat(listed).as("a runtime dependency in pom.xml").contains(coordinates);
                runtime++;
            }
        }
        assertThat(runtime).isGreaterThan(5);
    }

    private static String text(Element parent, String tag) {
        NodeList nodes = parent.getElementsByTagName(tag);
        return nodes.getLength() == 0 ? "" : nodes.item(0).getTextContent().trim();
    }

    @Test
    void licenceNamesAreToldApartAsPomsWriteThem() {
        // names as they appear in POMs on Maven Central (from memory), and the SPDX ids
        assertThat(Family.of("The Apache Software License, Version 2.0")).contains(Family.APACHE_2);
        assertThat(Family.of("Apache License, Version 2.0")).contains(Family.APACHE_2);
        assertThat(Family.of("Apache-2.0")).contains(Family.APACHE_2);
        assertThat(Family.of("The BSD License")).contains(Family.BSD);
        assertThat(Family.of("BSD-3-Clause")).contains(Family.BSD);
        assertThat(Family.of("MIT")).contains(Family.MIT);
        assertThat(Family.of("Eclipse Public License - v 2.0")).contains(Family.EPL);
        assertThat(Family.of("EPL 2.0")).contains(Family.EPL);
        assertThat(Family.of("Eclipse Distribution License - v 1.0")).as("the BSD-3-Clause text").contains(Family.BSD);
        assertThat(Family.of("GNU Lesser General Public Licence")).contains(Family.LGPL);
        assertThat(Family.of("GNU Lesser General Public License (LGPL), version 2.1 or later")).contains(Family.LGPL);
        assertThat(Family.of("Mozilla Public License Version 2.0")).contains(Family.MPL);
        // outside the list: the GPL in its forms (JFreeSVG's POM: "GNU General Public License (GPL)"), AGPL, CDDL
        for (String other : List.of("GNU General Public License (GPL)", "GPL-3.0", "GNU General Public License, version 2",
                "GNU Affero General Public License v3", "AGPL-3.0", "CDDL-1.1", "GPL2 w/ CPE", "Proprietary", "")) {
            assertThat(Family.of(other)).as(other).isEmpty();
        }
    }

    @Test
    void aLibraryIsAllowedWhenOneOfItsLicencesIs() {
        List<Library> parsed = libraries(List.of(
                "Lists of 3 third-party dependencies.",
                "     (GNU General Public License (GPL)) JFreeSVG (org.jfree:org.jfree.svg:5.0.6 - http://www.jfree.org/jfreesvg)",
                "     (CDDL-1.1) (GPL2 w/ CPE) Jakarta Example (jakarta.example:example:1.0 - https://example.org)",
                "     (Eclipse Public License - v 2.0) (GNU General Public License, version 2 with the GNU Classpath Exception) "
                        + "Example Two (org.example:two:2.1 - https://example.org/two)"));
        assertThat(parsed).extracting(Library::coordinates)
                .containsExactly("org.jfree:org.jfree.svg:5.0.6", "jakarta.example:example:1.0", "org.example:two:2.1");
        assertThat(parsed.get(0).licences()).containsExactly("GNU General Public License (GPL)");
        assertThat(parsed.get(0).allowed()).isFalse();
        assertThat(parsed.get(1).allowed()).as("neither the CDDL nor the GPL with CPE is allowed").isFalse();
        assertThat(parsed.get(2).allowed()).isTrue();
    }
}
