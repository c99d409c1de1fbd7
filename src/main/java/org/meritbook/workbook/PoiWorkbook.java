package org.meritbook.workbook;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Date;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFTable;
import org.apache.poi.xssf.usermodel.XSSFTableColumn;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** An .xlsx, .xlsm or .xls workbook read by POI, held in memory. */
final class PoiWorkbook implements SourceWorkbook {
    private final Workbook workbook;
    private final PoiCells cells;
    private final List<String> openingDecisions;
    private final String fileName;
    private final WorkbookBudget budget;
    /** Grids by sheet index, built once: indexing a sheet's merged regions is done once per file. */
    private final Map<Integer, PoiGrid> grids = new HashMap<>();
    /** Streamed sheets by part name ({@link SheetStreams}); empty when POI holds every cell. */
    private final Map<String, StreamedSheet> streamed;
    private final WholeFile whole;

    PoiWorkbook(Workbook workbook, List<String> openingDecisions, String fileName, WorkbookBudget budget) {
        this(workbook, openingDecisions, fileName, budget, Map.of(), null);
    }

    /**
     * @param streamed the sheets read by streaming, by part name; every one must belong to a sheet of the workbook
     * @param original the whole package, opened only to evaluate a formula when a sheet was streamed
     */
    PoiWorkbook(Workbook workbook, List<String> openingDecisions, String fileName, WorkbookBudget budget,
                Map<String, StreamedSheet> streamed, byte[] original) {
        this.workbook = workbook;
        this.cells = new PoiCells(workbook, budget.maxCells());
        this.openingDecisions = List.copyOf(openingDecisions);
        this.fileName = fileName;
        this.budget = budget;
        this.streamed = Map.copyOf(streamed);
        this.whole = streamed.isEmpty() ? null : new WholeFile(original, budget);
        if (workbook instanceof XSSFWorkbook x) {
            this.streamed.values().forEach(sheet -> sheet.attach(x.getStylesSource()));
        }
    }

    /** True when every streamed sheet is a sheet of the workbook POI opened (else cells would be missed). */
    boolean streamedSheetsFound() {
        long found = 0;
        for (Sheet s : workbook) {
            if (s instanceof XSSFSheet x && streamed.containsKey(partName(x))) {
                found++;
            }
        }
        return found == streamed.size();
    }

    /** How many sheets were read by streaming. */
    int streamedSheets() {
        return streamed.size();
    }

    private static String partName(XSSFSheet sheet) {
        return sheet.getPackagePart().getPartName().getName();
    }

    @Override
    public List<String> sheetNames() {
        List<String> names = new ArrayList<>();
        for (Sheet s : workbook) {
            names.add(s.getSheetName());
        }
        return names;
    }

    @Override
    public Optional<Grid> sheet(String name) {
        for (int i = 0; i < workbook.getNumberOfSheets(); i++) {
            Sheet s = workbook.getSheetAt(i);
            if (s.getSheetName().equalsIgnoreCase(name.strip())) {
                return Optional.of(grids.computeIfAbsent(i, k -> new PoiGrid(s, cells, fileName, budget,
                        s instanceof XSSFSheet x ? streamed.get(partName(x)) : null, whole)));
            }
        }
        return Optional.empty();
    }

    @Override
    public List<String> definedNames() {
        return userNames().stream().map(Name::getNameName).distinct().toList();
    }

    @Override
    public Optional<NamedRange> definedName(String name) {
        List<Name> matches = userNames().stream().filter(n -> n.getNameName().equalsIgnoreCase(name.strip())).toList();
        // A workbook-wide name wins over one scoped to a sheet, as in Excel outside that sheet.
        Optional<Name> chosen = matches.stream().filter(n -> n.getSheetIndex() < 0).findFirst()
                .or(() -> matches.stream().findFirst());
        return chosen.map(PoiWorkbook::namedRange);
    }

    private List<Name> userNames() {
        return workbook.getAllNames().stream()
                .filter(n -> !n.getNameName().startsWith("_xlnm.") && !n.isFunctionName())
                .map(Name.class::cast)
                .toList();
    }

