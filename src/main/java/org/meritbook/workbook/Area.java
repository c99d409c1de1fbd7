package org.meritbook.workbook;

/**
 * A rectangle of cells, 0-based and inclusive.
 */
record Area(int firstRow, int firstCol, int lastRow, int lastCol) {
    Area {
        if (firstRow < 0 || firstCol < 0 || lastRow < firstRow || lastCol < firstCol) {
            throw new IllegalArgumentException("bad area " + firstRow + "," + firstCol + ":" + lastRow + "," + lastCol);
        }
    }

    String a1() {
        return CellRef.columnLetters(firstCol) + (firstRow + 1) + ":" + CellRef.columnLetters(lastCol) + (lastRow + 1);
    }
}
