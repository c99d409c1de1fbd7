package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

/**
 * What a reviewer asks of a finished calibration section: the weight scaling, the equation, the ANOVA
 * table and the studentized residuals. Reference values: R 4.2.2 (R 4.x, anova(lm(...)), rstandard()),
 * the script in {@code org.meritbook.stats.regression.RegressionAnovaTest}; same invented data.
 */
class CalibrationFinishTest {
    private static final String[] X = {"1", "1", "2", "2", "5", "5", "10", "10", "20", "20"};
    private static final String[] Y = {"42.3", "40.9", "83.1", "85.6", "206.2", "201.4", "418.8", "409.5", "829.0",
        "846.3"};

    static SectionResult run(String options) {
        String notebook = """
                ---
                title: Test study
                sources:
                  runs: runs.xlsx
                ---

                ## Linearity

                ```calibration
                data: runs!Cal!A1:B11
                x: Conc
                y: Signal
                %s```
                """.formatted(options);
        Study study = StudyParser.parse(notebook, Path.of("study.md"));
        return new CalibrationAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block()));
    }

    private static DataBlock block() {
        List<CellValue> xv = new ArrayList<>();
        List<CellValue> yv = new ArrayList<>();
        for (int i = 0; i < X.length; i++) {
            xv.add(new CellValue(new CellRef("Cal", i + 1, 0), CellValue.Kind.NUMBER, Double.parseDouble(X[i]), X[i], null));
            yv.add(new CellValue(new CellRef("Cal", i + 1, 1), CellValue.Kind.NUMBER, Double.parseDouble(Y[i]), Y[i], null));
        }
        return new DataBlock(Path.of("runs.xlsx"), "Cal", "A1:B11",
                List.of(new Column("Conc (mg/L)", "Conc", "mg/L", "A", xv),
                        new Column("Signal (mAU·s)", "Signal", "mAU·s", "B", yv)), List.of());
    }

    static String setting(SectionResult s, String label) {
        return s.settings().stream().filter(st -> st.label().equals(label)).map(Setting::value).findFirst()
                .orElseThrow(() -> new AssertionError("no setting " + label));
    }

    static Step step(SectionResult s, String name) {
        return s.steps().stream().filter(st -> st.id().endsWith("." + name)).findFirst()
                .orElseThrow(() -> new AssertionError("no step " + name));
    }

    static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name)).value();
    }

    @Test
    void weightScalingIsStatedAndItsDivisorIsInTheTrail() {
        SectionResult s = run("weighting: 1/x^2\n");
        assertTrue(setting(s, "Weight scaling").contains("average 1"));
        // mean of 1/x² over the ten standards, computed here from the data, not from the fit
        double mean = 0;
        for (String x : X) {
            mean += 1 / (Double.parseDouble(x) * Double.parseDouble(x));
        }
        mean /= X.length;
        Step scale = step(s, "weight_scale");
        assertEquals(mean, scale.value(), 1e-15);
        assertEquals("1/(mg/L)²", scale.unit());
        assertTrue(setting(run(""), "Weight scaling").startsWith("none"));
        assertTrue(setting(s, "Shapiro–Wilk test on").startsWith("the standardized residuals"));
    }

    @Test
    void equationIsWrittenWithUnitsRoundedByItsIntervalsAndInFullInTheTrail() {
        SectionResult s = run("weighting: 1/x^2\n");
        // R 4.x, coef() and confint() of lm(y ~ x, weights = 1/x^2): a = 0.28656957928804494 (95 % half-width
        // 1.67491, so one decimal), b = 41.46046925566341912 (half-width 0.85486, so two decimals)
        assertEquals("Signal (mAU·s) = 0.3 + 41.46 · Conc (mg/L)", setting(s, "Calibration equation"));
        Step full = step(s, "equation");
        assertTrue(full.label().endsWith("Signal (mAU·s) = " + q(s, "intercept") + " + " + q(s, "slope")
                + " · Conc (mg/L)"), full.label());
        assertEquals(0.28656957928804494, q(s, "intercept"), 1e-12);
        assertEquals(41.46046925566341912, q(s, "slope"), 1e-12);
        SectionResult origin = run("weighting: 1/x^2\nmodel: linear-through-origin\n");
        assertTrue(setting(origin, "Calibration equation").matches("Signal \\(mAU·s\\) = [0-9.]+ · Conc \\(mg/L\\)"));
    }

    @Test
    void anovaRowsAreQuantitiesThatMatchRForTheWeightedFit() {
        SectionResult s = run("weighting: 1/x^2\n");
        // R 4.x, anova(lm(y ~ x, weights = w)) with w = 1/x² scaled to average 1, and anova(that, lm(y ~ factor(x)))
        assertEquals(1, q(s, "anova_regression_df"));
        assertEquals(8, q(s, "anova_residual_df"));
        assertEquals(9, q(s, "anova_total_df"));
        assertEquals(3, q(s, "anova_lack_of_fit_df"));
        assertEquals(5, q(s, "anova_pure_error_df"));
        assertEquals(31309.161865336, q(s, "anova_regression_ss"), 1e-7);
        assertEquals(20.0245664300045, q(s, "anova_residual_ss"), 1e-10);
        assertEquals(2.50307080375, q(s, "anova_residual_ms"), 1e-10);
        assertEquals(12508.30053, q(s, "anova_regression_f"), 1e-5);
        assertEquals(4.56483576814457e-14, q(s, "anova_regression_p"), 1e-21);
        assertEquals(8.39841479852685, q(s, "anova_lack_of_fit_ss"), 1e-10);
        assertEquals(11.6261516314777, q(s, "anova_pure_error_ss"), 1e-10);
        assertEquals(11.6261516314777 / 5, q(s, "anova_pure_error_ms"), 1e-10);
        assertEquals(31329.186431766, q(s, "anova_total_ss"), 1e-7);
        // the residual mean square is s²(y/x), so the ANOVA and the fit agree
        assertEquals(q(s, "residual_sd") * q(s, "residual_sd"), q(s, "anova_residual_ms"), 1e-12);
        assertEquals("(mAU·s)²", s.quantity("anova_residual_ss").orElseThrow().unit());
        for (var quantity : s.quantities()) {
            String base = quantity.name().contains(":") ? quantity.name().substring(0, quantity.name().indexOf(':'))
                    : quantity.name();
            assertTrue(org.meritbook.study.AnalysisKind.CALIBRATION.reportedNames().contains(base), base);
        }
    }

    @Test
    void studentizedResidualsSitInTheTableAndMatchRstandard() {
        SectionResult s = run("weighting: 1/x^2\n");
        // R 4.x, rstandard(lm(y ~ x, weights = 1/x^2)): the first and last standards (rows 2 and 11)
        assertEquals(0.9000333801633713, q(s, "studentized_residual:B2"), 1e-11);
        assertEquals(1.1510441065004728, q(s, "studentized_residual:B11"), 1e-11);
        assertTrue(s.table().headers().contains("Studentized residual"));
        assertTrue(s.table().headers().contains("Standardized residual"));
    }
}
