package org.meritbook.analysis.precision;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.meritbook.analysis.MeasuredRows;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.UnusableDataException;
import org.meritbook.stats.anova.HorwitzRatio;
import org.meritbook.stats.anova.OneWayAnova;
import org.meritbook.stats.anova.VarianceComponents;
import org.meritbook.stats.descriptive.Moments;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.outliers.CochranTest;
import org.meritbook.stats.outliers.GrubbsTest;
import org.meritbook.stats.outliers.OutlierClass;
import org.meritbook.study.MassFractions;
import org.meritbook.trail.StepInput;

/**
 * Records one level's quantities and steps: the summary of all its results, and with groups the
 * ANOVA, the variance components, the ISO 5725-2 limits and the outlier screening. Names carry
 * {@code :<level>} when the cell has a level column.
 */
final class LevelTrail {
    private static final String ISO_5725 = "ISO 5725-2:2019 §7.4 (one-way ANOVA, unequal groups)";

    private final SectionBuilder section;
    private final PrecisionData data;
    private final PrecisionData.Level level;
    private final String suffix;
    private final String unit;
    private final String where;

    /** The {@code horwitz:} unit of the results as a mass fraction, or null when no Horwitz ratio is asked for. */
    private final String horwitzUnit;
    /** The rows of this level's outlier table, in the order the tests ran. */
    private final List<List<ResultTable.Cell>> outliers = new ArrayList<>();

    LevelTrail(SectionBuilder section, PrecisionData data, PrecisionData.Level level, String horwitzUnit) {
        this.section = section;
        this.horwitzUnit = horwitzUnit;
        this.data = data;
        this.level = level;
        this.suffix = data.levelled() ? ":" + level.label() : "";
        this.unit = data.unit();
        this.where = data.levelled() ? "Level " + level.label() + ": " : "";
    }

    void record() {
        double[] values = level.values();
        if (values.length < SampleSummary.MINIMUM) {
            warn("mean, SD and %CV not evaluable, because only " + values.length
                    + " result is used (2 or more needed).");
            return;
        }
        List<StepInput> groupMeans = data.grouped() && level.groups().size() > 1 ? groupMeans() : List.of();
        SampleSummary summary = SampleSummary.of(values);
        String sd = summary(summary, groupMeans);
        grubbsOnValues(values, sd);
        if (data.grouped()) {
            grouped(groupMeans);
        }
        if (horwitzUnit != null) {
            horwitz(summary.mean());
        }
        if (!outliers.isEmpty()) {
            section.table(new ResultTable("Outlier tests" + of(), List.of(ResultTable.Column.of("Test"),
                    ResultTable.Column.of("Suspect"), ResultTable.Column.of("Statistic"),
                    ResultTable.Column.of("Critical value 5\u00a0%"), ResultTable.Column.of("Critical value 1\u00a0%"),
                    ResultTable.Column.of("Result")), outliers,
                    "A straggler lies between the 5 % and 1 % critical values, an outlier above the 1 % value "
                            + "(ISO 5725-2 §7.3.2); flagged, never removed."));
        }
    }

