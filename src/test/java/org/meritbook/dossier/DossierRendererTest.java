package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.TimeZone;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSDictionary;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.filespecification.PDComplexFileSpecification;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.error.InputException;
import org.meritbook.pipeline.StudyResults;

class DossierRendererTest {
    static final RenderEnvironment PINNED = new RenderEnvironment("Java 17 (test)", "test OS");
    static final byte[] RESULTS_JSON = "{\"fixture\": true}".getBytes(StandardCharsets.UTF_8);

    private static DossierRenderer renderer;
    @TempDir
    static Path shared;
    private static RenderedDossier plain;

    @BeforeAll
    static void renderOnce() throws IOException {
        renderer = new DossierRenderer(Optional.empty(), PINNED);
        plain = renderer.render(DossierFixtures.results(shared), RESULTS_JSON);
        // Kept for looking at the pages (pdftoppm) after a test run.
        Files.createDirectories(Path.of("target"));
        Files.write(Path.of("target/fixture-dossier.pdf"), plain.pdf());
        Files.write(Path.of("target/fixture-dossier.html"), plain.html());
    }

    @Test
    void thePdfIsPdfA3ByVeraPdf() {
        PdfAssertions.assertPdfA3(plain.pdf());
    }

    @Test
    void thePdfCarriesTheNotebookTheWorkbookAndResultsJsonAsAssociatedFiles() throws IOException {
        try (PDDocument doc = Loader.loadPDF(plain.pdf())) {
            COSArray af = doc.getDocumentCatalog().getCOSObject().getCOSArray(COSName.getPDFName("AF"));
            assertNotNull(af, "catalog /AF");
            List<String> seen = new ArrayList<>();
            for (int i = 0; i < af.size(); i++) {
                COSDictionary d = (COSDictionary) af.getObject(i);
                PDComplexFileSpecification spec = new PDComplexFileSpecification(d);
                seen.add(spec.getFileUnicode() + " " + d.getNameAsString(COSName.getPDFName("AFRelationship")) + " "
                        + spec.getEmbeddedFile().getSubtype());
            }
            assertEquals(List.of("nitrite-fixture.md Source text/markdown",
                    "nitrite-fixture.xlsx Source application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
                    "results.json Data application/json"), seen);
            assertEquals(2026, doc.getDocumentInformation().getCreationDate().get(java.util.Calendar.YEAR));
            assertNotNull(doc.getDocumentCatalog().getDocumentOutline(), "bookmarks");
        }
    }

    @Test
    void theSummaryValuesAppearInThePdfFormattedAsDocumented() throws IOException {
        String text = text(plain.pdf());
        // docs/dossier.md: CI half-width to two significant figures sets the decimals; "±" when symmetric.
        assertTrue(text.contains("1519.4 ± 2.2 µS·min per mg/L"), "slope");
        assertTrue(text.contains("95 % CI 1517.1 to 1521.6 µS·min per mg/L"), "slope interval");
        assertTrue(text.contains("3.7 ± 2.3 µS·min"), "intercept");
        // r² with four decimals, extended while four would round a value below 1 to 1.0000.
        assertTrue(text.contains("0.99999"), "r²");
        // No interval: four significant figures.
        assertTrue(text.contains("3.303 µS·min"), "s(y/x)");
        // Asymmetric interval: value and limits at the interval's decimals.
        assertTrue(text.contains("0.011 mg/L"), "sd");
        assertTrue(text.contains("95 % CI 0.007 to 0.027 mg/L"), "sd interval");
        // Percent: one decimal (at least two significant figures).
        assertTrue(text.contains("2.2 %"), "CV");
        assertTrue(text.contains("no criterion set"), "quantity without a criterion");
        assertTrue(text.contains("Not evaluable"), "verdict without a quantity");
        assertTrue(text.contains("support, and do not replace, the laboratory's own review"), "caution");
        assertTrue(text(plain.pdf(), true).contains("Page 3 of "), "running footer");
        assertTrue(text.contains("Calibration!C21"), "cell addresses (in the trail)");
        // The data table tells cells by column letter and sheet row; the caption names the block.
        assertTrue(text.contains("Data as read from Calibration!A5:C25"), "data range in the caption");
        assertTrue(text.contains("test fixture") && !text.contains("\uFB01"), "no ligature glyphs in the text layer");
        assertTrue(text.contains("Injection failure recorded in the run log"), "exclusion reason");
    }

