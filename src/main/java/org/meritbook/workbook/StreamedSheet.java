package org.meritbook.workbook;

import java.util.Arrays;
import javax.xml.stream.XMLStreamException;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.xssf.model.StylesTable;
import org.apache.poi.xssf.usermodel.XSSFRichTextString;

/**
 * The cells of one large worksheet read by streaming its XML ({@link SheetStreams}) instead of
 * through POI's usermodel, which holds about 720 bytes per cell. Each row keeps its cells' stored
 * XML facts (type, value, style, inline text) in parallel arrays and is turned into a
 * {@link CellValue} only when asked, by {@link PoiCells} under the same rules as a usermodel cell.
 * Formula cells are not held here: they stay in the package POI opens (see {@link SheetStreams}),
 * so their formula text, shared formulas included, is POI's own.
 */
final class StreamedSheet {
    /** Sheet row indexes (0-based) of the rows the XML holds, ascending. */
    private int[] rowIndexes = new int[16];
    private Row[] rows = new Row[16];
    private int rowCount;
    private boolean sorted = true;
    private StylesTable styles;
    private final java.util.Map<Integer, java.util.Optional<CellStyle>> styleCache = new java.util.HashMap<>();
    /** Cells this sheet may still take: a split made before the package check is held to the cell budget. */
    private long room;

    /** @param room the most cells this sheet may hold */
    StreamedSheet(long room) {
        this.room = room;
    }

    /** Cells this sheet could still have taken, for the next sheet of the same split. */
    long room() {
        return room;
    }

    /**
     * A cell's column (0-based) from its {@code r} attribute as written, or the one after the row's
     * last when the cell has none (as Excel reads it).
     */
    static int column(String ref, int lastCol) throws XMLStreamException {
        if (ref == null) {
            return lastCol + 1;
        }
        long parsed = XmlPartScan.cellAddress(ref.strip());
        if (parsed < 0) {
            throw new XMLStreamException("a cell reference '" + ref + "' the package check let through");
        }
        return (int) (parsed >>> 32);
    }

    /** A cell's {@code s} attribute as written; a value no style table can hold reads as Integer.MAX_VALUE. */
    static int styleIndex(String s) {
        try {
            long v = Long.parseLong(s.strip());
            return v < 0 || v > Integer.MAX_VALUE ? Integer.MAX_VALUE : (int) v;
        } catch (NumberFormatException e) {
            return Integer.MAX_VALUE;
        }
    }

    /** One row element: its attributes and its cells, by ascending column. */
    static final class Row {
        final boolean hidden;
        /** the {@code ht} attribute in points, or NaN when absent */
        final double height;
        int[] cols = new int[4];
        /** the {@code t} attribute ("n" when absent); null marks a formula cell, read from POI's usermodel */
        String[] types = new String[4];
        /** the text of {@code <v>}, or null when absent */
        String[] values = new String[4];
        /** the {@code s} attribute, or -1 when absent */
        int[] styleIndexes = new int[4];
        /** the text of {@code <is>} for inline strings (runs joined), or null when absent */
        String[] inline = new String[4];
        int size;

        Row(boolean hidden, double height) {
            this.hidden = hidden;
            this.height = height;
        }

        /** A row from its {@code hidden} and {@code ht} attributes as written (null when absent). */
        static Row of(String hidden, String height) {
            return new Row(bool(hidden), points(height));
        }

        /** xsd:boolean as XmlBeans reads it: "1" or "true". */
        private static boolean bool(String text) {
            if (text == null) {
                return false;
            }
            String t = text.strip();
            return t.equals("1") || t.equals("true");
        }

        private static double points(String text) {
            if (text == null) {
                return Double.NaN;
            }
            try {
                return Double.parseDouble(text.strip());
            } catch (NumberFormatException e) {
                return Double.NaN;
            }
        }

        void add(int col, String type, String value, int style, String inlineText) {
            if (size == RangeText.MAX_COLS) {
                // A checked row holds each of the columns A to XFD at most once; an unchecked one may hold anything.
                throw new IllegalStateException("a row of more than " + RangeText.MAX_COLS + " cells");
            }
            if (size == cols.length) {
                int n = size * 2;
                cols = Arrays.copyOf(cols, n);
                types = Arrays.copyOf(types, n);
                values = Arrays.copyOf(values, n);
                styleIndexes = Arrays.copyOf(styleIndexes, n);
                inline = Arrays.copyOf(inline, n);
            }
            cols[size] = col;
            types[size] = type;
            values[size] = value;
            styleIndexes[size] = style;
            inline[size] = inlineText;
            size++;
        }

