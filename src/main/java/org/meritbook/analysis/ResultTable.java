package org.meritbook.analysis;

import java.util.List;
import java.util.Objects;

/**
 * A table of results a section shows after its data table: an ANOVA, a per-level summary, outlier
 * tests, a comparison of methods. It holds no number of its own: every value is a quantity or a step
 * this section has already recorded, so the dossier formats it by its kind and links it to the trail.
 *
 * @param title   what the table shows, e.g. "One-way ANOVA by day"
 * @param columns column headers, each with its unit
 * @param rows    the rows, one cell per column
 * @param note    a line below the table (what a mark means, how a value was set), or empty
 */
public record ResultTable(String title, List<Column> columns, List<List<Cell>> rows, String note) {
    public ResultTable {
        Objects.requireNonNull(title, "title");
        columns = List.copyOf(columns);
        rows = rows.stream().map(List::copyOf).toList();
        note = note == null ? "" : note;
        for (List<Cell> row : rows) {
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException("table '" + title + "': a row has " + row.size() + " cells for "
                        + columns.size() + " columns");
            }
        }
    }

    public ResultTable(String title, List<Column> columns, List<List<Cell>> rows) {
        this(title, columns, rows, "");
    }

    /**
     * @param name the header
     * @param unit the unit of its numbers, or null
     */
    public record Column(String name, String unit) {
        public static Column of(String name) {
            return new Column(name, null);
        }
    }

    /** What a cell shows. */
    public enum Show {
        /** Text as given (a row label, a method's name, "outlier"). */
        TEXT,
        /** A quantity's value, rounded as the quantity is (its kind, its interval). */
        QUANTITY,
        /** A quantity's confidence interval, by its limits. */
        INTERVAL,
        /** A value of a trail step, with the kind given here. */
        STEP
    }

    /**
     * One cell.
     *
     * @param show  what it shows
     * @param text  the text of a {@link Show#TEXT} cell, else null
     * @param ref   the quantity name ({@link Show#QUANTITY}, {@link Show#INTERVAL}) or step id ({@link Show#STEP})
     * @param kind  the kind of number of a {@link Show#STEP} cell, else null
     * @param value the value of a {@link Show#STEP} cell that is an input of that step (a df), else NaN
     *              (the step's own value)
     */
    public record Cell(Show show, String text, String ref, NumberKind kind, double value) {
        public Cell {
            Objects.requireNonNull(show, "show");
            if (show == Show.TEXT ? text == null : ref == null) {
                throw new IllegalArgumentException("a " + show + " cell needs its " + (show == Show.TEXT ? "text" : "reference"));
            }
            if (show == Show.STEP && kind == null) {
                throw new IllegalArgumentException("a step cell needs its kind of number");
            }
        }

        public static Cell text(String text) {
            return new Cell(Show.TEXT, text, null, null, Double.NaN);
        }

        public static Cell empty() {
            return text("");
        }

        public static Cell quantity(String name) {
            return new Cell(Show.QUANTITY, null, name, null, Double.NaN);
        }

        public static Cell interval(String name) {
            return new Cell(Show.INTERVAL, null, name, null, Double.NaN);
        }

        /** The value of trail step {@code stepId}. */
        public static Cell step(String stepId, NumberKind kind) {
            return new Cell(Show.STEP, null, stepId, kind, Double.NaN);
        }

        /** A value that step {@code stepId} shows among its inputs (degrees of freedom, a critical value). */
        public static Cell inputOf(String stepId, double value, NumberKind kind) {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException("cell value is not finite: " + value);
            }
            return new Cell(Show.STEP, null, stepId, kind, value);
        }

        /** Whether the cell carries its own value rather than its step's. */
        public boolean ownValue() {
            return !Double.isNaN(value);
        }
    }
}