    /**
     * HorRat on the intermediate-precision RSD (the %CV of all results without groups), the mean
     * converted to a mass fraction with the {@code horwitz:} unit.
     */
    private void horwitz(double mean) {
        String found = section.hasQuantity("intermediate_cv_percent" + suffix) ? "intermediate_cv_percent" + suffix
                : "cv_percent" + suffix;
        if (!section.hasQuantity(found)) {
            warn("Horwitz ratio not evaluable, because no RSD was computed.");
            return;
        }
        double factor = MassFractions.factor(horwitzUnit);
        double c = Math.abs(mean) * factor;
        if (!(c > 0 && c <= 1)) {
            warn(String.format(Locale.ROOT, "Horwitz ratio not evaluable, because the mean as a mass fraction (%.4g) "
                    + "is not in (0, 1]; check horwitz: %s.", c, horwitzUnit));
            return;
        }
        HorwitzRatio h = HorwitzRatio.of(c, section.ref("RSD", section.stepId(found)).value());
        String cId = section.step("mass_fraction" + suffix, "Mean as a mass fraction" + of(), "C = |x̄| × " + MassFractions.factorText(horwitzUnit)
                        + " (horwitz: " + horwitzUnit + ")", List.of(section.ref("x̄", section.stepId("mean" + suffix))),
                c, null, null);
        String predicted = section.step("horwitz_predicted_rsd" + suffix, "RSD predicted by the Horwitz function" + of(),
                "PRSD_R = 2 · C^(−0.1505)", List.of(section.ref("C", cId)), h.predictedRsdPercent(), "%",
                "Horwitz, Kamps & Boyer (1980); Horwitz & Albert (2006)");
        section.quantity(QuantityDraft.of("horwitz_ratio" + suffix, "Horwitz ratio (HorRat)" + of(),
                "HorRat = RSD / PRSD_R", List.of(section.ref(found.startsWith("intermediate") ? "RSD_I" : "%CV",
                        section.stepId(found)), section.ref("PRSD_R", predicted)), h.ratio(), null).as(NumberKind.RATIO)
                .withMethod("HorRat on " + (found.startsWith("intermediate") ? "the intermediate-precision RSD"
                        : "the RSD of all results") + "; Horwitz & Albert, J. AOAC Int. 89 (2006)"));
    }

    /** One step per group: its mean, with the group's cells as inputs (the only place they are listed). */
    private List<StepInput> groupMeans() {
        List<StepInput> means = new ArrayList<>();
        String groupName = data.groupColumn().name();
        level.groups().forEach((label, rows) -> {
            List<StepInput> cells = cells(rows);
            double[] v = rows.stream().mapToDouble(r -> r.number(0)).toArray();
            String id = section.step("group_mean" + suffix + "/" + label,
                    "Mean of " + groupName + " " + label + of() + " (n = " + v.length + ")",
                    "x̄ᵢ = Σⱼ xᵢⱼ / nᵢ", cells, Moments.mean(v), unit, null);
            means.add(section.ref("x̄(" + label + ")", id));
        });
        return means;
    }

    private List<StepInput> cells(List<MeasuredRows.Row> rows) {
        List<StepInput> cells = new ArrayList<>();
        int i = 1;
        for (MeasuredRows.Row row : rows) {
            cells.add(StepInput.number("x" + i++, row.number(0), unit, row.cell(0).ref().address()));
        }
        return cells;
    }

    /**
     * n, mean, SD and %CV of all the level's results; returns the SD's step id. With groups the
     * mean's inputs are the group means (whose steps list the cells), otherwise the cells.
     */
    private String summary(SampleSummary s, List<StepInput> groupMeans) {
        String n = section.quantity(QuantityDraft.of("n" + suffix, "Number of results" + of(), "n = number of results used",
                List.of(StepInput.text("results", s.n() + " used rows" + (data.levelled() ? " of level " + level.label() : "")
                        + " (excluded rows not counted)", data.rows().where())), s.n(), null).as(NumberKind.COUNT));
        List<StepInput> meanInputs = new ArrayList<>();
        String formula;
        if (groupMeans.isEmpty()) {
            meanInputs.addAll(cells(level.rows()));
            formula = "x̄ = Σx / n";
        } else {
            meanInputs.add(section.ref("n", n));
            int i = 0;
            for (Map.Entry<String, List<MeasuredRows.Row>> g : level.groups().entrySet()) {
                StepInput groupMean = groupMeans.get(i++);
                meanInputs.add(groupMean);
                meanInputs.add(StepInput.number("n(" + g.getKey() + ")", g.getValue().size(), null, groupMean.source()));
            }
            formula = "x̄ = Σ nᵢ·x̄ᵢ / n (= Σx / n over all results)";
        }
        String mean = section.quantity(QuantityDraft.of("mean" + suffix, "Mean" + of(), formula, meanInputs, s.mean(), unit)
                .withInterval(s.meanInterval(PrecisionAnalysis.LEVEL)).withMethod("t interval of the mean, n − 1 df"));
        String sd = section.quantity(QuantityDraft.of("sd" + suffix, "Standard deviation" + of(),
                "s = √(Σ(x − x̄)² / (n − 1)) over the results of step " + section.stepId(groupMeans.isEmpty()
                        ? "mean" + suffix : "group_mean" + suffix + "/…"),
                List.of(section.ref("x̄", mean), section.ref("n", n)), s.sd(), unit)
                .withInterval(s.sdInterval(PrecisionAnalysis.LEVEL))
                .withMethod("chi-square interval of the SD, n − 1 df (normal data)"));
        if (s.mean() == 0) {
            warn("%CV not evaluable, because the mean is 0.");
        } else {
            QuantityDraft cv = QuantityDraft.of("cv_percent" + suffix, "%CV (RSD) of all results" + of(),
                    "%CV = 100 · s / |x̄|", List.of(section.ref("s", sd), section.ref("x̄", mean)), s.cvPercent(), "%");
            section.quantity(data.grouped() ? cv : cv.inSummary());
        }
        return sd;
    }

