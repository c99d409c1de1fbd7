package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.cli.Cli.Outcome;

/** Exit codes and messages as a user meets them (DESIGN §6 and §7). */
class CommandLineTest {
    @TempDir
    Path dir;

    /** A small workbook: Cal!A1:B6 with header "Conc (mg/L)", "Area"; one text entry when asked. */
    private Path workbook(String badEntry) throws Exception {
        Path file = dir.resolve("runs.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream os = Files.newOutputStream(file)) {
            Sheet s = wb.createSheet("Cal");
            Row h = s.createRow(0);
            h.createCell(0).setCellValue("Conc (mg/L)");
            h.createCell(1).setCellValue("Area");
            double[][] data = {{1, 10.2}, {2, 19.9}, {4, 40.5}, {8, 79.4}, {16, 161.0}};
            for (int i = 0; i < data.length; i++) {
                Row r = s.createRow(i + 1);
                r.createCell(0).setCellValue(data[i][0]);
                if (badEntry != null && i == 2) {
                    r.createCell(1).setCellValue(badEntry);
                } else {
                    r.createCell(1).setCellValue(data[i][1]);
                }
            }
            wb.write(os);
        }
        return file;
    }

    private Path notebook(String data) throws Exception {
        Path nb = dir.resolve("study.md");
        Files.writeString(nb, """
                ---
                title: Exit code check
                sources:
                  runs: runs.xlsx
                ---

                ```calibration
                data: %s
                x: Conc
                y: Area
                ```
                """.formatted(data));
        return nb;
    }

