package org.meritbook.dossier;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Locale;
import org.apache.fontbox.ttf.CmapLookup;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;
import org.w3c.dom.Node;

/**
 * Makes sure no text is silently lost in the PDF: a character that none of the embedded fonts can
 * draw (DejaVu has no CJK, for instance) would otherwise become a '#' or vanish. Such characters are
 * written as their code points, "[U+4E2D U+6587]", which stays legible and searchable; the HTML and
 * the attached notebook keep the original text.
 */
final class GlyphCoverage {
    /** Unicode cmaps of the embedded fonts; the fonts are parsed from memory and kept open. */
    private final List<CmapLookup> cmaps = new ArrayList<>();
    /** Code points already looked up: bit set when covered, in {@code known} when looked up. */
    private final BitSet covered = new BitSet();
    private final BitSet known = new BitSet();

    GlyphCoverage(EmbeddedFonts fonts) {
        for (EmbeddedFonts.FontFile f : fonts.files()) {
            try {
                TrueTypeFont ttf = new TTFParser().parse(new RandomAccessReadBuffer(f.bytes()));
                cmaps.add(ttf.getUnicodeCmapLookup());
            } catch (IOException e) {
                throw new UncheckedIOException("font " + f.family() + " is unreadable", e);
            }
        }
    }

    synchronized boolean covers(int codePoint) {
        if (Character.isWhitespace(codePoint) || Character.getType(codePoint) == Character.FORMAT
                || Character.getType(codePoint) == Character.CONTROL) {
            return true; // spacing and formatting characters are not drawn
        }
        if (!known.get(codePoint)) {
            known.set(codePoint);
            for (CmapLookup c : cmaps) {
                if (c.getGlyphId(codePoint) > 0) {
                    covered.set(codePoint);
                    break;
                }
            }
        }
        return covered.get(codePoint);
    }

    /** Rewrites, in place, every text node under {@code root} except style sheets. */
    void substitute(Node root) {
        for (Node n = root.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n.getNodeType() == Node.TEXT_NODE || n.getNodeType() == Node.CDATA_SECTION_NODE) {
                String text = n.getNodeValue();
                String fixed = substitute(text);
                if (!fixed.equals(text)) {
                    n.setNodeValue(fixed);
                }
            } else if (n.getNodeType() == Node.ELEMENT_NODE && !"style".equals(n.getLocalName())
                    && !"style".equals(n.getNodeName())) {
                substitute(n);
            }
        }
    }

    String substitute(String text) {
        StringBuilder out = null;
        boolean inRun = false;
        for (int i = 0; i < text.length(); ) {
            int cp = text.codePointAt(i);
            int len = Character.charCount(cp);
            if (covers(cp)) {
                if (out != null) {
                    if (inRun) {
                        out.append(']');
                        inRun = false;
                    }
                    out.appendCodePoint(cp);
                }
            } else {
                if (out == null) {
                    out = new StringBuilder(text.length() + 16).append(text, 0, i);
                }
                out.append(inRun ? " " : "[").append(String.format(Locale.ROOT, "U+%04X", cp));
                inRun = true;
            }
            i += len;
        }
        if (out == null) {
            return text;
        }
        if (inRun) {
            out.append(']');
        }
        return out.toString();
    }
}
