package org.meritbook.analysis.unknowns;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;
import org.meritbook.workbook.WorkbookReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code internal-standard:} on calibration and unknowns cells, on a workbook written with POI: the
 * response is A / A_IS cell by cell, each ratio a trail step with both cells, and a sample is read back
 * through a ratio calibration only as a ratio.
 */
class InternalStandardRatioTest {
    private static final double[] CONC = {0.5, 0.5, 1, 1, 2, 2, 5, 5, 10, 10};
    private static final double[] AREA = {1230, 1185, 2410, 2552, 4980, 4705, 12480, 11890, 24100, 25220};
    private static final double[] IS_AREA = {10020, 9650, 9890, 10410, 10150, 9580, 10080, 9720, 9810, 10300};

    @TempDir
    Path dir;

    /** Calibration rows 2–11 (A level, B conc, C area, D IS area); samples rows 2–5 (A sample, B area, C IS area). */
    private Path workbook(Object[] calibrationIs, Object[][] samples) throws IOException {
        Path file = dir.resolve("is.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(file)) {
            Sheet cal = wb.createSheet("Calibration");
            row(cal, 0, "Level", "Conc (µg/L)", "Area", "IS area");
            for (int i = 0; i < CONC.length; i++) {
                row(cal, i + 1, "L" + (i / 2 + 1), CONC[i], AREA[i], calibrationIs[i]);
            }
            Sheet smp = wb.createSheet("Samples");
            row(smp, 0, "Sample", "Area", "IS area");
            for (int i = 0; i < samples.length; i++) {
                row(smp, i + 1, samples[i]);
            }
            wb.write(out);
        }
        return file;
    }

    private static void row(Sheet sheet, int index, Object... values) {
        Row r = sheet.createRow(index);
        for (int c = 0; c < values.length; c++) {
            if (values[c] instanceof Number n) {
                r.createCell(c).setCellValue(n.doubleValue());
            } else if (values[c] != null) {
                r.createCell(c).setCellValue(values[c].toString());
            }
        }
    }

    private static Object[] boxed(double[] v) {
        Object[] o = new Object[v.length];
        for (int i = 0; i < v.length; i++) {
            o[i] = v[i];
        }
        return o;
    }

    private static final Object[][] SAMPLES = {{"S1", 7350.0, 9920.0}, {"S1", 7610.0, 10240.0}, {"S2", 18200.0, 9900.0}};

