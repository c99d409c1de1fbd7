package org.meritbook.analysis.calibration;

import java.util.List;
import java.util.Optional;
import org.meritbook.analysis.Attempt;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.regression.LackOfFit;
import org.meritbook.stats.regression.LeastSquares;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.MandelTest;
import org.meritbook.stats.regression.QuadraticFit;
import org.meritbook.stats.tests.ShapiroWilk;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.trail.StepInput;

/**
 * The tests that support a linearity claim beyond r²: lack of fit against pure error (when levels are
 * replicated), Mandel's test of the straight line against the quadratic, and normality of the
 * residuals (Shapiro–Wilk). Each result is a quantity with its step; a test the data cannot support
 * is stated as not evaluable, with the reason. Significant results are warnings, never silent.
 */
final class LinearityChecks {
    /** Significance level at which a test result is raised as a warning (common practice, no source). */
    static final double ALPHA = 0.05;

    private final SectionBuilder section;
    private final CalibrationData data;
    private final String points;
    /** Residuals at rounding level: the tests that need residual scatter are not evaluable. */
    private boolean perfect;

    LinearityChecks(SectionBuilder section, CalibrationData data) {
        this.section = section;
        this.data = data;
        this.points = section.stepId("n");
    }

    /** For a straight-line calibration. */
    void record(LineFit line) {
        perfect = PerfectFit.check(section, line.residualSd(), line.y(), data.yUnit());
        int parameters = line.model() == LineModel.THROUGH_ORIGIN ? 1 : 2;
        lackOfFit(line.x(), line.y(), line.weights(), line.fitted(), parameters);
        if (line.model() == LineModel.WITH_INTERCEPT) {
            mandel(line.weighting(), line, null);
        }
        normality(line.standardizedResiduals());
    }

    /** For a quadratic calibration. */
    void record(QuadraticFit quadratic) {
        perfect = PerfectFit.check(section, quadratic.residualSd(), quadratic.y(), data.yUnit());
        lackOfFit(quadratic.x(), quadratic.y(), quadratic.weights(), quadratic.fitted(), 3);
        mandel(quadratic.weighting(), null, quadratic);
        normality(quadratic.standardizedResiduals());
    }

    private void lackOfFit(double[] x, double[] y, double[] w, double[] fitted, int parameters) {
        if (perfect) {
            section.warning("Not evaluable: the lack-of-fit F test, because the residuals are at rounding level "
                    + "(a perfect fit), so there is no residual variance to compare with pure error.");
            return;
        }
        Optional<LackOfFit> test = LackOfFit.of(x, y, w, fitted, parameters);
        if (test.isEmpty()) {
            section.warning("Not evaluable: the lack-of-fit F test needs replicated concentration levels whose "
                    + "replicates scatter, and more levels than fitted parameters (" + parameters + ").");
            return;
        }
        LackOfFit t = test.get();
        String f = section.quantity(QuantityDraft.of("lack_of_fit_f", "Lack-of-fit F statistic",
                "F = (SS_LoF / df_LoF) / (SS_PE / df_PE); SS_PE = Σ over levels Σwᵢ(yᵢ − ȳlevel,w)², SS_LoF = SS_res − SS_PE",
                List.of(LineTrail.from("x, y, w", points), StepInput.number("SS_LoF", t.ssLackOfFit(), null, "computed"),
                        StepInput.number("SS_PE", t.ssPureError(), null, "computed"),
                        StepInput.number("df_LoF", t.lackOfFitDf(), null, "levels − parameters"),
                        StepInput.number("df_PE", t.pureErrorDf(), null, "n − levels")),
                t.f(), null).as(NumberKind.STATISTIC)
                .withMethod("lack-of-fit test with pure error; Draper & Smith, Applied Regression Analysis, §2.1"));
        section.quantity(QuantityDraft.of("lack_of_fit_p", "Lack-of-fit p-value", "p = P(F(df_LoF, df_PE) > F)",
                List.of(section.ref("F", f)), t.p(), null).as(NumberKind.P_VALUE).inSummary());
        if (t.p() < ALPHA) {
            section.warning(String.format(java.util.Locale.ROOT,
                    "Significant lack of fit (p = %.3g < %.2f): the model does not describe the level means within "
                            + "the replicate scatter.", t.p(), ALPHA));
        }
    }

