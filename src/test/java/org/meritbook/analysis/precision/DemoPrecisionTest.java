package org.meritbook.analysis.precision;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.analysis.SectionResult;
import org.meritbook.criteria.BuiltInProfiles;
import org.meritbook.analysis.Verdict;
import org.meritbook.pipeline.StudyRunner;

/**
 * The demo's precision block (sheet Precision, table PrecisionRuns; two levels, four days of six)
 * through the whole pipeline, against R 4.2.2. The values were exported from the workbook as
 * day,level,value rows (Apache POI, {@code getNumericCellValue}, printed with
 * {@code Double.toString}) to prec.csv and computed with:
 * <pre>
 * d &lt;- read.csv("prec.csv", header = FALSE, col.names = c("day", "level", "value"))
 * options(digits = 17)
 * for (lv in c("QC-N", "QC-S")) {
 *   x &lt;- d[d$level == lv, ]
 *   fit &lt;- anova(lm(value ~ factor(day), data = x))
 *   ni &lt;- table(x$day); N &lt;- sum(ni); k &lt;- length(ni)
 *   n0 &lt;- (N - sum(ni^2) / N) / (k - 1)
 *   msb &lt;- fit[1, 3]; msw &lt;- fit[2, 3]
 *   sL2 &lt;- max(0, (msb - msw) / n0); sI2 &lt;- msw + sL2
 *   nu &lt;- sI2^2 / ((msb / n0)^2 / (k - 1) + ((1 - 1 / n0) * msw)^2 / (N - k))
 *   s &lt;- sd(x$value); n &lt;- nrow(x)
 *   cat(lv, mean(x$value), s, 100 * s / mean(x$value), s * sqrt((n - 1) / qchisq(c(0.975, 0.025), n - 1)), "\n")
 *   cat(fit[1, 2], fit[2, 2], fit[1, 4], fit[1, 5], "\n")
 *   cat(sqrt(msw), sqrt(sL2), sqrt(sI2), nu, sqrt(sI2) * sqrt(nu / qchisq(c(0.975, 0.025), nu)), "\n")
 * }
 * </pre>
 */
class DemoPrecisionTest {
    private static final Path DEMO = Path.of("demo-data");

    private static SectionResult run(Path tmp) throws IOException {
        return run(tmp, "");
    }

