package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;

/**
 * The accuracy data table: the columns the cell reads and the block's text columns (sample names,
 * notes), as read, then the read-back value and the recovery. Columns of numbers the cell does not
 * read (a replicate number, a reagent blank kept for the record) stay in the attached workbook
 * only, so that the recovery fits the page beside the values it comes from.
 */
final class AccuracyTable {
    private AccuracyTable() {
    }

    static DataTable of(AccuracyData data, RowRecoveries recoveries, ReadBack readBack, Predicate<String> hasQuantity) {
        List<Column> read = data.measuredRows().columns();
        List<Column> columns = data.measuredRows().block().columns().stream()
                .filter(c -> read.contains(c) || isText(c)).toList();
        List<String> headers = new ArrayList<>();
        for (Column c : columns) {
            headers.add(c.header());
        }
        if (readBack != null) {
            String unit = readBack.line().xUnit();
            headers.add("Read back" + (unit == null ? "" : " (" + unit + ")"));
        }
        headers.add("Recovery (%)");
        List<DataTable.Row> rows = new ArrayList<>();
        for (int i = 0; i < data.rows().size(); i++) {
            AccuracyRow r = data.rows().get(i);
            List<TableCell> cells = new ArrayList<>();
            for (Column c : columns) {
                CellValue v = c.values().get(i);
                cells.add(TableCell.raw(v.raw(), v.ref().address()));
            }
            if (readBack != null) {
                cells.add(computedOrBlank("read_back:" + r.label(), hasQuantity));
            }
            cells.add(recoveries.has(r) ? TableCell.computed("row_recovery_percent:" + r.label())
                    : TableCell.raw("", null));
            rows.add(new DataTable.Row(r.label(), cells, r.exclusionReason()));
        }
        return new DataTable(headers, rows);
    }

    /** A column of words: every filled cell is text (not a number, not a censored result). */
    private static boolean isText(Column c) {
        List<CellValue> filled = c.values().stream().filter(v -> v.kind() != CellValue.Kind.BLANK).toList();
        return !filled.isEmpty() && filled.stream().allMatch(v -> v.kind() == CellValue.Kind.TEXT);
    }

    private static TableCell computedOrBlank(String quantity, Predicate<String> hasQuantity) {
        return hasQuantity.test(quantity) ? TableCell.computed(quantity) : TableCell.raw("", null);
    }
}