    private void grouped(List<StepInput> means) {
        Map<String, List<MeasuredRows.Row>> groups = level.groups();
        String groupName = data.groupColumn().name();
        if (groups.size() < 2) {
            warn("repeatability and intermediate precision not evaluable, because all results "
                    + "belong to one " + groupName + " (" + groups.keySet().iterator().next() + "); two or more are needed.");
            return;
        }
        List<String> labels = new ArrayList<>(groups.keySet());
        OneWayAnova anova;
        try {
            anova = OneWayAnova.of(level.groupValues());
        } catch (UnusableDataException e) {
            warn("repeatability and intermediate precision not evaluable, because "
                    + e.getMessage() + ".");
            return;
        }
        String sq = unit == null ? null : "(" + unit + ")²";
        List<StepInput> betweenInputs = new ArrayList<>(means);
        betweenInputs.add(StepInput.number("x̄", anova.grandMean(), unit, section.stepId("mean" + suffix)));
        String ssB = section.step("ss_between" + suffix, "Sum of squares between " + groupName + "s" + of(),
                "SS_between = Σ nᵢ (x̄ᵢ − x̄)², df = k − 1 = " + anova.dfBetween(), betweenInputs, anova.ssBetween(), sq,
                ISO_5725);
        String ssW = section.step("ss_within" + suffix, "Sum of squares within " + groupName + "s" + of(),
                "SS_within = Σᵢ Σⱼ (xᵢⱼ − x̄ᵢ)², df = N − k = " + anova.dfWithin(), means, anova.ssWithin(), sq, ISO_5725);
        String msB = section.step("ms_between" + suffix, "Mean square between " + groupName + "s" + of(),
                "MS_between = SS_between / (k − 1)", List.of(section.ref("SS_between", ssB),
                        StepInput.number("k − 1", anova.dfBetween(), null, "number of " + groupName + "s − 1")),
                anova.msBetween(), sq, null);
        String msW = section.step("ms_within" + suffix, "Mean square within " + groupName + "s" + of(),
                "MS_within = SS_within / (N − k)", List.of(section.ref("SS_within", ssW),
                        StepInput.number("N − k", anova.dfWithin(), null, "results − " + groupName + "s")),
                anova.msWithin(), sq, null);
        String f = section.quantity(QuantityDraft.of("anova_f" + suffix, "ANOVA F (" + groupName + ")" + of(),
                "F = MS_between / MS_within", List.of(section.ref("MS_between", msB), section.ref("MS_within", msW)),
                anova.f(), null).as(NumberKind.STATISTIC));
        section.quantity(QuantityDraft.of("anova_p" + suffix, "ANOVA p (" + groupName + " effect)" + of(),
                "p = P(F(k − 1, N − k) ≥ F)", List.of(section.ref("F", f),
                        StepInput.number("k − 1", anova.dfBetween(), null, ssB),
                        StepInput.number("N − k", anova.dfWithin(), null, ssW)), anova.p(), null).as(NumberKind.P_VALUE));
        anovaTable(anova, groupName, ssB, ssW, msB, msW, sq);
        components(VarianceComponents.of(anova), msB, msW, groupName);
        cochran(labels, groupName);
        grubbsOnMeans(anova, labels, groupName);
    }

