package org.meritbook.figures;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.XYStyler;

/**
 * Draws a {@link FigureSpec} as an SVG document fragment (the {@code <svg>} element, without XML
 * declaration or DOCTYPE) ready to be inlined into XHTML. The same spec always gives the same
 * string: fonts come from the classpath, number formats from {@link Locale#ROOT}. Text is drawn as
 * glyph outlines (XChart's way), so the SVG depends on no installed or embedded font.
 */
public final class SvgChartRenderer {
    /** Drawing size in CSS pixels (plot and legend together); the dossier scales the SVG to the text width. */
    public static final int WIDTH = 640;
    public static final int HEIGHT = 400;
    /** Margin left and right of the legend box, and space between the plot and the legend. */
    private static final int LEGEND_MARGIN = 8;
    private static final int MARKER_SIZE = 7;
    /**
     * A categorical axis names at most this many categories; with more, a slot is a few pixels wide,
     * the names would overprint, and the axis shows the positions as numbers instead.
     */
    public static final int MAX_NAMED_CATEGORIES = 40;

    public String render(FigureSpec spec) {
        List<Legend.Entry> entries = new ArrayList<>();
        Set<String> legendNames = new HashSet<>();
        for (FigureSpec.Series s : spec.series()) {
            String name = nullToEmpty(s.name());
            if (s.x().length > 0 && legendNames.add(name) && !name.isBlank()) {
                entries.add(new Legend.Entry(name, Palette.of(s.style())));
            }
        }
        Legend legend = new Legend(entries, WIDTH - 2.0 * LEGEND_MARGIN);
        int chartHeight = legend.isEmpty() ? HEIGHT : (int) (HEIGHT - legend.height() - LEGEND_MARGIN);
        XYChart chart = new XYChart(WIDTH, chartHeight);
        chart.setXAxisTitle(nullToEmpty(spec.xTitle()));
        chart.setYAxisTitle(nullToEmpty(spec.yTitle()));
        style(chart.getStyler());
        if (!spec.xCategories().isEmpty() && spec.xCategories().size() <= MAX_NAMED_CATEGORIES) {
            categorical(chart.getStyler(), spec.xCategories());
        } else if (!spec.xCategories().isEmpty()) {
            // Too many names to print side by side: the axis shows positions 1, 2, … with ordinary ticks.
            chart.getStyler().setXAxisMin(0.5);
            chart.getStyler().setXAxisMax(spec.xCategories().size() + 0.5);
        }
        Set<String> seriesNames = new HashSet<>();
        int index = 0;
        for (FigureSpec.Series s : spec.series()) {
            index++;
            if (s.x().length == 0) {
                continue; // XChart cannot draw an empty series; an empty one carries nothing to see
            }
            String name = nullToEmpty(s.name());
            // XChart requires unique series names; repeats (upper/lower band) share one legend entry.
            XYSeries series = chart.addSeries(seriesNames.add(name) ? name : name + " #" + index, s.x(), s.y());
            Palette p = Palette.of(s.style());
            series.setXYSeriesRenderStyle(p.isScatter()
                    ? XYSeries.XYSeriesRenderStyle.Scatter : XYSeries.XYSeriesRenderStyle.Line);
            series.setMarker(p.marker());
            series.setMarkerColor(p.colour());
            series.setLineColor(p.colour());
            if (!p.isScatter()) {
                series.setLineStyle(p.stroke());
            }
        }
        if (chart.getSeriesMap().isEmpty()) {
            throw new IllegalArgumentException("figure " + spec.id() + " has no data to draw");
        }
        String prefix = "fig-" + spec.id().replaceAll("[^A-Za-z0-9_-]", "-");
        String title = nullToEmpty(spec.title()) + " — x: " + nullToEmpty(spec.xTitle()) + "; y: "
                + nullToEmpty(spec.yTitle());
        VectorGraphics2D plot = new VectorGraphics2D();
        chart.paint(plot, WIDTH, chartHeight);
        plot.setColor(Color.WHITE);
        plot.fill(new Rectangle2D.Double(0, chartHeight, WIDTH, HEIGHT - chartHeight));
        String svg = withNotes(toSvg(plot), chart, spec);
        if (!legend.isEmpty()) {
            VectorGraphics2D key = new VectorGraphics2D();
            legend.paint(key, Math.floor((WIDTH - legend.width()) / 2), chartHeight + LEGEND_MARGIN / 2.0, MARKER_SIZE);
            int close = svg.lastIndexOf("</svg>");
            svg = svg.substring(0, close) + "<g class=\"legend\">\n" + inner(toSvg(key)) + "\n</g>\n" + svg.substring(close);
        }
        return SvgTidy.tidy(svg, prefix, title);
    }

