package org.meritbook.workbook;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.meritbook.study.DataReference;

/**
 * Reads data blocks from .xlsx, .xlsm, .xls and .csv files. Each file is opened once per reader
 * and kept until {@link #close()}: a study reads several blocks from one workbook. A reader sees a
 * file as it was when first opened; use a new reader to see later edits.
 *
 * <p>Reference forms (DESIGN §3): {@code Sheet!A4:C25} (the range's first row is the header),
 * {@code Sheet!B:C} (whole columns: the first non-empty row is the header, the data run to the
 * last non-empty row), and a bare {@code target}, looked up as a defined name, then an Excel
 * table, then a sheet whose first table-like block is detected ({@link AutoDetect}).
 */
public final class WorkbookReader implements BlockReader {
    private final Map<Path, SourceWorkbook> open = new LinkedHashMap<>();
    private final WorkbookBudget budget;
    /** Where parsed workbooks are taken from and given back to on close; null: each is parsed, then closed. */
    private final WorkbookShelf shelf;
    private final Map<Path, WorkbookShelf.Kept> taken = new LinkedHashMap<>();

    /** A reader with the budget the environment sets ({@link WorkbookBudget#fromEnvironment()}). */
    public WorkbookReader() {
        this(WorkbookBudget.fromEnvironment());
    }

    /** @param budget how large a workbook this reader opens */
    public WorkbookReader(WorkbookBudget budget) {
        this.budget = java.util.Objects.requireNonNull(budget, "budget");
        this.shelf = null;
    }

    /**
     * A reader that takes a file's parsed workbook from {@code shelf} when the file's bytes are those it
     * was parsed from, and gives what it opened back to the shelf when it closes (a live session's runs).
     */
    public WorkbookReader(WorkbookBudget budget, WorkbookShelf shelf) {
        this.budget = java.util.Objects.requireNonNull(budget, "budget");
        this.shelf = java.util.Objects.requireNonNull(shelf, "shelf");
    }

    @Override
    public DataBlock read(Path file, DataReference reference) {
        String where = ReadErrors.where(file, reference);
        SourceWorkbook wb = workbook(file, where);
        List<String> decisions = new ArrayList<>(wb.openingDecisions());
        if (reference.hasRange()) {
            Grid g = sheet(wb, reference.target(), where);
            return range(file, g, reference.range(), where, reference, decisions);
        }
        return named(file, wb, reference.target().strip(), where, reference, decisions);
    }

    /**
     * The last-saved time a workbook records about itself, if any (see
     * {@link SourceWorkbook#recordedSaveTime()}); opens the file like {@link #read} does.
     */
    public Optional<Instant> recordedSaveTime(Path file) {
        return workbook(file, ReadErrors.fileName(file)).recordedSaveTime();
    }

    /** The sheets, defined names and Excel tables of a workbook, in workbook order. */
    public WorkbookContents contents(Path file) {
        SourceWorkbook wb = workbook(file, ReadErrors.fileName(file));
        return new WorkbookContents(wb.sheetNames(), wb.definedNames(), wb.tableNames());
    }

    private SourceWorkbook workbook(Path file, String where) {
        Path key = file.toAbsolutePath().normalize();
        SourceWorkbook wb = open.get(key);
        if (wb == null) {
            if (shelf == null) {
                wb = WorkbookFiles.open(file, where, budget);
            } else {
                WorkbookShelf.Kept k = shelf.take(key, file, where, budget);
                taken.put(key, k);
                wb = k.workbook();
            }
            open.put(key, wb);
        }
        return wb;
    }

    private static Grid sheet(SourceWorkbook wb, String name, String where) {
        return wb.sheet(name).orElseThrow(() -> ReadErrors.missingSheet(where, name, wb.sheetNames()));
    }

    private static DataBlock range(Path file, Grid g, String text, String where, DataReference reference,
                                   List<String> decisions) {
        RangeText parsed;
        try {
            parsed = RangeText.parse(text);
        } catch (RangeText.Refused e) {
            throw ReadErrors.badRange(where, e.getMessage());
        }
        BlockBuilder builder = new BlockBuilder(file, g, reference);
        if (parsed instanceof RangeText.Cells cells) {
            Area a = cells.area();
            Headers.Read h = Headers.withUnitsRow(g, a.firstRow(), a.firstCol(), a.lastCol(), a.lastRow(), decisions);
            return builder.build(h.headers(), a.firstRow(), a.firstCol(), h.firstDataRow(), a.lastRow(), decisions);
        }
        RangeText.Columns cols = (RangeText.Columns) parsed;
        int first = -1;
        int last = -1;
        for (int r = 0; r <= g.lastRow(); r++) {
            if (!g.blank(r, cols.firstCol(), cols.lastCol())) {
                first = first < 0 ? r : first;
                last = r;
            }
        }
        String span = CellRef.columnLetters(cols.firstCol()) + ":" + CellRef.columnLetters(cols.lastCol());
        if (first < 0) {
            throw ReadErrors.emptyRange(where, "a header row and at least one data row in " + g.name() + "!" + span,
                    "only blank cells", "Check the sheet and the columns in the data reference.");
        }
        decisions.add("columns " + span + " read from row " + (first + 1) + " (the first non-empty row, read as the header) to row "
                + (last + 1) + " (the last non-empty row)");
        Headers.Read h = Headers.withUnitsRow(g, first, cols.firstCol(), cols.lastCol(), last, decisions);
        return builder.build(h.headers(), first, cols.firstCol(), h.firstDataRow(), last, decisions);
    }