    /** The one-way ANOVA table, every value a step or quantity of this level (the total's SS a step of its own). */
    private void anovaTable(OneWayAnova anova, String groupName, String ssB, String ssW, String msB, String msW,
                            String sq) {
        int dfTotal = anova.dfBetween() + anova.dfWithin();
        String ssT = section.step("ss_total" + suffix, "Total sum of squares" + of(),
                "SS_total = Σᵢ Σⱼ (xᵢⱼ − x̄)² = SS_between + SS_within, df = N − 1 = " + dfTotal,
                List.of(section.ref("SS_between", ssB), section.ref("SS_within", ssW)), anova.ssTotal(), sq, ISO_5725);
        NumberKind measure = NumberKind.MEASURE;
        List<List<ResultTable.Cell>> rows = List.of(
                List.of(ResultTable.Cell.text("Between " + groupName + "s"), ResultTable.Cell.step(ssB, measure),
                        ResultTable.Cell.inputOf(msB, anova.dfBetween(), NumberKind.COUNT),
                        ResultTable.Cell.step(msB, measure), ResultTable.Cell.quantity("anova_f" + suffix),
                        ResultTable.Cell.quantity("anova_p" + suffix)),
                List.of(ResultTable.Cell.text("Within " + groupName + "s"), ResultTable.Cell.step(ssW, measure),
                        ResultTable.Cell.inputOf(msW, anova.dfWithin(), NumberKind.COUNT),
                        ResultTable.Cell.step(msW, measure), ResultTable.Cell.empty(), ResultTable.Cell.empty()),
                List.of(ResultTable.Cell.text("Total"), ResultTable.Cell.step(ssT, measure),
                        ResultTable.Cell.inputOf(ssT, dfTotal, NumberKind.COUNT), ResultTable.Cell.empty(),
                        ResultTable.Cell.empty(), ResultTable.Cell.empty()));
        section.table(new ResultTable("One-way ANOVA by " + groupName + of(), List.of(ResultTable.Column.of("Source"),
                new ResultTable.Column("SS", sq), ResultTable.Column.of("df"), new ResultTable.Column("MS", sq),
                ResultTable.Column.of("F"), ResultTable.Column.of("p")), rows));
    }

    /** One row of the outlier table. */
    private void outlierRow(String test, String suspect, String statisticName, String stepId, double critical5,
                            double critical1, OutlierClass judgement) {
        outliers.add(List.of(ResultTable.Cell.text(test), ResultTable.Cell.text(suspect),
                ResultTable.Cell.quantity(statisticName), ResultTable.Cell.inputOf(stepId, critical5, NumberKind.STATISTIC),
                ResultTable.Cell.inputOf(stepId, critical1, NumberKind.STATISTIC),
                ResultTable.Cell.text(judgement == OutlierClass.CONSISTENT ? "not\u00a0flagged"
                        : judgement.name().toLowerCase(Locale.ROOT))));
    }

