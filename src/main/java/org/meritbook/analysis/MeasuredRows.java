package org.meritbook.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.DataReference;
import org.meritbook.study.Exclusion;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.meritbook.workbook.NumericColumn;

/**
 * The rows of one data set of a cell (its {@code data:}, or a nested set such as {@code blanks:}),
 * read through named columns the way every kind reads them: the notebook's exclusions (a row is
 * left out when any of its cells is excluded), {@code censored: drop}, and the rows the reader left
 * out ({@code hidden: leave-out}) applied, and every cell of a used row in a numeric column checked
 * to be a number. Every bad cell of every column is reported in one error.
 *
 * @param block   the block as read
 * @param columns the columns asked for, in request order
 * @param rows    every row of the block, used or not
 * @param claimed the notebook exclusions that name a cell of these columns
 */
public record MeasuredRows(DataBlock block, List<Column> columns, List<Row> rows, Set<Exclusion> claimed) {

    public MeasuredRows {
        columns = List.copyOf(columns);
        rows = List.copyOf(rows);
        claimed = Set.copyOf(claimed);
    }

    /**
     * A column to read.
     *
     * @param option  the cell option that names it (for the notebook line of a message)
     * @param wanted  its header text or letter, as written
     * @param numeric whether every used cell must be a number (false for labels: level, group, sample)
     */
    public record Request(String option, String wanted, boolean numeric) {
        public Request {
            Objects.requireNonNull(option, "option");
            Objects.requireNonNull(wanted, "wanted");
        }

        public static Request number(String option, String wanted) {
            return new Request(option, wanted, true);
        }

        public static Request label(String option, String wanted) {
            return new Request(option, wanted, false);
        }
    }

    /**
     * One row of the block.
     *
     * @param index           0-based row within the block
     * @param cells           one cell per requested column
     * @param numbers         one number per requested column; NaN for label columns and left-out cells
     * @param exclusionReason why the row is left out (the notebook's reason, censored, the reader's), or null
     */
    public record Row(int index, List<CellValue> cells, double[] numbers, String exclusionReason) {
        public Row {
            cells = List.copyOf(cells);
            numbers = numbers.clone();
        }

        public boolean used() {
            return exclusionReason == null;
        }

        public double number(int column) {
            return numbers[column];
        }

        /** The label of a label column, as the workbook showed it, stripped. */
        public String label(int column) {
            return cells.get(column).raw().strip();
        }

        public CellValue cell(int column) {
            return cells.get(column);
        }

        @Override
        public double[] numbers() {
            return numbers.clone();
        }
    }

    public List<Row> used() {
        return rows.stream().filter(Row::used).toList();
    }

    /** The numbers of one column over the used rows, in row order. */
    public double[] usedNumbers(int column) {
        return used().stream().mapToDouble(r -> r.number(column)).toArray();
    }

    public String where() {
        return block.sheet() + "!" + block.range();
    }

