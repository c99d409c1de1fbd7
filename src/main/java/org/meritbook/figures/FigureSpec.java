package org.meritbook.figures;

import java.util.List;
import java.util.Objects;

/**
 * A chart described as data, computed by an analysis and drawn by {@code figures}. Axis titles
 * carry units, e.g. "Concentration (µg/L)".
 *
 * @param id     unique within the study, e.g. {@code calibration.fit}
 * @param title  caption
 * @param xTitle x-axis title with unit
 * @param yTitle y-axis title with unit
 * @param series the series, drawn in order
 * @param xCategories for a categorical x axis (groups, days, levels), the label of position 1, 2, …;
 *                    empty for a numeric axis
 */
public record FigureSpec(String id, String title, String xTitle, String yTitle, List<Series> series,
                         List<String> xCategories) {
    public FigureSpec {
        Objects.requireNonNull(id, "id");
        series = List.copyOf(series);
        xCategories = List.copyOf(xCategories);
    }

    /** A figure with a numeric x axis. */
    public FigureSpec(String id, String title, String xTitle, String yTitle, List<Series> series) {
        this(id, title, xTitle, yTitle, series, List.of());
    }

    /**
     * A point with an infinite coordinate (a relative value of a concentration near the smallest
     * double) cannot be drawn and is left out; the section's warnings say why its value is missing.
     * NaN stays: it is a gap in a line.
     *
     * @param name   legend text
     * @param style  how to draw it
     * @param x      x values
     * @param y      y values, same length
     * @param notes  what a reader hovering over each point is told (its cell, value, residual), one per
     *               point, or empty for none; the drawing is the same either way
     */
    public record Series(String name, Style style, double[] x, double[] y, List<String> notes) {
        public Series {
            if (x.length != y.length) {
                throw new IllegalArgumentException("series " + name + ": x and y differ in length");
            }
            if (!notes.isEmpty() && notes.size() != x.length) {
                throw new IllegalArgumentException("series " + name + ": " + notes.size() + " notes for " + x.length + " points");
            }
            int drawable = 0;
            for (int i = 0; i < x.length; i++) {
                drawable += Double.isInfinite(x[i]) || Double.isInfinite(y[i]) ? 0 : 1;
            }
            double[] fx = new double[drawable];
            double[] fy = new double[drawable];
            List<String> kept = new java.util.ArrayList<>();
            for (int i = 0, k = 0; i < x.length; i++) {
                if (!Double.isInfinite(x[i]) && !Double.isInfinite(y[i])) {
                    fx[k] = x[i];
                    fy[k++] = y[i];
                    if (!notes.isEmpty()) {
                        kept.add(Objects.requireNonNull(notes.get(i), "note"));
                    }
                }
            }
            x = fx;
            y = fy;
            notes = List.copyOf(kept);
        }

        /** A series without notes. */
        public Series(String name, Style style, double[] x, double[] y) {
            this(name, style, x, y, List.of());
        }

        @Override
        public double[] x() {
            return x.clone();
        }

        @Override
        public double[] y() {
            return y.clone();
        }
    }

    /** Drawing styles; the renderer maps them to markers, colours and dashes. */
    public enum Style {
        /** measured points used in the statistics */
        POINTS,
        /** points excluded with a reason: drawn hollow/grey */
        EXCLUDED_POINTS,
        /** fitted curve */
        LINE,
        /** confidence band limits */
        DASHED,
        /** prediction band or tolerance limits */
        DOTTED,
        /** a reference line such as zero or a target */
        REFERENCE
    }
}