    @Test
    void theDataTableTellsEachCellByColumnLetterAndSheetRowAndKeepsTheAddressAsATooltip() throws IOException {
        org.w3c.dom.Document dom = PdfRenderer.parse(new String(plain.html(), StandardCharsets.UTF_8));
        org.w3c.dom.Element table = elementsWithClass(dom, "table", "data").get(0);
        List<String> notes = elementsWithClass(table, "span", "col-note").stream().map(e -> e.getTextContent()).toList();
        assertEquals(List.of("A", "B", "C", "computed", "computed"), notes, "column letters, computed columns marked");
        assertEquals(0, elementsWithClass(table, "span", "addr").size(), "no address printed in every cell");
        List<String> titles = new ArrayList<>();
        org.w3c.dom.NodeList tds = table.getElementsByTagNameNS("*", "td");
        for (int i = 0; i < tds.getLength(); i++) {
            titles.add(((org.w3c.dom.Element) tds.item(i)).getAttribute("title"));
        }
        assertTrue(titles.contains("Calibration!C21"), "the excluded point's cell as a tooltip");
        assertTrue(titles.stream().anyMatch(t -> t.startsWith("computed, trail step A.1.")), "computed cells name their step");
        String rowCell = elementsWithClass(table, "td", "c-row").get(16).getTextContent();
        assertEquals("21E1", rowCell.replaceAll("\\s+", ""), "sheet row 21 carries the exclusion mark");
    }

    @Test
    void everyTrailStepIdIsInThePdfAndEveryLinkLandsOnAnAnchor() throws IOException {
        String text = text(plain.pdf());
        com.fasterxml.jackson.databind.JsonNode json = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(org.meritbook.revision.ResultsJson.toBytes(DossierFixtures.results(shared)));
        List<String> missing = new ArrayList<>();
        int steps = 0;
        for (com.fasterxml.jackson.databind.JsonNode step : json.get("trail")) {
            steps++;
            String id = step.get("id").asText();
            if (!text.contains(id)) {
                missing.add(id);
            }
        }
        assertTrue(steps > 40, "the fixture has per-point steps: " + steps);
        assertEquals(List.of(), missing, "step ids missing from the PDF text");

        String html = new String(plain.html(), StandardCharsets.UTF_8);
        java.util.Set<String> ids = new java.util.HashSet<>();
        java.util.regex.Matcher m = java.util.regex.Pattern.compile(" id=\"([^\"]+)\"").matcher(html);
        while (m.find()) {
            ids.add(m.group(1));
        }
        m = java.util.regex.Pattern.compile("href=\"#([^\"]+)\"").matcher(html);
        List<String> dangling = new ArrayList<>();
        int links = 0;
        while (m.find()) {
            links++;
            if (!ids.contains(m.group(1))) {
                dangling.add(m.group(1));
            }
        }
        assertTrue(links > 80, "results, computed cells and inputs link to their steps: " + links);
        assertEquals(List.of(), dangling, "links without a target");
        // The per-point steps share a formula: one compact table each, not a block per step.
        assertEquals(2, html.split("class=\"step step-table\"", -1).length - 1, "compact step tables");
        assertTrue(html.contains("class=\"grid indexed\""), "x[i], y[i] inputs as a table by index");
    }

    @Test
    void theSameInputsGiveTheSameBytesWhateverTheLocaleAndTimeZone(@TempDir Path dir) throws Exception {
        StudyResults results = DossierFixtures.results(dir);
        RenderedDossier first = new DossierRenderer(Optional.empty(), PINNED).render(results, RESULTS_JSON);
        Locale locale = Locale.getDefault();
        TimeZone zone = TimeZone.getDefault();
        RenderedDossier second;
        try {
            Locale.setDefault(Locale.GERMANY);
            TimeZone.setDefault(TimeZone.getTimeZone("Pacific/Auckland"));
            second = new DossierRenderer(Optional.empty(), PINNED).render(results, RESULTS_JSON);
        } finally {
            Locale.setDefault(locale);
            TimeZone.setDefault(zone);
        }
        assertEquals(sha256(first.pdf()), sha256(second.pdf()), "PDF");
        assertEquals(sha256(first.html()), sha256(second.html()), "HTML");
        assertEquals(sha256(plain.pdf()), sha256(first.pdf()), "another folder, same file contents");
    }

