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
 */
public record FigureSpec(String id, String title, String xTitle, String yTitle, List<Series> series) {
    public FigureSpec {
        Objects.requireNonNull(id, "id");
        series = List.copyOf(series);
    }

    /**
     * @param name   legend text
     * @param style  how to draw it
     * @param x      x values
     * @param y      y values, same length
     */
    public record Series(String name, Style style, double[] x, double[] y) {
        public Series {
            if (x.length != y.length) {
                throw new IllegalArgumentException("series " + name + ": x and y differ in length");
            }
            x = x.clone();
            y = y.clone();
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
