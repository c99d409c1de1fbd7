package org.meritbook.analysis.accuracy;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.meritbook.analysis.NumberKind;
import org.meritbook.analysis.SectionBuilder;
import org.meritbook.analysis.SectionBuilder.QuantityDraft;
import org.meritbook.stats.Interval;
import org.meritbook.stats.descriptive.SampleSummary;
import org.meritbook.stats.distributions.StudentT;
import org.meritbook.stats.tests.OneSampleTTest;
import org.meritbook.trail.StepInput;

/**
 * The recoveries of one level (or of all levels): n, mean recovery with its 95 % t confidence
 * interval, mean % error, SD, and the two-sided one-sample t test of the mean recovery against
 * 100 %. With one result only the mean is reported; with equal results no interval or test.
 */
final class LevelSummary {
    static final String T_TEST = "one-sample t test, two-sided (Student 1908; ISO 5725-4 for trueness)";

    private LevelSummary() {
    }

    /**
     * @param suffix {@code ":<level>"}, or empty for all levels
     * @param what   how the group reads in labels and warnings: "level low", "all levels"
     */
    static void record(SectionBuilder section, String suffix, String what, List<RowRecoveries.Recovery> group) {
        double[] r = group.stream().mapToDouble(RowRecoveries.Recovery::value).toArray();
        List<StepInput> rows = new ArrayList<>();
        for (RowRecoveries.Recovery g : group) {
            rows.add(section.ref("R(" + g.row().label() + ")", g.stepId()));
        }
        int n = r.length;
        String nId = section.quantity(QuantityDraft.of("n" + suffix, "Number of results (" + what + ")", "n", rows, n,
                null).as(NumberKind.COUNT));
        if (n == 1) {
            String mean = section.quantity(QuantityDraft.of("recovery_percent" + suffix, "Recovery (" + what + ")",
                    "mean(R) = R (one result)", rows, r[0], "%").inSummary());
            error(section, suffix, what, mean);
            section.warning("Recovery, " + what + ": the SD, confidence interval and t test are not evaluable, "
                    + "because there is one result.");
            return;
        }
        SampleSummary s = SampleSummary.of(r);
        boolean varies = s.sd() > 0;
        Interval ci = varies ? s.meanInterval(AccuracyAnalysis.LEVEL) : null;
        QuantityDraft meanDraft = QuantityDraft.of("recovery_percent" + suffix, "Mean recovery (" + what + ")",
                "mean(R) = ΣRᵢ / n", rows, s.mean(), "%").inSummary();
        String mean = section.quantity(ci == null ? meanDraft : meanDraft.withInterval(ci));
        error(section, suffix, what, mean);
        String sd = section.quantity(QuantityDraft.of("recovery_sd" + suffix, "SD of the recovery (" + what + ")",
                "s = √(Σ(Rᵢ − mean(R))² / (n − 1))", withMean(section, rows, mean), s.sd(), "%"));
        if (!varies) {
            section.warning("Recovery, " + what + ": the confidence interval and t test are not evaluable, because "
                    + "all " + n + " recoveries are equal (s = 0).");
            return;
        }
        double tq = new StudentT(s.degreesOfFreedom()).twoSidedQuantile(AccuracyAnalysis.LEVEL);
        String t = section.step("t_quantile" + suffix, "Student t quantile, two-sided 95 % (" + what + ")",
                "t(0.975; n − 1)", List.of(section.ref("n", nId)), tq, null, "Student t distribution");
        String half = section.step("recovery_ci_half_width" + suffix,
                "Half-width of the 95 % confidence interval of the mean recovery (" + what + ")", "Δ = t · s / √n",
                List.of(section.ref("t", t), section.ref("s", sd), section.ref("n", nId)), tq * s.standardError(), "%",
                null);
        List<StepInput> ciInputs = List.of(section.ref("mean(R)", mean), section.ref("Δ", half));
        section.quantity(QuantityDraft.of("recovery_ci_low" + suffix,
                "Lower 95 % confidence limit of the mean recovery (" + what + ")", "mean(R) − Δ", ciInputs, ci.low(), "%"));
        section.quantity(QuantityDraft.of("recovery_ci_high" + suffix,
                "Upper 95 % confidence limit of the mean recovery (" + what + ")", "mean(R) + Δ", ciInputs, ci.high(),
                "%"));
        OneSampleTTest test = OneSampleTTest.of(r, AccuracyAnalysis.TARGET);
        String tStat = section.step("bias_t" + suffix, "t statistic of the mean recovery against 100 % (" + what + ")",
                "t = (mean(R) − 100) / (s / √n)", List.of(section.ref("mean(R)", mean), section.ref("s", sd),
                        section.ref("n", nId)), test.t(), null, T_TEST);
        section.quantity(QuantityDraft.of("bias_p" + suffix,
                "p of the t test: mean recovery differs from 100 % (" + what + ")",
                "p = P(|T(n − 1)| ≥ |t|)", List.of(section.ref("t", tStat), section.ref("n", nId)), test.p(), null).as(NumberKind.P_VALUE)
                .withMethod(T_TEST));
        if (test.p() < 1 - AccuracyAnalysis.LEVEL) {
            section.warning(String.format(Locale.ROOT, "Recovery, %s: the mean recovery differs significantly "
                    + "from 100 %% (t test, p < 0.05): a bias; judge it against the acceptance range.", what));
        }
    }

    private static void error(SectionBuilder section, String suffix, String what, String meanId) {
        section.quantity(QuantityDraft.of("error_percent" + suffix, "Mean error (" + what + ")",
                "ē = mean(R) − 100 (the mean % error)", List.of(section.ref("mean(R)", meanId)),
                section.ref("mean(R)", meanId).value() - AccuracyAnalysis.TARGET, "%"));
    }

    private static List<StepInput> withMean(SectionBuilder section, List<StepInput> rows, String meanId) {
        List<StepInput> inputs = new ArrayList<>(rows);
        inputs.add(section.ref("mean(R)", meanId));
        return inputs;
    }
}
