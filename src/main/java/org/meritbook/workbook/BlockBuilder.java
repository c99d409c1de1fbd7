package org.meritbook.workbook;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.error.InputException;
import org.meritbook.study.DataReference;
import org.meritbook.study.ReadingOptions;

/**
 * Builds a {@link DataBlock} from headers and a span of data rows on a grid. Blank rows are
 * skipped and recorded. What the workbook leaves open is settled by the notebook's reading options
 * or reported: hidden rows and columns ({@link HiddenCells}), merged regions ({@link MergedValues}),
 * formulas without a stored result ({@link FormulaResults}); every problem of the block is raised
 * in one error. How values were obtained (formula results, numbers stored as text, dates, error
 * values) is summarised per column, so the trail says what the reader did.
 */
final class BlockBuilder {
    /** Note phrases summarised per column, with their plural wording. */
    private static final String[][] SUMMARISED = {
        {Notes.CACHED, "cached formula results used"},
        {Notes.NUMBER_AS_TEXT, "numbers stored as text, read as numbers"},
        {Notes.DATE, "dates read as ISO text"},
        {Notes.ERROR, "error values read as text"},
        {Notes.LOGICAL, "logical values read as text"},
    };
    private static final int LISTED = 6;

    private final Path file;
    private final Grid grid;
    private final DataReference reference;
    private final String where;

    BlockBuilder(Path file, Grid grid, DataReference reference) {
        this.file = file;
        this.grid = grid;
        this.reference = reference;
        this.where = ReadErrors.where(file, reference);
    }

    /**
     * @param headers      one per column from {@code c0}
     * @param headerTop    the first header row (the top of the block's range)
     * @param firstDataRow the first data row
     * @param lastDataRow  the last data row of the requested or detected range (may lie past the sheet's end)
     * @throws InputException for hidden cells, merged numbers or formulas without results the notebook
     *                        did not say how to read, and formulas that could not be evaluated
     */
    DataBlock build(List<HeaderText> headers, int headerTop, int c0, int firstDataRow, int lastDataRow,
            List<String> decisions) {
        int c1 = c0 + headers.size() - 1;
        String range = new Area(headerTop, c0, Math.max(headerTop, lastDataRow), c1).a1();
        List<Integer> rows = dataRows(firstDataRow, lastDataRow, c0, c1, decisions);
        if (rows.isEmpty()) {
            throw empty(headers, headerTop, firstDataRow, range);
        }
        ReadingOptions reading = reference.reading();
        BlockDraft draft = new BlockDraft(file, grid, reference, rows, c0, headers, decisions);
        HiddenCells.apply(draft, reading.hidden());
        draft.readValues();
        MergedValues.apply(draft, reading.merged());
        FormulaResults.apply(draft, reading.formulas());
        if (!draft.problems.isEmpty()) {
            throw new InputException(draft.problems);
        }
        List<Column> columns = new ArrayList<>();
        for (int i = 0; i < draft.cols.size(); i++) {
            HeaderText h = draft.headers.get(i);
            columns.add(new Column(h.header(), h.name(), h.unit(), CellRef.columnLetters(draft.cols.get(i)), draft.column(i)));
        }
        for (Column col : columns) {
            summarise(col, decisions);
        }
        return new DataBlock(file, grid.name(), range, columns, decisions, draft.leftOut);
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
