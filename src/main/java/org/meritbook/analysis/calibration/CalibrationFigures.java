package org.meritbook.analysis.calibration;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.meritbook.analysis.AcceptanceBands.DeviationBand;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.FigureSpec.Series;
import org.meritbook.figures.FigureSpec.Style;

/**
 * The calibration figures as data: fit with 95 % confidence and prediction bands, standardized
 * residuals, and back-calculated % deviation with the profile's limits. Curves are evaluated here so
 * that the figure renderer never fits anything.
 */
final class CalibrationFigures {
    /** Points along the fitted curve and bands. */
    private static final int GRID = 60;
    /**
     * The guide drawn when no rule of the study's profile limits the deviation: ±15 % is the usual
     * limit for calibration standards (ICH M10 bioanalytical method validation, §3.2.5, from memory),
     * labelled as common practice, not as this study's criterion.
     */
    static final double DEVIATION_BAND_PERCENT = 15.0;

    private CalibrationFigures() {
    }

    /** @param band the deviation limits of the profile judging the section, if it sets any */
    static void addTo(SectionBuilder section, String id, CalibrationData data, CalibrationCurve fit,
                      Optional<DeviationBand> band) {
        String xTitle = titled(data.xColumn().name(), data.xUnit());
        String yTitle = titled(data.responseName(), data.yUnit());
        section.figure(fitFigure(id, data, fit, xTitle, yTitle));
        section.figure(residualFigure(id, data, fit, xTitle));
        section.figure(deviationFigure(id, data, fit, xTitle, band));
    }

    private static FigureSpec fitFigure(String id, CalibrationData data, CalibrationCurve fit, String xTitle, String yTitle) {
        double[] grid = grid(data);
        int m = grid.length;
        double[] line = new double[m];
        double[] cLow = new double[m];
        double[] cHigh = new double[m];
        double[] pLow = new double[m];
        double[] pHigh = new double[m];
        for (int i = 0; i < m; i++) {
            line[i] = fit.predict(grid[i]);
            double c = fit.confidenceHalfWidth(grid[i], CalibrationAnalysis.LEVEL);
            double p = fit.predictionHalfWidth(grid[i], CalibrationAnalysis.LEVEL);
            cLow[i] = line[i] - c;
            cHigh[i] = line[i] + c;
            pLow[i] = line[i] - p;
            pHigh[i] = line[i] + p;
        }
        List<Series> series = new ArrayList<>();
        series.add(new Series("Standards", Style.POINTS, data.usedX(), data.usedY(), notes(data, fit)));
        addExcluded(series, data, false, fit);
        series.add(new Series("Fitted line", Style.LINE, grid, line));
        series.add(new Series("95 % confidence band", Style.DASHED, grid, cLow));
        series.add(new Series("95 % confidence band", Style.DASHED, grid, cHigh));
        series.add(new Series("95 % prediction band", Style.DOTTED, grid, pLow));
        series.add(new Series("95 % prediction band", Style.DOTTED, grid, pHigh));
        return new FigureSpec(id + ".fit", "Calibration: standards, fitted line and 95 % bands", xTitle, yTitle,
                series);
    }

    private static FigureSpec residualFigure(String id, CalibrationData data, CalibrationCurve fit, String xTitle) {
        double[] x = data.usedX();
        double[] span = {min(x), max(x)};
        List<Series> series = new ArrayList<>();
        series.add(new Series("Standardized residuals", Style.POINTS, x, fit.standardizedResiduals(), notes(data, fit)));
        series.add(new Series("Zero", Style.REFERENCE, span, new double[] {0, 0}));
        String flag = "±" + (int) CalibrationAnalysis.RESIDUAL_FLAG + " (flagged beyond)";
        series.add(new Series(flag, Style.DOTTED, span,
                new double[] {CalibrationAnalysis.RESIDUAL_FLAG, CalibrationAnalysis.RESIDUAL_FLAG}));
        series.add(new Series(flag, Style.DOTTED, span,
                new double[] {-CalibrationAnalysis.RESIDUAL_FLAG, -CalibrationAnalysis.RESIDUAL_FLAG}));
        return new FigureSpec(id + ".residuals", "Standardized residuals against concentration", xTitle,
                "Standardized residual e·√w / s(y/x)", series);
    }

    private static FigureSpec deviationFigure(String id, CalibrationData data, CalibrationCurve fit, String xTitle,
                                              Optional<DeviationBand> band) {
        List<Double> xs = new ArrayList<>();
        List<Double> ds = new ArrayList<>();
        for (CalibrationPoint p : data.used()) {
            OptionalDouble back = fit.inverseIfAny(p.y());
            if (p.x() != 0 && back.isPresent()) {
                xs.add(p.x());
                ds.add((back.getAsDouble() - p.x()) / p.x() * 100.0);
            }
        }
        double[] x = xs.stream().mapToDouble(Double::doubleValue).toArray();
        double[] span = {min(data.usedX()), max(data.usedX())};
        List<Series> series = new ArrayList<>();
        series.add(new Series("Deviation of back-calculated standards", Style.POINTS, x,
                ds.stream().mapToDouble(Double::doubleValue).toArray()));
        addExcluded(series, data, true, fit);
        series.add(new Series("Zero", Style.REFERENCE, span, new double[] {0, 0}));
        if (band.isPresent()) {
            addLimits(series, band.get(), span, x);
        } else {
            String guide = "±" + percent(DEVIATION_BAND_PERCENT)
                    + " % guide (common practice; the study's profile sets no deviation limit)";
            double g = DEVIATION_BAND_PERCENT;
            series.add(new Series(guide, Style.DOTTED, span, new double[] {g, g}));
            series.add(new Series(guide, Style.DOTTED, span, new double[] {-g, -g}));
        }
        return new FigureSpec(id + ".deviation", "Back-calculated concentration: % deviation from nominal", xTitle,
                "Deviation (%)", series);
    }

