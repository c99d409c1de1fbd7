package org.meritbook.analysis.calibration;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.ResultTable;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.regression.LackOfFit;
import org.meritbook.stats.regression.RegressionAnova;
import org.meritbook.trail.StepInput;

/**
 * The regression ANOVA table: regression, residual, lack of fit and pure error where levels are
 * replicated, total; df, SS, MS, F, p, each a quantity with its trail step, and the section's table
 * of them. Sums of squares are on the fit's weights, which average 1.
 */
final class AnovaTrail {
    private static final String METHOD = "regression ANOVA; Draper & Smith, Applied Regression Analysis, §1.3, §2.1, ch. 9";

    private AnovaTrail() {
    }

    static void record(SectionBuilder section, Optional<RegressionAnova> table, boolean centred, String yUnit,
                       String points) {
        if (table.isEmpty()) {
            section.warning("Not evaluable: the regression ANOVA table, because the residual sum of squares is 0 "
                    + "(a perfect fit), so F has no finite value.");
            return;
        }
        RegressionAnova a = table.get();
        String ss = Units.squared(yUnit);
        StepInput data = LineTrail.from("x, y, w, ŷ", points);
        String regDf = count(section, "anova_regression_df", "ANOVA: regression degrees of freedom",
                centred ? "df_reg = p − 1" : "df_reg = p (through the origin)", a.regressionDf(), points);
        String resDf = count(section, "anova_residual_df", "ANOVA: residual degrees of freedom", "df_res = n − p",
                a.residualDf(), points);
        String regSs = section.quantity(QuantityDraft.of("anova_regression_ss", "ANOVA: regression sum of squares",
                centred ? "SS_reg = Σwᵢ(ŷᵢ − ȳw)²" : "SS_reg = Σwᵢŷᵢ² (uncentred, through the origin)", List.of(data),
                a.ssRegression(), ss).withMethod(METHOD));
        String resSs = section.quantity(QuantityDraft.of("anova_residual_ss", "ANOVA: residual sum of squares",
                "SS_res = Σwᵢ(yᵢ − ŷᵢ)²", List.of(data), a.ssResidual(), ss));
        String regMs = section.quantity(QuantityDraft.of("anova_regression_ms", "ANOVA: regression mean square",
                "MS_reg = SS_reg / df_reg", List.of(section.ref("SS_reg", regSs), section.ref("df_reg", regDf)),
                a.msRegression(), ss));
        String resMs = section.quantity(QuantityDraft.of("anova_residual_ms", "ANOVA: residual mean square",
                "MS_res = SS_res / df_res = s²(y/x)", List.of(section.ref("SS_res", resSs), section.ref("df_res", resDf)),
                a.msResidual(), ss));
        String f = section.quantity(QuantityDraft.of("anova_regression_f", "ANOVA: F statistic of the regression",
                "F = MS_reg / MS_res", List.of(section.ref("MS_reg", regMs), section.ref("MS_res", resMs)), a.f(), null).as(NumberKind.STATISTIC));
        section.quantity(QuantityDraft.of("anova_regression_p", "ANOVA: p-value of the regression",
                "p = P(F(df_reg, df_res) > F)", List.of(section.ref("F", f), section.ref("df_reg", regDf),
                        section.ref("df_res", resDf)), a.p(), null).as(NumberKind.P_VALUE));
        if (a.lackOfFit().isPresent()) {
            LackOfFit l = a.lackOfFit().get();
            String lofDf = count(section, "anova_lack_of_fit_df", "ANOVA: lack-of-fit degrees of freedom",
                    "df_LoF = levels − p", l.lackOfFitDf(), points);
            String peDf = count(section, "anova_pure_error_df", "ANOVA: pure-error degrees of freedom",
                    "df_PE = n − levels", l.pureErrorDf(), points);
            String lofSs = section.quantity(QuantityDraft.of("anova_lack_of_fit_ss", "ANOVA: lack-of-fit sum of squares",
                    "SS_LoF = Σ levels Σwᵢ(ȳlevel,w − ŷᵢ)²", List.of(data), l.ssLackOfFit(), ss));
            String peSs = section.quantity(QuantityDraft.of("anova_pure_error_ss", "ANOVA: pure-error sum of squares",
                    "SS_PE = Σ levels Σwᵢ(yᵢ − ȳlevel,w)²", List.of(data), l.ssPureError(), ss));
            section.quantity(QuantityDraft.of("anova_lack_of_fit_ms", "ANOVA: lack-of-fit mean square",
                    "MS_LoF = SS_LoF / df_LoF; its F and p are lack_of_fit_f and lack_of_fit_p",
                    List.of(section.ref("SS_LoF", lofSs), section.ref("df_LoF", lofDf)), l.ssLackOfFit() / l.lackOfFitDf(),
                    ss));
            section.quantity(QuantityDraft.of("anova_pure_error_ms", "ANOVA: pure-error mean square",
                    "MS_PE = SS_PE / df_PE", List.of(section.ref("SS_PE", peSs), section.ref("df_PE", peDf)),
                    l.ssPureError() / l.pureErrorDf(), ss));
        }
        count(section, "anova_total_df", "ANOVA: total degrees of freedom",
                centred ? "df_tot = n − 1 = df_reg + df_res" : "df_tot = n = df_reg + df_res", a.totalDf(), points);
        section.quantity(QuantityDraft.of("anova_total_ss", "ANOVA: total sum of squares",
                centred ? "SS_tot = Σwᵢ(yᵢ − ȳw)² = SS_reg + SS_res" : "SS_tot = Σwᵢyᵢ² = SS_reg + SS_res",
                List.of(LineTrail.from("y, w", points)), a.ssTotal(), ss));
        table(section, a.lackOfFit().isPresent(), ss);
    }

