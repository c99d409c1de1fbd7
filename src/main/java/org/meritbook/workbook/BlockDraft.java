package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.meritbook.error.Problem;
import org.meritbook.study.DataReference;

/**
 * A block while it is built: its data rows and columns on the sheet, their values, the rows left
 * out, the decisions and the problems found. The reading policies ({@link HiddenCells},
 * {@link MergedValues}, {@link FormulaResults}) work on it in turn, so every problem of the block is
 * collected before one error is raised.
 */
final class BlockDraft {
    final Path file;
    final Grid grid;
    final DataReference reference;
    /** Sheet row indexes of the data rows (blank rows already skipped). */
    final List<Integer> rows;
    /** Sheet column indexes of the columns read, and their headers. */
    final List<Integer> cols = new ArrayList<>();
    final List<HeaderText> headers = new ArrayList<>();
    /** Rows left out by the notebook's choice, by index in {@link #rows}, with the reason. */
    final Map<Integer, String> leftOut = new TreeMap<>();
    final List<String> decisions;
    final List<Problem> problems = new ArrayList<>();
    /** values.get(column index).get(row index), filled by {@link #readValues()}. */
    private final List<List<CellValue>> values = new ArrayList<>();

    BlockDraft(Path file, Grid grid, DataReference reference, List<Integer> rows, int c0, List<HeaderText> headers,
               List<String> decisions) {
        this.file = file;
        this.grid = grid;
        this.reference = reference;
        this.rows = List.copyOf(rows);
        for (int i = 0; i < headers.size(); i++) {
            cols.add(c0 + i);
            this.headers.add(headers.get(i));
        }
        this.decisions = decisions;
    }

    void dropColumn(int index) {
        cols.remove(index);
        headers.remove(index);
    }

    void readValues() {
        values.clear();
        for (int c : cols) {
            List<CellValue> column = new ArrayList<>(rows.size());
            for (int r : rows) {
                column.add(grid.value(r, c));
            }
            values.add(column);
        }
    }

    CellValue value(int colIndex, int rowIndex) {
        return values.get(colIndex).get(rowIndex);
    }

    void set(int colIndex, int rowIndex, CellValue v) {
        values.get(colIndex).set(rowIndex, v);
    }

    List<CellValue> column(int colIndex) {
        return values.get(colIndex);
    }

    /** Index of a sheet row among the data rows, or -1. */
    int rowIndex(int sheetRow) {
        int i = Collections.binarySearch(rows, sheetRow);
        return i >= 0 ? i : -1;
    }

    /** Index of a sheet column among the columns read, or -1. */
    int colIndex(int sheetCol) {
        return cols.indexOf(sheetCol);
    }

    /** "lab.xlsx, Calibration!A14:F14 (data reference 'lab!Calibration!A8:F31', notebook line 47)". */
    String at(String cells) {
        return ReadErrors.fileName(file) + ", " + grid.name() + "!" + cells + " (" + ReadErrors.reference(reference) + ")";
    }

    /** "lab.xlsx, data reference 'lab!Calibration!A8:F31' (notebook line 47)". */
    String where() {
        return ReadErrors.where(file, reference);
    }

    /** The block's row {@code r} across the columns read, "A14:F14". */
    String rowCells(int sheetRow) {
        return new Area(sheetRow, cols.get(0), sheetRow, cols.get(cols.size() - 1)).a1();
    }

    /** "rows 14, 22" or "row 14" (1-based), up to {@code listed} rows, then a count. */
    static String rowList(List<Integer> sheetRows, int listed) {
        List<String> shown = sheetRows.stream().limit(listed).map(r -> String.valueOf(r + 1)).toList();
        String more = sheetRows.size() > listed ? ", ... (" + sheetRows.size() + " in all)" : "";
        return (sheetRows.size() == 1 ? "row " : "rows ") + String.join(", ", shown) + more;
    }
}
