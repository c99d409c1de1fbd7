package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.Quantity;
import org.meritbook.dossier.DisplayFormatter;
import org.meritbook.dossier.PdfAssertions;
import org.meritbook.pipeline.Sha256;
import org.meritbook.stats.Interval;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The demo's dossier as a user gets it from {@code meritbook demo}: conformance, content, reproducibility. */
class DemoDossierTest {
    private static final String FOLDER = "hmf-honey-validation/rev1";
    private static final String PDF = FOLDER + "/hmf-honey-validation-rev1.pdf";
    private static final String HTML = FOLDER + "/hmf-honey-validation-rev1.html";

    @TempDir
    static Path first;
    @TempDir
    static Path second;

    @BeforeAll
    static void runDemoTwice() {
        for (Path out : List.of(first, second)) {
            CommandLine cl = Main.commandLine();
            cl.setOut(new PrintWriter(new StringWriter()));
            assertEquals(Main.DONE, cl.execute("demo", "-o", out.toString()));
        }
    }

    @Test
    void theDemoDossierIsPdfA3ByVeraPdf() throws Exception {
        // veraPDF (the reference PDF/A validator, org.verapdf:validation-model) on the real demo dossier.
        PdfAssertions.assertPdfA3(Files.readAllBytes(first.resolve(PDF)));
    }

    @Test
    void twoRunsGiveTheSameBytes() {
        assertEquals(Sha256.of(first.resolve(PDF)), Sha256.of(second.resolve(PDF)), "PDF");
        assertEquals(Sha256.of(first.resolve(HTML)), Sha256.of(second.resolve(HTML)), "HTML");
        assertEquals(Sha256.of(first.resolve(FOLDER + "/results.json")), Sha256.of(second.resolve(FOLDER + "/results.json")));
    }

    @Test
    void thePdfTextCarriesEverySummaryValueOfResultsJsonAsDocumented() throws Exception {
        String text;
        try (PDDocument doc = Loader.loadPDF(first.resolve(PDF).toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        JsonNode results = new ObjectMapper().readTree(first.resolve(FOLDER + "/results.json").toFile());
        DisplayFormatter formatter = new DisplayFormatter();
        List<String> missing = new ArrayList<>();
        int checked = 0;
        for (JsonNode section : results.get("sections")) {
            boolean calibration = section.get("kind").asText().equals("calibration");
            List<String> names = new ArrayList<>(calibration ? List.of("intercept", "n") : List.of());
            section.get("quantities").fields().forEachRemaining(e -> {
                if (e.getValue().get("summary").asBoolean()) {
                    names.add(e.getKey());
                }
            });
            for (String name : names) {
                JsonNode q = section.get("quantities").get(name);
                JsonNode ci = q.get("ci");
                Quantity quantity = new Quantity(name, q.get("label").asText(), q.get("value").asDouble(),
                        q.get("unit").isNull() ? null : q.get("unit").asText(), q.get("step").asText(),
                        ci == null ? null : new Interval(ci.get("low").asDouble(), ci.get("high").asDouble(),
                                ci.get("level").asDouble()),
                        false, kindOf(name, q.get("unit").isNull() ? null : q.get("unit").asText()));
                String shown = formatter.quantity(quantity).withUnit();
                checked++;
                if (!text.contains(shown)) {
                    missing.add(section.get("id").asText() + "." + name + " as '" + shown + "'");
                }
            }
        }
        // Each calibration: slope, s(y/x), r², lack-of-fit p, Mandel p, plus intercept and n; then the other kinds' summaries.
        assertTrue(checked >= 14 + 2, "checked " + checked);
        assertTrue(missing.isEmpty(), "not in the PDF text: " + missing);
        assertTrue(text.contains("Calibration!D23") && text.contains("Air bubble in the sample loop"),
                "the exclusion with its cell and reason");
        assertTrue(text.contains("support, and do not replace"), "the caution");
    }

    /** results.json does not carry a number's kind: the kinds the analyses give these names (docs/dossier.md). */
    private static NumberKind kindOf(String name, String unit) {
        String base = name.contains(":") ? name.substring(0, name.indexOf(':')) : name;
        if (base.equals("n") || base.endsWith("_df")) {
            return NumberKind.COUNT;
        }
        if (base.equals("r") || base.equals("r_squared")) {
            return NumberKind.CORRELATION;
        }
        return base.endsWith("_p") ? NumberKind.P_VALUE : NumberKind.ofUnit(unit);
    }
}
