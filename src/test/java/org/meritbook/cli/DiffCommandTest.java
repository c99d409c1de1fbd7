package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.meritbook.dossier.PdfAssertions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A data correction issued as revision 2, and {@code meritbook diff} between the two dossiers. */
class DiffCommandTest {
    @TempDir
    Path dir;

    private static String execute(int expectedCode, String... args) {
        Cli.Outcome o = Cli.execute(args);
        assertEquals(expectedCode, o.code(), o.out() + "\n" + o.err());
        return o.out();
    }

    @Test
    void aCorrectedCellShowsWithTheResultsItMoved() throws Exception {
        Path study = dir.resolve("study");
        Files.createDirectories(study);
        Path workbook = study.resolve("hmf-honey-validation.xlsx");
        Path notebook = study.resolve("hmf-honey-validation.md");
        Files.copy(Path.of("demo-data/hmf-honey-validation.xlsx"), workbook);
        Files.copy(Path.of("demo-data/hmf-honey-validation.md"), notebook);
        String out = dir.resolve("out").toString();
        execute(0, "run", notebook.toString(), "-o", out);

        // Correct Calibration!D16 (a transcription error) and issue revision 2.
        try (InputStream in = Files.newInputStream(workbook); XSSFWorkbook wb = new XSSFWorkbook(in)) {
            wb.getSheet("Calibration").getRow(15).getCell(3).setCellValue(21.80);
            try (OutputStream os = Files.newOutputStream(workbook)) {
                wb.write(os);
            }
        }
        Files.writeString(notebook, Files.readString(notebook).replace("revision: 1", "revision: 2")
                .replace("revision-reason: \"First issue\"", "revision-reason: \"D16 corrected from 21.08 to 21.80\""));
        execute(0, "run", notebook.toString(), "-o", out);

        Path rev1 = dir.resolve("out/hmf-honey-validation/rev1/hmf-honey-validation-rev1.pdf");
        Path rev2 = dir.resolve("out/hmf-honey-validation/rev2/hmf-honey-validation-rev2.pdf");
        assertTrue(Files.exists(rev1), "revision 1 is kept beside revision 2");
        String report = execute(1, "diff", rev1.toString(), rev2.toString());
        assertTrue(report.contains("Calibration!D16: 21.08 → 21.8"), report);
        assertTrue(report.contains("lab (hmf-honey-validation.xlsx): SHA-256"), report);
        assertTrue(report.contains("linearity.slope: "), report);
        assertTrue(report.contains("linearity.back_calculated:D16: "), report);
        assertTrue(!report.contains("Calibration!D15:"), "an unchanged cell is not listed:\n" + report);
        // 1/x² and 1/y² are within 0.02 % of each other in Σ|%dev| on these data, so the correction tips
        // weighting: auto from one to the other; diff must say so, among the settings.
        assertTrue(report.contains("linearity Weighting: 1/y^2 (chosen by auto) → 1/x^2 (chosen by auto)"), report);

        // Revision 2's dossier carries the history and the changes since revision 1, found beside it.
        String text;
        try (PDDocument doc = Loader.loadPDF(rev2.toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains("Changes since revision 1 (hmf-honey-validation-rev1.pdf)"), "changes chapter");
        assertTrue(text.contains("Calibration!D16 21.08 21.8"), "the corrected cell in the changes");
        assertTrue(text.contains("1 2026-11-20 First issue"), "revision 1 in the history");
        assertTrue(text.contains("D16 corrected from 21.08 to 21.80"), "revision 2's reason");
        JsonNode results = new ObjectMapper().readTree(dir.resolve("out/hmf-honey-validation/rev2/results.json").toFile());
        assertEquals(1, results.get("study").get("history").get(0).get("revision").asInt());
        assertEquals("First issue", results.get("study").get("history").get(0).get("reason").asText());
        PdfAssertions.assertPdfA3(Files.readAllBytes(rev2)); // veraPDF, with the changes tables
        // results.json records the changes, so verify renders the changes chapter again from the attachments.
        assertEquals("hmf-honey-validation-rev1.pdf", results.get("study").get("changes").get("since").asText());
        Cli.Outcome verified = Cli.execute("verify", rev2.toString());
        assertEquals(0, verified.code(), verified.out() + verified.err());

        String same = execute(0, "diff", rev2.toString(), dir.resolve("out/hmf-honey-validation/rev2/results.json").toString());
        assertTrue(same.contains(": none"), same);

        // --json for tools, with the same exit codes.
        JsonNode json = new ObjectMapper().readTree(execute(1, "diff", "--json", rev1.toString(), rev2.toString()));
        assertEquals(false, json.get("identical").asBoolean());
        assertEquals("hmf-honey-validation-rev1.pdf", json.get("before").asText());
        JsonNode cell = json.get("cells").get(0);
        assertEquals("Calibration!D16", cell.get("what").asText());
        assertEquals("21.08", cell.get("before").asText());
        assertEquals("21.8", cell.get("after").asText());
        assertTrue(json.get("results").size() > 10, "every moved result is listed");
        assertEquals(true, new ObjectMapper().readTree(execute(0, "diff", "--json", rev2.toString(), rev2.toString()))
                .get("identical").asBoolean());
    }

    @Test
    void aDamagedResultsFileIsTroubleWithItsLocation() throws Exception {
        ObjectMapper mapper = new ObjectMapper();
        Path good = dir.resolve("good.json");
        Files.write(good, org.meritbook.revision.ResultsJson.toBytes(
                org.meritbook.dossier.DossierFixtures.results(Files.createDirectories(dir.resolve("fixture")))));
        com.fasterxml.jackson.databind.node.ObjectNode tree =
                (com.fasterxml.jackson.databind.node.ObjectNode) mapper.readTree(good.toFile());
        ((com.fasterxml.jackson.databind.node.ObjectNode) tree.get("inputs").get(0)).remove("sha256");
        Path removed = dir.resolve("removed.json");
        mapper.writeValue(removed.toFile(), tree);
        ((com.fasterxml.jackson.databind.node.ObjectNode) tree.get("inputs").get(0)).put("sha256", "0".repeat(64));
        tree.put("sections", 7);
        Path wrongType = dir.resolve("wrong-type.json");
        mapper.writeValue(wrongType.toFile(), tree);

        Cli.Outcome o = Cli.execute("diff", good.toString(), removed.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("removed.json, at $.inputs[0].sha256: expected the field 'sha256' but found nothing "
                + "(the field is missing)."), o.err());
        o = Cli.execute("diff", wrongType.toString(), good.toString());
        assertEquals(2, o.code(), o.out() + o.err());
        assertTrue(o.err().contains("wrong-type.json, at $.sections: expected an array but found the number 7."), o.err());
        assertEquals(0, Cli.execute("diff", good.toString(), good.toString()).code());
        assertEquals(2, Cli.execute("diff", good.toString(), dir.resolve("absent.json").toString()).code());
    }
}
