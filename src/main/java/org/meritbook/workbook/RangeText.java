package org.meritbook.workbook;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The range part of a data reference: cells ({@code A4:C25}) or whole columns ({@code B:C}).
 * Absolute markers ({@code $A$4}) are accepted and ignored. Anything else, or a range not written
 * from its top-left to its bottom-right corner, is refused rather than reinterpreted.
 */
sealed interface RangeText {
    /** Excel's sheet limits (.xlsx): 1,048,576 rows and 16,384 columns (XFD). */
    int MAX_ROWS = 1_048_576;
    int MAX_COLS = 16_384;

    record Cells(Area area) implements RangeText {
    }

    record Columns(int firstCol, int lastCol) implements RangeText {
    }

    /** Why a range text was refused, in words for the "found" part of a message. */
    final class Refused extends Exception {
        private static final long serialVersionUID = 1L;

        Refused(String reason) {
            super(reason);
        }
    }

    Pattern CELLS = Pattern.compile("\\$?([A-Z]{1,3})\\$?(\\d{1,7}):\\$?([A-Z]{1,3})\\$?(\\d{1,7})");
    Pattern COLUMNS = Pattern.compile("\\$?([A-Z]{1,3}):\\$?([A-Z]{1,3})");

    static RangeText parse(String text) throws Refused {
        String t = text.strip().toUpperCase(Locale.ROOT);
        Matcher m = CELLS.matcher(t);
        if (m.matches()) {
            int c0 = column(m.group(1));
            int r0 = row(m.group(2));
            int c1 = column(m.group(3));
            int r1 = row(m.group(4));
            if (c0 >= MAX_COLS || c1 >= MAX_COLS || r0 >= MAX_ROWS || r1 >= MAX_ROWS || r0 < 0 || r1 < 0) {
                throw new Refused("'" + text + "', which lies outside a worksheet (A1:XFD1048576)");
            }
            if (r1 < r0 || c1 < c0) {
                throw new Refused("'" + text + "', which does not run from its top-left to its bottom-right cell");
            }
            return new Cells(new Area(r0, c0, r1, c1));
        }
        m = COLUMNS.matcher(t);
        if (m.matches()) {
            int c0 = column(m.group(1));
            int c1 = column(m.group(2));
            if (c0 >= MAX_COLS || c1 >= MAX_COLS) {
                throw new Refused("'" + text + "', which lies outside a worksheet (columns A to XFD)");
            }
            if (c1 < c0) {
                throw new Refused("'" + text + "', whose columns are not written left to right");
            }
            return new Columns(c0, c1);
        }
        throw new Refused("'" + text + "'");
    }

    private static int column(String letters) {
        int c = 0;
        for (char ch : letters.toCharArray()) {
            c = c * 26 + (ch - 'A' + 1);
        }
        return c - 1;
    }

    /** 0-based; -1 for row "0", which does not exist. */
    private static int row(String digits) {
        return Integer.parseInt(digits) - 1;
    }
}
