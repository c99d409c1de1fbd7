package org.meritbook.workbook;

import java.util.List;
import java.util.Optional;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;

/** A POI sheet seen as a {@link Grid}. */
final class PoiGrid implements Grid {
    private final Sheet sheet;
    private final PoiCells cells;
    private final List<Area> merged;

    PoiGrid(Sheet sheet, PoiCells cells) {
        this.sheet = sheet;
        this.cells = cells;
        this.merged = sheet.getMergedRegions().stream()
                .map(r -> new Area(r.getFirstRow(), r.getFirstColumn(), r.getLastRow(), r.getLastColumn()))
                .toList();
    }

    @Override
    public String name() {
        return sheet.getSheetName();
    }

    @Override
    public int lastRow() {
        return sheet.getPhysicalNumberOfRows() == 0 ? -1 : sheet.getLastRowNum();
    }

    @Override
    public int lastCol(int row) {
        Row r = sheet.getRow(row);
        return r == null ? -1 : Math.max(-1, r.getLastCellNum() - 1);
    }

    @Override
    public CellValue value(int row, int col) {
        Row r = sheet.getRow(row);
        return cells.read(r == null ? null : r.getCell(col), ref(row, col));
    }

    @Override
    public Optional<Area> merged(int row, int col) {
        for (Area a : merged) {
            if (row >= a.firstRow() && row <= a.lastRow() && col >= a.firstCol() && col <= a.lastCol()) {
                return Optional.of(a);
            }
        }
        return Optional.empty();
    }
}
