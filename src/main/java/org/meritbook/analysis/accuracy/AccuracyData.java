package org.meritbook.analysis.accuracy;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.MeasuredRows.Request;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.AnalysisCell;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.NumericColumn;

/**
 * The rows of an accuracy cell, checked: every used row has a measured and a known number, the
 * known value is not 0 (a recovery relative to 0 is undefined), a level label when levels come
 * from a column, and under {@code unspiked:} a number or an empty cell (no paired portion).
 *
 * @param rows          every row of the block, used or not, in block order
 * @param levels        the level labels in reporting order
 * @param mode          how the recovery is formed
 * @param measured      the measured column
 * @param known         the known column
 * @param levelColumn   the level column, or null when levels are the known values
 * @param unspiked      the unspiked column, or null
 * @param measuredRows  the rows as the shared reader gave them
 */
record AccuracyData(List<AccuracyRow> rows, List<String> levels, RecoveryMode mode, Column measured, Column known,
                    Column levelColumn, Column unspiked, MeasuredRows measuredRows) {

    AccuracyData {
        rows = List.copyOf(rows);
        levels = List.copyOf(levels);
    }

    List<AccuracyRow> used() {
        return rows.stream().filter(AccuracyRow::used).toList();
    }

    List<AccuracyRow> usedAt(String level) {
        return rows.stream().filter(r -> r.used() && r.level().equals(level)).toList();
    }

    static AccuracyData read(AnalysisCell cell, AnalysisContext context) {
        String levelOption = cell.option("level").map(v -> v.text()).orElse(null);
        String unspikedOption = cell.option("unspiked").map(v -> v.text()).orElse(null);
        List<Request> requests = new ArrayList<>(List.of(
                Request.number("measured", cell.option("measured").orElseThrow().text()),
                Request.number("known", cell.option("known").orElseThrow().text())));
        if (levelOption != null) {
            requests.add(Request.label("level", levelOption));
        }
        if (unspikedOption != null) {
            // Read as a label so that an empty cell can mean "no paired portion"; numbers are checked below.
            requests.add(Request.label("unspiked", unspikedOption));
        }
        MeasuredRows read = MeasuredRows.read(cell, context, "data", requests);
        MeasuredRows.requireAllClaimed(cell, context, List.of(read));
        int levelAt = levelOption == null ? -1 : 2;
        int unspikedAt = unspikedOption == null ? -1 : requests.size() - 1;
        double[] unspiked = unspikedAt < 0 ? null : unspikedNumbers(read, unspikedAt);

        List<Problem> problems = new ArrayList<>();
        List<AccuracyRow> rows = new ArrayList<>();
        for (MeasuredRows.Row r : read.rows()) {
            CellValue m = r.cell(0);
            CellValue k = r.cell(1);
            String level = levelAt >= 0 ? r.label(levelAt) : numberLabel(r.number(1));
            if (r.used() && r.number(1) == 0) {
                problems.add(new Problem(ErrorKey.ZERO_KNOWN_VALUE, where(read, k),
                        "a known value other than 0 in column '" + read.columns().get(1).header()
                                + "' (recovery = measured / known × 100)", "0",
                        "Correct the known value, or exclude the row in the notebook with a reason (exclude: - cell: "
                                + k.ref().address() + ", reason: ...); a blank belongs in a detection-limit cell."));
            }
            if (r.used() && levelAt >= 0 && level.isEmpty()) {
                CellValue l = r.cell(levelAt);
                problems.add(new Problem(ErrorKey.MISSING_LABEL, where(read, l),
                        "a level label in column '" + read.columns().get(levelAt).header() + "'", "an empty cell",
                        "Enter the level, or exclude the row in the notebook with a reason."));
            }
            rows.add(new AccuracyRow(m.ref().address().substring(m.ref().address().lastIndexOf('!') + 1), level, m, k,
                    unspikedAt < 0 ? null : r.cell(unspikedAt), r.number(0), r.number(1),
                    unspiked == null ? Double.NaN : unspiked[r.index()], r.exclusionReason()));
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        List<AccuracyRow> used = rows.stream().filter(AccuracyRow::used).toList();
        if (used.isEmpty()) {
            throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("data")),
                    "at least one result with its known value", "no usable row in " + read.where()
                            + (rows.isEmpty() ? "" : " (" + rows.size() + " excluded)"),
                    "Add results to the range, or reconsider the exclusions.");
        }
        RecoveryMode mode = RecoveryMode.DIRECT;
        if (unspiked != null) {
            long paired = used.stream().filter(AccuracyRow::hasUnspiked).count();
            if (paired == 0) {
                throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("unspiked")),
                        "at least one unspiked result in column '" + read.columns().get(unspikedAt).header() + "'",
                        "only empty cells in the rows used", "Enter the unspiked results, or remove 'unspiked:'.");
            }
            mode = paired == used.size() ? RecoveryMode.PAIRED : RecoveryMode.AVERAGED;
        }
        return new AccuracyData(rows, levels(used, levelAt >= 0), mode, read.columns().get(0), read.columns().get(1),
                levelAt >= 0 ? read.columns().get(levelAt) : null, unspikedAt >= 0 ? read.columns().get(unspikedAt) : null,
                read);
    }

    /** The unspiked numbers of the used rows; NaN for an empty cell or an unused row. Text is an error. */
    private static double[] unspikedNumbers(MeasuredRows read, int column) {
        Column c = read.columns().get(column);
        Set<CellRef> skip = new HashSet<>();
        for (MeasuredRows.Row r : read.rows()) {
            if (!r.used() || r.cell(column).kind() == CellValue.Kind.BLANK) {
                skip.add(r.cell(column).ref());
            }
        }
        return NumericColumn.values(read.block().file(), c, skip::contains);
    }

    /** Levels by first appearance when labelled; by increasing known value when they are the known values. */
    private static List<String> levels(List<AccuracyRow> used, boolean labelled) {
        Map<String, Double> first = new LinkedHashMap<>();
        for (AccuracyRow r : used) {
            first.putIfAbsent(r.level(), r.knownValue());
        }
        List<String> levels = new ArrayList<>(first.keySet());
        if (!labelled) {
            levels.sort((a, b) -> Double.compare(first.get(a), first.get(b)));
        }
        return levels;
    }

    /** A known value as a level name: 5 for 5.0, 0.25 for 0.25 (shortest decimal of the double). */
    static String numberLabel(double v) {
        return Double.isFinite(v) ? new BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString() : "";
    }

    private static String where(MeasuredRows read, CellValue v) {
        return read.block().file().getFileName() + ", " + v.ref().address();
    }
}
