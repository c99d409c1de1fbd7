package org.meritbook.dossier;

import com.openhtmltopdf.css.extend.StylesheetFactory;
import com.openhtmltopdf.css.sheet.StylesheetInfo;
import com.openhtmltopdf.simple.extend.XhtmlCssOnlyNamespaceHandler;
import com.openhtmltopdf.simple.extend.XhtmlNamespaceHandler;
import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

/**
 * The renderer's XHTML handling with the style sheets cut to one page DOM ({@link UnusedStyleRules}):
 * the renderer's default sheet (forms, frames, lists) and the dossier's own {@code <style>}. Made
 * for one document, from its vocabulary before the figures go in.
 */
final class PrunedStyleHandler extends XhtmlNamespaceHandler {
    /**
     * The renderer orders rules by a key that keeps only five digits of a selector's position, so from
     * 100,000 selectors on, two may share a key and one is lost; which two depends on the positions,
     * which a cut moves. Each selector takes at least two characters ("a,"): sheets of fewer
     * characters than this, all told, cannot get there, and larger ones are left whole.
     */
    static final int MAX_SHEET_CHARS = 190_000;

    private final StyleVocabulary words;
    private final boolean cuts;

    /** For this page DOM, as it is before the figures' drawings go in. */
    PrunedStyleHandler(Document dom) {
        this.words = StyleVocabulary.of(dom);
        String defaults = DefaultSheet.TEXT;
        this.cuts = defaults != null && defaults.length() + styleChars(dom) < MAX_SHEET_CHARS;
    }

    /** Whether the sheets are cut at all (not when they are too large to cut safely). */
    boolean cuts() {
        return cuts;
    }

    private static long styleChars(Document dom) {
        long chars = 0;
        NodeList styles = dom.getElementsByTagNameNS("*", "style");
        for (int i = 0; i < styles.getLength(); i++) {
            chars += styles.item(i).getTextContent().length();
        }
        return chars;
    }

    /** As the default handler's (same address, origin and media), with the unused rules taken out. */
    @Override
    public StylesheetInfo getDefaultStylesheet(StylesheetFactory factory) {
        String text = DefaultSheet.TEXT;
        if (!cuts || !getPathToDefaultStylesheet().equals(DefaultSheet.PATH)) {
            return super.getDefaultStylesheet(factory); // the renderer reports its own missing sheet
        }
        StylesheetInfo info = new StylesheetInfo();
        info.setUri("classpath:" + getPathToDefaultStylesheet());
        info.setOrigin(StylesheetInfo.USER_AGENT);
        info.setMedia("all");
        info.setType("text/css");
        info.setStylesheet(factory.parse(new StringReader(UnusedStyleRules.prune(text, words)), info));
        return info;
    }

    @Override
    public StylesheetInfo[] getStylesheets(Document doc) {
        StylesheetInfo[] sheets = super.getStylesheets(doc);
        if (!cuts) {
            return sheets;
        }
        for (StylesheetInfo s : sheets) {
            if (s.isInline() && s.getContent() != null) {
                s.setContent(UnusedStyleRules.prune(s.getContent(), words));
            }
        }
        return sheets;
    }

    /** The renderer's default sheet as its jar holds it; null when the jar lacks it. */
    static String defaultSheet() {
        return DefaultSheet.TEXT;
    }

    /** The renderer's default sheet, read once from its jar; null when the jar lacks it. */
    private static final class DefaultSheet {
        static final String PATH = "/resources/css/XhtmlNamespaceHandler.css";
        static final String TEXT = read();

        private static String read() {
            try (InputStream in = XhtmlCssOnlyNamespaceHandler.class.getResourceAsStream(PATH)) {
                return in == null ? null : new String(in.readAllBytes(), StandardCharsets.UTF_8);
            } catch (IOException e) {
                throw new UncheckedIOException("the PDF renderer's default style sheet could not be read", e);
            }
        }
    }
}