    /** Splits "'My sheet'!$A$4:$C$25" into sheet and range; anything else is not one range. */
    static NamedRange namedRange(Name n) {
        String f = n.getRefersToFormula() == null ? "" : n.getRefersToFormula().strip();
        if (f.startsWith("=")) {
            f = f.substring(1);
        }
        String sheet;
        String rest;
        if (f.startsWith("'")) {
            int i = 1;
            StringBuilder sb = new StringBuilder();
            while (i < f.length()) {
                char ch = f.charAt(i);
                if (ch == '\'' && i + 1 < f.length() && f.charAt(i + 1) == '\'') {
                    sb.append('\'');
                    i += 2;
                } else if (ch == '\'') {
                    break;
                } else {
                    sb.append(ch);
                    i++;
                }
            }
            sheet = sb.toString();
            rest = i + 1 < f.length() && f.charAt(i + 1) == '!' ? f.substring(i + 2) : null;
        } else {
            int bang = f.indexOf('!');
            sheet = bang < 0 ? null : f.substring(0, bang);
            rest = bang < 0 ? null : f.substring(bang + 1);
        }
        if (sheet == null || rest == null || rest.isEmpty() || sheet.contains("#REF") || rest.contains("#REF")
                || rest.contains(",") || rest.contains("!") || sheet.contains("[")) {
            return new NamedRange(n.getNameName(), f, null, null);
        }
        return new NamedRange(n.getNameName(), f, sheet, rest.contains(":") ? rest : rest + ":" + rest);
    }

    @Override
    public List<String> tableNames() {
        return tables().stream().map(XSSFTable::getName).toList();
    }

    @Override
    public Optional<TableRange> table(String name) {
        String want = name.strip();
        return tables().stream()
                .filter(t -> want.equalsIgnoreCase(t.getName()) || want.equalsIgnoreCase(t.getDisplayName()))
                .findFirst()
                .map(this::tableRange);
    }

    private TableRange tableRange(XSSFTable t) {
        try {
            return new TableRange(t.getName(), t.getSheetName(),
                    new Area(t.getStartCellReference().getRow(), t.getStartCellReference().getCol(),
                            t.getEndCellReference().getRow(), t.getEndCellReference().getCol()),
                    t.getHeaderRowCount(), t.getTotalsRowCount(),
                    t.getColumns().stream().map(XSSFTableColumn::getName).toList());
        } catch (RuntimeException e) {
            throw ReadErrors.corrupt(fileName + ", Excel table '" + t.getName() + "'", "an Excel table over one range of cells",
                    "a table definition whose range cannot be read", e);
        }
    }

    private List<XSSFTable> tables() {
        List<XSSFTable> all = new ArrayList<>();
        for (Sheet s : workbook) {
            if (s instanceof XSSFSheet x) {
                all.addAll(x.getTables());
            }
        }
        return all;
    }

    @Override
    public Optional<Instant> recordedSaveTime() {
        Date saved = null;
        if (workbook instanceof XSSFWorkbook x) {
            saved = x.getProperties().getCoreProperties().getModified();
        } else if (workbook instanceof HSSFWorkbook h && h.getSummaryInformation() != null) {
            saved = h.getSummaryInformation().getLastSaveDateTime();
        }
        return Optional.ofNullable(saved).map(Date::toInstant);
    }

    @Override
    public List<String> openingDecisions() {
        return openingDecisions;
    }

    @Override
    public void close() {
        try {
            // Opened from bytes in memory: closing releases memory and cannot write to the user's file.
            workbook.close();
            if (whole != null) {
                whole.close();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The file opened whole by POI, on the first formula to evaluate: with a sheet streamed, the
     * usermodel lacks that sheet's plain cells, and any formula may refer to them. Costs the memory
     * streaming saves, so only a study that asks for evaluation pays it.
     */
    private static final class WholeFile implements PoiGrid.Evaluation {
        private final byte[] original;
        private final WorkbookBudget budget;
        private XSSFWorkbook workbook;
        private PoiCells cells;

        WholeFile(byte[] original, WorkbookBudget budget) {
            this.original = original;
            this.budget = budget;
        }

        @Override
        public CellValue evaluate(int sheetIndex, int row, int col, CellRef ref) throws FormulaFailure {
            if (workbook == null) {
                try {
                    workbook = new XSSFWorkbook(new java.io.ByteArrayInputStream(original));
                } catch (IOException | RuntimeException e) {
                    throw new FormulaFailure("a formula in a workbook that cannot be opened whole to evaluate it ("
                            + e.getClass().getSimpleName() + ")");
                }
                cells = new PoiCells(workbook, budget.maxCells());
            }
            org.apache.poi.ss.usermodel.Row r = workbook.getSheetAt(sheetIndex).getRow(row);
            org.apache.poi.ss.usermodel.Cell c = r == null ? null : r.getCell(col);
            if (c == null) {
                throw new FormulaFailure("an empty cell");
            }
            return cells.evaluate(c, ref);
        }

        void close() throws IOException {
            if (workbook != null) {
                workbook.close();
            }
        }
    }
}
