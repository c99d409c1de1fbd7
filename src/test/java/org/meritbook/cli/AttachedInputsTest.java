package org.meritbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.cli.Cli.Outcome;

/** What a dossier carries: the files the run read, the notebook and the lab's profile, nothing else. */
class AttachedInputsTest {
    @TempDir
    Path dir;

    private Path study(String extraSources, String workbookName) throws Exception {
        SmallCalibration.csv(dir.resolve(workbookName));
        String sheet = workbookName.substring(0, workbookName.lastIndexOf('.'));
        Path nb = dir.resolve("study.md");
        Files.writeString(nb, """
                ---
                title: Attachment check
                sources:
                  runs: %s
                %s---

                ```calibration
                data: runs!%s!A1:B6
                x: Conc
                y: Area
                ```
                """.formatted(workbookName, extraSources, sheet));
        return nb;
    }

    private Outcome run(Path notebook) {
        return Cli.execute("run", notebook.toString(), "-o", dir.resolve("out").toString());
    }

    private static Set<String> attachments(Path pdf) throws Exception {
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            return doc.getDocumentCatalog().getNames().getEmbeddedFiles().getNames().keySet();
        }
    }

    private List<String> outputFiles() throws Exception {
        List<String> files = new ArrayList<>();
        if (Files.exists(dir.resolve("out"))) {
            try (var walk = Files.walk(dir.resolve("out"))) {
                walk.filter(Files::isRegularFile).forEach(p -> files.add(p.getFileName().toString()));
            }
        }
        return files;
    }

    @Test
    void etcPasswdAsAnUnusedSourceIsALocatedErrorAndNothingIsWritten() throws Exception {
        for (String path : List.of("/etc/passwd", "../../../../etc/passwd", "/etc/shadow")) {
            Outcome o = run(study("  secret: " + path + "\n", "runs.csv"));
            assertEquals(2, o.code(), o.out() + o.err());
            assertTrue(o.err().contains("study.md line 5: expected a workbook file (.xlsx, .xlsm, .xls or .csv) for "
                    + "source 'secret' but found '" + path + "'."), o.err());
            assertFalse(outputFiles().stream().anyMatch(n -> n.endsWith(".pdf") || n.endsWith(".json")),
                    "nothing written: " + outputFiles());
        }
    }

    @Test
    void aDeclaredButUnusedWorkbookIsAWarningNeverAnAttachment() throws Exception {
        Path elsewhere = Files.createDirectories(dir.resolve("elsewhere"));
        Files.writeString(elsewhere.resolve("private-notes.csv"), "who,what\nme,a secret\n");
        Outcome o = run(study("  notes: elsewhere/private-notes.csv\n", "runs.csv"));
        assertEquals(0, o.code(), o.out() + o.err());
        String warning = "Source 'notes' (elsewhere/private-notes.csv, study.md line 5) is declared but no cell reads "
                + "it: it was not read, checksummed or attached.";
        assertTrue(o.out().contains("warning: " + warning), o.out());

        Path pdf = dir.resolve("out/study/rev1/study-rev1.pdf");
        assertEquals(Set.of("study.md", "runs.csv", "results.json"), attachments(pdf));
        String text;
        try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
            text = new PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
        }
        assertTrue(text.contains("Warnings about the study"), "the dossier shows the warning");
        assertTrue(text.contains("is declared but no cell reads it"), text);
        assertFalse(text.contains("private-notes.csv, SHA") || text.contains("a secret"), "not in the manifest");

        JsonNode results = new ObjectMapper().readTree(dir.resolve("out/study/rev1/results.json").toFile());
        assertEquals(warning + " Remove it from sources: or use it in a cell.",
                results.get("study").get("warnings").get(0).asText());
        List<String> aliases = new ArrayList<>();
        results.get("inputs").forEach(i -> aliases.add(i.get("alias").asText()));
        assertEquals(List.of("notebook", "runs"), aliases, "the unused source is not an input");
    }

    @Test
    void aMissingUnusedSourceIsOnlyTheWarning() throws Exception {
        Outcome o = run(study("  later: not-yet-measured.xlsx\n", "runs.csv"));
        assertEquals(0, o.code(), o.out() + o.err());
        assertTrue(o.out().contains("Source 'later' (not-yet-measured.xlsx, study.md line 5) is declared but no cell"),
                o.out());
    }

    @Test
    void workbookExtensionsAreRecognisedWhateverTheirCase() throws Exception {
        Outcome o = run(study("", "RUNS.CSV"));
        assertEquals(0, o.code(), o.out() + o.err());
        assertEquals(Set.of("study.md", "RUNS.CSV", "results.json"),
                attachments(dir.resolve("out/study/rev1/study-rev1.pdf")));
    }
}
