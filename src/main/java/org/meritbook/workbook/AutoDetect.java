package org.meritbook.workbook;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Finds the first table-like block on a sheet referenced without a range. The rule, chosen to be
 * predictable rather than clever (common practice, no source):
 *
 * <ol>
 *   <li>A <em>numeric row</em> holds two or more numbers (number cells, cached numeric formula
 *       results, numbers stored as text). Scanning down, each numeric row is a candidate first
 *       data row D.</li>
 *   <li>The header row H is found by walking up from D: rows holding a number or a censored
 *       value are data rows and are passed over; the first row holding neither is H if it has two
 *       or more text cells, and otherwise (a blank row, a single label, the top of the sheet) D is
 *       not a data row but metadata, and the scan goes on to the next numeric row.</li>
 *   <li>The block's columns are the run of adjacent non-blank header cells in H (a cell inside a
 *       merged region counts with the region's text) that lies over at least two of D's numbers;
 *       header text elsewhere in H is left out, and recorded.</li>
 *   <li>The row above H is a second header row, read as "Upper Lower", when it holds a merged
 *       region across two or more of the block's columns, or when every header cell of H is only
 *       a bracketed unit such as "(mg/L)".</li>
 *   <li>The data run down from H. A run of blank rows is inside the block (skipped, recorded)
 *       when the next non-blank row holds a number or censored value in the block's columns;
 *       otherwise the block ends before it.</li>
 * </ol>
 * Everything above H (title, metadata) is not read. Every step taken is recorded in the block's
 * decisions.
 */
final class AutoDetect {
    /**
     * @param upperHeader the upper of two header rows, or -1
     * @param header      the (lower) header row
     * @param firstCol    first column of the block
     * @param lastCol     last column of the block
     * @param lastRow     last data row
     */
    record Layout(int upperHeader, int header, int firstCol, int lastCol, int lastRow) {
    }

    private AutoDetect() {
    }

    static Layout detect(Grid g, String where, List<String> decisions) {
        List<Integer> metadata = new ArrayList<>();
        for (int d = 0; d <= g.lastRow(); d++) {
            List<Integer> numbers = numberColumns(g, d);
            if (numbers.size() < 2) {
                continue;
            }
            int h = headerAbove(g, d);
            Optional<int[]> span = h < 0 ? Optional.empty() : span(g, h, numbers);
            if (span.isEmpty()) {
                metadata.add(d);
                continue;
            }
            int c0 = span.get()[0];
            int c1 = span.get()[1];
            int upper = upperHeader(g, h, c0, c1) ? h - 1 : -1;
            int last = lastRow(g, d, c0, c1);
            Area block = new Area(upper >= 0 ? upper : h, c0, last, c1);
            decisions.add("block " + block.a1() + " detected on sheet '" + g.name() + "': header row " + (h + 1)
                    + " is the nearest row of text cells above row " + (d + 1)
                    + ", the first row with two or more numbers under a header"
                    + (block.firstRow() > 0 ? "; rows 1 to " + block.firstRow() + " above it not read" : ""));
            if (!metadata.isEmpty()) {
                decisions.add("rows " + rows(metadata) + " hold numbers but no header row of text above them; read as metadata, not data");
            }
            if (upper >= 0) {
                decisions.add("header rows " + (upper + 1) + " and " + (h + 1) + " combined as 'upper lower'");
            }
            outsideHeader(g, h, c0, c1, decisions);
            ending(g, last, c0, c1, decisions);
            return new Layout(upper, h, c0, c1, last);
        }
        String fix = "Give the range in the data reference, with the header in its first row, e.g. "
                + g.name() + "!A4:C25.";
        String expected = "a table on sheet '" + g.name()
                + "': a header row of two or more text cells above rows with two or more numbers";
        if (metadata.isEmpty()) {
            throw ReadErrors.emptyRange(where, expected, "no row with two or more numbers", fix);
        }
        throw ReadErrors.emptyRange(where, expected, "rows with numbers (" + rows(metadata)
                + ") but no header row of text cells directly above them", fix);
    }

    private static List<Integer> numberColumns(Grid g, int row) {
        List<Integer> cols = new ArrayList<>();
        for (int c = 0; c <= g.lastCol(row); c++) {
            if (g.value(row, c).isNumber()) {
                cols.add(c);
            }
        }
        return cols;
    }

