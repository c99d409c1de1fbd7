package org.meritbook.dossier;

import java.util.HashSet;
import java.util.Locale;
import java.util.Set;
import org.w3c.dom.Attr;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.Node;

/**
 * What a page DOM holds that a CSS selector can ask for: its element names, classes, ids and
 * attribute names, all lower-cased (so a comparison errs towards "present"), and whether it holds
 * figures, whose drawings go in only after layout ({@link FigureArt#fillIn}) and so are not seen
 * here: inside a figure any SVG element name, class, id or attribute may turn up.
 */
record StyleVocabulary(Set<String> elements, Set<String> classes, Set<String> ids, Set<String> attributes,
                       boolean figures) {
    /** Every SVG 1.1 and SVG 2 element name, lower-cased: what a figure's drawing may contain. */
    static final Set<String> SVG_ELEMENTS = Set.of("a", "altglyph", "altglyphdef", "altglyphitem", "animate",
            "animatecolor", "animatemotion", "animatetransform", "circle", "clippath", "color-profile", "cursor", "defs",
            "desc", "discard", "ellipse", "feblend", "fecolormatrix", "fecomponenttransfer", "fecomposite",
            "feconvolvematrix", "fediffuselighting", "fedisplacementmap", "fedistantlight", "fedropshadow", "feflood",
            "fefunca", "fefuncb", "fefuncg", "fefuncr", "fegaussianblur", "feimage", "femerge", "femergenode",
            "femorphology", "feoffset", "fepointlight", "fespecularlighting", "fespotlight", "fetile", "feturbulence",
            "filter", "font", "font-face", "font-face-format", "font-face-name", "font-face-src", "font-face-uri",
            "foreignobject", "g", "glyph", "glyphref", "hkern", "image", "line", "lineargradient", "marker", "mask",
            "metadata", "missing-glyph", "mpath", "path", "pattern", "polygon", "polyline", "radialgradient", "rect",
            "script", "set", "stop", "style", "svg", "switch", "symbol", "text", "textpath", "title", "tref", "tspan",
            "use", "view", "vkern");

    StyleVocabulary {
        elements = Set.copyOf(elements);
        classes = Set.copyOf(classes);
        ids = Set.copyOf(ids);
        attributes = Set.copyOf(attributes);
    }

    /** The vocabulary of a page DOM as it is now (before the figures' drawings go in). */
    static StyleVocabulary of(Document dom) {
        Collector c = new Collector();
        c.collect(dom.getDocumentElement());
        return new StyleVocabulary(c.elements, c.classes, c.ids, c.attributes, c.figures);
    }

    /** One walk over the elements, gathering names as they are and lower-cased. */
    private static final class Collector {
        final Set<String> elements = new HashSet<>();
        final Set<String> classes = new HashSet<>();
        final Set<String> ids = new HashSet<>();
        final Set<String> attributes = new HashSet<>();
        boolean figures;

        void collect(Element e) {
            String local = lower(e.getLocalName() != null ? e.getLocalName() : e.getNodeName());
            elements.add(local);
            elements.add(lower(e.getNodeName()));
            figures |= local.equals("svg") || FigureArt.SVG_NS.equals(e.getNamespaceURI());
            NamedNodeMap attrs = e.getAttributes();
            for (int i = 0; i < attrs.getLength(); i++) {
                Attr a = (Attr) attrs.item(i);
                String name = lower(a.getLocalName() != null ? a.getLocalName() : a.getName());
                attributes.add(name);
                attributes.add(lower(a.getName()));
                if (name.equals("class")) {
                    classTokens(a.getValue());
                } else if (name.equals("id")) {
                    ids.add(lower(a.getValue()));
                    ids.add(lower(a.getValue().trim()));
                }
            }
            for (Node c = e.getFirstChild(); c != null; c = c.getNextSibling()) {
                if (c.getNodeType() == Node.ELEMENT_NODE) {
                    collect((Element) c);
                }
            }
        }

        /** The class names as the renderer tells them apart: split where Character.isWhitespace says. */
        private void classTokens(String value) {
            int start = -1;
            for (int i = 0; i <= value.length(); i++) {
                boolean space = i == value.length() || Character.isWhitespace(value.charAt(i));
                if (space && start >= 0) {
                    classes.add(lower(value.substring(start, i)));
                    start = -1;
                } else if (!space && start < 0) {
                    start = i;
                }
            }
        }
    }

    /** Whether some element here, or in a figure, may have this name. */
    boolean mayHaveElement(String name) {
        String n = lower(name);
        return elements.contains(n) || figures && SVG_ELEMENTS.contains(n);
    }

    boolean mayHaveClass(String name) {
        return figures || classes.contains(lower(name));
    }

    boolean mayHaveId(String name) {
        return figures || ids.contains(lower(name));
    }

    boolean mayHaveAttribute(String name) {
        return figures || attributes.contains(lower(name));
    }

    private static String lower(String s) {
        return s.toLowerCase(Locale.ROOT);
    }
}