        /** Sorts the cells by column (a sheet normally writes them in order; the package check refused duplicates). */
        void seal() {
            boolean sorted = true;
            for (int i = 1; i < size && sorted; i++) {
                sorted = cols[i - 1] < cols[i];
            }
            if (sorted) {
                return;
            }
            Integer[] order = new Integer[size];
            for (int i = 0; i < size; i++) {
                order[i] = i;
            }
            Arrays.sort(order, (a, b) -> Integer.compare(cols[a], cols[b]));
            int[] c = new int[size];
            String[] t = new String[size];
            String[] v = new String[size];
            int[] s = new int[size];
            String[] is = new String[size];
            for (int i = 0; i < size; i++) {
                c[i] = cols[order[i]];
                t[i] = types[order[i]];
                v[i] = values[order[i]];
                s[i] = styleIndexes[order[i]];
                is[i] = inline[order[i]];
            }
            cols = c;
            types = t;
            values = v;
            styleIndexes = s;
            inline = is;
        }

        int find(int col) {
            return Arrays.binarySearch(cols, 0, size, col);
        }
    }

    void addRow(int rowIndex, Row row) {
        room -= row.size;
        if (room < 0) {
            throw new IllegalStateException("more cells than the workbook budget allows");
        }
        if (rowCount == rows.length) {
            rows = Arrays.copyOf(rows, rowCount * 2);
            rowIndexes = Arrays.copyOf(rowIndexes, rowCount * 2);
        }
        row.seal();
        sorted &= rowCount == 0 || rowIndexes[rowCount - 1] < rowIndex;
        rows[rowCount] = row;
        rowIndexes[rowCount] = rowIndex;
        rowCount++;
    }

    /**
     * Called once every row is in: rows are written in order, and rows out of order (a hand edit)
     * are sorted once here, never shifted one by one (the package check refused duplicates).
     */
    void seal() {
        if (sorted) {
            return;
        }
        Integer[] order = new Integer[rowCount];
        for (int i = 0; i < rowCount; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Integer.compare(rowIndexes[a], rowIndexes[b]));
        int[] indexes = new int[rowCount];
        Row[] byIndex = new Row[rowCount];
        for (int i = 0; i < rowCount; i++) {
            indexes[i] = rowIndexes[order[i]];
            byIndex[i] = rows[order[i]];
        }
        rowIndexes = indexes;
        rows = byIndex;
        sorted = true;
    }

    /** Called once the package is open: styles are resolved through the workbook POI holds. */
    void attach(StylesTable styles) {
        this.styles = styles;
    }

    /** Like POI's {@code Sheet.getLastRowNum()} for a sheet with rows: the largest row index, or -1 without rows. */
    int lastRow() {
        return rowCount == 0 ? -1 : rowIndexes[rowCount - 1];
    }

    Row row(int rowIndex) {
        int i = Arrays.binarySearch(rowIndexes, 0, rowCount, rowIndex);
        return i < 0 ? null : rows[i];
    }

    /** Like POI's {@code Row.getLastCellNum() - 1}: the largest column index of the row, or -1. */
    int lastCol(int rowIndex) {
        Row r = row(rowIndex);
        return r == null || r.size == 0 ? -1 : r.cols[r.size - 1];
    }

    /** True when the cell is a formula cell, which POI's usermodel holds. */
    boolean formula(int rowIndex, int col) {
        Row r = row(rowIndex);
        int i = r == null ? -1 : r.find(col);
        return i >= 0 && r.types[i] == null;
    }

    /** The stored cell, or null for a cell the sheet does not hold (a formula cell is not held here either). */
    StoredCell cell(int rowIndex, int col) {
        Row r = row(rowIndex);
        int i = r == null ? -1 : r.find(col);
        return i < 0 || r.types[i] == null ? null : new Stored(r, i);
    }

    /** A stored cell, answering as POI's {@code XSSFCell} does for the same XML. */
    private final class Stored implements StoredCell {
        private final Row row;
        private final int i;

        Stored(Row row, int i) {
            this.row = row;
            this.i = i;
        }

        @Override
        public String type() {
            return row.types[i];
        }

        @Override
        public boolean hasFormula() {
            return false;
        }

        @Override
        public String formula() {
            throw new IllegalStateException("not a formula cell");
        }

        @Override
        public boolean hasValue() {
            return row.values[i] != null;
        }

        @Override
        public String value() {
            return row.values[i];
        }

        /** POI: a "str" cell's value, an inline string's value or else its {@code <is>} text, both decoded as rich text. */
        @Override
        public String text() {
            String v = row.values[i];
            if (type().equals("inlineStr") && v == null) {
                return row.inline[i] == null ? "" : new XSSFRichTextString(row.inline[i]).getString();
            }
            return new XSSFRichTextString(v == null ? "" : v).getString();
        }

        /** POI: style 0 when the cell names none, provided the workbook defines any cell style. */
        @Override
        public CellStyle style() {
            if (styles == null || styles.getNumCellStyles() <= 0) {
                return null;
            }
            int s = row.styleIndexes[i] < 0 ? 0 : row.styleIndexes[i];
            // POI makes a new style object per call; a sheet uses a handful, read-only here.
            return styleCache.computeIfAbsent(s, k -> java.util.Optional.ofNullable(styles.getStyleAt(k))).orElse(null);
        }
    }
}
