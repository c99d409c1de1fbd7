package org.meritbook.figures;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.dossier.DossierFixtures;
import org.w3c.dom.Document;
import org.xml.sax.InputSource;

class SvgChartRendererTest {
    private final SvgChartRenderer renderer = new SvgChartRenderer();

    private static FigureSpec fit(Path dir, DossierFixtures.Text text) {
        return DossierFixtures.results(dir, text).sections().get(0).figures().get(0);
    }

    @Test
    void drawsAWellFormedVectorSvgWithTheAxisTitlesAndEmbeddableFont(@TempDir Path dir) throws Exception {
        String svg = renderer.render(fit(dir, DossierFixtures.PLAIN));
        assertTrue(svg.startsWith("<svg"), svg.substring(0, Math.min(80, svg.length())));
        Document doc = parse(svg);
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        String title = doc.getElementsByTagName("title").item(0).getTextContent();
        assertTrue(title.contains("Nominal concentration (mg/L)"), "x-axis title with unit: " + title);
        assertTrue(title.contains("Peak area (µS·min)"), "y-axis title with unit: " + title);
        assertFalse(svg.contains("<image"), "no raster image inside the figure");
        assertFalse(svg.contains("<text"), "text is outlined: no font can fall back to a standard PDF font");
        assertTrue(svg.contains("id=\"fig-calibration-fit-clip1\""), "ids are per figure and numbered");
        assertFalse(svg.matches("(?s).*\\d\\.\\d{3,}.*"), "coordinates rounded to 1/100 px");
    }

