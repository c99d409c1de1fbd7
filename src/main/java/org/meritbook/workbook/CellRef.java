package org.meritbook.workbook;

import java.util.Objects;

/**
 * The address of one cell in a workbook sheet (for CSV files the sheet is the file name without
 * extension and addresses are A1-style over the CSV grid).
 *
 * @param sheet sheet name
 * @param row   0-based row index
 * @param col   0-based column index
 */
public record CellRef(String sheet, int row, int col) {
    public CellRef {
        Objects.requireNonNull(sheet, "sheet");
        if (row < 0 || col < 0) {
            throw new IllegalArgumentException("negative cell index " + row + "," + col);
        }
    }

    /** Column letters for a 0-based index: 0 → A, 25 → Z, 26 → AA. */
    public static String columnLetters(int col) {
        StringBuilder sb = new StringBuilder();
        int c = col + 1;
        while (c > 0) {
            int rem = (c - 1) % 26;
            sb.insert(0, (char) ('A' + rem));
            c = (c - 1) / 26;
        }
        return sb.toString();
    }

    /** {@code C17}. */
    public String a1() {
        return columnLetters(col) + (row + 1);
    }

    /** {@code Calibration!C17}, the form used everywhere in messages, trails and tables. */
    public String address() {
        return sheet + "!" + a1();
    }

    @Override
    public String toString() {
        return address();
    }
}
