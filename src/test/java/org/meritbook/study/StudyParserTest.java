package org.meritbook.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** A complete notebook in the shape of DESIGN §3 (invented content) read into its elements. */
class StudyParserTest {
    private static final Path FILE = Path.of("/lab/studies/fluoride.md");

    static final String NOTEBOOK = """
        ---
        title: Validation of fluoride in well water by ion-selective electrode
        method: KWL-ISE-03
        laboratory: Kestrel Wells Laboratory
        revision: 3
        revision-reason: Standard 4 re-read after electrode drift
        prepared-by: B. Chemist
        date: 2025-02-28
        criteria: trace-water          # acceptance profile
        x-reviewers: [C. Checker, D. Doublecheck]
        sources:
          runs: data/fluoride-runs.xlsx
          blanks: blank-log.xlsx
        ---

        # Fluoride study

        Introductory paragraph with *emphasis*.

        ## Linearity
        Six standards, two readings each.

        ```calibration
        data: runs!Calibration!A4:C16     # headers in the first row
        x: Nominal
        y: Potential
        weighting: 1/x²
        model: linear
        exclude:
          - cell: Calibration!C9
            reason: Electrode not rinsed
          - cell: "'Day 2'!B5"
            reason: Bubble on membrane
        ```

        ```calibration
        id: weighted-fit
        data: runs!'Day 2'!B:C
        x: Nominal
        y: Potential
        weighting: auto
        ```

        ```text
        note: this block only shows text
        ```

        ## Detection limits

        ```detection-limit
        methods: [blank, lob-lod]
        calibration: weighted-fit
        blanks:
          data: blanks!Blanks
          column: Signal
          units: concentration
        low-samples:
          data: runs!LowLevel
          column: Result
          sample: Sample
        k: 3
        ```

        ```calibration
        data: runs!Calibration!A20:C32
        x: B
        y: C
        ```

        Closing remarks.""";

    private final Study study = StudyParser.parse(NOTEBOOK, FILE);

    @Test
    void frontMatterIsTypedAndKeptAsWritten() {
        FrontMatter fm = study.frontMatter();
        assertEquals("Validation of fluoride in well water by ion-selective electrode", fm.title());
        assertEquals("KWL-ISE-03", fm.method());
        assertEquals("Kestrel Wells Laboratory", fm.laboratory());
        assertEquals(3, fm.revision());
        assertEquals("Standard 4 re-read after electrode drift", fm.revisionReason());
        assertEquals("B. Chemist", fm.preparedBy());
        assertEquals("2025-02-28", fm.date());
        assertEquals("trace-water", fm.criteria());
        assertEquals(List.of("title", "method", "laboratory", "revision", "revision-reason", "prepared-by", "date",
                "criteria", "x-reviewers", "sources"), List.copyOf(fm.all().keySet()));
        assertEquals(List.of("C. Checker", "D. Doublecheck"), fm.all().get("x-reviewers"));
        assertEquals(Map.of("runs", "data/fluoride-runs.xlsx", "blanks", "blank-log.xlsx"), fm.all().get("sources"));
    }

    @Test
    void sourcesAreResolvedAgainstTheNotebookFolder() {
        assertEquals(List.of("runs", "blanks"), List.copyOf(study.sources().keySet()));
        SourceFile runs = study.sources().get("runs");
        assertEquals(Path.of("/lab/studies/data/fluoride-runs.xlsx"), runs.path());
        assertEquals("data/fluoride-runs.xlsx", runs.written());
        assertEquals(12, runs.line());
        assertEquals(13, study.sources().get("blanks").line());
    }

    @Test
    void elementsAlternateNarrativeAndCellsInNotebookOrder() {
        List<StudyElement> e = study.elements();
        assertEquals(7, e.size());
        assertEquals(List.of(16, 23, 36, 44, 50, 64, 70), e.stream().map(StudyElement::line).toList());
        assertInstanceOf(Narrative.class, e.get(0));
        assertInstanceOf(AnalysisCell.class, e.get(1));
        assertInstanceOf(AnalysisCell.class, e.get(2));
        assertInstanceOf(Narrative.class, e.get(3));
        assertInstanceOf(AnalysisCell.class, e.get(4));
        assertInstanceOf(AnalysisCell.class, e.get(5));
        assertInstanceOf(Narrative.class, e.get(6));
    }

    @Test
    void narrativeIsKeptVerbatimIncludingNonAnalysisFences() {
        List<String> texts = study.elements().stream().filter(Narrative.class::isInstance)
                .map(n -> ((Narrative) n).markdown()).toList();
        assertEquals(List.of(
                "# Fluoride study\n\nIntroductory paragraph with *emphasis*.\n\n## Linearity\nSix standards, two readings each.",
                "```text\nnote: this block only shows text\n```\n\n## Detection limits",
                "Closing remarks."), texts);
    }

    @Test
    void cellsGetIdsTitlesAndLines() {
        List<AnalysisCell> cells = study.cells();
        assertEquals(List.of("calibration", "weighted-fit", "detection-limit", "calibration-3"),
                cells.stream().map(AnalysisCell::id).toList());
        assertEquals(List.of("Linearity", "weighted-fit", "Detection limits", "calibration-3"),
                cells.stream().map(AnalysisCell::title).toList());
        assertEquals(List.of(AnalysisKind.CALIBRATION, AnalysisKind.CALIBRATION, AnalysisKind.DETECTION_LIMIT,
                AnalysisKind.CALIBRATION), cells.stream().map(AnalysisCell::kind).toList());
        assertEquals(List.of(23, 36, 50, 64), cells.stream().map(AnalysisCell::line).toList());
        assertTrue(study.cell("weighted-fit").isPresent());
    }

