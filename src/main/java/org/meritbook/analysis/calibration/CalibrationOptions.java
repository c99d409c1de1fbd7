package org.meritbook.analysis.calibration;

import java.util.List;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.regression.Weighting;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.DataReference;
import org.meritbook.study.OptionValue;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.InternalStandard;

/**
 * A calibration cell's options, checked and typed.
 *
 * @param data      the data reference
 * @param x         column of nominal concentrations (header text or letter)
 * @param ys        columns of responses: one, or replicates side by side ({@code y: [B, C, D]})
 * @param weighting weighting, or auto
 * @param model     the calibration function
 * @param dropCensored whether censored entries are left out (recorded) rather than rejected
 * @param internalStandards internal-standard columns, one per response column (the response is then the ratio), or none
 */
record CalibrationOptions(DataReference data, String x, List<String> ys, WeightingChoice weighting, CalibrationModel model,
                          boolean dropCensored, List<String> internalStandards) {

    static CalibrationOptions of(AnalysisCell cell, AnalysisContext context) {
        DataReference data = cell.dataReference().orElseThrow(); // with the cell's reading options
        String x = cell.options().get("x").text();
        OptionValue yOption = cell.options().get("y");
        List<String> ys = yOption.isScalar() ? List.of(yOption.text())
                : yOption.list().stream().map(OptionValue::text).toList();
        WeightingChoice weighting = cell.option("weighting")
                .map(v -> WeightingChoice.parse(v.text()).orElseThrow(() -> badValue(context, v, "weighting",
                        List.of("none", "1/x", "1/x^2", "1/y", "1/y^2", "1/s^2", "auto"))))
                .orElse(new WeightingChoice(Weighting.NONE));
        CalibrationModel model = cell.option("model")
                .map(v -> CalibrationModel.fromKeyword(v.text())
                        .orElseThrow(() -> badValue(context, v, "model", CalibrationModel.keywords())))
                .orElse(CalibrationModel.LINEAR);
        boolean drop = cell.option("censored").map(v -> v.text().equals("drop")).orElse(false);
        return new CalibrationOptions(data, x, ys, weighting, model, drop, internalStandards(cell, context, ys));
    }

    /** One internal-standard column for one response column; with replicate columns, a list as long as y's. */
    private static List<String> internalStandards(AnalysisCell cell, AnalysisContext context, List<String> ys) {
        if (cell.option(InternalStandard.OPTION).isEmpty()) {
            return List.of();
        }
        OptionValue v = cell.option(InternalStandard.OPTION).orElseThrow();
        List<String> columns = v.isScalar() ? List.of(v.text()) : v.list().stream().map(OptionValue::text).toList();
        if (columns.size() != ys.size()) {
            throw new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(v.line()),
                    "one internal-standard column for each of the " + ys.size() + " response columns of 'y:'",
                    columns.size() + " column" + (columns.size() == 1 ? "" : "s"),
                    "Name the internal-standard column of each response column, in the same order "
                            + "(internal-standard: [E, F, G] for y: [B, C, D]).");
        }
        return columns;
    }

    private static InputException badValue(AnalysisContext context, OptionValue v, String option,
                                           List<String> allowed) {
        return new InputException(ErrorKey.BAD_OPTION_VALUE, context.where(v.line()),
                option + " one of " + String.join(", ", allowed), "'" + v.text() + "'",
                "Write one of the allowed values.");
    }
}