    private void components(VarianceComponents vc, String msB, String msW, String groupName) {
        String n0 = section.step("n0" + suffix, "Effective " + groupName + " size n₀" + of(),
                "n₀ = (N − Σnᵢ² / N) / (k − 1)", List.of(StepInput.number("N", vc.totalCount(), null, "results used"),
                        StepInput.number("k", vc.groupCount(), null, groupName + "s")), vc.n0(), null, ISO_5725);
        String sq = unit == null ? null : "(" + unit + ")²";
        String estimate = section.step("between_variance" + suffix, "Between-" + groupName + " variance estimate" + of(),
                "s_L² = (MS_between − MS_within) / n₀", List.of(section.ref("MS_between", msB),
                        section.ref("MS_within", msW), section.ref("n₀", n0)), vc.betweenEstimate(), sq, ISO_5725);
        String sr = section.quantity(QuantityDraft.of("repeatability_sd" + suffix, "Repeatability SD s_r" + of(),
                "s_r = √MS_within", List.of(section.ref("MS_within", msW)), vc.repeatabilitySd(), unit)
                .withInterval(vc.repeatabilitySdInterval(PrecisionAnalysis.LEVEL))
                .withMethod("chi-square interval, N − k = " + vc.repeatabilityDf() + " df").inSummary());
        String sl;
        if (vc.betweenSetToZero()) {
            sl = section.quantity(QuantityDraft.of("between_sd" + suffix, "Between-" + groupName + " SD s_L" + of(),
                    "s_L = 0, because the estimate s_L² < 0 was set to zero", List.of(section.ref("s_L²", estimate)), 0.0, unit));
            warn(String.format(Locale.ROOT, "the between-%s variance estimate (MS_between − MS_within)/n₀ "
                    + "= %.4g is negative (the %ss agree more closely than their replicates suggest); it is set to "
                    + "zero, so s_I = s_r and the interval of s_I has N − k degrees of freedom.", groupName,
                    vc.betweenEstimate(), groupName));
        } else {
            sl = section.quantity(QuantityDraft.of("between_sd" + suffix, "Between-" + groupName + " SD s_L" + of(),
                    "s_L = √s_L²", List.of(section.ref("s_L²", estimate)), vc.betweenSd(), unit));
        }
        String dfI = section.step("intermediate_df" + suffix, "Degrees of freedom of s_I (Satterthwaite)" + of(),
                vc.betweenSetToZero() ? "ν = N − k (s_L² set to zero)"
                        : "ν = s_I⁴ / [(MS_between/n₀)² / (k − 1) + ((1 − 1/n₀)·MS_within)² / (N − k)]",
                List.of(section.ref("MS_between", msB), section.ref("MS_within", msW), section.ref("n₀", n0)),
                vc.intermediateDf(), null, "Satterthwaite (1946)");
        String si = section.quantity(QuantityDraft.of("intermediate_sd" + suffix,
                "Intermediate precision SD s_I" + of(), "s_I = √(s_r² + s_L²)",
                List.of(section.ref("s_r", sr), section.ref("s_L", sl), section.ref("ν", dfI)), vc.intermediateSd(), unit)
                .withInterval(vc.intermediateSdInterval(PrecisionAnalysis.LEVEL))
                .withMethod("chi-square interval with Satterthwaite's ν (ISO 5725-3)").inSummary());
        String mean = section.stepId("mean" + suffix);
        if (vc.grandMean() == 0) {
            warn("relative standard deviations not evaluable, because the mean is 0.");
        } else {
            section.quantity(QuantityDraft.of("repeatability_cv_percent" + suffix, "Repeatability RSD" + of(),
                    "RSD_r = 100 · s_r / |x̄|", List.of(section.ref("s_r", sr), section.ref("x̄", mean)),
                    vc.repeatabilityCvPercent(), "%").inSummary());
            section.quantity(QuantityDraft.of("intermediate_cv_percent" + suffix, "Intermediate precision RSD" + of(),
                    "RSD_I = 100 · s_I / |x̄|", List.of(section.ref("s_I", si), section.ref("x̄", mean)),
                    vc.intermediateCvPercent(), "%").inSummary());
        }
        section.quantity(QuantityDraft.of("repeatability_limit" + suffix, "Repeatability limit r" + of(), "r = 2.8 · s_r",
                List.of(section.ref("s_r", sr)), vc.repeatabilityLimit(), unit)
                .withMethod("ISO 5725-2 / ISO 5725-6 §4.1 (2.8 ≈ 1.96·√2)"));
        section.quantity(QuantityDraft.of("intermediate_limit" + suffix, "Intermediate precision limit R" + of(),
                "R = 2.8 · s_I", List.of(section.ref("s_I", si)), vc.reproducibilityLimit(), unit)
                .withMethod("ISO 5725-2 / ISO 5725-6 §4.1 (2.8 ≈ 1.96·√2)"));
    }

