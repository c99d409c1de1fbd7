package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.descriptive.Moments;
import org.meritbook.trail.StepInput;

/**
 * The recovery of every row, each a quantity {@code row_recovery_percent:<row>} with its step:
 * R = m / k × 100, or (m − u) / k × 100 with the row's own unspiked result, or (m − ū) / k × 100
 * with the mean of the unspiked results. Excluded rows are computed too when their numbers allow
 * (shown in the table, marked), but enter no statistic.
 */
final class RowRecoveries {
    /** A row's recovery: its value and the step that computed it. */
    record Recovery(AccuracyRow row, double value, String stepId) {
    }

    private final Map<AccuracyRow, Recovery> byRow = new LinkedHashMap<>();

    private RowRecoveries() {
    }

    static RowRecoveries record(SectionBuilder section, AccuracyData data, ReadBack readBack) {
        RowRecoveries out = new RowRecoveries();
        String unit = readBack != null ? readBack.line().xUnit() : data.measured().unit();
        Map<AccuracyRow, StepInput> measured = new LinkedHashMap<>();
        Map<AccuracyRow, StepInput> unspiked = new LinkedHashMap<>();
        for (AccuracyRow r : data.rows()) {
            if (!Double.isFinite(r.measuredValue())) {
                continue;
            }
            StepInput signal = StepInput.number(readBack != null ? "y" : "m", r.measuredValue(),
                    data.measured().unit(), r.measured().ref().address());
            measured.put(r, readBack == null ? signal
                    : section.ref("m", readBack.recordQuantity(section, r.label(), "Result " + r.label(), signal)));
            if (r.hasUnspiked()) {
                StepInput u = StepInput.number(readBack != null ? "y" : "u", r.unspikedValue(), data.unspiked().unit(),
                        r.unspiked().ref().address());
                unspiked.put(r, readBack == null ? u : section.ref("u", readBack.recordStep(section,
                        "unspiked:" + r.label(), "Unspiked result beside " + r.label(), u)));
            }
        }
        StepInput mean = data.mode() == RecoveryMode.AVERAGED ? unspikedMean(section, data, unspiked, unit) : null;
        for (AccuracyRow r : data.rows()) {
            StepInput m = measured.get(r);
            StepInput u = data.mode() == RecoveryMode.PAIRED ? unspiked.get(r) : mean;
            if (m == null || !Double.isFinite(r.knownValue()) || r.knownValue() == 0
                    || (data.mode() != RecoveryMode.DIRECT && u == null)) {
                continue; // an excluded row without the numbers for a recovery stays blank in the table
            }
            StepInput k = StepInput.number(data.mode() == RecoveryMode.DIRECT ? "k" : "added", r.knownValue(),
                    data.known().unit(), r.known().ref().address());
            double value;
            String formula;
            List<StepInput> inputs;
            if (data.mode() == RecoveryMode.DIRECT) {
                value = m.value() / k.value() * 100;
                formula = "R = m / k × 100";
                inputs = List.of(m, k);
            } else {
                value = (m.value() - u.value()) / k.value() * 100;
                formula = data.mode() == RecoveryMode.PAIRED ? "R = (m − u) / added × 100"
                        : "R = (m − ū) / added × 100";
                inputs = List.of(m, data.mode() == RecoveryMode.PAIRED ? u
                        : StepInput.number("ū", u.value(), u.unit(), u.source()), k);
            }
            String label = "Recovery of " + r.label() + " (" + r.level() + ")"
                    + (r.used() ? "" : " — excluded, not in the statistics");
            String id = section.quantity(QuantityDraft.of("row_recovery_percent:" + r.label(), label, formula,
                    inputs, value, "%"));
            out.byRow.put(r, new Recovery(r, value, id));
        }
        return out;
    }

    /** ū = Σu / n over the used rows that have an unspiked result. */
    private static StepInput unspikedMean(SectionBuilder section, AccuracyData data, Map<AccuracyRow, StepInput> unspiked,
                                          String unit) {
        List<StepInput> inputs = new ArrayList<>();
        for (Map.Entry<AccuracyRow, StepInput> e : unspiked.entrySet()) {
            if (e.getKey().used()) {
                inputs.add(e.getValue());
            }
        }
        double mean = Moments.mean(inputs.stream().mapToDouble(StepInput::value).toArray());
        String id = section.step("unspiked_mean", "Mean of the unspiked results (" + inputs.size() + " of "
                        + data.used().size() + " rows have one)", "ū = Σu / n", inputs, mean, unit,
                null);
        return section.ref("ū", id);
    }

    Recovery of(AccuracyRow row) {
        return byRow.get(row);
    }

    boolean has(AccuracyRow row) {
        return byRow.containsKey(row);
    }

    /** The recoveries of the used rows among these, in row order. */
    List<Recovery> used(List<AccuracyRow> rows) {
        return rows.stream().filter(AccuracyRow::used).map(byRow::get).toList();
    }
}
