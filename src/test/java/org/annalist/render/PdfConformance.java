package org.annalist.render;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.PDFAValidator;
import org.verapdf.pdfa.flavours.PDFAFlavour;
import org.verapdf.pdfa.results.TestAssertion;
import org.verapdf.pdfa.results.ValidationResult;

/** veraPDF's validator (test scope): the failed rules of a PDF against one flavour, empty when it conforms. */
public final class PdfConformance {

    private static boolean initialised;

    private PdfConformance() {
    }

    public static synchronized List<String> violations(Path pdf, String flavour) throws Exception {
        if (!initialised) {
            VeraGreenfieldFoundryProvider.initialise();
            initialised = true;
        }
        PDFAFlavour f = PDFAFlavour.fromString(flavour);
        try (InputStream in = Files.newInputStream(pdf);
             PDFAParser parser = Foundries.defaultInstance().createParser(in, f);
             PDFAValidator validator = Foundries.defaultInstance().createValidator(f, false)) {
            ValidationResult result = validator.validate(parser);
            List<String> failed = new ArrayList<>();
            for (TestAssertion a : result.getTestAssertions()) {
                if (a.getStatus() == TestAssertion.Status.FAILED) {
                    failed.add(a.getRuleId().getClause() + "-" + a.getRuleId().getTestNumber() + ": " + a.getMessage());
                }
            }
            if (!result.isCompliant() && failed.isEmpty()) {
                failed.add("not compliant");
            }
            return failed.stream().distinct().toList();
        }
    }
}