    private static SectionResult run(Path tmp, String more) throws IOException {
        Files.copy(DEMO.resolve("hmf-honey-validation.xlsx"), tmp.resolve("hmf-honey-validation.xlsx"));
        Path notebook = tmp.resolve("study.md");
        Files.writeString(notebook, """
                ---
                title: Demo precision block
                sources:
                  lab: hmf-honey-validation.xlsx
                ---

                ## Precision

                ```precision
                data: lab!PrecisionRuns
                value: Result
                group: Day
                level: Level
                %s```
                """.formatted(more), StandardCharsets.UTF_8);
        return StudyRunner.withBuiltInAnalyses().run(notebook).sections().get(0);
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name)).value();
    }

    private static double step(SectionResult s, String name) {
        return s.steps().stream().filter(x -> x.id().equals("precision." + name)).findFirst()
                .orElseThrow(() -> new AssertionError("no step " + name)).value();
    }

    @Test
    void demoBlockMatchesR(@TempDir Path tmp) throws IOException {
        SectionResult s = run(tmp);
        // QC-N: the days differ (F = 18.9), so s_I is well above s_r.
        assertEquals(24, q(s, "n:QC-N"));
        assertEquals(8.62125, q(s, "mean:QC-N"), 1e-13);
        assertEquals(0.20452091420641091, q(s, "sd:QC-N"), 1e-14);
        assertEquals(2.3722884060479736, q(s, "cv_percent:QC-N"), 1e-12);
        assertEquals(0.15895643354558037, s.quantity("sd:QC-N").orElseThrow().interval().low(), 1e-14);
        assertEquals(0.28689388274798555, s.quantity("sd:QC-N").orElseThrow().interval().high(), 1e-14);
        assertEquals(0.711479166666665, step(s, "ss_between:QC-N"), 1e-12);
        assertEquals(0.25058333333333149, step(s, "ss_within:QC-N"), 1e-12);
        assertEquals(18.928611018734163, q(s, "anova_f:QC-N"), 1e-10);
        assertEquals(4.6450174555354221e-06, q(s, "anova_p:QC-N"), 1e-15);
        assertEquals(0.11193376017389291, q(s, "repeatability_sd:QC-N"), 1e-14);
        assertEquals(0.19349011841932873, q(s, "between_sd:QC-N"), 1e-13);
        assertEquals(0.2235343208381935, q(s, "intermediate_sd:QC-N"), 1e-14);
        assertEquals(4.7445704665492139, step(s, "intermediate_df:QC-N"), 1e-11);
        assertEquals(0.13822168810797408, s.quantity("intermediate_sd:QC-N").orElseThrow().interval().low(), 1e-12);
        assertEquals(0.56741158368001854, s.quantity("intermediate_sd:QC-N").orElseThrow().interval().high(), 1e-12);
        assertEquals(0.3134145284869001, q(s, "repeatability_limit:QC-N"), 1e-13);
        assertEquals(0.62589609834694171, q(s, "intermediate_limit:QC-N"), 1e-13);
        // QC-S: no significant day effect (p = 0.29), but the estimate of s_L² stays positive.
        assertEquals(38.068333333333335, q(s, "mean:QC-S"), 1e-12);
        assertEquals(0.78505976879452366, q(s, "sd:QC-S"), 1e-14);
        assertEquals(2.062238348919549, q(s, "cv_percent:QC-S"), 1e-12);
        assertEquals(0.61015911967688496, s.quantity("sd:QC-S").orElseThrow().interval().low(), 1e-14);
        assertEquals(1.1012509216117943, s.quantity("sd:QC-S").orElseThrow().interval().high(), 1e-13);
        assertEquals(2.3561666666666681, step(s, "ss_between:QC-S"), 1e-11);
        assertEquals(11.819166666666815, step(s, "ss_within:QC-S"), 1e-11);
        assertEquals(1.3290089073773608, q(s, "anova_f:QC-S"), 1e-12);
        assertEquals(0.29293619810570481, q(s, "anova_p:QC-S"), 1e-13);
        assertEquals(0.76873814354000991, q(s, "repeatability_sd:QC-S"), 1e-14);
        assertEquals(0.1800141455347091, q(s, "between_sd:QC-S"), 1e-12);
        assertEquals(0.78953367624562554, q(s, "intermediate_sd:QC-S"), 1e-14);
        assertEquals(21.784498806637352, step(s, "intermediate_df:QC-S"), 1e-10);
        assertEquals(0.60994890084540909, s.quantity("intermediate_sd:QC-S").orElseThrow().interval().low(), 1e-13);
        assertEquals(1.1197217475177612, s.quantity("intermediate_sd:QC-S").orElseThrow().interval().high(), 1e-13);
        assertEquals(2.1524668019120274, q(s, "repeatability_limit:QC-S"), 1e-13);
        assertEquals(2.2106942934877511, q(s, "intermediate_limit:QC-S"), 1e-13);
        PrecisionAnalysisTest.everyQuantityHasItsStepAndAKnownName(s);
        assertEquals(48, s.table().rows().size());
        assertEquals(2, s.figures().size());
        // days on a categorical axis, named in order of appearance
        assertEquals(4, s.figures().get(0).xCategories().size());
        assertTrue(s.figures().get(0).xCategories().get(0).contains("1"), s.figures().get(0).xCategories().toString());
        assertFalse(s.warnings().stream().anyMatch(w -> w.contains("set to zero")), s.warnings().toString());
        assertTrue(s.settings().stream().anyMatch(x -> x.label().equals("Levels") && x.value().contains("QC-N, QC-S")));
    }

    /**
     * HorRat on s_I, R 4.2.2 (from the values above):
     * {@code C <- mean * 1e-6; p <- 2 * C^(-0.1505); (100 * sI / mean) / p}.
     */
    @Test
    void horwitzRatioOnRequest(@TempDir Path tmp) throws IOException {
        SectionResult s = run(tmp, "horwitz: mg/kg\n");
        assertEquals(11.567158183426121, step(s, "horwitz_predicted_rsd:QC-N"), 1e-12);
        assertEquals(0.22415441603581993, q(s, "horwitz_ratio:QC-N"), 1e-14);
        assertEquals(9.2502854413586526, step(s, "horwitz_predicted_rsd:QC-S"), 1e-12);
        assertEquals(0.22420828732188594, q(s, "horwitz_ratio:QC-S"), 1e-14);
        assertTrue(s.settings().stream().anyMatch(x -> x.label().equals("Horwitz ratio") && x.value().contains("10^-6")));
    }

    @Test
    void theFoodPrecisionProfileJudgesEachLevel(@TempDir Path tmp) throws IOException {
        SectionResult s = BuiltInProfiles.all().get("food-precision-10-mg-kg").judge(run(tmp));
        // RSD_r 1.30 % and 2.02 %, RSD_I 2.59 % and 2.07 % (R above): all within 7.3 % and 11 %.
        assertEquals(List.of("repeatability_cv_percent:QC-N", "repeatability_cv_percent:QC-S",
                "intermediate_cv_percent:QC-N", "intermediate_cv_percent:QC-S"),
                s.verdicts().stream().map(Verdict::quantity).toList());
        assertTrue(s.verdicts().stream().allMatch(v -> v.outcome() == Verdict.Outcome.PASS), s.verdicts().toString());
        assertEquals("RSD_r (%) ≤ 7.3", s.verdicts().get(0).rule());
    }
}
