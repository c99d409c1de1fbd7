package org.meritbook.figures;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Post-processes XChart's SVG so it can be inlined several times into one XHTML document: ids made
 * unique per figure and numbered in order of appearance (not hash codes), coordinates rounded to
 * 1/100 px (the exports carry up to 15 decimals, which only bloat the file), and a {@code <title>}
 * so the figure has an accessible name. XChart draws all text as glyph outlines, so the SVG needs no
 * font at all: nothing in it can fall back to a non-embedded PDF font.
 */
final class SvgTidy {
    private static final Pattern LONG_DECIMAL = Pattern.compile("-?\\d+\\.\\d{3,}");
    private static final Pattern CLIP_ID = Pattern.compile("\\bclip-?\\d+\\b");

    private SvgTidy() {
    }

    static String tidy(String svg, String idPrefix, String title) {
        String s = renumberClips(svg, idPrefix);
        s = roundDecimals(s);
        int close = s.indexOf('>');
        return s.substring(0, close + 1) + "\n  <title>" + escapeXml(title) + "</title>" + s.substring(close + 1);
    }

    private static String renumberClips(String svg, String prefix) {
        Map<String, String> ids = new LinkedHashMap<>();
        Matcher m = CLIP_ID.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        while (m.find()) {
            String id = ids.computeIfAbsent(m.group(), k -> prefix + "-clip" + (ids.size() + 1));
            m.appendReplacement(out, Matcher.quoteReplacement(id));
        }
        m.appendTail(out);
        return out.toString();
    }

    private static String roundDecimals(String svg) {
        Matcher m = LONG_DECIMAL.matcher(svg);
        StringBuilder out = new StringBuilder(svg.length());
        while (m.find()) {
            BigDecimal v = new BigDecimal(m.group()).setScale(2, RoundingMode.HALF_UP).stripTrailingZeros();
            String text = v.signum() == 0 ? "0" : v.toPlainString();
            m.appendReplacement(out, text);
        }
        m.appendTail(out);
        return out.toString();
    }

    static String escapeXml(String text) {
        StringBuilder b = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '&' -> b.append("&amp;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> b.append(c);
            }
        }
        return b.toString();
    }
}