    private static DataBlock named(Path file, SourceWorkbook wb, String target, String where, DataReference reference,
                                   List<String> decisions) {
        Optional<SourceWorkbook.NamedRange> name = wb.definedName(target);
        Optional<SourceWorkbook.TableRange> table = wb.table(target);
        Optional<Grid> sheet = wb.sheet(target);
        if (name.isPresent()) {
            SourceWorkbook.NamedRange n = name.get();
            if (n.sheet() == null) {
                throw ReadErrors.badName(where, n);
            }
            ambiguity(target, "defined name", table.isPresent(), sheet.isPresent(), decisions);
            decisions.add("read defined name '" + n.name() + "' (" + n.refersTo() + ")");
            Grid g = sheet(wb, n.sheet(), where);
            return range(file, g, n.range(), where, reference, decisions);
        }
        if (table.isPresent()) {
            ambiguity(target, "Excel table", false, sheet.isPresent(), decisions);
            return table(file, wb, table.get(), where, reference, decisions);
        }
        if (sheet.isPresent()) {
            Grid g = sheet.get();
            AutoDetect.Layout l = AutoDetect.detect(g, where, decisions);
            List<HeaderText> headers = l.upperHeader() >= 0
                    ? Headers.combined(g, l.upperHeader(), l.header(), l.firstCol(), l.lastCol(), decisions)
                    : Headers.fromRow(g, l.header(), l.firstCol(), l.lastCol(), decisions);
            int top = l.upperHeader() >= 0 ? l.upperHeader() : l.header();
            return new BlockBuilder(file, g, reference).build(headers, top, l.firstCol(), l.header() + 1, l.lastRow(), decisions);
        }
        throw ReadErrors.missingName(where, target, wb);
    }

    private static void ambiguity(String target, String used, boolean table, boolean sheet, List<String> decisions) {
        List<String> others = new ArrayList<>();
        if (table) {
            others.add("an Excel table");
        }
        if (sheet) {
            others.add("a sheet");
        }
        if (!others.isEmpty()) {
            decisions.add("'" + target + "' names a " + used + " and also " + String.join(" and ", others)
                    + "; the " + used + " was read (order: defined name, table, sheet)");
        }
    }

    private static DataBlock table(Path file, SourceWorkbook wb, SourceWorkbook.TableRange t, String where,
            DataReference reference, List<String> decisions) {
        Grid g = sheet(wb, t.sheet(), where);
        Area a = t.area();
        decisions.add("read Excel table '" + t.name() + "' (" + g.name() + "!" + a.a1() + ")");
        int lastData = a.lastRow() - t.totalsRows();
        if (t.totalsRows() > 0) {
            decisions.add("totals row " + (a.lastRow() + 1) + " of table '" + t.name() + "' not read");
        }
        List<HeaderText> headers;
        int firstData = a.firstRow() + t.headerRows();
        if (t.headerRows() > 0) {
            Headers.Read h = Headers.withUnitsRow(g, a.firstRow(), a.firstCol(), a.lastCol(), lastData, decisions);
            headers = h.headers();
            firstData = h.firstDataRow();
        } else {
            decisions.add("table '" + t.name() + "' shows no header row; headers taken from the table definition");
            headers = Headers.given(t.columnNames(), a.firstRow(), a.firstCol(), decisions);
        }
        return new BlockBuilder(file, g, reference).build(headers, a.firstRow(), a.firstCol(), firstData, lastData, decisions);
    }

    /** Closes every file this reader opened, or gives it back to the shelf it came from. */
    @Override
    public void close() {
        if (shelf != null) {
            taken.forEach(shelf::giveBack);
            taken.clear();
            open.clear();
            return;
        }
        RuntimeException failure = null;
        for (SourceWorkbook wb : open.values()) {
            try {
                wb.close();
            } catch (RuntimeException e) {
                failure = failure == null ? e : failure;
            }
        }
        open.clear();
        if (failure != null) {
            throw failure;
        }
    }
}
