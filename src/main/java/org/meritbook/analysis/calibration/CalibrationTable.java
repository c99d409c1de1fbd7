package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;
import org.meritbook.workbook.Column;

/** The calibration data table: every column of the block as read, then x̂ and % deviation. */
final class CalibrationTable {
    private CalibrationTable() {
    }

    static DataTable of(CalibrationData data, Predicate<String> hasQuantity) {
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
            cells.add(computedOrBlank("back_calculated:" + p.label(), hasQuantity));
            cells.add(computedOrBlank("deviation_percent:" + p.label(), hasQuantity));
            rows.add(new DataTable.Row(p.label(), cells, p.exclusionReason()));
        }
        return new DataTable(headers, rows);
    }

    /** A value the analysis could not compute (no numbers, nominal 0, no root) stays blank. */
    private static TableCell computedOrBlank(String quantity, Predicate<String> hasQuantity) {
        return hasQuantity.test(quantity) ? TableCell.computed(quantity) : TableCell.raw("", null);
    }
}
