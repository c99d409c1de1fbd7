package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** A data correction issued as revision 2, and {@code meritbook diff} between the two dossiers. */
class DiffCommandTest {
    @TempDir
    Path dir;

    private static String execute(int expectedCode, String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        assertEquals(expectedCode, cl.execute(args), out + "\n" + err);
        return out.toString();
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

        String same = execute(0, "diff", rev2.toString(), dir.resolve("out/hmf-honey-validation/results.json").toString());
        assertTrue(same.contains(": none"), same);
    }
}
