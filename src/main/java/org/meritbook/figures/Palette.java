package org.meritbook.figures;

import java.awt.BasicStroke;
import java.awt.Color;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * meritbook's own chart palette: muted, distinguishable for the common colour-vision deficiencies
 * (blue against orange, never red against green), and every style also differs in marker shape or
 * dash pattern so that a greyscale print keeps the meaning.
 */
enum Palette {
    POINTS(new Color(0x1F, 0x5A, 0x85), SeriesMarkers.CIRCLE, null),
    EXCLUDED_POINTS(new Color(0xB8, 0x5C, 0x1E), SeriesMarkers.CROSS, null),
    LINE(new Color(0x24, 0x32, 0x40), SeriesMarkers.NONE, new BasicStroke(1.6f)),
    DASHED(new Color(0x2E, 0x86, 0x82), SeriesMarkers.NONE,
            new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f)),
    DOTTED(new Color(0x6E, 0x5C, 0x94), SeriesMarkers.NONE,
            new BasicStroke(1.2f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {1f, 3f}, 0f)),
    REFERENCE(new Color(0x8C, 0x92, 0x98), SeriesMarkers.NONE, new BasicStroke(0.9f));

    static final Color INK = new Color(0x2B, 0x2F, 0x33);
    static final Color GRID = new Color(0xE3, 0xE6, 0xE9);
    static final Color FRAME = new Color(0xA9, 0xB0, 0xB6);

    private final Color colour;
    private final Marker marker;
    private final BasicStroke stroke;

    Palette(Color colour, Marker marker, BasicStroke stroke) {
        this.colour = colour;
        this.marker = marker;
        this.stroke = stroke;
    }

    static Palette of(FigureSpec.Style style) {
        return valueOf(style.name());
    }

    Color colour() {
        return colour;
    }

    Marker marker() {
        return marker;
    }

    /** The line stroke, or null for a style drawn as markers only. */
    BasicStroke stroke() {
        return stroke;
    }

    boolean isScatter() {
        return stroke == null;
    }
}
