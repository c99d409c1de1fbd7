package org.meritbook.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Exported;
import org.meritbook.analysis.LloqLevel;
import org.meritbook.analysis.NominalValues;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.TableCell;
import org.meritbook.analysis.Verdict;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.trail.Step;
import org.meritbook.trail.StepInput;

/**
 * The built-in bioanalysis-m10 profile on constructed runs with exactly the boundary cases. ICH M10
 * (2022), sections on calibration curve and accuracy and precision (from memory): standards and QCs
 * within ±15 % of nominal, ±20 % at the LLOQ; at least 75 % of the standards, at a minimum of six
 * levels; accuracy and precision (CV) 15 %, 20 % at the LLOQ; analytical run acceptance, two thirds of
 * the QCs and half of each level within their limits. "Within ±15 %" includes 15.0 %: a value
 * exactly at the limit passes, anything above it (15.1 %, and as computed even 15.0000001 %) fails.
 */
class M10ProfileTest {
    @TempDir
    Path dir;

    private static final AcceptanceProfile M10 = BuiltInProfiles.all().get("bioanalysis-m10");

    /** A calibration section: point i at nominal[i] ng/mL with deviation[i] %, labelled P0, P1, … */
    private static SectionResult calibration(double[] nominal, double[] deviation) {
        List<Quantity> quantities = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        List<DataTable.Row> rows = new ArrayList<>();
        Map<String, Double> nominals = new java.util.LinkedHashMap<>();
        for (int i = 0; i < nominal.length; i++) {
            String label = "P" + i;
            nominals.put(label, nominal[i]);
            String id = "cal.deviation_percent:" + label;
            quantities.add(new Quantity("deviation_percent:" + label, "dev", deviation[i], "%", id, null, false));
            steps.add(new Step(id, "dev", "%dev = (x̂ − x) / x × 100",
                    List.of(StepInput.number("x", nominal[i], "ng/mL", "Cal!A" + (i + 2))), deviation[i], "%", null));
            rows.add(new DataTable.Row(label, List.of(TableCell.raw("1", "Cal!A" + (i + 2))), null));
        }
        return new SectionResult("cal", AnalysisKind.CALIBRATION, "Calibration", List.of(), quantities, steps,
                new DataTable(List.of("Conc"), rows), List.of(), List.of(), List.of(),
                List.of(new NominalValues(nominals)));
    }

    /**
     * An unknowns section of QC samples: name → {known ng/mL, deviation %}; the known value is a step input.
     * The samples named in {@code atLloq} are the ones the section identified at the LLOQ; none named: the
     * section identified no LLOQ.
     */
    private static SectionResult qcs(Map<String, double[]> samples, String... atLloq) {
        List<Quantity> quantities = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        int row = 2;
        Map<String, Double> nominals = new java.util.LinkedHashMap<>();
        for (Map.Entry<String, double[]> e : samples.entrySet()) {
            nominals.put(e.getKey(), e.getValue()[0]);
            String id = "u.qc_deviation_percent:" + e.getKey();
            double known = e.getValue()[0];
            double dev = e.getValue()[1];
            quantities.add(new Quantity("qc_deviation_percent:" + e.getKey(), "QC", dev, "%", id, null, true));
            steps.add(new Step(id, "QC", "(result − known) / known × 100", List.of(
                    StepInput.number("result", known * (1 + dev / 100), "ng/mL", "u.x0:" + e.getKey()),
                    StepInput.number("known", known, "ng/mL", "Samples!D" + row++)), dev, "%", null));
        }
        return new SectionResult("u", AnalysisKind.UNKNOWNS, "QC samples", List.of(), quantities, steps,
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of(), exports(nominals, atLloq));
    }

    private static List<Exported> exports(Map<String, Double> nominals, String... atLloq) {
        List<Exported> exports = new ArrayList<>(List.of(new NominalValues(nominals)));
        if (atLloq.length > 0) {
            exports.add(new LloqLevel(List.of(atLloq), "named in the test"));
        }
        return exports;
    }

