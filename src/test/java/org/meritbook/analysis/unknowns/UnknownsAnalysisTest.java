package org.meritbook.analysis.unknowns;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.meritbook.analysis.AnalysisContext;
import org.meritbook.analysis.DataTable;
import org.meritbook.analysis.Quantity;
import org.meritbook.analysis.SectionResult;
import org.meritbook.analysis.calibration.CalibrationAnalysis;
import org.meritbook.error.ErrorKey;
import org.meritbook.error.InputException;
import org.meritbook.study.AnalysisKind;
import org.meritbook.study.Study;
import org.meritbook.study.StudyParser;
import org.meritbook.workbook.CellRef;
import org.meritbook.workbook.CellValue;
import org.meritbook.workbook.Column;
import org.meritbook.workbook.DataBlock;
import org.junit.jupiter.api.Test;

class UnknownsAnalysisTest {
    /** Miller & Miller's fluorescence calibration (handbook worked example, ch. 5, from memory). */
    private static final double[] X = {0, 2, 4, 6, 8, 10, 12};
    private static final double[] Y = {2.1, 5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
    private static final Path FILE = Path.of("runs.xlsx");

    private static String notebook(String weighting, String unknownOptions) {
        return """
                ---
                title: Test study
                sources:
                  runs: runs.xlsx
                ---

                ```calibration
                id: cal
                data: runs!Cal!A1:B%d
                x: Conc
                y: Signal
                weighting: %s
                ```

                ```unknowns
                calibration: cal
                data: runs!Samples!A1:E20
                sample: Sample
                y: Signal
                %s```
                """.formatted(X.length + 1, weighting, unknownOptions);
    }

    private static CellValue cell(String sheet, int col, int row, String raw) {
        CellRef ref = new CellRef(sheet, row, col);
        if (raw.isEmpty()) {
            return new CellValue(ref, CellValue.Kind.BLANK, Double.NaN, raw, null);
        }
        try {
            return new CellValue(ref, CellValue.Kind.NUMBER, Double.parseDouble(raw), raw, null);
        } catch (NumberFormatException e) {
            return new CellValue(ref, CellValue.Kind.TEXT, Double.NaN, raw, null);
        }
    }

    private static DataBlock calibration(double[] x, double[] y) {
        List<CellValue> xv = new ArrayList<>();
        List<CellValue> yv = new ArrayList<>();
        for (int i = 0; i < x.length; i++) {
            xv.add(cell("Cal", 0, i + 1, Double.toString(x[i])));
            yv.add(cell("Cal", 1, i + 1, Double.toString(y[i])));
        }
        return new DataBlock(FILE, "Cal", "A1:B" + (x.length + 1), List.of(
                new Column("Conc (mg/L)", "Conc", "mg/L", "A", xv),
                new Column("Signal (counts)", "Signal", "counts", "B", yv)), List.of());
    }

    /** Samples: one row per reading, columns Sample, Signal, Mass (g), Dilution, Nominal (mg/kg). */
    private static DataBlock samples(String[][] rows) {
        String[] headers = {"Sample", "Signal (counts)", "Mass (g)", "Dilution", "Nominal (mg/kg)"};
        String[] names = {"Sample", "Signal", "Mass", "Dilution", "Nominal"};
        String[] units = {null, "counts", "g", null, "mg/kg"};
        List<Column> columns = new ArrayList<>();
        for (int c = 0; c < headers.length; c++) {
            List<CellValue> values = new ArrayList<>();
            for (int r = 0; r < rows.length; r++) {
                values.add(cell("Samples", c, r + 1, c < rows[r].length ? rows[r][c] : ""));
            }
            columns.add(new Column(headers[c], names[c], units[c], CellRef.columnLetters(c), values));
        }
        return new DataBlock(FILE, "Samples", "A1:E" + (rows.length + 1), columns, List.of());
    }

    private static SectionResult run(String weighting, String options, DataBlock cal, DataBlock samples) {
        Study study = StudyParser.parse(notebook(weighting, options), Path.of("study.md"));
        AnalysisContext context = new AnalysisContext(study, ref -> ref.target().equals("Cal") ? cal : samples);
        SectionResult calibration = new CalibrationAnalysis().run(study.cells().get(0), context);
        return new UnknownsAnalysis().run(study.cells().get(1), context.with(calibration));
    }

    private static double q(SectionResult s, String name) {
        return s.quantity(name).orElseThrow(() -> new AssertionError("no quantity " + name + " in "
                + s.quantities().stream().map(Quantity::name).toList())).value();
    }

    @Test
    void readsBackMillerAndMillersThreeSamplesWithTheirStandardErrors() {
        // Miller & Miller, Statistics and Chemometrics for Analytical Chemistry, ch. 5 worked example
        // (from memory): single readings y0 = 2.9, 13.5, 23.0 give x0 = 0.72, 6.21, 11.13 pg/mL with
        // s(x0) = 0.26, 0.24, 0.26. Cross-checked to full precision in R 4.2:
        // f <- lm(y ~ x); s <- summary(f)$sigma; x0 <- (y0 - a)/b
        // se <- s/b*sqrt(1 + 1/7 + (y0 - mean(y))^2/(b^2*sum((x - mean(x))^2)))
        // → 0.7160037 / 0.2645698, 6.207216 / 0.2397542, 11.12858 / 0.2631933
        SectionResult s = run("none", "", calibration(X, Y),
                samples(new String[][] {{"A", "2.9"}, {"B", "13.5"}, {"C", "23.0"}}));
        assertEquals(0.72, q(s, "x0:A"), 0.005);
        assertEquals(6.21, q(s, "x0:B"), 0.005);
        assertEquals(11.13, q(s, "x0:C"), 0.005);
        assertEquals(0.26, q(s, "x0_se:A"), 0.005);
        assertEquals(0.24, q(s, "x0_se:B"), 0.005);
        assertEquals(0.26, q(s, "x0_se:C"), 0.005);
        assertEquals(0.7160037, q(s, "x0:A"), 5e-7);
        assertEquals(0.2645698, q(s, "x0_se:A"), 5e-7);
        assertEquals(11.12858, q(s, "x0:C"), 5e-6);
        assertEquals(0.2631933, q(s, "x0_se:C"), 5e-7);
        // The interval is x0 ± t(0.975; 5)·s(x0), t = 2.5706 (any t table).
        assertEquals(q(s, "x0:B") - 2.570582 * q(s, "x0_se:B"), q(s, "x0_ci_low:B"), 1e-5);
        assertTrue(s.warnings().isEmpty(), s.warnings().toString());
    }

    @Test
    void aWeightedReadBackAgreesWithAnIndependentComputationInR() {
        double[] x = {2, 4, 6, 8, 10, 12};
        double[] y = {5.0, 9.0, 12.6, 17.3, 21.0, 24.7};
        SectionResult s = run("1/x", "", calibration(x, y), samples(new String[][] {{"S", "6.1"}, {"S", "6.3"}}));
        // R 4.2: x <- c(2,4,6,8,10,12); y <- c(5.0,9.0,12.6,17.3,21.0,24.7); w <- 1/x; w <- w/mean(w)
        // fit <- lm(y ~ x, weights = w); a, b, s <- coef, summary(fit)$sigma; xw, yw weighted means
        // y0 <- c(6.1, 6.3); x0 <- (mean(y0)-a)/b; w0 <- (1/x0)/mean(1/x)
        // se <- s/abs(b)*sqrt(1/(w0*2) + 1/sum(w) + (mean(y0)-yw)^2/(b^2*sum(w*(x-xw)^2)))
        assertEquals(2.60989100374166, q(s, "x0:S"), 1e-12);
        assertEquals(0.0816261664345531, q(s, "x0_se:S"), 1e-12);
    }

    @Test
    void scalingTheConcentrationsScalesX0AndItsErrorAndRowOrderChangesNothing() {
        String[][] rows = {{"P", "7.7"}, {"Q", "19.0"}, {"P", "7.9"}};
        SectionResult base = run("none", "", calibration(X, Y), samples(rows));
        double[] x10 = new double[X.length];
        for (int i = 0; i < X.length; i++) {
            x10[i] = X[i] * 10;
        }
        SectionResult scaled = run("none", "", calibration(x10, Y), samples(rows));
        assertEquals(10 * q(base, "x0:P"), q(scaled, "x0:P"), 1e-10);
        assertEquals(10 * q(base, "x0_se:P"), q(scaled, "x0_se:P"), 1e-10);
        SectionResult permuted = run("none", "", calibration(X, Y), samples(new String[][] {rows[2], rows[1], rows[0]}));
        assertEquals(q(base, "x0:P"), q(permuted, "x0:P"), 1e-12);
        assertEquals(q(base, "x0_se:P"), q(permuted, "x0_se:P"), 1e-12);
        assertEquals(q(base, "x0:Q"), q(permuted, "x0:Q"), 1e-12);
    }

    @Test
    void aReadingAtTheMeanResponseHasTheSmallestStandardError() {
        double yMean = java.util.Arrays.stream(Y).average().orElseThrow();
        String[][] rows = new String[9][];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = new String[] {"R" + i, Double.toString(yMean + (i - 4) * 2.5)};
        }
        SectionResult s = run("none", "", calibration(X, Y), samples(rows));
        double atMean = q(s, "x0_se:R4");
        for (int i = 0; i < rows.length; i++) {
            if (i != 4) {
                assertTrue(q(s, "x0_se:R" + i) > atMean, "R" + i);
            }
        }
    }

