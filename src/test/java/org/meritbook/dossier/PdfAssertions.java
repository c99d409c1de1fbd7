package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.util.Comparator;
import java.util.stream.Collectors;
import org.verapdf.gf.foundry.VeraGreenfieldFoundryProvider;
import org.verapdf.pdfa.Foundries;
import org.verapdf.pdfa.PDFAParser;
import org.verapdf.pdfa.PDFAValidator;
import org.verapdf.pdfa.flavours.PDFAFlavour;
import org.verapdf.pdfa.results.TestAssertion;
import org.verapdf.pdfa.results.ValidationResult;

/**
 * Reusable PDF checks for tests: PDF/A-3 conformance by veraPDF (the reference validator), with
 * every failed rule listed in the assertion message.
 */
public final class PdfAssertions {
    private static boolean initialised;

    private PdfAssertions() {
    }

    /** Asserts the bytes are a PDF/A-3u document (3u is what the dossier claims). */
    public static void assertPdfA3(byte[] pdf) {
        assertPdfA(pdf, PDFAFlavour.PDFA_3_U);
    }

    public static synchronized void assertPdfA(byte[] pdf, PDFAFlavour flavour) {
        if (!initialised) {
            VeraGreenfieldFoundryProvider.initialise();
            initialised = true;
        }
        try (PDFAParser parser = Foundries.defaultInstance().createParser(new ByteArrayInputStream(pdf), flavour);
             PDFAValidator validator = Foundries.defaultInstance().createValidator(flavour, false)) {
            ValidationResult result = validator.validate(parser);
            String failures = result.getTestAssertions().stream()
                    .filter(a -> a.getStatus() == TestAssertion.Status.FAILED)
                    .sorted(Comparator.comparing(a -> a.getRuleId().toString()))
                    .map(a -> a.getRuleId().getClause() + "-" + a.getRuleId().getTestNumber() + ": " + a.getMessage()
                            + " [" + a.getLocation().getContext() + "]")
                    .distinct()
                    .collect(Collectors.joining("\n  "));
            assertTrue(result.isCompliant(), "not " + flavour + " compliant; failed rules:\n  " + failures);
        } catch (Exception e) {
            fail("veraPDF could not validate the document: " + e, e);
        }
    }
}