    private static List<Verdict> judged(SectionResult s) {
        return M10.judge(s).verdicts();
    }

    private static List<Verdict.Outcome> outcomes(List<Verdict> vs) {
        return vs.stream().map(Verdict::outcome).toList();
    }

    /** ICH M10's limits on each QC (±15 %, ±20 % at the LLOQ; from memory), as a lab profile writes them. */
    private static final LevelRule PER_QC = new LevelRule(AnalysisKind.UNKNOWNS, "QC samples", "qc_deviation_percent",
            true, 15, 20, "QC deviation", "test");

    private static final Verdict.Outcome PASS = Verdict.Outcome.PASS;
    private static final Verdict.Outcome FAIL = Verdict.Outcome.FAIL;

    @Test
    void qcSamplesAtTheBoundaries() {
        // LLOQ = 1 ng/mL, the QCs the section identified there; the others are judged at ±15 %.
        Map<String, double[]> samples = new java.util.LinkedHashMap<>();
        samples.put("LLOQ-1", new double[] {1, 20.0});
        samples.put("LLOQ-2", new double[] {1, -20.1});
        samples.put("L-1", new double[] {3, 14.9});
        samples.put("L-2", new double[] {3, -15.0});
        samples.put("M-1", new double[] {50, 15.1});
        samples.put("H-1", new double[] {150, 20.0});
        List<Verdict> v = PER_QC.judge(qcs(samples, "LLOQ-1", "LLOQ-2"));
        assertEquals(List.of(PASS, FAIL, PASS, PASS, FAIL, FAIL), outcomes(v), v.toString());
        assertEquals("QC samples (LLOQ-1, LLOQ)", v.get(0).characteristic());
        assertEquals("QC samples (L-1)", v.get(2).characteristic());
        assertEquals("QC deviation = −20.1 %, limit ±20 %", v.get(1).reason());
        assertEquals("QC deviation = 15.1 %, limit ±15 %", v.get(4).reason());
        assertEquals("QC deviation within ±15 % (±20 % at the LLOQ)", v.get(0).rule());
    }

    @Test
    void theLowestQcIsNotTheLloqUnlessTheSectionIdentifiesIt() {
        // A run's low QC sits at about three times the LLOQ and is held to ±15 % (ICH M10, from memory):
        // without an identified LLOQ, +18 % at the lowest QC fails, and each verdict says why.
        Map<String, double[]> samples = new java.util.LinkedHashMap<>();
        samples.put("L-1", new double[] {3, 18.0});
        samples.put("M-1", new double[] {50, 5.0});
        List<Verdict> v = PER_QC.judge(qcs(samples));
        assertEquals(List.of(FAIL, PASS), outcomes(v), v.toString());
        assertEquals("QC samples (L-1)", v.get(0).characteristic());
        assertEquals("QC deviation = 18 %, limit ±15 %; LLOQ not identified (name it with 'lloq-level:' in the cell), "
                + "general limit applied", v.get(0).reason());
        assertEquals("QC deviation = 5 %, limit ±15 %", v.get(1).reason(), "told only where the LLOQ's limit decides");
        // identified, the same QC is judged at ±20 %
        assertEquals(List.of(PASS, PASS), outcomes(PER_QC.judge(qcs(samples, "L-1"))));
        // the profile's run rule: one of two QCs within is less than two thirds, and it says why
        Verdict run = judged(qcs(samples)).get(0);
        assertEquals(FAIL, run.outcome(), run.reason());
        assertEquals("1 of 2 QCs within their limit; by known value 3: 0 of 1, 50: 1 of 1; outside: L-1 (18 %); LLOQ not "
                + "identified (name it with 'lloq-level:' in the cell), general limit applied", run.reason());
        assertEquals("2 of 2 QCs within their limit; by known value 3 (LLOQ): 1 of 1, 50: 1 of 1",
                judged(qcs(samples, "L-1")).get(0).reason());
    }