    @Test
    void samplesOutsideTheSpanAreFlaggedAndNotConvertedAndQcsGetTheirDeviation() {
        SectionResult s = run("none", "mass: Mass\nvolume: 50 mL\ndilution: Dilution\nknown: Nominal\n",
                calibration(X, Y), samples(new String[][] {
                        {"H1", "13.5", "5.000", "1"}, {"H1", "13.7", "5.000", "1"},
                        {"H2", "40.0", "5.000", "1"}, {"H2", "9.1", "5.000", "5"},
                        {"QC", "12.0", "5.000", "1", "55.0"}}));
        // content = x0 · 50 mL · D / m with x0 in mg/L and m in g: mg/L · mL / g = mg/kg (factor 1).
        assertEquals(q(s, "x0:H1") * 50 / 5.0, q(s, "content:H1"), 1e-12);
        assertFalse(s.quantity("content:H2").isPresent(), "H2 undiluted reads above 12 mg/L: not converted");
        assertTrue(s.warnings().stream().anyMatch(w -> w.startsWith("Sample H2 reads") && w.contains("above the highest")),
                s.warnings().toString());
        assertEquals(q(s, "x0:H2 (dilution 5)") * 50 * 5 / 5.0, q(s, "content:H2 (dilution 5)"), 1e-12);
        double qc = q(s, "content:QC");
        assertEquals((qc - 55.0) / 55.0 * 100, q(s, "qc_deviation_percent:QC"), 1e-12);
        DataTable.Row h2 = s.table().rows().get(2);
        assertEquals("outside the calibrated span: not reported", h2.cells().get(h2.cells().size() - 1).raw());
        for (Quantity quantity : s.quantities()) {
            String base = quantity.name().contains(":") ? quantity.name().substring(0, quantity.name().indexOf(':'))
                    : quantity.name();
            assertTrue(AnalysisKind.UNKNOWNS.reportedNames().contains(base), quantity.name());
        }
    }

