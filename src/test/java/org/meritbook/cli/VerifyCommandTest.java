package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TimeZone;
import java.util.function.Consumer;
import java.util.function.UnaryOperator;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.contentstream.operator.Operator;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdfparser.PDFStreamParser;
import org.apache.pdfbox.pdfwriter.ContentStreamWriter;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.common.PDStream;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.pdmodel.common.filespecification.PDEmbeddedFile;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotationText;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.ExternalSigningSupport;
import org.apache.pdfbox.pdmodel.interactive.digitalsignature.PDSignature;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.cli.Cli.Outcome;
import org.meritbook.pipeline.Sha256;

/**
 * {@code meritbook verify} against a hostile sender: a dossier re-run from its own attachments, and
 * every way of making its pages, attachments or manifest disagree caught and named. The altered
 * dossiers are built here with PDFBox, as anyone could build them.
 */
class VerifyCommandTest {
    private static final String WORKBOOK = "hmf-honey-validation.xlsx";
    private static final String NOTEBOOK = "hmf-honey-validation.md";
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    static Path dir;
    static Path dossier;

    @BeforeAll
    static void writeTheDemoDossier() {
        assertEquals(0, Cli.execute("demo", "-o", dir.toString()).code());
        dossier = dir.resolve("hmf-honey-validation/rev1/hmf-honey-validation-rev1.pdf");
    }

