package org.meritbook.dossier;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.TimeZone;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;

/** The PDF renderer with its style sheets cut to the page ({@link UnusedStyleRules}) against the whole sheets. */
class PdfRendererTest {
    /** Most of what the renderer's default sheet styles, as a lab's template might use it, and a figure. */
    private static final String PAGE = "<!DOCTYPE html>\n<html xmlns=\"http://www.w3.org/1999/xhtml\" lang=\"en\"><head>"
            + "<meta charset=\"UTF-8\"/><title>t</title><style>\n%s\n</style></head><body class=\"print\">"
            + "<h1>One</h1><h2>Two</h2><h3>Three</h3><h4>Four</h4><h5>Five</h5><h6>Six</h6>"
            + "<p>Text with <b>bold</b>, <strong>strong</strong>, <i>italic</i>, <em>em</em>, <u>under</u>, <s>struck</s>, "
            + "x<sub>2</sub> and x<sup>2</sup>, <small>small</small> <big>big</big>, <code>code</code>, <a href=\"#t\">a link</a>"
            + "<br/>after a break.</p><blockquote>Quoted.</blockquote><pre>pre  formatted</pre><center>centred</center><hr/>"
            + "<ol><li>first<ul><li>nested</li></ul></li><li>second</li></ol><dl><dt>term</dt><dd>definition</dd></dl>"
            + "<p dir=\"rtl\">right to left</p><table id=\"t\" class=\"grid\"><caption>Caption</caption><thead><tr><th>H</th>"
            + "<th>I</th></tr></thead><tbody><tr><td class=\"c-num\">1.5</td><td>x</td></tr></tbody><tfoot><tr><td>f</td>"
            + "<td>g</td></tr></tfoot></table><div class=\"figure\"><div class=\"figure-art\">%s</div></div></body></html>";
    private static final String LAB_CSS = "body { font-family: \"DejaVu Sans\"; font-size: 9pt }\n"
            + ".grid td.c-num { text-align: right }\n.steps .src { color: #55616B }\ninput, form { margin: 4mm }\n"
            + ".figure-art svg { width: 160mm; height: 100mm }\n";
    /** Styles inside the drawing, which goes in after layout: what the cut must not lose. */
    private static final String FIGURE_CSS = "svg .legend { display: none }\n";

    private final EmbeddedFonts fonts = new EmbeddedFonts(Optional.empty());

    @Test
    void cutSheetsGiveThePdfOfTheWholeSheets(@TempDir Path dir) {
        FigureSpec spec = DossierFixtures.results(dir, DossierFixtures.PLAIN).sections().get(0).figures().get(0);
        byte[] whole = pdf(false, LAB_CSS, spec);
        assertEquals(DossierRenderer.sha256Hex(whole), DossierRenderer.sha256Hex(pdf(true, LAB_CSS, spec)));
        // and the page is one where the cut takes rules out of both sheets
        StyleVocabulary words = StyleVocabulary.of(PdfRenderer.parse(String.format(PAGE, LAB_CSS, "")));
        assertEquals(".grid td.c-num { text-align: right }", UnusedStyleRules.prune(
                ".grid td.c-num { text-align: right }\n.steps .src { color: #55616B }\ninput, form { margin: 4mm }", words).strip());
        String defaults = PrunedStyleHandler.defaultSheet();
        String cut = UnusedStyleRules.prune(defaults, words);
        assertTrue(cut.length() < defaults.length() * 3 / 4, cut);
        assertTrue(cut.contains("blockquote") && !cut.contains("textarea"), cut);
    }

    @Test
    void aRuleForWhatIsInsideAFigureStillApplies(@TempDir Path dir) {
        FigureSpec spec = DossierFixtures.results(dir, DossierFixtures.PLAIN).sections().get(0).figures().get(0);
        assertTrue(new SvgChartRenderer().render(spec).contains("class=\"legend\""), "the drawing has a legend");
        byte[] whole = pdf(false, LAB_CSS + FIGURE_CSS, spec);
        assertNotEquals(DossierRenderer.sha256Hex(pdf(false, LAB_CSS, spec)), DossierRenderer.sha256Hex(whole),
                "the rule changes the drawing");
        assertEquals(DossierRenderer.sha256Hex(whole), DossierRenderer.sha256Hex(pdf(true, LAB_CSS + FIGURE_CSS, spec)));
    }

    private byte[] pdf(boolean pruneStyles, String css, FigureSpec spec) {
        FigureArt art = new FigureArt(new SvgChartRenderer()::render);
        Markup placeholder = art.placeholder(spec);
        art.startDrawing();
        Calendar date = new GregorianCalendar(TimeZone.getTimeZone("UTC"), Locale.ROOT);
        date.clear();
        date.set(2026, Calendar.JANUARY, 2);
        PdfAFinisher.Metadata meta = new PdfAFinisher.Metadata("t", "test", "test", "test", date, new byte[16]);
        return new PdfAFinisher().finish(new PdfRenderer(fonts, pruneStyles).render(String.format(PAGE, css, placeholder.html()),
                art), meta, List.of());
    }
}
