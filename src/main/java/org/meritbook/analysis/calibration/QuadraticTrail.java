package org.meritbook.analysis.calibration;

import java.util.List;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.regression.QuadraticFit;
import org.meritbook.trail.StepInput;

/** Records a quadratic calibration y = a + b·x + c·x² as named quantities with their trail steps. */
final class QuadraticTrail {
    private static final String LS_REFERENCE =
            "weighted least squares by QR on centred, scaled x; Draper & Smith, Applied Regression Analysis, ch. 5 and 9";
    private static final String SOLVE = "minimise Σwᵢ(yᵢ − a − b·xᵢ − c·xᵢ²)²";

    private final SectionBuilder section;
    private final CalibrationData data;
    private final QuadraticFit fit;

    QuadraticTrail(SectionBuilder section, CalibrationData data, QuadraticFit fit) {
        this.section = section;
        this.data = data;
        this.fit = fit;
    }

    /** Records the fit's steps; returns how a response is inverted, for the back-calculation. */
    BackCalculation.Inversion record() {
        String xUnit = data.xUnit();
        String yUnit = data.yUnit();
        double level = CalibrationAnalysis.LEVEL;
        String points = PointsStep.record(section, data, fit.weighting(), fit.weights(), fit.n());
        section.step("t", "Student t quantile, two-sided 95 %", "t = t(0.975; df), df = n − 3",
                List.of(StepInput.number("df", fit.degreesOfFreedom(), null, points)), fit.tQuantile(level), null,
                "Student t distribution (Apache Commons Math)");
        List<StepInput> fromPoints = List.of(LineTrail.from("x, y, w", points));
        String a = section.quantity(QuantityDraft.of("intercept", "Intercept a", SOLVE + "; a", fromPoints,
                fit.intercept(), yUnit).withInterval(fit.coefficientInterval(0, level)).withMethod(LS_REFERENCE));
        String b = section.quantity(QuantityDraft.of("slope", "Linear coefficient b (sensitivity at x = 0)",
                SOLVE + "; b", fromPoints, fit.linear(), Units.ratio(yUnit, xUnit))
                .withInterval(fit.coefficientInterval(1, level)).withMethod(LS_REFERENCE));
        String c = section.quantity(QuantityDraft.of("quadratic_coef", "Quadratic coefficient c", SOLVE + "; c",
                fromPoints, fit.quadratic(), Units.perSquare(yUnit, xUnit))
                .withInterval(fit.coefficientInterval(2, level)).withMethod(LS_REFERENCE).inSummary());
        String s = section.quantity(QuantityDraft.of("residual_sd", "Residual standard deviation s(y/x)",
                "s(y/x) = √(Σwᵢ(yᵢ − a − b·xᵢ − c·xᵢ²)² / (n − 3))",
                List.of(LineTrail.from("x, y, w", points), section.ref("a", a), section.ref("b", b),
                        section.ref("c", c)),
                fit.residualSd(), yUnit).inSummary());
        section.quantity(QuantityDraft.of("intercept_se", "Standard error of a", "s(a) = s(y/x)·√[(XᵀWX)⁻¹]₀₀",
                List.of(section.ref("s(y/x)", s), fromPoints.get(0)), fit.interceptSe(), yUnit));
        section.quantity(QuantityDraft.of("slope_se", "Standard error of b", "s(b) = s(y/x)·√[(XᵀWX)⁻¹]₁₁",
                List.of(section.ref("s(y/x)", s), fromPoints.get(0)), fit.linearSe(), Units.ratio(yUnit, xUnit)));
        section.quantity(QuantityDraft.of("quadratic_coef_se", "Standard error of c", "s(c) = s(y/x)·√[(XᵀWX)⁻¹]₂₂",
                List.of(section.ref("s(y/x)", s), fromPoints.get(0)), fit.quadraticSe(), Units.perSquare(yUnit, xUnit)));
        section.quantity(QuantityDraft.of("r_squared", "Coefficient of determination r²",
                "r² = 1 − Σwᵢ(yᵢ − ŷᵢ)² / Σwᵢ(yᵢ − ȳw)²", List.of(fromPoints.get(0), section.ref("s(y/x)", s)),
                fit.rSquared(), null).as(NumberKind.CORRELATION).inSummary());
        return new BackCalculation.Inversion("x̂ = the root of a + b·x + c·x² = y within the calibrated span",
                List.of(section.ref("a", a), section.ref("b", b), section.ref("c", c)));
    }
}
