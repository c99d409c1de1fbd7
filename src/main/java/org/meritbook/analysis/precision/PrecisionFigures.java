package org.meritbook.analysis.precision;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.FigureSpec.Series;
import org.meritbook.figures.FigureSpec.Style;

/**
 * One figure per level: every result against its group's position (1, 2, … in order of first
 * appearance; result order without groups), the group means and the level's mean. Excluded results
 * are drawn apart.
 */
final class PrecisionFigures {
    private PrecisionFigures() {
    }

    static void addTo(SectionBuilder section, String id, PrecisionData data) {
        int levelAt = data.rows().columns().size() - 1;
        for (PrecisionData.Level level : data.levels()) {
            double[] values = level.values();
            if (values.length == 0) {
                continue;
            }
            Map<String, Integer> position = new LinkedHashMap<>();
            level.groups().keySet().forEach(g -> position.put(g, position.size() + 1));
            List<double[]> used = new ArrayList<>();
            List<String> notes = new ArrayList<>();
            List<double[]> means = new ArrayList<>();
            int i = 0;
            for (Map.Entry<String, List<MeasuredRows.Row>> g : level.groups().entrySet()) {
                double sum = 0;
                for (MeasuredRows.Row r : g.getValue()) {
                    double x = data.grouped() ? position.get(g.getKey()) : ++i;
                    used.add(new double[] {x, r.number(0)});
                    notes.add(r.cell(0).ref().address() + ": " + r.cell(0).raw() + (data.unit() == null ? "" : " "
                            + data.unit()) + (data.grouped() ? ", " + data.groupColumn().name() + " " + g.getKey() : ""));
                    sum += r.number(0);
                }
                if (data.grouped()) {
                    means.add(new double[] {position.get(g.getKey()), sum / g.getValue().size()});
                }
            }
            List<double[]> excluded = new ArrayList<>();
            for (MeasuredRows.Row r : data.rows().rows()) {
                boolean sameLevel = !data.levelled() || r.label(levelAt).equals(level.label());
                Integer at = data.grouped() ? position.get(r.label(1)) : null;
                if (!r.used() && sameLevel && Double.isFinite(r.number(0)) && (at != null || !data.grouped())) {
                    excluded.add(new double[] {at == null ? 0 : at, r.number(0)});
                }
            }
            double mean = 0;
            for (double v : values) {
                mean += v / values.length;
            }
            double[] span = data.grouped() ? new double[] {0.5, position.size() + 0.5} : new double[] {1, values.length};
            List<Series> series = new ArrayList<>();
            series.add(new Series("Results", Style.POINTS, used.stream().mapToDouble(p -> p[0]).toArray(),
                    used.stream().mapToDouble(p -> p[1]).toArray(), notes));
            if (!means.isEmpty()) {
                series.add(series(data.groupColumn().name() + " means", Style.LINE, means));
            }
            if (!excluded.isEmpty() && data.grouped()) {
                series.add(series("Excluded (see reasons)", Style.EXCLUDED_POINTS, excluded));
            }
            series.add(new Series("Mean of the level", Style.REFERENCE, span, new double[] {mean, mean}));
            String unit = data.unit();
            String yTitle = data.valueColumn().name() + (unit == null ? "" : " (" + unit + ")");
            String xTitle = data.grouped() ? data.groupColumn().name() + " (in order of appearance)" : "Result number";
            String suffix = data.levelled() ? "." + level.label() : "";
            section.figure(new FigureSpec(id + ".values" + suffix, "Results by " + (data.grouped()
                    ? data.groupColumn().name() : "order") + (data.levelled() ? ", level " + level.label() : ""),
                    xTitle, yTitle, series, data.grouped() ? List.copyOf(position.keySet()) : List.of()));
        }
    }

    private static Series series(String name, Style style, List<double[]> points) {
        return new Series(name, style, points.stream().mapToDouble(p -> p[0]).toArray(),
                points.stream().mapToDouble(p -> p[1]).toArray());
    }
}
