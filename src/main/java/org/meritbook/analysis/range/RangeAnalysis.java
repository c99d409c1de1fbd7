package org.meritbook.analysis.range;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.TableCell;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.FigureSpec.Series;
import org.meritbook.figures.FigureSpec.Style;
import org.meritbook.stats.regression.LineFit;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.OptionValue;
import org.meritbook.trail.StepInput;

/**
 * The linear range (DESIGN §4): the widest contiguous span of calibration levels over which every
 * level's mean back-calculated deviation is within {@code deviation} % of nominal and every
 * level's mean response factor y/x is within {@code tolerance} % of the span's mean response
 * factor. Levels at concentration 0 have no response factor and are not range levels. With
 * {@code limits:} the lower end is the lowest level in the span at or above the LOQ.
 */
public final class RangeAnalysis implements Analysis {
    /** ±5 % of the mean response factor: common practice, no source. */
    static final double DEFAULT_TOLERANCE = 5.0;
    /** ±15 % back-calculated deviation, as calibration acceptance commonly uses (ICH M10, from memory). */
    static final double DEFAULT_DEVIATION = 15.0;

    @Override
    public SectionResult run(AnalysisCell cell, AnalysisContext context) {
        CalibrationLine line = context.earlier(cell, "calibration", CalibrationLine.class, CalibrationLine.DESCRIPTION);
        SectionResult calibration = context.earlierSection(cell, "calibration");
        double tolerance = percent(cell, context, "tolerance", DEFAULT_TOLERANCE);
        double deviationLimit = percent(cell, context, "deviation", DEFAULT_DEVIATION);
        List<LevelCheck> levels = levels(line.fit());
        long positive = java.util.Arrays.stream(line.fit().x()).filter(v -> v > 0).distinct().count();
        if (levels.size() < 2) {
            throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("calibration")),
                    "a calibration with at least two levels above zero", levels.size() + " in '" + line.cellId() + "'",
                    "Add standards at more concentration levels to the calibration.");
        }
        SectionBuilder section = new SectionBuilder(cell);
        section.setting("Calibration", "'" + line.cellId() + "', " + levels.size() + " levels above zero");
        if (levels.size() < positive) {
            section.warning((positive - levels.size()) + " level(s) of '" + line.cellId() + "' left out of the range: "
                    + "their concentration is so close to zero that a response factor or relative deviation is not finite.");
        }
        section.setting("Response factor", "y/x per standard, averaged per level; within ±" + trimmed(tolerance)
                + " % of the span's mean" + (cell.option("tolerance").isPresent() ? "" : " (default, common practice)"));
        section.setting("Back-calculated deviation", "mean per level within ±" + trimmed(deviationLimit) + " %"
                + (cell.option("deviation").isPresent() ? "" : " (default)"));

        int[] best = widest(levels, tolerance, deviationLimit);
        if (best == null) {
            section.warning("No two adjacent levels meet both conditions: the calibration gives no linear range.");
            return section.build(table(levels, rfUnit(line), -1, -1, Double.NaN));
        }
        int lo = best[0];
        int hi = best[1];
        double meanRf = meanRf(levels, lo, hi);
        String lowReason = lo == 0 ? "the lowest calibrated level" : reason(levels.get(lo - 1), levels, lo - 1, hi,
                tolerance, deviationLimit);
        String highReason = hi == levels.size() - 1 ? "the highest calibrated level"
                : reason(levels.get(hi + 1), levels, lo, hi + 1, tolerance, deviationLimit);
        int lowIndex = lo;
        Quantity loq = null;
        if (cell.option("limits").isPresent()) {
            loq = loq(cell, context, line);
            while (lowIndex <= hi && levels.get(lowIndex).x() < loq.value()) {
                lowIndex++;
            }
            if (lowIndex > hi) {
                section.warning(String.format(Locale.ROOT, "The LOQ (%s %s) lies above the whole linear span: no range "
                        + "is reported.", plain(loq.value()), Objects.toString(loq.unit(), "")));
                return section.build(table(levels, rfUnit(line), lo, hi, meanRf));
            }
            if (lowIndex > lo) {
                lowReason = "the LOQ (" + plain(loq.value()) + " " + Objects.toString(loq.unit(), "")
                        + "): levels below it are not quantifiable";
            }
        }
        List<StepInput> inputs = new ArrayList<>();
        for (int i = lo; i <= hi; i++) {
            LevelCheck l = levels.get(i);
            inputs.add(StepInput.number("RF(" + plain(l.x()) + ")", l.responseFactor(), rfUnit(line),
                    "standards at " + plain(l.x()) + " in '" + line.cellId() + "'"));
        }
        String rfStep = section.step("mean_response_factor", "Mean response factor over the range",
                "RF̄ = mean of the levels' RF = mean(yᵢ/xᵢ)", inputs, meanRf, rfUnit(line), null);
        List<StepInput> lowIn = new ArrayList<>(List.of(section.ref("RF̄", rfStep),
                StepInput.text("decided by", lowReason, "levels of '" + line.cellId() + "'")));
        if (loq != null) {
            lowIn.add(SectionBuilder.fromEarlier("LOQ", loq));
        }
        section.quantity(QuantityDraft.of("range_low", "Lower end of the linear range",
                "lowest level of the widest span within the tolerances" + (loq != null ? ", at or above the LOQ" : ""),
                lowIn, levels.get(lowIndex).x(), line.xUnit()).inSummary());
        section.quantity(QuantityDraft.of("range_high", "Upper end of the linear range",
                "highest level of the widest span within the tolerances",
                List.of(section.ref("RF̄", rfStep), StepInput.text("decided by", highReason, "levels of '" + line.cellId() + "'")),
                levels.get(hi).x(), line.xUnit()).inSummary());
        section.figure(figure(cell.id(), levels, meanRf, tolerance, line));
        return section.build(table(levels, rfUnit(line), lowIndex, hi, meanRf));
    }

    /** The levels of the fit, ascending; a level at 0 (a calibration blank) has no response factor. */
    static List<LevelCheck> levels(LineFit fit) {
        Map<Double, List<double[]>> byX = new TreeMap<>();
        double[] x = fit.x();
        double[] y = fit.y();
        for (int i = 0; i < x.length; i++) {
            if (x[i] > 0) {
                byX.computeIfAbsent(x[i], k -> new ArrayList<>()).add(new double[] {x[i], y[i]});
            }
        }
        List<LevelCheck> levels = new ArrayList<>();
        for (var e : byX.entrySet()) {
            double dev = 0;
            double rf = 0;
            for (double[] p : e.getValue()) {
                dev += (fit.inverse(p[1]) - p[0]) / p[0] * 100.0;
                rf += p[1] / p[0];
            }
            int n = e.getValue().size();
            if (Double.isFinite(dev) && Double.isFinite(rf)) { // a level near the smallest double has no finite ratio
                levels.add(new LevelCheck(e.getKey(), n, dev / n, rf / n));
            }
        }
        return levels;
    }

    /** [lo, hi] of the widest valid span (most levels; then the widest concentration ratio), or null. */
    static int[] widest(List<LevelCheck> levels, double tolerance, double deviationLimit) {
        int[] best = null;
        for (int lo = 0; lo < levels.size(); lo++) {
            for (int hi = lo + 1; hi < levels.size(); hi++) {
                if (!valid(levels, lo, hi, tolerance, deviationLimit)) {
                    continue;
                }
                if (best == null || hi - lo > best[1] - best[0] || (hi - lo == best[1] - best[0]
                        && levels.get(hi).x() / levels.get(lo).x() > levels.get(best[1]).x() / levels.get(best[0]).x())) {
                    best = new int[] {lo, hi};
                }
            }
        }
        return best;
    }

    private static boolean valid(List<LevelCheck> levels, int lo, int hi, double tolerance, double deviationLimit) {
        double mean = meanRf(levels, lo, hi);
        for (int i = lo; i <= hi; i++) {
            LevelCheck l = levels.get(i);
            if (Math.abs(l.deviation()) > deviationLimit || Math.abs(l.responseFactor() - mean) / mean * 100 > tolerance) {
                return false;
            }
        }
        return true;
    }

    static double meanRf(List<LevelCheck> levels, int lo, int hi) {
        double sum = 0;
        for (int i = lo; i <= hi; i++) {
            sum += levels.get(i).responseFactor();
        }
        return sum / (hi - lo + 1);
    }

    /** Why the level just outside the span is not in it. */
    private static String reason(LevelCheck outside, List<LevelCheck> levels, int lo, int hi, double tolerance,
                                 double deviationLimit) {
        if (Math.abs(outside.deviation()) > deviationLimit) {
            return String.format(Locale.ROOT, "the next level (%s) deviates %s %% when back-calculated (limit ±%s %%)",
                    plain(outside.x()), plain(outside.deviation()), plain(deviationLimit));
        }
        double mean = meanRf(levels, lo, hi);
        return String.format(Locale.ROOT, "with the next level (%s) its response factor lies %s %% from the mean "
                        + "(limit ±%s %%)", plain(outside.x()), plain((outside.responseFactor() - mean) / mean * 100),
                plain(tolerance));
    }

    private static DataTable table(List<LevelCheck> levels, String rfUnit, int lo, int hi, double meanRf) {
        List<String> headers = List.of("Level", "Standards", "Mean back-calculated deviation (%)",
                "Mean response factor" + (rfUnit == null ? "" : " (" + rfUnit + ")"), "From the range's mean RF (%)",
                "In the range");
        List<DataTable.Row> rows = new ArrayList<>();
        for (int i = 0; i < levels.size(); i++) {
            LevelCheck l = levels.get(i);
            String fromMean = Double.isNaN(meanRf) ? "" : plain((l.responseFactor() - meanRf) / meanRf * 100);
            rows.add(new DataTable.Row(plain(l.x()), List.of(TableCell.raw(plain(l.x()), null),
                    TableCell.raw(Integer.toString(l.n()), null), TableCell.raw(plain(l.deviation()), null),
                    TableCell.raw(plain(l.responseFactor()), null), TableCell.raw(fromMean, null),
                    TableCell.raw(i >= lo && i <= hi && lo >= 0 ? "yes" : "no", null)), null));
        }
        return new DataTable(headers, rows);
    }

    private static FigureSpec figure(String id, List<LevelCheck> levels, double meanRf, double tolerance,
                                     CalibrationLine line) {
        double[] x = levels.stream().mapToDouble(LevelCheck::x).toArray();
        double[] rf = levels.stream().mapToDouble(LevelCheck::responseFactor).toArray();
        double[] span = {x[0], x[x.length - 1]};
        List<Series> series = new ArrayList<>();
        series.add(new Series("Mean response factor per level", Style.POINTS, x, rf));
        series.add(new Series("Range mean", Style.REFERENCE, span, new double[] {meanRf, meanRf}));
        String band = "±" + trimmed(tolerance) + " %";
        series.add(new Series(band, Style.DOTTED, span, new double[] {meanRf * (1 + tolerance / 100), meanRf * (1 + tolerance / 100)}));
        series.add(new Series(band, Style.DOTTED, span, new double[] {meanRf * (1 - tolerance / 100), meanRf * (1 - tolerance / 100)}));
        String xTitle = "Concentration" + (line.xUnit() == null ? "" : " (" + line.xUnit() + ")");
        return new FigureSpec(id + ".response-factor", "Response factor by level, with the range's tolerance band",
                xTitle, "Response factor" + (rfUnit(line) == null ? "" : " (" + rfUnit(line) + ")"), series);
    }

    private static String rfUnit(CalibrationLine line) {
        return line.yUnit() == null || line.xUnit() == null ? null : line.yUnit() + " per " + line.xUnit();
    }

    private static double percent(AnalysisCell cell, AnalysisContext context, String option, double fallback) {
        OptionValue v = cell.option(option).orElse(null);
        if (v == null) {
            return fallback;
        }
        try {
            double p = Double.parseDouble(v.text().strip().replace("%", "").strip());
            if (p > 0 && p < 100) {
                return p;
            }
        } catch (NumberFormatException e) {
            // reported below, with the text as written
        }
        throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(v.line()),
                option + ": a percentage between 0 and 100", "'" + v.text() + "'", "Write e.g. '" + option + ": 5'.");
    }

    private static Quantity loq(AnalysisCell cell, AnalysisContext context, CalibrationLine line) {
        SectionResult limits = context.earlierSection(cell, "limits");
        Quantity loq = limits.quantity("loq").orElseThrow(() -> new InputException(ErrorKey.UNKNOWN_REFERENCE,
                context.where(cell.lineOf("limits")), "a cell that reports an LOQ (a detection-limit cell)",
                "cell '" + limits.id() + "' (" + limits.kind().keyword() + ") reports none",
                "Name the detection-limit cell whose LOQ bounds the range."));
        if (!Objects.equals(loq.unit(), line.xUnit())) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(cell.lineOf("limits")),
                    "an LOQ in the calibration's unit (" + line.xUnit() + ")",
                    "'" + limits.id() + "' gives its LOQ in " + loq.unit(),
                    "Name a detection-limit cell computed through this calibration.");
        }
        return loq;
    }

    private static String trimmed(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    static String plain(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }
}