    @Test
    void badInputIsLocated() {
        DataBlock cal = calibration(X, Y);
        InputException text = assertThrows(InputException.class, () -> run("none", "", cal,
                samples(new String[][] {{"A", "2.9"}, {"B", "n/a"}})));
        assertEquals(ErrorKey.NOT_A_NUMBER, text.key());
        assertTrue(text.getMessage().startsWith("runs.xlsx, Samples!B3"), text.getMessage());
        InputException onlyMass = assertThrows(InputException.class, () -> run("none", "mass: Mass\n", cal,
                samples(new String[][] {{"A", "2.9", "5"}})));
        assertEquals(ErrorKey.MISSING_OPTION, onlyMass.key());
        // a dilution alone would scale nothing: x₀ is the measured solution's, and a QC's deviation would be off by D
        InputException onlyDilution = assertThrows(InputException.class, () -> run("none", "dilution: Dilution\n", cal,
                samples(new String[][] {{"A", "2.9", "5", "2"}})));
        assertEquals(ErrorKey.MISSING_OPTION, onlyDilution.key());
        assertTrue(onlyDilution.getMessage().startsWith("study.md line 20: expected 'mass:' and 'volume:' beside "
                + "'dilution:'"), onlyDilution.getMessage());
        InputException unit = assertThrows(InputException.class, () -> run("none", "mass: Mass\nvolume: 50 gallons\n",
                cal, samples(new String[][] {{"A", "2.9", "5"}})));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, unit.key());
        assertTrue(unit.getMessage().contains("study.md line 21"), unit.getMessage());
        InputException twoKnown = assertThrows(InputException.class, () -> run("none",
                "known: Nominal\nmass: Mass\nvolume: 50 mL\n", cal,
                samples(new String[][] {{"QC", "2.9", "5", "", "1.0"}, {"QC", "3.0", "5", "", "1.1"}})));
        assertEquals(ErrorKey.BAD_OPTION_VALUE, twoKnown.key());
        assertTrue(twoKnown.getMessage().startsWith("runs.xlsx, Samples!E3"), twoKnown.getMessage());
    }
}
