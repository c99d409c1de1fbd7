package org.meritbook.analysis.detection;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.meritbook.analysis.calibration.CalibrationLine;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.FigureSpec.Series;
import org.meritbook.figures.FigureSpec.Style;
import org.meritbook.stats.regression.LineFit;

/**
 * The section's figures: the blank values with the decision levels and limits drawn on their scale,
 * and the limits in concentration against the low end of the calibration.
 */
final class DetectionFigures {
    /** How far past the largest limit the low-end view of the calibration reaches. */
    private static final double LOW_END_SPAN = 2.0;

    private DetectionFigures() {
    }

    static void addTo(DetectionInputs in) {
        in.blanks().ifPresent(b -> blankFigure(in, b));
        in.calibrationIfAny().ifPresent(line -> lowEndFigure(in, line));
    }

    private static void blankFigure(DetectionInputs in, MeasuredSet blanks) {
        List<DetectionInputs.Mark> marks = in.marks().stream().filter(DetectionInputs.Mark::blankScale)
                .filter(m -> Objects.equals(m.unit(), blanks.unit())).toList();
        double[] v = blanks.values();
        if (v.length == 0) {
            return;
        }
        double[] order = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            order[i] = i + 1;
        }
        double[] span = {0.5, v.length + 0.5};
        List<Series> series = new ArrayList<>();
        series.add(new Series("Blanks", Style.POINTS, order, v));
        series.add(new Series("Zero", Style.REFERENCE, span, new double[] {0, 0}));
        for (DetectionInputs.Mark m : marks) {
            series.add(new Series(m.label(), m.label().startsWith("LoD") || m.label().startsWith("MDL")
                    ? Style.DASHED : Style.DOTTED, span, new double[] {m.value(), m.value()}));
        }
        in.section().figure(new FigureSpec(in.cell().id() + ".blanks",
                "Blank results in order, with the decision levels and limits on their scale", "Blank (in order)",
                axis(blanks.columnName(), blanks.unit()), series));
    }

    private static void lowEndFigure(DetectionInputs in, CalibrationLine line) {
        List<DetectionInputs.Mark> marks = in.marks().stream().filter(m -> !m.blankScale())
                .filter(m -> Objects.equals(m.unit(), line.xUnit())).toList();
        if (marks.isEmpty()) {
            return;
        }
        LineFit fit = line.fit();
        double top = marks.stream().mapToDouble(DetectionInputs.Mark::value).max().orElseThrow() * LOW_END_SPAN;
        double lowest = line.xLow();
        top = Math.max(top, lowest * 1.2);
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        double[] x = fit.x();
        double[] y = fit.y();
        for (int i = 0; i < x.length; i++) {
            if (x[i] <= top) {
                xs.add(x[i]);
                ys.add(y[i]);
            }
        }
        double yTop = fit.predict(top);
        double yBottom = Math.min(0, fit.intercept());
        for (double v : ys) {
            yTop = Math.max(yTop, v);
        }
        List<Series> series = new ArrayList<>();
        series.add(new Series("Standards", Style.POINTS, xs.stream().mapToDouble(Double::doubleValue).toArray(),
                ys.stream().mapToDouble(Double::doubleValue).toArray()));
        series.add(new Series("Calibration line", Style.LINE, new double[] {0, top},
                new double[] {fit.predict(0), fit.predict(top)}));
        for (DetectionInputs.Mark m : marks) {
            series.add(new Series(m.label(), m.label().startsWith("x_C") ? Style.DOTTED : Style.DASHED,
                    new double[] {m.value(), m.value()}, new double[] {yBottom, yTop}));
        }
        in.section().figure(new FigureSpec(in.cell().id() + ".low-end",
                "Limits against the low end of calibration " + line.cellId(), axis("Concentration", line.xUnit()),
                axis("Response", line.yUnit()), series));
    }

    private static String axis(String name, String unit) {
        return unit == null ? name : name + " (" + unit + ")";
    }
}
