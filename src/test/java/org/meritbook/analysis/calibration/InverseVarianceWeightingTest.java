package org.meritbook.analysis.calibration;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

/**
 * {@code weighting: 1/s^2}: each standard weighted by the inverse variance of its level's replicates,
 * checked against R's weighted {@code lm}; a level that cannot give a weight is a located error.
 */
class InverseVarianceWeightingTest {
    private static final double[] LEVELS = {1, 2, 5, 10, 20};
    /** Three injections per level, one row per level (y: [B, C, D]); the spread grows with the level. */
    private static final double[][] AREAS = {
        {10.2, 9.9, 10.4}, {20.1, 20.6, 19.8}, {50.9, 49.7, 50.2}, {100.3, 101.0, 99.6}, {200.8, 197.1, 202.5}};

    /*
     * R 4.x, lm with weights (the expected values below, printed with %.15g):
     *   x <- rep(c(1, 2, 5, 10, 20), each = 3)
     *   y <- c(10.2, 9.9, 10.4, 20.1, 20.6, 19.8, 50.9, 49.7, 50.2, 100.3, 101.0, 99.6, 200.8, 197.1, 202.5)
     *   s <- tapply(y, x, sd); raw <- 1 / s[as.character(x)]^2; w <- raw / mean(raw)
     *   f <- lm(y ~ x, weights = w); cf <- summary(f)$coefficients
     *   c(mean(raw), cf[2,1], cf[1,1], cf[2,2], cf[1,2], summary(f)$sigma, summary(f)$r.squared)
     * → s = 0.251661147842358 0.404145188432738 0.602771377334169 0.700000000000003 2.761038451983847
     */
    private static final double MEAN_RAW_WEIGHT = 5.36724175633892;
    private static final double SLOPE = 10.012907581298;
    private static final double INTERCEPT = 0.155718737417256;
    private static final double SLOPE_SE = 0.0351184160949881;
    private static final double INTERCEPT_SE = 0.129628481423369;
    private static final double RESIDUAL_SD = 0.37960428036974;
    private static final double R_SQUARED = 0.999840109252767;

    static CellValue number(String sheet, int col, int row, double v) {
        return new CellValue(new CellRef(sheet, row, col), CellValue.Kind.NUMBER, v, Double.toString(v), null);
    }

    static DataBlock wide(double[][] areas) {
        List<CellValue> x = new ArrayList<>();
        List<List<CellValue>> ys = List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        for (int i = 0; i < LEVELS.length; i++) {
            x.add(number("Cal", 0, i + 1, LEVELS[i]));
            for (int k = 0; k < 3; k++) {
                ys.get(k).add(number("Cal", k + 1, i + 1, areas[i][k]));
            }
        }
        return new DataBlock(Path.of("lab.xlsx"), "Cal", "A1:D6", List.of(
                new Column("Conc (ng/mL)", "Conc", "ng/mL", "A", x), new Column("Inj 1 (mAU·s)", "Inj 1", "mAU·s", "B",
                        ys.get(0)), new Column("Inj 2 (mAU·s)", "Inj 2", "mAU·s", "C", ys.get(1)),
                new Column("Inj 3 (mAU·s)", "Inj 3", "mAU·s", "D", ys.get(2))), List.of());
    }

    static SectionResult run(String weighting, String extra, DataBlock block) {
        Study study = StudyParser.parse("""
                ---
                title: Inverse variance
                sources:
                  lab: lab.xlsx
                ---

                ```calibration
                data: lab!Cal!A1:D6
                x: Conc
                y: [B, C, D]
                weighting: %s
                %s```
                """.formatted(weighting, extra), Path.of("study.md"));
        return new CalibrationAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no " + name)).value();
    }

    private static Step step(SectionResult s, String name) {
        return s.steps().stream().filter(t -> t.id().equals(s.id() + "." + name)).findFirst()
                .orElseThrow(() -> new AssertionError("no step " + name));
    }

    private static void assertRelative(double expected, double actual, String what) {
        assertEquals(expected, actual, 1e-11 * Math.abs(expected), what);
    }