    @Test
    void aRunPassesWithTwoThirdsOfItsQcsAndHalfAtEachLevel() {
        // ICH M10 (2022), analytical run acceptance (from memory): at least 2/3 of all QCs and at least 50 % at
        // each concentration level within ±15 %. Here 4 of 6, and one of two at the low and the high level.
        Map<String, double[]> samples = new java.util.LinkedHashMap<>();
        samples.put("L-1", new double[] {3, 5.0});
        samples.put("L-2", new double[] {3, 16.0});
        samples.put("M-1", new double[] {50, 3.0});
        samples.put("M-2", new double[] {50, -4.0});
        samples.put("H-1", new double[] {150, 2.0});
        samples.put("H-2", new double[] {150, -17.0});
        List<Verdict> verdicts = judged(qcs(samples));
        assertEquals(1, verdicts.size(), "three levels in duplicate: the design is met, no verdict on it");
        Verdict run = verdicts.get(0);
        assertEquals(PASS, run.outcome(), run.reason());
        assertEquals("QC samples of the run", run.characteristic());
        assertEquals("4 of 6 QCs within their limit; by known value 3: 1 of 2, 50: 2 of 2, 150: 1 of 2; outside: L-2 (16 %), "
                + "H-2 (−17 %)", run.reason());
        // a third QC outside: 3 of 6 is less than two thirds
        samples.put("M-2", new double[] {50, -15.5});
        assertEquals(FAIL, judged(qcs(samples)).get(0).outcome());
        // 4 of 6 overall, but none of the low level: fewer than half at a level
        samples.put("M-2", new double[] {50, -4.0});
        samples.put("L-1", new double[] {3, 15.2});
        samples.put("H-2", new double[] {150, 2.0});
        Verdict level = judged(qcs(samples)).get(0);
        assertEquals(FAIL, level.outcome(), level.reason());
        assertTrue(level.reason().startsWith("4 of 6 QCs within their limit; by known value 3: 0 of 2,"), level.reason());
        // known values that differ only in the last digits of a typed number are one level
        Map<String, double[]> close = new java.util.LinkedHashMap<>();
        close.put("L-1", new double[] {3, 16.0});
        close.put("L-2", new double[] {3.0000000000001, 1.0});
        close.put("M-1", new double[] {50, 1.0});
        Verdict one = judged(qcs(close)).get(0);
        assertEquals(PASS, one.outcome(), one.reason());
        assertTrue(one.reason().startsWith("2 of 3 QCs within their limit; by known value 3: 1 of 2, 50: 1 of 1"), one.reason());
    }

    @Test
    void calibrationStandardsAtTheBoundaries() {
        double[] levels = {1, 2, 5, 10, 20, 50, 100, 200};
        // every standard exactly at or just inside its limit: all 8 pass
        Verdict all = judged(calibration(levels, new double[] {20.0, 14.9, -15.0, 15.0, 0, 1, -2, 3})).get(0);
        assertEquals(PASS, all.outcome(), all.reason());
        assertEquals("8 of 8 standards within their limit, at 8 of 8 levels", all.reason());
        // 20.1 % at the LLOQ and 15.1 % elsewhere are outside
        Verdict two = judged(calibration(levels, new double[] {20.1, 15.1, -15.0, 15.0, 0, 1, -2, 3})).get(0);
        assertEquals("6 of 8 standards within their limit, at 6 of 8 levels; outside: P0 (20.1 %), P1 (15.1 %)",
                two.reason());
        assertEquals(PASS, two.outcome(), "6 of 8 is exactly 75 %, at six levels");
        Verdict three = judged(calibration(levels, new double[] {20.1, 15.1, -15.1, 15.0, 0, 1, -2, 3})).get(0);
        assertEquals(FAIL, three.outcome(), "5 of 8 = 62.5 % is below 75 %: " + three.reason());
    }

