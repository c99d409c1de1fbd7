package org.meritbook.analysis.accuracy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.criteria.AcceptanceProfiles;
import org.meritbook.criteria.ProfileBands;
import org.meritbook.analysis.Verdict;
import org.meritbook.error.ErrorKey;
import org.meritbook.figures.FigureSpec;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.meritbook.workbook.WorkbookReader;

class AccuracyAnalysisTest {
    private static final Path FILE = Path.of("runs.xlsx");

    private static String notebook(String options) {
        return """
                ---
                title: Test study
                sources:
                  runs: runs.xlsx
                ---

                ## Trueness

                ```accuracy
                data: runs!Rec!A1:C9
                measured: Found
                known: Nominal
                %s```
                """.formatted(options);
    }

    /** A block of columns named by their headers, header in row 1; each column's cells as raw text. */
    private static DataBlock block(List<String> headers, List<String[]> columns) {
        List<Column> cols = new ArrayList<>();
        for (int c = 0; c < headers.size(); c++) {
            List<CellValue> values = new ArrayList<>();
            String[] raw = columns.get(c);
            for (int i = 0; i < raw.length; i++) {
                values.add(cell(c, i + 1, raw[i]));
            }
            String h = headers.get(c);
            int paren = h.indexOf(" (");
            cols.add(new Column(h, paren < 0 ? h : h.substring(0, paren),
                    paren < 0 ? null : h.substring(paren + 2, h.length() - 1), String.valueOf((char) ('A' + c)), values));
        }
        return new DataBlock(FILE, "Rec", "A1:" + (char) ('A' + headers.size() - 1) + (columns.get(0).length + 1), cols,
                List.of());
    }

