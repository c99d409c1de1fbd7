package org.meritbook.study;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the text of a data reference ({@code source!Sheet!A1:D40}, {@code source!Sheet!B:C},
 * {@code source!Name}, {@code source!Sheet}, {@code source!'Day 1'!A1:C9}). Only the syntax is
 * checked here; whether the sheet, name or cells exist is the workbook reader's concern.
 */
final class DataReferenceParser {
    static final String ACCEPTED = "a data reference source!Sheet!A1:D40, source!Sheet!B:C, source!Name"
            + " or source!Sheet (a sheet name with spaces or '!' in quotes: source!'Day 1'!A1:C9)";

    // Excel's grid: columns A..XFD, rows 1..1048576. '$' is accepted as copied from Excel and dropped.
    private static final Pattern CELL_RANGE = Pattern.compile("\\$?([A-Z]{1,3})\\$?([0-9]{1,7}):\\$?([A-Z]{1,3})\\$?([0-9]{1,7})");
    private static final Pattern COLUMN_RANGE = Pattern.compile("\\$?([A-Z]{1,3}):\\$?([A-Z]{1,3})");
    private static final int MAX_COLUMN = 16_384;
    private static final int MAX_ROW = 1_048_576;

    /** Either a reference or why the text is not one (expected is always {@link #ACCEPTED}). */
    record Parsed(DataReference reference, String found, String fix) {
        boolean ok() {
            return reference != null;
        }
    }

    private DataReferenceParser() {
    }

    static Parsed parse(String text, int line) {
        String t = text.strip();
        int bang = t.indexOf('!');
        if (bang < 0) {
            return bad(text, "no '!' after the source alias", "Write the source alias, '!', then the sheet and range, e.g. runs!Calibration!A4:C25.");
        }
        String source = t.substring(0, bang);
        if (source.isEmpty()) {
            return bad(text, "no source alias before '!'", "Start the reference with an alias declared under 'sources:'.");
        }
        String rest = t.substring(bang + 1);
        String target;
        String after;
        if (rest.startsWith("'")) {
            int end = closingQuote(rest);
            if (end < 0) {
                return bad(text, "a sheet name with no closing quote", "Close the quoted sheet name: runs!'Day 1'!A1:C9.");
            }
            target = rest.substring(1, end).replace("''", "'");
            after = rest.substring(end + 1);
            if (!after.isEmpty() && !after.startsWith("!")) {
                return bad(text, "text after the quoted sheet name", "Put '!' between the sheet name and the range.");
            }
        } else {
            int next = rest.indexOf('!');
            target = next < 0 ? rest : rest.substring(0, next);
            after = next < 0 ? "" : rest.substring(next);
        }
        if (target.isBlank()) {
            return bad(text, "no sheet or name after the source alias", "Name the sheet, defined name or table after '" + source + "!'.");
        }
        if (after.isEmpty()) {
            if (!rest.startsWith("'") && isRange(target.toUpperCase(Locale.ROOT))) {
                return bad(text, "a range with no sheet", "Name the sheet between the alias and the range: " + source + "!Sheet1!" + target
                        + " (a .csv file's one sheet is named after the file: " + source + "!results!" + target
                        + " for results.csv).");
            }
            return new Parsed(new DataReference(source, target, null, text, line), null, null);
        }
        String range = after.substring(1);
        if (range.isEmpty()) {
            return bad(text, "nothing after the last '!'", "Write the range after the sheet, e.g. A4:C25 or B:C, or drop the '!'.");
        }
        String upper = range.toUpperCase(Locale.ROOT);
        if (!isRange(upper)) {
            String why = range.contains("!") ? "more than one sheet" : Problems.quote(range) + " as the range";
            return bad(text, why, "Write the range as two corners (A4:C25) or whole columns (B:C), inside Excel's grid (A1 to XFD1048576).");
        }
        return new Parsed(new DataReference(source, target, upper.replace("$", ""), text, line), null, null);
    }

    /** Index of the quote closing a quoted sheet name, where {@code ''} is an escaped quote; -1 if none. */
    static int closingQuote(String quoted) {
        int i = 1;
        while (i < quoted.length()) {
            if (quoted.charAt(i) == '\'') {
                if (i + 1 < quoted.length() && quoted.charAt(i + 1) == '\'') {
                    i += 2;
                    continue;
                }
                return i;
            }
            i++;
        }
        return -1;
    }

    private static boolean isRange(String upper) {
        Matcher cells = CELL_RANGE.matcher(upper);
        if (cells.matches()) {
            return column(cells.group(1)) <= MAX_COLUMN && row(cells.group(2)) && column(cells.group(3)) <= MAX_COLUMN
                    && row(cells.group(4));
        }
        Matcher columns = COLUMN_RANGE.matcher(upper);
        return columns.matches() && column(columns.group(1)) <= MAX_COLUMN && column(columns.group(2)) <= MAX_COLUMN;
    }

    /** 1-based column number of upper-case letters: A → 1, XFD → 16384. */
    static int column(String letters) {
        int n = 0;
        for (char c : letters.toCharArray()) {
            n = n * 26 + (c - 'A' + 1);
        }
        return n;
    }

    static boolean row(String digits) {
        int r = Integer.parseInt(digits);
        return r >= 1 && r <= MAX_ROW;
    }

    private static Parsed bad(String text, String why, String fix) {
        return new Parsed(null, Problems.quote(text) + " (" + why + ")", fix);
    }
}