    /** A copy of a dossier changed through PDFBox and saved whole, as a PDF editor would. */
    private static Path rewritten(Path source, String copy, Consumer<PDDocument> change) {
        Path out = dir.resolve(copy);
        try (PDDocument doc = Loader.loadPDF(source.toFile())) {
            change.accept(doc);
            doc.save(out.toFile());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    private static Map<String, PDComplexFileSpecification> attachments(PDDocument doc) {
        try {
            return doc.getDocumentCatalog().getNames().getEmbeddedFiles().getNames();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static byte[] attachment(PDDocument doc, String name) {
        try {
            return attachments(doc).get(name).getEmbeddedFile().toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void replace(PDDocument doc, String name, byte[] bytes) {
        try {
            attachments(doc).get(name).setEmbeddedFile(new PDEmbeddedFile(doc, new ByteArrayInputStream(bytes)));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A copy of the demo dossier with one attachment's bytes replaced. */
    private static Path tampered(String attachment, UnaryOperator<byte[]> change) {
        return rewritten(dossier, "tampered-" + attachment + ".pdf",
                doc -> replace(doc, attachment, change.apply(attachment(doc, attachment))));
    }

    private static byte[] json(byte[] bytes, Consumer<ObjectNode> change) {
        try {
            ObjectNode tree = (ObjectNode) JSON.readTree(bytes);
            change.accept(tree);
            return JSON.writerWithDefaultPrettyPrinter().writeValueAsBytes(tree);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The demo workbook with Calibration!D16 corrected from 21.08 to 21.80. */
    private static byte[] workbookWithD16(byte[] workbook) {
        try (InputStream in = new ByteArrayInputStream(workbook); XSSFWorkbook wb = new XSSFWorkbook(in);
             ByteArrayOutputStream out = new ByteArrayOutputStream()) {
            wb.getSheet("Calibration").getRow(15).getCell(3).setCellValue(21.80);
            wb.write(out);
            return out.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Test
    void theDemoDossierIsReproducedFromItsAttachmentsAndMatchesTheLabsWorkbook() throws Exception {
        Path lab = Files.createDirectories(dir.resolve("lab-copies"));
        Files.copy(Path.of("demo-data", WORKBOOK), lab.resolve(WORKBOOK));
        Outcome o = Cli.execute("verify", dossier.toString(), "--against", lab.toString());
        assertEquals(0, o.code(), o.out() + o.err());
        // The counts are those of the run itself: every quantity of every section, every page of the PDF.
        var results = new ObjectMapper().readTree(dossier.resolveSibling("results.json").toFile());
        int quantities = 0;
        for (var section : results.get("sections")) {
            quantities += section.get("quantities").size();
        }
        int pages;
        try (var pdf = Loader.loadPDF(dossier.toFile())) {
            pages = pdf.getNumberOfPages();
        }
        assertTrue(quantities > 116 && pages > 27, quantities + " results, " + pages + " pages");
        assertTrue(o.out().startsWith("meritbook: verified hmf-honey-validation-rev1.pdf: all " + quantities + " results of "
                + results.get("sections").size() + " sections reproduced exactly from its attached inputs, and all " + pages
                + " pages show what those inputs give."), o.out());
        assertTrue(o.out().contains("note: lab (" + WORKBOOK + "): " + lab.resolve(WORKBOOK)
                + " is byte-identical to the copy the dossier carries"), o.out());
    }

    @Test
    void aLabWorkbookThatChangedSinceIsNamedWithItsFirstDifferingCell() throws Exception {
        Path lab = Files.createDirectories(dir.resolve("lab-changed"));
        Files.write(lab.resolve(WORKBOOK), workbookWithD16(Files.readAllBytes(Path.of("demo-data", WORKBOOK))));
        Outcome o = Cli.execute("verify", dossier.toString(), "--against", lab.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("lab (" + WORKBOOK + "): " + lab.resolve(WORKBOOK) + " differs from the copy the "
                + "dossier carries; first differing cell Calibration!D16: \"21.08\" in the dossier, 21.8 in the folder"),
                o.out());
        Outcome missing = Cli.execute("verify", dossier.toString(), "--against", dir.resolve("fixture").toString());
        assertEquals(2, missing.code(), missing.out() + missing.err());
    }

    @Test
    void oneByteOfEachAttachmentIsCaught() {
        for (String name : List.of(NOTEBOOK, WORKBOOK)) {
            Outcome o = Cli.execute("verify", tampered(name, flipMiddleByte()).toString());
            assertEquals(2, o.code(), name + ": " + o.out() + o.err());
            assertTrue(o.err().contains("expected an attached file with the SHA-256 the manifest records for '"
                    + (name.equals(NOTEBOOK) ? "notebook" : "lab") + "' (" + name + ") but found none"), o.err());
        }
        Outcome o = Cli.execute("verify", tampered("results.json", flipMiddleByte()).toString());
        assertTrue(o.code() == 1 || o.code() == 2, o.out() + o.err());
        assertTrue((o.out() + o.err()).contains("results.json"), o.out() + o.err());
    }

    private static UnaryOperator<byte[]> flipMiddleByte() {
        return bytes -> {
            byte[] b = bytes.clone();
            b[b.length / 2] ^= 1;
            return b;
        };
    }

    @Test
    void anAlteredResultIsListed() {
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
        assertTrue(o.out().contains("linearity.slope: recorded 41.0, re-run gives 41.5"), o.out());
    }

    @Test
    void aCellOfTheAttachedWorkbookChangedWithItsManifestEntryIsCaughtByTheResults() {
        Path copy = rewritten(dossier, "tampered-cell.pdf", doc -> {
            byte[] workbook = workbookWithD16(attachment(doc, WORKBOOK));
            replace(doc, WORKBOOK, workbook);
            replace(doc, "results.json", json(attachment(doc, "results.json"), tree -> {
                ObjectNode lab = (ObjectNode) tree.get("inputs").get(1);
                lab.put("sha256", Sha256.of(workbook)).put("bytes", workbook.length);
            }));
        });
        Outcome o = Cli.execute("verify", copy.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("linearity.slope: recorded 41.5"), o.out());
        assertTrue(o.out().contains("linearity.back_calculated:D16: recorded"), o.out());
    }

    @Test
    void attachmentsSwappedForThoseOfAnotherRunAreRefusedByThePages() throws Exception {
        Path study = Files.createDirectories(dir.resolve("other-run"));
        Files.write(study.resolve(WORKBOOK), workbookWithD16(Files.readAllBytes(Path.of("demo-data", WORKBOOK))));
        Files.copy(Path.of("demo-data", NOTEBOOK), study.resolve(NOTEBOOK));
        assertEquals(0, Cli.execute("run", study.resolve(NOTEBOOK).toString(), "-o", study.resolve("out").toString())
                .code());
        Path other = study.resolve("out/hmf-honey-validation/rev1/hmf-honey-validation-rev1.pdf");
        List<byte[]> theirs = new ArrayList<>();
        try (PDDocument doc = Loader.loadPDF(other.toFile())) {
            for (String name : List.of(NOTEBOOK, WORKBOOK, "results.json")) {
                theirs.add(attachment(doc, name));
            }
        }
        Path swapped = rewritten(dossier, "swapped.pdf", doc -> {
            replace(doc, NOTEBOOK, theirs.get(0));
            replace(doc, WORKBOOK, theirs.get(1));
            replace(doc, "results.json", theirs.get(2));
        });
        Outcome o = Cli.execute("verify", swapped.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertFalse(o.out().contains("re-run gives"), "the swapped attachments agree among themselves:\n" + o.out());
        assertTrue(o.out().matches("(?s).*page \\d+ shows \"[^\"]*\" where its attachments give \"[^\"]*\".*"), o.out());
    }

    @Test
    void aVisibleNumberChangedOnAPageIsNamedWithItsPage() throws Exception {
        String text;
        try (PDDocument doc = Loader.loadPDF(dossier.toFile())) {
            text = new PDFTextStripper().getText(doc);
        }
        assertTrue(text.contains("41.55 ± 0.40"), "the summary shows the slope");
        Path copy = rewritten(dossier, "tampered-page.pdf", doc -> swapDigitsOf(doc, "41.55", 0, 1));
        try (PDDocument doc = Loader.loadPDF(copy.toFile())) {
            assertTrue(new PDFTextStripper().getText(doc).contains("14.55 ± 0.40"), "the page now shows another slope");
        }
        Outcome o = Cli.execute("verify", copy.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().matches("(?s).*page \\d+ shows \"[^\"]*14\\.55 ± 0\\.40[^\"]*\" where its attachments give "
                + "\"[^\"]*41\\.55 ± 0\\.40[^\"]*\".*"), o.out());
    }

    /**
     * Swaps the glyphs of two characters of the first shown string that reads {@code number}: the
     * page then shows another number, in the same font, at the same place.
     */
    private static void swapDigitsOf(PDDocument doc, String number, int i, int j) {
        try {
            for (PDPage page : doc.getPages()) {
                PDFStreamParser parser = new PDFStreamParser(page);
                List<Object> tokens = new ArrayList<>(parser.parse());
                PDFont font = null;
                boolean changed = false;
                for (int t = 0; t < tokens.size() && !changed; t++) {
                    if (tokens.get(t) instanceof Operator op && op.getName().equals("Tf")) {
                        font = page.getResources().getFont((COSName) tokens.get(t - 2));
                    }
                    if (font != null && tokens.get(t) instanceof COSString s) {
                        COSString swapped = swapIn(s, font, number, i, j);
                        if (swapped != null) {
                            tokens.set(t, swapped);
                            changed = true;
                        }
                    } else if (font != null && tokens.get(t) instanceof COSArray a) {
                        for (int k = 0; k < a.size() && !changed; k++) {
                            COSString swapped = a.get(k) instanceof COSString s ? swapIn(s, font, number, i, j) : null;
                            if (swapped != null) {
                                a.set(k, swapped);
                                changed = true;
                            }
                        }
                    }
                }
                if (changed) {
                    PDStream stream = new PDStream(doc);
                    try (OutputStream out = stream.createOutputStream(COSName.FLATE_DECODE)) {
                        new ContentStreamWriter(out).writeTokens(tokens);
                    }
                    page.setContents(stream);
                    return;
                }
            }
            throw new AssertionError("no page shows " + number + " as one string");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static COSString swapIn(COSString s, PDFont font, String number, int i, int j) throws IOException {
        byte[] bytes = s.getBytes();
        List<int[]> codes = new ArrayList<>(); // {start, end} of each code
        StringBuilder shown = new StringBuilder();
        InputStream in = new ByteArrayInputStream(bytes);
        int offset = 0;
        while (in.available() > 0) {
            int code = font.readCode(in);
            int end = bytes.length - in.available();
            codes.add(new int[] {offset, end});
            String u = font.toUnicode(code);
            shown.append(u == null || u.length() != 1 ? "\uFFFD" : u);
            offset = end;
        }
        int at = shown.indexOf(number);
        if (at < 0) {
            return null;
        }
        int[] a = codes.get(at + i);
        int[] b = codes.get(at + j);
        byte[] swapped = bytes.clone();
        byte[] ca = Arrays.copyOfRange(bytes, a[0], a[1]);
        byte[] cb = Arrays.copyOfRange(bytes, b[0], b[1]);
        assertEquals(ca.length, cb.length);
        System.arraycopy(cb, 0, swapped, a[0], cb.length);
        System.arraycopy(ca, 0, swapped, b[0], ca.length);
        return new COSString(swapped);
    }

    @Test
    void aTruncatedDossierIsDamagedNotVerified() throws Exception {
        byte[] bytes = Files.readAllBytes(dossier);
        Path cut = dir.resolve("truncated.pdf");
        Files.write(cut, Arrays.copyOf(bytes, bytes.length - 878));
        Outcome o = Cli.execute("verify", cut.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("truncated.pdf: expected a complete PDF that ends with %%EOF after its last "
                + "startxref but found damage: a file of " + (bytes.length - 878) + " bytes that ends without it"),
                o.err());
        assertEquals(2, Cli.execute("diff", cut.toString(), dossier.toString()).code(), "diff refuses it too");
    }

    @Test
    void aDossierWhoseManifestNamesPathsWritesNothingAndIsRefused() throws Exception {
        String escape = "../" + dir.getFileName() + "/escaped";
        Path byAlias = rewritten(dossier, "traversal-alias.pdf", doc -> replace(doc, "results.json",
                json(attachment(doc, "results.json"), tree -> ((ObjectNode) tree.get("inputs").get(1))
                        .put("alias", escape))));
        Path byName = rewritten(dossier, "traversal-name.pdf", doc -> {
            replace(doc, "results.json", json(attachment(doc, "results.json"),
                    tree -> ((ObjectNode) tree.get("study")).put("file", escape + ".md")));
            try {
                // and an attachment whose own name climbs out, which nothing may ever write either
                PDEmbeddedFile ef = new PDEmbeddedFile(doc, new ByteArrayInputStream(new byte[] {1, 2, 3}));
                PDComplexFileSpecification spec = new PDComplexFileSpecification();
                spec.setFile(escape + ".bin");
                spec.setEmbeddedFile(ef);
                Map<String, PDComplexFileSpecification> names = new java.util.TreeMap<>(attachments(doc));
                names.put(escape + ".bin", spec);
                doc.getDocumentCatalog().getNames().getEmbeddedFiles().setNames(names);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
        Path control = rewritten(dossier, "control-name.pdf", doc -> replace(doc, "results.json",
                json(attachment(doc, "results.json"), tree -> ((ObjectNode) tree.get("study"))
                        .put("file", "study\u0000.md"))));

        Outcome o = Cli.execute("verify", byAlias.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("at $.inputs[1].alias: expected an alias of letters, digits, '_', '.' or '-'"), o.err());
        o = Cli.execute("verify", byName.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("traversal-name.pdf (attached results.json), at $.study.file: expected a plain file "
                + "name (no folder separator, no '..', no control character) but found '" + escape + ".md'"), o.err());
        o = Cli.execute("verify", control.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("but found 'study\\u0000.md'"), o.err());
        try (var files = Files.list(dir)) {
            assertEquals(List.of(), files.filter(p -> p.getFileName().toString().startsWith("escaped")).toList(),
                    "nothing was written outside the private folder");
        }
    }

    @Test
    void aDossierSignedLaterStillVerifiesAndItsSignatureIsReported() throws Exception {
        Path signed = dir.resolve("signed.pdf");
        Files.write(signed, signed(Files.readAllBytes(dossier), "Q. Reviewer"));
        Outcome o = Cli.execute("verify", signed.toString());
        assertEquals(0, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("note: the dossier as issued (its first " + Files.size(dossier) + " bytes) is exactly "
                + "the one its attachments render to; 1 later update was appended by another program without changing "
                + "what any page shows"), o.out());
        assertTrue(o.out().contains("signed: the signature of Q. Reviewer, dated 2026-11-23: covers the whole document"),
                o.out());

        // A note added on a page after signing: visible, not covered by the signature, and not the dossier.
        Path annotated = dir.resolve("signed-then-annotated.pdf");
        try (PDDocument doc = Loader.loadPDF(signed.toFile()); OutputStream out = Files.newOutputStream(annotated)) {
            PDPage page = doc.getPage(1);
            PDAnnotationText note = new PDAnnotationText();
            note.setContents("slope should read 42.11");
            note.setRectangle(new PDRectangle(100, 100, 20, 20));
            List<org.apache.pdfbox.pdmodel.interactive.annotation.PDAnnotation> annotations =
                    new ArrayList<>(page.getAnnotations());
            annotations.add(note);
            page.setAnnotations(annotations);
            COSDictionary pageDictionary = page.getCOSObject();
            doc.saveIncremental(out, Set.of(pageDictionary, note.getCOSObject()));
        }
        o = Cli.execute("verify", annotated.toString());
        assertEquals(1, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("page 2 carries the annotations"), o.out());
        assertTrue(o.out().matches("(?s).*signed: the signature of Q\\. Reviewer, dated 2026-11-23: covers the first \\d+ of "
                + Files.size(annotated) + " bytes; what was appended after it is not signed.*"), o.out());
    }

    /**
     * The dossier with a signature field added by an incremental update, as a PDF reader signs. The
     * signature value is placeholder bytes: meritbook reports what a signature covers, not whether its
     * certificate is trusted, so no key is needed here.
     */
    private static byte[] signed(byte[] pdf, String signer) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDSignature sig = new PDSignature();
            sig.setFilter(PDSignature.FILTER_ADOBE_PPKLITE);
            sig.setSubFilter(PDSignature.SUBFILTER_ADBE_PKCS7_DETACHED);
            sig.setName(signer);
            Calendar when = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
            when.clear();
            when.set(2026, Calendar.NOVEMBER, 23, 9, 30);
            sig.setSignDate(when);
            doc.addSignature(sig);
            ExternalSigningSupport signing = doc.saveIncrementalForExternalSigning(out);
            signing.setSignature(Sha256.of(signing.getContent().readAllBytes()).getBytes(StandardCharsets.US_ASCII));
        }
        byte[] bytes = out.toByteArray();
        assertTrue(Arrays.equals(pdf, 0, pdf.length, bytes, 0, pdf.length), "an incremental update keeps the original");
        return bytes;
    }

    @Test
    void aDossierJudgedByALabProfileInASubfolderCarriesTheProfileAndVerifies() throws Exception {
        Path study = dir.resolve("lab-profile");
        Files.createDirectories(study.resolve("profiles"));
        Files.copy(Path.of("demo-data", WORKBOOK), study.resolve(WORKBOOK));
        Files.writeString(study.resolve("profiles/qc.yaml"), """
                name: QC lab linearity
                rules:
                  - quantity: r_squared
                    at-least: 0.998
                """);
        Path notebook = study.resolve(NOTEBOOK);
        Files.writeString(notebook, Files.readString(Path.of("demo-data", NOTEBOOK))
                .replace("criteria: linearity-basic", "criteria: profiles/qc.yaml"));
        assertEquals(0, Cli.execute("run", notebook.toString(), "-o", study.resolve("out").toString()).code());
        Path pdf = study.resolve("out/hmf-honey-validation/rev1/hmf-honey-validation-rev1.pdf");
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            assertTrue(attachments(doc).containsKey("qc.yaml"), "the profile is attached");
        }
        Outcome o = Cli.execute("verify", pdf.toString());
        assertEquals(0, o.code(), o.out() + o.err());
    }

    @Test
    void aResultsFieldRemovedOrOfTheWrongTypeIsALocatedInputError() {
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

    @Test
    void aFileThatIsNotADossierIsBadInput() throws Exception {
        Path notPdf = dir.resolve("notes.pdf");
        Files.writeString(notPdf, "not a pdf");
        assertEquals(2, Cli.execute("verify", notPdf.toString()).code());
    }
}
