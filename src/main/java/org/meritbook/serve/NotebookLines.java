package org.meritbook.serve;

import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where a problem's notebook line is, for the page: the line's text and the analysis cell it lies
 * in (by the cell's {@code id:}), so the page can quote the line and link to the cell's section.
 * Read from the text alone, since a notebook with a problem may not parse.
 */
final class NotebookLines {
    private static final Pattern LINE = Pattern.compile("\\bline ([0-9]{1,7})\\b");
    private static final Pattern FENCE = Pattern.compile("^\\s{0,3}(`{3,}|~{3,})\\s*([A-Za-z][A-Za-z0-9-]*)?.*$");
    private static final Pattern ID = Pattern.compile("^id\\s*:\\s*['\"]?([^'\"#\\s]+)['\"]?\\s*(#.*)?$");

    private NotebookLines() {
    }

    /**
     * @param line the 1-based line number
     * @param text the line as written
     * @param cell the id of the analysis cell holding it, or null outside a cell
     */
    record Place(int line, String text, String cell) {
    }

    /** The place a problem's {@code where} names ("study.md line 72"), if it names a line of this notebook. */
    static Optional<Place> of(String where, String notebookName, List<String> lines) {
        if (!where.startsWith(notebookName)) {
            return Optional.empty();
        }
        Matcher m = LINE.matcher(where);
        if (!m.find()) {
            return Optional.empty();
        }
        int n = Integer.parseInt(m.group(1));
        if (n < 1 || n > lines.size()) {
            return Optional.empty();
        }
        return Optional.of(new Place(n, lines.get(n - 1), cellAt(lines, n - 1)));
    }

    private static boolean closes(String line, String fence) {
        String s = line.strip();
        char c = fence.charAt(0);
        return s.length() >= fence.length() && s.chars().allMatch(ch -> ch == c);
    }

    /** The id of the fenced cell around line index {@code at}, or null. */
    private static String cellAt(List<String> lines, int at) {
        String open = null;
        int start = -1;
        for (int i = 0; i <= at; i++) {
            Matcher f = FENCE.matcher(lines.get(i));
            if (f.matches()) {
                if (open == null) {
                    open = f.group(1);
                    start = i;
                } else if (closes(lines.get(i), open)) {
                    open = null;
                }
            }
        }
        if (open == null) {
            return null;
        }
        for (int i = start + 1; i < lines.size(); i++) {
            String s = lines.get(i).strip();
            if (closes(s, open)) {
                break;
            }
            Matcher id = ID.matcher(s);
            if (id.matches()) {
                return id.group(1);
            }
        }
        return null;
    }
}