    @Test
    void optionsKeepTheTextWrittenAndTheirLines() {
        AnalysisCell cal = study.cells().get(0);
        assertEquals(List.of("data", "x", "y", "weighting", "model", "exclude"), List.copyOf(cal.options().keySet()));
        assertEquals("runs!Calibration!A4:C16", cal.option("data").orElseThrow().text());
        assertEquals("1/x²", cal.option("weighting").orElseThrow().text());
        assertEquals(26, cal.lineOf("y"));
        assertEquals(28, cal.lineOf("model"));
        assertEquals(23, cal.lineOf("censored")); // absent: the fence line

        AnalysisCell dl = study.cell("detection-limit").orElseThrow();
        OptionValue methods = dl.option("methods").orElseThrow();
        assertEquals(51, methods.line());
        assertEquals(List.of("blank", "lob-lod"), methods.list().stream().map(OptionValue::text).toList());
        OptionValue blanks = dl.option("blanks").orElseThrow();
        assertEquals(53, blanks.line());
        assertEquals(List.of("data", "column", "units"), List.copyOf(blanks.map().keySet()));
        assertEquals("Signal", blanks.map().get("column").text());
        assertEquals(55, blanks.map().get("column").line());
        assertEquals("3", dl.option("k").orElseThrow().text());
        assertEquals("weighted-fit", dl.option("calibration").orElseThrow().text());
    }

    @Test
    void exclusionsAreParsedWithQuotedSheetNames() {
        AnalysisCell cal = study.cells().get(0);
        assertEquals(List.of(
                new Exclusion("Calibration", "C9", "Electrode not rinsed", 30),
                new Exclusion("Day 2", "B5", "Bubble on membrane", 32)), cal.exclusions());
        assertEquals("Calibration!C9", cal.exclusions().get(0).address());
        assertTrue(study.cell("weighted-fit").orElseThrow().exclusions().isEmpty());
    }

    @Test
    void dataReferencesOfCellsAndNestedDataSets() {
        assertEquals(new DataReference("runs", "Calibration", "A4:C16", "runs!Calibration!A4:C16", 24),
                study.cells().get(0).dataReference().orElseThrow());
        assertEquals(new DataReference("runs", "Day 2", "B:C", "runs!'Day 2'!B:C", 38),
                study.cell("weighted-fit").orElseThrow().dataReference().orElseThrow());
        AnalysisCell dl = study.cell("detection-limit").orElseThrow();
        assertFalse(dl.dataReference().isPresent());
        DataReference blanks = dl.dataReference("blanks").orElseThrow();
        assertEquals(new DataReference("blanks", "Blanks", null, "blanks!Blanks", 54), blanks);
        assertFalse(blanks.hasRange());
        assertEquals(58, dl.dataReference("low-samples").orElseThrow().line());
        assertFalse(dl.dataReference("spikes").isPresent());
    }

    @Test
    void textIsKeptExactlyAsRead() {
        assertEquals(NOTEBOOK, study.text());
        assertEquals(FILE, study.file());
    }

    @Test
    void revisionDefaultsToOneAndNotebookWithoutCellsIsAllNarrative() {
        Study s = StudyParser.parse("""
                ---
                title: Only words
                ---
                Nothing to compute yet.
                """, FILE);
        assertEquals(1, s.frontMatter().revision());
        assertNull(s.frontMatter().date());
        assertEquals(List.of(new Narrative("Nothing to compute yet.", 4)), s.elements());
        assertTrue(s.sources().isEmpty());
    }

    @Test
    void windowsLineEndingsAndByteOrderMarkKeepLinesAndNarrativeVerbatim() {
        String text = "\uFEFF---\r\ntitle: Crlf\r\nsources:\r\n  runs: r.xlsx\r\n---\r\n## Slope\r\nFirst.\r\nSecond.\r\n\r\n"
                + "```calibration\r\ndata: runs!S!A1:B9\r\nx: A\r\ny: B\r\n```\r\n";
        Study s = StudyParser.parse(text, FILE);
        assertEquals(new Narrative("## Slope\r\nFirst.\r\nSecond.", 6), s.elements().get(0));
        AnalysisCell cell = s.cells().get(0);
        assertEquals(10, cell.line());
        assertEquals("Slope", cell.title());
        assertEquals(12, cell.lineOf("x"));
    }

    @Test
    void blockScalarsAndIndentedFencesKeepNotebookLines() {
        Study s = StudyParser.parse("""
                ---
                title: Indented
                sources:
                  runs: r.xlsx
                ---
                  ```precision
                  data: runs!Repeats!A1:C30
                  value: Result
                  group: Day
                  ```
                """, FILE);
        AnalysisCell cell = s.cells().get(0);
        assertEquals(6, cell.line());
        assertEquals(9, cell.lineOf("group"));
        assertEquals("Day", cell.option("group").orElseThrow().text());
    }
}
