package org.meritbook.dossier;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Takes out of a style sheet the selectors that cannot match anything in one page DOM: the PDF
 * renderer tries every selector on every element, so a 90-page dossier pays for each rule the
 * default style sheet keeps for forms, frames and lists it never has. Only what is certain goes:
 * a selector that names an element, class, id or attribute the page does not hold
 * ({@link StyleVocabulary}). A rule any of whose selectors is outside the plain grammar read here
 * (escapes, namespaces, functions, the ~ combinator, pseudo-classes other than a few) is kept as
 * written, and so is every at-rule; a sheet that does not scan (an unclosed block or string) is
 * returned unchanged. A selector that matches nothing changes no style, so the pages are the same,
 * byte for byte (PdfRendererTest).
 */
final class UnusedStyleRules {
    private static final Set<String> PSEUDO_CLASSES = Set.of("first-child", "last-child", "link", "visited", "hover",
            "active", "focus");
    private static final Set<String> PSEUDO_ELEMENTS = Set.of("before", "after");
    /** From {@link #skip}: a token not read here, so the sheet is left as it is. */
    private static final int FAIL = -2;
    /** What may stand between two compound selectors: white space, '>' and '+'. */
    private static final String COMBINATOR = " \t\n\r\f>+";

    private UnusedStyleRules() {
    }

    /** The sheet without the selectors that cannot match in a page of this vocabulary. */
    static String prune(String css, StyleVocabulary words) {
        StringBuilder out = new StringBuilder(css.length());
        int i = 0;
        while (true) {
            i = skipSpaceAndComments(css, i);
            if (i < 0) {
                return css;
            }
            if (i >= css.length()) {
                return out.toString();
            }
            if (css.charAt(i) == '@') {
                int end = atRuleEnd(css, i);
                if (end < 0) {
                    return css;
                }
                out.append(css, i, end).append('\n');
                i = end;
                continue;
            }
            int open = preludeEnd(css, i);
            if (open < 0) {
                return css;
            }
            int close = blockEnd(css, open);
            if (close < 0) {
                return css;
            }
            String kept = keptSelectors(css.substring(i, open), words);
            if (kept != null) {
                out.append(kept).append(' ').append(css, open, close).append('\n');
            }
            i = close;
        }
    }

    /**
     * The selector list to write: the prelude as it is when every selector may match or one is not
     * read, the matching ones joined when some cannot, null when none can.
     */
    private static String keptSelectors(String prelude, StyleVocabulary words) {
        List<String> selectors = splitOnCommas(prelude);
        List<String> kept = new ArrayList<>();
        for (String s : selectors) {
            String selector = cssStrip(s);
            Boolean may = mayMatch(selector, words);
            if (may == null) {
                return cssStrip(prelude);
            }
            if (may) {
                kept.add(selector);
            }
        }
        if (kept.size() == selectors.size()) {
            return cssStrip(prelude);
        }
        return kept.isEmpty() ? null : String.join(", ", kept);
    }

    /** Whether a selector may match; null when it is not in the grammar read here. */
    static Boolean mayMatch(String selector, StyleVocabulary words) {
        if (selector.isEmpty()) {
            return null;
        }
        boolean may = true;
        int i = 0;
        int n = selector.length();
        boolean expectCompound = true;
        while (i < n) {
            char c = selector.charAt(i);
            if (COMBINATOR.indexOf(c) >= 0) {
                if (expectCompound) {
                    return null; // a combinator with nothing before it
                }
                boolean sawSymbol = false;
                while (i < n && COMBINATOR.indexOf(selector.charAt(i)) >= 0) {
                    if (selector.charAt(i) == '>' || selector.charAt(i) == '+') {
                        if (sawSymbol) {
                            return null;
                        }
                        sawSymbol = true;
                    }
                    i++;
                }
                if (i == n) {
                    return null; // a combinator with nothing after it
                }
                expectCompound = true;
                continue;
            }
            if (!expectCompound) {
                return null;
            }
            int end = compoundEnd(selector, i);
            if (end < 0) {
                return null;
            }
            Boolean compound = compoundMayMatch(selector.substring(i, end), words);
            if (compound == null) {
                return null;
            }
            may &= compound;
            i = end;
            expectCompound = false;
        }
        return may;
    }

    private static int compoundEnd(String s, int from) {
        int i = from;
        while (i < s.length() && COMBINATOR.indexOf(s.charAt(i)) < 0) {
            if (s.charAt(i) == '[') {
                int close = attributeEnd(s, i);
                if (close < 0) {
                    return -1;
                }
                i = close;
            } else {
                i++;
            }
        }
        return i;
    }