    /** Mandel's test needs both fits; the one not in use is fitted here with the same weighting. */
    private void mandel(Weighting weighting, LineFit line, QuadraticFit quadratic) {
        double[] x = data.usedX();
        double[] y = data.usedY();
        long levels = java.util.Arrays.stream(x).distinct().count();
        if (x.length < 4 || levels < 3) {
            section.warning("Not evaluable: Mandel's test needs at least 4 points at 3 or more concentration levels.");
            return;
        }
        // e.g. the quadratic fits to rounding level, so F would be a ratio of rounding errors
        Optional<MandelTest> test = Attempt.optional(section, "Mandel's test", () -> MandelTest.of(
                line != null ? line : LeastSquares.fitLine(x, y, weighting, LineModel.WITH_INTERCEPT),
                quadratic != null ? quadratic : LeastSquares.fitQuadratic(x, y, weighting)));
        if (test.isEmpty()) {
            return;
        }
        MandelTest t = test.get();
        String f = section.quantity(QuantityDraft.of("mandel_f", "Mandel's fitting test F statistic",
                "F = (SS_res,linear − SS_res,quadratic) / s²(y/x),quadratic",
                List.of(StepInput.number("SS_res,linear", t.ssResidualLinear(), null, "straight-line fit, same weights"),
                        StepInput.number("SS_res,quadratic", t.ssResidualQuadratic(), null, "quadratic fit, same weights"),
                        StepInput.number("s(y/x),quadratic", t.residualSdQuadratic(), data.yUnit(), "quadratic fit"),
                        StepInput.number("df", t.df2(), null, "n − 3")),
                t.f(), null).as(NumberKind.STATISTIC).withMethod("Mandel's fitting test (ISO 8466-1)"));
        section.quantity(QuantityDraft.of("mandel_p", "Mandel's test p-value", "p = P(F(1, n − 3) > F)",
                List.of(section.ref("F", f)), t.p(), null).as(NumberKind.P_VALUE).inSummary());
        if (line != null && t.p() < ALPHA) {
            section.warning(String.format(java.util.Locale.ROOT,
                    "Mandel's test: the quadratic model fits significantly better than the straight line (p = %.3g < %.2f);"
                            + " consider model: quadratic or a narrower range.", t.p(), ALPHA));
        } else if (quadratic != null && t.p() >= ALPHA) {
            section.warning(String.format(java.util.Locale.ROOT,
                    "Mandel's test: the quadratic term is not significant (p = %.3g ≥ %.2f); a straight line may suffice.",
                    t.p(), ALPHA));
        }
    }

    private void normality(double[] standardizedResiduals) {
        if (perfect) {
            section.warning("Not evaluable: the Shapiro–Wilk test of the residuals, because the residuals are at "
                    + "rounding level (a perfect fit), so their pattern is numerical noise.");
            return;
        }
        Optional<ShapiroWilk> test = Attempt.optional(section, "the Shapiro–Wilk test of the residuals",
                () -> ShapiroWilk.test(standardizedResiduals));
        if (test.isEmpty()) {
            return;
        }
        ShapiroWilk t = test.get();
        String w = section.quantity(QuantityDraft.of("shapiro_w", "Shapiro–Wilk W of the standardized residuals",
                "W = (Σaᵢ·z₍ᵢ₎)² / Σ(zᵢ − z̄)², z = standardized residuals, a from Royston's approximation",
                List.of(StepInput.text("z", "standardized residuals of the fit", points)), t.w(), null).as(NumberKind.STATISTIC)
                .withMethod("Shapiro–Wilk test, Royston's algorithm (AS R94, 1995)"));
        section.quantity(QuantityDraft.of("shapiro_p", "Shapiro–Wilk p-value", "p from Royston's normalising transformation of W",
                List.of(section.ref("W", w)), t.p(), null).as(NumberKind.P_VALUE));
        if (t.p() < ALPHA) {
            section.warning(String.format(java.util.Locale.ROOT,
                    "The residuals depart from normality (Shapiro–Wilk p = %.3g < %.2f): intervals and tests that assume "
                            + "normal errors are approximate; check the weighting and the residual plot.", t.p(), ALPHA));
        }
    }
}
