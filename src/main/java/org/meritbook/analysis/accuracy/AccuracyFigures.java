package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AcceptanceBands.Band;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.FigureSpec.Series;
import org.meritbook.figures.FigureSpec.Style;

/**
 * The recovery figure: each result's recovery against its known value, the level means, 100 %, and
 * the acceptance range when the profile judging the section sets one on {@code recovery_percent}
 * (through {@link org.meritbook.analysis.AcceptanceBands}).
 */
final class AccuracyFigures {
    private AccuracyFigures() {
    }

    static void addTo(SectionBuilder section, String id, AccuracyData data, RowRecoveries recoveries, Band band) {
        List<Series> series = new ArrayList<>();
        List<double[]> used = new ArrayList<>();
        List<double[]> excluded = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        for (AccuracyRow r : data.rows()) {
            if (recoveries.has(r)) {
                (r.used() ? used : excluded).add(new double[] {r.knownValue(), recoveries.of(r).value()});
                if (r.used()) {
                    // what hovering over the point tells (in the live notebook): its cells and its recovery
                    notes.add(r.measured().ref().address() + ": measured " + r.measured().raw() + ", known "
                            + r.known().raw() + " (" + r.known().ref().address() + "); recovery "
                            + new java.math.BigDecimal(recoveries.of(r).value()).round(new java.math.MathContext(4))
                                    .stripTrailingZeros().toPlainString() + " %");
                }
            }
        }
        series.add(new Series("Results", Style.POINTS, xs(used), ys(used), notes));
        if (!excluded.isEmpty()) {
            series.add(new Series("Excluded (see reasons)", Style.EXCLUDED_POINTS, xs(excluded), ys(excluded)));
        }
        List<double[]> means = new ArrayList<>();
        for (String level : data.levels()) {
            List<RowRecoveries.Recovery> group = recoveries.used(data.usedAt(level));
            double k = group.stream().mapToDouble(g -> g.row().knownValue()).average().orElseThrow();
            double m = group.stream().mapToDouble(RowRecoveries.Recovery::value).average().orElseThrow();
            means.add(new double[] {k, m});
        }
        means.sort((a, b) -> Double.compare(a[0], b[0]));
        series.add(new Series("Level mean", Style.LINE, xs(means), ys(means)));
        double[] span = span(data, recoveries);
        series.add(new Series("100 %", Style.REFERENCE, span, new double[] {AccuracyAnalysis.TARGET,
            AccuracyAnalysis.TARGET}));
        String accepted = "Acceptance range (profile " + band.profile() + ")";
        if (!Double.isNaN(band.low())) {
            series.add(new Series(accepted, Style.DOTTED, span, new double[] {band.low(), band.low()}));
        }
        if (!Double.isNaN(band.high())) {
            series.add(new Series(accepted, Style.DOTTED, span, new double[] {band.high(), band.high()}));
        }
        String known = data.known().name() + (data.known().unit() == null ? "" : " (" + data.known().unit() + ")");
        section.figure(new FigureSpec(id + ".recovery", "Recovery by level", known, "Recovery (%)", series));
    }

    private static double[] span(AccuracyData data, RowRecoveries recoveries) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (AccuracyRow r : data.rows()) {
            if (recoveries.has(r)) {
                lo = Math.min(lo, r.knownValue());
                hi = Math.max(hi, r.knownValue());
            }
        }
        return new double[] {lo, hi};
    }

    private static double[] xs(List<double[]> points) {
        return points.stream().mapToDouble(p -> p[0]).toArray();
    }

    private static double[] ys(List<double[]> points) {
        return points.stream().mapToDouble(p -> p[1]).toArray();
    }
}
