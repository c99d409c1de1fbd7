package org.meritbook.workbook;

import java.util.Objects;

/**
 * The address of one cell in a workbook sheet (for CSV files the sheet is the file name without
 * extension and addresses are A1-style over the CSV grid).
 *
 * <p>A value, compared by sheet, row and column. A class rather than a record only to keep its
 * {@link #address()} once made: a large block's tables, trail and figures each name every cell,
 * and made afresh each time those 100,000 texts were the larger part of what a run held.
 */
public final class CellRef {
    private final String sheet;
    private final int row;
    private final int col;
    /** Made on first use; a race makes the same text twice, harmlessly (as {@code String.hashCode} does). */
    private String address;

    /**
     * @param sheet sheet name
     * @param row   0-based row index
     * @param col   0-based column index
     */
    public CellRef(String sheet, int row, int col) {
        this.sheet = Objects.requireNonNull(sheet, "sheet");
        if (row < 0 || col < 0) {
            throw new IllegalArgumentException("negative cell index " + row + "," + col);
        }
        this.row = row;
        this.col = col;
    }

    public String sheet() {
        return sheet;
    }

    public int row() {
        return row;
    }

    public int col() {
        return col;
    }

    /** Letters of the columns A to ZZ, made once: a large block asks for them once per cell. */
    private static final String[] LETTERS = new String[26 + 26 * 26];

    static {
        for (int c = 0; c < LETTERS.length; c++) {
            LETTERS[c] = spell(c);
        }
    }

    /** Column letters for a 0-based index: 0 → A, 25 → Z, 26 → AA. */
    public static String columnLetters(int col) {
        return col >= 0 && col < LETTERS.length ? LETTERS[col] : spell(col);
    }

    private static String spell(int col) {
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
        String a = address;
        if (a == null) {
            a = sheet + "!" + columnLetters(col) + (row + 1);
            address = a;
        }
        return a;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CellRef other && row == other.row && col == other.col && sheet.equals(other.sheet);
    }

    /** The hash a record of these three components had, so hashed collections keep their order. */
    @Override
    public int hashCode() {
        return (sheet.hashCode() * 31 + Integer.hashCode(row)) * 31 + Integer.hashCode(col);
    }

    @Override
    public String toString() {
        return address();
    }
}