    /** The header row above data row d, or -1. */
    private static int headerAbove(Grid g, int d) {
        for (int r = d - 1; r >= 0; r--) {
            int text = 0;
            boolean data = false;
            for (int c = 0; c <= g.lastCol(r); c++) {
                CellValue v = g.shown(r, c);
                switch (v.kind()) {
                    case NUMBER, CENSORED -> data = true;
                    case TEXT -> text++;
                    default -> {
                    }
                }
            }
            if (!data) {
                return text >= 2 ? r : -1;
            }
        }
        return -1;
    }

    /** The run of adjacent non-blank header cells over at least two of the numbers, as {first, last}. */
    private static Optional<int[]> span(Grid g, int h, List<Integer> numbers) {
        int width = Math.max(g.lastCol(h), numbers.get(numbers.size() - 1)) + 1;
        int c = 0;
        while (c < width) {
            if (g.shown(h, c).kind() == CellValue.Kind.BLANK) {
                c++;
                continue;
            }
            int start = c;
            while (c < width && g.shown(h, c).kind() != CellValue.Kind.BLANK) {
                c++;
            }
            int end = c - 1;
            long over = numbers.stream().filter(n -> n >= start && n <= end).count();
            if (over >= 2) {
                return Optional.of(new int[] {start, end});
            }
        }
        return Optional.empty();
    }

    private static boolean upperHeader(Grid g, int h, int c0, int c1) {
        if (h == 0) {
            return false;
        }
        int u = h - 1;
        for (int c = c0; c <= c1; c++) {
            Optional<Area> m = g.merged(u, c);
            if (m.isPresent() && m.get().lastRow() == u && m.get().lastCol() > m.get().firstCol()
                    && !g.shown(u, c).raw().isEmpty()) {
                return true;
            }
        }
        boolean allUnits = true;
        boolean upperText = false;
        for (int c = c0; c <= c1; c++) {
            String low = g.shown(h, c).raw().strip();
            allUnits &= low.matches("\\(.*\\)|\\[.*]");
            upperText |= g.shown(u, c).kind() == CellValue.Kind.TEXT;
        }
        return allUnits && upperText;
    }

    private static int lastRow(Grid g, int d, int c0, int c1) {
        int last = d;
        int r = d + 1;
        while (r <= g.lastRow()) {
            if (!g.blank(r, c0, c1)) {
                last = r++;
                continue;
            }
            int next = r;
            while (next <= g.lastRow() && g.blank(next, c0, c1)) {
                next++;
            }
            if (next > g.lastRow() || !holdsData(g, next, c0, c1)) {
                break;
            }
            r = next;
        }
        return last;
    }

    private static boolean holdsData(Grid g, int r, int c0, int c1) {
        for (int c = c0; c <= c1; c++) {
            CellValue.Kind k = g.value(r, c).kind();
            if (k == CellValue.Kind.NUMBER || k == CellValue.Kind.CENSORED) {
                return true;
            }
        }
        return false;
    }

    private static void outsideHeader(Grid g, int h, int c0, int c1, List<String> decisions) {
        List<String> left = new ArrayList<>();
        for (int c = 0; c <= g.lastCol(h); c++) {
            if ((c < c0 || c > c1) && g.value(h, c).kind() != CellValue.Kind.BLANK) {
                left.add(g.ref(h, c).a1());
            }
        }
        if (!left.isEmpty()) {
            decisions.add("header row " + (h + 1) + " also holds text outside the block (" + String.join(", ", left)
                    + "), not read; give a range to read it");
        }
    }

    private static void ending(Grid g, int last, int c0, int c1, List<String> decisions) {
        boolean more = false;
        for (int r = last + 1; r <= g.lastRow() && !more; r++) {
            more = !g.blank(r, c0, c1);
        }
        if (more) {
            decisions.add("block ends at row " + (last + 1)
                    + ": below it a blank row is followed by rows without numbers, not read");
        }
    }

    private static String rows(List<Integer> rows) {
        return String.join(", ", rows.stream().map(r -> String.valueOf(r + 1)).toList());
    }
}
