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

        Path rev1 = dir.resolve("out/hmf-honey-validation/hmf-honey-validation-rev1.pdf");
        Path rev2 = dir.resolve("out/hmf-honey-validation/hmf-honey-validation-rev2.pdf");
        assertTrue(Files.exists(rev1), "revision 1 is kept beside revision 2");
        String report = execute(0, "diff", rev1.toString(), rev2.toString());
        assertTrue(report.contains("Calibration!D16: 21.08 → 21.8"), report);
        assertTrue(report.contains("lab (hmf-honey-validation.xlsx): SHA-256"), report);
        assertTrue(report.contains("linearity.slope: "), report);
        assertTrue(report.contains("linearity.back_calculated:D16: "), report);
        assertTrue(!report.contains("Calibration!D15:"), "an unchanged cell is not listed:\n" + report);
        assertTrue(!report.contains("Settings"), "no statistical choice changed:\n" + report);

        // Revision 2's dossier carries the history and the changes since revision 1, found beside it.
        String text;
        try (PDDocument doc = Loader.loadPDF(rev2.toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains("Changes since revision 1 (hmf-honey-validation-rev1.pdf)"), "changes chapter");
        assertTrue(text.contains("Calibration!D16 21.08 21.8"), "the corrected cell in the changes");
        assertTrue(text.contains("1 2026-11-20 First issue"), "revision 1 in the history");
        assertTrue(text.contains("D16 corrected from 21.08 to 21.80"), "revision 2's reason");
        JsonNode results = new ObjectMapper().readTree(dir.resolve("out/hmf-honey-validation/results.json").toFile());
        assertEquals(1, results.get("study").get("history").get(0).get("revision").asInt());
        assertEquals("First issue", results.get("study").get("history").get(0).get("reason").asText());
        PdfAssertions.assertPdfA3(Files.readAllBytes(rev2)); // veraPDF, with the changes tables

        String same = execute(0, "diff", rev2.toString(), dir.resolve("out/hmf-honey-validation/results.json").toString());
        assertTrue(same.contains(": none"), same);
    }
}