    /** Grubbs' test on the level's results (n ≥ 3). */
    private void grubbsOnValues(double[] values, String sd) {
        if (values.length < GrubbsTest.MINIMUM) {
            warn("Grubbs' test not evaluable, because it needs 3 or more results.");
            return;
        }
        GrubbsTest g;
        try {
            g = GrubbsTest.of(values);
        } catch (UnusableDataException e) {
            warn("Grubbs' test not evaluable, because " + e.getMessage() + ".");
            return;
        }
        MeasuredRows.Row suspect = level.rows().get(g.suspectIndex());
        String address = suspect.cell(0).ref().address();
        String id = section.quantity(QuantityDraft.of("grubbs_g" + suffix,
                "Grubbs' G for the result farthest from the mean" + of() + ": "
                        + address + ", " + g.judgement().name().toLowerCase(Locale.ROOT),
                "G = |x − x̄| / s; critical G = ((n − 1)/√n)·√(t² / (n − 2 + t²)), t = t(1 − α/(2n); n − 2)",
                List.of(StepInput.number("x", g.suspect(), unit, address), section.ref("x̄", section.stepId("mean" + suffix)),
                        section.ref("s", sd), StepInput.number("G crit (5 %)", g.critical5(), null, "α = 0.05"),
                        StepInput.number("G crit (1 %)", g.critical1(), null, "α = 0.01")),
                g.statistic(), null).as(NumberKind.STATISTIC).withMethod("Grubbs (1969), single two-sided; ISO 5725-2 §7.3.4"));
        outlierRow("Grubbs, results", address + " (" + suspect.cell(0).raw() + ")", "grubbs_g" + suffix, id,
                g.critical5(), g.critical1(), g.judgement());
        flag(g.judgement(), String.format(Locale.ROOT, "Grubbs' test flags result %s (%s) as a %s: G = %.3f against "
                + "%.3f (5 %%) and %.3f (1 %%) (step %s).", address, suspect.cell(0).raw(), noun(g.judgement()),
                g.statistic(), g.critical5(), g.critical1(), id));
    }

    /** Grubbs' test on the group means (ISO 5725-2 applies it to cell means; k ≥ 3). */
    private void grubbsOnMeans(OneWayAnova anova, List<String> labels, String groupName) {
        if (labels.size() < GrubbsTest.MINIMUM) {
            warn("Grubbs' test on the " + groupName + " means not evaluable, because it needs 3 or more "
                    + groupName + "s.");
            return;
        }
        double[] means = anova.groupMeans().stream().mapToDouble(Double::doubleValue).toArray();
        GrubbsTest g;
        try {
            g = GrubbsTest.of(means);
        } catch (UnusableDataException e) {
            warn("Grubbs' test on the " + groupName + " means not evaluable, because "
                    + e.getMessage() + ".");
            return;
        }
        String suspect = labels.get(g.suspectIndex());
        String id = section.quantity(QuantityDraft.of("grubbs_means_g" + suffix,
                "Grubbs' G for the " + groupName + " mean farthest from the rest"
                        + of() + ": " + groupName + " " + suspect + ", " + g.judgement().name().toLowerCase(Locale.ROOT),
                "G = |x̄ᵢ − mean of x̄ᵢ| / SD of x̄ᵢ; critical G as for single results, n = k",
                List.of(section.ref("x̄(" + suspect + ")", section.stepId("group_mean" + suffix + "/" + suspect)),
                        StepInput.number("G crit (5 %)", g.critical5(), null, "α = 0.05, k = " + labels.size()),
                        StepInput.number("G crit (1 %)", g.critical1(), null, "α = 0.01, k = " + labels.size())),
                g.statistic(), null).as(NumberKind.STATISTIC).withMethod("Grubbs (1969) on cell means; ISO 5725-2 §7.3.4"));
        outlierRow("Grubbs, " + groupName + " means", groupName + " " + suspect, "grubbs_means_g" + suffix, id,
                g.critical5(), g.critical1(), g.judgement());
        flag(g.judgement(), String.format(Locale.ROOT, "Grubbs' test on the %s means flags %s %s as a %s: G = %.3f "
                + "against %.3f (5 %%) and %.3f (1 %%) (step %s).", groupName, groupName, suspect, noun(g.judgement()),
                g.statistic(), g.critical5(), g.critical1(), id));
    }