    private static CellValue cell(int col, int row, String raw) {
        CellRef ref = new CellRef("Rec", row, col);
        if (raw.isEmpty()) {
            return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, raw, null);
        }
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static SectionResult run(String options, DataBlock block) {
        Study study = StudyParser.parse(notebook(options), Path.of("study.md"));
        return new AccuracyAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name + " in "
                + s.quantities().stream().map(Quantity::name).toList())).value();
    }

    private static String setting(SectionResult s, String label) {
        return s.settings().stream().filter(st -> st.label().equals(label)).map(Setting::key).findFirst()
                .orElseThrow();
    }

    private static void assertEveryQuantityHasItsStep(SectionResult s) {
        Set<String> ids = s.steps().stream().map(Step::id).collect(Collectors.toSet());
        for (Quantity quantity : s.quantities()) {
            assertTrue(ids.contains(quantity.stepId()), quantity.name() + " has no trail step");
        }
    }

    /** Invented results against known values; level 100 has a single result. */
    private static final String[] NOMINAL = {"10", "10", "10", "10", "50", "50", "50", "100"};
    private static final String[] FOUND = {"9.7", "10.2", "9.9", "10.4", "48.6", "50.9", "49.3", "101.5"};

    private static DataBlock known() {
        return block(List.of("Nominal (mg/L)", "Found (mg/L)"), List.of(NOMINAL, FOUND));
    }

    @Test
    void recoveryAgainstKnownValuesMatchesR() {
        SectionResult s = run("", known());
        // R 4.2.2, mean / sd / t.test(r, mu = 100): src/test/resources/accuracy/known-recovery.R
        //   10      n=4 mean=100.5 sd=3.1091263510296 ci_low=95.5526861657528 ci_high=105.447313834247 p=0.768837310314464
        //   50      n=3 mean=99.2 sd=2.35796522451032 ci_low=93.3424896627981 ci_high=105.057510337202 p=0.616282312365353
        //   overall n=8 mean=100.1375 sd=2.53936859418692 ci_low=98.0145347275303 ci_high=102.26046527247 p=0.882599990867786
        //   100     n=1 recovery=101.5
        assertLevel(s, ":10", 4, 100.5, 3.1091263510296, 95.5526861657528, 105.447313834247, 0.768837310314464);
        assertLevel(s, ":50", 3, 99.2, 2.35796522451032, 93.3424896627981, 105.057510337202, 0.616282312365353);
        assertLevel(s, "", 8, 100.1375, 2.53936859418692, 98.0145347275303, 102.26046527247, 0.882599990867786);
        assertEquals(101.5, q(s, "recovery_percent:100"), 1e-12);
        assertEquals(1.5, q(s, "error_percent:100"), 1e-12);
        assertEquals(0.5, q(s, "error_percent:10"), 1e-12);
        assertEquals("direct", setting(s, "Recovery"));
        assertEveryQuantityHasItsStep(s);
        // Row B3 (second result): 10.2 / 10 × 100, its inputs the workbook cells.
        assertEquals(102.0, q(s, "row_recovery_percent:B3"), 1e-12);
        Step row = s.steps().stream().filter(st -> st.id().equals("accuracy.row_recovery_percent:B3")).findFirst()
                .orElseThrow();
        assertEquals(List.of("Rec!B3", "Rec!A3"), row.inputs().stream().map(StepInput::source).toList());
    }

    private static void assertLevel(SectionResult s, String suffix, int n, double mean, double sd, double low,
                                    double high, double p) {
        assertEquals(n, q(s, "n" + suffix));
        assertEquals(mean, q(s, "recovery_percent" + suffix), 1e-10);
        assertEquals(mean - 100, q(s, "error_percent" + suffix), 1e-10);
        assertEquals(sd, q(s, "recovery_sd" + suffix), 1e-10);
        assertEquals(low, q(s, "recovery_ci_low" + suffix), 1e-9);
        assertEquals(high, q(s, "recovery_ci_high" + suffix), 1e-9);
        assertEquals(p, q(s, "bias_p" + suffix), 1e-9);
        Quantity m = s.quantity("recovery_percent" + suffix).orElseThrow();
        assertEquals(low, m.interval().low(), 1e-9);
    }

    @Test
    void aLevelWithOneResultReportsItsMeanAndSaysWhyTheRestIsNotEvaluable() {
        SectionResult s = run("", known());
        assertTrue(s.quantity("recovery_sd:100").isEmpty());
        assertTrue(s.quantity("recovery_ci_low:100").isEmpty());
        assertTrue(s.quantity("bias_p:100").isEmpty());
        assertTrue(s.warnings().stream().anyMatch(w -> w.contains("level 100") && w.contains("not evaluable")
                && w.contains("one result")), s.warnings().toString());
    }

    @Test
    void levelsMayComeFromAColumnAndExcludedRowsStayInTheTable() {
        String[] level = {"L", "L", "L", "L", "M", "M", "M", "M"};
        String[] nominal = {"10", "10", "10", "10", "50", "50", "50", "50"};
        String[] found = {"9.7", "10.2", "9.9", "10.4", "48.6", "50.9", "49.3", "80"};
        SectionResult s = run("""
                level: Level
                exclude:
                  - cell: Rec!B9
                    reason: Vial swapped (run log)
                """, block(List.of("Nominal (mg/L)", "Found (mg/L)", "Level"), List.of(nominal, found, level)));
        assertEquals(99.2, q(s, "recovery_percent:M"), 1e-10); // the 50-level results above, without B9
        assertEquals(3, q(s, "n:M"));
        assertEquals(7, q(s, "n"));
        assertEquals("Vial swapped (run log)", s.table().rows().get(7).exclusionReason());
        assertEquals(160.0, q(s, "row_recovery_percent:B9"), 1e-12); // shown, marked, not used
        assertTrue(s.quantity("row_recovery_percent:B9").orElseThrow().label().contains("excluded"));
        assertFalse(s.figures().isEmpty());
    }

    /**
     * The demo workbook's spike block (sheet Spikes A5:H23): paired unspiked portions, levels low,
     * mid, high. Expected values from R (spike-recovery.R beside this test's resources).
     */
    @Test
    void demoSpikeRecoveryIsPairedAndMatchesR() {
        String text = """
                ---
                title: Spikes
                sources:
                  lab: hmf-honey-validation.xlsx
                ---

                ## Trueness

                ```accuracy
                data: lab!Spikes!A5:H23
                measured: Measured
                known: Added
                unspiked: Unspiked
                level: Level
                ```
                """;
        Study study = StudyParser.parse(text, Path.of("demo-data/spikes-test.md"));
        SectionResult s;
        try (WorkbookReader reader = new WorkbookReader()) {
            s = new AccuracyAnalysis().run(study.cells().get(0), new AnalysisContext(study,
                    ref -> reader.read(study.sources().get(ref.source()).path(), ref)));
        }
        // R 4.2.2 (mean, sd, t.test(r, mu = 100, conf.level = 0.95)) on (Measured − Unspiked) / Added × 100,
        // script src/test/resources/accuracy/spike-recovery.R:
        //   low     n=6 mean=99 sd=18.8034039471581 ci_low=79.2670377464915 ci_high=118.732962253509 p=0.901432779232539
        //   mid     n=6 mean=99.825 sd=4.13397508458868 ci_low=95.4866592117906 ci_high=104.163340788209 p=0.92144439756197
        //   high    n=6 mean=101.4875 sd=1.71608202018435 ci_low=99.6865823670338 ci_high=103.288417632966 p=0.0871495415059199
        //   overall n=18 mean=100.104166666667 sd=10.5364292771206 ci_low=94.8645236558648 ci_high=105.343809677469 p=0.967031909331395
        assertLevel(s, ":low", 6, 99, 18.8034039471581, 79.2670377464915, 118.732962253509, 0.901432779232539);
        assertLevel(s, ":mid", 6, 99.825, 4.13397508458868, 95.4866592117906, 104.163340788209, 0.92144439756197);
        assertLevel(s, ":high", 6, 101.4875, 1.71608202018435, 99.6865823670338, 103.288417632966, 0.0871495415059199);
        assertLevel(s, "", 18, 100.104166666667, 10.5364292771206, 94.8645236558648, 105.343809677469,
                0.967031909331395);
        assertEquals("paired", setting(s, "Recovery"));
        assertEquals((14.57 - 8.04) / 5 * 100, q(s, "row_recovery_percent:F6"), 1e-12);
        Step row = s.steps().stream().filter(st -> st.id().equals("accuracy.row_recovery_percent:F6")).findFirst()
                .orElseThrow();
        assertEquals(List.of("Spikes!F6", "Spikes!D6", "Spikes!E6"),
                row.inputs().stream().map(StepInput::source).toList());
        assertEquals(18, s.table().rows().size());
        // Read columns and text columns (Sample ID, Notes); Replicate and Reagent blank are not read.
        assertEquals(List.of("Sample ID", "Level", "Unspiked (mg/kg)", "Added (mg/kg)", "Measured (mg/kg)", "Notes",
                "Recovery (%)"), s.table().headers());
        assertEveryQuantityHasItsStep(s);
    }

    @Test
    void withoutAnUnspikedResultInEveryRowTheUnspikedResultsAreAveraged() {
        String[] added = {"5", "5", "5", "20", "20", "20"};
        String[] spiked = {"13.9", "13.5", "14.1", "28.4", "28.9", "28.1"};
        String[] unspiked = {"8.6", "", "8.8", "", "8.4", ""};
        SectionResult s = run("unspiked: Background\n", block(List.of("Nominal (mg/kg)", "Found (mg/kg)",
                "Background (mg/kg)"), List.of(added, spiked, unspiked)));
        assertEquals("averaged", setting(s, "Recovery"));
        double u = (8.6 + 8.8 + 8.4) / 3;
        assertEquals((13.5 - u) / 5 * 100, q(s, "row_recovery_percent:B3"), 1e-12);
        assertEquals((28.4 - u) / 20 * 100, q(s, "row_recovery_percent:B5"), 1e-12);
        Step mean = s.steps().stream().filter(st -> st.id().equals("accuracy.unspiked_mean")).findFirst().orElseThrow();
        assertEquals(u, mean.value(), 1e-12);
        assertEquals(List.of("Rec!C2", "Rec!C4", "Rec!C6"), mean.inputs().stream().map(StepInput::source).toList());
    }

    @Test
    void signalsAreReadBackThroughTheEarlierCalibration() {
        String text = """
                ---
                title: Read back
                sources:
                  runs: runs.xlsx
                ---

                ## Linearity

                ```calibration
                id: cal
                data: runs!Cal!A1:B6
                x: Conc
                y: Signal
                ```

                ## Trueness

                ```accuracy
                data: runs!Rec!A1:B5
                measured: Area
                known: Nominal
                calibration: cal
                ```
                """;
        DataBlock cal = block(List.of("Conc (mg/L)", "Signal (counts)"),
                List.of(new String[] {"1", "2", "4", "6", "8"}, new String[] {"12.1", "21.8", "42.3", "61.9", "82.0"}));
        DataBlock rec = block(List.of("Nominal (mg/L)", "Area (counts)"),
                List.of(new String[] {"3", "3", "5", "5"}, new String[] {"31.5", "32.4", "51.0", "52.2"}));
        Study study = StudyParser.parse(text, Path.of("study.md"));
        AnalysisContext context = new AnalysisContext(study, ref -> ref.toString().contains("Cal") ? cal : rec);
        SectionResult calibration = new CalibrationAnalysis().run(study.cells().get(0), context);
        SectionResult s = new AccuracyAnalysis().run(study.cells().get(1), context.with(calibration));
        double a = calibration.quantity("intercept").orElseThrow().value();
        double b = calibration.quantity("slope").orElseThrow().value();
        double x = (32.4 - a) / b;
        assertEquals(x, q(s, "read_back:B3"), 1e-12);
        assertEquals(x / 3 * 100, q(s, "row_recovery_percent:B3"), 1e-12);
        Step readBack = s.steps().stream().filter(st -> st.id().equals("accuracy.read_back:B3")).findFirst()
                .orElseThrow();
        // The calibration's slope and intercept are inputs linked to the calibration's own steps.
        assertEquals(List.of("Rec!B3", "cal.intercept", "cal.slope"),
                readBack.inputs().stream().map(StepInput::source).toList());
        assertEquals("mg/L", s.quantity("read_back:B3").orElseThrow().unit());
        assertTrue(s.warnings().stream().noneMatch(w -> w.contains("units")), s.warnings().toString());
    }

    @Test
    void theBuiltInRecoveryProfileJudgesEachLevelAndOverallAndBoundsTheFigure() {
        String text = notebook("").replace("title: Test study\n", "title: Test study\ncriteria: recovery-ppm\n");
        Study study = StudyParser.parse(text, Path.of("study.md"));
        DataBlock block = known();
        SectionResult s = new AccuracyAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block,
                ProfileBands.of(AcceptanceProfiles.of(study))));
        SectionResult judged = AcceptanceProfiles.of(study).judge(s);
        // Two rules (≥ 80 %, ≤ 110 %) on levels 10, 50, 100 and overall: eight verdicts, all passing.
        assertEquals(8, judged.verdicts().size(), judged.verdicts().toString());
        assertTrue(judged.verdicts().stream().allMatch(v -> v.outcome() == Verdict.Outcome.PASS));
        FigureSpec figure = s.figures().get(0);
        List<double[]> band = figure.series().stream().filter(x -> x.name().startsWith("Acceptance"))
                .map(FigureSpec.Series::y).toList();
        assertEquals(2, band.size());
        assertEquals(80.0, band.get(0)[0], 0);
        assertEquals(110.0, band.get(1)[0], 0);
    }

    @Test
    void aKnownValueOfZeroIsALocatedError() {
        String[] nominal = NOMINAL.clone();
        nominal[2] = "0";
        InputException e = assertThrows(InputException.class, () -> run("", block(List.of("Nominal (mg/L)",
                "Found (mg/L)"), List.of(nominal, FOUND))));
        assertEquals(ErrorKey.ZERO_KNOWN_VALUE, e.key());
        assertEquals("runs.xlsx, Rec!A4", e.problems().get(0).where());
    }

    @Test
    void textInTheMeasuredColumnIsALocatedError() {
        String[] found = FOUND.clone();
        found[1] = "n.d.";
        InputException e = assertThrows(InputException.class, () -> run("", block(List.of("Nominal (mg/L)",
                "Found (mg/L)"), List.of(NOMINAL, found))));
        assertEquals(ErrorKey.NOT_A_NUMBER, e.key());
        assertEquals("runs.xlsx, Rec!B3", e.problems().get(0).where());
    }

    @Test
    void textInTheUnspikedColumnIsALocatedError() {
        String[] unspiked = {"8.6", "8.7", "<0.5", "8.5", "8.4", "8.8", "8.6", "8.7"};
        InputException e = assertThrows(InputException.class, () -> run("unspiked: Background\n",
                block(List.of("Nominal (mg/L)", "Found (mg/L)", "Background"), List.of(NOMINAL, FOUND, unspiked))));
        assertEquals("runs.xlsx, Rec!C4", e.problems().get(0).where());
    }

    @Test
    void aMissingColumnNamesTheNotebookLineAndTheColumns() {
        InputException e = assertThrows(InputException.class, () -> run("level: Series\n", known()));
        assertEquals(ErrorKey.MISSING_COLUMN, e.key());
        assertEquals("study.md line 13", e.problems().get(0).where());
        assertTrue(e.getMessage().contains("'Nominal (mg/L)' (A)"), e.getMessage());
    }

    @Test
    void aBlankLevelLabelIsALocatedError() {
        String[] level = {"L", "L", "", "L", "M", "M", "M", "M"};
        InputException e = assertThrows(InputException.class, () -> run("level: Level\n",
                block(List.of("Nominal (mg/L)", "Found (mg/L)", "Level"), List.of(NOMINAL, FOUND, level))));
        assertEquals(ErrorKey.MISSING_LABEL, e.key());
        assertEquals("runs.xlsx, Rec!C4", e.problems().get(0).where());
    }

    @Test
    void noUsableRowIsAnError() {
        InputException e = assertThrows(InputException.class, () -> run("""
                exclude:
                  - cell: Rec!B2
                    reason: spilled
                """, block(List.of("Nominal (mg/L)", "Found (mg/L)"), List.of(new String[] {"10"},
                new String[] {"9.9"}))));
        assertEquals(ErrorKey.TOO_FEW_POINTS, e.key());
    }

    @Test
    void equalRecoveriesGiveNoIntervalAndSaySo() {
        SectionResult s = run("", block(List.of("Nominal (mg/L)", "Found (mg/L)"),
                List.of(new String[] {"10", "10", "10"}, new String[] {"9.8", "9.8", "9.8"})));
        assertEquals(98.0, q(s, "recovery_percent"), 1e-12);
        assertEquals(0.0, q(s, "recovery_sd"), 0);
        assertTrue(s.quantity("bias_p").isEmpty());
        assertTrue(s.warnings().stream().anyMatch(w -> w.contains("s = 0")), s.warnings().toString());
    }

    @Test
    void aCalibrationBelowTheCellIsAnError() {
        InputException e = assertThrows(InputException.class, () -> run("calibration: later\n", known()));
        assertEquals(ErrorKey.UNKNOWN_REFERENCE, e.key());
    }

    @Test
    void theRecoveryByLevelTableGivesEachLevelsSummaryFromItsQuantities() {
        SectionResult s = run("", known());
        ResultTable t = s.tables().stream().filter(x -> x.title().equals("Recovery by level")).findFirst()
                .orElseThrow(() -> new AssertionError("no recovery table"));
        assertEquals(List.of("Level", "n", "Mean recovery", "SD", "95 % CI of the mean", "Mean error"),
                t.columns().stream().map(ResultTable.Column::name).toList());
        java.util.Map<String, List<ResultTable.Cell>> rows = new java.util.HashMap<>();
        t.rows().forEach(r -> rows.put(r.get(0).text(), r));
        assertEquals(Set.of("10", "50", "100", "All levels"), rows.keySet());
        // R 4.2.2, as in recoveryAgainstKnownValuesMatchesR (src/test/resources/accuracy/known-recovery.R)
        List<ResultTable.Cell> ten = rows.get("10");
        assertEquals(4, q(s, ten.get(1).ref()));
        assertEquals(100.5, q(s, ten.get(2).ref()), 1e-12);
        assertEquals(3.1091263510296, q(s, ten.get(3).ref()), 1e-12);
        assertEquals(ResultTable.Show.INTERVAL, ten.get(4).show());
        assertEquals(95.5526861657528, s.quantity(ten.get(4).ref()).orElseThrow().interval().low(), 1e-10);
        assertEquals(0.5, q(s, ten.get(5).ref()), 1e-12);
        List<ResultTable.Cell> all = rows.get("All levels");
        assertEquals(8, q(s, all.get(1).ref()));
        assertEquals(100.1375, q(s, all.get(2).ref()), 1e-12);
        // one result at 100: its SD and interval are not evaluable, shown as a dash
        assertEquals("—", rows.get("100").get(3).text());
        assertEquals("—", rows.get("100").get(4).text());
        assertEquals(101.5, q(s, rows.get("100").get(2).ref()), 1e-12);
    }
}
