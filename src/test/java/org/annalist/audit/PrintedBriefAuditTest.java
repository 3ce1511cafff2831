package org.annalist.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.annalist.cli.Main;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The statement audit on printed pages: briefs of the demo and of public series of different
 * kinds (a flow with a strong season, a temperature, a series with a break, a quarterly flow) made
 * through the command line, their PDF text read back. The chart labels are text in the PDF, so
 * their minus signs and numbers are checked with the sentences.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PrintedBriefAuditTest {

    @TempDir
    static Path out;

    private final Map<String, String> pages = new LinkedHashMap<>();

    @BeforeAll
    void printTheBriefs() throws IOException {
        print("demo-data/quennelmark-guest-nights.csv", "Total");
        print("src/test/resources/reference/AirPassengers.csv", null);   // R datasets::AirPassengers
        print("src/test/resources/reference/nottem.csv", null);          // R datasets::nottem, °F
        print("src/test/resources/reference/Nile.csv", null);            // R datasets::Nile, a break in 1898/99
        print("src/test/resources/reference/UKgas.csv", null);           // R datasets::UKgas, quarterly
    }

    private void print(String file, String series) throws IOException {
        Path pdf = out.resolve(Path.of(file).getFileName() + ".pdf");
        List<String> args = new ArrayList<>(List.of("brief", file, "-o", pdf.toString(), "--generated-at",
                "2026-11-20T08:00:00Z"));
        if (series != null) {
            args.addAll(List.of("--series", series));
        }
        StringWriter err = new StringWriter();
        int code = Main.run(args.toArray(String[]::new), new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertThat(code).as(file + ": " + err).isZero();
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setSortByPosition(true);
            pages.put(file, stripper.getText(document).replaceAll("[ \\t\\r\\n]+", " "));
        }
    }

    /**
     * The marks that survive text extraction: a PDF's text comes back with line breaks where the
     * layout wrapped and no-break spaces as plain ones, so spacing is checked on the brief's words
     * before layout ({@link StatementAuditTest}).
     */
    @ParameterizedTest
    @EnumSource(value = ProofMarks.class, names = {"DIRECTION_AND_SIGN", "NEGATIVE_ZERO", "HYPHEN_AS_MINUS",
            "DEVELOPMENT_VERSION"})
    void noProofMarksOnThePrintedPages(ProofMarks mark) {
        List<String> found = new ArrayList<>();
        pages.forEach((file, text) -> {
            // the appendix quotes the rules and the file's checksum; the pages before it are what readers quote
            int appendix = text.indexOf("Data and methods");
            String body = appendix < 0 ? text : text.substring(0, appendix);
            mark.in(mark == ProofMarks.HYPHEN_AS_MINUS || mark == ProofMarks.NEGATIVE_ZERO ? body : text)
                    .forEach(place -> found.add(file + ": «" + place + "»"));
        });
        assertThat(found).as(mark.mistake).isEmpty();
    }
}