    @Test
    void aGoodStudyExitsZero() throws Exception {
        workbook(null);
        Outcome o = Cli.execute("run", notebook("runs!Cal!A1:B6").toString(), "-o", dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(Files.exists(dir.resolve("out/study/rev1/results.json")));
        assertTrue(Files.exists(dir.resolve("out/study/rev1/trail.md")));
    }

    @Test
    void aChangedStudyUnderTheSameRevisionIsRefusedAndLeavesEveryOutputAsItWas() throws Exception {
        workbook(null);
        Path nb = notebook("runs!Cal!A1:B6");
        String out = dir.resolve("out").toString();
        assertEquals(0, Cli.execute("run", nb.toString(), "-o", out).code());
        Path results = dir.resolve("out/study/rev1/results.json");
        Path pdf = dir.resolve("out/study/rev1/study-rev1.pdf");
        byte[] firstResults = Files.readAllBytes(results);
        byte[] firstPdf = Files.readAllBytes(pdf);
        assertEquals(0, Cli.execute("run", nb.toString(), "-o", out).code(), "an identical re-run is fine");

        Files.writeString(nb, Files.readString(nb).replace("y: Area", "y: Area\nweighting: 1/x"));
        Outcome refused = Cli.execute("run", nb.toString(), "-o", out);
        assertEquals(2, refused.code());
        assertTrue(refused.err().contains("Raise 'revision:' in the notebook's front matter"), refused.err());
        assertArrayEquals(firstResults, Files.readAllBytes(results), "results.json untouched");
        assertArrayEquals(firstPdf, Files.readAllBytes(pdf), "dossier untouched");

        assertEquals(0, Cli.execute("run", nb.toString(), "-o", out, "--force").code());
        assertFalse(java.util.Arrays.equals(firstPdf, Files.readAllBytes(pdf)), "--force replaced the dossier");
        try (var files = Files.list(dir.resolve("out/study"))) {
            assertEquals(List.of(".meritbook.lock", "rev1"),
                    files.map(p -> p.getFileName().toString()).sorted().toList(), "no staging folder left");
        }
        try (var files = Files.list(dir.resolve("out/study/rev1"))) {
            assertEquals(List.of("results.json", "study-rev1.html", "study-rev1.pdf", "trail.md"),
                    files.map(p -> p.getFileName().toString()).sorted().toList(), "the whole set, nothing else");
        }
    }

    @Test
    void aFailedAcceptanceRuleExitsOneAndStillWritesTheDossier() throws Exception {
        workbook(null);
        Path nb = notebook("runs!Cal!A1:B6");
        Files.writeString(dir.resolve("strict.yaml"), """
                name: strict
                rules:
                  - quantity: r_squared
                    at-least: 0.9999999
                    characteristic: Linearity
                """);
        Files.writeString(nb, Files.readString(nb).replace("title: Exit code check", "title: Exit code check\ncriteria: strict.yaml"));
        Outcome o = Cli.execute("run", nb.toString(), "-o", dir.resolve("out").toString());
        assertEquals(1, o.code(), o.err());
        assertTrue(o.out().contains("acceptance (strict.yaml): 0 passed, 1 failed, 0 not evaluable"), o.out());
        assertTrue(o.out().contains("FAIL Linearity: r_squared = 0.99"), o.out());
        assertTrue(Files.exists(dir.resolve("out/study/rev1/study-rev1.pdf")), "the dossier is written all the same");
    }

    @Test
    void aSupportingCellIsJudgedAndShownButKeptOutOfTheOutcome() throws Exception {
        workbook(null);
        Path nb = notebook("runs!Cal!A1:B6");
        Files.writeString(dir.resolve("strict.yaml"), """
                name: strict
                rules:
                  - quantity: r_squared
                    at-least: 0.9999999
                    characteristic: Linearity
                """);
        Files.writeString(nb, Files.readString(nb)
                .replace("title: Exit code check", "title: Exit code check\ncriteria: strict.yaml")
                .replace("y: Area\n", "y: Area\nrole: supporting\n"));
        Outcome o = Cli.execute("run", nb.toString(), "-o", dir.resolve("out").toString());
        assertEquals(0, o.code(), "only reporting cells' failures give exit 1: " + o.out() + o.err());
        assertTrue(o.out().contains("acceptance (strict.yaml): 0 passed, 0 failed, 0 not evaluable"), o.out());
        assertTrue(o.out().contains("supporting calibration (not counted): 0 passed, 1 failed"), o.out());
        String json = Files.readString(dir.resolve("out/study/rev1/results.json"));
        assertTrue(json.contains("\"role\" : \"supporting\""), json);
        assertTrue(json.contains("\"outcome\" : \"fail\""), "still judged: " + json);
        String html = Files.readString(dir.resolve("out/study/rev1/study-rev1.html"));
        assertTrue(html.contains("supporting check: not counted in the overall outcome"), "said beside the verdict");
        assertTrue(html.contains("0 passed, 0 failed, 0 not evaluable"), "the counts leave it out");
    }

    @Test
    void anUnknownRoleIsALocatedError() throws Exception {
        workbook(null);
        Path nb = notebook("runs!Cal!A1:B6");
        Files.writeString(nb, Files.readString(nb).replace("y: Area\n", "y: Area\nrole: support\n"));
        Outcome o = Cli.execute("run", nb.toString(), "-o", dir.resolve("out").toString());
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains("study.md line 11"), o.err());
        assertTrue(o.err().contains("supporting"), o.err());
    }

    @Test
    void textInANumericColumnExitsTwoNamingTheCell() throws Exception {
        workbook("<0.05");
        Outcome o = Cli.execute("run", notebook("runs!Cal!A1:B6").toString(), "-o", dir.resolve("out").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("runs.xlsx, Cal!B4: expected a number in column 'Area' but found the censored "
                + "result '<0.05'."), o.err());
        assertFalse(Files.exists(dir.resolve("out/study/rev1/results.json")), "no results from bad input");
    }

    @Test
    void aMissingSheetExitsTwo() throws Exception {
        workbook(null);
        Outcome o = Cli.execute("run", notebook("runs!Calibration!A1:B6").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("runs.xlsx, data reference 'runs!Calibration!A1:B6' (notebook line 8): expected a "
                + "sheet named 'Calibration' but found only the sheet 'Cal'. Correct the sheet name in the data "
                + "reference."), o.err());
    }

    @Test
    void anUndeclaredSourceExitsTwoWithTheLine() throws Exception {
        workbook(null);
        Outcome o = Cli.execute("run", notebook("lab!Cal!A1:B6").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("study.md line 8"), o.err());
        assertTrue(o.err().contains("runs"), o.err());
    }

