package org.meritbook.analysis.detection;

import java.util.List;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.stats.limits.PredictionBandLimits;
import org.meritbook.stats.limits.ZeroWeightSource;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.trail.StepInput;

/**
 * {@code prediction-band}: the critical value x_C and the minimum detectable value x_D from the
 * calibration's prediction band for one future measurement (ISO 11843-2; Hubaux &amp; Vos 1970).
 */
final class PredictionBandMethod {
    static final String NAME = "prediction-band";
    static final String PROCEDURE = "ISO 11843-2; Hubaux & Vos 1970: calibration prediction band";

    private PredictionBandMethod() {
    }

    static LimitRow record(DetectionInputs in) {
        SectionBuilder s = in.section();
        CalibrationLine line = in.calibration(NAME);
        double alpha = in.options().alpha();
        double beta = in.options().beta();
        PredictionBandLimits p = PredictionBandLimits.of(line.fit(), alpha, beta, 1);
        s.setting("α, β for prediction-band", alpha + ", " + beta + " (one future measurement)");
        StepInput a = in.fromCalibration("a", "intercept");
        StepInput b = in.fromCalibration("b", "slope");
        StepInput syx = in.fromCalibration("s(y/x)", "residual_sd");
        String tA = s.step("pb_t_alpha", "Student t(1 − α; ν = " + p.degreesOfFreedom() + ")", "t_α = t(1 − α; n − 2)",
                List.of(StepInput.number("α", alpha, null, source(in, "alpha"))), p.tAlpha(), null, PROCEDURE);
        String tB = s.step("pb_t_beta", "Student t(1 − β; ν = " + p.degreesOfFreedom() + ")", "t_β = t(1 − β; n − 2)",
                List.of(StepInput.number("β", beta, null, source(in, "beta"))), p.tBeta(), null, PROCEDURE);
        String w0 = weightNote(p);
        String yC = s.step("pb_critical_response", "Critical response: upper prediction limit at zero" + w0,
                "y_C = a + t_α·s(y/x)·√(1/w₀ + 1/Σw + x̄w²/Sxx)", List.of(a, syx, s.ref("t_α", tA),
                        StepInput.number("w₀", p.weightAtZero(), null, switch (p.zeroWeightSource()) {
                            case UNWEIGHTED -> "unweighted fit";
                            case AT_ZERO -> "weighting " + line.fit().weighting().notation() + " at x = 0";
                            case AT_LOWEST_STANDARD -> "weight of the lowest standard, " + line.xLow() + " "
                                    + (line.xUnit() == null ? "" : line.xUnit());
                        })),
                p.criticalResponse(), line.yUnit(), PROCEDURE);
        String xC = s.quantity(QuantityDraft.of("critical_value:prediction-band", "Critical value x_C",
                "x_C = (y_C − a) / b", List.of(s.ref("y_C", yC), a, b), p.criticalValue(), line.xUnit())
                .withMethod(PROCEDURE));
        String formula = line.fit().weighting() == Weighting.NONE
                ? "x_D = (t_α + t_β)·s(y/x)·h(0) / b  (ISO 11843-2's closed form, δ ≈ t_α + t_β)"
                : "x_D solves b·x_D − t_β·s(y/x)·h(x_D) = t_α·s(y/x)·h(0), h with the weight at x_D (bisection)";
        s.quantity(QuantityDraft.of("lod:prediction-band", "Minimum detectable value x_D", formula,
                List.of(s.ref("x_C", xC), s.ref("t_β", tB), syx, b,
                        StepInput.number("w(x_D)", p.weightAtMinimum(), null, "weighting "
                                + line.fit().weighting().notation())), p.minimumDetectable(), line.xUnit())
                .withMethod(PROCEDURE));
        if (p.zeroWeightSource() == ZeroWeightSource.AT_LOWEST_STANDARD) {
            s.warning("Method prediction-band: the weighting " + line.fit().weighting().notation() + " gives no finite "
                    + "weight at zero, so a blank was given the weight of the lowest standard (a larger, cautious x_C).");
        }
        in.mark("x_C, prediction band", p.criticalValue(), line.xUnit(), false);
        in.mark("x_D, prediction band", p.minimumDetectable(), line.xUnit(), false);
        return new LimitRow(NAME, line.xUnit(), "calibration " + line.cellId() + ", α = " + alpha + ", β = " + beta,
                PROCEDURE, false, true);
    }

    private static String source(DetectionInputs in, String option) {
        return in.cell().option(option).map(v -> "notebook line " + v.line()).orElse("default " + option + " = 0.05");
    }

    private static String weightNote(PredictionBandLimits p) {
        return switch (p.zeroWeightSource()) {
            case UNWEIGHTED -> "";
            case AT_ZERO -> " (weight of a blank from the weighting at zero)";
            case AT_LOWEST_STANDARD -> " (weight of a blank: that of the lowest standard)";
        };
    }
}
