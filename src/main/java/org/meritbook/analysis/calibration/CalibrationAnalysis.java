package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.Attempt;
import org.meritbook.analysis.InternalStandard;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.regression.LeastSquares;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.stats.regression.LineModel;
import org.meritbook.stats.regression.QuadraticFit;
import org.meritbook.stats.regression.RegressionAnova;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.AnalysisKind;
import org.meritbook.trail.StepInput;

/**
 * Calibration and linearity (DESIGN §4): weighted or unweighted least-squares straight line (with or
 * without intercept) or quadratic; sensitivity (slope) and intercept with standard errors and 95 %
 * confidence intervals, r, r², s(y/x), residuals, back-calculated concentrations and their %
 * deviation from nominal; lack-of-fit, Mandel's and Shapiro–Wilk tests. Excluded points stay in the
 * table, marked, and out of the fit.
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
        section.setting("Model", options.model().description(), options.model().keyword());
        section.setting("Weighting", weighting.notation() + (options.weighting().isAuto() ? " (chosen by auto)"
                : weighting == Weighting.INVERSE_VARIANCE ? " (inverse variance: s the SD of the replicate responses "
                + "of each point's concentration level)" : ""));
        section.setting("Weight scaling", PointsStep.scaling(weighting));
        section.setting("Shapiro–Wilk test on", "the standardized residuals eᵢ·√wᵢ / s(y/x) of the points in the fit");
        if (data.ratio()) {
            section.setting("Response", "ratio to the internal standard, y = A / A_IS: '" + data.yColumn().header()
                    + "' / '" + data.isColumns().get(0).header() + "' in each row" + (data.replicateColumns()
                    ? " (internal-standard columns " + String.join(", ", data.isColumns().stream().map(c -> c.letter())
                    .toList()) + " beside response columns " + String.join(", ", data.yColumns().stream()
                    .map(c -> c.letter()).toList()) + ")" : ""), InternalStandard.OPTION);
        }
        section.setting("Confidence level", "95 %");
        ResponseRatios.record(section, data);
        double[] x = data.usedX();
        double[] y = data.usedY();
        CalibrationCurve curve;
        BackCalculation.Inversion inversion;
        LinearityChecks checks = new LinearityChecks(section, data);
        String where = context.where(cell.lineOf("data"));
        String fix = "Check the responses in column '" + data.yColumn().header() + "' and the concentrations in '"
                + data.xColumn().header() + "', or exclude the point that cannot be used with a reason.";
        if (options.model() == CalibrationModel.QUADRATIC) {
            QuadraticFit fit = Attempt.required(where, "calibration data a quadratic can be fitted to", fix,
                    () -> LeastSquares.fitQuadratic(x, y, weighting));
            inversion = new QuadraticTrail(section, data, fit).record();
            curve = CalibrationCurve.of(fit, min(x), max(x));
            checks.record(fit);
            AnovaTrail.record(section, RegressionAnova.of(fit.x(), fit.y(), fit.weights(), fit.fitted(), 3, true), true,
                    data.yUnit(), section.stepId("n"));
        } else {
            LineFit fit = Attempt.required(where, "calibration data a straight line can be fitted to", fix,
                    () -> LeastSquares.fitLine(x, y, weighting, options.model().lineModel()));
            section.setting("Calibration equation", Equation.rounded(data, fit));
            inversion = new LineTrail(section, data, fit).record();
            curve = CalibrationCurve.of(fit);
            checks.record(fit);
            AnovaTrail.record(section, RegressionAnova.of(fit), fit.model() == LineModel.WITH_INTERCEPT, data.yUnit(),
                    section.stepId("n"));
            recordResiduals(section, data, fit);
            section.export(new CalibrationLine(cell.id(), fit, data.xUnit(), data.yUnit(), min(x), max(x),
                    data.ratio() ? data.isColumns().get(0).header() : null, data.lowestPlannedAboveZero()));
        }
        BackCalculation.record(section, data, curve, inversion);
        flagResiduals(section, data, curve);
        CalibrationFigures.addTo(section, cell.id(), data, curve, context.bands().deviation(AnalysisKind.CALIBRATION));
        return section.build(CalibrationTable.of(data, section::hasQuantity));
    }

    /** The fitted curve of one model and weighting, for the auto-weighting comparison. */
    private static CalibrationCurve fit(CalibrationModel model, double[] x, double[] y, Weighting w) {
        return model == CalibrationModel.QUADRATIC
                ? CalibrationCurve.of(LeastSquares.fitQuadratic(x, y, w), min(x), max(x))
                : CalibrationCurve.of(LeastSquares.fitLine(x, y, w, model.lineModel()));
    }

    static double min(double[] v) {
        return java.util.Arrays.stream(v).min().orElseThrow();
    }

    static double max(double[] v) {
        return java.util.Arrays.stream(v).max().orElseThrow();
    }

    private static void checkSupportsFit(AnalysisCell cell, CalibrationOptions options, CalibrationData data,
                                         AnalysisContext context) {
        int used = data.used().size();
        int excluded = data.points().size() - used;
        String block = data.block().sheet() + "!" + data.block().range();
        int needed = options.model().minimumPoints();
        if (used < needed) {
            throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("data")),
                    "at least " + needed + " calibration points in the fit" + (needed == 3 ? "" : " (model: "
                            + options.model().keyword() + ")"),
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
        long levels = java.util.Arrays.stream(x).distinct().count();
        if (levels < options.model().minimumLevels()) {
            throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("model")),
                    "at least " + options.model().minimumLevels() + " concentration levels for model: "
                            + options.model().keyword(),
                    levels + " levels in column '" + data.xColumn().header() + "'",
                    "Include standards at more concentration levels, or use a straight-line model.");
        }
        Weighting fixed = options.weighting().fixed();
        if (fixed == Weighting.INVERSE_VARIANCE) {
            ReplicateWeights.check(data, context.where(cell.lineOf("weighting")));
        } else if (fixed != null) {
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
            if (w == Weighting.INVERSE_VARIANCE) {
                continue; // weights estimated from a few replicates are a choice to state, not to be picked by fit
            }
            if (w.firstNonPositiveBasis(x, y) >= 0) {
                section.warning("Weighting " + w.notation() + " was not tried by auto: a "
                        + ("x".equals(w.basis()) ? "concentration" : "response") + " is zero or negative.");
                continue;
            }
            Optional<CalibrationCurve> curve = Attempt.optional(section, "weighting " + w.notation() + " in the auto "
                    + "comparison", () -> fit(options.model(), x, y, w));
            if (curve.isEmpty()) {
                continue;
            }
            double sum = 0;
            try {
                for (int i = 0; i < x.length; i++) {
                    // A blank (x = 0) has no relative deviation; the comparison is over the other standards.
                    if (x[i] != 0) {
                        sum += Math.abs((curve.get().inverse(y[i]) - x[i]) / x[i] * 100.0);
                    }
                }
            } catch (IllegalArgumentException e) {
                section.warning("Weighting " + w.notation() + " was not chosen by auto: " + e.getMessage());
                continue;
            }
            if (!Double.isFinite(sum)) {
                // A concentration near the smallest double makes a relative deviation overflow: no basis to compare on.
                section.warning("Weighting " + w.notation() + " was not chosen by auto: the sum of relative deviations "
                        + "of its back-calculated standards is not a finite number (a concentration too close to zero).");
                continue;
            }
            sums.put(w, sum);
        }
        if (sums.isEmpty()) {
            return Weighting.NONE; // the fit itself then reports, located, why no line can be fitted
        }
        Weighting best = sums.entrySet().stream().min(Map.Entry.comparingByValue()).orElseThrow().getKey();
        List<StepInput> inputs = new ArrayList<>();
        sums.forEach((w, s) -> inputs.add(StepInput.number("Σ|%dev| with " + w.notation(), s, "%",
                "fit with weighting " + w.notation())));
        section.step("weighting_choice", "Weighting chosen by auto: " + best.notation(),
                "choose w minimising Σ|(x̂ᵢ − xᵢ)/xᵢ| × 100 over the standards with xᵢ ≠ 0", inputs, sums.get(best), "%", null);
        return best;
    }

    /** Standardized and internally studentized residuals per point, for the data table. */
    private static void recordResiduals(SectionBuilder section, CalibrationData data, LineFit fit) {
        double[] z = fit.standardizedResiduals();
        double[] r = fit.studentizedResiduals();
        double[] h = fit.leverages();
        String points = section.stepId("n");
        String s = section.stepId("residual_sd");
        List<CalibrationPoint> used = data.used();
        for (int i = 0; i < used.size(); i++) {
            String label = used.get(i).label();
            String zId = section.quantity(SectionBuilder.QuantityDraft.of("standardized_residual:" + label,
                    "Standardized residual of " + label, "zᵢ = eᵢ·√wᵢ / s(y/x)",
                    List.of(LineTrail.from("x, y, w", points), section.ref("s(y/x)", s)), z[i], null).as(NumberKind.STATISTIC));
            if (Double.isFinite(r[i])) {
                section.quantity(SectionBuilder.QuantityDraft.of("studentized_residual:" + label,
                        "Studentized residual of " + label, "rᵢ = zᵢ / √(1 − hᵢᵢ), hᵢᵢ = wᵢ(1/Σw + (xᵢ − x̄w)²/Sxx)",
                        List.of(section.ref("z", zId), StepInput.number("hᵢᵢ", h[i], null, "leverage, weighted")),
                        r[i], null).as(NumberKind.STATISTIC).withMethod("internally studentized residual; Draper & Smith, ch. 8"));
            }
        }
    }

    private static void flagResiduals(SectionBuilder section, CalibrationData data, CalibrationCurve curve) {
        double[] z = curve.standardizedResiduals();
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
