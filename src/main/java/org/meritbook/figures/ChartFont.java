package org.meritbook.figures;

import java.awt.Font;
import java.awt.FontFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The chart typeface, loaded from the bundled DejaVu Sans rather than looked up among the system's
 * fonts: text is then measured the same on every machine (deterministic SVG) and the family named in
 * the SVG is one the PDF renderer embeds.
 */
final class ChartFont {
    static final String RESOURCE = "/net/sf/jasperreports/fonts/dejavu/DejaVuSans.ttf";
    private static final Font BASE = load();

    private ChartFont() {
    }

    static Font of(int style, float size) {
        return BASE.deriveFont(style, size);
    }

    private static Font load() {
        try (InputStream in = ChartFont.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("font " + RESOURCE + " is not on the classpath");
            }
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("font " + RESOURCE + " is unreadable", e);
        }
    }
}