    @Test
    void theSameSpecGivesTheSameBytesWhateverTheDefaultLocale(@TempDir Path dir) {
        FigureSpec spec = fit(dir, DossierFixtures.PLAIN);
        String first = renderer.render(spec);
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.GERMANY);
            assertEquals(first, new SvgChartRenderer().render(spec));
        } finally {
            Locale.setDefault(saved);
        }
    }

    /**
     * Studies of a batch draw their figures at the same time. The SVG export formats coordinates
     * through one DecimalFormat that the library shares between all threads (safe only because the
     * JDK locks its digit list); concurrent figures must come out exactly as when drawn alone.
     */
    @Test
    void figuresDrawnOnTwoThreadsAtOnceAreTheBytesDrawnAlone(@TempDir Path dir) throws Exception {
        FigureSpec spec = fit(dir, DossierFixtures.PLAIN);
        String alone = renderer.render(spec);
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(2);
        try {
            List<java.util.concurrent.Future<String>> drawn = new java.util.ArrayList<>();
            for (int i = 0; i < 40; i++) {
                drawn.add(pool.submit(() -> new SvgChartRenderer().render(spec)));
            }
            for (java.util.concurrent.Future<String> f : drawn) {
                assertEquals(alone, f.get());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void hostileSeriesAndAxisTextStaysText(@TempDir Path dir) throws Exception {
        String svg = renderer.render(fit(dir, DossierFixtures.HOSTILE));
        Document doc = parse(svg);
        assertEquals(0, doc.getElementsByTagName("script").getLength(), "no script element smuggled in");
        assertTrue(doc.getDocumentElement().getTextContent().contains("<script>x()</script>"),
                "the markup is kept as literal text");
    }

    @Test
    void aFigureWithoutDataIsRefused() {
        FigureSpec empty = new FigureSpec("empty", "Empty", "x (1)", "y (1)",
                List.of(new FigureSpec.Series("none", FigureSpec.Style.POINTS, new double[0], new double[0])));
        assertThrows(IllegalArgumentException.class, () -> renderer.render(empty));
    }

    @Test
    void notedPointsCarryTheirNoteAsAnInvisibleTitledCircleAndTheDrawingIsUnchanged() throws Exception {
        double[] x = {0, 1, 2};
        double[] y = {0.1, 1.9, 4.2};
        FigureSpec plain = new FigureSpec("noted", "Noted", "x (1)", "y (1)",
                List.of(new FigureSpec.Series("Standards", FigureSpec.Style.POINTS, x, y)));
        FigureSpec noted = new FigureSpec("noted", "Noted", "x (1)", "y (1)", List.of(new FigureSpec.Series("Standards",
                FigureSpec.Style.POINTS, x, y, List.of("Cal!B2: <low>", "Cal!B3: mid", "Cal!B4: high"))));
        String without = renderer.render(plain);
        String with = renderer.render(noted);
        Document doc = parse(with);
        org.w3c.dom.NodeList circles = doc.getElementsByTagName("circle");
        assertEquals(3, circles.getLength());
        for (int i = 0; i < 3; i++) {
            org.w3c.dom.Element c = (org.w3c.dom.Element) circles.item(i);
            assertEquals("none", c.getAttribute("fill"));
            assertEquals("none", c.getAttribute("stroke"));
        }
        assertEquals("Cal!B2: <low>", circles.item(0).getTextContent(), "the note is text, escaped");
        // The points rise left to right, so the circles do too (screen y grows downwards).
        double x0 = Double.parseDouble(((org.w3c.dom.Element) circles.item(0)).getAttribute("cx"));
        double x2 = Double.parseDouble(((org.w3c.dom.Element) circles.item(2)).getAttribute("cx"));
        double y0 = Double.parseDouble(((org.w3c.dom.Element) circles.item(0)).getAttribute("cy"));
        double y2 = Double.parseDouble(((org.w3c.dom.Element) circles.item(2)).getAttribute("cy"));
        assertTrue(x2 > x0 && y2 < y0, "positions follow the data: " + x0 + "," + y0 + " " + x2 + "," + y2);
        String stripped = with.replaceAll("(?s)<g class=\"point-notes\">.*?</g>\n", "");
        assertEquals(without, stripped, "apart from the notes, the same drawing");
        assertThrows(IllegalArgumentException.class, () -> new FigureSpec.Series("s", FigureSpec.Style.POINTS, x, y,
                List.of("one note for three points")));
    }

    /** Invented series names, long enough that one legend row cannot hold them all. */
    private static FigureSpec crowded() {
        double[] x = {0, 1, 2, 3};
        List<FigureSpec.Series> series = new java.util.ArrayList<>();
        series.add(new FigureSpec.Series("Standards used in the fit", FigureSpec.Style.POINTS, x, new double[] {0, 1, 2, 3}));
        series.add(new FigureSpec.Series("Excluded standards (see the reasons listed below the data table)",
                FigureSpec.Style.EXCLUDED_POINTS, new double[] {1.5}, new double[] {1}));
        series.add(new FigureSpec.Series("Fitted straight line", FigureSpec.Style.LINE, x, new double[] {0, 1, 2, 3}));
        series.add(new FigureSpec.Series("95 % confidence band of the fitted line", FigureSpec.Style.DASHED, x,
                new double[] {-0.2, 0.9, 1.9, 2.8}));
        series.add(new FigureSpec.Series("95 % confidence band of the fitted line", FigureSpec.Style.DASHED, x,
                new double[] {0.2, 1.1, 2.1, 3.2}));
        series.add(new FigureSpec.Series("95 % prediction band for a single new measurement", FigureSpec.Style.DOTTED, x,
                new double[] {-0.5, 0.5, 1.5, 2.5}));
        series.add(new FigureSpec.Series("Reference", FigureSpec.Style.REFERENCE, x, new double[] {0, 0, 0, 0}));
        series.add(new FigureSpec.Series("An_absurdly_long_series_name_without_any_space_that_must_still_fit_the_chart_width".repeat(2),
                FigureSpec.Style.DOTTED, x, new double[] {3, 3, 3, 3}));
        return new FigureSpec("crowded", "Crowded legend", "x (1)", "y (1)", series);
    }

    @Test
    void everyPartOfACrowdedLegendLiesInsideTheFigure() throws Exception {
        String svg = renderer.render(crowded());
        Document doc = parse(svg);
        double[] view = java.util.Arrays.stream(doc.getDocumentElement().getAttribute("viewBox").trim().split("\\s+"))
                .mapToDouble(Double::parseDouble).toArray();
        org.w3c.dom.NodeList groups = doc.getElementsByTagNameNS("*", "g");
        org.w3c.dom.Element legend = null;
        for (int i = 0; i < groups.getLength(); i++) {
            if ("legend".equals(((org.w3c.dom.Element) groups.item(i)).getAttribute("class"))) {
                legend = (org.w3c.dom.Element) groups.item(i);
            }
        }
        assertTrue(legend != null, "the legend is drawn, as a group of its own");
        double[] box = {Double.MAX_VALUE, Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        extent(legend, 0, 0, box);
        assertTrue(box[2] > box[0] && box[3] > box[1], "the legend has extent");
        assertTrue(box[0] >= view[0] && box[1] >= view[1], "legend's top-left inside the view box: " + java.util.Arrays.toString(box));
        assertTrue(box[2] <= view[0] + view[2] && box[3] <= view[1] + view[3],
                "legend's bottom-right inside the view box " + java.util.Arrays.toString(view) + ": "
                        + java.util.Arrays.toString(box));
    }

    @Test
    void legendEntriesNeitherOverlapNorTouchTheirSymbolsAndRepeatedNamesShareOneEntry() {
        List<Legend.Entry> entries = new java.util.ArrayList<>();
        java.util.Set<String> seen = new java.util.HashSet<>();
        for (FigureSpec.Series s : crowded().series()) {
            if (seen.add(s.name())) {
                entries.add(new Legend.Entry(s.name(), Palette.of(s.style())));
            }
        }
        Legend legend = new Legend(entries, 624);
        assertEquals(7, legend.placed().size(), "the repeated band name gives one entry");
        assertTrue(legend.width() <= 624, "legend width " + legend.width());
        for (Legend.Placed p : legend.placed()) {
            assertTrue(p.text().getMinX() - p.symbol().getMaxX() >= Legend.GAP - 1e-9, "gap after the symbol of " + p.entry());
            assertTrue(p.text().getMaxX() <= legend.width() && p.symbol().getMinX() >= 0, "inside the box: " + p.entry());
            for (Legend.Placed q : legend.placed()) {
                if (p != q) {
                    java.awt.geom.Rectangle2D a = p.symbol().createUnion(p.text());
                    java.awt.geom.Rectangle2D b = q.symbol().createUnion(q.text());
                    assertFalse(a.intersects(b), p.entry().name() + " overlaps " + q.entry().name());
                }
            }
        }
        assertTrue(legend.placed().get(7 - 1).lines().size() > 1, "a name wider than the chart wraps");
    }

    /** Grows {@code box} (minX, minY, maxX, maxY) by every coordinate drawn under {@code e}, following translations. */
    private static void extent(org.w3c.dom.Element e, double dx, double dy, double[] box) {
        String transform = e.getAttribute("transform");
        java.util.regex.Matcher t = java.util.regex.Pattern.compile("translate\\(([-\\d.]+)[ ,]+([-\\d.]+)\\)")
                .matcher(transform);
        if (t.find()) {
            dx += Double.parseDouble(t.group(1));
            dy += Double.parseDouble(t.group(2));
        } else {
            assertTrue(transform.isEmpty(), "only translations are expected: " + transform);
        }
        switch (e.getLocalName()) {
            case "path", "polyline", "polygon" -> {
                String d = e.hasAttribute("d") ? e.getAttribute("d") : e.getAttribute("points");
                assertFalse(d.matches(".*[HhVvAa].*"), "coordinates come in x,y pairs: " + d);
                java.util.regex.Matcher n = java.util.regex.Pattern.compile("-?\\d+(?:\\.\\d+)?").matcher(d);
                List<Double> v = new java.util.ArrayList<>();
                while (n.find()) {
                    v.add(Double.parseDouble(n.group()));
                }
                for (int i = 0; i + 1 < v.size(); i += 2) {
                    grow(box, v.get(i) + dx, v.get(i + 1) + dy);
                }
            }
            case "rect" -> {
                double x = num(e, "x") + dx, y = num(e, "y") + dy;
                grow(box, x, y);
                grow(box, x + num(e, "width"), y + num(e, "height"));
            }
            case "line" -> {
                grow(box, num(e, "x1") + dx, num(e, "y1") + dy);
                grow(box, num(e, "x2") + dx, num(e, "y2") + dy);
            }
            case "ellipse", "circle" -> {
                double rx = e.hasAttribute("r") ? num(e, "r") : num(e, "rx");
                double ry = e.hasAttribute("r") ? num(e, "r") : num(e, "ry");
                grow(box, num(e, "cx") + dx - rx, num(e, "cy") + dy - ry);
                grow(box, num(e, "cx") + dx + rx, num(e, "cy") + dy + ry);
            }
            default -> {
            }
        }
        for (org.w3c.dom.Node c = e.getFirstChild(); c != null; c = c.getNextSibling()) {
            if (c instanceof org.w3c.dom.Element child) {
                extent(child, dx, dy, box);
            }
        }
    }

    private static double num(org.w3c.dom.Element e, String attr) {
        String v = e.getAttribute(attr);
        return v.isEmpty() ? 0 : Double.parseDouble(v.replace("px", ""));
    }

    private static void grow(double[] box, double x, double y) {
        box[0] = Math.min(box[0], x);
        box[1] = Math.min(box[1], y);
        box[2] = Math.max(box[2], x);
        box[3] = Math.max(box[3], y);
    }

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
    }

    @Test
    void aPointWithAnInfiniteCoordinateIsLeftOutOfItsSeries() {
        // Found by the robustness corpus: a response factor y/x of a concentration of 4.9e-324 is infinite.
        FigureSpec.Series s = new FigureSpec.Series("levels", FigureSpec.Style.POINTS,
                new double[] {1, 2, 3, 4}, new double[] {10, Double.POSITIVE_INFINITY, 30, Double.NaN});
        org.junit.jupiter.api.Assertions.assertArrayEquals(new double[] {1, 3, 4}, s.x());
        org.junit.jupiter.api.Assertions.assertEquals(3, s.y().length);
        org.junit.jupiter.api.Assertions.assertTrue(Double.isNaN(s.y()[2]), "NaN stays, a gap in a line");
    }
    @Test
    void aCategoricalAxisNamesEachPositionAndOnlyThose() throws Exception {
        List<String> days = List.of("Day 1", "Day 2", "Day 3");
        assertEquals("Day 1", SvgChartRenderer.categoryTick(days, 1.0));
        assertEquals("Day 3", SvgChartRenderer.categoryTick(days, 3.0));
        assertTrue(SvgChartRenderer.categoryTick(days, 1.5).isBlank());
        assertTrue(SvgChartRenderer.categoryTick(days, 0.5).isBlank());
        assertTrue(SvgChartRenderer.categoryTick(days, 4.0).isBlank());
        // XChart draws no tick at all when two labels are equal: the blanks must differ
        assertFalse(SvgChartRenderer.categoryTick(days, 0.5).equals(SvgChartRenderer.categoryTick(days, 3.5)));
        FigureSpec spec = new FigureSpec("p.values", "Results by day", "Day", "Result (mg/kg)", List.of(
                new FigureSpec.Series("Results", FigureSpec.Style.POINTS, new double[] {1, 1, 2, 2, 3, 3},
                        new double[] {9.8, 10.1, 10.4, 10.2, 9.9, 10.0})), days);
        String svg = renderer.render(spec);
        assertTrue(parse(svg).getDocumentElement().getLocalName().equals("svg"));
        // Three category labels are drawn where a numeric axis would draw its numbers: the SVG differs.
        FigureSpec numeric = new FigureSpec(spec.id(), spec.title(), spec.xTitle(), spec.yTitle(), spec.series());
        assertFalse(svg.equals(renderer.render(numeric)));
    }
}
