package org.meritbook.workbook;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * Reads a block's header row(s) into one {@link HeaderText} per column and records what was read
 * in a way a reader of the trail could not see from the values alone (merged cells, units,
 * numbers in the header, missing or repeated headers).
 */
final class Headers {
    private Headers() {
    }

    /** One header row: a cell inside a merged region takes the region's text. */
    static List<HeaderText> fromRow(Grid g, int row, int c0, int c1, List<String> decisions) {
        List<HeaderText> out = new ArrayList<>();
        for (int c = c0; c <= c1; c++) {
            out.add(HeaderText.parse(cellText(g, row, c, decisions)));
        }
        return checked(out, row, c0, decisions);
    }

    /**
     * Two header rows read as "Upper Lower". A column whose upper and lower cells lie in one
     * merged region (a header merged down over both rows) takes that text once.
     */
    static List<HeaderText> combined(Grid g, int upper, int lower, int c0, int c1, List<String> decisions) {
        List<HeaderText> out = new ArrayList<>();
        for (int c = c0; c <= c1; c++) {
            Optional<Area> m = g.merged(lower, c);
            boolean spansBoth = m.isPresent() && m.get().firstRow() <= upper;
            String low = cellText(g, lower, c, decisions);
            out.add(spansBoth ? HeaderText.parse(low) : HeaderText.combine(cellText(g, upper, c, decisions), low));
        }
        return checked(out, lower, c0, decisions);
    }

    /** A block's headers and the row its data start on. */
    record Read(List<HeaderText> headers, int firstDataRow) {
    }

    /** A unit as labs write one under a header: "[µg/mL]", "(mg/L)", or a bare "mg/L", "%", "mAU·s". */
    private static final java.util.regex.Pattern UNIT = java.util.regex.Pattern.compile(
            "\\[[^\\]]{1,20}]|\\([^)]{1,20}\\)|[A-Za-zµμ°%‰][A-Za-zµμ°%‰/·.*^0-9²³⁻¹ -]{0,14}");

    /**
     * The header row, and a row of units under it when there is one ("Conc." over "[µg/mL]"): a row
     * whose every non-empty cell is unit-like text, with at least one number below it. Its units are
     * joined to the headers above and the data start after it; the decision is recorded.
     */
    static Read withUnitsRow(Grid g, int row, int c0, int c1, int lastRow, List<String> decisions) {
        List<HeaderText> names = fromRow(g, row, c0, c1, decisions);
        int under = row + 1;
        if (under > lastRow || !isUnitsRow(g, under, c0, c1, lastRow)) {
            return new Read(names, row + 1);
        }
        List<HeaderText> out = new ArrayList<>();
        for (int c = c0; c <= c1; c++) {
            String unit = HeaderText.collapse(g.shown(under, c).raw());
            String header = names.get(c - c0).header();
            boolean bracketed = unit.matches("\\[.*]|\\(.*\\)");
            out.add(unit.isEmpty() ? names.get(c - c0)
                    : HeaderText.combine(header, bracketed ? unit : "[" + unit + "]"));
        }
        decisions.add("row " + (under + 1) + " read as a row of units under the headers of row " + (row + 1));
        return new Read(checked(out, under, c0, new ArrayList<>()), under + 1);
    }

    private static boolean isUnitsRow(Grid g, int r, int c0, int c1, int lastRow) {
        boolean any = false;
        for (int c = c0; c <= c1; c++) {
            CellValue v = g.shown(r, c);
            if (v.kind() == CellValue.Kind.BLANK) {
                continue;
            }
            if (v.kind() != CellValue.Kind.TEXT || !UNIT.matcher(HeaderText.collapse(v.raw())).matches()) {
                return false;
            }
            any = true;
        }
        if (!any || r + 1 > lastRow) {
            return false;
        }
        for (int c = c0; c <= c1; c++) {
            if (g.shown(r + 1, c).kind() == CellValue.Kind.NUMBER) {
                return true;
            }
        }
        return false;
    }

    /** Headers stored in an Excel table's definition (a table without a header row in the sheet). */
    static List<HeaderText> given(List<String> names, int row, int c0, List<String> decisions) {
        return checked(names.stream().map(HeaderText::parse).toList(), row, c0, decisions);
    }

    private static String cellText(Grid g, int row, int c, List<String> decisions) {
        CellValue v = g.shown(row, c);
        Optional<Area> m = g.merged(row, c);
        String at = g.ref(row, c).a1();
        if (m.isPresent() && !(m.get().firstRow() == row && m.get().firstCol() == c) && !v.raw().isEmpty()) {
            decisions.add("header " + at + " taken from merged cells " + m.get().a1() + " ('" + v.raw() + "')");
        }
        if (v.kind() == CellValue.Kind.NUMBER) {
            decisions.add("header cell " + at + " holds the number " + v.raw()
                    + "; check that the block's first row is its header row");
        }
        if (v.raw().contains("\n")) {
            decisions.add("header " + at + ": line breaks read as spaces");
        }
        return v.raw();
    }

    private static List<HeaderText> checked(List<HeaderText> headers, int row, int c0, List<String> decisions) {
        Map<String, String> seen = new HashMap<>();
        for (int i = 0; i < headers.size(); i++) {
            HeaderText h = headers.get(i);
            String letter = CellRef.columnLetters(c0 + i);
            if (h.header().isEmpty()) {
                decisions.add("column " + letter + " has no header text in row " + (row + 1) + "; select it by its letter");
                continue;
            }
            if (h.unit() != null) {
                decisions.add("column " + letter + ": header '" + h.header() + "' read as name '" + h.name()
                        + "' and unit '" + h.unit() + "'");
            }
            String key = h.name().toLowerCase(Locale.ROOT);
            String first = seen.putIfAbsent(key, letter);
            if (first != null) {
                decisions.add("columns " + first + " and " + letter + " are both named '" + h.name()
                        + "'; the name selects column " + first + ", the letter selects either");
            }
        }
        return headers;
    }
}
