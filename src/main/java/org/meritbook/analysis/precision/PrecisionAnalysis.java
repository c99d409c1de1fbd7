package org.meritbook.analysis.precision;

import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
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
        section.setting("Levels", data.levelled()
                ? "'" + data.levelColumn().header() + "' (column " + data.levelColumn().letter() + "): "
                        + String.join(", ", data.levels().stream().map(PrecisionData.Level::label).toList())
                : "one level (all results)");
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
        PrecisionFigures.addTo(section, cell.id(), data);
        return section.build(PrecisionTable.of(data));
    }
}
