package org.meritbook.analysis.detection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.meritbook.analysis.detection.DetectionFixture.numbers;

import java.util.Set;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.stats.distributions.StudentT;
import org.meritbook.trail.Step;

/**
 * Reference values: R 4.x (lm, qt, sd, shapiro.test, uniroot), script in
 * src/test/resources/detection/reference.R, output quoted beside each assertion. Data: Miller &amp;
 * Miller's fluorescence calibration (handbook worked example, from memory) and the demo workbook's
 * invented MDL, LowLevel and SignalNoise blocks.
 */
class DetectionLimitAnalysisTest {
    private static final double[] MM_X = {0, 2, 4, 6, 8, 10, 12};
    private static final double[] MM_Y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
    private static final double[] BLANK_SIGNALS = {2.0, 2.3, 1.8, 2.1, 2.4, 1.9, 2.2, 2.0};
    private static final double[] SPIKES = {0.505, 0.528, 0.493, 0.491, 0.504, 0.517, 0.512, 0.486};
    private static final String[] SPIKE_BATCH = {"B1", "B1", "B1", "B2", "B2", "B2", "B3", "B3"};
    private static final double[] METHOD_BLANKS = {0.022, 0.01, 0.01, 0.03, 0.017, 0.018, 0.021, -0.036, 0.033, 0.021};
    private static final String[] BLANK_BATCH = {"B1", "B1", "B1", "B1", "B2", "B2", "B2", "B3", "B3", "B3"};
    private static final double[] LOB_BLANKS = {0.007, 0.009, 0.01, -0.012, 0.016, 0.023, 0.028, -0.012, -0.01,
        -0.001, 0.011, 0.003, 0.019, 0.053, 0.009, -0.021, 0.014, -0.008, 0.03, -0.012};
    private static final double[] LOW = {0.108, 0.083, 0.102, 0.104, 0.059, 0.087, 0.093, 0.133, 0.106, 0.126, 0.097,
        0.106, 0.215, 0.2, 0.221, 0.151, 0.19, 0.179};

    private static final String CALIBRATION = """
            ```calibration
            id: cal
            data: lab!Cal!A1:B8
            x: Conc
            y: Signal
            ```

            """;

    private static DetectionFixture fixture() {
        String[] samples = new String[18];
        for (int i = 0; i < 18; i++) {
            samples[i] = "LL-" + (i / 6 + 1);
        }
        String[] spiked = new String[8];
        java.util.Arrays.fill(spiked, "0.5");
        return new DetectionFixture()
                .block("Cal", 0, "A1:B8", new String[] {"Conc (pg/mL)", "Signal (units)"},
                        new String[][] {numbers(MM_X), numbers(MM_Y)})
                .block("Blanks", 0, "A1:A9", new String[] {"Signal (units)"}, new String[][] {numbers(BLANK_SIGNALS)})
                .block("MDL", 0, "A1:C9", new String[] {"Spiked (mg/kg)", "Batch", "Result (mg/kg)"},
                        new String[][] {spiked, SPIKE_BATCH, numbers(SPIKES)})
                .block("MDL", 4, "E1:F11", new String[] {"Batch", "Result (mg/kg)"},
                        new String[][] {BLANK_BATCH, numbers(METHOD_BLANKS)})
                .block("Low", 0, "A1:A21", new String[] {"Result (mg/kg)"}, new String[][] {numbers(LOB_BLANKS)})
                .block("Low", 2, "C1:D19", new String[] {"Sample", "Result (mg/kg)"},
                        new String[][] {samples, numbers(LOW)})
                .block("SN", 0, "A1:C4", new String[] {"Nominal (mg/L)", "Height (mAU)", "Noise (mAU)"},
                        new String[][] {numbers(0.1, 0.1, 0.1), numbers(0.622, 0.625, 0.612),
                            numbers(0.0212, 0.0199, 0.0192)});
    }

