package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Builds a {@link DataBlock} from headers and a span of data rows on a grid. Blank rows are
 * skipped and recorded; cells covered by a merged region are read with the region's value and
 * recorded; how values were obtained (formula results, numbers stored as text, dates, error
 * values) is summarised per column, so the trail says what the reader did.
 */
final class BlockBuilder {
    /** Note phrases summarised per column, with their plural wording. */
    private static final String[][] SUMMARISED = {
        {Notes.CACHED, "cached formula results used"},
        {Notes.NO_CACHED, "formulas without a cached result (saved without calculating), read as text"},
        {Notes.NUMBER_AS_TEXT, "numbers stored as text, read as numbers"},
        {Notes.DATE, "dates read as ISO text"},
        {Notes.ERROR, "error values read as text"},
        {Notes.LOGICAL, "logical values read as text"},
    };
    private static final int LISTED = 6;

    private final Path file;
    private final Grid grid;
    private final String where;

    BlockBuilder(Path file, Grid grid, String where) {
        this.file = file;
        this.grid = grid;
        this.where = where;
    }

    /**
     * @param headers      one per column from {@code c0}
     * @param headerTop    the first header row (the top of the block's range)
     * @param firstDataRow the first data row
     * @param lastDataRow  the last data row of the requested or detected range (may lie past the sheet's end)
     */
    DataBlock build(List<HeaderText> headers, int headerTop, int c0, int firstDataRow, int lastDataRow,
            List<String> decisions) {
        int c1 = c0 + headers.size() - 1;
        String range = new Area(headerTop, c0, Math.max(headerTop, lastDataRow), c1).a1();
        List<Integer> rows = dataRows(firstDataRow, lastDataRow, c0, c1, decisions);
        if (rows.isEmpty()) {
            throw empty(headers, headerTop, firstDataRow, range);
        }
        List<Column> columns = new ArrayList<>();
        Set<Area> mergedUsed = new LinkedHashSet<>();
        for (int i = 0; i < headers.size(); i++) {
            int c = c0 + i;
            List<CellValue> values = new ArrayList<>();
            for (int r : rows) {
                values.add(dataCell(r, c, mergedUsed));
            }
            HeaderText h = headers.get(i);
            columns.add(new Column(h.header(), h.name(), h.unit(), CellRef.columnLetters(c), values));
        }
        for (Area m : mergedUsed) {
            CellValue v = grid.value(m.firstRow(), m.firstCol());
            decisions.add("cells in merged region " + m.a1() + " read with its value '" + v.raw() + "'");
        }
        for (Column col : columns) {
            summarise(col, decisions);
        }
        return new DataBlock(file, grid.name(), range, columns, decisions);
    }

    private List<Integer> dataRows(int first, int last, int c0, int c1, List<String> decisions) {
        List<Integer> rows = new ArrayList<>();
        int end = Math.min(last, grid.lastRow());
        int blankFrom = -1;
        for (int r = first; r <= end; r++) {
            if (grid.blank(r, c0, c1)) {
                if (blankFrom < 0) {
                    blankFrom = r;
                }
                continue;
            }
            if (blankFrom >= 0 && !rows.isEmpty()) {
                decisions.add("skipped blank " + rowSpan(blankFrom, r - 1));
            } else if (blankFrom >= 0) {
                decisions.add("skipped blank " + rowSpan(blankFrom, r - 1) + " below the header");
            }
            blankFrom = -1;
            rows.add(r);
        }
        int lastRead = rows.isEmpty() ? first - 1 : rows.get(rows.size() - 1);
        if (!rows.isEmpty() && lastRead < last) {
            decisions.add(rowSpan(lastRead + 1, last) + " at the end of the range are blank; the data end at row "
                    + (lastRead + 1));
        }
        return rows;
    }

    private static String rowSpan(int from, int to) {
        return from == to ? "row " + (from + 1) : "rows " + (from + 1) + " to " + (to + 1);
    }

    private CellValue dataCell(int r, int c, Set<Area> mergedUsed) {
        CellValue v = grid.value(r, c);
        Optional<Area> m = grid.merged(r, c);
        if (v.kind() != CellValue.Kind.BLANK || m.isEmpty()
                || (m.get().firstRow() == r && m.get().firstCol() == c)) {
            return v;
        }
        // Excel shows the region's value across the whole region (e.g. "Day 1" merged over its replicates).
        CellValue src = grid.value(m.get().firstRow(), m.get().firstCol());
        if (src.kind() == CellValue.Kind.BLANK) {
            return v;
        }
        mergedUsed.add(m.get());
        return new CellValue(v.ref(), src.kind(), src.number(), src.raw(),
                Notes.join(src.note(), Notes.MERGED + m.get().a1()));
    }

    private static void summarise(Column col, List<String> decisions) {
        for (String[] s : SUMMARISED) {
            List<String> cells = col.values().stream()
                    .filter(v -> v.note() != null && v.note().contains(s[0]))
                    .map(v -> v.ref().a1())
                    .toList();
            if (!cells.isEmpty()) {
                String listed = cells.size() <= LISTED
                        ? String.join(", ", cells)
                        : String.join(", ", cells.subList(0, LISTED)) + ", ... (" + cells.size() + " in all)";
                decisions.add("column " + col.letter() + " '" + col.header() + "': " + s[1] + " in " + listed);
            }
        }
    }

    private RuntimeException empty(List<HeaderText> headers, int headerTop, int firstDataRow, String range) {
        String expected = "a header row and at least one data row in " + grid.name() + "!" + range;
        boolean noHeader = headers.stream().allMatch(h -> h.header().isEmpty());
        if (noHeader && firstDataRow > headerTop) {
            return ReadErrors.emptyRange(where, expected, "only blank cells",
                    "Check the sheet and the range in the data reference.");
        }
        return ReadErrors.emptyRange(where, expected,
                "the header row " + (headerTop + 1) + " and no data rows below it",
                "Extend the range down to the last data row.");
    }
}
