package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;
import org.meritbook.stats.LineFit;
import org.meritbook.workbook.Column;

/** The calibration data table: every column of the block as read, then x̂ and % deviation. */
final class CalibrationTable {
    private CalibrationTable() {
    }

    static DataTable of(CalibrationData data, LineFit fit) {
        List<String> headers = new ArrayList<>();
        for (Column c : data.block().columns()) {
            headers.add(c.header());
        }
        String xUnit = data.xUnit();
        headers.add("Back-calculated" + (xUnit == null ? "" : " (" + xUnit + ")"));
        headers.add("Deviation (%)");
        List<DataTable.Row> rows = new ArrayList<>();
        for (int i = 0; i < data.points().size(); i++) {
            CalibrationPoint p = data.points().get(i);
            List<TableCell> cells = new ArrayList<>();
            for (Column c : data.block().columns()) {
                var v = c.values().get(i);
                cells.add(TableCell.raw(v.raw(), v.ref().address()));
            }
            boolean computable = Double.isFinite(p.x()) && Double.isFinite(p.y());
            cells.add(computable ? TableCell.computed("back_calculated:" + p.label()) : TableCell.raw("", null));
            cells.add(computable && p.x() != 0 ? TableCell.computed("deviation_percent:" + p.label())
                    : TableCell.raw("", null));
            rows.add(new DataTable.Row(p.label(), cells, p.exclusionReason()));
        }
        return new DataTable(headers, rows);
    }
}