    /**
     * Each noted point gets an invisible circle carrying its note as an SVG {@code <title>}, which a
     * browser shows on hover. Neither filled nor stroked, the circles draw nothing, so the PDF's page
     * looks the same; only an interactive viewer sees them. Positions come from XChart's own axis
     * transform of the chart just painted.
     */
    private static String withNotes(String svg, XYChart chart, FigureSpec spec) {
        StringBuilder notes = new StringBuilder();
        for (FigureSpec.Series s : spec.series()) {
            double[] x = s.x();
            double[] y = s.y();
            for (int i = 0; i < s.notes().size(); i++) {
                if (!Double.isFinite(x[i]) || !Double.isFinite(y[i])) {
                    continue;
                }
                notes.append(String.format(Locale.ROOT, "<circle cx=\"%.2f\" cy=\"%.2f\" r=\"6\" fill=\"none\" stroke=\"none\" "
                        + "pointer-events=\"all\"><title>%s</title></circle>%n", chart.getScreenXFromChart(x[i]),
                        chart.getScreenYFromChart(y[i]), SvgTidy.escapeXml(s.notes().get(i))));
            }
        }
        if (notes.length() == 0) {
            return svg;
        }
        int close = svg.lastIndexOf("</svg>");
        return svg.substring(0, close) + "<g class=\"point-notes\">\n" + notes + "</g>\n" + svg.substring(close);
    }

    private static void style(XYStyler st) {
        st.setLocale(Locale.ROOT);
        st.setxAxisTickLabelsFormattingFunction(SvgChartRenderer::tick);
        st.setyAxisTickLabelsFormattingFunction(SvgChartRenderer::tick);
        st.setChartTitleVisible(false); // the dossier prints the caption under the figure
        st.setChartBackgroundColor(Color.WHITE);
        st.setPlotBackgroundColor(Color.WHITE);
        st.setPlotBorderVisible(true);
        st.setPlotBorderColor(Palette.FRAME);
        st.setPlotGridLinesColor(Palette.GRID);
        st.setChartFontColor(Palette.INK);
        st.setAxisTickLabelsColor(Palette.INK);
        st.setAxisTickMarksColor(Palette.FRAME);
        st.setLegendVisible(false); // drawn by Legend, which makes it fit
        st.setMarkerSize(MARKER_SIZE);
        st.setChartPadding(8);
        st.setPlotMargin(4);
        st.setAntiAlias(true);
        Font plain = ChartFont.of(Font.PLAIN, 11f);
        st.setBaseFont(plain);
        st.setChartTitleFont(ChartFont.of(Font.BOLD, 12f));
        st.setAxisTitleFont(ChartFont.of(Font.PLAIN, 11.5f));
        st.setAxisTickLabelsFont(ChartFont.of(Font.PLAIN, 10f));
        st.setAnnotationTextFont(plain);
        st.setToolTipsEnabled(false);
    }

    private static String toSvg(VectorGraphics2D g) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            new SVGProcessor().getDocument(g.getCommands(), new PageSize(0, 0, WIDTH, HEIGHT)).writeTo(out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String svg = out.toString(StandardCharsets.UTF_8);
        int start = svg.indexOf("<svg");
        if (start < 0) {
            throw new IllegalStateException("the SVG export produced no <svg> element");
        }
        return svg.substring(start).strip();
    }

    /** The content of an {@code <svg>} element, without the element itself. */
    private static String inner(String svg) {
        return svg.substring(svg.indexOf('>') + 1, svg.lastIndexOf("</svg>")).strip();
    }

    /** Tick labels: at most ten significant digits, no digit grouping, a true minus sign. */
    /**
     * Positions 1 … k carry their category's name, and the axis runs from 0.5 to k + 0.5 so that
     * each category sits in a slot of its own; ticks between the positions stay unlabelled.
     */
    private static void categorical(XYStyler st, List<String> categories) {
        st.setXAxisMin(0.5);
        st.setXAxisMax(categories.size() + 0.5);
        // a hint of one slot's width makes the axis step by 1: a tick, and a name, at every position
        st.setXAxisTickMarkSpacingHint(Math.max(16, (WIDTH - 120) / categories.size()));
        st.setxAxisTickLabelsFormattingFunction(v -> categoryTick(categories, v));
    }

    /**
     * The label at axis position {@code v}: its category's name at 1, 2, …, blank elsewhere. XChart
     * drops every tick when two labels are equal, so each blank is a different number of spaces.
     */
    static String categoryTick(List<String> categories, Double v) {
        double r = Math.rint(v);
        if (Math.abs(v - r) > 1e-9 || r < 1 || r > categories.size()) {
            return " ".repeat((int) Math.max(1, Math.min(64, Math.round(Math.abs(v) * 2) + 1)));
        }
        return categories.get((int) r - 1);
    }

    static String tick(Double v) {
        BigDecimal b = new BigDecimal(v).round(new MathContext(10, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        if (b.signum() == 0) {
            return "0";
        }
        String s = b.abs().toPlainString();
        return b.signum() < 0 ? "\u2212" + s : s;
    }

    private static String nullToEmpty(String s) {
        return s == null ? "" : s;
    }
}