    @Test
    void sixLevelsMustPassBesideSeventyFivePercentOfTheStandards() {
        // Twelve standards in duplicate at six levels; three outside, so 9 of 12 = exactly 75 % pass.
        double[] levels = {1, 1, 5, 5, 20, 20, 50, 50, 100, 100, 200, 200};
        Verdict spread = judged(calibration(levels, new double[] {25, 1, 16, 2, 0, 0, -16, 1, 0, 0, 1, 1})).get(0);
        assertEquals(PASS, spread.outcome(), spread.reason());
        assertTrue(spread.reason().startsWith("9 of 12 standards within their limit, at 6 of 6 levels"), spread.reason());
        // the same 75 %, but both standards of one level and one of another outside: five levels pass
        Verdict lost = judged(calibration(levels, new double[] {25, 21, 16, 2, 0, 0, 1, 1, 0, 0, 1, 1})).get(0);
        assertEquals(FAIL, lost.outcome(), lost.reason());
        assertTrue(lost.reason().startsWith("9 of 12 standards within their limit, at 5 of 6 levels"), lost.reason());
        // one standard more outside: 8 of 12 = 66.7 %, below 75 %, though all six levels still have one
        Verdict below = judged(calibration(levels, new double[] {25, 1, 16, 2, 16, 0, -16, 1, 0, 0, 1, 1})).get(0);
        assertEquals(FAIL, below.outcome(), below.reason());
        assertTrue(below.reason().startsWith("8 of 12 standards within their limit, at 6 of 6 levels"), below.reason());
        // five levels only, all within: the six-level minimum fails the curve
        Verdict five = judged(calibration(new double[] {1, 5, 20, 50, 100}, new double[] {0, 0, 0, 0, 0})).get(0);
        assertEquals(FAIL, five.outcome(), five.reason());
    }

    /**
     * An accuracy section whose levels are text labels: error_percent:&lt;level&gt; → recovery_percent:&lt;level&gt;
     * → row recoveries with their known value k, as AccuracyAnalysis records them; {@code lloq} is the level
     * the section identified at the LLOQ ({@code lloq-level:}).
     */
    private static SectionResult accuracy(String[] levels, double[] known, double[] error, String lloq) {
        List<Quantity> quantities = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        Map<String, Double> nominals = new java.util.LinkedHashMap<>();
        for (int i = 0; i < levels.length; i++) {
            String level = levels[i];
            nominals.put(level, known[i]);
            List<StepInput> rows = new ArrayList<>();
            for (int r = 0; r < 3; r++) {
                String rowId = "a.row_recovery_percent:" + level + r;
                double rec = 100 + error[i];
                steps.add(new Step(rowId, "R", "R = m / k × 100", List.of(
                        StepInput.number("m", known[i] * rec / 100, "ng/mL", "Acc!B" + (3 * i + r + 2)),
                        StepInput.number("k", known[i], "ng/mL", "Acc!C" + (3 * i + r + 2))), rec, "%", null));
                quantities.add(new Quantity("row_recovery_percent:" + level + r, "R", rec, "%", rowId, null, false));
                rows.add(StepInput.number("R(" + level + r + ")", rec, "%", rowId));
            }
            String meanId = "a.recovery_percent:" + level;
            steps.add(new Step(meanId, "mean", "mean(R)", rows, 100 + error[i], "%", null));
            quantities.add(new Quantity("recovery_percent:" + level, "mean", 100 + error[i], "%", meanId, null, true));
            String errorId = "a.error_percent:" + level;
            steps.add(new Step(errorId, "error", "mean(R) − 100",
                    List.of(StepInput.number("mean(R)", 100 + error[i], "%", meanId)), error[i], "%", null));
            quantities.add(new Quantity("error_percent:" + level, "error", error[i], "%", errorId, null, false));
        }
        steps.add(new Step("a.error_percent", "error", "mean(R) − 100", List.of(), 30, "%", null));
        quantities.add(new Quantity("error_percent", "overall", 30, "%", "a.error_percent", null, false));
        return new SectionResult("a", AnalysisKind.ACCURACY, "Accuracy", List.of(), quantities, steps,
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of(), exports(nominals, lloq));
    }