    /** Cochran's C on the group variances (every group with 2 or more results). */
    private void cochran(List<String> labels, String groupName) {
        List<double[]> groups = level.groupValues();
        if (groups.stream().anyMatch(g -> g.length < 2)) {
            warn("Cochran's test not evaluable, because a " + groupName + " has fewer than 2 results.");
            return;
        }
        CochranTest c;
        try {
            c = CochranTest.of(groups);
        } catch (UnusableDataException e) {
            warn("Cochran's test not evaluable, because " + e.getMessage() + ".");
            return;
        }
        String suspect = labels.get(c.suspectIndex());
        String sq = unit == null ? null : "(" + unit + ")²";
        String id = section.quantity(QuantityDraft.of("cochran_c" + suffix,
                "Cochran's C for the largest " + groupName + " variance" + of() + ": "
                        + groupName + " " + suspect + ", " + c.judgement().name().toLowerCase(Locale.ROOT),
                "C = s²max / Σ sᵢ²; critical C = 1 / (1 + (k − 1)/F), F = F(1 − α/k; n − 1, (k − 1)(n − 1))",
                List.of(StepInput.number("s²max", c.variances().get(c.suspectIndex()), sq, groupName + " " + suspect),
                        StepInput.number("Σ sᵢ²", c.variances().stream().mapToDouble(Double::doubleValue).sum(), sq,
                                "all " + labels.size() + " " + groupName + "s"),
                        StepInput.number("C crit (5 %)", c.critical5(), null, "α = 0.05, n = " + c.groupSize()
                                + (c.sizeRule() == CochranTest.GroupSizeRule.EQUAL ? "" : " (the most frequent size)")),
                        StepInput.number("C crit (1 %)", c.critical1(), null, "α = 0.01")),
                c.statistic(), null).as(NumberKind.STATISTIC).withMethod("Cochran's test; ISO 5725-2 §7.3.3"));
        outlierRow("Cochran, " + groupName + " variances", groupName + " " + suspect, "cochran_c" + suffix, id,
                c.critical5(), c.critical1(), c.judgement());
        flag(c.judgement(), String.format(Locale.ROOT, "Cochran's test flags the variance of %s %s as a %s: C = %.3f "
                + "against %.3f (5 %%) and %.3f (1 %%) (step %s).", groupName, suspect, noun(c.judgement()),
                c.statistic(), c.critical5(), c.critical1(), id));
    }

    private void flag(OutlierClass judgement, String text) {
        if (judgement != OutlierClass.CONSISTENT) {
            warn(text + " It is flagged, not removed; exclude it in the notebook with a reason "
                    + "if it is a known failure.");
        }
    }

    /** A section warning, prefixed with the level when there are levels. */
    private void warn(String text) {
        String full = where + text;
        section.warning(Character.toUpperCase(full.charAt(0)) + full.substring(1));
    }

    private static String noun(OutlierClass c) {
        return c == OutlierClass.OUTLIER ? "statistical outlier (above the 1 % critical value)"
                : "straggler (between the 5 % and 1 % critical values)";
    }

    /** " (level QC-N)" in labels, nothing without levels. */
    private String of() {
        return data.levelled() ? " (" + level.label() + ")" : "";
    }
}