    @Test
    void figuresDrawnWhileThePagesAreLaidOutGiveTheBytesOfFiguresDrawnInline(@TempDir Path dir) throws Exception {
        StudyResults results = DossierFixtures.results(dir);
        RenderedDossier inline = new DossierRenderer(Optional.empty(), PINNED, true, false).render(results, RESULTS_JSON);
        assertTrue(new String(inline.html(), StandardCharsets.UTF_8).contains("<path"), "the fixture has drawings");
        assertEquals(sha256(inline.pdf()), sha256(plain.pdf()), "PDF");
        assertEquals(sha256(inline.html()), sha256(plain.html()), "HTML");
        assertFalse(new String(plain.html(), StandardCharsets.UTF_8).contains(FigureArt.MARK), "no placeholder left");
    }

    @Test
    void styleSheetsCutToThePagesGiveTheBytesOfTheWholeSheets(@TempDir Path dir) throws Exception {
        // The renderer tries every selector on every element; the quick way gives it only those that
        // can match something in the pages (UnusedStyleRules). The dossier must not change by a byte.
        StudyResults results = DossierFixtures.results(dir);
        RenderedDossier whole = new DossierRenderer(Optional.empty(), PINNED, false, true).render(results, RESULTS_JSON);
        assertEquals(sha256(whole.pdf()), sha256(plain.pdf()), "PDF");
        assertEquals(sha256(whole.html()), sha256(plain.html()), "HTML");
    }

    @Test
    void aRendererThatWarmedUpOnASecondThreadRendersTheBytesOfOneThatDidNot(@TempDir Path dir) throws Exception {
        StudyResults results = DossierFixtures.results(dir);
        RenderedDossier direct = new DossierRenderer(Optional.empty()).render(results, RESULTS_JSON);
        RenderedDossier warmed = DossierRenderer.warmingUp(Optional.empty()).render(results, RESULTS_JSON);
        assertEquals(sha256(direct.pdf()), sha256(warmed.pdf()), "PDF");
        assertEquals(sha256(direct.html()), sha256(warmed.html()), "HTML");
    }

    @Test
    void aTemplateFolderThatIsNotAFolderIsRefusedAtOnceNamingIt(@TempDir Path dir) throws IOException {
        Path file = Files.writeString(dir.resolve("templates.txt"), "not a folder");
        InputException e = assertThrows(InputException.class, () -> DossierRenderer.warmingUp(Optional.of(file)));
        assertTrue(e.getMessage().contains(file.toString()) && e.getMessage().contains("a file, not a folder"),
                e.getMessage());
        Path missing = dir.resolve("no-such-folder");
        e = assertThrows(InputException.class, () -> new DossierRenderer(Optional.of(missing)));
        assertTrue(e.getMessage().contains(missing.toString()) && e.getMessage().contains("no such folder"),
                e.getMessage());
    }

