package org.meritbook.analysis.precision;

import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.LloqLevels;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.MassFractions;
import org.meritbook.study.OptionValue;

/**
 * Precision (DESIGN §4): per level, mean, SD with its chi-square interval and %CV of the results;
 * with {@code group:} a one-way ANOVA by run, day or analyst, repeatability and intermediate-precision
 * SDs and RSDs from its variance components (unequal groups, n₀), the Satterthwaite interval of
 * s_I, the ISO 5725-2 limits r and R, and Grubbs' and Cochran's tests, which flag and never remove.
 * Excluded rows stay in the table, marked, and out of every statistic.
 */
public final class PrecisionAnalysis implements Analysis {
    /** Confidence level of every interval this section reports. */
    static final double LEVEL = 0.95;

    @Override
    public SectionResult run(AnalysisCell cell, AnalysisContext context) {
        PrecisionData data = PrecisionData.read(cell, context);
        int used = data.rows().used().size();
        if (used < 2) {
            throw new InputException(ErrorKey.TOO_FEW_POINTS, context.where(cell.lineOf("data")),
                    "at least 2 results in column '" + data.valueColumn().header() + "'",
                    used + " usable result" + (used == 1 ? "" : "s") + " in " + data.rows().where(),
                    "Add the replicate results to the range, or reconsider the exclusions.");
        }
        SectionBuilder section = new SectionBuilder(cell);
        section.setting("Results", "'" + data.valueColumn().header() + "' (column " + data.valueColumn().letter() + ")");
        section.setting("Grouping", data.grouped()
                ? "'" + data.groupColumn().header() + "' (column " + data.groupColumn().letter()
                        + "): one-way ANOVA, repeatability within and intermediate precision across groups"
                : "none: all results of a level are replicates under repeatability conditions");
        List<String> levels = data.levelled() ? data.levels().stream().map(PrecisionData.Level::label).toList() : List.of();
        section.setting("Levels", data.levelled()
                ? "'" + data.levelColumn().header() + "' (column " + data.levelColumn().letter() + "): "
                        + String.join(", ", levels)
                : "one level (all results)");
        LloqLevels.named(cell, context, levels, data.levelled() ? "levels in column '" + data.levelColumn().header() + "'"
                : "levels of a 'level:' column").ifPresent(l -> LloqLevels.record(section, l));
        section.setting("Confidence level", "95 %");
        section.setting("Outlier screening", "Grubbs (single, two-sided) on the results"
                + (data.grouped() ? " and on the group means, Cochran's C on the group variances" : "")
                + "; at 5 % and 1 %; flagged, never removed");
        String horwitz = cell.option("horwitz").map(OptionValue::text).orElse(null);
        if (horwitz != null) {
            section.setting("Horwitz ratio", "on the " + (data.grouped() ? "intermediate-precision RSD" : "RSD of all results")
                    + "; results in " + horwitz + ", as a mass fraction × " + MassFractions.factorText(horwitz));
        }
        for (PrecisionData.Level level : data.levels()) {
            new LevelTrail(section, data, level, horwitz).record();
        }
        if (data.levelled()) {
            levelTable(section, data);
        }
        PrecisionFigures.addTo(section, cell.id(), data);
        return section.build(PrecisionTable.of(data));
    }

    /** One row per level: n, mean, SD, %CV and the SD's interval, as the level's quantities give them. */
    private static void levelTable(SectionBuilder section, PrecisionData data) {
        List<List<ResultTable.Cell>> rows = new ArrayList<>();
        for (PrecisionData.Level level : data.levels()) {
            String l = ":" + level.label();
            if (!section.hasQuantity("sd" + l)) {
                continue; // fewer than 2 results: the level's warning says so
            }
            rows.add(List.of(ResultTable.Cell.text(level.label()), ResultTable.Cell.quantity("n" + l),
                    ResultTable.Cell.quantity("mean" + l), ResultTable.Cell.quantity("sd" + l),
                    section.hasQuantity("cv_percent" + l) ? ResultTable.Cell.quantity("cv_percent" + l)
                            : ResultTable.Cell.text("not evaluable"),
                    ResultTable.Cell.interval("sd" + l)));
        }
        if (rows.isEmpty()) {
            return;
        }
        String unit = data.unit();
        section.tableFirst(new ResultTable("Summary by level", List.of(ResultTable.Column.of("Level"),
                ResultTable.Column.of("n"), new ResultTable.Column("Mean", unit), new ResultTable.Column("SD", unit),
                new ResultTable.Column("%CV", "%"), new ResultTable.Column("95 % CI of the SD", unit)), rows,
                "The SD's interval is the chi-square interval with n − 1 degrees of freedom."));
    }
}
