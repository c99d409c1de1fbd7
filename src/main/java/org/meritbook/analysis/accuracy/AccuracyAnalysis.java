package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.meritbook.analysis.Analysis;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.LloqLevels;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionResult;
import org.meritbook.study.AnalysisCell;
import org.meritbook.study.AnalysisKind;

/**
 * Accuracy (DESIGN §4): % recovery R = measured / known × 100 and % error R − 100 per row; with
 * {@code unspiked:} the spike recovery (spiked − unspiked) / added × 100, paired row by row when
 * every spiked row has its unspiked result, else against their mean; with {@code calibration:}
 * measured signals read back first. Per level (the {@code level:} column, else the known value)
 * and over all levels: n, mean recovery with its 95 % t interval, mean error, SD, and the one-sample
 * t test of the mean recovery against 100 %.
 */
public final class AccuracyAnalysis implements Analysis {
    /** Confidence level of every interval this section reports. */
    static final double LEVEL = 0.95;
    /** The recovery of an unbiased method. */
    static final double TARGET = 100.0;
    /** The mean recovery's name: the figure draws the profile's limits on it. */
    static final String RECOVERY = "recovery_percent";
    /** What a table shows for a value the level's data cannot give. */
    private static final String NOT_EVALUABLE = "—";

    @Override
    public SectionResult run(AnalysisCell cell, AnalysisContext context) {
        AccuracyData data = AccuracyData.read(cell, context);
        ReadBack readBack = cell.option("calibration").isPresent() ? ReadBack.of(cell, context) : null;
        SectionBuilder section = new SectionBuilder(cell);
        section.setting("Recovery", data.mode().description(), data.mode().key());
        section.setting("Levels", data.levelColumn() == null
                ? "by known value in column '" + data.known().header() + "'"
                : "by column '" + data.levelColumn().header() + "'");
        LloqLevels.named(cell, context, data.levels(), data.levelColumn() == null
                ? "levels (the known values in column '" + data.known().header() + "')"
                : "levels in column '" + data.levelColumn().header() + "'").ifPresent(l -> LloqLevels.record(section, l));
        if (readBack != null) {
            section.setting("Measured values", "signals read back through calibration '" + readBack.line().cellId()
                    + "', " + readBack.formula() + (data.unspiked() == null ? "" : " (unspiked results too)"));
        }
        section.setting("Confidence level", "95 %");
        section.setting("Bias test", "one-sample t test of the mean recovery against 100 %, two-sided");
        warnOnUnits(section, data, readBack);
        RowRecoveries recoveries = RowRecoveries.record(section, data, readBack);
        for (String level : data.levels()) {
            LevelSummary.record(section, ":" + level, "level " + level, recoveries.used(data.usedAt(level)));
        }
        LevelSummary.record(section, "", "all levels", recoveries.used(data.used()));
        levelTable(section, data.levels());
        AccuracyFigures.addTo(section, cell.id(), data, recoveries,
                context.bands().on(AnalysisKind.ACCURACY, null, RECOVERY));
        return section.build(AccuracyTable.of(data, recoveries, readBack, section::hasQuantity));
    }

    /** One row per level and one for all levels, every value a quantity the level summaries recorded. */
    private static void levelTable(SectionBuilder section, List<String> levels) {
        List<List<ResultTable.Cell>> rows = new ArrayList<>();
        for (String level : levels) {
            rows.add(levelRow(section, level, ":" + level));
        }
        rows.add(levelRow(section, "All levels", ""));
        String none = NOT_EVALUABLE;
        boolean dashes = rows.stream().flatMap(List::stream).anyMatch(c -> none.equals(c.text()));
        section.table(new ResultTable("Recovery by level", List.of(ResultTable.Column.of("Level"),
                ResultTable.Column.of("n"), new ResultTable.Column("Mean recovery", "%"), new ResultTable.Column("SD", "%"),
                new ResultTable.Column("95 % CI of the mean", "%"), new ResultTable.Column("Mean error", "%")), rows,
                dashes ? none + " not evaluable: one result, or all recoveries equal (see the warnings)." : ""));
    }

    private static List<ResultTable.Cell> levelRow(SectionBuilder section, String label, String suffix) {
        ResultTable.Cell none = ResultTable.Cell.text(NOT_EVALUABLE);
        return List.of(ResultTable.Cell.text(label), ResultTable.Cell.quantity("n" + suffix),
                ResultTable.Cell.quantity("recovery_percent" + suffix),
                section.hasQuantity("recovery_sd" + suffix) ? ResultTable.Cell.quantity("recovery_sd" + suffix) : none,
                section.hasQuantity("recovery_ci_low" + suffix) ? ResultTable.Cell.interval("recovery_percent" + suffix)
                        : none,
                ResultTable.Cell.quantity("error_percent" + suffix));
    }

    /** A recovery is a ratio of like quantities: say so when the columns state different units. */
    private static void warnOnUnits(SectionBuilder section, AccuracyData data, ReadBack readBack) {
        Map<String, String> units = new LinkedHashMap<>();
        units.put("measured", readBack != null ? readBack.line().xUnit() : data.measured().unit());
        if (data.unspiked() != null) {
            units.put("unspiked", readBack != null ? readBack.line().xUnit() : data.unspiked().unit());
        }
        units.put("known", data.known().unit());
        units.values().removeIf(Objects::isNull);
        if (units.values().stream().distinct().count() > 1) {
            List<String> stated = new ArrayList<>();
            units.forEach((what, unit) -> stated.add(what + " in " + unit));
            section.warning("The columns state different units (" + String.join(", ", stated)
                    + "): a recovery compares like quantities; check the units.");
        }
    }
}
