package org.meritbook.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.NominalValues;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.Setting;
import org.meritbook.analysis.TableCell;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.StudyParser;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;
import org.meritbook.analysis.Verdict;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AcceptanceTest {
    @TempDir
    Path dir;

    /**
     * A calibration section with the given nominal levels and % deviations; point i is labelled Pi
     * and is excluded when its label is listed.
     */
    private static SectionResult calibration(double[] nominal, double[] deviation, String model, double rSquared,
                                             List<String> excluded) {
        List<Quantity> quantities = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        List<DataTable.Row> rows = new ArrayList<>();
        java.util.Map<String, Double> nominals = new java.util.LinkedHashMap<>();
        quantities.add(new Quantity("r_squared", "r²", rSquared, null, "cal.r_squared", null, true));
        steps.add(new Step("cal.r_squared", "r²", "r²", List.of(), rSquared, null, null));
        for (int i = 0; i < nominal.length; i++) {
            String label = "P" + i;
            nominals.put(label, nominal[i]);
            String id = "cal.deviation_percent:" + label;
            quantities.add(new Quantity("deviation_percent:" + label, "dev", deviation[i], "%", id, null, false));
            steps.add(new Step(id, "dev", "%dev = (x̂ − x) / x × 100",
                    List.of(StepInput.number("x", nominal[i], "ng/mL", "Cal!A" + (i + 2))), deviation[i], "%", null));
            rows.add(new DataTable.Row(label, List.of(TableCell.raw("1", "Cal!A" + (i + 2))),
                    excluded.contains(label) ? "failed injection" : null));
        }
        return new SectionResult("cal", AnalysisKind.CALIBRATION, "Linearity", List.of(new Setting("Model", "model " + model, model)),
                quantities, steps, new DataTable(List.of("Conc"), rows), List.of(), List.of(), List.of(),
                List.of(new NominalValues(nominals)));
    }

    private static final double[] LEVELS = {1, 2, 5, 10, 20, 50, 100, 200};

    @Test
    void standardsWithinFifteenPercentAndTwentyAtTheLowestLevelPass() {
        // ICH M10 calibration-curve criteria (±15 %, ±20 % at the LLOQ, ≥ 75 % of standards), from memory.
        DeviationRule rule = new DeviationRule("Back-calculated standards", 15, 20, 0.75, "ICH M10");
        double[] dev = {-18, 3, -2, 16.5, 1, 0, -4, 2}; // lowest level −18 % is within ±20 %; 10 ng/mL at +16.5 % is not
        Verdict v = rule.judge(calibration(LEVELS, dev, "linear", 0.999, List.of())).get(0);
        assertEquals(Verdict.Outcome.PASS, v.outcome(), v.reason());
        assertEquals("7 of 8 standards within their limit; outside: P3 (16.5 %)", v.reason());

        double[] worse = {-22, 3, -2, 16.5, 1, 0, -15.5, 2}; // 5 of 8 = 62.5 % < 75 %
        Verdict f = rule.judge(calibration(LEVELS, worse, "linear", 0.999, List.of())).get(0);
        assertEquals(Verdict.Outcome.FAIL, f.outcome());
        assertEquals("5 of 8 standards within their limit; outside: P0 (−22 %), P3 (16.5 %), P6 (−15.5 %)", f.reason());
    }

    @Test
    void excludedStandardsAreNotJudged() {
        DeviationRule rule = new DeviationRule("Back-calculated standards", 15, 20, 1.0, "all must pass");
        double[] dev = {1, 2, -40, 3, 1, 0, -4, 2};
        assertEquals(Verdict.Outcome.PASS, rule.judge(calibration(LEVELS, dev, "linear", 0.999, List.of("P2")))
                .get(0).outcome());
        assertEquals(Verdict.Outcome.FAIL, rule.judge(calibration(LEVELS, dev, "linear", 0.999, List.of()))
                .get(0).outcome());
    }

    @Test
    void aQuantityRulePassesFailsOrIsNotEvaluable() {
        QuantityRule r2 = new QuantityRule(AnalysisKind.CALIBRATION, "Linearity", "r_squared", true, 0.995, "r²", null, "x");
        double[] dev = {0, 0, 0, 0, 0, 0, 0, 0};
        Verdict pass = r2.judge(calibration(LEVELS, dev, "linear", 0.9991, List.of())).get(0);
        assertEquals(Verdict.Outcome.PASS, pass.outcome());
        assertEquals("r² = 0.9991", pass.reason());
        assertEquals(Verdict.Outcome.FAIL, r2.judge(calibration(LEVELS, dev, "linear", 0.99, List.of()))
                .get(0).outcome());
        QuantityRule mandel = new QuantityRule(AnalysisKind.CALIBRATION, "No curvature", "mandel_p", true, 0.05,
                "Mandel p", "linear", "x");
        assertEquals(Verdict.Outcome.NOT_EVALUABLE, mandel.judge(calibration(LEVELS, dev, "linear", 1, List.of()))
                .get(0).outcome());
        assertTrue(mandel.judge(calibration(LEVELS, dev, "quadratic", 1, List.of())).isEmpty(),
                "Mandel's rule does not judge a quadratic calibration");
    }

    @Test
    void everyRuleOfLinearityBasicJudgesAStraightLineAndARuleThatJudgesNothingIsNamed() {
        // Regression: the built-in Mandel rule once named its model "straight line", a display text no
        // section carries, and judged nothing — silently, beside two passes.
        AcceptanceProfile basic = BuiltInProfiles.all().get("linearity-basic");
        double[] dev = {0, 0, 0, 0, 0, 0, 0, 0};
        SectionResult line = basic.judge(calibration(LEVELS, dev, "linear", 0.9991, List.of()));
        assertEquals(List.of("r_squared", "lack_of_fit_p", "mandel_p"),
                line.verdicts().stream().map(Verdict::quantity).toList());
        assertEquals(List.of(), basic.unapplied(List.of(line)));
        SectionResult curve = calibration(LEVELS, dev, "quadratic", 0.9991, List.of());
        assertEquals(List.of("Mandel p ≥ 0.05"), basic.unapplied(List.of(curve)).stream().map(Rule::text).toList());
        assertEquals("model of the rule on mandel_p must be a notebook word (linear, quadratic, "
                + "linear-through-origin), not 'straight line'", assertThrows(IllegalArgumentException.class,
                        () -> new QuantityRule(AnalysisKind.CALIBRATION, "No curvature", "mandel_p", true, 0.05,
                                "Mandel p", "straight line", "x")).getMessage());
    }

    @Test
    void aLabProfileFileIsReadAndItsMistakesLocated() throws Exception {
        Path file = dir.resolve("lab.yaml");
        Files.writeString(file, """
                name: QC lab linearity
                rules:
                  - quantity: r_squared
                    at-least: 0.998
                    characteristic: Linearity
                    source: SOP QA-12
                  - quantity: deviation_percent
                    within: 10
                    lowest-level-within: 15
                    fraction: 0.8
                """);
        AcceptanceProfile p = ProfileFile.read(file, "lab.yaml");
        assertEquals("QC lab linearity", p.name());
        assertEquals("r_squared ≥ 0.998", p.rules().get(0).text());
        assertEquals(new DeviationRule("deviation_percent", 10, 15, 0.8, "laboratory profile"), p.rules().get(1));

        Files.writeString(file, "rules:\n  - quantity: r_squared\n    at-least: high\n");
        InputException e = assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml"));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertEquals("lab.yaml: expected rule 1: a non-negative number for 'at-least' but found 'high'. Correct the "
                + "acceptance profile file (its format is in docs/criteria.md).", e.getMessage());
        Files.writeString(file, "rules:\n  - quantity: r_squared\n    atleast: 0.9\n");
        assertEquals(ErrorKey.UNKNOWN_OPTION, assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).key());
    }

    @Test
    void aMisspeltQuantityOrModelIsRefusedWhenTheProfileIsRead() throws Exception {
        // A rule that names nothing a section reports would judge nothing and let the study pass.
        Path file = dir.resolve("lab.yaml");
        Files.writeString(file, "rules:\n  - quantity: r_sqared\n    at-least: 0.99\n");
        InputException e = assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml"));
        assertTrue(e.getMessage().contains("found 'r_sqared' (did you mean 'r_squared'?)"), e.getMessage());
        Files.writeString(file, "rules:\n  - quantity: r_squared\n    at-least: 0.99\n    model: straight line\n");
        e = assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml"));
        assertTrue(e.getMessage().contains("'model:' one of linear, quadratic, linear-through-origin"), e.getMessage());
        Files.writeString(file, "rules:\n  - quantity: r_squared\n    at-least: 0.995\n    model: linear\n");
        Rule linear = ProfileFile.read(file, "lab.yaml").rules().get(0);
        double[] dev = {0, 0, 0, 0, 0, 0, 0, 0};
        assertEquals(Verdict.Outcome.FAIL, linear.judge(calibration(LEVELS, dev, "linear", 0.99, List.of())).get(0).outcome(),
                "model: linear judges a linear calibration (it once matched the display text and judged nothing)");
        assertTrue(linear.judge(calibration(LEVELS, dev, "quadratic", 0.99, List.of())).isEmpty());
    }

    @Test
    void aFamilyNameJudgesEveryMemberAndAMemberNameOnlyItself() {
        List<Quantity> qs = List.of(
                new Quantity("repeatability_cv_percent:QC-N", "RSD", 2.5, "%", "p.a", null, false),
                new Quantity("repeatability_cv_percent:QC-S", "RSD", 1.0, "%", "p.b", null, false));
        SectionResult precision = new SectionResult("p", AnalysisKind.PRECISION, "Precision", List.of(), qs, List.of(),
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of());
        QuantityRule family = new QuantityRule(AnalysisKind.PRECISION, "Repeatability", "repeatability_cv_percent", false,
                2.0, "RSDr", null, "common practice, no source");
        List<Verdict> verdicts = family.judge(precision);
        assertEquals(List.of(Verdict.Outcome.FAIL, Verdict.Outcome.PASS), verdicts.stream().map(Verdict::outcome).toList());
        assertEquals("Repeatability (QC-N)", verdicts.get(0).characteristic());
        QuantityRule member = new QuantityRule(AnalysisKind.PRECISION, "Repeatability", "repeatability_cv_percent:QC-S",
                false, 2.0, "RSDr", null, "common practice, no source");
        assertEquals(1, member.judge(precision).size());
        assertEquals(Verdict.Outcome.PASS, member.judge(precision).get(0).outcome());
    }

    @Test
    void aFamilyNameJudgesTheOverallValueAndEveryLevel() {
        List<Quantity> qs = List.of(
                new Quantity("recovery_percent:low", "Mean recovery", 78.0, "%", "a.a", null, false),
                new Quantity("recovery_percent:high", "Mean recovery", 101.0, "%", "a.b", null, false),
                new Quantity("recovery_percent", "Mean recovery", 89.5, "%", "a.c", null, false),
                new Quantity("row_recovery_percent:F6", "Recovery of F6", 60.0, "%", "a.d", null, false));
        SectionResult accuracy = new SectionResult("a", AnalysisKind.ACCURACY, "Trueness", List.of(), qs, List.of(),
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of());
        QuantityRule rule = new QuantityRule(AnalysisKind.ACCURACY, "Recovery", "recovery_percent", true, 80,
                "mean recovery (%)", null, "invented limit");
        List<Verdict> verdicts = rule.judge(accuracy);
        // Not the row's recovery: row_recovery_percent is another family.
        assertEquals(List.of("Recovery (low)", "Recovery (high)", "Recovery"),
                verdicts.stream().map(Verdict::characteristic).toList());
        assertEquals(List.of(Verdict.Outcome.FAIL, Verdict.Outcome.PASS, Verdict.Outcome.PASS),
                verdicts.stream().map(Verdict::outcome).toList());
    }

    @Test
    void anUnknownProfileNameListsTheBuiltInOnes() {
        var study = StudyParser.parse("---\ntitle: t\ncriteria: trace-metals\n---\n", dir.resolve("s.md"));
        InputException e = assertThrows(InputException.class, () -> AcceptanceProfiles.of(study));
        assertTrue(e.getMessage().startsWith("s.md line 3: expected a built-in acceptance profile "
                + "(linearity-basic, bioanalytical-calibration, recovery-ppm, food-precision-10-mg-kg, drug-substance-assay, "
                + "bioanalysis-m10, trace-environmental) or a .yaml profile file"
                + " but found 'trace-metals'."),
                e.getMessage());
    }

    // The −2.00496 % against "within 2" case of issue 6. Rounding to the limit's decimals before comparing
    // is pharmacopoeial practice (USP General Notices, significant figures and rounding; from memory).
    private static final double[] TWO_LEVELS = {1, 10};
    private static final double[] NEAR_TWO = {0.5, -2.00496};

    @Test
    void asComputedTheDeviationJustOverTheLimitFailsAndPrintsTheDigitsThatShowWhy() {
        DeviationRule rule = new DeviationRule("Back-calculated standards", 2, 5, 1.0, "test limit");
        Verdict v = rule.judge(calibration(TWO_LEVELS, NEAR_TWO, "linear", 0.999, List.of()),
                Comparison.AS_COMPUTED).get(0);
        assertEquals(Verdict.Outcome.FAIL, v.outcome());
        assertEquals("1 of 2 standards within their limit; outside: P1 (−2.00496 %)", v.reason());
    }

    @Test
    void roundedToTheLimitTheSameDeviationIsWithinAndPrintsTheRoundedValue() {
        DeviationRule rule = new DeviationRule("Back-calculated standards", 2, 5, 1.0, "test limit");
        Verdict v = rule.judge(calibration(TWO_LEVELS, NEAR_TWO, "linear", 0.999, List.of()),
                Comparison.ROUNDED_TO_LIMIT).get(0);
        assertEquals(Verdict.Outcome.PASS, v.outcome(), v.reason());
        assertEquals("2 of 2 standards within their limit", v.reason());
    }

    @Test
    void aQuantityRuleJudgesBothWaysAndItsPrintedValueAgreesWithItsVerdict() {
        QuantityRule atMost = new QuantityRule(AnalysisKind.CALIBRATION, "Fit", "r_squared", false, 2, "v", null, "test");
        SectionResult s = calibration(TWO_LEVELS, NEAR_TWO, "linear", 2.00496, List.of());
        Verdict computed = atMost.judge(s, Comparison.AS_COMPUTED).get(0);
        assertEquals(Verdict.Outcome.FAIL, computed.outcome());
        assertEquals("v = 2.00496", computed.reason());
        Verdict rounded = atMost.judge(s, Comparison.ROUNDED_TO_LIMIT).get(0);
        assertEquals(Verdict.Outcome.PASS, rounded.outcome());
        assertEquals("v = 2 (rounded from 2.00496)", rounded.reason());
    }

    @Test
    void sixSignificantFiguresNeverPrintTheLimitItselfForAValueThatFails() {
        // 2.0000004 prints as 2 at six significant figures, which would contradict "fail ≤ 2".
        assertEquals("2.0000004", Comparison.AS_COMPUTED.text(2.0000004, 2));
        assertEquals("2.00496", Comparison.AS_COMPUTED.text(2.00496, 2));
        assertEquals("0.998735", Comparison.AS_COMPUTED.text(0.998734567, 0.995));
        // rounded to the limit's decimals, half away from zero: 0.9945 against 0.995 rounds to 0.995 (pass ≥)
        assertTrue(Comparison.ROUNDED_TO_LIMIT.passes(0.9945, 0.995, true));
        assertTrue(!Comparison.AS_COMPUTED.passes(0.9945, 0.995, true));
        assertEquals(3, Comparison.decimals(0.995));
        assertEquals(0, Comparison.decimals(15));
    }

    @Test
    void aProfileFileStatesItsComparisonAndAMisspeltOneIsRefused() throws Exception {
        Path file = dir.resolve("lab.yaml");
        Files.writeString(file,
                "compare: rounded-to-limit\nrules:\n  - quantity: r_squared\n    at-least: 0.995\n");
        assertEquals(Comparison.ROUNDED_TO_LIMIT, ProfileFile.read(file, "lab.yaml").comparison());
        Files.writeString(file, "rules:\n  - quantity: r_squared\n    at-least: 0.995\n");
        assertEquals(Comparison.AS_COMPUTED, ProfileFile.read(file, "lab.yaml").comparison(), "the default");
        Files.writeString(file, "compare: rounded\nrules:\n  - quantity: r_squared\n    at-least: 0.995\n");
        InputException e = assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml"));
        assertTrue(e.getMessage().contains("'compare:' one of as-computed, rounded-to-limit"), e.getMessage());
        assertTrue(BuiltInProfiles.all().values().stream().allMatch(p -> p.comparison() == Comparison.AS_COMPUTED));
    }
}
