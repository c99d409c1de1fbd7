package org.meritbook.analysis.precision;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.TableCell;
import org.meritbook.workbook.CellValue;

/** The precision data table: level, group and result of every row read, excluded rows marked. */
final class PrecisionTable {
    private PrecisionTable() {
    }

    static DataTable of(PrecisionData data) {
        List<Integer> order = new ArrayList<>();
        List<String> headers = new ArrayList<>();
        int columns = data.rows().columns().size();
        if (data.levelled()) {
            order.add(columns - 1);
            headers.add(data.levelColumn().header());
        }
        if (data.grouped()) {
            order.add(1);
            headers.add(data.groupColumn().header());
        }
        order.add(0);
        headers.add(data.valueColumn().header());
        List<DataTable.Row> rows = new ArrayList<>();
        for (MeasuredRows.Row row : data.rows().rows()) {
            List<TableCell> cells = new ArrayList<>();
            for (int c : order) {
                CellValue v = row.cell(c);
                cells.add(TableCell.raw(v.raw(), v.ref().address()));
            }
            rows.add(new DataTable.Row(row.cell(0).ref().a1(), cells, row.exclusionReason()));
        }
        return new DataTable(headers, rows);
    }
}
