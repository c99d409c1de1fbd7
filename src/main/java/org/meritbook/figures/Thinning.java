package org.meritbook.figures;

import java.util.ArrayList;
import java.util.List;

/**
 * Keeps a figure drawable when a series holds more points than a page can show. A series with more
 * than {@link #MAX_POINTS} points is thinned by a stated rule: its x range is cut into
 * {@link #COLUMNS} columns of equal width (one per pixel or so of the plot), and in each column the
 * point with the lowest and the one with the highest y are kept, in their original order. The
 * outline of the cloud, every extreme point included, looks as before; the SVG stays a few hundred
 * kilobytes instead of megabytes. Points that could not be drawn anyway (an x or y that is not
 * finite) are left out of a thinned series. The statistics never see this: it is drawing only.
 */
public final class Thinning {
    /** A series up to this many points is drawn whole. */
    public static final int MAX_POINTS = 2_000;
    /** Columns of the x range in which the lowest and highest point are kept. */
    public static final int COLUMNS = SvgChartRenderer.WIDTH;

    private Thinning() {
    }

    /** The figure with each oversized series thinned; the same instance when none needs it. */
    public static FigureSpec of(FigureSpec spec) {
        boolean any = false;
        List<FigureSpec.Series> out = new ArrayList<>();
        for (FigureSpec.Series s : spec.series()) {
            FigureSpec.Series t = thin(s);
            any |= t != s;
            out.add(t);
        }
        return any ? new FigureSpec(spec.id(), spec.title(), spec.xTitle(), spec.yTitle(), out, spec.xCategories()) : spec;
    }

    /** "Results: 50,000 points, 1,280 drawn": what was thinned, for the figure's caption; empty when nothing was. */
    public static String describe(FigureSpec original, FigureSpec drawn) {
        if (original == drawn) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < original.series().size(); i++) {
            int before = original.series().get(i).x().length;
            int after = drawn.series().get(i).x().length;
            if (before != after) {
                parts.add(String.format(java.util.Locale.ROOT, "%s: %,d points, %,d drawn", original.series().get(i).name(),
                        before, after));
            }
        }
        return String.join("; ", parts);
    }

    static FigureSpec.Series thin(FigureSpec.Series s) {
        double[] x = s.x();
        double[] y = s.y();
        if (x.length <= MAX_POINTS) {
            return s;
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < x.length; i++) {
            if (Double.isFinite(x[i]) && Double.isFinite(y[i])) {
                lo = Math.min(lo, x[i]);
                hi = Math.max(hi, x[i]);
            }
        }
        int[] low = new int[COLUMNS];
        int[] high = new int[COLUMNS];
        java.util.Arrays.fill(low, -1);
        java.util.Arrays.fill(high, -1);
        double width = hi > lo ? (hi - lo) / COLUMNS : 1;
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                continue;
            }
            int c = (int) Math.min(COLUMNS - 1, Math.floor((x[i] - lo) / width));
            if (low[c] < 0 || y[i] < y[low[c]]) {
                low[c] = i;
            }
            if (high[c] < 0 || y[i] > y[high[c]]) {
                high[c] = i;
            }
        }
        boolean[] keep = new boolean[x.length];
        for (int c = 0; c < COLUMNS; c++) {
            if (low[c] >= 0) {
                keep[low[c]] = true;
                keep[high[c]] = true;
            }
        }
        int n = 0;
        for (boolean k : keep) {
            n += k ? 1 : 0;
        }
        double[] kx = new double[n];
        double[] ky = new double[n];
        List<String> notes = new ArrayList<>();
        for (int i = 0, k = 0; i < x.length; i++) {
            if (keep[i]) {
                kx[k] = x[i];
                ky[k++] = y[i];
                if (!s.notes().isEmpty()) {
                    notes.add(s.notes().get(i));
                }
            }
        }
        return new FigureSpec.Series(s.name(), s.style(), kx, ky, notes);
    }
}
