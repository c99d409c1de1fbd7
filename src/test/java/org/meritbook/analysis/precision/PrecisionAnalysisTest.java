package org.meritbook.analysis.precision;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;

/**
 * The precision section on small invented data. Reference values: R 4.2.2, computed by hand for
 * these tests with {@code anova(lm(x ~ g))}, {@code sd}, {@code qchisq}, {@code qt}:
 * <pre>
 * options(digits = 17)
 * x &lt;- c(10.1, 10.5, 9.7, 10.2, 9.8, 10.4, 9.9, 10.0, 10.3)
 * g &lt;- factor(c("A", "A", "A", "B", "B", "C", "C", "C", "C"))
 * fit &lt;- anova(lm(x ~ g)); ni &lt;- table(g); N &lt;- sum(ni); k &lt;- length(ni)
 * n0 &lt;- (N - sum(ni^2) / N) / (k - 1); msb &lt;- fit[1, 3]; msw &lt;- fit[2, 3]
 * c(mean(x), sd(x), 100 * sd(x) / mean(x))           # 10.1 0.27386127875258315 2.7114978094315165
 * s &lt;- sd(x); n &lt;- 9; s * sqrt((n - 1) / qchisq(c(.975, .025), n - 1))   # 0.18498152718354069 0.52465546379966999
 * mean(x) + c(-1, 1) * qt(.975, n - 1) * s / sqrt(n) # 9.8894915862414141 10.310508413758585
 * fit                     # SS 0.030000000000000176 / 0.57000000000000051, F 0.15789473684210606, p 0.857374999999999
 * n0; (msb - msw) / n0    # 2.8888888888888888, -0.027692307692307693
 * sqrt(msw); sqrt(msw) * sqrt((N - k) / qchisq(c(.975, .025), N - k))
 *                         # 0.30822070014844893; 0.19861538736396075 0.67872235906703382
 * </pre>
 */
class PrecisionAnalysisTest {
    private static final Path FILE = Path.of("runs.xlsx");
    static final String[] GROUPS = {"A", "A", "A", "B", "B", "C", "C", "C", "C"};
    static final String[] VALUES = {"10.1", "10.5", "9.7", "10.2", "9.8", "10.4", "9.9", "10.0", "10.3"};

    static String notebook(String options) {
        return """
                ---
                title: Test study
                sources:
                  runs: runs.xlsx
                ---

                ## Precision

                ```precision
                data: runs!Prec!A1:C10
                value: Result
                %s```
                """.formatted(options);
    }

