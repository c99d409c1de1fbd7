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

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        return f.newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
    }
}