    @Test
    void aCorruptWorkbookExitsTwo() throws Exception {
        Files.writeString(dir.resolve("runs.xlsx"), "this is not a workbook");
        Outcome o = Cli.execute("run", notebook("runs!Cal!A1:B6").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("runs.xlsx, data reference 'runs!Cal!A1:B6' (notebook line 8): expected an Excel "
                + "workbook (.xlsx) but found a file that is not a workbook (neither a zip package nor an OLE2 file)."),
                o.err());
    }

    @Test
    void aMissingNotebookExitsTwo() {
        Outcome o = Cli.execute("run", dir.resolve("nope.md").toString());
        assertEquals(2, o.code());
        assertTrue(o.err().contains("nope.md"), o.err());
    }

    @Test
    void qualifyWritesADatedRecordAndPasses() throws Exception {
        Outcome o = Cli.execute("qualify", "-o", dir.toString());
        assertEquals(0, o.code(), o.err());
        assertTrue(o.out().startsWith("meritbook: qualification passed: 117 of 117 NIST certified figures"), o.out());
        try (var files = Files.list(dir.resolve("qualification"))) {
            List<Path> records = files.toList();
            assertEquals(1, records.size());
            assertTrue(Files.readString(records.get(0)).contains("**Outcome: all 117 figures passed.**"));
        }
    }

    @Test
    void versionAndHelpAnswer() {
        Outcome v = Cli.execute("--version");
        assertEquals(0, v.code());
        assertTrue(v.out().startsWith("meritbook "), v.out());
        Outcome h = Cli.execute("--help");
        assertEquals(0, h.code());
        assertTrue(h.out().contains("run") && h.out().contains("demo"), h.out());
        Outcome bad = Cli.execute("frobnicate");
        assertEquals(2, bad.code());
    }

    @Test
    void aFileWhereTheOutputFolderShouldBeExitsTwoLocated() throws Exception {
        workbook(null);
        Path file = Files.writeString(dir.resolve("out"), "not a folder");
        Outcome o = Cli.execute("run", notebook("runs!Cal!A1:B6").toString(), "-o", file.toString());
        assertEquals(Main.BAD_INPUT, o.code(), o.err());
        assertTrue(o.err().contains(file.toAbsolutePath() + ": expected a folder to write the output set in"), o.err());
        assertFalse(o.err().contains("\tat "), "no stack trace");
    }

    @Test
    void runningOutOfMemoryIsOnePlainLineAndExitThreeNeverOne() {
        java.io.StringWriter err = new java.io.StringWriter();
        int code = Main.guarded(() -> {
            throw new OutOfMemoryError("Java heap space");
        }, new java.io.PrintWriter(err));
        assertEquals(Main.INTERNAL_ERROR, code);
        assertEquals(1, err.toString().strip().lines().count(), err.toString());
        assertTrue(err.toString().startsWith("meritbook: out of memory (Java heap space)"), err.toString());
        assertTrue(err.toString().contains("MERITBOOK_JAVA_OPTS=-Xmx4g"));
    }

    @Test
    void aPerfectFitExitsZeroAndItsWarningsReachTheSummaryAndTheCount() throws Exception {
        Files.writeString(dir.resolve("runs.csv"), "Conc (mg/L),Area\n1,10\n2,20\n4,40\n8,80\n");
        Path nb = Files.writeString(dir.resolve("study.md"), """
                ---
                title: Perfect
                sources:
                  runs: runs.csv
                ---

                ```calibration
                data: runs!runs
                x: Conc
                y: Area
                ```
                """);
        Outcome o = Cli.execute("run", nb.toString(), "-o", dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        String html = Files.readString(dir.resolve("out/study/rev1/study-rev1.html"));
        // Perfect fit; lack of fit, Mandel, Shapiro–Wilk, the intercept's t test and the regression ANOVA's F not evaluable.
        assertTrue(html.contains("without a criterion; 6 warnings"), "the count includes the section's warnings");
        assertTrue(html.contains("<li>calibration: Perfect fit"), "the summary lists the section's warning");
    }
}