    /** The table of the quantities above; lack of fit and pure error split the residual when levels are replicated. */
    private static void table(SectionBuilder section, boolean split, String ss) {
        List<List<ResultTable.Cell>> rows = new ArrayList<>();
        rows.add(row(section, "Regression", "regression", "anova_regression"));
        rows.add(row(section, "Residual", "residual", null));
        if (split) {
            rows.add(row(section, "Lack of fit", "lack_of_fit", "lack_of_fit"));
            rows.add(row(section, "Pure error", "pure_error", null));
        }
        rows.add(List.of(ResultTable.Cell.text("Total"), ResultTable.Cell.quantity("anova_total_ss"),
                ResultTable.Cell.quantity("anova_total_df"), ResultTable.Cell.empty(), ResultTable.Cell.empty(),
                ResultTable.Cell.empty()));
        section.table(new ResultTable("Regression ANOVA", List.of(
                ResultTable.Column.of("Source"), new ResultTable.Column("SS", ss), ResultTable.Column.of("df"),
                new ResultTable.Column("MS", ss), ResultTable.Column.of("F"), ResultTable.Column.of("p")), rows,
                (split ? "Lack of fit and pure error split the residual (levels are replicated). " : "")
                        + "Sums of squares are on the fit's weights, scaled to average 1 (all 1 without weighting)."));
    }

    /**
     * A row of anova_&lt;part&gt;_ss, _df and _ms and, when {@code test} is given and was evaluable,
     * &lt;test&gt;_f and &lt;test&gt;_p.
     */
    private static List<ResultTable.Cell> row(SectionBuilder section, String source, String part, String test) {
        boolean tested = test != null && section.hasQuantity(test + "_f");
        return List.of(ResultTable.Cell.text(source), ResultTable.Cell.quantity("anova_" + part + "_ss"),
                ResultTable.Cell.quantity("anova_" + part + "_df"), ResultTable.Cell.quantity("anova_" + part + "_ms"),
                tested ? ResultTable.Cell.quantity(test + "_f") : ResultTable.Cell.empty(),
                tested ? ResultTable.Cell.quantity(test + "_p") : ResultTable.Cell.empty());
    }

    private static String count(SectionBuilder section, String name, String label, String formula, int value,
                                String points) {
        return section.quantity(QuantityDraft.of(name, label, formula, List.of(LineTrail.from("n", points)), value, null)
                .as(NumberKind.COUNT));
    }
}
