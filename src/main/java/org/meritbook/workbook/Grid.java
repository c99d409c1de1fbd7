package org.meritbook.workbook;

import java.util.Optional;

/**
 * One sheet as a grid of typed cells, whatever the file format. Block finding and building work
 * on this view only, so .xlsx, .xls and .csv behave alike.
 */
interface Grid {
    /** The sheet name used in cell addresses. */
    String name();

    /** The last row index holding a cell, or -1 for an empty sheet. */
    int lastRow();

    /** The last column index holding a cell in that row, or -1 when the row is empty. */
    int lastCol(int row);

    /** The cell's value as stored (a cell covered by a merged region, other than its first cell, is blank). */
    CellValue value(int row, int col);

    /** The merged region covering the cell, if any. */
    Optional<Area> merged(int row, int col);

    /** True when the workbook hides the row (hidden, or zero height); a CSV file hides nothing. */
    default boolean rowHidden(int row) {
        return false;
    }

    /** True when the workbook hides the column (hidden, or zero width). */
    default boolean columnHidden(int col) {
        return false;
    }

    /**
     * Evaluates the formula of a cell saved without its result ({@link CellValue#isFormulaWithoutResult()}).
     *
     * @throws FormulaFailure when it cannot be evaluated, with the reason
     */
    default CellValue evaluate(int row, int col) throws FormulaFailure {
        throw new FormulaFailure("a cell without a formula to evaluate");
    }

    /** The cell's value, or for a cell inside a merged region the value of the region's first cell. */
    default CellValue shown(int row, int col) {
        Optional<Area> m = merged(row, col);
        if (m.isEmpty() || (m.get().firstRow() == row && m.get().firstCol() == col)) {
            return value(row, col);
        }
        return value(m.get().firstRow(), m.get().firstCol());
    }

    default CellRef ref(int row, int col) {
        return new CellRef(name(), row, col);
    }

    /** True when every cell of the row between the columns (inclusive) is blank as stored. */
    default boolean blank(int row, int firstCol, int lastCol) {
        int last = Math.min(lastCol, lastCol(row));
        for (int c = firstCol; c <= last; c++) {
            if (value(row, c).kind() != CellValue.Kind.BLANK) {
                return false;
            }
        }
        return true;
    }
}