    /** Columns Run (A), Result in mg/kg (B), Level (C); header in row 1, data from row 2. */
    static DataBlock block(String[] groups, String[] values, String[] levels) {
        List<CellValue> g = new ArrayList<>();
        List<CellValue> v = new ArrayList<>();
        List<CellValue> l = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            g.add(cell(0, i + 1, groups[i]));
            v.add(cell(1, i + 1, values[i]));
            l.add(cell(2, i + 1, levels[i]));
        }
        return new DataBlock(FILE, "Prec", "A1:C" + (values.length + 1),
                List.of(new Column("Run", "Run", null, "A", g), new Column("Result (mg/kg)", "Result", "mg/kg", "B", v),
                        new Column("Level", "Level", null, "C", l)), List.of());
    }

    static DataBlock block(String[] groups, String[] values) {
        String[] levels = new String[values.length];
        java.util.Arrays.fill(levels, "L1");
        return block(groups, values, levels);
    }

    private static CellValue cell(int col, int row, String raw) {
        CellRef ref = new CellRef("Prec", row, col);
        if (raw.isEmpty()) {
            return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, raw, null);
        }
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            // Not a number: kept as text, exactly as a reader would.
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static SectionResult run(String options, DataBlock block) {
        Study study = StudyParser.parse(notebook(options), Path.of("study.md"));
        return new PrecisionAnalysis().run(study.cells().get(0), new AnalysisContext(study, ref -> block));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name)).value();
    }

    private static Quantity quantity(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name));
    }

    @Test
    void ungroupedReplicatesGiveMeanSdAndCvWithTheirIntervals() {
        SectionResult s = run("", block(GROUPS, VALUES));
        assertEquals(9, q(s, "n"));
        assertEquals(10.1, q(s, "mean"), 1e-14);
        assertEquals(0.27386127875258315, q(s, "sd"), 1e-15);
        assertEquals(2.7114978094315165, q(s, "cv_percent"), 1e-13);
        assertEquals(0.18498152718354069, quantity(s, "sd").interval().low(), 1e-14);
        assertEquals(0.52465546379966999, quantity(s, "sd").interval().high(), 1e-14);
        assertEquals(9.8894915862414141, quantity(s, "mean").interval().low(), 1e-13);
        assertEquals(10.310508413758585, quantity(s, "mean").interval().high(), 1e-13);
        assertTrue(s.quantity("repeatability_sd").isEmpty(), "no ANOVA without group:");
        assertEquals("mg/kg", quantity(s, "sd").unit());
        everyQuantityHasItsStepAndAKnownName(s);
    }

    @Test
    void unbalancedGroupsWithANegativeBetweenEstimateSetItToZeroAndSaySo() {
        SectionResult s = run("group: Run\n", block(GROUPS, VALUES));
        assertEquals(0.15789473684210606, q(s, "anova_f"), 1e-13);
        assertEquals(0.857374999999999, q(s, "anova_p"), 1e-12);
        assertEquals(0.030000000000000176, step(s, "ss_between").value(), 1e-15);
        assertEquals(0.57000000000000051, step(s, "ss_within").value(), 1e-14);
        assertEquals(2.8888888888888888, step(s, "n0").value(), 1e-14);
        assertEquals(-0.027692307692307693, step(s, "between_variance").value(), 1e-15);
        assertEquals(0.30822070014844893, q(s, "repeatability_sd"), 1e-15);
        assertEquals(0.0, q(s, "between_sd"));
        assertEquals(q(s, "repeatability_sd"), q(s, "intermediate_sd"));
        // With s_L² set to zero the interval of s_I is the repeatability interval, N − k = 6 df.
        assertEquals(0.19861538736396075, quantity(s, "intermediate_sd").interval().low(), 1e-14);
        assertEquals(0.67872235906703382, quantity(s, "intermediate_sd").interval().high(), 1e-14);
        assertEquals(6, step(s, "intermediate_df").value());
        assertEquals(2.8 * 0.30822070014844893, q(s, "repeatability_limit"), 1e-14);
        assertEquals(q(s, "repeatability_limit"), q(s, "intermediate_limit"));
        assertEquals(100 * 0.30822070014844893 / 10.1, q(s, "repeatability_cv_percent"), 1e-12);
        assertTrue(s.warnings().stream().anyMatch(w -> w.contains("negative") && w.contains("set to zero")),
                s.warnings().toString());
        assertTrue(s.settings().stream().anyMatch(x -> x.label().equals("Grouping") && x.value().contains("'Run'")));
        everyQuantityHasItsStepAndAKnownName(s);
    }

    @Test
    void levelsAreAnalysedApartWithSuffixedNames() {
        String[] values = {"10.1", "10.5", "9.7", "20.2", "19.8", "20.4", "19.9", "20.0", "20.3"};
        String[] levels = {"low", "low", "low", "high", "high", "high", "high", "high", "high"};
        SectionResult s = run("level: Level\n", block(GROUPS, values, levels));
        assertEquals(10.1, q(s, "mean:low"), 1e-14);
        assertEquals(3, q(s, "n:low"));
        assertEquals(6, q(s, "n:high"));
        assertEquals(0.4, q(s, "sd:low"), 1e-15); // deviations −0.0, 0.4, −0.4: s = √(0.32/2)
        assertTrue(s.quantity("mean").isEmpty());
        assertTrue(s.figures().size() == 2, "one figure per level");
    }

    @Test
    void excludedResultStaysInTheTableAndLeavesTheStatistics() {
        String[] values = VALUES.clone();
        values[2] = "14.0";
        SectionResult s = run("""
                group: Run
                exclude:
                  - cell: Prec!B4
                    reason: Vial broken before injection
                """, block(GROUPS, values));
        assertEquals(8, q(s, "n"));
        double mean = (10.1 + 10.5 + 10.2 + 9.8 + 10.4 + 9.9 + 10.0 + 10.3) / 8;
        assertEquals(mean, q(s, "mean"), 1e-14);
        assertEquals(9, s.table().rows().size());
        assertEquals("Vial broken before injection", s.table().rows().get(2).exclusionReason());
        assertEquals(List.of("Run", "Result (mg/kg)"), s.table().headers());
    }

    @Test
    void aFarValueIsFlaggedByGrubbsAndNotRemoved() {
        String[] values = {"10.1", "10.2", "10.0", "10.1", "10.2", "10.0", "10.1", "10.2", "12.0"};
        SectionResult s = run("", block(GROUPS, values));
        assertEquals(9, q(s, "n"));
        double[] x = java.util.Arrays.stream(values).mapToDouble(Double::parseDouble).toArray();
        double g = Math.abs(12.0 - q(s, "mean")) / q(s, "sd");
        assertEquals(g, step(s, "grubbs_g").value(), 1e-12);
        assertEquals(x.length, (int) q(s, "n"));
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Grubbs' test flags result Prec!B10")
                && w.contains("outlier") && w.contains("not removed")), s.warnings().toString());
    }

    @Test
    void aWideGroupIsFlaggedByCochran() {
        String[] groups = {"A", "A", "B", "B", "C", "C", "D", "D", "D"};
        String[] values = {"10.0", "10.01", "10.1", "10.11", "9.9", "9.91", "10.0", "11.0", "9.0"};
        SectionResult s = run("group: Run\n", block(groups, values));
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Cochran's test flags the variance of Run D")),
                s.warnings().toString());
    }

    @Test
    void aHorwitzUnitThatIsNoMassFractionIsALocatedError() {
        InputException e = assertThrows(InputException.class, () -> run("horwitz: mg/L\n", block(GROUPS, VALUES)));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertEquals("study.md line 12", e.problems().get(0).where());
    }

    @Test
    void aMeanAboveAMassFractionOfOneMakesHorwitzNotEvaluable() {
        SectionResult s = run("horwitz: '%'\n", block(GROUPS, VALUES)); // 10.1 % is fine
        assertTrue(s.quantity("horwitz_ratio").isPresent());
        SectionResult t = run("horwitz: g/g\n", block(GROUPS, VALUES)); // 10.1 g/g is impossible
        assertTrue(t.quantity("horwitz_ratio").isEmpty());
        assertTrue(t.warnings().stream().anyMatch(w -> w.startsWith("Horwitz ratio not evaluable")), t.warnings().toString());
    }

    @Test
    void aMissingColumnIsALocatedError() {
        InputException e = assertThrows(InputException.class, () -> run("group: Analyst\n", block(GROUPS, VALUES)));
        assertEquals(ErrorKey.MISSING_COLUMN, e.key());
        assertEquals("study.md line 12", e.problems().get(0).where());
    }

    @Test
    void textInTheResultColumnIsALocatedError() {
        String[] values = VALUES.clone();
        values[4] = "n/a";
        InputException e = assertThrows(InputException.class, () -> run("", block(GROUPS, values)));
        assertEquals(ErrorKey.NOT_A_NUMBER, e.key());
        assertTrue(e.problems().get(0).where().contains("Prec!B6"), e.problems().get(0).where());
    }

    @Test
    void aBlankGroupLabelIsALocatedError() {
        String[] groups = GROUPS.clone();
        groups[3] = "";
        InputException e = assertThrows(InputException.class, () -> run("group: Run\n", block(groups, VALUES)));
        assertEquals(ErrorKey.MISSING_LABEL, e.key());
        assertEquals("runs.xlsx, Prec!A5", e.problems().get(0).where());
    }

    @Test
    void tooFewResultsIsALocatedError() {
        InputException e = assertThrows(InputException.class, () -> run("""
                exclude:
                  - cell: Prec!B2
                    reason: a
                  - cell: Prec!B3
                    reason: b
                  - cell: Prec!B4
                    reason: c
                  - cell: Prec!B5
                    reason: d
                  - cell: Prec!B6
                    reason: e
                  - cell: Prec!B7
                    reason: f
                  - cell: Prec!B8
                    reason: g
                  - cell: Prec!B9
                    reason: h
                """, block(GROUPS, VALUES)));
        assertEquals(ErrorKey.TOO_FEW_POINTS, e.key());
        assertEquals("study.md line 10", e.problems().get(0).where());
    }

    @Test
    void aLevelWithOneResultIsNotEvaluableAndTheRestGoesOn() {
        String[] levels = {"low", "high", "high", "high", "high", "high", "high", "high", "high"};
        SectionResult s = run("level: Level\n", block(GROUPS, VALUES, levels));
        assertTrue(s.quantity("mean:low").isEmpty());
        assertTrue(s.quantity("mean:high").isPresent());
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Level low: mean, SD and %CV not evaluable")),
                s.warnings().toString());
    }

    private static Step step(SectionResult s, String name) {
        return s.steps().stream().filter(x -> x.id().equals("precision." + name)).findFirst()
                .orElseThrow(() -> new AssertionError("no step " + name));
    }

    static void everyQuantityHasItsStepAndAKnownName(SectionResult s) {
        Set<String> stepIds = s.steps().stream().map(Step::id).collect(Collectors.toSet());
        for (Quantity quantity : s.quantities()) {
            assertTrue(stepIds.contains(quantity.stepId()), quantity.name() + " has no trail step");
            String base = quantity.name().contains(":") ? quantity.name().substring(0, quantity.name().indexOf(':'))
                    : quantity.name();
            assertTrue(AnalysisKind.PRECISION.reportedNames().contains(base), base + " is not a reported name");
            assertFalse(Double.isNaN(quantity.value()));
        }
    }
}
