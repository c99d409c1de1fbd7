package org.meritbook.figures;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.font.FontRenderContext;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * The figure legend, drawn below the plot by meritbook rather than by XChart so that it always fits:
 * entries flow into as many centred rows as the chart width needs, a name too long for one row wraps
 * at its spaces (or, for a single overlong word, between characters), and each symbol keeps a gap
 * before its text. Text is drawn as glyph outlines in the bundled font, like XChart's own text.
 */
final class Legend {
    static final float FONT_SIZE = 10.5f;
    /** Length of the line sample, in px. */
    static final double SYMBOL = 26;
    /** Space between a symbol and its text. */
    static final double GAP = 6;
    /** Space between two entries in a row. */
    static final double ENTRY_GAP = 20;
    static final double PAD = 7;
    static final double ROW_GAP = 3;
    private static final FontRenderContext FRC = new FontRenderContext(null, true, true);
    private static final Color BACKGROUND = new Color(0xF7, 0xF8, 0xF9);

    /** One legend entry: its style and its name. */
    record Entry(String name, Palette style) {
    }

    /** Where one entry goes, relative to the legend's top-left corner. */
    record Placed(Entry entry, Rectangle2D symbol, Rectangle2D text, List<String> lines) {
    }

    private final Font font = ChartFont.of(Font.PLAIN, FONT_SIZE);
    private final double lineHeight;
    private final double ascent;
    private final List<Placed> placed;
    private final double width;
    private final double height;

    /**
     * @param entries  the entries in order
     * @param maxWidth the width the legend box may take, in px
     */
    Legend(List<Entry> entries, double maxWidth) {
        var metrics = font.getLineMetrics("Xg", FRC);
        this.ascent = Math.ceil(metrics.getAscent());
        this.lineHeight = Math.ceil(metrics.getAscent() + metrics.getDescent() + 1);
        double inner = maxWidth - 2 * PAD;
        double textMax = inner - SYMBOL - GAP;
        List<List<Placed>> rows = new ArrayList<>();
        List<Placed> row = new ArrayList<>();
        double x = 0;
        for (Entry e : entries) {
            List<String> lines = wrap(e.name(), textMax);
            double textWidth = lines.stream().mapToDouble(this::textWidth).max().orElse(0);
            double w = SYMBOL + GAP + textWidth;
            if (!row.isEmpty() && x + ENTRY_GAP + w > inner) {
                rows.add(row);
                row = new ArrayList<>();
                x = 0;
            }
            double start = row.isEmpty() ? 0 : x + ENTRY_GAP;
            double h = lines.size() * lineHeight;
            row.add(new Placed(e, new Rectangle2D.Double(start, 0, SYMBOL, lineHeight),
                    new Rectangle2D.Double(start + SYMBOL + GAP, 0, textWidth, h), lines));
            x = start + w;
        }
        if (!row.isEmpty()) {
            rows.add(row);
        }
        double widest = 0;
        for (List<Placed> r : rows) {
            widest = Math.max(widest, rowWidth(r));
        }
        this.width = Math.ceil(widest + 2 * PAD);
        List<Placed> all = new ArrayList<>();
        double y = PAD;
        for (List<Placed> r : rows) {
            double shift = PAD + (widest - rowWidth(r)) / 2; // each row centred in the box
            double rowHeight = 0;
            for (Placed p : r) {
                all.add(new Placed(p.entry(), moved(p.symbol(), shift, y), moved(p.text(), shift, y), p.lines()));
                rowHeight = Math.max(rowHeight, p.text().getHeight());
            }
            y += rowHeight + ROW_GAP;
        }
        this.placed = List.copyOf(all);
        this.height = rows.isEmpty() ? 0 : Math.ceil(y - ROW_GAP + PAD);
    }

    private static double rowWidth(List<Placed> r) {
        Placed last = r.get(r.size() - 1);
        return last.text().getMaxX() - r.get(0).symbol().getMinX();
    }

    private static Rectangle2D moved(Rectangle2D r, double dx, double dy) {
        return new Rectangle2D.Double(r.getX() + dx, r.getY() + dy, r.getWidth(), r.getHeight());
    }

    double width() {
        return width;
    }

    double height() {
        return height;
    }

    List<Placed> placed() {
        return placed;
    }

    boolean isEmpty() {
        return placed.isEmpty();
    }

    double textWidth(String s) {
        return font.getStringBounds(s, FRC).getWidth();
    }

    /** Splits a name into lines no wider than {@code max}: at spaces, and inside a word only when it alone is wider. */
    List<String> wrap(String name, double max) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : name.strip().split(" +")) {
            String candidate = line.isEmpty() ? word : line + " " + word;
            if (textWidth(candidate) <= max) {
                line.setLength(0);
                line.append(candidate);
                continue;
            }
            if (!line.isEmpty()) {
                lines.add(line.toString());
                line.setLength(0);
            }
            String rest = word;
            while (textWidth(rest) > max && rest.length() > 1) {
                int k = rest.length() - 1;
                while (k > 1 && textWidth(rest.substring(0, k)) > max) {
                    k--;
                }
                lines.add(rest.substring(0, k));
                rest = rest.substring(k);
            }
            line.append(rest);
        }
        if (!line.isEmpty() || lines.isEmpty()) {
            lines.add(line.toString());
        }
        return lines;
    }

    /** Draws the legend with its top-left corner at ({@code left}, {@code top}). */
    void paint(Graphics2D g, double left, double top, int markerSize) {
        if (placed.isEmpty()) {
            return;
        }
        Rectangle2D box = new Rectangle2D.Double(left + 0.5, top + 0.5, width - 1, height - 1);
        g.setColor(BACKGROUND);
        g.fill(box);
        g.setColor(Palette.FRAME);
        g.setStroke(new BasicStroke(0.8f));
        g.draw(box);
        for (Placed p : placed) {
            Palette style = p.entry().style();
            double cy = top + p.symbol().getCenterY();
            double sx = left + p.symbol().getX();
            g.setColor(style.colour());
            if (style.isScatter()) {
                g.setStroke(new BasicStroke(1.2f));
                style.marker().paint(g, sx + SYMBOL / 2, cy, markerSize);
            } else {
                g.setStroke(style.stroke());
                g.draw(new Line2D.Double(sx + 1, cy, sx + SYMBOL - 1, cy));
            }
            g.setColor(Palette.INK);
            double baseline = top + p.text().getY() + ascent;
            for (String line : p.lines()) {
                Shape glyphs = font.createGlyphVector(FRC, line).getOutline((float) (left + p.text().getX()),
                        (float) baseline);
                g.fill(glyphs);
                baseline += lineHeight;
            }
        }
    }
}
