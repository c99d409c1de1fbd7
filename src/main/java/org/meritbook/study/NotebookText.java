package org.meritbook.study;

import java.util.ArrayList;
import java.util.List;

/**
 * The notebook split into lines, each kept with its own line break, so that slices are the exact
 * text written (narrative is kept verbatim) and every part can be mapped back to a 1-based line.
 */
final class NotebookText {
    private final List<String> lines = new ArrayList<>();   // without line breaks
    private final List<String> breaks = new ArrayList<>();  // "\n", "\r\n", "\r" or "" for the last line

    NotebookText(String text) {
        int start = 0;
        int i = 0;
        while (i < text.length()) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                int end = i;
                i += (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') ? 2 : 1;
                lines.add(text.substring(start, end));
                breaks.add(text.substring(end, i));
                start = i;
            } else {
                i++;
            }
        }
        if (start < text.length()) {
            lines.add(text.substring(start));
            breaks.add("");
        }
    }

    int lineCount() {
        return lines.size();
    }

    /** The text of 1-based line {@code n}, without its line break. */
    String line(int n) {
        return lines.get(n - 1);
    }

    boolean isBlank(int n) {
        return lines.get(n - 1).isBlank();
    }

    /** Lines {@code first..last} (1-based, inclusive) exactly as written, without the last line break. */
    String slice(int first, int last) {
        StringBuilder sb = new StringBuilder();
        for (int n = first; n <= last; n++) {
            sb.append(lines.get(n - 1));
            if (n < last) {
                sb.append(breaks.get(n - 1));
            }
        }
        return sb.toString();
    }

    /** Lines {@code first..last} joined with {@code \n}, for the parsers (CommonMark, YAML). */
    String joined(int first, int last) {
        return String.join("\n", lines.subList(first - 1, last));
    }
}