    @Test
    void theFitAgreesWithRsWeightedLinearModel() {
        SectionResult s = run("1/s^2", "", wide(AREAS));
        assertRelative(SLOPE, q(s, "slope"), "slope");
        assertRelative(INTERCEPT, q(s, "intercept"), "intercept");
        assertRelative(SLOPE_SE, q(s, "slope_se"), "slope_se");
        assertRelative(INTERCEPT_SE, q(s, "intercept_se"), "intercept_se");
        assertRelative(RESIDUAL_SD, q(s, "residual_sd"), "residual_sd");
        assertRelative(R_SQUARED, q(s, "r_squared"), "r_squared");
        // The scaling is stated: the divisor is the mean of the raw weights 1/s², in 1/(mAU·s)².
        Step scale = step(s, "weight_scale");
        assertRelative(MEAN_RAW_WEIGHT, scale.value(), "weight_scale");
        assertEquals("1/(mAU·s)²", scale.unit());
        // Each level's SD is a step citing its three response cells; each weight cites its level.
        Step level10 = step(s, "level_sd:10");
        assertEquals(0.700000000000003, level10.value(), 1e-12);
        assertEquals(List.of("Cal!B5", "Cal!C5", "Cal!D5"), level10.inputs().stream().map(i -> i.source()).toList());
        assertTrue(step(s, "n").inputs().stream().anyMatch(i -> i.name().startsWith("w")
                && i.source().equals("1/s² of calibration.level_sd:10, normalised to mean 1")));
        assertTrue(s.settings().stream().anyMatch(t -> t.label().equals("Weighting") && t.value().startsWith("1/s^2 "
                + "(inverse variance")), s.settings().toString());
        assertTrue(s.settings().stream().anyMatch(t -> t.label().equals("Weight scaling")
                && t.value().startsWith("each weight 1/s^2 divided by the mean weight")));
    }

    @Test
    void theSuperscriptSpellingIsTheSameWeighting() {
        assertEquals(q(run("1/s^2", "", wide(AREAS)), "slope"), q(run("1/s²", "", wide(AREAS)), "slope"));
    }

    @Test
    void aLevelLeftWithOneReplicateIsALocatedError() {
        InputException e = assertThrows(InputException.class, () -> run("1/s^2",
                "exclude:\n  - cell: Cal!C3\n    reason: bubble\n  - cell: Cal!D3\n    reason: bubble\n", wide(AREAS)));
        assertEquals(ErrorKey.TOO_FEW_POINTS, e.key());
        assertEquals(1, e.problems().size());
        assertEquals("lab.xlsx, Cal!B3: expected at least 2 replicate responses that differ at each concentration level "
                + "under weighting 1/s^2 (study.md line 11) but found 1 response at x = 2 ng/mL in the fit, so no "
                + "replicate SD. Measure this level in replicate, exclude it with a reason, or choose another weighting.",
                e.problems().get(0).message());
    }

    @Test
    void equalReplicatesAreALocatedErrorAndEveryBadLevelIsReportedAtOnce() {
        double[][] areas = AREAS.clone();
        areas[2] = new double[] {50.2, 50.2, 50.2};
        InputException e = assertThrows(InputException.class, () -> run("1/s^2",
                "exclude:\n  - cell: Cal!C6\n    reason: vial empty\n  - cell: Cal!D6\n    reason: vial empty\n",
                wide(areas)));
        List<Problem> problems = e.problems();
        assertEquals(List.of(ErrorKey.ZERO_VARIANCE, ErrorKey.TOO_FEW_POINTS), problems.stream().map(Problem::key).toList());
        assertEquals("lab.xlsx, Cal!B4, Cal!C4, Cal!D4: expected at least 2 replicate responses that differ at each "
                + "concentration level under weighting 1/s^2 (study.md line 11) but found 3 equal responses at x = 5 "
                + "ng/mL (s = 0), which would give an infinite weight. Check the responses of this level (copied "
                + "values?), or choose another weighting.", problems.get(0).message());
        assertEquals("lab.xlsx, Cal!B6", problems.get(1).where());
    }

    @Test
    void autoDoesNotConsiderInverseVariance() {
        SectionResult s = run("auto", "", wide(AREAS));
        Step choice = step(s, "weighting_choice");
        assertEquals(5, choice.inputs().size(), "none, 1/x, 1/x^2, 1/y, 1/y^2");
        assertFalse(choice.inputs().stream().anyMatch(i -> i.name().contains("1/s")));
    }

    @Test
    void aQuadraticTakesTheSameWeights() {
        SectionResult s = run("1/s^2", "model: quadratic\n", wide(AREAS));
        assertRelative(MEAN_RAW_WEIGHT, step(s, "weight_scale").value(), "weight_scale");
        assertTrue(s.quantity("quadratic_coef").isPresent());
    }
}
