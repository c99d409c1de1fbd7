package org.meritbook.analysis.detection;

import java.util.List;
import java.util.Locale;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.limits.ResponseSdLimit;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.trail.StepInput;

/**
 * {@code response-sd}: ICH Q2's 3.3·σ/S and 10·σ/S, σ from the blank SD, s(y/x) or SE(a)
 * ({@code sigma:}, default {@code residual}). With a weighted calibration s(y/x) and SE(a) are on the
 * scale of the weights, which the section states.
 */
final class ResponseSdMethod {
    static final String NAME = "response-sd";
    static final String PROCEDURE = "ICH Q2(R2): SD of the response and the slope, 3.3·σ/S and 10·σ/S";

    private ResponseSdMethod() {
    }

    static LimitRow record(DetectionInputs in) {
        SectionBuilder s = in.section();
        CalibrationLine line = in.calibration(NAME);
        LineFit fit = line.fit();
        String sigma = in.options().sigma().orElse("residual");
        StepInput slope = in.fromCalibration("S", "slope");
        ResponseSdLimit limit;
        StepInput sigmaInput;
        String basis;
        switch (sigma) {
            case "blank" -> {
                if (in.blanks().isPresent() && in.blanksAreConcentrations()) {
                    throw new InputException(ErrorKey.BAD_OPTION_VALUE, in.context().where(in.cell().lineOf("sigma")),
                            "blank signals (units: signal) for 'sigma: blank'", "blanks in concentration units",
                            "Give blank signals, or choose sigma: residual or intercept.");
                }
                limit = ResponseSdLimit.fromBlankSd(in.blankSummary(NAME), fit.slope());
                sigmaInput = s.ref("σ = s_b", s.stepId("blank_sd"));
                basis = "σ = SD of " + in.blanks().orElseThrow().values().length + " blank signals";
            }
            case "intercept" -> {
                limit = ResponseSdLimit.fromInterceptSe(fit);
                sigmaInput = in.fromCalibration("σ = SE(a)", "intercept_se");
                basis = "σ = SE of the intercept of " + line.cellId();
            }
            default -> {
                limit = ResponseSdLimit.fromResidualSd(fit);
                sigmaInput = in.fromCalibration("σ = s(y/x)", "residual_sd");
                basis = "σ = s(y/x) of " + line.cellId();
            }
        }
        s.setting("σ for response-sd", scaleNote(sigma, fit, line), sigma);
        if (!"blank".equals(sigma) && fit.weighting() != Weighting.NONE) {
            s.warning(weightedWarning(sigma, fit, line));
        }
        s.quantity(QuantityDraft.of("lod:response-sd", "LOD from the SD of the response and the slope",
                "LOD = 3.3·σ / S", List.of(sigmaInput, slope), limit.lod(), line.xUnit()).withMethod(PROCEDURE));
        s.quantity(QuantityDraft.of("loq:response-sd", "LOQ from the SD of the response and the slope",
                "LOQ = 10·σ / S", List.of(sigmaInput, slope), limit.loq(), line.xUnit()).withMethod(PROCEDURE));
        in.mark("LOD, response-sd", limit.lod(), line.xUnit(), false);
        return new LimitRow(NAME, line.xUnit(), basis, PROCEDURE, true, false);
    }

    /** Which σ, and on what scale, in one line. */
    private static String scaleNote(String sigma, LineFit fit, CalibrationLine line) {
        if ("blank".equals(sigma)) {
            return "SD of the blank signals (response scale, unweighted)";
        }
        String what = "residual".equals(sigma) ? "s(y/x)" : "SE of the intercept";
        if (fit.weighting() == Weighting.NONE) {
            return what + " of the unweighted calibration " + line.cellId() + " (response scale)";
        }
        return what + " of the " + fit.weighting().notation() + "-weighted calibration " + line.cellId()
                + ", weights normalised to average 1: the scale of a response of weight 1" + weightOneAt(fit, line);
    }

    /** Where a weight of 1 falls, for weightings on x (for 1/x^p: x = (mean x⁻ᵖ)^(−1/p)). */
    private static String weightOneAt(LineFit fit, CalibrationLine line) {
        if (!"x".equals(fit.weighting().basis())) {
            return "";
        }
        int p = fit.weighting().power();
        double mean = 0;
        for (double x : fit.x()) {
            mean += Math.pow(x, -p);
        }
        mean /= fit.n();
        return String.format(Locale.ROOT, " (x = %.4g %s)", Math.pow(mean, -1.0 / p), unit(line));
    }

    private static String weightedWarning(String sigma, LineFit fit, CalibrationLine line) {
        String what = "residual".equals(sigma) ? "s(y/x)" : "SE(a)";
        double value = "residual".equals(sigma) ? fit.residualSd() : fit.interceptSe();
        String low = "";
        try {
            double atLowest = fit.residualSd() / Math.sqrt(fit.weightAt(line.xLow()));
            low = String.format(Locale.ROOT, " The weighted model gives a response SD of s(y/x)/√w = %.4g at the lowest "
                    + "standard (%.4g %s), and one that shrinks towards zero below it.", atLowest, line.xLow(), unit(line));
        } catch (IllegalArgumentException e) {
            low = " The weighting gives no weight at the lowest standard.";
        }
        return String.format(Locale.ROOT, "Method response-sd: σ = %s = %.4g comes from a %s-weighted calibration; it "
                + "depends on how the weights are scaled (here to average 1) and is not the SD of a low-level "
                + "response.%s Measure blanks or low-level samples (sigma: blank) for a σ that is.", what, value,
                fit.weighting().notation(), low);
    }

    private static String unit(CalibrationLine line) {
        return line.xUnit() == null ? "" : line.xUnit();
    }
}