    @Test
    void hostileTextRendersLiterallyInBothFormats(@TempDir Path dir) throws Exception {
        RenderedDossier d = renderer.render(DossierFixtures.results(dir, DossierFixtures.HOSTILE), RESULTS_JSON);
        Files.write(Path.of("target/hostile-dossier.pdf"), d.pdf());
        PdfAssertions.assertPdfA3(d.pdf());

        String html = new String(d.html(), StandardCharsets.UTF_8);
        org.w3c.dom.Document dom = PdfRenderer.parse(html); // still well-formed
        assertEquals(0, dom.getElementsByTagNameNS("*", "script").getLength(), "no script element");
        assertEquals(0, dom.getElementsByTagNameNS("*", "b").getLength(), "no markup from user text");
        String htmlText = dom.getDocumentElement().getTextContent();
        for (String literal : List.of("<script>alert('t')</script>", "${title}", "Area <script>x()</script> ${oops} & Co",
                "<div style=\"color:red\">html block</div>", "Ελληνικά", "Кириллица", "中文标题", "方法验证")) {
            assertTrue(htmlText.contains(literal), "HTML keeps " + literal);
        }
        assertFalse(html.contains("javascript:"), "unsafe link scheme dropped");

        String pdfText = text(d.pdf());
        for (String literal : List.of("<script>alert('t')</script>", "${title}", "& <b>bold</b>", "Ελληνικά",
                "Кириллица", "μέθοδος επικύρωσης", "валидация методики")) {
            assertTrue(pdfText.contains(literal), "PDF keeps " + literal);
        }
        // DejaVu has no CJK: the PDF spells the code points instead of dropping them.
        assertTrue(pdfText.contains("[U+4E2D U+6587 U+6807 U+9898]"), "CJK as code points");
        assertTrue(pdfText.contains("[U+65B9 U+6CD5 U+9A8C U+8BC1]"), "CJK in narrative as code points");
        assertTrue(pdfText.replace(" ", "").contains("Pneumonoultramicroscopicsilicovolcanoconiosis"),
                "the very long word is kept");
        assertTrue(maxTextRight(d.pdf()) <= 595.3 - 40, "no text runs into the right margin or off the page");
    }

    @Test
    void aLabTemplateFolderOverridesSomeTemplatesAndFailsLoudlyOnMissingValues(@TempDir Path dir) throws IOException {
        Path lab = Files.createDirectories(dir.resolve("lab-templates"));
        Files.writeString(lab.resolve("cover.ftlh"), "<div class=\"cover\"><p>LAB LETTERHEAD ${cover.laboratory}</p></div>");
        StudyResults results = DossierFixtures.results(dir);
        RenderedDossier d = new DossierRenderer(Optional.of(lab), PINNED).render(results, RESULTS_JSON);
        String html = new String(d.html(), StandardCharsets.UTF_8);
        assertTrue(html.contains("LAB LETTERHEAD Fixture Water Laboratory (invented)"), "lab cover used");
        assertTrue(html.contains("Summary of results"), "other templates from the defaults");

        Files.writeString(lab.resolve("cover.ftlh"), "<p>${cover.logoPath}</p>");
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> new DossierRenderer(Optional.of(lab), PINNED).render(results, RESULTS_JSON));
        assertTrue(e.getMessage().contains("logoPath"), e.getMessage());
    }

    private static List<org.w3c.dom.Element> elementsWithClass(org.w3c.dom.Node root, String tag, String css) {
        org.w3c.dom.NodeList all = root instanceof org.w3c.dom.Document d ? d.getElementsByTagNameNS("*", tag)
                : ((org.w3c.dom.Element) root).getElementsByTagNameNS("*", tag);
        List<org.w3c.dom.Element> out = new ArrayList<>();
        for (int i = 0; i < all.getLength(); i++) {
            org.w3c.dom.Element e = (org.w3c.dom.Element) all.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(css)) {
                out.add(e);
            }
        }
        return out;
    }

    static String text(byte[] pdf) throws IOException {
        return text(pdf, false);
    }

    /**
     * Lines joined (a value may wrap inside its table cell). Content order keeps table cells whole;
     * position order is needed for the footer, whose page number is generated content drawn last.
     */
    static String text(byte[] pdf, boolean byPosition) throws IOException {
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setSortByPosition(byPosition);
            return stripper.getText(doc).replaceAll("\\s+", " ");
        }
    }

    private static float maxTextRight(byte[] pdf) throws IOException {
        float[] max = {0};
        try (PDDocument doc = Loader.loadPDF(pdf)) {
            PDFTextStripper s = new PDFTextStripper() {
                @Override
                protected void writeString(String text, List<TextPosition> positions) throws IOException {
                    for (TextPosition p : positions) {
                        max[0] = Math.max(max[0], p.getXDirAdj() + p.getWidthDirAdj());
                    }
                    super.writeString(text, positions);
                }
            };
            s.getText(doc);
        }
        return max[0];
    }

    private static String sha256(byte[] b) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
    }
}