    @Test
    void accuracyPerLevelWithTheLevelTheSectionIdentifiedAtTheLloq() {
        // The LLOQ level is listed last: the set-apart level is the identified one, not the first label.
        SectionResult s = accuracy(new String[] {"QC-H", "QC-M", "QC-L", "QC-A"}, new double[] {150, 50, 3, 1},
                new double[] {-15.0, 15.1, 14.9, 20.0}, "QC-A");
        List<Verdict> v = judged(s).stream().filter(x -> x.quantity().startsWith("error_percent")).toList();
        assertEquals(List.of("error_percent:QC-H", "error_percent:QC-M", "error_percent:QC-L", "error_percent:QC-A"),
                v.stream().map(Verdict::quantity).toList(), "per level only: the overall 30 % is not an M10 criterion");
        assertEquals(List.of(PASS, FAIL, PASS, PASS), outcomes(v));
        assertEquals("Accuracy (QC-A, LLOQ)", v.get(3).characteristic());
        SectionResult over = accuracy(new String[] {"QC-H", "QC-A"}, new double[] {150, 1}, new double[] {0, -20.1}, "QC-A");
        assertEquals(FAIL, judged(over).get(1).outcome());
    }

    @Test
    void precisionPerLevelSetsApartTheIdentifiedLevelAndNeverGuessesFromTheMeans() {
        List<Quantity> qs = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        Object[][] levels = {{"QC-H", 148.0, 15.0}, {"QC-L", 3.1, 15.1}, {"QC-A", 1.02, 20.0}};
        for (Object[] l : levels) {
            String level = (String) l[0];
            for (String name : List.of("mean", "cv_percent", "repeatability_cv_percent", "intermediate_cv_percent")) {
                double v = name.equals("mean") ? (double) l[1] : (double) l[2];
                String id = "p." + name + ":" + level;
                steps.add(new Step(id, name, name, List.of(), v, null, null));
                qs.add(new Quantity(name + ":" + level, name, v, name.equals("mean") ? "ng/mL" : "%", id, null, false));
            }
        }
        SectionResult p = new SectionResult("p", AnalysisKind.PRECISION, "Precision", List.of(), qs, steps,
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of(), List.of(
                        new LloqLevel(List.of("QC-A"), "named in the test")));
        List<Verdict> v = judged(p);
        // three rules (within run, between runs, all results), three levels each
        assertEquals(9, v.size(), v.toString());
        assertEquals(List.of(PASS, FAIL, PASS), outcomes(v.subList(0, 3)));
        assertEquals("Precision, within run (QC-A, LLOQ)", v.get(2).characteristic());
        assertEquals("within-run CV = 20 %, limit ≤ 20 %", v.get(2).reason());
        // not identified: the level with the lowest mean is not taken for the LLOQ
        SectionResult unnamed = new SectionResult("p", AnalysisKind.PRECISION, "Precision", List.of(), qs, steps,
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of());
        List<Verdict> general = judged(unnamed);
        assertEquals(List.of(PASS, FAIL, FAIL), outcomes(general.subList(0, 3)));
        assertEquals("Precision, within run (QC-A)", general.get(2).characteristic());
    }

