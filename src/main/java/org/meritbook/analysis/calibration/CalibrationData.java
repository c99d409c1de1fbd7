package org.meritbook.analysis.calibration;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.Exclusion;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.meritbook.workbook.NumericColumn;

/**
 * The calibration standards of one cell: every row of the block, with exclusions applied (a row
 * is excluded when its x or y cell is), numbers checked, and units taken from the headers.
 */
record CalibrationData(DataBlock block, Column xColumn, Column yColumn, List<CalibrationPoint> points) {

    CalibrationData {
        points = List.copyOf(points);
    }

    String xUnit() {
        return xColumn.unit();
    }

    String yUnit() {
        return yColumn.unit();
    }

    List<CalibrationPoint> used() {
        return points.stream().filter(CalibrationPoint::used).toList();
    }

    double[] usedX() {
        return used().stream().mapToDouble(CalibrationPoint::x).toArray();
    }

    double[] usedY() {
        return used().stream().mapToDouble(CalibrationPoint::y).toArray();
    }

    static CalibrationData read(AnalysisCell cell, CalibrationOptions options, AnalysisContext context) {
        DataBlock block = context.data().block(options.data());
        Column xColumn = column(block, options.x(), cell.lineOf("x"), context);
        Column yColumn = column(block, options.y(), cell.lineOf("y"), context);
        Map<CellRef, String> reasons = exclusionReasons(cell, block, xColumn, yColumn, context);
        if (options.dropCensored()) {
            addCensored(xColumn, reasons);
            addCensored(yColumn, reasons);
        }
        int rows = block.rowCount();
        String[] rowReason = new String[rows];
        for (int i = 0; i < rows; i++) {
            String rx = reasons.get(xColumn.values().get(i).ref());
            String ry = reasons.get(yColumn.values().get(i).ref());
            rowReason[i] = rx != null ? rx : ry != null ? ry : block.leftOut().get(i); // the reader's, e.g. hidden: leave-out
        }
        double[][] xy = numbers(block.file(), xColumn, yColumn, rowReason);
        List<CalibrationPoint> points = new ArrayList<>(rows);
        for (int i = 0; i < rows; i++) {
            CellValue xc = xColumn.values().get(i);
            CellValue yc = yColumn.values().get(i);
            // Excluded points keep their values when numeric, so the table and figures can show them.
            double x = xc.isNumber() ? xc.number() : xy[0][i];
            double y = yc.isNumber() ? yc.number() : xy[1][i];
            points.add(new CalibrationPoint(yc.ref().a1(), xc, yc, x, y, rowReason[i]));
        }
        return new CalibrationData(block, xColumn, yColumn, points);
    }

    /** Reads both columns, reporting the bad cells of both in one error. */
    private static double[][] numbers(Path file, Column x, Column y, String[] rowReason) {
        List<Problem> problems = new ArrayList<>();
        double[][] out = new double[2][];
        Column[] columns = {x, y};
        for (int c = 0; c < 2; c++) {
            Column column = columns[c];
            Map<CellRef, Integer> rowOf = new HashMap<>();
            for (int i = 0; i < column.values().size(); i++) {
                rowOf.put(column.values().get(i).ref(), i);
            }
            try {
                out[c] = NumericColumn.values(file, column, ref -> rowReason[rowOf.get(ref)] != null);
            } catch (InputException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return out;
    }

    private static Column column(DataBlock block, String wanted, int line, AnalysisContext context) {
        return block.column(wanted).orElseThrow(() -> new InputException(ErrorKey.MISSING_COLUMN,
                context.where(line),
                "a column headed '" + wanted + "' (or a column letter) in " + block.sheet() + "!" + block.range(),
                "the columns " + quoted(block),
                "Name one of these columns by its header text or its letter."));
    }

    private static String quoted(DataBlock block) {
        List<String> names = new ArrayList<>();
        for (Column c : block.columns()) {
            names.add("'" + c.header() + "' (" + c.letter() + ")");
        }
        return String.join(", ", names);
    }

    private static Map<CellRef, String> exclusionReasons(AnalysisCell cell, DataBlock block, Column x, Column y,
                                                         AnalysisContext context) {
        Map<String, CellRef> byAddress = new HashMap<>();
        for (Column c : List.of(x, y)) {
            for (CellValue v : c.values()) {
                byAddress.put(v.ref().address(), v.ref());
            }
        }
        Map<CellRef, String> reasons = new HashMap<>();
        List<Problem> problems = new ArrayList<>();
        for (Exclusion e : cell.exclusions()) {
            CellRef ref = byAddress.get(e.address());
            if (ref == null) {
                problems.add(new Problem(ErrorKey.BAD_OPTION_VALUE, context.where(e.line()),
                        "an excluded cell among the x or y values of " + block.sheet() + "!" + block.range()
                                + " (columns " + x.letter() + " and " + y.letter() + ")",
                        "exclude: " + e.address(),
                        "Name the concentration or response cell of the point to leave out."));
            } else {
                reasons.put(ref, e.reason());
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        return reasons;
    }

    private static void addCensored(Column column, Map<CellRef, String> reasons) {
        for (CellValue v : column.values()) {
            if (v.kind() == CellValue.Kind.CENSORED) {
                reasons.putIfAbsent(v.ref(), "censored result '" + v.raw() + "' left out (censored: drop)");
            }
        }
    }
}
