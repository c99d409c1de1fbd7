package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;

/** The accuracy data table: every column of the block as read, then the read-back value and the recovery. */
final class AccuracyTable {
    private AccuracyTable() {
    }

    static DataTable of(AccuracyData data, RowRecoveries recoveries, ReadBack readBack, Predicate<String> hasQuantity) {
        List<Column> columns = data.measuredRows().block().columns();
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

    private static TableCell computedOrBlank(String quantity, Predicate<String> hasQuantity) {
        return hasQuantity.test(quantity) ? TableCell.computed(quantity) : TableCell.raw("", null);
    }
}
