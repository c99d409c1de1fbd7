package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.bench.BigBlockWorkbook;
import org.meritbook.cli.Cli.Outcome;

/**
 * A study whose data block has 600 rows (above the 500 a dossier prints): the data table is
 * summarised with its first and last rows and its range, the full table is attached to the PDF as
 * CSV with every value beside its cell, and {@code meritbook verify} still re-runs the dossier from its attachments to the same bytes.
 */
class LargeBlockDossierTest {
    private static final int ROWS = 600;

    @TempDir
    static Path dir;
    static Path pdf;
    static String html;

    @BeforeAll
    static void runTheStudy() throws IOException {
        Path notebook = BigBlockWorkbook.write(dir.resolve("study"), ROWS);
        Outcome o = Cli.execute("run", notebook.toString(), "-o", dir.resolve("out").toString());
        assertEquals(0, o.code(), o.err());
        Path rev = dir.resolve("out/analyser-checks/rev1");
        pdf = rev.resolve("analyser-checks-rev1.pdf");
        html = Files.readString(rev.resolve("analyser-checks-rev1.html"), StandardCharsets.UTF_8);
    }

    private static Map<String, byte[]> attachments() throws IOException {
        Map<String, byte[]> out = new LinkedHashMap<>();
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            var names = doc.getDocumentCatalog().getNames().getEmbeddedFiles().getNames();
            for (var e : names.entrySet()) {
                out.put(e.getKey(), e.getValue().getEmbeddedFile().toByteArray());
            }
        }
        return out;
    }

    @Test
    void theDataTableIsSummarisedWithItsRangeAndTheAttachmentNamed() throws IOException {
        String csv = attachments().keySet().stream().filter(n -> n.endsWith(".csv")).findFirst().orElseThrow();
        assertTrue(html.contains("Summary of the data as read from Checks!A4:D603: 600 rows, of which the first 10 and the "
                + "last 10 are printed. The full table, every value with its workbook cell, is attached to the PDF as " + csv), html);
        assertTrue(html.contains("… 580 rows not printed (sheet rows 14 to 593): see the attached " + csv + " …"));
        // the rows printed: sheet rows 4 to 13 and 594 to 603, none between
        assertTrue(html.contains("<td class=\"c-row\">13</td>") && html.contains("<td class=\"c-row\">594</td>"));
        assertFalse(html.contains("<td class=\"c-row\">14</td>") || html.contains("<td class=\"c-row\">593</td>"));
    }

    @Test
    void theFullTableTravelsAsCsvWithEveryValueBesideItsCell() throws IOException {
        Map<String, byte[]> files = attachments();
        byte[] csv = files.entrySet().stream().filter(e -> e.getKey().endsWith(".csv")).findFirst().orElseThrow().getValue();
        List<String> lines = List.of(new String(csv, StandardCharsets.UTF_8).split("\r\n"));
        assertEquals(ROWS + 1, lines.size());
        // the columns the section reads (the injection number is not one of them)
        assertEquals("Point,Level,Level cell,Run,Run cell,Nitrate (mg/L),Nitrate (mg/L) cell,Excluded because", lines.get(0));
        assertTrue(lines.get(1).contains(",QC 2.0,Checks!A4,R0001,Checks!B4,"), lines.get(1));
        assertTrue(lines.get(1).endsWith(",Checks!D4,"), lines.get(1));
        assertTrue(lines.get(ROWS).contains(",Checks!D603,"), lines.get(ROWS));
        assertTrue(files.containsKey("results.json") && files.containsKey(BigBlockWorkbook.WORKBOOK));
    }

    @Test
    void verifyReRunsTheDossierFromItsAttachments() {
        Outcome o = Cli.execute("verify", pdf.toString());
        assertEquals(0, o.code(), o.out() + o.err());
    }
}
