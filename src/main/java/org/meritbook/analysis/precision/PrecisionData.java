package org.meritbook.analysis.precision;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.MeasuredRows.Request;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.error.Problem;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.OptionValue;
import org.meritbook.workbook.Column;

/**
 * The rows of a precision cell split by level and, within a level, by group, both in order of first
 * appearance. Excluded rows stay in {@link #rows()} (for the table and figure) and out of every level.
 *
 * @param rows        every row as read: value first, then group, then level when named
 * @param valueColumn the value column
 * @param groupColumn the grouping column, or null without {@code group:}
 * @param levelColumn the level column, or null without {@code level:}
 * @param levels      the used rows by level (one level named "" without {@code level:})
 */
record PrecisionData(MeasuredRows rows, Column valueColumn, Column groupColumn, Column levelColumn,
                     List<Level> levels) {

    PrecisionData {
        levels = List.copyOf(levels);
    }

    /**
     * The used results of one level.
     *
     * @param label  the level as the workbook shows it ("" when there is no level column)
     * @param groups the used rows by group label (one group "" without {@code group:})
     */
    record Level(String label, Map<String, List<MeasuredRows.Row>> groups) {
        Level {
            Map<String, List<MeasuredRows.Row>> copy = new LinkedHashMap<>();
            groups.forEach((k, v) -> copy.put(k, List.copyOf(v)));
            groups = java.util.Collections.unmodifiableMap(copy);
        }

        /** Every used row of the level, group after group. */
        List<MeasuredRows.Row> rows() {
            List<MeasuredRows.Row> all = new ArrayList<>();
            groups.values().forEach(all::addAll);
            return all;
        }

        double[] values() {
            return rows().stream().mapToDouble(r -> r.number(0)).toArray();
        }

        /** The values of each group, in group order. */
        List<double[]> groupValues() {
            return groups.values().stream().map(g -> g.stream().mapToDouble(r -> r.number(0)).toArray()).toList();
        }
    }

    boolean grouped() {
        return groupColumn != null;
    }

    boolean levelled() {
        return levelColumn != null;
    }

    /** The unit of the results, from the value column's header, or null. */
    String unit() {
        return valueColumn.unit();
    }

    static PrecisionData read(AnalysisCell cell, AnalysisContext context) {
        List<Request> requests = new ArrayList<>();
        requests.add(Request.number("value", text(cell, "value")));
        String group = cell.option("group").map(OptionValue::text).orElse(null);
        String level = cell.option("level").map(OptionValue::text).orElse(null);
        if (group != null) {
            requests.add(Request.label("group", group));
        }
        if (level != null) {
            requests.add(Request.label("level", level));
        }
        MeasuredRows rows = MeasuredRows.read(cell, context, "data", requests);
        MeasuredRows.requireAllClaimed(cell, context, List.of(rows));
        int groupAt = group == null ? -1 : 1;
        int levelAt = level == null ? -1 : requests.size() - 1;
        List<Problem> problems = new ArrayList<>();
        Map<String, Map<String, List<MeasuredRows.Row>>> byLevel = new LinkedHashMap<>();
        for (MeasuredRows.Row row : rows.used()) {
            String levelLabel = label(row, levelAt, rows, "level", context, cell, problems);
            String groupLabel = label(row, groupAt, rows, "group", context, cell, problems);
            if (levelLabel != null && groupLabel != null) {
                byLevel.computeIfAbsent(levelLabel, k -> new LinkedHashMap<>())
                        .computeIfAbsent(groupLabel, k -> new ArrayList<>()).add(row);
            }
        }
        if (!problems.isEmpty()) {
            throw new InputException(problems);
        }
        List<Level> levels = new ArrayList<>();
        byLevel.forEach((label, groups) -> levels.add(new Level(label, groups)));
        List<Column> columns = rows.columns();
        return new PrecisionData(rows, columns.get(0), groupAt < 0 ? null : columns.get(groupAt),
                levelAt < 0 ? null : columns.get(levelAt), levels);
    }

    private static String text(AnalysisCell cell, String option) {
        return cell.option(option).map(OptionValue::text).orElseThrow();
    }

    /** A used row's level or group label; a blank one is a located problem (the row belongs nowhere). */
    private static String label(MeasuredRows.Row row, int column, MeasuredRows rows, String option,
                                AnalysisContext context, AnalysisCell cell, List<Problem> problems) {
        if (column < 0) {
            return "";
        }
        String label = row.label(column);
        if (label.isEmpty()) {
            problems.add(new Problem(ErrorKey.MISSING_LABEL,
                    rows.block().file().getFileName() + ", " + row.cell(column).ref().address(),
                    "a " + option + " label in column '" + rows.columns().get(column).header() + "' ("
                            + context.where(cell.lineOf(option)) + ")",
                    "an empty cell beside the result " + row.cell(0).raw(),
                    "Fill in the " + option + " of this result, or exclude it with a reason."));
            return null;
        }
        return label;
    }
}
