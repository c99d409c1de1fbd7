package org.meritbook.analysis.detection;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.MeasuredRows.Request;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.OptionValue;
import org.meritbook.trail.StepInput;
import org.meritbook.workbook.CellValue;

/**
 * One nested data set of the cell (blanks, spikes, low-samples, signal, noise): the used values of
 * its {@code column}, their cell addresses, and optionally one more column per row (a batch, a
 * sample, a concentration).
 *
 * @param name      the set's option name
 * @param rows      the rows as read (for exclusions)
 * @param values    the used values of {@code column}, in row order
 * @param addresses their cells ({@code Sheet!C17})
 * @param unit      the unit of {@code column} from its header, or null
 * @param extra     per used row, the text of the extra column, or empty when none was asked
 * @param extraNumbers per used row, the number of the extra column when it is numeric
 * @param censored  rows left out because their value was censored ({@code censored: drop})
 * @param line      the notebook line of the set
 */
record MeasuredSet(String name, MeasuredRows rows, double[] values, List<String> addresses, String unit,
                   List<String> extra, double[] extraNumbers, int censored, int line) {

    /** Reads the set when the cell has it; {@code extraKey} names the key of a second column (or null). */
    static Optional<MeasuredSet> read(AnalysisCell cell, AnalysisContext context, String name, String extraKey,
                                      boolean extraNumeric) {
        Optional<OptionValue> option = cell.option(name);
        if (option.isEmpty()) {
            return Optional.empty();
        }
        var map = option.get().map();
        List<Request> requests = new ArrayList<>();
        requests.add(Request.number(name, map.get("column").text()));
        boolean hasExtra = extraKey != null && map.containsKey(extraKey);
        if (hasExtra) {
            String wanted = map.get(extraKey).text();
            requests.add(extraNumeric ? Request.number(name, wanted) : Request.label(name, wanted));
        }
        MeasuredRows rows = MeasuredRows.read(cell, context, name, requests);
        List<MeasuredRows.Row> used = rows.used();
        double[] values = rows.usedNumbers(0);
        List<String> addresses = used.stream().map(r -> r.cell(0).ref().address()).toList();
        List<String> extra = hasExtra ? used.stream().map(r -> r.label(1)).toList() : List.of();
        double[] extraNumbers = hasExtra && extraNumeric ? rows.usedNumbers(1) : new double[0];
        int censored = (int) rows.rows().stream()
                .filter(r -> !r.used() && r.cell(0).kind() == CellValue.Kind.CENSORED).count();
        return Optional.of(new MeasuredSet(name, rows, values, addresses, rows.columns().get(0).unit(), extra,
                extraNumbers, censored, option.get().line()));
    }

    boolean hasExtra() {
        return !extra.isEmpty();
    }

    /** One trail input per used value, with its cell. */
    List<StepInput> inputs(String symbol) {
        List<StepInput> in = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            in.add(StepInput.number(symbol + "[" + (i + 1) + "]", values[i], unit, addresses.get(i)));
        }
        return in;
    }

    /** The column's name, its header without the unit. */
    String columnName() {
        return rows.columns().get(0).name();
    }

    String where() {
        return rows.where();
    }

    @Override
    public double[] values() {
        return values.clone();
    }
}
