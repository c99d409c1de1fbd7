package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.UnaryOperator;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.cli.Cli.Outcome;

/** {@code meritbook verify}: a dossier re-run from its own attachments, and tampering caught. */
class VerifyCommandTest {
    @TempDir
    static Path dir;
    static Path dossier;

    @BeforeAll
    static void writeTheDemoDossier() {
        assertEquals(0, Cli.execute("demo", "-o", dir.toString()).code());
        dossier = dir.resolve("hmf-honey-validation/rev1/hmf-honey-validation-rev1.pdf");
    }

    /** A copy of the dossier with one attachment's bytes replaced. */
    private static Path tampered(String attachment, UnaryOperator<byte[]> change) throws Exception {
        Path copy = dir.resolve("tampered-" + attachment + ".pdf");
        try (PDDocument doc = Loader.loadPDF(dossier.toFile())) {
            PDComplexFileSpecification spec = doc.getDocumentCatalog().getNames().getEmbeddedFiles().getNames()
                    .get(attachment);
            byte[] bytes = change.apply(spec.getEmbeddedFile().toByteArray());
            spec.setEmbeddedFile(new PDEmbeddedFile(doc, new ByteArrayInputStream(bytes)));
            doc.save(copy.toFile());
        }
        return copy;
    }

    @Test
    void theDemoDossierIsReproducedFromItsAttachments() {
        Outcome o = Cli.execute("verify", dossier.toString());
        assertEquals(0, o.code(), o.out() + o.err());
        assertTrue(o.out().matches("(?s)meritbook: verified hmf-honey-validation-rev1.pdf: all \\d+ results of 2 sections "
                + "reproduced exactly from its attached inputs.\\s*"), o.out());
    }

    @Test
    void anAlteredResultIsListed() throws Exception {
        Path copy = tampered("results.json", bytes -> {
            String json = new String(bytes, StandardCharsets.UTF_8);
            // Change the slope's recorded value in the linearity section: the first "slope" entry.
            int at = json.indexOf("\"slope\" : {");
            int value = json.indexOf("\"value\" : ", at) + "\"value\" : ".length();
            int end = json.indexOf(',', value);
            return (json.substring(0, value) + "41.0" + json.substring(end)).getBytes(StandardCharsets.UTF_8);
        });
        Outcome o = Cli.execute("verify", copy.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("NOT verified"), o.out());
        assertTrue(o.out().contains("linearity.slope: recorded 41.0, re-run gives 41.7"), o.out());
    }

    @Test
    void aResultsFieldRemovedOrOfTheWrongTypeIsALocatedInputError() throws Exception {
        Path removed = tampered("results.json", bytes -> json(bytes, tree ->
                ((ObjectNode) tree.get("sections").get(0)).remove("quantities")));
        Outcome o = Cli.execute("verify", removed.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("tampered-results.json.pdf (attached results.json), at $.sections[0].quantities: "
                + "expected the field 'quantities' but found nothing (the field is missing)."), o.err());

        Path wrongType = tampered("results.json", bytes -> json(bytes, tree ->
                ((ObjectNode) tree.get("study")).put("file", 42)));
        o = Cli.execute("verify", wrongType.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("at $.study.file: expected a text but found the number 42."), o.err());
    }

    private static byte[] json(byte[] bytes, java.util.function.Consumer<ObjectNode> change) {
        try {
            ObjectMapper mapper = new ObjectMapper();
            ObjectNode tree = (ObjectNode) mapper.readTree(bytes);
            change.accept(tree);
            return mapper.writeValueAsBytes(tree);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void anAlteredWorkbookIsRefused() throws Exception {
        Path copy = tampered("hmf-honey-validation.xlsx", bytes -> {
            byte[] b = bytes.clone();
            b[b.length / 2] ^= 1;
            return b;
        });
        Outcome o = Cli.execute("verify", copy.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("expected an attached file with the SHA-256 the manifest records for 'lab' "
                + "(hmf-honey-validation.xlsx) but found none: the attachment is missing or was altered."), o.err());
    }

    @Test
    void aDossierJudgedByALabProfileCarriesTheProfileAndVerifies() throws Exception {
        Path study = dir.resolve("lab-profile");
        Files.createDirectories(study.resolve("profiles"));
        Files.copy(Path.of("demo-data/hmf-honey-validation.xlsx"), study.resolve("hmf-honey-validation.xlsx"));
        Files.writeString(study.resolve("profiles/qc.yaml"), """
                name: QC lab linearity
                rules:
                  - quantity: r_squared
                    at-least: 0.998
                """);
        Path notebook = study.resolve("hmf-honey-validation.md");
        Files.writeString(notebook, Files.readString(Path.of("demo-data/hmf-honey-validation.md"))
                .replace("criteria: linearity-basic", "criteria: profiles/qc.yaml"));
        assertEquals(0, Cli.execute("run", notebook.toString(), "-o", study.resolve("out").toString()).code());
        Path pdf = study.resolve("out/hmf-honey-validation/rev1/hmf-honey-validation-rev1.pdf");
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertTrue(doc.getDocumentCatalog().getNames().getEmbeddedFiles().getNames().containsKey("qc.yaml"),
                    "the profile is attached");
        }
        Outcome o = Cli.execute("verify", pdf.toString());
        assertEquals(0, o.code(), o.out() + o.err());
    }

    @Test
    void aFileThatIsNotADossierIsBadInput() throws Exception {
        Path notPdf = dir.resolve("notes.pdf");
        Files.writeString(notPdf, "not a pdf");
        assertEquals(2, Cli.execute("verify", notPdf.toString()).code());
    }
}