    /**
     * The index after the ']' closing the attribute selector at {@code open}, or -1. A prelude holds
     * no backslash ({@link #preludeEnd}), so a string here ends at its next quote.
     */
    private static int attributeEnd(String s, int open) {
        for (int i = open + 1; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '"' || c == '\'') {
                int close = s.indexOf(c, i + 1);
                if (close < 0) {
                    return -1;
                }
                i = close;
            } else if (c == ']') {
                return i + 1;
            }
        }
        return -1;
    }

    /** One compound selector (element name, then classes, ids, attributes, pseudo parts). */
    private static Boolean compoundMayMatch(String compound, StyleVocabulary words) {
        boolean may = true;
        int i = 0;
        int n = compound.length();
        if (compound.charAt(0) == '*') {
            i = 1;
        } else if (nameEnd(compound, 0) > 0) {
            i = nameEnd(compound, 0);
            may = words.mayHaveElement(compound.substring(0, i));
        }
        boolean pseudoElement = false;
        while (i < n) {
            char c = compound.charAt(i);
            if (pseudoElement) {
                return null; // nothing may follow a pseudo-element
            }
            if (c == '.' || c == '#') {
                int end = nameEnd(compound, i + 1);
                if (end == i + 1) {
                    return null;
                }
                String name = compound.substring(i + 1, end);
                may &= c == '.' ? words.mayHaveClass(name) : words.mayHaveId(name);
                i = end;
            } else if (c == '[') {
                int close = attributeEnd(compound, i);
                Boolean attribute = close < 0 ? null : attributeMayMatch(compound.substring(i + 1, close - 1), words);
                if (attribute == null) {
                    return null;
                }
                may &= attribute;
                i = close;
            } else if (c == ':') {
                boolean doubled = i + 1 < n && compound.charAt(i + 1) == ':';
                int start = i + (doubled ? 2 : 1);
                int end = nameEnd(compound, start);
                String name = compound.substring(start, end).toLowerCase(Locale.ROOT);
                if (PSEUDO_ELEMENTS.contains(name)) {
                    pseudoElement = true;
                } else if (doubled || !PSEUDO_CLASSES.contains(name)) {
                    return null;
                }
                i = end;
            } else {
                return null;
            }
        }
        return may;
    }

    /** {@code name}, {@code name=value} and the like; the value is not looked at. */
    private static Boolean attributeMayMatch(String inside, StyleVocabulary words) {
        String s = cssStrip(inside);
        int end = nameEnd(s, 0);
        if (end == 0) {
            return null;
        }
        String rest = cssStrip(s.substring(end));
        if (!rest.isEmpty()) {
            int valueAt = rest.startsWith("=") ? 1 : rest.length() > 1 && "~|^$*".indexOf(rest.charAt(0)) >= 0
                    && rest.charAt(1) == '=' ? 2 : -1;
            if (valueAt < 0 || !plainValue(cssStrip(rest.substring(valueAt)))) {
                return null;
            }
        }
        return words.mayHaveAttribute(s.substring(0, end));
    }

    private static boolean plainValue(String v) {
        if (v.length() >= 2 && (v.charAt(0) == '"' || v.charAt(0) == '\'') && v.charAt(v.length() - 1) == v.charAt(0)) {
            return v.indexOf(v.charAt(0), 1) == v.length() - 1;
        }
        return !v.isEmpty() && nameEnd(v, 0) == v.length();
    }

    /**
     * The end of the plain CSS name at {@code from}: a letter or '_' (after at most one '-'), then
     * letters, digits, '_' and '-'; {@code from} when none starts there. No escapes, nothing beyond
     * ASCII, no leading digit or "--": what is not such a name is not read, so a selector the
     * renderer would refuse (and with it its whole rule) is never taken out of a list.
     */
    private static int nameEnd(String s, int from) {
        int i = from < s.length() && s.charAt(from) == '-' ? from + 1 : from;
        if (i >= s.length() || !nameStart(s.charAt(i))) {
            return from;
        }
        i++;
        while (i < s.length() && nameChar(s.charAt(i))) {
            i++;
        }
        return i;
    }

    private static boolean nameStart(char c) {
        return c >= 'a' && c <= 'z' || c >= 'A' && c <= 'Z' || c == '_';
    }

    private static boolean nameChar(char c) {
        return nameStart(c) || c >= '0' && c <= '9' || c == '-';
    }

    /** CSS's white space, and only that: to the renderer U+3000 and the like are name characters. */
    private static boolean cssSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f';
    }

    private static String cssStrip(String s) {
        int start = 0;
        int end = s.length();
        while (start < end && cssSpace(s.charAt(start))) {
            start++;
        }
        while (end > start && cssSpace(s.charAt(end - 1))) {
            end--;
        }
        return s.substring(start, end);
    }

    private static List<String> splitOnCommas(String prelude) {
        List<String> parts = new ArrayList<>();
        int start = 0;
        char quote = 0;
        int brackets = 0;
        for (int i = 0; i < prelude.length(); i++) {
            char c = prelude.charAt(i);
            if (quote != 0) {
                quote = c == quote ? 0 : quote;
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == '[' || c == '(') {
                brackets++;
            } else if (c == ']' || c == ')') {
                brackets--;
            } else if (c == ',' && brackets == 0) {
                parts.add(prelude.substring(start, i));
                start = i + 1;
            }
        }
        parts.add(prelude.substring(start));
        return parts;
    }

    /** The index after white space and comments from {@code i}; -1 in an unclosed comment. */
    private static int skipSpaceAndComments(String css, int from) {
        int i = from;
        while (i < css.length()) {
            if (cssSpace(css.charAt(i))) {
                i++;
            } else if (css.startsWith("/*", i)) {
                int close = commentEnd(css, i);
                if (close < 0) {
                    return -1;
                }
                i = close + 1;
            } else {
                break;
            }
        }
        return i;
    }

    /**
     * The index of the '{' opening a rule's block; -1 when a ';', '}', comment, escape, url( or the
     * end comes first.
     */
    private static int preludeEnd(String css, int from) {
        for (int i = from; i < css.length(); i++) {
            char c = css.charAt(i);
            if (c == '"' || c == '\'') {
                int close = stringEnd(css, i);
                if (close < 0 || css.substring(i, close).indexOf('\\') >= 0) {
                    return -1;
                }
                i = close;
            } else if (c == '{') {
                return i;
            } else if (c == ';' || c == '}' || c == '\\' || css.startsWith("/*", i) || urlAt(css, i)) {
                return -1;
            }
        }
        return -1;
    }

    /** The index after the '}' that closes the block opened at {@code open}; -1 when it is not closed or not read. */
    private static int blockEnd(String css, int open) {
        int depth = 0;
        for (int i = scanTo(css, open, "{}"); i >= 0; i = scanTo(css, i + 1, "{}")) {
            depth += css.charAt(i) == '{' ? 1 : -1;
            if (depth == 0) {
                return i + 1;
            }
        }
        return -1;
    }

    /** The end of an at-rule: after its ';' or its block; -1 when it does not end or is not read. */
    private static int atRuleEnd(String css, int at) {
        int i = scanTo(css, at, ";{}");
        if (i < 0 || css.charAt(i) == '}') {
            return -1;
        }
        return css.charAt(i) == ';' ? i + 1 : blockEnd(css, i);
    }

    /**
     * The index of the first of {@code stops} from {@code from} that is not inside a string, comment or
     * url(...); -1 when the sheet ends first or holds a token not read here ({@link #skip}).
     */
    private static int scanTo(String css, int from, String stops) {
        for (int i = from; i < css.length(); i++) {
            int skipTo = skip(css, i);
            if (skipTo == FAIL) {
                return -1;
            } else if (skipTo >= 0) {
                i = skipTo;
            } else if (stops.indexOf(css.charAt(i)) >= 0) {
                return i;
            }
        }
        return -1;
    }

    /**
     * What the renderer's lexer reads as one token from {@code i}: a string, a comment or an unquoted
     * url(...), whose last index is returned; -1 when none starts there; {@link #FAIL} for what is not
     * read here (an escape, an unclosed string or comment, a url(...) holding quotes, '(' or spaces).
     */
    private static int skip(String css, int i) {
        char c = css.charAt(i);
        if (c == '"' || c == '\'') {
            int close = stringEnd(css, i);
            return close < 0 ? FAIL : close;
        }
        if (css.startsWith("/*", i)) {
            int close = commentEnd(css, i);
            return close < 0 ? FAIL : close;
        }
        if (c == '\\') {
            return FAIL;
        }
        if (urlAt(css, i)) {
            int j = i + 4;
            while (j < css.length() && cssSpace(css.charAt(j))) {
                j++;
            }
            if (j < css.length() && (css.charAt(j) == '"' || css.charAt(j) == '\'')) {
                return i + 3; // url("..."): a function holding a string, read on as such
            }
            int close = css.indexOf(')', j);
            if (close < 0) {
                return FAIL;
            }
            String inside = cssStrip(css.substring(j, close));
            for (int k = 0; k < inside.length(); k++) {
                if ("\"'(\\".indexOf(inside.charAt(k)) >= 0 || cssSpace(inside.charAt(k))) {
                    return FAIL;
                }
            }
            return close;
        }
        return -1;
    }

    /** Whether an unquoted-or-quoted url( token starts at {@code i} (not the end of a longer name). */
    private static boolean urlAt(String css, int i) {
        if (!css.regionMatches(true, i, "url(", 0, 4)) {
            return false;
        }
        char before = i == 0 ? ' ' : css.charAt(i - 1);
        return !(nameChar(before) || before > 127);
    }

    /**
     * The index of the quote closing the string that opens at {@code open}; -1 when the line or the
     * sheet ends first (an unclosed string is left to the renderer's own recovery).
     */
    private static int stringEnd(String css, int open) {
        char quote = css.charAt(open);
        for (int i = open + 1; i < css.length(); i++) {
            char c = css.charAt(i);
            if (c == '\\') {
                i++;
            } else if (c == quote) {
                return i;
            } else if (c == '\n' || c == '\r' || c == '\f') {
                return -1;
            }
        }
        return -1;
    }

    /** The index of the '/' ending the comment that opens at {@code open}; -1 when it is not closed. */
    private static int commentEnd(String css, int open) {
        int close = css.indexOf("*/", open + 2);
        return close < 0 ? -1 : close + 1;
    }
}
