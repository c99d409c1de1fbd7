package org.meritbook.analysis.calibration;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.InternalStandard;
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
 * The calibration standards of one cell: every row of the block, with exclusions applied (a point
 * is excluded when its x or y cell is), numbers checked, and units taken from the headers. With
 * several response columns ({@code y: [B, C, D]}, replicates side by side, one row per level)
 * each response cell is a point of its own, keeping its own cell address. With
 * {@code internal-standard:} each point's response is the ratio of its response cell to the
 * internal-standard cell of its row (one internal-standard column per response column).
 *
 * @param yColumns  the response columns, one or more
 * @param isColumns the internal-standard columns, one per response column, or none
 */
record CalibrationData(DataBlock block, Column xColumn, List<Column> yColumns, List<CalibrationPoint> points,
                       List<Column> isColumns) {

    CalibrationData {
        yColumns = List.copyOf(yColumns);
        points = List.copyOf(points);
        isColumns = List.copyOf(isColumns);
    }

    /** Whether the response is the ratio to an internal standard. */
    boolean ratio() {
        return !isColumns.isEmpty();
    }

    /** What the response is called on axes and in the equation: "Peak area" or "Peak area / IS area". */
    String responseName() {
        return ratio() ? yColumn().name() + " / " + isColumns.get(0).name() : yColumn().name();
    }

    /** The first response column: its name and unit stand for all of them. */
    Column yColumn() {
        return yColumns.get(0);
    }

    boolean replicateColumns() {
        return yColumns.size() > 1;
    }

    String xUnit() {
        return xColumn.unit();
    }

    /** The response's unit: the response column's, or the ratio's ({@link InternalStandard#unit}). */
    String yUnit() {
        return ratio() ? InternalStandard.unit(yColumn().unit(), isColumns.get(0).unit()) : yColumn().unit();
    }

    List<CalibrationPoint> used() {
        return points.stream().filter(CalibrationPoint::used).toList();
    }

    /** The lowest concentration above zero among all the standards, excluded ones included; NaN when none. */
    double lowestPlannedAboveZero() {
        return points.stream().mapToDouble(CalibrationPoint::x).filter(x -> Double.isFinite(x) && x > 0).min()
                .orElse(Double.NaN);
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
        List<Column> yColumns = new ArrayList<>();
        for (String y : options.ys()) {
            yColumns.add(column(block, y, cell.lineOf("y"), context));
        }
        List<Column> isColumns = new ArrayList<>();
        for (String is : options.internalStandards()) {
            isColumns.add(column(block, is, cell.lineOf(InternalStandard.OPTION), context));
        }
        List<Column> all = new ArrayList<>(List.of(xColumn));
        all.addAll(yColumns);
        List<Column> excludable = new ArrayList<>(all);
        excludable.addAll(isColumns);
        Map<CellRef, String> reasons = exclusionReasons(cell, block, excludable, context);
        if (options.dropCensored()) {
            all.forEach(c -> addCensored(c, reasons)); // a censored internal standard gives no ratio: always an error
        }
        int rows = block.rowCount();
        // A point is out when its x or its own y cell is; an x cell's reason takes every response of its row.
        String[][] pointReason = new String[yColumns.size()][rows];
        for (int k = 0; k < yColumns.size(); k++) {
            for (int i = 0; i < rows; i++) {
                String rx = reasons.get(xColumn.values().get(i).ref());
                String ry = reasons.get(yColumns.get(k).values().get(i).ref());
                if (ry == null && !isColumns.isEmpty()) {
                    ry = reasons.get(isColumns.get(k).values().get(i).ref());
                }
                pointReason[k][i] = rx != null ? rx : ry != null ? ry : block.leftOut().get(i); // the reader's, e.g. hidden: leave-out
            }
        }
        String[] xReason = new String[rows];
        for (int i = 0; i < rows; i++) {
            boolean allOut = true;
            for (int k = 0; k < yColumns.size(); k++) {
                allOut &= pointReason[k][i] != null;
            }
            xReason[i] = allOut ? pointReason[0][i] : null; // x is needed while any response of its row is used
        }
        List<Problem> problems = new ArrayList<>();
        double[] xs = numbers(block.file(), xColumn, xReason, problems);
        double[][] ys = new double[yColumns.size()][];
        for (int k = 0; k < yColumns.size(); k++) {
            ys[k] = numbers(block.file(), yColumns.get(k), pointReason[k], problems);
            if (!isColumns.isEmpty()) {
                List<CellValue> usedIs = new ArrayList<>();
                for (int i = 0; i < rows; i++) {
                    if (pointReason[k][i] == null) {
                        usedIs.add(isColumns.get(k).values().get(i));
                    }
                }
                problems.addAll(InternalStandard.problems(block.file(), isColumns.get(k), usedIs,
                        context.where(cell.lineOf(InternalStandard.OPTION))));
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        List<CalibrationPoint> points = new ArrayList<>(rows * yColumns.size());
        for (int i = 0; i < rows; i++) {
            CellValue xc = xColumn.values().get(i);
            for (int k = 0; k < yColumns.size(); k++) {
                CellValue yc = yColumns.get(k).values().get(i);
                // Excluded points keep their values when numeric, so the table and figures can show them.
                double x = xc.isNumber() ? xc.number() : xs[i];
                double y = yc.isNumber() ? yc.number() : ys[k][i];
                CellValue is = isColumns.isEmpty() ? null : isColumns.get(k).values().get(i);
                if (is != null) {
                    // An excluded point keeps its ratio when both cells allow one, else NaN (not shown as a number).
                    y = InternalStandard.problem(block.file(), isColumns.get(k), is, "").isEmpty() ? y / is.number()
                            : Double.NaN;
                }
                points.add(new CalibrationPoint(yc.ref().a1(), i, xc, yc, x, y, pointReason[k][i], is));
            }
        }
        return new CalibrationData(block, xColumn, yColumns, points, isColumns);
    }

    /** One column's numbers, NaN where its cell is left out; bad cells are added to {@code problems}. */
    private static double[] numbers(Path file, Column column, String[] rowReason, List<Problem> problems) {
        try {
            return NumericColumn.valuesSkipping(file, column, i -> rowReason[i] != null);
        } catch (InputException e) {
            problems.addAll(e.problems()); // every column's bad cells are reported together
            return new double[column.values().size()];
        }
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

    private static Map<CellRef, String> exclusionReasons(AnalysisCell cell, DataBlock block, List<Column> columns,
                                                         AnalysisContext context) {
        Map<String, CellRef> byAddress = new HashMap<>();
        for (Column c : columns) {
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
                                + " (columns " + String.join(", ", columns.stream().map(Column::letter).toList()) + ")",
                        "exclude: " + e.address(),
                        "Name the concentration or response cell of the point to leave out."));
            } else {
                reasons.put(ref, e.shownReason());
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