    @Test
    void aSingleLevelIsAtTheLloqOnlyWhenIdentifiedAndAMissingFamilyIsNotEvaluable() {
        Map<String, double[]> one = Map.of("QC-1", new double[] {5, 18});
        Verdict v = PER_QC.judge(qcs(one)).get(0);
        assertEquals(FAIL, v.outcome(), "one level, no LLOQ identified: the general ±15 % applies");
        assertTrue(v.reason().endsWith("; LLOQ not identified (name it with 'lloq-level:' in the cell), general limit "
                + "applied"), v.reason());
        assertEquals(PASS, PER_QC.judge(qcs(one, "QC-1")).get(0).outcome(), "a run of LLOQ QCs alone: ±20 %");
        SectionResult noQc = new SectionResult("u", AnalysisKind.UNKNOWNS, "Samples", List.of(), List.of(), List.of(),
                new DataTable(List.of(), List.of()), List.of(), List.of(), List.of());
        assertEquals(Verdict.Outcome.NOT_EVALUABLE, judged(noQc).get(0).outcome());
    }

    @Test
    void roundedToTheLimitFifteenPointZeroFourIsWithinFifteen() {
        // A limit of 15 has no decimals (Comparison.decimals): 15.04 rounds to 15 and is within; 15.5 rounds
        // (half away from zero) to 16 and is not. As computed, 15.04 is outside.
        LevelRule qc = new LevelRule(AnalysisKind.UNKNOWNS, "QC", "qc_deviation_percent", true, 15.0, 20.0, "QC deviation",
                "test");
        Map<String, double[]> samples = new java.util.LinkedHashMap<>();
        samples.put("A", new double[] {1, 0});
        samples.put("B", new double[] {3, -15.04});
        samples.put("C", new double[] {50, 15.5});
        List<Verdict> rounded = qc.judge(qcs(samples, "A"), Comparison.ROUNDED_TO_LIMIT);
        assertEquals(List.of(PASS, PASS, FAIL), outcomes(rounded));
        assertEquals("QC deviation = −15 % (rounded from −15.04 %), limit ±15 %", rounded.get(1).reason());
        assertEquals(List.of(PASS, FAIL, FAIL), outcomes(qc.judge(qcs(samples, "A"), Comparison.AS_COMPUTED)));
    }