    private List<SectionResult> run(String calibrationExtra, String unknownsExtra, Object[] calibrationIs,
                                    Object[][] samples) throws IOException {
        workbook(calibrationIs, samples);
        Path notebook = dir.resolve("study.md");
        Files.writeString(notebook, """
                ---
                title: Internal standard
                sources:
                  lab: is.xlsx
                ---

                ```calibration
                id: cal
                data: lab!Calibration!A1:D11
                x: Conc
                y: Area
                %s```

                ```unknowns
                calibration: cal
                data: lab!Samples!A1:C4
                sample: Sample
                y: Area
                %s```
                """.formatted(calibrationExtra, unknownsExtra));
        Study study = StudyParser.parse(notebook);
        try (WorkbookReader reader = new WorkbookReader()) {
            AnalysisContext context = new AnalysisContext(study,
                    ref -> reader.read(study.sources().get(ref.source()).path(), ref));
            SectionResult calibration = new CalibrationAnalysis().run(study.cells().get(0), context);
            SectionResult unknowns = new UnknownsAnalysis().run(study.cells().get(1), context.with(calibration));
            return List.of(calibration, unknowns);
        }
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name)).value();
    }

    private static Step step(SectionResult s, String name) {
        return s.steps().stream().filter(t -> t.id().equals(s.id() + "." + name)).findFirst()
                .orElseThrow(() -> new AssertionError("no step " + name + " in " + s.id()));
    }

    @Test
    void theRatioIsTheResponseOfTheCalibrationAndOfTheSamples() throws IOException {
        List<SectionResult> out = run("internal-standard: IS area\n", "internal-standard: IS area\n", boxed(IS_AREA),
                SAMPLES);
        SectionResult cal = out.get(0);
        // Independent fit of the ratios computed here: Apache Commons Math SimpleRegression (ordinary least squares).
        SimpleRegression ols = new SimpleRegression();
        for (int i = 0; i < CONC.length; i++) {
            ols.addData(CONC[i], AREA[i] / IS_AREA[i]);
        }
        assertEquals(ols.getSlope(), q(cal, "slope"), 1e-12 * ols.getSlope());
        assertEquals(ols.getIntercept(), q(cal, "intercept"), 1e-12);
        Step ratio = step(cal, "response_ratio:C2");
        assertEquals(AREA[0] / IS_AREA[0], ratio.value(), 1e-15);
        assertEquals(List.of("Calibration!C2", "Calibration!D2"), ratio.inputs().stream().map(StepInput::source).toList());
        assertTrue(step(cal, "n").inputs().stream().anyMatch(i -> i.source().equals("cal.response_ratio:C2")),
                "the points cite the ratio, not the raw cell");
        assertTrue(cal.settings().stream().anyMatch(t -> "internal-standard".equals(t.key())
                && t.value().startsWith("ratio to the internal standard, y = A / A_IS: 'Area' / 'IS area'")));

        SectionResult unknowns = out.get(1);
        double mean = (7350.0 / 9920.0 + 7610.0 / 10240.0) / 2;
        assertEquals((mean - ols.getIntercept()) / ols.getSlope(), q(unknowns, "x0:S1"), 1e-11);
        Step sampleRatio = step(unknowns, "response_ratio:B3");
        assertEquals(List.of("Samples!B3", "Samples!C3"), sampleRatio.inputs().stream().map(StepInput::source).toList());
        assertTrue(step(unknowns, "mean_response:S1").inputs().stream()
                .anyMatch(i -> i.source().equals("unknowns.response_ratio:B3")));
    }

    @Test
    void everyUnusableInternalStandardCellIsLocated() {
        Object[] is = boxed(IS_AREA);
        is[5] = 0.0;      // D7
        is[6] = null;     // D8, empty
        is[7] = "lost";   // D9
        is[8] = "n.d.";   // D10, censored
        InputException e = assertThrows(InputException.class,
                () -> run("internal-standard: IS area\n", "internal-standard: IS area\n", is, SAMPLES));
        List<Problem> problems = e.problems();
        assertEquals(List.of("is.xlsx, Calibration!D7", "is.xlsx, Calibration!D8", "is.xlsx, Calibration!D9",
                "is.xlsx, Calibration!D10"), problems.stream().map(Problem::where).toList());
        assertEquals(List.of(ErrorKey.UNUSABLE_VALUES, ErrorKey.NOT_A_NUMBER, ErrorKey.NOT_A_NUMBER,
                ErrorKey.CENSORED_VALUE), problems.stream().map(Problem::key).toList());
        assertEquals("is.xlsx, Calibration!D7: expected a positive internal-standard response in column 'IS area' "
                + "(internal-standard: study.md line 12), the divisor of the response ratio but found '0'. A response "
                + "ratio needs an internal-standard response above 0: correct the cell, or exclude the reading in the "
                + "notebook with a reason (exclude: - cell: Calibration!D7, reason: ...).", problems.get(0).message());
    }

    @Test
    void anExcludedInternalStandardCellTakesItsPointOutOfTheFit() throws IOException {
        Object[] is = boxed(IS_AREA);
        is[5] = 0.0;
        List<SectionResult> out = run("internal-standard: IS area\nexclude:\n  - cell: Calibration!D7\n"
                + "    reason: internal standard not added\n", "internal-standard: IS area\n", is, SAMPLES);
        assertEquals(9, q(out.get(0), "n"));
    }

    @Test
    void aSampleCellWithoutTheRatioIsRefusedThroughARatioCalibration() {
        InputException e = assertThrows(InputException.class,
                () -> run("internal-standard: IS area\n", "", boxed(IS_AREA), SAMPLES));
        assertEquals(ErrorKey.MISSING_OPTION, e.key());
        assertEquals("study.md line 16: expected 'internal-standard:' naming the samples' internal-standard column, "
                + "since calibration 'cal' uses the ratio to its internal standard ('IS area') but found no "
                + "'internal-standard:'. Add 'internal-standard: <column>' so the samples are read back as the same "
                + "ratio.", e.problems().get(0).message());
    }

    @Test
    void aRatioIsRefusedThroughACalibrationOnPlainResponses() {
        InputException e = assertThrows(InputException.class,
                () -> run("", "internal-standard: IS area\n", boxed(IS_AREA), SAMPLES));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertEquals("study.md line 19", e.problems().get(0).where());
    }

    /** A ratio calibration, then one cell of another kind that uses it (its body after the fence). */
    private InputException refusedAfterRatioCalibration(String kind, String body, org.meritbook.analysis.Analysis analysis)
            throws IOException {
        workbook(boxed(IS_AREA), SAMPLES);
        Path notebook = dir.resolve("study.md");
        Files.writeString(notebook, """
                ---
                title: Internal standard
                sources:
                  lab: is.xlsx
                ---

                ```calibration
                id: cal
                data: lab!Calibration!A1:D11
                x: Conc
                y: Area
                internal-standard: IS area
                ```

                ```%s
                calibration: cal
                %s```
                """.formatted(kind, body));
        Study study = StudyParser.parse(notebook);
        try (WorkbookReader reader = new WorkbookReader()) {
            AnalysisContext context = new AnalysisContext(study,
                    ref -> reader.read(study.sources().get(ref.source()).path(), ref));
            SectionResult calibration = new CalibrationAnalysis().run(study.cells().get(0), context);
            return assertThrows(InputException.class, () -> analysis.run(study.cells().get(1), context.with(calibration)));
        }
    }

    @Test
    void plainSignalsAreNotReadBackThroughARatioCalibrationByOtherKinds() throws IOException {
        InputException accuracy = refusedAfterRatioCalibration("accuracy",
                "data: lab!Samples!A1:C4\nmeasured: Area\nknown: IS area\n",
                new org.meritbook.analysis.accuracy.AccuracyAnalysis());
        assertEquals(ErrorKey.BAD_OPTION_VALUE, accuracy.key());
        assertEquals("study.md line 16", accuracy.problems().get(0).where());
        InputException limits = refusedAfterRatioCalibration("detection-limit",
                "methods: [blank]\nblanks:\n  data: lab!Samples!A1:C4\n  column: Area\n",
                new org.meritbook.analysis.detection.DetectionLimitAnalysis());
        assertEquals(ErrorKey.BAD_OPTION_VALUE, limits.key());
        assertEquals("study.md line 18", limits.problems().get(0).where());
    }

    @Test
    void aBadSampleInternalStandardIsLocated() {
        Object[][] samples = {{"S1", 7350.0, 9920.0}, {"S1", 7610.0, ""}, {"S2", 18200.0, -5.0}};
        InputException e = assertThrows(InputException.class,
                () -> run("internal-standard: IS area\n", "internal-standard: IS area\n", boxed(IS_AREA), samples));
        assertEquals(List.of("is.xlsx, Samples!C3", "is.xlsx, Samples!C4"),
                e.problems().stream().map(Problem::where).toList());
    }
}
