package org.meritbook.analysis.unknowns;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.analysis.Verdict;
import org.meritbook.criteria.BuiltInProfiles;
import org.meritbook.criteria.LevelRule;
import org.meritbook.dossier.DossierRenderer;
import org.meritbook.pipeline.StudyResults;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;

/**
 * QC samples read back through a calibration and judged with ICH M10's limits (ICH M10 (2022),
 * calibration curve, accuracy and precision, and analytical run acceptance, from memory): each QC
 * within ±15 % of the known value, ±20 % at the LLOQ, the calibration's lowest standard above zero (a
 * low QC above it is held to ±15 %); the bioanalysis-m10 profile accepts the run when two thirds of its
 * QCs, and half of those at each level, are within their limits. Calibration: Miller &amp; Miller's fluorescence example
 * (handbook worked example, ch. 5, from memory), a ≈ 1.518, b ≈ 1.930; each QC's reading is
 * a + b·x₀ for an intended x₀, far enough from the limits (±18 %, −5 %) that the fit's last digits
 * do not matter.
 */
class QcVerdictsTest {
    private static final Path FILE = Path.of("runs.xlsx");
    private static final double A = 1.518;
    private static final double B = 1.930;

    private static CellValue cell(String sheet, int col, int row, String raw) {
        CellRef ref = new CellRef(sheet, row, col);
        if (raw.isEmpty()) {
            return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, raw, null);
        }
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static DataBlock block(String sheet, String[] headers, String[] names, String[] units, String[][] rows) {
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < headers.length; c++) {
            List<CellValue> values = new ArrayList<>();
            for (int r = 0; r < rows.length; r++) {
                values.add(cell(sheet, c, r + 1, rows[r][c]));
            }
            columns.add(new Column(headers[c], names[c], units[c], CellRef.columnLetters(c), values));
        }
        return new DataBlock(FILE, sheet, "A1:" + CellRef.columnLetters(headers.length - 1) + (rows.length + 1), columns,
                List.of());
    }

    private static String reading(double x0) {
        return Double.toString(A + B * x0);
    }

    /** The unknowns section of these QC rows (sample, reading, known) read through the 0-12 mg/L calibration. */
    private static SectionResult qcs(String[][] samples, String extra) {
        return qcs(samples, "mg/L", "", extra);
    }

    /**
     * @param knownUnit   the unit of the known values' column
     * @param calibration lines added to the calibration cell (an exclusion)
     * @param extra       lines added to the unknowns cell
     */
    private static SectionResult qcs(String[][] samples, String knownUnit, String calibration, String extra) {
        return run(Path.of("study.md"), samples, knownUnit, calibration, extra).unknowns();
    }

    /** The study as parsed from {@code notebook}, its calibration and its unknowns section. */
    private record Run(Study study, SectionResult calibration, SectionResult unknowns) {
    }

    private static Run run(Path notebook, String[][] samples, String knownUnit, String calibration, String extra) {
        double[] x = {0, 2, 4, 6, 8, 10, 12};
        double[] y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
        String[][] cal = new String[x.length][];
        for (int i = 0; i < x.length; i++) {
            cal[i] = new String[] {Double.toString(x[i]), Double.toString(y[i])};
        }
        DataBlock standards = block("Cal", new String[] {"Conc (mg/L)", "Signal (counts)"},
                new String[] {"Conc", "Signal"}, new String[] {"mg/L", "counts"}, cal);
        DataBlock rows = block("Samples", new String[] {"Sample", "Signal (counts)", "Nominal (" + knownUnit + ")"},
                new String[] {"Sample", "Signal", "Nominal"}, new String[] {null, "counts", knownUnit}, samples);
        String text = """
                ---
                title: QC test
                sources:
                  runs: runs.xlsx
                ---

                ```calibration
                id: cal
                data: runs!Cal!A1:B8
                x: Conc
                y: Signal
                %s```

                ```unknowns
                calibration: cal
                data: runs!Samples!A1:C%d
                sample: Sample
                y: Signal
                known: Nominal
                %s```
                """.formatted(calibration, samples.length + 1, extra);
        if (!notebook.equals(Path.of("study.md"))) {
            try {
                Files.writeString(notebook, text, StandardCharsets.UTF_8); // the dossier attaches it
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        Study study = StudyParser.parse(text, notebook);
        AnalysisContext context = new AnalysisContext(study, ref -> ref.target().equals("Cal") ? standards : rows);
        SectionResult c = new CalibrationAnalysis().run(study.cells().get(0), context);
        return new Run(study, c, new UnknownsAnalysis().run(study.cells().get(1), context.with(c)));
    }

    /** One verdict per QC, with ICH M10's limits (±15 %, ±20 % at the LLOQ; from memory), as a lab profile writes it. */
    private static final LevelRule PER_QC = new LevelRule(AnalysisKind.UNKNOWNS, "QC samples", "qc_deviation_percent",
            true, 15, 20, "QC deviation", "ICH M10 (2022), from memory");

    private static List<Verdict> judged(SectionResult u) {
        return PER_QC.judge(u);
    }

    /** The section's "LLOQ level" setting: which QCs stand at the LLOQ, and how they were found. */
    private static String lloqSetting(SectionResult u) {
        return u.settings().stream().filter(s -> s.label().equals("LLOQ level")).map(Setting::value).findFirst()
                .orElse("(no LLOQ level setting)");
    }

    @Test
    void eachQcIsJudgedWithTheLloqLevelSetApart() {
        // The lowest standard above zero is 2 mg/L (the 0 standard is a zero calibrator): QC-LLOQ stands there.
        SectionResult u = qcs(new String[][] {
            {"QC-H", reading(10 * 0.95), "10"},
            {"QC-LLOQ", reading(2 * 1.18), "2"},
            {"QC-M", reading(6 * 1.18), "6"}}, "");
        List<Verdict> v = judged(u);
        assertEquals(List.of("QC samples (QC-H)", "QC samples (QC-LLOQ, LLOQ)", "QC samples (QC-M)"),
                v.stream().map(Verdict::characteristic).toList(), v.toString());
        // +18 % passes at the LLOQ (±20 %) and fails at the mid level (±15 %)
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS, Verdict.Outcome.FAIL),
                v.stream().map(Verdict::outcome).toList(), v.toString());
        assertEquals(
                "QC-LLOQ: known value equal to the lowest standard above zero of calibration 'cal' (2.000 mg/L)", lloqSetting(u));
    }

    @Test
    void theM10ProfileJudgesTheRunByItsQcsTogether() {
        // The same three QCs: two of three within their limits is two thirds, but the 6 mg/L level has none.
        SectionResult u = qcs(new String[][] {
            {"QC-H", reading(10 * 0.95), "10"},
            {"QC-LLOQ", reading(2 * 1.18), "2"},
            {"QC-M", reading(6 * 1.18), "6"}}, "");
        List<Verdict> v = BuiltInProfiles.all().get("bioanalysis-m10").judge(u).verdicts();
        assertEquals(2, v.size(), v.toString());
        assertEquals("QC samples of the run", v.get(0).characteristic());
        assertEquals("QCs within ±15 % of their known value (±20 % at the LLOQ), at least two thirds of them and 50 % at "
                + "each level; QCs at 3 or more levels, 2 or more at each", v.get(0).rule());
        // one QC per level is short of ICH M10's duplicates (from memory): a verdict of its own
        assertEquals("QC samples of the run: QC design", v.get(1).characteristic());
        assertEquals(Verdict.Outcome.FAIL, v.get(1).outcome());
        assertEquals("QCs at 3 levels, 1 at the level with fewest; the rule asks for 3 or more levels with 2 or more QCs "
                + "each", v.get(1).reason());
        assertEquals(Verdict.Outcome.FAIL, v.get(0).outcome(), v.get(0).reason());
        assertTrue(v.get(0).reason().startsWith("2 of 3 QCs within their limit; by known value 2 (LLOQ): 1 of 1, 6: 0 of 1, "
                + "10: 1 of 1; outside: QC-M ("), v.get(0).reason());
    }

    @Test
    void theDossierSummaryPointsEachQcToTheRunVerdict(@TempDir Path dir) {
        Run r = run(dir.resolve("study.md"), new String[][] {
            {"QC-H", reading(10 * 0.95), "10"},
            {"QC-M", reading(6 * 1.18), "6"}}, "mg/L", "", "");
        SectionResult judged = r.unknowns().withVerdicts(BuiltInProfiles.all().get("bioanalysis-m10").judge(r.unknowns())
                .verdicts());
        StudyResults results = new StudyResults(r.study(), List.of(), List.of(r.calibration(), judged),
                List.of(new StudyResults.SoftwareComponent("meritbook", "test")));
        String html = new String(new DossierRenderer(Optional.empty()).renderHtml(results,
                "{}".getBytes(StandardCharsets.UTF_8)), StandardCharsets.UTF_8);
        int row = html.lastIndexOf("<tr", html.indexOf("judged with the others, below"));
        String summary = html.substring(row, html.indexOf("</tr>", row));
        assertTrue(summary.contains("QC deviation from its known value, QC-H"), summary);
        assertTrue(summary.contains("judged with the others, below") && summary.contains("Judged together"), summary);
        assertTrue(summary.contains("in &#39;QC samples of the run&#39; below"), summary); // HTML-escaped quotes
        assertTrue(html.contains("QC samples of the run"), "the run's own verdict row");
    }

    @Test
    void aQcThatCannotBeReadBackCountsAsOutsideInTheRun() {
        // 1/x gives no weight at x₀ ≤ 0, so QC-L1 (a response below the intercept) is not read back. Counted as
        // outside, the run has 2 of 4 within, less than two thirds; dropped, it would have passed with 2 of 3.
        SectionResult u = qcs(new String[][] {
            {"QC-L1", reading(-1), "3"},
            {"QC-L2", reading(3 * 1.02), "3"},
            {"QC-M1", reading(6 * 0.97), "6"},
            {"QC-M2", reading(6 * 1.18), "6"}}, "mg/L", "weighting: 1/x\n" + exclusion("B2", "zero calibrator"), "");
        assertTrue(u.warnings().stream().anyMatch(w -> w.startsWith("Sample QC-L1: not read back")), u.warnings().toString());
        Verdict run = BuiltInProfiles.all().get("bioanalysis-m10").judge(u).verdicts().get(0);
        assertEquals(Verdict.Outcome.FAIL, run.outcome(), run.reason());
        assertTrue(run.reason().startsWith("2 of 4 QCs within their limit; by known value 3: 1 of 2, 6: 1 of 2; outside: "
                + "QC-L1 (not read back), QC-M2 ("), run.reason());
    }

    @Test
    void aLowQcAboveTheLowestStandardIsHeldToTheGeneralLimit() {
        // QC-L at 3 mg/L is a low QC, not the LLOQ (2 mg/L): +18 % fails, where taking the lowest QC for the
        // LLOQ would have passed it.
        SectionResult u = qcs(new String[][] {
            {"QC-L", reading(3 * 1.18), "3"},
            {"QC-H", reading(10 * 0.95), "10"}}, "");
        List<Verdict> v = judged(u);
        assertEquals(List.of("QC samples (QC-L)", "QC samples (QC-H)"), v.stream().map(Verdict::characteristic).toList());
        assertEquals(List.of(Verdict.Outcome.FAIL, Verdict.Outcome.PASS), v.stream().map(Verdict::outcome).toList(),
                v.toString());
        assertEquals(
                "none: no known value equals the lowest standard above zero of calibration 'cal' (2.000 mg/L)", lloqSetting(u));
        // named in the cell, the same QC is judged at the LLOQ's ±20 %
        List<Verdict> named = judged(qcs(new String[][] {
            {"QC-L", reading(3 * 1.18), "3"},
            {"QC-H", reading(10 * 0.95), "10"}}, "lloq-level: QC-L\n"));
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS), named.stream().map(Verdict::outcome).toList(),
                named.toString());
    }

    @Test
    void aSampleWithoutAKnownValueIsNotALloqLevel() {
        InputException e = assertThrows(InputException.class, () -> qcs(new String[][] {
            {"QC-H", reading(10 * 0.95), "10"},
            {"S-1", reading(5), ""}}, "lloq-level: [S-1]\n"));
        assertTrue(e.getMessage().contains("QC samples (samples with a known value): QC-H"), e.getMessage());
        assertTrue(e.getMessage().contains("'S-1'"), e.getMessage());
    }

    @Test
    void anLloqQcReadingBelowTheLowestStandardIsStillJudged() {
        // Without the zero calibrator the fit starts at 2 mg/L (a = 1.0133, b = 1.98857 on the other six
        // standards, by hand): QC-LLOQ reads back at 1.904, about 4.8 % low, below the lowest standard, outside
        // the calibrated span, and is judged at the LLOQ's ±20 % all the same (it used to get no verdict).
        SectionResult u = qcs(new String[][] {
            {"QC-LLOQ", reading(2 * 0.85), "2"},
            {"QC-H", reading(10 * 0.95), "10"}}, "mg/L", exclusion("B2", "zero calibrator"), "");
        assertTrue(u.warnings().stream().anyMatch(w -> w.startsWith("QC QC-LLOQ reads") && w.contains("below the lowest")
                && w.contains("still judged by its deviation")), u.warnings().toString());
        List<Verdict> v = judged(u);
        assertEquals(List.of("QC samples (QC-LLOQ, LLOQ)", "QC samples (QC-H)"),
                v.stream().map(Verdict::characteristic).toList(), v.toString());
        assertEquals(List.of(Verdict.Outcome.PASS, Verdict.Outcome.PASS), v.stream().map(Verdict::outcome).toList());
        double deviation = u.quantity("qc_deviation_percent:QC-LLOQ").orElseThrow().value();
        assertEquals(-4.8, deviation, 0.05);
    }

    @Test
    void withTheLowestStandardExcludedNoQcIsTakenForAnLloqQc() {
        // 2 mg/L is the lowest standard planned; excluded, the fit starts at 4: QC-L at 4 mg/L is a low QC.
        SectionResult u = qcs(new String[][] {
            {"QC-L", reading(4 * 1.18), "4"},
            {"QC-H", reading(10 * 0.95), "10"}}, "mg/L", exclusion("B3", "injection failed"), "");
        assertTrue(lloqSetting(u).startsWith("none: the lowest standard above zero of calibration 'cal' (2.000 mg/L) is "
                + "excluded from its fit"), lloqSetting(u));
        Verdict low = judged(u).get(0);
        assertEquals(Verdict.Outcome.FAIL, low.outcome(), low.reason());
        assertTrue(low.reason().endsWith("LLOQ not identified (name it with 'lloq-level:' in the cell), general limit "
                + "applied"), low.reason());
    }

    @Test
    void aQcAtTheLloqIsTakenBesideTheOnesTheCellNames() {
        SectionResult u = qcs(new String[][] {
            {"LLOQ-A", reading(2 * 1.18), "2"},
            {"LLOQ-B", reading(2 * 0.85), "2"},
            {"QC-H", reading(10 * 0.95), "10"}}, "lloq-level: LLOQ-B\n");
        List<Verdict> v = judged(u);
        assertEquals(List.of("QC samples (LLOQ-A, LLOQ)", "QC samples (LLOQ-B, LLOQ)", "QC samples (QC-H)"),
                v.stream().map(Verdict::characteristic).toList(), v.toString());
        assertEquals(
                "LLOQ-B, LLOQ-A: named in the cell (lloq-level: LLOQ-B); known value equal to the lowest standard above "
                        + "zero of calibration 'cal' (2.000 mg/L)", lloqSetting(u));
    }

    @Test
    void knownValuesInTheSamplesUnitTakeNoQcForTheLloq() {
        // With mass and volume the known values are contents in mg/kg, not a standard's concentration in mg/L.
        SectionResult u = qcs(new String[][] {
            {"QC-LLOQ", reading(2 * 1.18), "20"},
            {"QC-H", reading(10 * 0.95), "100"}}, "mg/kg", "", "mass: 5.00 g\nvolume: 50 mL\n");
        assertTrue(u.settings().stream().noneMatch(s -> s.label().equals("LLOQ level")), u.settings().toString());
        Verdict v = judged(u).get(0);
        assertEquals("QC samples (QC-LLOQ)", v.characteristic());
        assertEquals(Verdict.Outcome.FAIL, v.outcome(), v.reason());
    }

    private static String exclusion(String cell, String reason) {
        return "exclude:\n  - cell: Cal!" + cell + "\n    reason: " + reason + "\n";
    }
}
