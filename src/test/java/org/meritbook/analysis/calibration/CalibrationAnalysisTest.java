package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

class CalibrationAnalysisTest {
    /** Miller & Miller fluorescence calibration (handbook worked example, from memory). */
    private static final double[] X = {0, 2, 4, 6, 8, 10, 12};
    private static final double[] Y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};

    private static final Path FILE = Path.of("runs.xlsx");

    private static String notebook(String options) {
        return """
                ---
                title: Test study
                sources:
                  runs: runs.xlsx
                ---

                ## Linearity

                ```calibration
                data: runs!Cal!A1:B8
                x: Conc
                y: Signal
                %s```
                """.formatted(options);
    }

    /** A block of two columns, header in row 1, data from row 2; raw text given per row. */
    private static DataBlock block(String[] xs, String[] ys) {
        List<CellValue> xv = new ArrayList<>();
        List<CellValue> yv = new ArrayList<>();
        for (int i = 0; i < xs.length; i++) {
            xv.add(cell(0, i + 1, xs[i]));
            yv.add(cell(1, i + 1, ys[i]));
        }
        return new DataBlock(FILE, "Cal", "A1:B" + (xs.length + 1),
                List.of(new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", xv),
                        new Column("Signal (counts)", "Signal", "counts", "B", yv)), List.of());
    }

    private static CellValue cell(int col, int row, String raw) {
        CellRef ref = new CellRef("Cal", row, col);
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            // Not a number: kept as text, exactly as a reader would.
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static String[] text(double[] v) {
        String[] s = new String[v.length];
        for (int i = 0; i < v.length; i++) {
            s[i] = Double.toString(v[i]);
        }
        return s;
    }

    private static SectionResult run(String options, DataBlock block) {
        Study study = StudyParser.parse(notebook(options), Path.of("study.md"));
        return new CalibrationAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name)).value();
    }

    @Test
    void unweightedFitMatchesCommonsMathAndEveryQuantityHasItsStep() {
        SectionResult s = run("", block(text(X), text(Y)));
        // Cross-check against a general-purpose library (Apache Commons Math SimpleRegression).
        SimpleRegression reference = new SimpleRegression();
        for (int i = 0; i < X.length; i++) {
            reference.addData(X[i], Y[i]);
        }
        assertEquals(reference.getSlope(), q(s, "slope"), 1e-12);
        assertEquals(reference.getIntercept(), q(s, "intercept"), 1e-12);
        assertEquals(reference.getSlopeStdErr(), q(s, "slope_se"), 1e-12);
        assertEquals(reference.getInterceptStdErr(), q(s, "intercept_se"), 1e-12);
        assertEquals(reference.getR(), q(s, "r"), 1e-12);
        assertEquals(reference.getRSquare(), q(s, "r_squared"), 1e-12);
        assertEquals(Math.sqrt(reference.getMeanSquareError()), q(s, "residual_sd"), 1e-12);
        assertEquals(7, q(s, "n"));
        // Miller & Miller print b = 1.93 and a = 1.52 (from memory).
        assertEquals(1.93, q(s, "slope"), 0.005);
        assertEquals(1.52, q(s, "intercept"), 0.005);
        Set<String> stepIds = s.steps().stream().map(Step::id).collect(Collectors.toSet());
        for (Quantity quantity : s.quantities()) {
            assertTrue(stepIds.contains(quantity.stepId()), quantity.name() + " has no trail step");
        }
        assertEquals("ng/mL", s.quantity("back_calculated:B3").orElseThrow().unit());
        assertEquals("counts per ng/mL", s.quantity("slope").orElseThrow().unit());
    }

    @Test
    void backCalculatedConcentrationAndDeviationFollowTheirFormulas() {
        SectionResult s = run("", block(text(X), text(Y)));
        double a = q(s, "intercept");
        double b = q(s, "slope");
        double back = (Y[3] - a) / b; // the fourth standard sits in row 5 (B5)
        assertEquals(back, q(s, "back_calculated:B5"), 1e-12);
        assertEquals((back - X[3]) / X[3] * 100, q(s, "deviation_percent:B5"), 1e-10);
        // The standard at nominal 0 has no % deviation.
        assertTrue(s.quantity("deviation_percent:B2").isEmpty());
        // Acceptance rules read each standard's nominal concentration from the typed export, not the trail.
        assertEquals(X[3], org.meritbook.analysis.NominalValues.of(s, "deviation_percent:B5").getAsDouble(), 0);
        assertTrue(org.meritbook.analysis.NominalValues.of(s, "deviation_percent:B2").isEmpty());
    }

    @Test
    void excludedPointStaysInTheTableAndLeavesTheFit() {
        String[] ys = text(Y);
        ys[4] = "30.0"; // an injection failure at row 6
        SectionResult s = run("""
                exclude:
                  - cell: Cal!B6
                    reason: Injection failure in the run log
                """, block(text(X), ys));
        SimpleRegression withoutIt = new SimpleRegression();
        for (int i = 0; i < X.length; i++) {
            if (i != 4) {
                withoutIt.addData(X[i], Y[i]);
            }
        }
        assertEquals(withoutIt.getSlope(), q(s, "slope"), 1e-12);
        assertEquals(6, q(s, "n"));
        assertEquals(7, s.table().rows().size());
        assertEquals("Injection failure in the run log", s.table().rows().get(4).exclusionReason());
        assertNull(s.table().rows().get(3).exclusionReason());
        assertTrue(s.quantity("back_calculated:B6").orElseThrow().label().contains("excluded"));
    }

    @Test
    void weightedFitUsesTheNotebookWeightingAndStatesIt() {
        double[] x = {1, 2, 5, 10, 20, 50};
        double[] y = {10.4, 19.6, 51.5, 99.0, 203.0, 497.0};
        SectionResult s = run("weighting: 1/x\n", block(text(x), text(y)));
        // Weighted slope by the closed form b = Σw(x−x̄w)(y−ȳw) / Σw(x−x̄w)² with w = 1/x (Draper & Smith ch. 9).
        double sw = 0, swx = 0, swy = 0;
        for (int i = 0; i < x.length; i++) {
            sw += 1 / x[i];
            swx += 1;
            swy += y[i] / x[i];
        }
        double xm = swx / sw;
        double ym = swy / sw;
        double sxy = 0, sxx = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - xm) * (y[i] - ym) / x[i];
            sxx += (x[i] - xm) * (x[i] - xm) / x[i];
        }
        assertEquals(sxy / sxx, q(s, "slope"), 1e-12);
        assertTrue(s.settings().stream().anyMatch(st -> st.label().equals("Weighting") && st.value().equals("1/x")));
    }

    @Test
    void autoWeightingWithAConcentrationNearTheSmallestDoubleNeverFailsInternally() {
        // Found by the robustness corpus: 4.9e-324 in a concentration cell made a relative deviation infinite.
        double[] x = X.clone();
        x[1] = Double.MIN_VALUE;
        try {
            SectionResult s = run("weighting: auto\n", block(text(x), text(Y)));
            assertTrue(s.warnings().stream().anyMatch(w -> w.contains("not chosen by auto") || w.contains("not tried by auto")),
                    s.warnings().toString());
        } catch (InputException located) {
            assertTrue(located.getMessage().contains("Cal!A3") || located.getMessage().contains("line"), located.getMessage());
        }
    }

    @Test
    void autoWeightingRecordsTheComparisonInTheTrail() {
        double[] x = {1, 2, 5, 10, 20, 50};
        double[] y = {10.4, 19.6, 51.5, 99.0, 203.0, 497.0};
        SectionResult s = run("weighting: auto\n", block(text(x), text(y)));
        Step choice = s.steps().stream().filter(st -> st.id().equals("calibration.weighting_choice")).findFirst()
                .orElseThrow();
        assertEquals(5, choice.inputs().size());
        double best = choice.inputs().stream().mapToDouble(i -> i.value()).min().orElseThrow();
        assertEquals(best, choice.value(), 0);
    }

    @Test
    void throughOriginReportsNoIntercept() {
        SectionResult s = run("model: linear-through-origin\n", block(text(X), text(Y)));
        assertTrue(s.quantity("intercept").isEmpty());
        assertFalse(s.quantity("slope").isEmpty());
        double sxy = 0, sxx = 0;
        for (int i = 0; i < X.length; i++) {
            sxy += X[i] * Y[i];
            sxx += X[i] * X[i];
        }
        assertEquals(sxy / sxx, q(s, "slope"), 1e-12); // b = Σxy / Σx² (Draper & Smith §3.x, from memory)
    }

    @Test
    void everyTextInTheNumericColumnsIsReportedAtOnce() {
        String[] xs = text(X);
        String[] ys = text(Y);
        xs[1] = "n.d.";
        ys[5] = "#DIV/0!";
        InputException e = assertThrows(InputException.class, () -> run("", block(xs, ys)));
        assertEquals(2, e.problems().size());
        assertEquals(ErrorKey.NOT_A_NUMBER, e.key());
        assertEquals("runs.xlsx, Cal!A3: expected a number in column 'Conc (ng/mL)' but found the text 'n.d.'. "
                + "Correct the cell, or exclude it in the notebook with a reason (exclude: - cell: Cal!A3, "
                + "reason: ...).", e.problems().get(0).message());
        assertEquals("runs.xlsx, Cal!B7", e.problems().get(1).where());
    }

    @Test
    void censoredResponsesAreRejectedUnlessTheNotebookSaysDrop() {
        List<CellValue> xs = new ArrayList<>();
        List<CellValue> ys = new ArrayList<>();
        for (int i = 0; i < X.length; i++) {
            xs.add(cell(0, i + 1, Double.toString(X[i])));
            ys.add(i == 0 ? new CellValue(new CellRef("Cal", 1, 1), CellValue.Kind.CENSORED, 2.5, "<2.5", null)
                    : cell(1, i + 1, Double.toString(Y[i])));
        }
        DataBlock block = new DataBlock(FILE, "Cal", "A1:B8", List.of(
                new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", xs),
                new Column("Signal (counts)", "Signal", "counts", "B", ys)), List.of());
        InputException e = assertThrows(InputException.class, () -> run("", block));
        assertEquals(ErrorKey.CENSORED_VALUE, e.key());
        assertEquals("runs.xlsx, Cal!B2", e.problems().get(0).where());

        SectionResult s = run("censored: drop\n", block);
        assertEquals(6, q(s, "n"));
        assertEquals("censored result '<2.5' left out (censored: drop)", s.table().rows().get(0).exclusionReason());
    }

    @Test
    void fewerThanThreePointsIsAnError() {
        InputException e = assertThrows(InputException.class,
                () -> run("", block(new String[] {"1", "2"}, new String[] {"3", "5"})));
        assertEquals(ErrorKey.TOO_FEW_POINTS, e.key());
        assertEquals("study.md line 10: expected at least 3 calibration points in the fit but found 2 usable "
                + "points in Cal!A1:B3. Add calibration standards to the range, or reconsider the exclusions.",
                e.getMessage());
    }

    @Test
    void zeroConcentrationUnderOneOverXIsAnErrorNamingTheCell() {
        InputException e = assertThrows(InputException.class, () -> run("weighting: 1/x\n", block(text(X), text(Y))));
        assertEquals(ErrorKey.NON_POSITIVE_WEIGHT_BASIS, e.key());
        assertEquals("runs.xlsx, Cal!A2", e.problems().get(0).where());
    }

    @Test
    void allStandardsAtOneLevelIsAnError() {
        InputException e = assertThrows(InputException.class,
                () -> run("", block(new String[] {"5", "5", "5"}, new String[] {"1", "2", "3"})));
        assertEquals(ErrorKey.ZERO_VARIANCE, e.key());
    }

    @Test
    void unknownColumnListsTheColumns() {
        InputException e = assertThrows(InputException.class,
                () -> run("", new DataBlock(FILE, "Cal", "A1:B3", List.of(
                        new Column("Level", "Level", null, "A", List.of(cell(0, 1, "1"), cell(0, 2, "2"))),
                        new Column("Signal", "Signal", null, "B", List.of(cell(1, 1, "1"), cell(1, 2, "2")))),
                        List.of())));
        assertEquals(ErrorKey.MISSING_COLUMN, e.key());
        assertEquals("study.md line 11", e.problems().get(0).where());
        assertTrue(e.getMessage().contains("'Level' (A), 'Signal' (B)"), e.getMessage());
    }

    @Test
    void exclusionOutsideTheBlockIsAnError() {
        InputException e = assertThrows(InputException.class, () -> run("""
                exclude:
                  - cell: Cal!C4
                    reason: wrong column
                """, block(text(X), text(Y))));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertEquals("study.md line 14", e.problems().get(0).where());
    }

    @Test
    void aFarOutlierIsFlaggedNotRemoved() {
        // y = x plus small noise, one response 0.5 too high at x = 10 (standardized residual ≈ 4.1).
        double[] noise = {0.01, -0.02, 0.01, 0, 0.02, -0.01, 0, 0.01, -0.02, 0.5,
            0, 0.01, -0.01, 0.02, 0, -0.01, 0.01, 0, -0.02, 0.01};
        double[] x = new double[20];
        double[] y = new double[20];
        for (int i = 0; i < 20; i++) {
            x[i] = i + 1;
            y[i] = x[i] + noise[i];
        }
        SectionResult s = run("", block(text(x), text(y)));
        assertEquals(20, q(s, "n"));
        List<String> flagged = s.warnings().stream().filter(w -> w.startsWith("Point ")).toList();
        assertEquals(1, flagged.size(), s.warnings().toString());
        assertTrue(flagged.get(0).startsWith("Point Cal!B11"), flagged.get(0));
    }

    /** Three replicates at five levels, y = 2 + 10·x plus fixed scatter; one level mean pushed off the line when asked. */
    private static DataBlock replicated(double bend) {
        double[] levels = {1, 2, 4, 6, 8};
        double[] scatter = {-0.2, 0.1, 0.1};
        List<String> xs = new ArrayList<>();
        List<String> ys = new ArrayList<>();
        for (double level : levels) {
            for (double e : scatter) {
                xs.add(Double.toString(level));
                ys.add(Double.toString(2 + 10 * level + e + (level == 4 ? bend : 0)));
            }
        }
        return block(xs.toArray(new String[0]), ys.toArray(new String[0]));
    }

    @Test
    void lackOfFitUsesThePureErrorOfTheReplicates() {
        SectionResult s = run("", replicated(0));
        // Pure error by hand: each level's replicates scatter −0.2, 0.1, 0.1 about a mean of 0,
        // so SS_PE = 5 × (0.04 + 0.01 + 0.01) = 0.30 on 15 − 5 = 10 df; the level means lie exactly on
        // y = 2 + 10x, so the line fits the means and SS_LoF = 0 (Draper & Smith §2.1, from memory).
        assertEquals(0.0, q(s, "lack_of_fit_f"), 1e-9);
        assertEquals(1.0, q(s, "lack_of_fit_p"), 1e-9);
        SectionResult bent = run("", replicated(3.0));
        assertTrue(q(bent, "lack_of_fit_p") < 0.001, "a level mean 3 units off the line is a lack of fit");
        assertTrue(bent.warnings().stream().anyMatch(w -> w.startsWith("Significant lack of fit")), bent.warnings().toString());
    }

    @Test
    void withoutReplicatesTheLackOfFitTestIsStatedNotEvaluable() {
        SectionResult s = run("", block(text(X), text(Y)));
        assertTrue(s.quantity("lack_of_fit_f").isEmpty());
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Not evaluable: the lack-of-fit F test")),
                s.warnings().toString());
    }

    @Test
    void curvedDataFailMandelsTestAndTheQuadraticModelFitsThem() {
        double[] x = {1, 2, 3, 4, 5, 6, 7, 8};
        double[] y = new double[x.length];
        double[] noise = {0.02, -0.01, 0.01, -0.02, 0.0, 0.01, -0.01, 0.02};
        for (int i = 0; i < x.length; i++) {
            y[i] = 1 + 2 * x[i] + 0.3 * x[i] * x[i] + noise[i];
        }
        SectionResult linear = run("", block(text(x), text(y)));
        assertTrue(q(linear, "mandel_p") < 1e-6, "curvature is significant");
        assertTrue(linear.warnings().stream().anyMatch(w -> w.startsWith("Mandel's test: the quadratic model fits")),
                linear.warnings().toString());

        SectionResult quadratic = run("model: quadratic\n", block(text(x), text(y)));
        // Cross-check against a general-purpose library: Commons Math OLS with columns x and x².
        org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression ols =
                new org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression();
        double[][] design = new double[x.length][];
        for (int i = 0; i < x.length; i++) {
            design[i] = new double[] {x[i], x[i] * x[i]};
        }
        ols.newSampleData(y, design);
        double[] beta = ols.estimateRegressionParameters();
        assertEquals(beta[0], q(quadratic, "intercept"), 1e-9);
        assertEquals(beta[1], q(quadratic, "slope"), 1e-9);
        assertEquals(beta[2], q(quadratic, "quadratic_coef"), 1e-9);
        assertEquals(ols.estimateRegressionStandardError(), q(quadratic, "residual_sd"), 1e-9);
        // Back-calculation inverts the quadratic: x̂ solves a + b·x + c·x² = y.
        double a = q(quadratic, "intercept");
        double b = q(quadratic, "slope");
        double c = q(quadratic, "quadratic_coef");
        double back = q(quadratic, "back_calculated:B5"); // the fourth standard, x = 4
        assertEquals(y[3], a + b * back + c * back * back, 1e-9);
        assertTrue(quadratic.settings().stream().anyMatch(st -> st.value().startsWith("quadratic")));
    }

    @Test
    void theQuadraticModelNeedsThreeLevels() {
        InputException e = assertThrows(InputException.class, () -> run("model: quadratic\n",
                block(new String[] {"1", "1", "2", "2"}, new String[] {"1", "1.1", "2", "2.1"})));
        assertEquals(ErrorKey.TOO_FEW_POINTS, e.key());
        assertEquals("study.md line 13", e.problems().get(0).where());
    }

    @Test
    void normalityOfTheResidualsIsTestedAndReported() {
        SectionResult s = run("", block(text(X), text(Y)));
        double w = q(s, "shapiro_w");
        assertTrue(w > 0 && w <= 1, "W lies in (0, 1]");
        double p = q(s, "shapiro_p");
        assertTrue(p > 0 && p <= 1);
    }

    // Issue 6: data the statistics cannot support end in a located error or a result with warnings,
    // never in an internal error (properties that can fail; no outside source needed).

    @Test
    void constantResponsesAreALocatedZeroVarianceError() {
        InputException e = assertThrows(InputException.class,
                () -> run("", block(new String[] {"1", "2", "4", "8"}, new String[] {"5", "5", "5", "5"})));
        assertEquals(ErrorKey.ZERO_VARIANCE, e.key());
        assertEquals("study.md line 10", e.problems().get(0).where());
        assertTrue(e.getMessage().contains("every point has y = 5.0"), e.getMessage());
    }

    @Test
    void aPerfectFitGivesResultsWithAWarningAndTheResidualTestsNotEvaluable() {
        SectionResult s = run("", block(new String[] {"1", "2", "4", "8", "8"},
                new String[] {"10", "20", "40", "80", "80"}));
        assertEquals(10.0, q(s, "slope"), 1e-12);
        assertEquals(0.0, q(s, "residual_sd"), 1e-12);
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Perfect fit")), s.warnings().toString());
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Not evaluable: the Shapiro–Wilk")));
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Not evaluable: the lack-of-fit")));
        assertFalse(s.quantity("shapiro_p").isPresent());
        assertFalse(s.quantity("lack_of_fit_p").isPresent());
    }

    @Test
    void autoWeightingWithAZeroStandardSkipsZeroBasesAndTheBlankInTheComparison() {
        // Miller & Miller's data start with a blank at x = 0.
        SectionResult s = run("weighting: auto\n", block(text(X), text(Y)));
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Weighting 1/x was not tried")), s.warnings().toString());
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Weighting 1/x^2 was not tried")
                || w.startsWith("Weighting 1/x² was not tried")), s.warnings().toString());
        Step choice = s.steps().stream().filter(st -> st.id().endsWith("weighting_choice")).findFirst().orElseThrow();
        assertTrue(Double.isFinite(choice.value()));
        assertTrue(s.steps().stream().allMatch(st -> Double.isFinite(st.value())));
    }

    @Test
    void aTrailStepRefusesANonFiniteValueLikeAQuantity() {
        assertThrows(IllegalArgumentException.class,
                () -> new Step("c.x", "x", "x = 1/0", List.of(), Double.POSITIVE_INFINITY, null, null));
        assertThrows(IllegalArgumentException.class,
                () -> new Step("c.x", "x", "x = 0/0", List.of(), Double.NaN, null, null));
    }

    @Test
    void valuesWhoseSquaresLeaveDoublePrecisionAreALocatedError() {
        for (String[] ys : List.of(new String[] {"1e307", "2e307", "4.1e307", "7.9e307"},
                new String[] {"1e-320", "2e-320", "4.1e-320", "7.9e-320"})) {
            InputException e = assertThrows(InputException.class,
                    () -> run("", block(new String[] {"1", "2", "4", "8"}, ys)));
            assertEquals(ErrorKey.UNUSABLE_VALUES, e.key());
            assertTrue(e.getMessage().contains("another unit"), e.getMessage());
        }
    }

    @Test
    void moreThan5000PointsLeaveShapiroWilkNotEvaluableAndTheRestComputed() {
        int n = 5001;
        String[] xs = new String[n];
        String[] ys = new String[n];
        java.util.Random random = new java.util.Random(6);
        for (int i = 0; i < n; i++) {
            double x = 1 + i % 10;
            xs[i] = Double.toString(x);
            ys[i] = Double.toString(10 * x + random.nextGaussian());
        }
        SectionResult s = run("", block(xs, ys));
        assertEquals(n, q(s, "n"));
        assertEquals(10.0, q(s, "slope"), 0.05);
        assertFalse(s.quantity("shapiro_p").isPresent());
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Not evaluable: the Shapiro–Wilk test of the "
                + "residuals, because") && w.contains("5000")), s.warnings().toString());
        assertTrue(s.quantity("lack_of_fit_p").isPresent());
    }

    @Test
    void theInterceptsTTestMatchesRAndASignificantInterceptIsAWarning() {
        // R 4.2.2, summary(lm(y ~ x))$coefficients[1, 3:4] on Miller & Miller's data:
        //   x <- c(0,2,4,6,8,10,12); y <- c(2.1,5.0,9.0,12.6,17.3,21.0,24.7)
        //   t = 5.14639493266463, p = 0.00362582929043381
        SectionResult s = run("", block(text(X), text(Y)));
        assertEquals(5.14639493266463, q(s, "intercept_t"), 1e-11);
        assertEquals(0.00362582929043381, q(s, "intercept_p"), 1e-13);
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("The intercept differs significantly from zero")),
                s.warnings().toString());
    }
}