    @Test
    void aLabProfileWritesTheSameRulesAndItsMistakesAreRefusedWhenRead() throws Exception {
        Path file = dir.resolve("lab.yaml");
        Files.writeString(file, """
                rules:
                  - quantity: deviation_percent
                    within: 15
                    lowest-level-within: 20
                    fraction: 0.75
                    minimum-levels: 6
                  - kind: unknowns
                    quantity: qc_deviation_percent
                    within: 15
                    lowest-level-within: 20
                  - kind: precision
                    quantity: cv_percent
                    at-most: 15
                    lowest-level-at-most: 20
                  - kind: detection-limit
                    quantity: loq
                    not-above: lowest_standard
                  - kind: unknowns
                    quantity: qc_deviation_percent
                    characteristic: Run QCs
                    within: 15
                    fraction: 2/3
                    fraction-per-level: 0.5
                    minimum-per-level: 2
                """);
        List<Rule> rules = ProfileFile.read(file, "lab.yaml").rules();
        assertEquals(new QcRunRule("Run QCs", 15, 15, 2.0 / 3, 0.5, new QcRunRule.Design(0, 2), "laboratory profile"),
                rules.get(4));
        // two thirds written as a ratio is two thirds: 4 of 6 QCs within pass (0.667 would ask for 4.002)
        Map<String, double[]> run = new java.util.LinkedHashMap<>();
        run.put("L-1", new double[] {3, 5.0});
        run.put("L-2", new double[] {3, 16.0});
        run.put("M-1", new double[] {50, 3.0});
        run.put("M-2", new double[] {50, 17.0});
        run.put("H-1", new double[] {150, 2.0});
        run.put("H-2", new double[] {150, -1.0});
        assertEquals(PASS, rules.get(4).judge(qcs(run)).get(0).outcome());
        assertEquals(new DeviationRule("deviation_percent", 15, 20, 0.75, 6, "laboratory profile"), rules.get(0));
        assertEquals(new LevelRule(AnalysisKind.UNKNOWNS, "qc_deviation_percent", "qc_deviation_percent", true, 15, 20,
                "qc_deviation_percent", "laboratory profile"), rules.get(1));
        assertEquals(new LevelRule(AnalysisKind.PRECISION, "cv_percent", "cv_percent", false, 15, 20, "cv_percent",
                "laboratory profile"), rules.get(2));
        assertEquals(new BoundRule(AnalysisKind.DETECTION_LIMIT, "loq", "loq", false, "lowest_standard", "loq",
                "lowest_standard", "laboratory profile"), rules.get(3));

        // A misspelt quantity as the bound would leave the rule not evaluable for ever: refused when read.
        Files.writeString(file, "rules:\n  - kind: detection-limit\n    quantity: loq\n    not-above: reporting_limt\n");
        InputException e = assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml"));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, e.key());
        assertTrue(e.getMessage().startsWith("lab.yaml: expected rule 1: for 'not-above' the name of another quantity "
                + "a detection-limit cell reports (lod, loq, critical_value, lowest_standard, reporting_limit); a number "
                + "goes after 'at-most:' but found 'reporting_limt' (did you mean 'reporting_limit'?)"), e.getMessage());
        Files.writeString(file, "rules:\n  - kind: detection-limit\n    quantity: loq\n    not-above: 0.05\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("found '0.05'"));
        Files.writeString(file, "rules:\n  - kind: unknowns\n    quantity: qc_deviaton_percent\n    within: 15\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("(did you mean 'qc_deviation_percent'?)"));
        Files.writeString(file, "rules:\n  - kind: precision\n    quantity: cv_percent\n    at-most: 15\n"
                + "    lowest-level-within: 20\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("'lowest-level-within:' only beside 'within:'"));
        Files.writeString(file, "rules:\n  - kind: precision\n    quantity: cv_percent\n    at-most: 15\n"
                + "    fraction-per-level: 0.5\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("'fraction-per-level:' only in a rule on a calibration's deviation_percent or on a run's QCs "
                        + "(an unknowns cell's qc_deviation_percent)"));
        Files.writeString(file, "rules:\n  - kind: unknowns\n    quantity: qc_deviation_percent\n    within: 15\n"
                + "    fraction: 1.5\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("for 'fraction' a share in (0, 1], as a number (0.75) or a ratio (2/3) but found '1.5'"));
        Files.writeString(file, "rules:\n  - kind: unknowns\n    quantity: qc_deviation_percent\n    within: 0\n"
                + "    fraction: 2/3\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("a positive number for 'within' but found '0'"), "an input error, not a crash");
        Files.writeString(file, "rules:\n  - kind: unknowns\n    quantity: qc_deviation_percent\n    at-most: 15\n"
                + "    fraction: 2/3\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("but found ['at-most:']"), "a limit key the rule would ignore is refused");
        Files.writeString(file, "rules:\n  - quantity: r_squared\n    at-least: 0.99\n    at-most: 1\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("found at-least, at-most"));
        Files.writeString(file, "rules:\n  - quantity: deviation_percent\n    within: 15\n    minimum-levels: 5.5\n");
        assertTrue(assertThrows(InputException.class, () -> ProfileFile.read(file, "lab.yaml")).getMessage()
                .contains("a whole number for 'minimum-levels'"));
    }

    @Test
    void everyBuiltInRuleNamesWhatItJudgesAndItsSource() {
        for (AcceptanceProfile p : BuiltInProfiles.all().values()) {
            assertEquals("built in", p.origin());
            for (Rule r : p.rules()) {
                assertTrue(r.source() != null && !r.source().isBlank(), p.name() + ": " + r.text());
            }
        }
        for (String name : List.of("drug-substance-assay", "bioanalysis-m10", "trace-environmental")) {
            assertTrue(BuiltInProfiles.all().get(name).rules().stream().allMatch(r -> r.source().contains("confirm locally")),
                    name + ": every new built-in limit is a default to confirm locally");
        }
    }
}
