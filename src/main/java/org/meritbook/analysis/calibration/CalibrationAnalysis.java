package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.LeastSquares;
import org.meritbook.stats.LineFit;
import org.meritbook.stats.LineModel;
import org.meritbook.stats.Weighting;
import org.meritbook.study.AnalysisCell;
import org.meritbook.trail.StepInput;

/**
 * Calibration and linearity (DESIGN §4, first part): weighted or unweighted least-squares straight
 * line, with or without intercept; sensitivity (slope) and intercept with standard errors and 95 %
 * confidence intervals, r, r², s(y/x), residuals, back-calculated concentrations and their %
 * deviation from nominal. Excluded points stay in the table, marked, and out of the fit.
 */
public final class CalibrationAnalysis implements Analysis {
    /** Confidence level of every interval this section reports. */
    static final double LEVEL = 0.95;
    /** Standardized residuals beyond this are flagged, never removed (common practice, no source). */
    static final double RESIDUAL_FLAG = 3.0;

    @Override
    public SectionResult run(AnalysisCell cell, AnalysisContext context) {
        CalibrationOptions options = CalibrationOptions.of(cell, context);
        CalibrationData data = CalibrationData.read(cell, options, context);
        checkSupportsFit(cell, options, data, context);
        SectionBuilder section = new SectionBuilder(cell);
        Weighting weighting = chooseWeighting(options, data, section);
        LineFit fit = LeastSquares.fitLine(data.usedX(), data.usedY(), weighting, options.model());
        section.setting("Model", options.model() == LineModel.THROUGH_ORIGIN
                ? "straight line through the origin, y = b·x" : "straight line, y = a + b·x");
        section.setting("Weighting", weighting.notation() + (options.weighting().isAuto() ? " (chosen by auto)" : ""));
        section.setting("Confidence level", "95 %");
        new CalibrationTrail(section, data, fit).record();
        flagResiduals(section, data, fit);
        CalibrationFigures.addTo(section, cell.id(), data, fit);
        return section.build(CalibrationTable.of(data, fit));
    }

    private static void checkSupportsFit(AnalysisCell cell, CalibrationOptions options, CalibrationData data,
                                         AnalysisContext context) {
        int used = data.used().size();
        int excluded = data.points().size() - used;
        String block = data.block().sheet() + "!" + data.block().range();
        if (used < 3) {
            throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("data")),
                    "at least 3 calibration points in the fit",
                    used + " usable point" + (used == 1 ? "" : "s") + " in " + block
                            + (excluded > 0 ? " (" + excluded + " excluded)" : ""),
                    "Add calibration standards to the range, or reconsider the exclusions.");
        }
        double[] x = data.usedX();
        boolean constant = true;
        for (double v : x) {
            constant &= v == x[0];
        }
        if (constant) {
            throw new InputException(ErrorKey.ZERO_VARIANCE, context.where(cell.lineOf("x")),
                    "at least two different concentrations in column '" + data.xColumn().header() + "'",
                    "every point at " + x[0], "Include standards at several concentration levels.");
        }
        Weighting fixed = options.weighting().fixed();
        if (fixed != null) {
            int bad = fixed.firstNonPositiveBasis(x, data.usedY());
            if (bad >= 0) {
                CalibrationPoint p = data.used().get(bad);
                boolean onX = "x".equals(fixed.basis());
                var cellValue = onX ? p.xCell() : p.yCell();
                throw new InputException(ErrorKey.NON_POSITIVE_WEIGHT_BASIS,
                        data.block().file().getFileName() + ", " + cellValue.ref().address(),
                        "a positive " + (onX ? "concentration" : "response") + " under weighting "
                                + fixed.notation() + " (" + context.where(cell.lineOf("weighting")) + ")",
                        "'" + cellValue.raw() + "'",
                        "Use weighting: none, or exclude this point with a reason.");
            }
        }
    }

    /**
     * A fixed weighting is taken as written. {@code auto} fits each weighting whose basis is
     * positive everywhere and keeps the smallest Σ|% deviation| of the back-calculated standards;
     * the comparison is a trail step.
     */
    private static Weighting chooseWeighting(CalibrationOptions options, CalibrationData data,
                                             SectionBuilder section) {
        if (!options.weighting().isAuto()) {
            return options.weighting().fixed();
        }
        double[] x = data.usedX();
        double[] y = data.usedY();
        Map<Weighting, Double> sums = new LinkedHashMap<>();
        for (Weighting w : Weighting.values()) {
            if (w.firstNonPositiveBasis(x, y) >= 0) {
                section.warning("Weighting " + w.notation() + " was not tried by auto: a "
                        + ("x".equals(w.basis()) ? "concentration" : "response") + " is zero or negative.");
                continue;
            }
            LineFit fit = LeastSquares.fitLine(x, y, w, options.model());
            double sum = 0;
            for (int i = 0; i < x.length; i++) {
                sum += Math.abs((fit.inverse(y[i]) - x[i]) / x[i] * 100.0);
            }
            sums.put(w, sum);
        }
        Weighting best = sums.entrySet().stream().min(Map.Entry.comparingByValue()).orElseThrow().getKey();
        List<StepInput> inputs = new ArrayList<>();
        sums.forEach((w, s) -> inputs.add(StepInput.number("Σ|%dev| with " + w.notation(), s, "%",
                "fit with weighting " + w.notation())));
        section.step("weighting_choice", "Weighting chosen by auto: " + best.notation(),
                "choose w minimising Σ|(x̂ᵢ − xᵢ)/xᵢ| × 100 over the standards", inputs, sums.get(best), "%", null);
        return best;
    }

    private static void flagResiduals(SectionBuilder section, CalibrationData data, LineFit fit) {
        double[] z = fit.standardizedResiduals();
        List<CalibrationPoint> used = data.used();
        for (int i = 0; i < z.length; i++) {
            if (Math.abs(z[i]) > RESIDUAL_FLAG) {
                CalibrationPoint p = used.get(i);
                section.warning(String.format(Locale.ROOT,
                        "Point %s (%s) has a standardized residual of %.2f, beyond ±%.0f: check it. It is flagged, "
                                + "not removed; exclude it in the notebook with a reason if it is a known failure.",
                        p.yCell().ref().address(), p.label(), z[i], RESIDUAL_FLAG));
            }
        }
    }
}