    /**
     * Reads a data set of the cell.
     *
     * @param cell     the cell
     * @param context  the analysis context
     * @param dataSet  {@code "data"} for the cell's own block, or the name of a nested set
     * @param requests the columns, in the order {@link Row#cells()} gives them
     */
    public static MeasuredRows read(AnalysisCell cell, AnalysisContext context, String dataSet,
                                    List<Request> requests) {
        DataReference reference = ("data".equals(dataSet) ? cell.dataReference() : cell.dataReference(dataSet))
                .orElseThrow(() -> new InputException(ErrorKey.MISSING_OPTION, context.where(cell.lineOf(dataSet)),
                        "a data reference for '" + dataSet + "' (data: source!Sheet!A1:D20)",
                        "none", "Add 'data:' to the '" + dataSet + "' option."));
        DataBlock block = context.data().block(reference);
        int setLine = cell.lineOf(dataSet);
        List<Column> columns = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        for (Request r : requests) {
            int line = "data".equals(dataSet) ? cell.lineOf(r.option()) : setLine;
            block.column(r.wanted()).ifPresentOrElse(columns::add, () -> problems.add(new Problem(
                    ErrorKey.MISSING_COLUMN, context.where(line),
                    "a column headed '" + r.wanted() + "' (or a column letter) in " + block.sheet() + "!"
                            + block.range() + " for " + r.option(),
                    "the columns " + describe(block), "Name one of these columns by its header text or its letter.")));
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        Map<CellRef, String> reasons = new HashMap<>();
        Set<Exclusion> claimed = new HashSet<>();
        if (!cell.exclusions().isEmpty()) { // a large block without exclusions is not indexed by address
            Map<String, CellRef> byAddress = new HashMap<>();
            for (Column c : columns) {
                for (CellValue v : c.values()) {
                    byAddress.put(v.ref().address(), v.ref());
                }
            }
            for (Exclusion e : cell.exclusions()) {
                CellRef ref = byAddress.get(e.address());
                if (ref != null) {
                    reasons.put(ref, e.shownReason());
                    claimed.add(e);
                }
            }
        }
        boolean dropCensored = cell.option("censored").map(v -> v.text().equals("drop")).orElse(false);
        if (dropCensored) {
            for (int c = 0; c < columns.size(); c++) {
                if (requests.get(c).numeric()) {
                    for (CellValue v : columns.get(c).values()) {
                        if (v.kind() == CellValue.Kind.CENSORED) {
                            reasons.putIfAbsent(v.ref(), "censored result '" + v.raw() + "' left out (censored: drop)");
                        }
                    }
                }
            }
        }
        int n = block.rowCount();
        String[] rowReason = new String[n];
        for (int i = 0; i < n; i++) {
            for (Column c : columns) {
                String reason = reasons.get(c.values().get(i).ref());
                if (reason != null && rowReason[i] == null) {
                    rowReason[i] = reason;
                }
            }
            if (rowReason[i] == null) {
                rowReason[i] = block.leftOut().get(i);
            }
        }
        double[][] numbers = new double[columns.size()][];
        for (int c = 0; c < columns.size(); c++) {
            Column column = columns.get(c);
            if (!requests.get(c).numeric()) {
                numbers[c] = new double[n];
                java.util.Arrays.fill(numbers[c], Double.NaN);
                continue;
            }
            try {
                numbers[c] = NumericColumn.valuesSkipping(block.file(), column, i -> rowReason[i] != null);
            } catch (InputException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        List<Row> rows = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            List<CellValue> cells = new ArrayList<>();
            double[] values = new double[columns.size()];
            for (int c = 0; c < columns.size(); c++) {
                CellValue v = columns.get(c).values().get(i);
                cells.add(v);
                // A left-out number keeps its value so tables and figures can still show it.
                values[c] = requests.get(c).numeric() && v.isNumber() ? v.number() : numbers[c][i];
            }
            rows.add(new Row(i, cells, values, rowReason[i]));
        }
        return new MeasuredRows(block, columns, rows, claimed);
    }

    /**
     * Every exclusion of the cell must name a cell one of its data sets read: an exclusion that
     * matches nothing is a located error, never silently ignored.
     */
    public static void requireAllClaimed(AnalysisCell cell, AnalysisContext context, List<MeasuredRows> sets) {
        Set<Exclusion> claimed = new HashSet<>();
        List<String> where = new ArrayList<>();
        for (MeasuredRows s : sets) {
            claimed.addAll(s.claimed());
            where.add(s.where());
        }
        List<Problem> problems = new ArrayList<>();
        for (Exclusion e : cell.exclusions()) {
            if (!claimed.contains(e)) {
                problems.add(new Problem(ErrorKey.BAD_OPTION_VALUE, context.where(e.line()),
                        "an excluded cell among the columns this cell reads (" + String.join(", ", where) + ")",
                        "exclude: " + e.address(), "Name a cell of a column the cell uses."));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
    }

    private static String describe(DataBlock block) {
        List<String> names = new ArrayList<>();
        for (Column c : block.columns()) {
            names.add("'" + c.header() + "' (" + c.letter() + ")");
        }
        return String.join(", ", names);
    }
}
