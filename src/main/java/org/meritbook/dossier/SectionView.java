package org.meritbook.dossier;

import java.util.List;
import java.util.function.UnaryOperator;

/**
 * One analysis cell as the dossier shows it, in notebook order.
 *
 * @param number          chapter number, e.g. "2"
 * @param anchor          link target
 * @param id              the cell id
 * @param kind            the analysis kind keyword
 * @param title           the section title
 * @param narrativeBefore the notebook's narrative leading to the cell (may be empty)
 * @param narrativeAfter  narrative following the cell before the next heading (may be empty)
 * @param settings        statistical choices in force
 * @param table           the data table; {@code present} false when the analysis has none
 * @param tables          further tables after it (ANOVA, per-level summaries, outlier tests)
 * @param figures         figures in order
 * @param results         results other than those already shown in the table
 * @param verdicts        acceptance verdicts
 * @param warnings        warnings in plain language
 * @param available       false when the cell produced no result at all
 */
public record SectionView(String number, String anchor, String id, String kind, String title, Markup narrativeBefore,
                          Markup narrativeAfter, List<SettingRow> settings, TableView table,
                          List<ResultTableView> tables, List<FigureView> figures, List<ResultRow> results, List<VerdictRow> verdicts,
                          List<String> warnings, boolean available) {
    public SectionView {
        settings = List.copyOf(settings);
        tables = List.copyOf(tables);
        figures = List.copyOf(figures);
        results = List.copyOf(results);
        verdicts = List.copyOf(verdicts);
        warnings = List.copyOf(warnings);
    }

    /** The same section with each figure's markup passed through {@code art} (placeholder to drawing). */
    SectionView withFigureMarkup(UnaryOperator<Markup> art) {
        List<FigureView> drawn = figures.stream()
                .map(f -> new FigureView(f.number(), f.anchor(), f.caption(), art.apply(f.svg()))).toList();
        return new SectionView(number, anchor, id, kind, title, narrativeBefore, narrativeAfter, settings, table, tables,
                drawn, results, verdicts, warnings, available);
    }

    public record SettingRow(String label, String value) {
    }

    /**
     * A data table. When every raw column holds one sheet column and every row one sheet row, a value's
     * cell is told by its column's letter and its row's number ({@code compact}); otherwise each value
     * carries its own address.
     *
     * @param present    false when the section has no data table
     * @param caption    e.g. "Table 2.1 Data as read from Calibration!A9:F31 …"
     * @param headers    column headers as in the workbook (without the row and point columns)
     * @param columns    the same columns with their sheet letter or "computed" note
     * @param rowNumbers true when the first column shows sheet row numbers
     * @param labels     true when a column shows the rows' point labels
     * @param rows       the rows; excluded rows stay, marked
     * @param exclusions the reasons, keyed by their mark
     * @param omitted    the rows a summarised table leaves out ({@link Omission#NONE} for a table printed whole)
     */
    public record TableView(boolean present, String caption, List<String> headers, List<ColumnView> columns,
                            boolean rowNumbers, boolean labels, List<TableRow> rows, List<Exclusion> exclusions,
                            Omission omitted) {
        public TableView {
            headers = List.copyOf(headers);
            columns = List.copyOf(columns);
            rows = List.copyOf(rows);
            exclusions = List.copyOf(exclusions);
            java.util.Objects.requireNonNull(omitted, "omitted");
        }

        /** A table printed whole. */
        public TableView(boolean present, String caption, List<String> headers, List<ColumnView> columns,
                         boolean rowNumbers, boolean labels, List<TableRow> rows, List<Exclusion> exclusions) {
            this(present, caption, headers, columns, rowNumbers, labels, rows, exclusions, Omission.NONE);
        }

        static TableView none() {
            return new TableView(false, "", List.of(), List.of(), false, false, List.of(), List.of());
        }
    }

    /**
     * The rows a summarised data table leaves out, shown as one line across the table.
     *
     * @param after   the number of printed rows before the line (0 when nothing is left out)
     * @param text    what the line says, e.g. "99,980 rows not printed (sheet rows 14 to 99,993) …"
     * @param columns how many table columns the line spans
     */
    public record Omission(int after, String text, int columns) {
        static final Omission NONE = new Omission(0, "", 1);

        public boolean present() {
            return !text.isEmpty();
        }
    }

    /**
     * @param header   the header as in the workbook (with unit)
     * @param name     the header without a trailing unit in parentheses
     * @param unit     that unit with its parentheses, e.g. "(mg/L)", or empty
     * @param note     the sheet column letter ("C"), "computed", or empty
     * @param computed true for a column of computed values
     * @param text     true for a column of free text (it may wrap and takes the spare width)
     * @param shortName  true when the name is short enough to keep on one line
     */
    public record ColumnView(String header, String name, String unit, String note, boolean computed, boolean text,
                             boolean shortName) {
    }

    /**
     * @param label    the point's label
     * @param sheetRow the sheet row number, or empty when the table is not one row per sheet row
     * @param mark     the exclusion mark ("E1"), or empty for a row used in the statistics
     */
    public record TableRow(String label, String sheetRow, List<CellView> cells, boolean excluded, String mark) {
        public TableRow {
            cells = List.copyOf(cells);
        }
    }

    /**
     * @param address     the workbook cell, or empty for a computed value
     * @param showAddress true when the address must be printed with the value (no column letter and row tell it)
     * @param tooltip     the cell address, or for a computed value its trail step
     * @param stepAnchor  link to the trail step of a computed value, or empty
     */
    public record CellView(String text, String address, boolean computed, boolean showAddress, String tooltip,
                           String stepAnchor) {
    }

    /**
     * A table of results, numbered after the data table.
     *
     * @param anchor  link target
     * @param caption e.g. "Table 4.2 One-way ANOVA by day"
     * @param columns the headers with their units
     * @param rows    the rows
     * @param note    a line below the table, or empty
     * @param wide    true when the table has many columns (a smaller font keeps it within the page)
     */
    public record ResultTableView(String anchor, String caption, List<ResultColumn> columns,
                                  List<List<ResultCell>> rows, String note, boolean wide) {
        public ResultTableView {
            columns = List.copyOf(columns);
            rows = rows.stream().map(List::copyOf).toList();
        }
    }

    /**
     * @param name    the header
     * @param unit    the unit in parentheses, e.g. "(mg/L)", or empty
     * @param numeric true when the column holds numbers (aligned right)
     */
    public record ResultColumn(String name, String unit, boolean numeric) {
    }

    /**
     * @param text       the formatted value or the text
     * @param numeric    true for a number
     * @param tooltip    the trail step of a number, or empty
     * @param stepAnchor link to that step, or empty
     */
    public record ResultCell(String text, boolean numeric, String tooltip, String stepAnchor) {
    }

    public record Exclusion(String mark, String row, String reason) {
    }

    public record FigureView(String number, String anchor, String caption, Markup svg) {
    }

    /**
     * @param label       plain-language label
     * @param name        results.json name
     * @param value       value with unit
     * @param uncertainty interval line or empty
     * @param stepNumber  trail step number, e.g. "A.1.2"
     * @param stepAnchor  link to the trail step
     */
    public record ResultRow(String label, String name, String value, String uncertainty, String stepNumber,
                            String stepAnchor) {
    }

    public record VerdictRow(String characteristic, String rule, DossierView.VerdictView verdict) {
    }
}
