package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.function.UnaryOperator;
import org.meritbook.figures.FigureSpec;
import org.meritbook.figures.SvgChartRenderer;
import org.meritbook.pipeline.SideTask;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * One dossier's figures, drawn on a worker thread while the main thread lays out the PDF's pages.
 * Layout needs only a figure's size, and every figure has the same root element (the drawing size
 * of {@link SvgChartRenderer}), so the pages are laid out around empty placeholders with that root
 * and the drawings are put into them before the pages are painted; the HTML gets the drawings
 * themselves. The PDF is the one an inline drawing gives, byte for byte (DossierRendererTest).
 */
final class FigureArt {
    static final String SVG_NS = "http://www.w3.org/2000/svg";
    /** Marks a placeholder with its figure's index; removed before the drawing goes in. */
    static final String MARK = "data-meritbook-figure";
    /** The root start tag of every drawing: what the layout sees of a figure. */
    static final String ROOT = "<svg xmlns:xlink=\"http://www.w3.org/1999/xlink\" height=\""
            + SvgChartRenderer.HEIGHT + "px\" version=\"1.1\" viewBox=\"0 0 " + SvgChartRenderer.WIDTH + " "
            + SvgChartRenderer.HEIGHT + "\" width=\"" + SvgChartRenderer.WIDTH + "px\" x=\"0px\" y=\"0px\" xmlns=\""
            + SVG_NS + "\">";

    private final Function<FigureSpec, String> draw;
    private final List<FigureSpec> specs = new ArrayList<>();
    private final Map<Markup, Integer> placeholders = new HashMap<>();
    private SideTask<List<String>> drawing;

    /** @param draw a figure's SVG ({@link SvgChartRenderer#render}, or a {@link FigureCache}'s drawing) */
    FigureArt(Function<FigureSpec, String> draw) {
        this.draw = draw;
    }

    /** Registers a figure to draw and returns its placeholder markup (what the PDF's layout sees). */
    Markup placeholder(FigureSpec spec) {
        if (drawing != null) {
            throw new IllegalStateException("figures are already being drawn");
        }
        int index = specs.size();
        specs.add(spec);
        Markup m = new Markup(ROOT.substring(0, ROOT.length() - 1) + " " + MARK + "=\"" + index + "\"></svg>");
        placeholders.put(m, index);
        return m;
    }

    /** Starts drawing every registered figure, in order, on a worker thread. */
    void startDrawing() {
        List<FigureSpec> toDraw = List.copyOf(specs);
        drawing = SideTask.start("meritbook-figures", () -> toDraw.stream().map(draw).toList());
    }

    /** The drawings in registration order; waits for the worker and rethrows what a drawing threw. */
    List<String> drawings() {
        if (drawing == null) {
            startDrawing();
        }
        List<String> svgs = drawing.join("drawing the figures");
        for (int i = 0; i < svgs.size(); i++) {
            if (!svgs.get(i).startsWith(ROOT)) {
                // The layout was made for ROOT's size: a different root would need a different layout.
                throw new IllegalStateException("figure " + specs.get(i).id() + " does not start with the root "
                        + "element its page was laid out for");
            }
        }
        return svgs;
    }

    /** The HTML's markup for a figure: its drawing in place of its placeholder; other markup as it is. */
    UnaryOperator<Markup> resolver() {
        List<String> svgs = drawings();
        return m -> {
            Integer index = placeholders.get(m);
            return index == null ? m : new Markup(svgs.get(index));
        };
    }

    /**
     * Puts each drawing into its placeholders in a laid-out page DOM: the children of the drawing's
     * root become the placeholder's children, and its mark goes, so the painted element is the one an
     * inline drawing gives. Text in the drawing goes through the same glyph coverage as the page's.
     */
    void fillIn(Document dom, GlyphCoverage coverage) {
        if (placeholders.isEmpty()) {
            return;
        }
        List<String> svgs = drawings();
        NodeList all = dom.getElementsByTagNameNS(SVG_NS, "svg");
        List<Element> marked = new ArrayList<>();
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (e.hasAttribute(MARK)) {
                marked.add(e);
            }
        }
        for (Element placeholder : marked) {
            int index = Integer.parseInt(placeholder.getAttribute(MARK));
            placeholder.removeAttribute(MARK);
            Element drawn = PdfRenderer.parse(svgs.get(index)).getDocumentElement();
            for (Node c = drawn.getFirstChild(); c != null; c = c.getNextSibling()) {
                placeholder.appendChild(dom.importNode(c, true));
            }
            coverage.substitute(placeholder);
        }
    }
}
