package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.TableCell;
import org.meritbook.workbook.Column;

/**
 * The calibration data table: every column of the block as read, then x̂ and % deviation; with
 * replicate response columns, one row per point: its concentration, its response cell and the
 * column it sits in.
 */
final class CalibrationTable {
    private CalibrationTable() {
    }

    static DataTable of(CalibrationData data, Predicate<String> hasQuantity) {
        if (data.replicateColumns()) {
            return perPoint(data, hasQuantity);
        }
        List<String> headers = new ArrayList<>();
        for (Column c : data.block().columns()) {
            headers.add(c.header());
        }
        String xUnit = data.xUnit();
        headers.add("Back-calculated" + (xUnit == null ? "" : " (" + xUnit + ")"));
        headers.add("Deviation (%)");
        headers.add("Standardized residual");
        headers.add("Studentized residual");
        List<DataTable.Row> rows = new ArrayList<>();
        for (int i = 0; i < data.points().size(); i++) {
            CalibrationPoint p = data.points().get(i);
            List<TableCell> cells = new ArrayList<>();
            for (Column c : data.block().columns()) {
                var v = c.values().get(p.row());
                cells.add(TableCell.raw(v.raw(), v.ref().address()));
            }
            cells.add(computedOrBlank("back_calculated:" + p.label(), hasQuantity));
            cells.add(computedOrBlank("deviation_percent:" + p.label(), hasQuantity));
            cells.add(computedOrBlank("standardized_residual:" + p.label(), hasQuantity));
            cells.add(computedOrBlank("studentized_residual:" + p.label(), hasQuantity));
            rows.add(new DataTable.Row(p.label(), cells, p.exclusionReason()));
        }
        return new DataTable(headers, rows);
    }

    private static DataTable perPoint(CalibrationData data, Predicate<String> hasQuantity) {
        String xUnit = data.xUnit();
        List<String> headers = List.of(data.xColumn().header(), "Response column",
                "Response" + (data.yColumn().unit() == null ? "" : " (" + data.yColumn().unit() + ")"), // the cell as read
                "Back-calculated" + (xUnit == null ? "" : " (" + xUnit + ")"), "Deviation (%)");
        List<DataTable.Row> rows = new ArrayList<>();
        for (CalibrationPoint p : data.points()) {
            rows.add(new DataTable.Row(p.label(), List.of(TableCell.raw(p.xCell().raw(), p.xCell().ref().address()),
                    TableCell.raw(columnHeader(data, p), null), TableCell.raw(p.yCell().raw(), p.yCell().ref().address()),
                    computedOrBlank("back_calculated:" + p.label(), hasQuantity),
                    computedOrBlank("deviation_percent:" + p.label(), hasQuantity)), p.exclusionReason()));
        }
        return new DataTable(headers, rows);
    }

    private static String columnHeader(CalibrationData data, CalibrationPoint p) {
        return data.yColumns().stream().filter(c -> c.values().contains(p.yCell())).findFirst()
                .map(Column::header).orElseThrow();
    }

    /** A value the analysis could not compute (no numbers, nominal 0, no root) stays blank. */
    private static TableCell computedOrBlank(String quantity, Predicate<String> hasQuantity) {
        return hasQuantity.test(quantity) ? TableCell.computed(quantity) : TableCell.raw("", null);
    }
}