    /**
     * The profile's limits, ±tolerance over the span; when the limit at the lowest level differs it is
     * drawn from the lowest level to halfway towards the next, where the band steps to the general limit.
     *
     * @param judged the nominal concentrations whose deviation is drawn (the lowest is the rule's lowest level)
     */
    private static void addLimits(List<Series> series, DeviationBand band, double[] span, double[] judged) {
        double[] levels = Arrays.stream(judged.length == 0 ? span : judged).distinct().sorted().toArray();
        double t = band.tolerance();
        double l = band.lowestTolerance();
        String name = "Acceptance limit ±" + percent(t) + " %"
                + (l == t ? "" : ", ±" + percent(l) + " % at the lowest level") + " (profile " + band.profile() + ")";
        double[] xs;
        double[] up;
        if (l == t || levels.length < 2) {
            double only = levels.length < 2 ? l : t;
            xs = span;
            up = new double[] {only, only};
        } else {
            double step = (levels[0] + levels[1]) / 2;
            xs = new double[] {Math.min(span[0], levels[0]), step, step, span[1]};
            up = new double[] {l, l, t, t};
        }
        double[] down = Arrays.stream(up).map(v -> -v).toArray();
        series.add(new Series(name, Style.DOTTED, xs, up));
        series.add(new Series(name, Style.DOTTED, xs, down));
    }

    /** What hovering over a standard tells (in the live notebook): its cell, its values and its residual. */
    private static List<String> notes(CalibrationData data, CalibrationCurve fit) {
        List<CalibrationPoint> used = data.used();
        double[] standardized = fit.standardizedResiduals();
        List<String> notes = new ArrayList<>(used.size());
        for (int i = 0; i < used.size(); i++) {
            CalibrationPoint p = used.get(i);
            double residual = p.y() - fit.predict(p.x());
            notes.add(p.yCell().ref().address() + ": " + data.xColumn().name() + " " + shown(p.x()) + unit(data.xUnit()) + ", "
                    + data.yColumn().name() + " " + shown(p.y()) + unit(data.yUnit()) + "; residual " + shown(residual)
                    + unit(data.yUnit()) + (i < standardized.length ? " (standardized " + shown(standardized[i]) + ")" : ""));
        }
        return notes;
    }

    private static String shown(double v) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        java.math.BigDecimal b = new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros();
        return b.signum() == 0 ? "0" : b.toPlainString();
    }

    private static String unit(String unit) {
        return unit == null || unit.isBlank() ? "" : " " + unit;
    }

    private static void addExcluded(List<Series> series, CalibrationData data, boolean asDeviation, CalibrationCurve fit) {
        List<double[]> pts = new ArrayList<>();
        for (CalibrationPoint p : data.points()) {
            if (p.used() || !Double.isFinite(p.x()) || !Double.isFinite(p.y())) {
                continue;
            }
            if (!asDeviation) {
                pts.add(new double[] {p.x(), p.y()});
            } else {
                OptionalDouble back = fit.inverseIfAny(p.y());
                if (p.x() != 0 && back.isPresent()) {
                    pts.add(new double[] {p.x(), (back.getAsDouble() - p.x()) / p.x() * 100.0});
                }
            }
        }
        if (!pts.isEmpty()) {
            series.add(new Series("Excluded (see reasons)", Style.EXCLUDED_POINTS,
                    pts.stream().mapToDouble(a -> a[0]).toArray(), pts.stream().mapToDouble(a -> a[1]).toArray()));
        }
    }

    /**
     * Evenly spaced concentrations over the calibrated span only: bands are not drawn where the
     * calibration says nothing (and a 1/y weight is undefined where the line goes negative).
     */
    private static double[] grid(CalibrationData data) {
        double lo = min(data.usedX());
        double hi = max(data.usedX());
        double[] g = new double[GRID];
        for (int i = 0; i < GRID; i++) {
            g[i] = lo + (hi - lo) * i / (GRID - 1);
        }
        return g;
    }

    /** A limit as the profile states it: 10, 12.5 (no trailing zeros, no exponent). */
    private static String percent(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    private static String titled(String name, String unit) {
        return unit == null ? name : name + " (" + unit + ")";
    }

    private static double min(double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double d : v) {
            m = Math.min(m, d);
        }
        return m;
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            m = Math.max(m, d);
        }
        return m;
    }
}
