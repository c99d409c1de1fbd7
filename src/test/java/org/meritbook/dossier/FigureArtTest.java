package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import javax.xml.transform.OutputKeys;
import javax.xml.transform.TransformerFactory;
import javax.xml.transform.dom.DOMSource;
import javax.xml.transform.stream.StreamResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;
import org.w3c.dom.Document;

class FigureArtTest {
    private static final String PAGE = "<html xmlns=\"http://www.w3.org/1999/xhtml\"><body><p>Figure</p>%s<p>%s</p></body></html>";

    private static FigureSpec fit(Path dir) {
        return DossierFixtures.results(dir, DossierFixtures.PLAIN).sections().get(0).figures().get(0);
    }

    @Test
    void aPlaceholderFilledInAfterLayoutIsTheElementTheDrawingInlineParsesTo(@TempDir Path dir) throws Exception {
        FigureSpec spec = fit(dir);
        String drawn = new SvgChartRenderer().render(spec);
        FigureArt art = new FigureArt(new SvgChartRenderer()::render);
        Markup placeholder = art.placeholder(spec);
        assertTrue(placeholder.html().startsWith("<svg "), placeholder.html());
        assertTrue(placeholder.html().contains(FigureArt.MARK + "=\"0\""), placeholder.html());
        art.startDrawing();
        // The same figure twice (a lab template may show it twice): both placeholders are filled.
        Document page = PdfRenderer.parse(String.format(PAGE, placeholder.html() + placeholder.html(), "text"));
        art.fillIn(page, new GlyphCoverage(new EmbeddedFonts(Optional.empty())));
        Document inline = PdfRenderer.parse(String.format(PAGE, drawn + drawn, "text"));
        assertEquals(xml(inline), xml(page));
        assertFalse(xml(page).contains(FigureArt.MARK), "the mark is gone before painting");
    }

    @Test
    void everyDrawingStartsWithTheRootItsPlaceholderWasLaidOutFor(@TempDir Path dir) {
        // The layout sees only the placeholder's root; if the renderer's root ever changed, this fails.
        for (FigureSpec spec : DossierFixtures.results(dir, DossierFixtures.PLAIN).sections().get(0).figures()) {
            String drawn = new SvgChartRenderer().render(spec);
            assertEquals(FigureArt.ROOT, drawn.substring(0, drawn.indexOf('>') + 1), spec.id());
        }
    }

    @Test
    void theHtmlGetsTheDrawingsAndOtherMarkupStaysAsItIs(@TempDir Path dir) {
        FigureSpec spec = fit(dir);
        FigureArt art = new FigureArt(new SvgChartRenderer()::render);
        Markup placeholder = art.placeholder(spec);
        Markup narrative = new Markup("<p>narrative</p>");
        var resolve = art.resolver();
        assertEquals(new SvgChartRenderer().render(spec), resolve.apply(placeholder).html());
        assertSame(narrative, resolve.apply(narrative));
    }

    @Test
    void aFigureThatCannotBeDrawnFailsTheRenderWithItsOwnMessage() {
        FigureSpec empty = new FigureSpec("empty-fig", "Nothing", "x", "y",
                List.of(new FigureSpec.Series("none", FigureSpec.Style.POINTS, new double[0], new double[0], List.of())));
        FigureArt art = new FigureArt(new SvgChartRenderer()::render);
        art.placeholder(empty);
        art.startDrawing();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, art::drawings);
        assertEquals("figure empty-fig has no data to draw", e.getMessage());
        assertThrows(IllegalStateException.class, () -> art.placeholder(empty), "no figure joins once drawing began");
    }

    private static String xml(Document d) throws Exception {
        var t = TransformerFactory.newInstance().newTransformer();
        t.setOutputProperty(OutputKeys.OMIT_XML_DECLARATION, "yes");
        StringWriter w = new StringWriter();
        t.transform(new DOMSource(d), new StreamResult(w));
        return w.toString();
    }
}
