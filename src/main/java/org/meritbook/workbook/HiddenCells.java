package org.meritbook.workbook;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.Problem;
import org.meritbook.study.ReadingOptions;
import org.meritbook.study.ReadingOptions.Hidden;

/**
 * Rows and columns the workbook hides inside a block. A hidden row is easily a value someone meant
 * to drop, or one nobody sees any more, so it is read only when the notebook says how
 * ({@code hidden:}): {@code include} reads it like a visible one, {@code leave-out} leaves the row out
 * like an excluded point (shown with its reason) and does not read a hidden column. Without the
 * option each hidden row and column holding data is a located error. Only data rows that hold
 * something, and columns with a value in them, count: a hidden blank spacer changes nothing.
 */
final class HiddenCells {
    private static final String FIX = "Unhide it in the workbook if it holds data the study needs, or say in the notebook cell how "
            + "to read hidden rows and columns: '" + ReadingOptions.HIDDEN + ": include' (read them like visible ones) or '"
            + ReadingOptions.HIDDEN + ": leave-out' (leave hidden rows out, each recorded like an exclusion, and hidden columns unread).";

    private HiddenCells() {
    }

    static void apply(BlockDraft d, Hidden policy) {
        List<Integer> hiddenCols = new ArrayList<>();
        for (int i = 0; i < d.cols.size(); i++) {
            int c = d.cols.get(i);
            if (d.grid.columnHidden(c) && holdsData(d, c)) {
                hiddenCols.add(i);
            }
        }
        List<Integer> hiddenRows = new ArrayList<>();
        for (int i = 0; i < d.rows.size(); i++) {
            if (d.grid.rowHidden(d.rows.get(i))) {
                hiddenRows.add(i);
            }
        }
        if (hiddenCols.isEmpty() && hiddenRows.isEmpty()) {
            return;
        }
        switch (policy) {
            case REFUSE -> refuse(d, hiddenCols, hiddenRows);
            case INCLUDE -> include(d, hiddenCols, hiddenRows);
            case LEAVE_OUT -> leaveOut(d, hiddenCols, hiddenRows);
            default -> throw new IllegalStateException("hidden: " + policy);
        }
    }

    private static boolean holdsData(BlockDraft d, int c) {
        for (int r : d.rows) {
            if (d.grid.value(r, c).kind() != CellValue.Kind.BLANK) {
                return true;
            }
        }
        return false;
    }

    private static void refuse(BlockDraft d, List<Integer> cols, List<Integer> rows) {
        String expected = "only visible rows and columns in the block, unless the notebook says how to read hidden ones";
        for (int i : cols) {
            int c = d.cols.get(i);
            String letter = CellRef.columnLetters(c);
            String cells = new Area(d.rows.get(0), c, d.rows.get(d.rows.size() - 1), c).a1();
            d.problems.add(new Problem(ErrorKey.HIDDEN_CELLS, d.at(cells), expected,
                    "column " + letter + " '" + d.headers.get(i).header() + "', hidden in the workbook", FIX));
        }
        for (int i : rows) {
            int r = d.rows.get(i);
            d.problems.add(new Problem(ErrorKey.HIDDEN_CELLS, d.at(d.rowCells(r)), expected,
                    "row " + (r + 1) + ", hidden in the workbook", FIX));
        }
    }

    private static void include(BlockDraft d, List<Integer> cols, List<Integer> rows) {
        if (!cols.isEmpty()) {
            d.decisions.add("hidden " + columnList(d, cols) + " read like visible columns (" + ReadingOptions.HIDDEN + ": include)");
        }
        if (!rows.isEmpty()) {
            d.decisions.add("hidden " + BlockDraft.rowList(sheetRows(d, rows), 20) + " read like visible rows ("
                    + ReadingOptions.HIDDEN + ": include)");
        }
    }

    private static void leaveOut(BlockDraft d, List<Integer> cols, List<Integer> rows) {
        if (cols.size() == d.cols.size()) {
            d.problems.add(new Problem(ErrorKey.HIDDEN_CELLS, d.where(), "a block with at least one visible column",
                    "only hidden columns, which '" + ReadingOptions.HIDDEN + ": leave-out' does not read",
                    "Unhide the columns the study needs, or use '" + ReadingOptions.HIDDEN + ": include'."));
            return;
        }
        if (!cols.isEmpty()) {
            d.decisions.add("hidden " + columnList(d, cols) + " not read (" + ReadingOptions.HIDDEN + ": leave-out)");
            for (int k = cols.size() - 1; k >= 0; k--) {
                d.dropColumn(cols.get(k));
            }
        }
        for (int i : rows) {
            d.leftOut.put(i, "row " + (d.rows.get(i) + 1) + " is hidden in the workbook; left out (" + ReadingOptions.HIDDEN
                    + ": leave-out)");
        }
        if (!rows.isEmpty()) {
            d.decisions.add("hidden " + BlockDraft.rowList(sheetRows(d, rows), 20) + " left out (" + ReadingOptions.HIDDEN
                    + ": leave-out)");
        }
    }

    private static List<Integer> sheetRows(BlockDraft d, List<Integer> indexes) {
        return indexes.stream().map(d.rows::get).toList();
    }

    private static String columnList(BlockDraft d, List<Integer> indexes) {
        List<String> named = indexes.stream()
                .map(i -> CellRef.columnLetters(d.cols.get(i)) + " '" + d.headers.get(i).header() + "'").toList();
        return (named.size() == 1 ? "column " : "columns ") + String.join(", ", named);
    }
}
