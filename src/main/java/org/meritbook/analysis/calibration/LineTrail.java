package org.meritbook.analysis.calibration;

import java.util.List;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.distributions.StudentT;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.trail.StepInput;

/**
 * Records a straight-line calibration as named quantities, each with the formula and the inputs it
 * came from (raw inputs with their cell addresses, derived ones by step id).
 */
final class LineTrail {
    private static final String LS_REFERENCE =
            "weighted least squares; Draper & Smith, Applied Regression Analysis, ch. 1 and 9";

    private final SectionBuilder section;
    private final CalibrationData data;
    private final LineFit fit;
    private final boolean origin;
    private final String xUnit;
    private final String yUnit;

    LineTrail(SectionBuilder section, CalibrationData data, LineFit fit) {
        this.section = section;
        this.data = data;
        this.fit = fit;
        this.origin = fit.model() == LineModel.THROUGH_ORIGIN;
        this.xUnit = data.xUnit();
        this.yUnit = data.yUnit();
    }

    /** Records the fit's steps; returns how a response is inverted, for the back-calculation. */
    BackCalculation.Inversion record() {
        String points = PointsStep.record(section, data, fit.weighting(), fit.weights(), fit.n());
        String t = section.step("t", "Student t quantile, two-sided 95 %", "t = t(0.975; df), df = n − "
                        + (origin ? "1" : "2"),
                List.of(StepInput.number("df", fit.degreesOfFreedom(), null, points)), fit.tQuantile(
                        CalibrationAnalysis.LEVEL), null, "Student t distribution (Apache Commons Math)");
        String xMean = origin ? null : section.step("x_mean_w", "Weighted mean concentration",
                "x̄w = Σwᵢxᵢ / Σwᵢ", List.of(from("x, w", points)), fit.weightedMeanX(), xUnit, null);
        String yMean = origin ? null : section.step("y_mean_w", "Weighted mean response",
                "ȳw = Σwᵢyᵢ / Σwᵢ", List.of(from("y, w", points)), fit.weightedMeanY(), yUnit, null);
        String sxx = section.step("sxx", "Weighted sum of squares of concentration",
                origin ? "Sxx = Σwᵢxᵢ²" : "Sxx = Σwᵢ(xᵢ − x̄w)²",
                origin ? List.of(from("x, w", points)) : List.of(from("x, w", points), section.ref("x̄w", xMean)),
                fit.sxx(), Units.squared(xUnit), null);
        String slopeUnit = Units.ratio(yUnit, xUnit);
        String slope = section.quantity(QuantityDraft.of("slope", "Slope (sensitivity)",
                        origin ? "b = Σwᵢxᵢyᵢ / Σwᵢxᵢ²" : "b = Σwᵢ(xᵢ − x̄w)(yᵢ − ȳw) / Sxx",
                        origin ? List.of(from("x, y, w", points), section.ref("Sxx", sxx))
                                : List.of(from("x, y, w", points), section.ref("x̄w", xMean), section.ref("ȳw", yMean),
                                section.ref("Sxx", sxx)),
                        fit.slope(), slopeUnit)
                .withInterval(fit.slopeInterval(CalibrationAnalysis.LEVEL)).withMethod(LS_REFERENCE).inSummary());
        String intercept = null;
        if (!origin) {
            intercept = section.quantity(QuantityDraft.of("intercept", "Intercept", "a = ȳw − b·x̄w",
                            List.of(section.ref("ȳw", yMean), section.ref("b", slope), section.ref("x̄w", xMean)), fit.intercept(), yUnit)
                    .withInterval(fit.interceptInterval(CalibrationAnalysis.LEVEL)).withMethod(LS_REFERENCE));
        }
        String s = section.quantity(QuantityDraft.of("residual_sd", "Residual standard deviation s(y/x)",
                origin ? "s(y/x) = √(Σwᵢ(yᵢ − b·xᵢ)² / (n − 1))" : "s(y/x) = √(Σwᵢ(yᵢ − a − b·xᵢ)² / (n − 2))",
                origin ? List.of(from("x, y, w", points), section.ref("b", slope))
                        : List.of(from("x, y, w", points), section.ref("a", intercept), section.ref("b", slope)),
                fit.residualSd(), yUnit).inSummary());
        String slopeSe = section.quantity(QuantityDraft.of("slope_se", "Standard error of the slope",
                "s(b) = s(y/x) / √Sxx", List.of(section.ref("s(y/x)", s), section.ref("Sxx", sxx)), fit.slopeSe(),
                slopeUnit));
        section.step("slope_ci_half_width", "Half-width of the 95 % confidence interval of the slope",
                "Δb = t · s(b); interval b ± Δb", List.of(section.ref("t", t), section.ref("s(b)", slopeSe)),
                fit.tQuantile(CalibrationAnalysis.LEVEL) * fit.slopeSe(), slopeUnit, null);
        if (!origin) {
            String interceptSe = section.quantity(QuantityDraft.of("intercept_se",
                    "Standard error of the intercept", "s(a) = s(y/x) · √(1/Σwᵢ + x̄w² / Sxx)",
                    List.of(section.ref("s(y/x)", s), section.ref("x̄w", xMean), section.ref("Sxx", sxx),
                            from("w", points)),
                    fit.interceptSe(), yUnit));
            section.step("intercept_ci_half_width", "Half-width of the 95 % confidence interval of the intercept",
                    "Δa = t · s(a); interval a ± Δa", List.of(section.ref("t", t), section.ref("s(a)", interceptSe)),
                    fit.tQuantile(CalibrationAnalysis.LEVEL) * fit.interceptSe(), yUnit, null);
            interceptTest(intercept, interceptSe);
            section.quantity(QuantityDraft.of("r", "Correlation coefficient r",
                    "r = Σwᵢ(xᵢ − x̄w)(yᵢ − ȳw) / √(Sxx · Σwᵢ(yᵢ − ȳw)²)",
                    List.of(from("x, y, w", points), section.ref("Sxx", sxx)), fit.r(), null).as(NumberKind.CORRELATION));
        }
        section.quantity(QuantityDraft.of("r_squared",
                origin ? "Coefficient of determination r² (uncentred, through origin)" : "Coefficient of determination r²",
                origin ? "r² = Σwᵢŷᵢ² / Σwᵢyᵢ²" : "r² = r·r",
                List.of(from("x, y, w", points), section.ref("b", slope)), fit.rSquared(), null).as(NumberKind.CORRELATION).inSummary());
        section.step("equation", "Calibration equation, every digit (the value shown is the slope b): " + Equation.full(data, fit),
                origin ? "y = b·x" : "y = a + b·x",
                origin ? List.of(section.ref("b", slope)) : List.of(section.ref("a", intercept), section.ref("b", slope)),
                fit.slope(), slopeUnit, null);
        List<StepInput> coefficients = intercept == null ? List.of(section.ref("b", slope))
                : List.of(section.ref("a", intercept), section.ref("b", slope));
        return new BackCalculation.Inversion(intercept == null ? "x̂ = y / b" : "x̂ = (y − a) / b", coefficients);
    }

