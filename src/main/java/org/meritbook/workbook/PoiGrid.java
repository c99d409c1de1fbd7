package org.meritbook.workbook;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;

/**
 * A POI sheet seen as a {@link Grid}. Merged regions are indexed by row, so looking a cell up costs
 * the same however many regions the sheet has; regions that overlap are refused, since a cell in
 * two regions has no one value.
 */
final class PoiGrid implements Grid {
    private final Sheet sheet;
    private final PoiCells cells;
    /** The sheet's plain cells and rows when it was read by streaming ({@link SheetStreams}), else null. */
    private final StreamedSheet streamed;
    private final Evaluation evaluation;
    private final Map<Integer, List<Area>> mergedByRow = new HashMap<>();

    /**
     * @param fileName for messages
     * @param budget   bounds the work of indexing merged regions (rows covered, counted up to the
     *                 sheet's last row)
     * @throws InputException MALFORMED_SHEET for a merged region that cannot be read or overlaps another
     */
    PoiGrid(Sheet sheet, PoiCells cells, String fileName, WorkbookBudget budget, StreamedSheet streamed, Evaluation evaluation) {
        this.sheet = sheet;
        this.cells = cells;
        this.streamed = streamed;
        this.evaluation = evaluation;
        int last = Math.max(0, lastRow());
        long indexed = 0;
        List<CellRangeAddress> regions;
        try {
            regions = sheet.getMergedRegions();
        } catch (RuntimeException e) {
            throw malformed(fileName, "", "a merged-cell entry that is not a range of cells ("
                    + e.getClass().getSimpleName() + ")");
        }
        for (CellRangeAddress r : regions) {
            if (r.getFirstRow() < 0 || r.getFirstColumn() < 0 || r.getLastRow() < r.getFirstRow()
                    || r.getLastColumn() < r.getFirstColumn()) {
                throw malformed(fileName, "", "the merged-cell entry '" + r.formatAsString() + "', which is not a range of cells");
            }
            Area a = new Area(r.getFirstRow(), r.getFirstColumn(), r.getLastRow(), r.getLastColumn());
            // Rows past the sheet's last row hold nothing to read; indexing them would only cost time.
            int to = Math.min(a.lastRow(), Math.max(last, a.firstRow()));
            indexed += to - a.firstRow() + 1;
            if (indexed > budget.maxCells()) {
                throw budget.tooManyCells(fileName + ", sheet " + sheet.getSheetName(), "merged regions covering more than "
                        + String.format(Locale.ROOT, "%,d", budget.maxCells()) + " rows in all");
            }
            for (int row = a.firstRow(); row <= to; row++) {
                mergedByRow.computeIfAbsent(row, k -> new ArrayList<>()).add(a);
            }
        }
        for (List<Area> inRow : mergedByRow.values()) {
            inRow.sort(Comparator.comparingInt(Area::firstCol));
            for (int i = 1; i < inRow.size(); i++) {
                Area before = inRow.get(i - 1);
                Area next = inRow.get(i);
                if (next.firstCol() <= before.lastCol()) {
                    throw malformed(fileName, next.a1(), "merged regions " + before.a1() + " and " + next.a1()
                            + " that overlap, so a cell in both has no one value");
                }
            }
        }
    }

    private InputException malformed(String fileName, String at, String found) {
        return new InputException(ErrorKey.MALFORMED_SHEET, fileName + ", " + sheet.getSheetName() + (at.isEmpty() ? "" : "!" + at),
                "merged regions that each cover cells no other region covers", found,
                "Open the workbook in a spreadsheet program, unmerge and merge the cells again, and save it.");
    }

    @Override
    public String name() {
        return sheet.getSheetName();
    }

    /**
     * Where a formula without a stored result is evaluated: the workbook POI holds whole. When a sheet
     * of the file was streamed, the usermodel lacks its plain cells, so the file is opened whole for it.
     */
    interface Evaluation {
        /** @throws FormulaFailure when the cell cannot be reached or evaluated */
        CellValue evaluate(int sheetIndex, int row, int col, CellRef ref) throws FormulaFailure;
    }

    @Override
    public int lastRow() {
        if (streamed != null) {
            return streamed.lastRow();
        }
        return sheet.getPhysicalNumberOfRows() == 0 ? -1 : sheet.getLastRowNum();
    }

    @Override
    public int lastCol(int row) {
        if (streamed != null) {
            return streamed.lastCol(row);
        }
        Row r = sheet.getRow(row);
        return r == null ? -1 : Math.max(-1, r.getLastCellNum() - 1);
    }

    @Override
    public CellValue value(int row, int col) {
        if (streamed != null) {
            StoredCell stored = streamed.cell(row, col);
            if (stored != null || !streamed.formula(row, col)) {
                return cells.read(stored, ref(row, col));
            }
        }
        return cells.read(cell(row, col), ref(row, col));
    }

    private Cell cell(int row, int col) {
        Row r = sheet.getRow(row);
        return r == null ? null : r.getCell(col);
    }

    @Override
    public Optional<Area> merged(int row, int col) {
        List<Area> inRow = mergedByRow.get(row);
        if (inRow == null) {
            return Optional.empty();
        }
        for (Area a : inRow) {
            if (col >= a.firstCol() && col <= a.lastCol()) {
                return Optional.of(a);
            }
        }
        return Optional.empty();
    }

    @Override
    public boolean rowHidden(int row) {
        if (streamed != null) {
            StreamedSheet.Row r = streamed.row(row);
            if (r == null) {
                return false;
            }
            // POI: a row's height is its ht attribute, else the sheet's default, in twentieths of a point.
            float points = Double.isNaN(r.height) ? sheet.getDefaultRowHeightInPoints() : (float) r.height;
            return r.hidden || (short) (points * 20) == 0;
        }
        Row r = sheet.getRow(row);
        return r != null && (r.getZeroHeight() || r.getHeight() == 0);
    }

    @Override
    public boolean columnHidden(int col) {
        return sheet.isColumnHidden(col) || sheet.getColumnWidth(col) == 0;
    }

    @Override
    public CellValue evaluate(int row, int col) throws FormulaFailure {
        if (evaluation != null) {
            return evaluation.evaluate(sheet.getWorkbook().getSheetIndex(sheet), row, col, ref(row, col));
        }
        Cell c = cell(row, col);
        if (c == null) {
            throw new FormulaFailure("an empty cell");
        }
        return cells.evaluate(c, ref(row, col));
    }
}
