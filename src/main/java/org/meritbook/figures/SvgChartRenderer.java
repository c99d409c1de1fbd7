package org.meritbook.figures;

import java.awt.Font;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.charset.StandardCharsets;
import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.VectorGraphicsEncoder.VectorGraphicsFormat;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;

/**
 * Draws a {@link FigureSpec} as an SVG document fragment (the {@code <svg>} element, without XML
 * declaration or DOCTYPE) ready to be inlined into XHTML. The same spec always gives the same
 * string: fonts come from the classpath, number formats from {@link Locale#ROOT}. Text is drawn as
 * glyph outlines (XChart's way), so the SVG depends on no installed or embedded font.
 */
public final class SvgChartRenderer {
    /** Drawing size in CSS pixels; the dossier scales the SVG to the text width. */
    public static final int WIDTH = 640;
    public static final int HEIGHT = 380;

    public String render(FigureSpec spec) {
        XYChart chart = new XYChart(WIDTH, HEIGHT);
        chart.setXAxisTitle(nullToEmpty(spec.xTitle()));
        chart.setYAxisTitle(nullToEmpty(spec.yTitle()));
        style(chart.getStyler());
        Set<String> legendNames = new HashSet<>();
        int index = 0;
        for (FigureSpec.Series s : spec.series()) {
            index++;
            if (s.x().length == 0) {
                continue; // XChart cannot draw an empty series; an empty one carries nothing to see
            }
            String name = nullToEmpty(s.name());
            boolean firstOfName = legendNames.add(name);
            // XChart requires unique series names; repeats (upper/lower band) keep one legend entry.
            XYSeries series = chart.addSeries(firstOfName ? name : name + " #" + index, s.x(), s.y());
            series.setShowInLegend(firstOfName && !name.isBlank());
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
        return SvgTidy.tidy(toSvg(chart), prefix, title);
    }

    private static void style(XYStyler st) {
        st.setLocale(Locale.ROOT);
        st.setxAxisTickLabelsFormattingFunction(SvgChartRenderer::tick);
        st.setyAxisTickLabelsFormattingFunction(SvgChartRenderer::tick);
        st.setChartTitleVisible(false); // the dossier prints the caption under the figure
        st.setChartBackgroundColor(java.awt.Color.WHITE);
        st.setPlotBackgroundColor(java.awt.Color.WHITE);
        st.setPlotBorderVisible(true);
        st.setPlotBorderColor(Palette.FRAME);
        st.setPlotGridLinesColor(Palette.GRID);
        st.setChartFontColor(Palette.INK);
        st.setAxisTickLabelsColor(Palette.INK);
        st.setAxisTickMarksColor(Palette.FRAME);
        st.setLegendBorderColor(Palette.FRAME);
        st.setLegendPosition(Styler.LegendPosition.OutsideS);
        st.setLegendLayout(Styler.LegendLayout.Horizontal);
        st.setLegendSeriesLineLength(28);
        st.setMarkerSize(7);
        st.setChartPadding(8);
        st.setPlotMargin(4);
        st.setAntiAlias(true);
        Font plain = ChartFont.of(Font.PLAIN, 11f);
        st.setBaseFont(plain);
        st.setChartTitleFont(ChartFont.of(Font.BOLD, 12f));
        st.setAxisTitleFont(ChartFont.of(Font.PLAIN, 11.5f));
        st.setAxisTickLabelsFont(ChartFont.of(Font.PLAIN, 10f));
        st.setLegendFont(ChartFont.of(Font.PLAIN, 10f));
        st.setAnnotationTextFont(plain);
        st.setToolTipsEnabled(false);
    }

    private static String toSvg(XYChart chart) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            VectorGraphicsEncoder.saveVectorGraphic(chart, out, VectorGraphicsFormat.SVG);
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

    /** Tick labels: at most ten significant digits, no digit grouping, a true minus sign. */
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