    /**
     * Whether the intercept differs from zero: t = a / s(a) with n − 2 degrees of freedom, two-sided
     * (Miller &amp; Miller, Statistics and Chemometrics for Analytical Chemistry, ch. 5, from memory). A
     * significant intercept is a warning: a blank signal or a curved low end, for the analyst to explain.
     */
    private void interceptTest(String intercept, String interceptSe) {
        if (!(fit.interceptSe() > 0)) {
            section.warning("Not evaluable: the t test of the intercept, because its standard error is 0 (a perfect fit).");
            return;
        }
        double t = fit.intercept() / fit.interceptSe();
        String tId = section.quantity(QuantityDraft.of("intercept_t", "t statistic of the intercept against 0",
                "t = a / s(a)", List.of(section.ref("a", intercept), section.ref("s(a)", interceptSe)), t, null).as(NumberKind.STATISTIC));
        double p = new StudentT(fit.degreesOfFreedom()).twoSidedP(t);
        section.quantity(QuantityDraft.of("intercept_p", "Intercept p-value (two-sided, against 0)",
                "p = 2·P(T(n − 2) > |t|)", List.of(section.ref("t", tId)), p, null).as(NumberKind.P_VALUE)
                .withMethod("t test of the intercept; Miller & Miller, Statistics and Chemometrics for Analytical "
                        + "Chemistry, ch. 5 (from memory)"));
        if (p < LinearityChecks.ALPHA) {
            section.warning(String.format(java.util.Locale.ROOT,
                    "The intercept differs significantly from zero (t = %.3g, p = %.3g < %.2f): a blank response or "
                            + "curvature at the low end; check the blank and the lowest standards before using a "
                            + "line through the origin or a single-point calibration.", t, p, LinearityChecks.ALPHA));
        }
    }

    /** A reference to the data set listed in a step (not a single number). */
    static StepInput from(String name, String stepId) {
        return StepInput.text(name, "the points listed in " + stepId, stepId);
    }
}
