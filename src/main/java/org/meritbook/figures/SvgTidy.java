package org.meritbook.figures;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.HashMap;
import java.util.Map;

/**
 * Post-processes XChart's SVG so it can be inlined several times into one XHTML document: ids made
 * unique per figure and numbered in order of appearance (not hash codes), coordinates rounded to
 * 1/100 px (the exports carry up to 15 decimals, which only bloat the file), and a {@code <title>}
 * so the figure has an accessible name. XChart draws all text as glyph outlines, so the SVG needs no
 * font at all: nothing in it can fall back to a non-embedded PDF font.
 */
final class SvgTidy {
    private SvgTidy() {
    }

    static String tidy(String svg, String idPrefix, String title) {
        String s = renumberClips(svg, idPrefix);
        s = roundDecimals(s);
        int close = s.indexOf('>');
        return s.substring(0, close + 1) + "\n  <title>" + escapeXml(title) + "</title>" + s.substring(close + 1);
    }

    /** Replaces each whole word {@code clip<digits>} or {@code clip-<digits>} by the figure's own id. */
    static String renumberClips(String svg, String prefix) {
        Map<String, String> ids = new HashMap<>();
        StringBuilder out = new StringBuilder(svg.length() + 256);
        int n = svg.length();
        int copied = 0;
        int at = svg.indexOf("clip", 0);
        while (at >= 0) {
            int end = clipIdEnd(svg, at);
            if (end > 0) {
                String id = ids.computeIfAbsent(svg.substring(at, end), k -> prefix + "-clip" + (ids.size() + 1));
                out.append(svg, copied, at).append(id);
                copied = end;
            }
            at = svg.indexOf("clip", end > 0 ? end : at + 1);
        }
        return copied == 0 ? svg : out.append(svg, copied, n).toString();
    }

    /** End of a clip id starting at {@code at} as a whole word, or -1 when there is none there. */
    private static int clipIdEnd(String s, int at) {
        if (at > 0 && isWordChar(s.charAt(at - 1))) {
            return -1;
        }
        int i = at + 4;
        if (i < s.length() && s.charAt(i) == '-') {
            i++;
        }
        int digits = i;
        while (i < s.length() && isDigit(s.charAt(i))) {
            i++;
        }
        if (i == digits || i < s.length() && isWordChar(s.charAt(i))) {
            return -1;
        }
        return i;
    }

    /** Rounds to 1/100 every decimal with three or more fraction digits, scanning left to right as {@code -?\d+\.\d{3,}} did. */
    static String roundDecimals(String svg) {
        StringBuilder out = new StringBuilder(svg.length());
        int n = svg.length();
        int copied = 0;
        int i = 0;
        while (i < n) {
            char c = svg.charAt(i);
            int start = i;
            int digits = c == '-' ? i + 1 : i;
            if (digits >= n || !isDigit(svg.charAt(digits))) {
                i++;
                continue;
            }
            int j = digits;
            while (j < n && isDigit(svg.charAt(j))) {
                j++;
            }
            if (j < n && svg.charAt(j) == '.') {
                int k = j + 1;
                while (k < n && isDigit(svg.charAt(k))) {
                    k++;
                }
                if (k - j - 1 >= 3) {
                    BigDecimal v = new BigDecimal(svg.substring(start, k)).setScale(2, RoundingMode.HALF_UP)
                            .stripTrailingZeros();
                    out.append(svg, copied, start).append(v.signum() == 0 ? "0" : v.toPlainString());
                    copied = k;
                    i = k;
                    continue;
                }
            }
            // A shorter start inside the same digits fails the same way: resume after them.
            i = j;
        }
        return copied == 0 ? svg : out.append(svg, copied, n).toString();
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static boolean isWordChar(char c) {
        return c == '_' || Character.isLetterOrDigit(c); // what a regex word boundary counts as a word
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