    private static String cell(String options) {
        return "## Limits\n\n```detection-limit\n" + options + "```\n";
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name + " in "
                + s.quantities().stream().map(Quantity::name).toList() + "; warnings " + s.warnings())).value();
    }

    private static void everyQuantityHasItsStep(SectionResult s) {
        Set<String> ids = s.steps().stream().map(Step::id).collect(Collectors.toSet());
        for (Quantity quantity : s.quantities()) {
            assertTrue(ids.contains(quantity.stepId()), quantity.name() + " has no trail step");
        }
    }

    @Test
    void calibrationAsTheBlankMatchesTheHandbookFigure() {
        SectionResult s = fixture().run(CALIBRATION + cell("methods: [blank]\ncalibration: cal\n"));
        // Miller & Miller (ch. 5, from memory): y_B = a = 1.52, s_B = s(y/x) = 0.4329, LOD = 0.67 pg/mL.
        // R: 3*s/b = 0.672695798559935, 10*s/b = 2.24231932853312.
        assertEquals(0.672695798559935, q(s, "lod:blank"), 1e-12);
        assertEquals(0.67, q(s, "lod:blank"), 0.005);
        assertEquals(2.24231932853312, q(s, "loq:blank"), 1e-12);
        assertEquals(q(s, "lod:blank"), q(s, "lod"), 0);
        assertEquals("pg/mL", s.quantity("lod").orElseThrow().unit());
        everyQuantityHasItsStep(s);
        // The trail links to the calibration's own steps.
        Step step = s.steps().stream().filter(x -> x.id().equals("detection-limit.lod:blank")).findFirst().orElseThrow();
        assertTrue(step.inputs().stream().anyMatch(i -> i.source().equals("cal.slope")), step.inputs().toString());
    }

    @Test
    void blankSignalsResponseSdAndPredictionBandAgainstR() {
        SectionResult s = fixture().run(CALIBRATION + cell("""
                methods: [blank, response-sd, prediction-band]
                calibration: cal
                blanks: {data: lab!Blanks!A1:A9, column: Signal}
                """));
        // R: (mean(yb) + 3 sd(yb) − a)/b = 0.610739697497417; with 10: 1.34723901632658.
        assertEquals(0.610739697497417, q(s, "lod:blank"), 1e-12);
        assertEquals(1.34723901632658, q(s, "loq:blank"), 1e-12);
        // ICH Q2(R2), from memory: 3.3·s(y/x)/b = 0.739965378415928, 10·s(y/x)/b = 2.24231932853312 (R).
        assertEquals(0.739965378415928, q(s, "lod:response-sd"), 1e-12);
        assertEquals(2.24231932853312, q(s, "loq:response-sd"), 1e-12);
        // ISO 11843-2 / Hubaux–Vos, unweighted, α = β = 0.05 (R): x_C = 0.546758885384041, x_D = 1.09351777076808.
        assertEquals(0.546758885384041, q(s, "critical_value:prediction-band"), 1e-10);
        assertEquals(1.09351777076808, q(s, "lod:prediction-band"), 1e-10);
        assertEquals(3, s.table().rows().size());
        assertEquals("prediction-band", s.table().rows().get(2).label());
        everyQuantityHasItsStep(s);
        // The blank figure draws y_L on the blank signals' scale; the low-end figure draws each limit in pg/mL.
        assertEquals(java.util.List.of("detection-limit.blanks", "detection-limit.low-end"),
                s.figures().stream().map(org.meritbook.figures.FigureSpec::id).toList());
        var lowEnd = s.figures().get(1).series().stream().filter(x -> x.name().equals("x_D, prediction band"))
                .findFirst().orElseThrow();
        assertEquals(q(s, "lod:prediction-band"), lowEnd.x()[0], 0);
    }

    @Test
    void responseSdFromTheInterceptAndFromTheBlanks() {
        SectionResult byIntercept = fixture().run(CALIBRATION + cell("methods: [response-sd]\ncalibration: cal\n"
                + "sigma: intercept\n"));
        // R: 3.3·SE(a)/b = 0.504201415830199, 10·SE(a)/b = 1.52788307827333.
        assertEquals(0.504201415830199, q(byIntercept, "lod"), 1e-12);
        assertEquals(1.52788307827333, q(byIntercept, "loq"), 1e-12);
        SectionResult byBlank = fixture().run(CALIBRATION + cell("methods: [response-sd]\ncalibration: cal\n"
                + "sigma: blank\nblanks: {data: lab!Blanks!A1:A9, column: Signal}\n"));
        // R: 3.3·sd(yb)/b = 0.347206821733748.
        assertEquals(0.347206821733748, q(byBlank, "lod:response-sd"), 1e-12);
    }

    @Test
    void mdlTakesTheLargerOfSpikedAndBlank() {
        SectionResult s = fixture().run(cell("""
                methods: [mdl]
                spikes: {data: lab!MDL!A1:C9, column: Result, batch: Batch, spiked: Spiked}
                blanks: {data: lab!MDL!E1:F11, column: Result, units: concentration, batch: Batch}
                """));
        // 40 CFR 136 App. B Rev. 2 (from memory); R: MDL_s = qt(0.99, 7)·sd = 0.0427292618627457,
        // MDL_b = max(mean, 0) + qt(0.99, 9)·sd = 0.0688909958479025; MDL = the larger.
        Step spiked = s.steps().stream().filter(x -> x.id().equals("detection-limit.mdl_spiked")).findFirst().orElseThrow();
        assertEquals(0.0427292618627457, spiked.value(), 1e-13);
        assertEquals(0.0688909958479025, q(s, "lod:mdl"), 1e-13);
        assertEquals("mg/kg", s.quantity("lod").orElseThrow().unit());
        assertTrue(s.quantity("loq").isEmpty(), "the MDL procedure defines no LOQ");
        // Three batches each, spike level 0.5 < 10 × MDL: no procedural warning.
        assertTrue(s.warnings().isEmpty(), s.warnings().toString());
        everyQuantityHasItsStep(s);
    }

    @Test
    void mdlWarnsAboutSpikeLevelAndBatches() {
        DetectionFixture f = fixture();
        String[] high = new String[8];
        java.util.Arrays.fill(high, "5");
        String[] oneBatch = new String[8];
        java.util.Arrays.fill(oneBatch, "B1");
        f.block("MDL", 0, "A1:C9", new String[] {"Spiked (mg/kg)", "Batch", "Result (mg/kg)"},
                new String[][] {high, oneBatch, numbers(SPIKES)});
        SectionResult s = f.run(cell("methods: [mdl]\nspikes: {data: lab!MDL!A1:C9, column: Result, batch: Batch, "
                + "spiked: Spiked}\n"));
        // No blanks: MDL = MDL_s (R: 0.0427292618627457); 5 > 10 × 0.0427.
        assertEquals(0.0427292618627457, q(s, "lod:mdl"), 1e-13);
        String all = String.join("\n", s.warnings());
        assertTrue(all.contains("more than 10 times"), all);
        assertTrue(all.contains("1 batch(es)"), all);
        assertTrue(all.contains("no method blanks"), all);
    }

    @Test
    void lobLodChoosesByNormalityAndMatchesR() {
        SectionResult s = fixture().run(cell("""
                methods: [lob-lod]
                blanks: {data: lab!Low!A1:A21, column: Result, units: concentration}
                low-samples: {data: lab!Low!C1:D19, column: Result, sample: Sample}
                """));
        // CLSI EP17-A2 (from memory). R: shapiro.test p = 0.480 ≥ 0.05 → parametric;
        // LoB = mean + 1.645·sd = 0.0372682484165049; SD_L = 0.0203988017077257, c_p = 1.6728813559322,
        // LoD = 0.0713930234767171.
        assertEquals(0.0372682484165049, q(s, "critical_value:lob-lod"), 1e-13);
        assertEquals(0.0713930234767171, q(s, "lod:lob-lod"), 1e-13);
        assertTrue(s.settings().stream().anyMatch(x -> x.value().startsWith("parametric, chosen by Shapiro")));
        SectionResult rank = fixture().run(cell("""
                methods: [lob-lod]
                lob: non-parametric
                blanks: {data: lab!Low!A1:A21, column: Result, units: concentration}
                low-samples: {data: lab!Low!C1:D19, column: Result, sample: Sample}
                """));
        // R: rank 19.5 of 20 sorted blanks, LoB = 0.0415, LoD = 0.0756247750602122.
        assertEquals(0.0415, q(rank, "critical_value:lob-lod"), 1e-13);
        assertEquals(0.0756247750602122, q(rank, "lod:lob-lod"), 1e-13);
    }

    @Test
    void equalBlanksTakeTheRankBasedLobWithoutANormalityTest() {
        DetectionFixture f = fixture();
        String[] zeros = new String[20];
        java.util.Arrays.fill(zeros, "0");
        f.block("Low", 0, "A1:A21", new String[] {"Result (mg/kg)"}, new String[][] {zeros});
        SectionResult s = f.run(cell("""
                methods: [lob-lod]
                blanks: {data: lab!Low!A1:A21, column: Result, units: concentration}
                low-samples: {data: lab!Low!C1:D19, column: Result, sample: Sample}
                """));
        // By hand from the R values above: LoB = 0 (every blank), LoD = c_p·SD_L = 1.6728813559322 × 0.0203988017077257
        // = 0.0341247750602122 (R).
        assertEquals(0, q(s, "critical_value:lob-lod"), 0);
        assertEquals(0.0341247750602122, q(s, "lod"), 1e-13);
    }

    @Test
    void signalToNoiseScalesTheStandard() {
        SectionResult s = fixture().run(cell("""
                methods: [signal-noise]
                signal: {data: lab!SN!A1:C4, column: Height, concentration: Nominal}
                noise: {data: lab!SN!A1:C4, column: Noise}
                """));
        // R: S/N = mean(H)/mean(h) = 30.8291873963516; LOD = 0.3/S/N = 0.00973103819257666, LOQ = 0.0324367939752555.
        assertEquals(0.00973103819257666, q(s, "lod:signal-noise"), 1e-14);
        assertEquals(0.0324367939752555, q(s, "loq"), 1e-14);
        assertEquals("mg/L", s.quantity("lod").orElseThrow().unit());
    }

    @Test
    void weightedCalibrationStatesTheScaleAndWarns() {
        DetectionFixture f = fixture().block("W", 0, "A1:B8", new String[] {"Conc (mg/L)", "Area (mAU·s)"},
                new String[][] {numbers(0.1, 0.25, 0.5, 1, 2.5, 5, 10), numbers(4.55, 10.9, 21.6, 42.0, 105.9, 209.0,
                    423.5)});
        SectionResult s = f.run("""
                ```calibration
                id: wcal
                data: lab!W!A1:B8
                x: Conc
                y: Area
                weighting: 1/x
                ```

                """ + cell("methods: [response-sd, prediction-band]\ncalibration: wcal\n"));
        // R, lm(weights = (1/x)/mean(1/x)): 3.3·s/b = 0.0266105054123236.
        assertEquals(0.0266105054123236, q(s, "lod:response-sd"), 1e-12);
        // R, uniroot on b·x − t_β·s·h(x) = t_α·s·h(0), blank weight = that of the lowest standard:
        // x_C = 0.0105250500670667, x_D = 0.0179718147283505.
        assertEquals(0.0105250500670667, q(s, "critical_value:prediction-band"), 1e-10);
        assertEquals(0.0179718147283505, q(s, "lod:prediction-band"), 1e-9);
        String all = String.join("\n", s.warnings());
        assertTrue(all.contains("not the SD of a low-level response"), all);
        assertTrue(all.contains("weight of the lowest standard"), all);
        assertTrue(s.settings().stream().anyMatch(x -> x.value().contains("weights normalised to average 1")));
    }

    @Test
    void aMethodTheDataCannotSupportIsNotEvaluableAndTheOthersGoOn() {
        DetectionFixture f = fixture().block("MDL", 0, "A1:C9", new String[] {"Spiked (mg/kg)", "Batch",
            "Result (mg/kg)"}, new String[][] {numbers(0.5, 0.5, 0.5, 0.5, 0.5), new String[] {"B1", "B1", "B2", "B2",
                "B3"}, numbers(0.5, 0.51, 0.49, 0.5, 0.52)});
        SectionResult s = f.run(cell("""
                methods: [mdl, signal-noise]
                spikes: {data: lab!MDL!A1:C9, column: Result}
                signal: {data: lab!SN!A1:C4, column: Height, concentration: Nominal}
                noise: {data: lab!SN!A1:C4, column: Noise}
                """));
        String all = String.join("\n", s.warnings());
        assertTrue(all.contains("Method mdl not evaluable, because"), all);
        assertTrue(all.contains("lod and loq are not reported"), all);
        assertFalse(s.quantity("lod").isPresent());
        assertEquals(0.00973103819257666, q(s, "lod:signal-noise"), 1e-14);
    }

    @Test
    void censoredBlanksAreNeverZero() {
        DetectionFixture f = fixture();
        String[] blanks = numbers(METHOD_BLANKS);
        blanks[7] = "<0.01";
        f.block("MDL", 4, "E1:F11", new String[] {"Batch", "Result (mg/kg)"}, new String[][] {BLANK_BATCH, blanks});
        String options = """
                methods: [mdl]
                spikes: {data: lab!MDL!A1:C9, column: Result, batch: Batch, spiked: Spiked}
                blanks: {data: lab!MDL!E1:F11, column: Result, units: concentration, batch: Batch}
                """;
        // Without censored: drop the censored blank is a located error.
        InputException e = assertThrows(InputException.class, () -> f.run(cell(options)));
        assertTrue(e.getMessage().contains("MDL!F9"), e.getMessage());
        // With it, 9 of 10 blanks give numbers: n < 100, so MDL_b is the highest numeric blank, 0.033.
        SectionResult s = f.run(cell(options + "censored: drop\n"));
        Step b = s.steps().stream().filter(x -> x.id().equals("detection-limit.mdl_blank")).findFirst().orElseThrow();
        assertEquals(0.033, b.value(), 0);
        assertTrue(b.label().contains("1 without a numerical result"), b.label());
        // MDL_s 0.0427 > 0.033.
        assertEquals(0.0427292618627457, q(s, "lod"), 1e-13);
    }

    @Test
    void badInputIsLocated() {
        InputException missing = assertThrows(InputException.class, () -> fixture().run(cell(
                "methods: [mdl]\nspikes: {data: lab!MDL!A1:C9, column: Concentration}\n")));
        assertEquals(ErrorKey.MISSING_COLUMN, missing.key());
        assertTrue(missing.getMessage().contains("'Concentration'"), missing.getMessage());
        DetectionFixture f = fixture();
        String[] bad = numbers(SPIKES);
        bad[2] = "0.49x";
        f.block("MDL", 0, "A1:C9", new String[] {"Spiked (mg/kg)", "Batch", "Result (mg/kg)"},
                new String[][] {numbers(0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5), SPIKE_BATCH, bad});
        InputException text = assertThrows(InputException.class, () -> f.run(cell(
                "methods: [mdl]\nspikes: {data: lab!MDL!A1:C9, column: Result}\n")));
        assertEquals(ErrorKey.NOT_A_NUMBER, text.key());
        assertTrue(text.getMessage().contains("MDL!C4"), text.getMessage());
        InputException noCal = assertThrows(InputException.class, () -> fixture().run(cell("methods: [response-sd]\n")));
        assertTrue(noCal.getMessage().contains("calibration: <id>"), noCal.getMessage());
        InputException k = assertThrows(InputException.class, () -> fixture().run(CALIBRATION
                + cell("methods: [blank]\ncalibration: cal\nk: three\n")));
        assertTrue(k.getMessage().contains("study.md line"), k.getMessage());
        assertTrue(k.getMessage().contains("'three'"), k.getMessage());
        InputException signals = assertThrows(InputException.class, () -> fixture().run(cell(
                "methods: [lob-lod]\nblanks: {data: lab!Low!A1:A21, column: Result}\n"
                        + "low-samples: {data: lab!Low!C1:D19, column: Result, sample: Sample}\n")));
        assertTrue(signals.getMessage().contains("units: concentration"), signals.getMessage());
    }

    @Test
    void tQuantilesMatchTheEpaTable() {
        // 40 CFR 136 App. B Rev. 2, table of t(n − 1, 0.99) for n = 7 … 30 (from memory; equal to R's
        // round(qt(0.99, 6:29), 3)) and Commons Math's TDistribution.
        double[] table = {3.143, 2.998, 2.896, 2.821, 2.764, 2.718, 2.681, 2.650, 2.624, 2.602, 2.583, 2.567, 2.552,
            2.539, 2.528, 2.518, 2.508, 2.500, 2.492, 2.485, 2.479, 2.473, 2.467, 2.462};
        for (int n = 7; n <= 30; n++) {
            double t = new StudentT(n - 1).quantile(0.99);
            assertEquals(table[n - 7], t, 0.0005, "n = " + n);
            assertEquals(new org.apache.commons.math3.distribution.TDistribution(n - 1).inverseCumulativeProbability(0.99),
                    t, 1e-9, "n = " + n);
        }
    }
}
